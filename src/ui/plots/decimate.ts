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

type Map1 = (v: number) => number;
const same: Map1 = (v) => v;

/**
 * The thinned points of `start…end`, with `mapX` and `mapY` applied to the points kept (so a
 * redraw makes no second pass over them). One pass, no allocation per bucket: the first drawing
 * of a page runs this before the engine has optimised it.
 */
export function decimateMinMax(x: ArrayLike<number>, y: ArrayLike<number>, start: number, end: number, maxPoints: number, mapX: Map1 = same, mapY: Map1 = same): XY {
  const n = end - start;
  const out: XY = { x: [], y: [] };
  const keep = (i: number) => {
    out.x.push(mapX(x[i] as number));
    out.y.push(mapY(y[i] as number));
  };
  if (n <= maxPoints) {
    for (let i = start; i < end; i++) keep(i);
    return out;
  }
  const buckets = Math.max(1, Math.floor(maxPoints / 3));
  const size = n / buckets;
  for (let b = 0; b < buckets; b++) {
    const a = start + Math.floor(b * size);
    const z = Math.min(end, start + Math.floor((b + 1) * size));
    let lo = a;
    let hi = a;
    let yLo = y[a] as number;
    let yHi = yLo;
    for (let i = a + 1; i < z; i++) {
      const v = y[i] as number;
      if (v < yLo) {
        lo = i;
        yLo = v;
      }
      if (v > yHi) {
        hi = i;
        yHi = v;
      }
    }
    // The bucket's first point, then its extremes in trace order, each once.
    keep(a);
    const first = Math.min(lo, hi);
    const second = Math.max(lo, hi);
    if (first !== a) keep(first);
    if (second !== first) keep(second);
  }
  keep(end - 1);
  return out;
}
