/**
 * Isolated bad points (single-point glitches, "spikes") in a recorded current, found against a
 * running median and replaced by it, so that peak finding and baselines never see them.
 * Method: the Hampel identifier as a moving-window filter (R. K. Pearson, "Outliers in process
 *   modeling and identification", IEEE Trans. Control Syst. Technol. 10, 55 (2002), from memory),
 *   built on the median absolute deviation with the 1.4826 factor (F. R. Hampel, J. Am. Stat.
 *   Assoc. 69, 383 (1974)): point i is an outlier when |x_i − m_i| > t·S_i, m_i the median and
 *   S_i = 1.4826·MAD of the 2k + 1 points around it.
 * Choices (ours, common practice, no source): k = 3; t = 6; S_i is never smaller than the trace's
 *   own white-noise level (MAD of second differences, madSecondDifferenceNoise.ts), so a quiet,
 *   smooth stretch does not turn its noise into spikes; windows stay inside one sweep (a vertex,
 *   where the charging current jumps, is never an outlier of the next sweep, nor are the first two
 *   points of a sweep, where that current settles); only runs of at most
 *   k flagged points count, because a longer run is a feature, not a glitch.
 * In: current (A, any sign convention) and the sweeps. Out: the flagged indices and the current with
 *   them replaced by their running median (a copy; the input is untouched).
 */
import { madSecondDifferenceNoise } from './madSecondDifferenceNoise';
import { ownStart } from './sweepSignals';
import type { SweepSegment } from '../types';

export interface HampelSpikesOptions {
  /** Half-width k of the window (points). @default 3 */
  halfWidth?: number;
  /** Threshold t in robust standard deviations. @default 6 */
  threshold?: number;
}

export interface HampelSpikesResult {
  indices: number[];
  /** The current with each spike replaced by its running median (A). */
  cleanedA: Float64Array;
}

/**
 * Median m and 1.4826·MAD of x[lo, lo + w.length), written to out[0] and out[1]. `w` is the
 * window's own scratch buffer: one per trace, nothing allocated per point.
 */
function windowMedianAndScale(x: ArrayLike<number>, lo: number, w: Float64Array, out: Float64Array): void {
  const n = w.length;
  for (let j = 0; j < n; j++) w[j] = x[lo + j] as number;
  w.sort();
  const m = n % 2 ? w[(n - 1) / 2]! : (w[n / 2 - 1]! + w[n / 2]!) / 2;
  for (let j = 0; j < n; j++) w[j] = Math.abs(w[j]! - m);
  w.sort();
  out[0] = m;
  out[1] = 1.4826 * (n % 2 ? w[(n - 1) / 2]! : (w[n / 2 - 1]! + w[n / 2]!) / 2);
}

export function hampelSpikes(currentA: Float64Array, segments: SweepSegment[], options: HampelSpikesOptions = {}): HampelSpikesResult {
  const k = options.halfWidth ?? 3;
  const t = options.threshold ?? 6;
  const cleanedA = Float64Array.from(currentA);
  if (currentA.length < 2 * k + 1) return { indices: [], cleanedA };
  const floor = madSecondDifferenceNoise(currentA);
  const buf = new Float64Array(2 * k + 1);
  const ms = new Float64Array(2);
  const indices: number[] = [];
  for (let s = 0; s < segments.length; s++) {
    const seg = segments[s] as SweepSegment;
    const start = ownStart(segments, s);
    if (seg.end - start < 2 * k + 1) continue;
    const flagged: Array<{ i: number; m: number }> = [];
    // Where a sweep starts (a vertex, or the start of the record) the charging current settles
    // over a point or two: not a glitch.
    const first = start + 2;
    for (let i = first; i < seg.end; i++) {
      const lo = Math.max(start, Math.min(i - k, seg.end - 2 * k - 1));
      windowMedianAndScale(currentA, lo, buf, ms);
      const m = ms[0] as number;
      if (Math.abs((currentA[i] as number) - m) > t * Math.max(ms[1] as number, floor)) flagged.push({ i, m });
    }
    for (let a = 0; a < flagged.length;) {
      let b = a;
      while (b + 1 < flagged.length && flagged[b + 1]!.i === flagged[b]!.i + 1) b++;
      if (b - a + 1 <= k) for (let j = a; j <= b; j++) { indices.push(flagged[j]!.i); cleanedA[flagged[j]!.i] = flagged[j]!.m; }
      a = b + 1;
    }
  }
  return { indices, cleanedA };
}
