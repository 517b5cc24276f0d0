/**
 * Shape statistics of a numeric column, used to guess its role when the header does not say:
 * how many values are integers, whether it only rises, how far it wanders compared with its
 * span (a triangle potential wave wanders about 2 spans per cycle; a noisy current much more).
 * Heuristics: common practice, no source. Works on at most ~20 000 evenly strided points.
 */
export interface ColumnStats {
  finite: number;
  min: number;
  max: number;
  maxAbs: number;
  allIntegers: boolean;
  nonDecreasing: boolean;
  strictlyIncreasing: boolean;
  /**
   * Distinct values seen, counted up to 1001 while every value is a whole number (only such
   * columns are asked; a column of fractions stops counting at its first fraction).
   */
  distinct: number;
  /** Total variation divided by the span (max − min); Infinity when the span is 0. */
  wander: number;
  /** Mean step between consecutive finite values. */
  meanStep: number;
}

export function columnStats(col: Float64Array, maxPoints = 20000): ColumnStats {
  const stride = Math.max(1, Math.floor(col.length / maxPoints));
  let finite = 0;
  let min = Infinity;
  let max = -Infinity;
  let allIntegers = true;
  let nonDecreasing = true;
  let strictlyIncreasing = true;
  let tv = 0;
  let prev = NaN;
  let first = NaN;
  const seen = new Set<number>();
  for (let i = 0; i < col.length; i += stride) {
    const v = col[i] as number;
    if (!Number.isFinite(v)) continue;
    finite++;
    if (finite === 1) first = v;
    if (v < min) min = v;
    if (v > max) max = v;
    if (allIntegers && !Number.isInteger(v)) allIntegers = false;
    if (allIntegers && seen.size <= 1000) seen.add(v);
    if (prev === prev) {
      if (v < prev) nonDecreasing = false;
      if (v <= prev) strictlyIncreasing = false;
      tv += Math.abs(v - prev);
    }
    prev = v;
  }
  const span = max - min;
  return {
    finite,
    min,
    max,
    maxAbs: Math.max(Math.abs(min), Math.abs(max)),
    allIntegers: allIntegers && finite > 0,
    nonDecreasing: nonDecreasing && finite > 1,
    strictlyIncreasing: strictlyIncreasing && finite > 1,
    distinct: seen.size,
    wander: span > 0 ? tv / span : Infinity,
    meanStep: finite > 1 ? (prev - first) / (finite - 1) : 0,
  };
}

/** A per-point counter 0,1,2... or 1,2,3... (a row index, not a time). */
export function looksLikeIndex(s: ColumnStats): boolean {
  return s.allIntegers && s.strictlyIncreasing && (s.min === 0 || s.min === 1) && Math.abs(s.meanStep - 1) < 1e-9;
}

/** Small non-decreasing integers that change rarely: a cycle or scan number. */
export function looksLikeCycle(s: ColumnStats, rows: number): boolean {
  return s.allIntegers && s.nonDecreasing && s.min >= 0 && s.distinct <= 1000 && s.distinct * 10 <= Math.max(rows, 10);
}

/** Rises throughout and is not a plain counter: a time column. */
export function looksLikeTime(s: ColumnStats): boolean {
  return s.strictlyIncreasing && !looksLikeIndex(s) && s.min >= 0;
}
