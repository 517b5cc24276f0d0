/**
 * Ratio of a quasi-reversible forward peak current to the reversible (Randles–Ševčík) one, as a
 * function of Nicholson's ψ and α, for correcting peak currents before D is taken from them.
 * In: psi (pure number, from ΔEp by nicholsonPsi), alpha of the forward reaction (for a forward
 *   oxidation pass 1 − α of the reduction), stepV of the working simulation. Out: ip/ip,rev (≤ 1).
 * Method: the ratio depends on ψ = k°/(π D n F v/RT)^½ and α only (Matsuda & Ayabe, Z. Elektrochem.
 *   59, 494 (1955), from memory; Nicholson, Anal. Chem. 37, 1351 (1965)). Their tabulated curve is
 *   not to hand, so it is computed here with this project's simulator (src/core/simulation, whose
 *   tests tie it to 0.4463 and Nicholson's ΔEp table): one reversible and one quasi-reversible
 *   sweep with identical numerics, so discretisation errors cancel in the ratio.
 * Difference from the sources: numerical working curve instead of a printed table.
 */
import { assertFiniteInRange } from '../errors';
import { inverseThermalVoltagePerV, STANDARD_TEMPERATURE_K } from '../constants';
import { simulateCv } from '../simulation';

export interface KineticPeakCurrentRatioOptions {
  /** Potential step of the working simulation (V). @default 0.0005 */
  stepV?: number;
}

const D_CM2_PER_S = 1e-5;
const V_PER_S = 1;

function forwardCathodicPeakA(k0CmPerS: number, alpha: number, stepV: number): number {
  const r = simulateCv({ mechanism: 'E', k0CmPerS, alpha, formalPotentialV: 0, startV: 0.5, switchV: -0.7, stepV, scanRateVPerS: V_PER_S,
    diffusionOCm2PerS: D_CM2_PER_S, diffusionRCm2PerS: D_CM2_PER_S, concentrationOMolPerCm3: 1e-6, concentrationRMolPerCm3: 0 }, { firstSweepOnly: true });
  let min = 0;
  for (let k = 0; k < r.currentA.length; k++) min = Math.min(min, r.currentA[k] as number);
  return -min;
}

/** The reversible peak does not depend on α; it is computed once per step size. */
const reversibleCache = new Map<number, number>();
/** A series asks for the same ψ at several α and again on each rerun: ratios are kept by (ψ, α, step). */
const ratioCache = new Map<string, number>();

export function kineticPeakCurrentRatio(psi: number, alpha: number, options: KineticPeakCurrentRatioOptions = {}): number {
  assertFiniteInRange('psi', psi, Number.MIN_VALUE);
  assertFiniteInRange('alpha', alpha, 0.01, 0.99);
  const stepV = options.stepV ?? 0.0005;
  assertFiniteInRange('stepV', stepV, 1e-5, 0.005);
  const k0 = psi * Math.sqrt(Math.PI * D_CM2_PER_S * inverseThermalVoltagePerV(STANDARD_TEMPERATURE_K) * V_PER_S);
  const key = `${psi.toPrecision(6)}|${alpha.toPrecision(6)}|${stepV}`;
  const known = ratioCache.get(key);
  if (known !== undefined) return known;
  let reversible = reversibleCache.get(stepV);
  if (reversible === undefined) {
    reversible = forwardCathodicPeakA(Infinity, 0.5, stepV);
    reversibleCache.set(stepV, reversible);
  }
  const ratio = forwardCathodicPeakA(k0, alpha, stepV) / reversible;
  if (ratioCache.size > 2000) ratioCache.clear();
  ratioCache.set(key, ratio);
  return ratio;
}
