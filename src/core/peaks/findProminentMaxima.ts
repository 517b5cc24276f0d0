/**
 * Local maxima of a (smoothed) signal with their topographic prominence: how far the maximum rises
 * above the higher of the two lowest points met on each side before a higher point (or the end of
 * the range) is reached.
 * Source: topographic prominence as used for peak picking in general signal processing (common
 *   practice, no source). Applied to voltammograms after orienting the current so that the wanted
 *   peaks point up.
 * In: y (any unit) over [start, end). Out: interior maxima with prominence in the unit of y and the
 *   indices of the lowest point on each side (the bases), sorted by index. The end points are never
 *   maxima: a current still rising at a vertex is not a peak.
 */

export interface ProminentMaximum {
  index: number;
  prominence: number;
  leftBase: number;
  rightBase: number;
}

export interface FindProminentMaximaOptions {
  /** First sample (inclusive). @default 0 */
  start?: number;
  /** Last sample (exclusive). @default length */
  end?: number;
  /** Smallest prominence kept, in the unit of y. @default 0 */
  minProminence?: number;
}

export function findProminentMaxima(y: ArrayLike<number>, options: FindProminentMaximaOptions = {}): ProminentMaximum[] {
  const start = options.start ?? 0;
  const end = options.end ?? y.length;
  const minProminence = options.minProminence ?? 0;
  const out: ProminentMaximum[] = [];
  if (end - start < 3) return out;
  const leftLow = lowestSinceHigher(y, start, end, 1);
  const rightLow = lowestSinceHigher(y, start, end, -1);
  for (let k = start + 1; k < end - 1; k++) {
    const v = y[k] as number;
    if (!(v > (y[k - 1] as number))) continue;
    // A flat top counts once, at its first point.
    let r = k + 1;
    while (r < end - 1 && (y[r] as number) === v) r++;
    if (!(v > (y[r] as number))) continue;
    const left = leftLow[k - start]!;
    const right = rightLow[r - 1 - start]!;
    const base = Math.max(y[left] as number, y[right] as number);
    const prominence = v - base;
    if (prominence >= minProminence && prominence > 0) out.push({ index: k, prominence, leftBase: left, rightBase: right });
  }
  return out;
}

/**
 * For every k in [start, end): the index of the lowest y between k and the nearest point beyond
 * it (before it for step 1, after it for step −1) that is higher than y[k], k included; on ties
 * the point nearest k. One pass with a stack of ever higher points, O(n) in all: each point is
 * pushed and popped once, and a popped point hands over the lowest point of the stretch it covered.
 */
function lowestSinceHigher(y: ArrayLike<number>, start: number, end: number, step: 1 | -1): Int32Array {
  const low = new Int32Array(end - start);
  const stack = new Int32Array(end - start);
  let top = 0;
  for (let n = 0; n < end - start; n++) {
    const k = step === 1 ? start + n : end - 1 - n;
    const v = y[k] as number;
    let best = k;
    while (top > 0 && (y[stack[top - 1]!] as number) <= v) {
      const cand = low[stack[--top]! - start]!;
      if ((y[cand] as number) < (y[best] as number)) best = cand;
    }
    low[k - start] = best;
    stack[top++] = k;
  }
  return low;
}
