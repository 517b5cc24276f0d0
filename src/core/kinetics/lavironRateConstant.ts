/**
 * Electron-transfer rate constant k_s (s⁻¹) and transfer coefficient α of a surface-confined
 * couple from its peak separation at large ΔEp.
 * In: deltaEpV (Epa − Epc, V), scanRateVPerS, electronCount n, alpha, temperatureK; or the
 *   slopes of Epa and Epc against log₁₀ v (V per decade). Out: k_s in s⁻¹; α.
 * Source: E. Laviron, "General expression of the linear potential sweep voltammogram in the case
 *   of diffusionless electrochemical systems", J. Electroanal. Chem. 101, 19 (1979) (from memory):
 *   Epc = E°′ − (RT/αnF)·ln[αnFv/(RT k_s)], Epa = E°′ + (RT/(1−α)nF)·ln[(1−α)nFv/(RT k_s)],
 *   log k_s = α log(1−α) + (1−α) log α − log(RT/nFv) − α(1−α)nFΔEp/(2.303RT).
 * The expressions hold for n·ΔEp > 200 mV only; below that Laviron's working curve is needed,
 *   which is not given here (its values are known to us only from memory), so the function refuses.
 */
import { AnalysisError, assertFiniteInRange } from '../errors';
import { STANDARD_TEMPERATURE_K, thermalVoltageV } from '../constants';

export interface LavironOptions {
  /** Transfer coefficient α in (0, 1). @default 0.5 */
  alpha?: number;
  /** Temperature in K. @default 298.15 */
  temperatureK?: number;
}

/** Smallest n·ΔEp (V) for which the large-separation expressions apply. */
export const LAVIRON_MIN_N_DELTA_EP_V = 0.2;

export function lavironRateConstant(
  input: { deltaEpV: number; scanRateVPerS: number; electronCount: number },
  options: LavironOptions = {},
): number {
  const alpha = options.alpha ?? 0.5;
  const temperatureK = options.temperatureK ?? STANDARD_TEMPERATURE_K;
  const { deltaEpV, scanRateVPerS: v, electronCount: n } = input;
  assertFiniteInRange('deltaEpV', deltaEpV);
  assertFiniteInRange('scanRateVPerS', v, Number.MIN_VALUE);
  assertFiniteInRange('electronCount', n, Number.MIN_VALUE);
  assertFiniteInRange('alpha', alpha, Number.MIN_VALUE, 1 - Number.EPSILON);
  assertFiniteInRange('temperatureK', temperatureK, Number.MIN_VALUE);
  if (n * deltaEpV <= LAVIRON_MIN_N_DELTA_EP_V) {
    throw new AnalysisError(
      'OUT_OF_RANGE',
      `n·ΔEp = ${(n * deltaEpV * 1000).toFixed(1)} mV: Laviron's large-separation expression needs more than 200 mV`,
    );
  }
  const rtOverF = thermalVoltageV(temperatureK);
  const logKs = alpha * Math.log10(1 - alpha) + (1 - alpha) * Math.log10(alpha) - Math.log10(rtOverF / (n * v))
    - (alpha * (1 - alpha) * n * deltaEpV) / (Math.LN10 * rtOverF);
  return 10 ** logKs;
}

/** Epa and Epc (V) predicted by Laviron's large-separation lines, for a check or a simulation. */
export function lavironPeakPotentials(
  input: { formalPotentialV: number; rateConstantPerS: number; scanRateVPerS: number; electronCount: number },
  options: LavironOptions = {},
): { epaV: number; epcV: number } {
  const alpha = options.alpha ?? 0.5;
  const rt = thermalVoltageV(options.temperatureK ?? STANDARD_TEMPERATURE_K);
  const { formalPotentialV: e0, rateConstantPerS: ks, scanRateVPerS: v, electronCount: n } = input;
  assertFiniteInRange('rateConstantPerS', ks, Number.MIN_VALUE);
  const epcV = e0 - (rt / (alpha * n)) * Math.log((alpha * n * v) / (rt * ks));
  const epaV = e0 + (rt / ((1 - alpha) * n)) * Math.log(((1 - alpha) * n * v) / (rt * ks));
  return { epaV, epcV };
}

/**
 * α from the slopes of Epa and Epc against log₁₀ v at large ΔEp (V per decade):
 * slope_a = 2.303RT/((1−α)nF), slope_c = −2.303RT/(αnF), so α = slope_a/(slope_a − slope_c).
 */
export function lavironTransferCoefficient(anodicSlopeVPerDecade: number, cathodicSlopeVPerDecade: number): number {
  assertFiniteInRange('anodicSlopeVPerDecade', anodicSlopeVPerDecade, Number.MIN_VALUE);
  assertFiniteInRange('cathodicSlopeVPerDecade', cathodicSlopeVPerDecade, -Infinity, -Number.MIN_VALUE);
  return anodicSlopeVPerDecade / (anodicSlopeVPerDecade - cathodicSlopeVPerDecade);
}
