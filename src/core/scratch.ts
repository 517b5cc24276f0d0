/**
 * Working arrays kept from call to call. New memory costs a page fault per 4 KB the first time it
 * is written (about 10 µs each in a browser's worker on this project's virtual machines), and the
 * analysis of every file of a batch needs the same short-lived arrays again. A kept array is for
 * a function that runs to its end without yielding and lets nothing it writes escape: no other
 * call can then meet it half-written. Arrays longer than `maxLength` are made new each time, so a
 * single huge file does not leave a huge array behind.
 */
export function keptScratch(maxLength = 1 << 17): (length: number) => Float64Array {
  let kept = new Float64Array(0);
  return (length) => {
    if (length > maxLength) return new Float64Array(length);
    if (kept.length < length) kept = new Float64Array(Math.min(maxLength, Math.max(length, 2 * kept.length)));
    return kept.subarray(0, length);
  };
}
