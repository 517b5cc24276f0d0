/**
 * Ordinary least squares for y = Σ_j b_j·x_j over given regressor columns (a column of ones gives an
 * intercept), with standard errors and confidence intervals of each coefficient.
 * In: columns (each as long as y; any units) and y. Out: coefficients, standard errors and
 *   intervals (null without degrees of freedom), residual standard deviation, degrees of freedom.
 * Source: the matrix form b = (XᵀX)⁻¹Xᵀy, V(b) = (XᵀX)⁻¹·s², s² = Σr²/(n − p) (N. R. Draper,
 *   H. Smith, Applied Regression Analysis, 3rd ed. (Wiley, 1998), ch. 5); intervals with Student's
 *   t (studentTQuantile.ts).
 * Numerics: columns are scaled to unit length before the normal equations are solved by Gaussian
 *   elimination with partial pivoting; enough for the few, distinct columns used here (our choice).
 */
import { AnalysisError } from '../errors';
import { studentTQuantile } from './studentTQuantile';

export interface LinearModelFit {
  coefficients: number[];
  standardErrors: number[] | null;
  intervals: Array<[number, number]> | null;
  residualStdDev: number | null;
  degreesOfFreedom: number;
}

/** Inverse of a small symmetric positive matrix by Gauss–Jordan elimination with partial pivoting. */
function invert(m: number[][]): number[][] {
  const n = m.length;
  const a = m.map((row, i) => [...row, ...Array.from({ length: n }, (_, j) => (i === j ? 1 : 0))]);
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(a[r]![c]!) > Math.abs(a[p]![c]!)) p = r;
    if (!(Math.abs(a[p]![c]!) > 1e-12)) throw new AnalysisError('OUT_OF_RANGE', 'fitLinearModel: the regressor columns are not independent');
    [a[c], a[p]] = [a[p]!, a[c]!];
    const pivot = a[c]![c]!;
    for (let j = 0; j < 2 * n; j++) a[c]![j]! /= pivot;
    for (let r = 0; r < n; r++) {
      if (r === c) continue;
      const f = a[r]![c]!;
      for (let j = 0; j < 2 * n; j++) a[r]![j]! -= f * a[c]![j]!;
    }
  }
  return a.map((row) => row.slice(n));
}

export function fitLinearModel(columns: number[][], y: number[], confidenceLevel = 0.95): LinearModelFit {
  const p = columns.length;
  const n = y.length;
  if (!p || columns.some((c) => c.length !== n)) throw new AnalysisError('LENGTH_MISMATCH', 'fitLinearModel: every column must be as long as y');
  if (n < p) throw new AnalysisError('TOO_FEW_POINTS', `fitLinearModel: ${p} coefficients need at least ${p} points, got ${n}`);
  if (![...y, ...columns.flat()].every(Number.isFinite)) throw new AnalysisError('NON_FINITE', 'fitLinearModel: a value is not finite');
  const scale = columns.map((c) => Math.hypot(...c) || 1);
  const x = columns.map((c, j) => c.map((v) => v / scale[j]!));
  const xtx = x.map((a) => x.map((b) => a.reduce((s, v, i) => s + v * b[i]!, 0)));
  const xty = x.map((a) => a.reduce((s, v, i) => s + v * y[i]!, 0));
  const inv = invert(xtx);
  const scaled = inv.map((row) => row.reduce((s, v, j) => s + v * xty[j]!, 0));
  const coefficients = scaled.map((b, j) => b / scale[j]!);
  const dof = n - p;
  if (dof < 1) return { coefficients, standardErrors: null, intervals: null, residualStdDev: null, degreesOfFreedom: dof };
  let ss = 0;
  for (let i = 0; i < n; i++) ss += (y[i]! - columns.reduce((s, c, j) => s + coefficients[j]! * c[i]!, 0)) ** 2;
  const s2 = ss / dof;
  const standardErrors = inv.map((row, j) => Math.sqrt(Math.max(0, row[j]! * s2)) / scale[j]!);
  const t = studentTQuantile(0.5 + confidenceLevel / 2, dof);
  return {
    coefficients, standardErrors, intervals: coefficients.map((b, j) => [b - t * standardErrors[j]!, b + t * standardErrors[j]!]),
    residualStdDev: Math.sqrt(s2), degreesOfFreedom: dof,
  };
}
