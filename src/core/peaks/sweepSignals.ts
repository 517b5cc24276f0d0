/**
 * The signals every later step of the per-voltammogram analysis reads: IUPAC current, a time axis,
 * the shown (user) smoothing, the heavier smoothing used only to locate features, dI/dE, and the
 * noise level. Smoothing runs sweep by sweep so that no window straddles a vertex; a vertex shared
 * by two sweeps belongs to the earlier one (see ownStart). The raw columns are never modified.
 * Methods: Savitzky–Golay (../smoothing/savitzkyGolaySmooth.ts), MAD noise
 *   (madSecondDifferenceNoise.ts). Time when the file has none: cumulative |ΔE|/v (exact for a
 *   linear sweep at constant rate).
 */
import type { SmoothingSetting } from '../smoothing/smoothingTypes';
import type { SweepSegment } from '../types';
import { savitzkyGolayDerivative, savitzkyGolaySmooth } from '../smoothing/savitzkyGolaySmooth';
import { madSecondDifferenceNoise } from './madSecondDifferenceNoise';
import { keptScratch } from '../scratch';

export interface SweepSignals {
  potentialV: Float64Array;
  /** Raw current, IUPAC sign (A). */
  currentA: Float64Array;
  /** Seconds when `timeKnown`, otherwise cumulative |ΔE| in V (a time-like clock). */
  timeS: Float64Array;
  timeKnown: boolean;
  /** Current with the user's smoothing (a copy of the raw current when smoothing is off). */
  shownA: Float64Array;
  /** dI/dE of the shown current (A/V). */
  shownSlopeAPerV: Float64Array;
  /** Current smoothed for locating peaks, feet and shoulders. */
  locatingA: Float64Array;
  segments: SweepSegment[];
  noiseA: number;
}

/** Cumulative |ΔE| divided by the scan rate (or left in V when the rate is unknown). */
export function buildTimeAxis(potentialV: Float64Array, scanRateVPerS: number | null): Float64Array {
  const t = new Float64Array(potentialV.length);
  const rate = scanRateVPerS ?? 1;
  for (let k = 1; k < t.length; k++) t[k] = t[k - 1]! + Math.abs(potentialV[k]! - potentialV[k - 1]!) / rate;
  return t;
}

/** Odd window covering about `spanV` of potential on this sweep, at least 5 points. */
export function windowForSpan(potentialV: Float64Array, segment: SweepSegment, spanV: number): number {
  const n = segment.end - segment.start;
  const stepV = Math.abs(potentialV[segment.end - 1]! - potentialV[segment.start]!) / Math.max(n - 1, 1);
  const points = stepV > 0 ? Math.round(spanV / stepV) : 5;
  const odd = Math.max(5, points | 1);
  return Math.min(odd, n % 2 ? n : n - 1);
}

/**
 * First point a sweep owns. A vertex shared with the previous sweep belongs to that sweep: the
 * charging current reverses right after it, and a smoothing window that straddled the step
 * would invent a bump at the start of the new sweep.
 */
export function ownStart(segments: SweepSegment[], k: number): number {
  const seg = segments[k]!;
  const prev = segments[k - 1];
  return prev && prev.end - 1 === seg.start ? seg.start + 1 : seg.start;
}

/** dE/dk of a sweep, in an array kept between calls (../scratch.ts): every sweep of every file needs one. */
const potentialSlope = keptScratch();

/** Each sweep of `y` filtered in place in a copy of `y` (a sweep too short for its window keeps its values). */
function smoothSegments(
  y: Float64Array,
  segments: SweepSegment[],
  pick: (segment: SweepSegment) => SmoothingSetting | null,
  derivativeOf?: Float64Array,
): Float64Array {
  const out = y.slice();
  for (let k = 0; k < segments.length; k++) {
    const seg = segments[k]!;
    const setting = pick(seg);
    const start = ownStart(segments, k);
    const n = seg.end - start;
    if (!setting || n < setting.window || n < 3) continue;
    const part = y.subarray(start, seg.end);
    const target = out.subarray(start, seg.end);
    if (derivativeOf) {
      const options = { ...setting, order: Math.max(1, setting.order) };
      savitzkyGolayDerivative(part, options, target);
      const dE = savitzkyGolayDerivative(derivativeOf.subarray(start, seg.end), options, potentialSlope(n));
      divideBy(target, dE);
    } else {
      savitzkyGolaySmooth(part, setting, target);
    }
  }
  return out;
}

/** dI/dk ÷ dE/dk, in place: dI/dE (0 where the potential stands still). */
function divideBy(dI: Float64Array, dE: Float64Array): void {
  for (let i = 0; i < dI.length; i++) dI[i] = dE[i] !== 0 ? dI[i]! / dE[i]! : 0;
}

export interface PrepareSweepSignalsInput {
  potentialV: Float64Array;
  currentA: Float64Array;
  timeS: Float64Array | null;
  scanRateVPerS: number | null;
  segments: SweepSegment[];
}

export function prepareSweepSignals(
  input: PrepareSweepSignalsInput,
  smoothing: SmoothingSetting | 'off',
  locating: (segment: SweepSegment) => SmoothingSetting,
): SweepSignals {
  const { potentialV, currentA, segments } = input;
  const user = smoothing === 'off' ? null : smoothing;
  const shownA = smoothSegments(currentA, segments, () => user);
  const slopeSetting = (seg: SweepSegment) => user ?? locating(seg);
  const shownSlopeAPerV = smoothSegments(currentA, segments, slopeSetting, potentialV);
  const locatingA = smoothSegments(currentA, segments, locating);
  const timeKnown = input.timeS !== null || input.scanRateVPerS !== null;
  const timeS = input.timeS ?? buildTimeAxis(potentialV, input.scanRateVPerS);
  const noiseA = currentA.length >= 3 ? madSecondDifferenceNoise(currentA) : 0;
  return { potentialV, currentA, timeS, timeKnown, shownA, shownSlopeAPerV, locatingA, segments, noiseA };
}
