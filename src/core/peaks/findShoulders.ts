/**
 * Shoulders: places where a wave shows up only as a flattening of its neighbour's flank. The
 * smoothed first derivative comes close to zero there without changing sign (on the rising flank
 * it dips towards zero between two steeper stretches; on the falling flank it rises towards zero
 * between two steeper stretches).
 * Method: derivative-based shoulder detection (common practice, no source); thresholds are ours.
 * In: the derivative of the oriented signal (peaks up) over [start, end), any unit.
 * Out: shoulder indices with the flank they sit on and the slope ratio |d_shoulder| / |d_flank|
 *   (small = pronounced shoulder), sorted by index.
 */

export interface Shoulder {
  index: number;
  flank: 'rising' | 'falling';
  /** |d| at the shoulder over the smaller of the two bracketing steep slopes (0…1). */
  slopeRatio: number;
  /** Indices of the steepest points on either side (the brackets). */
  leftBracket: number;
  rightBracket: number;
}

export interface FindShouldersOptions {
  /** First sample (inclusive). @default 0 */
  start?: number;
  /** Last sample (exclusive). @default length */
  end?: number;
  /** Largest slope ratio still called a shoulder. @default 0.3 */
  maxSlopeRatio?: number;
  /** Each bracketing slope must reach this fraction of the largest |d| in the range. @default 0.2 */
  minBracketFraction?: number;
}

export function findShoulders(d: ArrayLike<number>, options: FindShouldersOptions = {}): Shoulder[] {
  const start = options.start ?? 0;
  const end = options.end ?? d.length;
  const maxRatio = options.maxSlopeRatio ?? 0.3;
  const minBracket = (options.minBracketFraction ?? 0.2) * largestMagnitude(d, start, end);
  const out: Shoulder[] = [];
  let k = start;
  while (k < end) {
    // One run of constant derivative sign at a time.
    const sign = Math.sign(d[k] as number);
    let r = k;
    while (r < end && Math.sign(d[r] as number) === sign) r++;
    if (sign !== 0) {
      const best = flattestInteriorPoint(d, k, r, sign, minBracket, { start, end });
      if (best && best.slopeRatio <= maxRatio) out.push({ ...best, flank: sign > 0 ? 'rising' : 'falling' });
    }
    k = r;
  }
  return out;
}

function largestMagnitude(d: ArrayLike<number>, start: number, end: number): number {
  let m = 0;
  for (let k = start; k < end; k++) m = Math.max(m, Math.abs(d[k] as number));
  return m;
}

/**
 * Within one same-sign run [a, b), the flattest point with a steep stretch on both sides. A steep
 * stretch that is steepest at the very start or end of the range (e.g. the decay right after a
 * vertex) is not a wave's flank and does not count as a bracket.
 */
function flattestInteriorPoint(d: ArrayLike<number>, a: number, b: number, sign: number, minBracket: number, range: { start: number; end: number }) {
  let best: { index: number; slopeRatio: number; leftBracket: number; rightBracket: number } | null = null;
  const mag = (j: number) => sign * (d[j] as number);
  for (let k = a + 1; k < b - 1; k++) {
    if (!(mag(k) <= mag(k - 1) && mag(k) < mag(k + 1))) continue;
    let left = a;
    for (let j = a; j < k; j++) if (mag(j) > mag(left)) left = j;
    let right = k + 1;
    for (let j = k + 1; j < b; j++) if (mag(j) > mag(right)) right = j;
    if (left <= range.start + 2 || right >= range.end - 3) continue;
    const bracket = Math.min(mag(left), mag(right));
    if (bracket < minBracket) continue;
    const ratio = mag(k) / bracket;
    if (!best || ratio < best.slopeRatio) best = { index: k, slopeRatio: ratio, leftBracket: left, rightBracket: right };
  }
  return best;
}
