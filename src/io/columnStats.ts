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

/**
 * The shape of a swept potential: a triangle (or staircase) wave changes by nearly the same step
 * from point to point and turns back only at its few vertices; a current, even a smooth one,
 * changes by steps that grow and shrink through its peaks. Heuristic: common practice, no source.
 * Over the evenly strided sample: `steps`, the non-zero steps between consecutive finite values;
 * `usualStep`, their median size; `steady`, the share of them within 25 % of it; `turns`, the
 * changes of direction among the steps at least half the usual step.
 */
export type SweepShape = { steps: number; usualStep: number; steady: number; turns: number };

export function sweepShape(col: Float64Array, maxPoints = 20000): SweepShape {
  const stride = Math.max(1, Math.floor(col.length / maxPoints));
  const sizes: number[] = [];
  const signs: number[] = [];
  let prev = NaN;
  for (let i = 0; i < col.length; i += stride) {
    const v = col[i] as number;
    if (!Number.isFinite(v)) continue;
    if (prev === prev && v !== prev) {
      sizes.push(Math.abs(v - prev));
      signs.push(v > prev ? 1 : -1);
    }
    prev = v;
  }
  if (sizes.length < 3) return { steps: sizes.length, usualStep: 0, steady: 0, turns: 0 };
  const sorted = Float64Array.from(sizes).sort();
  const usualStep = sorted[Math.floor(sorted.length / 2)] as number;
  let steadyCount = 0;
  let turns = 0;
  let lastSign = 0;
  for (let i = 0; i < sizes.length; i++) {
    const d = sizes[i] as number;
    if (Math.abs(d - usualStep) <= 0.25 * usualStep) steadyCount++;
    if (d < 0.5 * usualStep) continue;
    if (lastSign !== 0 && signs[i] !== lastSign) turns++;
    lastSign = signs[i] as number;
  }
  return { steps: sizes.length, usualStep, steady: steadyCount / sizes.length, turns };
}

/** Nearly constant steps (80 % within 25 % of the usual one) and few turns (one per 20 steps at most). */
export function looksLikeSweep(s: SweepShape): boolean {
  return s.steps >= 10 && s.steady >= 0.8 && s.turns * 20 <= s.steps;
}
