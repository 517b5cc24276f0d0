/**
 * One dissolved species under planar semi-infinite diffusion (with an optional first-order
 * homogeneous decay), advanced in time by backward differentiation formulas (BDF1–3; the class
 * keeps its historical name), fully implicit, on an expanding grid with a compact three-point (Mehrstellen)
 * discretisation. Each step's length and coefficients come from vertexStepSchedule.ts (backward
 * Euler at a fresh start, variable-step BDF2 after it, BDF3 at equal steps).
 * Source: BDF2 for electrochemical diffusion: D. Britz, T. Strutwolf, "Digital Simulation in
 *   Electrochemistry", 4th ed., Springer (2016), chapter on implicit methods (from memory);
 *   BDF1 and BDF2 are A- and L-stable, BDF3 stable on the whole negative real axis, where the
 *   eigenvalues of diffusion with decay lie, so any time step is stable.
 * Equation per node i (spacings h, three weights m per node from compactDiffusionStencil.ts):
 *   m_−(ċ + kc)_{i−1} + m_0(ċ + kc)_i + m_+(ċ + kc)_{i+1} = D[(c_{i+1}−c_i)/h_i − (c_i−c_{i−1})/h_{i−1}];
 *   at the surface node the second term is replaced by the flux q (mol cm⁻² s⁻¹) of this species
 *   into the electrode. The bulk node holds c_bulk. The systems stay tridiagonal.
 * Per step the surface concentration is a linear function of q: c_0 = intercept − q·slope.
 */
import { compactDiffusionWeights, type CompactWeights } from './compactDiffusionStencil';
import type { ExpandingGrid } from './expandingGrid';
import { factorThomasFromBulkSide, substituteTowardsBulk, type ThomasFactor } from './solveTridiagonalThomas';
import type { StepRule } from './vertexStepSchedule';

export class Bdf2DiffusionSpecies {
  /** Concentrations at the latest completed step, mol/cm³ (nodes 0 … N−1). */
  latestMolPerCm3: Float64Array;
  private previousMolPerCm3: Float64Array;
  private olderMolPerCm3: Float64Array;
  private readonly u: Float64Array;
  /** Factorisations per step rule (vertexStepSchedule.ts), made as first needed. */
  private readonly factors: (ThomasFactor | undefined)[] = [];
  private active: ThomasFactor | null = null;
  /** Weights of the time-derivative (and decay) terms, compactDiffusionStencil.ts. */
  private readonly weights: CompactWeights;
  /** What the fixed bulk node adds to the last node's right-hand side, mol cm⁻² s⁻¹. */
  private readonly bulkSource: number;
  private readonly diffusionCm2PerS: number;
  /** After prepareStep: surface value without flux, and dc_0/dq (positive). */
  intercept = 0;
  slope = 0;

  constructor(
    private readonly grid: ExpandingGrid,
    diffusionCm2PerS: number,
    private readonly bulkMolPerCm3: number,
    private readonly decayRatePerS: number,
  ) {
    const n = grid.volumeCm.length;
    this.latestMolPerCm3 = new Float64Array(n).fill(bulkMolPerCm3);
    this.previousMolPerCm3 = new Float64Array(n).fill(bulkMolPerCm3);
    this.olderMolPerCm3 = new Float64Array(n).fill(bulkMolPerCm3);
    this.u = new Float64Array(n);
    this.weights = compactDiffusionWeights(grid.spacingCm);
    this.diffusionCm2PerS = diffusionCm2PerS;
    // The bulk node's term (σ+k)·m_+·c_N − D·c_N/h, less the history m_+·σ·c_N it would carry.
    this.bulkSource = (diffusionCm2PerS / (grid.spacingCm[n - 1] as number) - decayRatePerS * (this.weights.upper[n - 1] as number)) * bulkMolPerCm3;
  }

  private factor(d: number, k: number, sigma: number): ThomasFactor {
    const h = this.grid.spacingCm;
    const m = this.weights;
    const n = h.length;
    const lower = new Float64Array(n);
    const diag = new Float64Array(n);
    const upper = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const right = d / (h[i] as number);
      const left = i === 0 ? 0 : d / (h[i - 1] as number);
      lower[i] = (sigma + k) * (m.lower[i] as number) - left;
      upper[i] = (sigma + k) * (m.upper[i] as number) - right;
      diag[i] = (sigma + k) * (m.diagonal[i] as number) + left + right;
    }
    return factorThomasFromBulkSide(lower, diag, upper);
  }

  /**
   * Builds the right-hand side from the history and eliminates it (one fused pass from the bulk
   * towards the electrode); sets intercept and slope.
   */
  prepareStep(rule: StepRule): void {
    const f = this.factors[rule.id] ?? (this.factors[rule.id] = this.factor(this.diffusionCm2PerS, this.decayRatePerS, rule.sigmaPerS));
    this.active = f;
    const { lower: mL, diagonal: mD, upper: mU } = this.weights;
    const c = this.latestMolPerCm3;
    const p = this.previousMolPerCm3;
    const o = this.olderMolPerCm3;
    const u = this.u;
    const upper = f.upper;
    const invDen = f.inverseDenominator;
    const a = rule.latestWeightPerS;
    const b = rule.previousWeightPerS;
    const g = rule.olderWeightPerS;
    const last = u.length - 1;
    // History H_j = a·c_j + b·p_j + g·o_j, weighted by the node's three weights (H of the bulk node is in bulkSource).
    let hRight = 0;
    let hHere = a * (c[last] as number) + b * (p[last] as number) + g * (o[last] as number);
    let uNext = 0;
    for (let i = last; i >= 0; i--) {
      const hLeft = i === 0 ? 0 : a * (c[i - 1] as number) + b * (p[i - 1] as number) + g * (o[i - 1] as number);
      const rhs = (mL[i] as number) * hLeft + (mD[i] as number) * hHere + (mU[i] as number) * hRight;
      uNext = (i === last ? rhs + this.bulkSource : rhs - (upper[i] as number) * uNext) * (invDen[i] as number);
      u[i] = uNext;
      hRight = hHere;
      hHere = hLeft;
    }
    this.intercept = uNext;
    this.slope = invDen[0] as number;
  }

  /** Completes the step once the flux into the electrode, q (mol cm⁻² s⁻¹), is known. */
  finishStep(fluxIntoElectrode: number): void {
    // Rotate buffers: latest → previous → older; the new solution overwrites the oldest one.
    const oldest = this.olderMolPerCm3;
    this.olderMolPerCm3 = this.previousMolPerCm3;
    this.previousMolPerCm3 = this.latestMolPerCm3;
    this.latestMolPerCm3 = oldest;
    substituteTowardsBulk(this.active as ThomasFactor, this.u, this.intercept - fluxIntoElectrode * this.slope, this.latestMolPerCm3);
  }
}
