/**
 * Thins a long trace for drawing while keeping its shape: the points are cut into buckets of
 * consecutive samples and each bucket keeps its first point and the points of its smallest and
 * largest y, in their original order (common practice for plotting long signals, no source).
 * Peaks therefore survive at full height. Analysis always uses the full data; only the picture
 * is thinned.
 */
export interface XY {
  x: number[];
  y: number[];
}

export function decimateMinMax(x: ArrayLike<number>, y: ArrayLike<number>, start: number, end: number, maxPoints: number): XY {
  const n = end - start;
  const out: XY = { x: [], y: [] };
  if (n <= maxPoints) {
    for (let i = start; i < end; i++) {
      out.x.push(x[i] as number);
      out.y.push(y[i] as number);
    }
    return out;
  }
  const buckets = Math.max(1, Math.floor(maxPoints / 3));
  const size = n / buckets;
  for (let b = 0; b < buckets; b++) {
    const a = start + Math.floor(b * size);
    const z = Math.min(end, start + Math.floor((b + 1) * size));
    let lo = a;
    let hi = a;
    for (let i = a + 1; i < z; i++) {
      if ((y[i] as number) < (y[lo] as number)) lo = i;
      if ((y[i] as number) > (y[hi] as number)) hi = i;
    }
    for (const i of [...new Set([a, lo, hi])].sort((p, q) => p - q)) {
      out.x.push(x[i] as number);
      out.y.push(y[i] as number);
    }
  }
  out.x.push(x[end - 1] as number);
  out.y.push(y[end - 1] as number);
  return out;
}
