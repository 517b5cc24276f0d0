/**
 * Shift of the peak potential with scan rate for a totally irreversible, diffusing couple, and
 * the transfer coefficient α that follows from it.
 * In: scanRatesVPerS (> 0), peakPotentialsV of one peak (V), the peak's direction, and nₐ.
 * Out: the line Ep = slope·log₁₀ v + intercept (slope in V per decade) and α·nₐ, α.
 * Source: Ep = E°′ ∓ (RT/(α nₐ F))·[0.780 + ln(D^½/k°) + ½ ln(α nₐ F v/RT)] (J. Wang, Analytical
 *   Electrochemistry, 2nd ed. (2000), eq. 2-5; Bard & Faulkner 2nd ed. §6.3), so
 *   |dEp/d log₁₀ v| = (ln 10)·RT/(2 α nₐ F) = 29.58/(α nₐ) mV per decade at 25 °C.
 * A cathodic peak must move negative and an anodic one positive as v rises; a slope of the wrong
 *   sign gives alpha = null and a note.
 */
import { assertFiniteInRange } from '../errors';
import { STANDARD_TEMPERATURE_K, thermalVoltageV } from '../constants';
import { fitLine } from '../regression';
import type { FitLineResult } from '../regression';

export interface PeakPotentialVsLogScanRateOptions {
  /** Electrons in the rate-determining step nₐ. @default 1 */
  transferElectronCount?: number;
  /** Temperature in K. @default 298.15 */
  temperatureK?: number;
}

export interface PeakPotentialVsLogScanRateResult {
  /** dEp/d log₁₀ v in V per decade. */
  slopeVPerDecade: number;
  fit: FitLineResult;
  /** α·nₐ from the slope; null when the slope has the wrong sign or is zero. */
  alphaTimesTransferElectrons: number | null;
  alpha: number | null;
  note: string | null;
}

/** |dEp/d log₁₀ v| of a totally irreversible wave, in V per decade. */
export function irreversiblePeakShiftVPerDecade(alphaTimesTransferElectrons: number, temperatureK = STANDARD_TEMPERATURE_K): number {
  assertFiniteInRange('alphaTimesTransferElectrons', alphaTimesTransferElectrons, Number.MIN_VALUE);
  return (Math.LN10 * thermalVoltageV(temperatureK)) / (2 * alphaTimesTransferElectrons);
}

/** The same shift for messages, at the series' temperature: "29.6/(αnₐ) mV" at 25 °C. */
export function irreversibleShiftText(temperatureK: number): string {
  return `${(irreversiblePeakShiftVPerDecade(1, temperatureK) * 1000).toFixed(1)}/(αnₐ) mV`;
}

export function peakPotentialVsLogScanRate(
  input: { scanRatesVPerS: ArrayLike<number>; peakPotentialsV: ArrayLike<number>; direction: 'anodic' | 'cathodic' },
  options: PeakPotentialVsLogScanRateOptions = {},
): PeakPotentialVsLogScanRateResult {
  const na = options.transferElectronCount ?? 1;
  const temperatureK = options.temperatureK ?? STANDARD_TEMPERATURE_K;
  assertFiniteInRange('transferElectronCount', na, Number.MIN_VALUE);
  assertFiniteInRange('temperatureK', temperatureK, Number.MIN_VALUE);
  const logV = Array.from(input.scanRatesVPerS, (v, i) => {
    assertFiniteInRange(`scanRatesVPerS[${i}]`, v, Number.MIN_VALUE);
    return Math.log10(v);
  });
  const fit = fitLine(logV, input.peakPotentialsV);
  const expectedSign = input.direction === 'anodic' ? 1 : -1;
  if (!(fit.slope * expectedSign > 0)) {
    const note = `the ${input.direction} peak does not move ${expectedSign > 0 ? 'positive' : 'negative'} with scan rate, so α cannot be read from it`;
    return { slopeVPerDecade: fit.slope, fit, alphaTimesTransferElectrons: null, alpha: null, note };
  }
  const alphaNa = (Math.LN10 * thermalVoltageV(temperatureK)) / (2 * Math.abs(fit.slope));
  const alpha = alphaNa / na;
  const note = alpha > 1 ? `α = ${alpha.toFixed(2)} > 1: the peak moves less than an irreversible wave can; the couple is probably not totally irreversible` : null;
  return { slopeVPerDecade: fit.slope, fit, alphaTimesTransferElectrons: alphaNa, alpha, note };
}
