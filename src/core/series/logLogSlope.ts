/**
 * Diagnostic slope of log₁₀|ip| against log₁₀ v, and what it usually means.
 * In: scanRatesVPerS (> 0) and peakCurrentsA (non-zero, either sign; magnitudes are used).
 * Out: the fitted line with its 95 % interval and a reading:
 *   'diffusion' (slope within LOG_LOG_DIFFUSION_BAND, 0.4–0.6), 'adsorbed-or-capacitive' (within
 *   LOG_LOG_SURFACE_BAND, 0.85–1.15), 'mixed' (anything else).
 * Source: ip ∝ v^½ for planar diffusion (Randles–Ševčík, Bard & Faulkner 2nd ed. §6.2) and ip ∝ v
 *   for a surface-confined couple or double-layer charging (Laviron 1974; B&F §14.3, §1.2).
 *   The band limits are common practice, no source.
 */
import { AnalysisError } from '../errors';
import { fitLine } from '../regression';
import type { FitLineResult } from '../regression';

export type LogLogReading = 'diffusion' | 'adsorbed-or-capacitive' | 'mixed';

/** Log–log slopes read as diffusion control (common practice, no source). */
export const LOG_LOG_DIFFUSION_BAND: readonly [number, number] = [0.4, 0.6];
/** Log–log slopes read as ip ∝ v: an adsorbed couple or charging current (common practice, no source). */
export const LOG_LOG_SURFACE_BAND: readonly [number, number] = [0.85, 1.15];

/** "0.4–0.6": a band as the results sheet prints it. */
export function formatBand(band: readonly [number, number]): string {
  return `${band[0]}–${band[1]}`;
}

export interface LogLogSlopeOptions {
  /** Slope band read as diffusion control. @default LOG_LOG_DIFFUSION_BAND */
  diffusionBand?: readonly [number, number];
  /** Slope band read as adsorbed species or charging current. @default LOG_LOG_SURFACE_BAND */
  adsorbedBand?: readonly [number, number];
}

export interface LogLogSlopeResult {
  slope: number;
  fit: FitLineResult;
  reading: LogLogReading;
}

/** The reading of a log–log slope on its own. */
export function readLogLogSlope(slope: number, options: LogLogSlopeOptions = {}): LogLogReading {
  const [d0, d1] = options.diffusionBand ?? LOG_LOG_DIFFUSION_BAND;
  const [a0, a1] = options.adsorbedBand ?? LOG_LOG_SURFACE_BAND;
  if (slope >= d0 && slope <= d1) return 'diffusion';
  if (slope >= a0 && slope <= a1) return 'adsorbed-or-capacitive';
  return 'mixed';
}

export function logLogSlope(
  scanRatesVPerS: ArrayLike<number>,
  peakCurrentsA: ArrayLike<number>,
  options: LogLogSlopeOptions = {},
): LogLogSlopeResult {
  const lx = Array.from(scanRatesVPerS, (v, i) => {
    if (!(v > 0)) throw new AnalysisError('OUT_OF_RANGE', `scan rate ${i} must be > 0 for a log–log plot, got ${v}`);
    return Math.log10(v);
  });
  const ly = Array.from(peakCurrentsA, (ip, i) => {
    if (!(Math.abs(ip) > 0)) throw new AnalysisError('OUT_OF_RANGE', `peak current ${i} must be non-zero for a log–log plot, got ${ip}`);
    return Math.log10(Math.abs(ip));
  });
  const fit = fitLine(lx, ly);
  return { slope: fit.slope, fit, reading: readLogLogSlope(fit.slope, options) };
}
