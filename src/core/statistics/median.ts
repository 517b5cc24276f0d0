/**
 * Median of a list of numbers: the middle value of the sorted list, or the mean of the two middle
 * values when the count is even (the usual definition; e.g. Hogg, McKean & Craig, Introduction to
 * Mathematical Statistics, 7th ed. 2013, §1.7).
 * In: any finite numbers (not modified). Out: the median, or NaN for an empty list.
 */

/** Median of values already sorted ascending. */
export function medianOfSorted(sorted: ArrayLike<number>): number {
  const n = sorted.length;
  if (n === 0) return Number.NaN;
  const m = n >> 1;
  return n % 2 ? sorted[m]! : (sorted[m - 1]! + sorted[m]!) / 2;
}

/** Median of values in any order; the input is copied, never sorted in place. */
export function median(values: ArrayLike<number>): number {
  return medianOfSorted(Float64Array.from(values).sort());
}
