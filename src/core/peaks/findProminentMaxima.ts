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
  for (let k = start + 1; k < end - 1; k++) {
    const v = y[k] as number;
    if (!(v > (y[k - 1] as number))) continue;
    // A flat top counts once, at its first point.
    let r = k + 1;
    while (r < end - 1 && (y[r] as number) === v) r++;
    if (!(v > (y[r] as number))) continue;
    const left = lowestBefore(y, k, start, v);
    const right = lowestAfter(y, r, end, v);
    const base = Math.max(y[left] as number, y[right] as number);
    const prominence = v - base;
    if (prominence >= minProminence && prominence > 0) out.push({ index: k, prominence, leftBase: left, rightBase: right });
  }
  return out;
}

function lowestBefore(y: ArrayLike<number>, k: number, start: number, top: number): number {
  let low = k;
  for (let j = k - 1; j >= start; j--) {
    const v = y[j] as number;
    if (v > top) break;
    if (v < (y[low] as number)) low = j;
  }
  return low;
}

function lowestAfter(y: ArrayLike<number>, k: number, end: number, top: number): number {
  let low = k;
  for (let j = k; j < end; j++) {
    const v = y[j] as number;
    if (v > top) break;
    if (v < (y[low] as number)) low = j;
  }
  return low;
}
