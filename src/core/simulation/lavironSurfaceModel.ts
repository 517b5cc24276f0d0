/**
 * Surface-confined couple O_ads + n e⁻ ⇌ R_ads (Langmuir, no lateral interactions, both forms
 * equally adsorbed) with Butler–Volmer-type surface kinetics.
 * Source: E. Laviron, "General expression of the linear potential sweep voltammogram in the case
 *   of diffusionless electrochemical systems", J. Electroanal. Chem. 101, 19 (1979) (from memory):
 *   dΓ_O/dt = −k_s e^{−αnfη} Γ_O + k_s e^{(1−α)nfη} Γ_R, Γ_O + Γ_R = Γ.
 * Integration: for a fixed potential the rate law is linear in Γ_O, so each time step is solved
 *   exactly, Γ_O(t+Δt) = Γ_eq + (Γ_O(t) − Γ_eq)·e^{−(k_red+k_ox)Δt}, with the potential at the end
 *   of the step (fully implicit in the potential). The reported current is the step mean
 *   i = nFA·ΔΓ_O/Δt, so it lags by Δt/2 (≤ 0.13 mV of sweep at the default time step).
 * Initial state: the film is in equilibrium with the start potential.
 * k_s = Infinity gives the Nernstian film, Γ_O/Γ_R = e^{nfη}.
 */
import { FARADAY_C_PER_MOL, inverseThermalVoltagePerV } from '../constants';
import type { FaradaicModel } from './faradaicModel';
import type { CvSimulationInput } from './simulationTypes';
import type { StepRule } from './vertexStepSchedule';

export class LavironSurfaceModel implements FaradaicModel {
  /** Γ_O at the last completed step, mol/cm². */
  oxidisedMolPerCm2: number;
  private readonly nf: number;
  private readonly chargePerMol: number;

  /** Length of the current time step, s. */
  private dtS = 0;

  constructor(private readonly input: CvSimulationInput) {
    this.nf = input.electronCount * inverseThermalVoltagePerV(input.temperatureK);
    this.chargePerMol = input.electronCount * FARADAY_C_PER_MOL * input.areaCm2;
    this.oxidisedMolPerCm2 = this.equilibriumOxidised(input.startV);
  }

  prepareStep(rule: StepRule): void {
    this.dtS = rule.dtS;
    this.cacheV = Number.NaN;
  }

  /** Γ_O in equilibrium at E: Γ·θ/(1+θ), θ = e^{nfη}, written to avoid overflow. */
  private equilibriumOxidised(potentialV: number): number {
    const x = this.nf * (potentialV - this.input.formalPotentialV);
    return x > 0 ? this.input.coverageMolPerCm2 / (1 + Math.exp(-x)) : (this.input.coverageMolPerCm2 * Math.exp(x)) / (1 + Math.exp(x));
  }

  private oxidisedAfterStep(interfacialV: number): number {
    const eq = this.equilibriumOxidised(interfacialV);
    const ks = this.input.surfaceRatePerS;
    if (ks === Infinity) return eq;
    const x = this.nf * (interfacialV - this.input.formalPotentialV);
    const a = this.input.alpha;
    // k_red + k_ox, kept finite: beyond e^700 the film is at equilibrium within the step anyway.
    const total = ks * (Math.exp(Math.min(-a * x, 700)) + Math.exp(Math.min((1 - a) * x, 700)));
    return eq + (this.oxidisedMolPerCm2 - eq) * Math.exp(-total * this.dtS);
  }

  currentAt(interfacialV: number): number {
    return (this.chargePerMol * (this.cachedAfterStep(interfacialV) - this.oxidisedMolPerCm2)) / this.dtS;
  }

  finishStep(interfacialV: number): void {
    this.oxidisedMolPerCm2 = this.cachedAfterStep(interfacialV);
    this.cacheV = Number.NaN;
  }

  /** The loop asks for the same potential in currentAt and finishStep; compute it once. */
  private cacheV = Number.NaN;
  private cacheValue = 0;

  private cachedAfterStep(interfacialV: number): number {
    if (interfacialV !== this.cacheV) {
      this.cacheValue = this.oxidisedAfterStep(interfacialV);
      this.cacheV = interfacialV;
    }
    return this.cacheValue;
  }
}
