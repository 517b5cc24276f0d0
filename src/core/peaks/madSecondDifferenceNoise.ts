/**
 * Robust estimate of the white-noise standard deviation of a sampled current, from the median
 * absolute deviation (MAD) of its second differences.
 * Sources: the MAD with the 1.4826 consistency factor for a normal distribution (F. R. Hampel,
 *   "The influence curve and its role in robust estimation", J. Am. Stat. Assoc. 69 (1974) 383,
 *   from memory); a second difference y[k−1] − 2y[k] + y[k+1] of independent noise has variance
 *   (1 + 4 + 1)σ² = 6σ² (variance of a linear combination).
 * In: current samples (A) over [start, end). Out: σ (A). A smooth signal contributes only its
 *   curvature, which is small against the noise when the sampling is dense; peaks and vertices
 *   barely move the median.
 */
import { medianOfSorted } from '../statistics/median';
import { AnalysisError } from '../errors';
import { keptScratch } from '../scratch';

export interface MadSecondDifferenceNoiseOptions {
  /** First sample (inclusive). @default 0 */
  start?: number;
  /** Last sample (exclusive). @default length */
  end?: number;
}

/** The second differences go into an array kept between calls (../scratch.ts): the estimate runs twice per file. */
const differences = keptScratch();

export function madSecondDifferenceNoise(currentA: ArrayLike<number>, options: MadSecondDifferenceNoiseOptions = {}): number {
  const start = options.start ?? 0;
  const end = options.end ?? currentA.length;
  if (end - start < 3) throw new AnalysisError('TOO_FEW_POINTS', `noise estimate needs at least 3 points, got ${end - start}`);
  const d = differences(Math.max(0, end - start - 2));
  let count = 0;
  for (let k = start + 1; k < end - 1; k++) {
    const v = (currentA[k - 1] as number) - 2 * (currentA[k] as number) + (currentA[k + 1] as number);
    if (Number.isFinite(v)) d[count++] = v;
  }
  if (count === 0) throw new AnalysisError('NON_FINITE', 'no finite second differences for the noise estimate');
  // Typed arrays sort numerically without a comparator, several times faster on long traces.
  const diffs = d.subarray(0, count).sort();
  const med = medianOfSorted(diffs);
  for (let i = 0; i < count; i++) diffs[i] = Math.abs(diffs[i]! - med);
  const mad = medianOfSorted(diffs.sort());
  return (1.4826 * mad) / Math.sqrt(6);
}
