/**
 * How much an uncompensated resistance lowers the forward peak current of a diffusing couple:
 * ip(with Ru)/ip(without Ru) at the same ψ and α, for correcting peak currents before D is taken
 * from them when Ru is known. Correcting the potentials E − i·Ru after the measurement does not
 * undo this: the interface was swept more slowly than v near the peak, so less was converted.
 * In: rho = ip,rev·Ru·nF/(RT), the ohmic drop of the reversible (Randles–Ševčík) peak in units of
 *   RT/(nF) (pure number); psi = k°/(π D nFv/RT)^½ (Infinity for a Nernstian couple); alpha of the
 *   forward reaction (for a forward oxidation pass 1 − αc). Out: the ratio (≤ 1).
 * Method: the ratio depends on ρ, ψ and α only (the drop enters the interfacial potential in units
 *   of RT/nF; R. S. Nicholson, Anal. Chem. 37, 667 (1965), the integral equation with an ohmic
 *   term, from memory). It is computed with this project's simulator (src/core/simulation, whose
 *   ohmic coupling is solved self-consistently per step) in one canonical cell: a forward sweep
 *   with and one without Ru at identical numerics, so discretisation errors cancel in the ratio.
 *   The double layer is left out: its charging time Ru·Cd·A (about 0.2 ms at 150 Ω, 20 µF/cm²,
 *   0.07 cm²) is short beside RT/(nFv) (13 ms at 2 V/s).
 * Difference from the source: a numerical working curve instead of a printed one.
 */
import { assertFiniteInRange } from '../errors';
import { FARADAY_C_PER_MOL, STANDARD_TEMPERATURE_K, inverseThermalVoltagePerV, thermalVoltageV } from '../constants';
import { simulateCv } from '../simulation';
import { RANDLES_SEVCIK_REVERSIBLE } from './randlesSevcik';

export interface OhmicPeakCurrentRatioOptions {
  /** Potential step of the working simulation (V). @default 0.0005 */
  stepV?: number;
}

/** Largest ρ the working curve is computed for: beyond it the drop (> 10 RT/nF at the peak) dominates the wave. */
export const OHMIC_RHO_MAX = 10;

const CANON = { D: 1e-5, v: 1, c: 1e-6, area: 0.0707 };

/** ρ of a file: the reversible peak current at D (A) times Ru, over RT/(nF). */
export function ohmicDropParameter(cell: { electronCount: number; areaCm2: number; concentrationMolPerCm3: number; temperatureK: number }, scanRateVPerS: number, diffusionCm2PerS: number, ruOhm: number): number {
  const nf = cell.electronCount * inverseThermalVoltagePerV(cell.temperatureK);
  const ip = RANDLES_SEVCIK_REVERSIBLE * cell.electronCount * FARADAY_C_PER_MOL * cell.areaCm2 * cell.concentrationMolPerCm3 * Math.sqrt(nf * scanRateVPerS * diffusionCm2PerS);
  return ip * ruOhm * nf;
}

function forwardCathodicPeakA(k0CmPerS: number, alpha: number, ruOhm: number, dropV: number, stepV: number): number {
  const r = simulateCv({
    mechanism: 'E', k0CmPerS, alpha, formalPotentialV: 0, startV: 0.5, switchV: -0.7 - 1.5 * dropV, stepV, scanRateVPerS: CANON.v, areaCm2: CANON.area,
    diffusionOCm2PerS: CANON.D, diffusionRCm2PerS: CANON.D, concentrationOMolPerCm3: CANON.c, concentrationRMolPerCm3: 0, uncompensatedOhm: ruOhm,
  }, { firstSweepOnly: true });
  let min = 0;
  for (let k = 0; k < r.currentA.length; k++) min = Math.min(min, r.currentA[k] as number);
  return -min;
}

/** A series asks for the same (ρ, ψ, α) on each rerun: peaks are kept by key. */
const peakCache = new Map<string, number>();

function cachedPeak(k0: number, alpha: number, ruOhm: number, dropV: number, stepV: number): number {
  const key = `${k0.toPrecision(6)}|${alpha.toPrecision(6)}|${ruOhm.toPrecision(6)}|${stepV}`;
  const known = peakCache.get(key);
  if (known !== undefined) return known;
  const peak = forwardCathodicPeakA(k0, alpha, ruOhm, dropV, stepV);
  if (peakCache.size > 2000) peakCache.clear();
  peakCache.set(key, peak);
  return peak;
}

export function ohmicPeakCurrentRatio(rho: number, psi: number, alpha: number, options: OhmicPeakCurrentRatioOptions = {}): number {
  assertFiniteInRange('rho', rho, 0, OHMIC_RHO_MAX);
  if (!(psi > 0)) assertFiniteInRange('psi', psi, Number.MIN_VALUE);
  assertFiniteInRange('alpha', alpha, 0.01, 0.99);
  const stepV = options.stepV ?? 0.0005;
  assertFiniteInRange('stepV', stepV, 1e-5, 0.005);
  if (rho === 0) return 1;
  const f = inverseThermalVoltagePerV(STANDARD_TEMPERATURE_K);
  const k0 = psi === Infinity ? Infinity : psi * Math.sqrt(Math.PI * CANON.D * f * CANON.v);
  // α does not enter a Nernstian couple: one cache entry serves every α.
  const a = psi === Infinity ? 0.5 : alpha;
  const canon = { electronCount: 1, areaCm2: CANON.area, concentrationMolPerCm3: CANON.c, temperatureK: STANDARD_TEMPERATURE_K };
  const ruOhm = rho / ohmicDropParameter(canon, CANON.v, CANON.D, 1);
  const dropV = rho * thermalVoltageV(STANDARD_TEMPERATURE_K);
  return cachedPeak(k0, a, ruOhm, dropV, stepV) / cachedPeak(k0, a, 0, 0, stepV);
}
