/**
 * Savitzky–Golay smoothing and first derivative of an evenly spaced signal.
 * Source: A. Savitzky, M. J. E. Golay, "Smoothing and differentiation of data by simplified least
 *   squares procedures", Anal. Chem. 36 (1964) 1627–1639; corrections to their tables by
 *   J. Steinier, Y. Termonia, J. Deltour, Anal. Chem. 44 (1972) 1906.
 * In: samples y[k] taken at equal steps (any unit). Out: same length; the smoothed signal in the
 *   unit of y, or dy/dk divided by `spacing` for the derivative.
 * Method: the convolution weights are computed here by least squares (a polynomial of degree
 *   `order` fitted to `window` equally spaced points, weights = row of the pseudo-inverse of the
 *   Vandermonde matrix), so any odd window and any order < window work, not just the tabulated ones.
 *   Windows wider than 101 points (order ≤ 4) use the same fit through sliding power moments
 *   (slidingMomentsFilter.ts), so a finely sampled million-point trace costs O(n), not O(n·window).
 * Difference from the source (edge handling): the paper defines no value for the first and last
 *   (window−1)/2 points. Here those points take the value of the same-degree polynomial fitted to
 *   the first (or last) `window` points, evaluated at the point itself (an off-centre fit). So a
 *   polynomial of degree ≤ order is reproduced exactly everywhere, including the ends.
 * The input is never modified; a new array is returned.
 */
import { AnalysisError } from '../errors';
import { monomialDerivativeRow, solveSmall, windowNormalMatrix } from './polynomialWindowFit';
import { filterBySlidingMoments, MAX_MOMENT_ORDER } from './slidingMomentsFilter';

export interface SavitzkyGolayOptions {
  /** Odd number of points in the moving window. @default 5 */
  window?: number;
  /** Degree of the fitted polynomial, smaller than `window`. @default 2 */
  order?: number;
}

export interface SavitzkyGolayDerivativeOptions extends SavitzkyGolayOptions {
  /** Step between samples, in the unit of the abscissa; the result is dy/dx. @default 1 */
  spacing?: number;
}

export interface SavitzkyGolayCoefficientOptions {
  /** Derivative order of the estimate (0 = smoothed value, 1 = slope per sample). @default 0 */
  derivative?: number;
  /** Where in the window to evaluate, in samples from the centre (−m…m). @default 0 */
  position?: number;
}

function checkWindow(window: number, order: number): void {
  if (!Number.isInteger(window) || window < 3 || window % 2 === 0) {
    throw new AnalysisError('BAD_OPTION', `smoothing window must be an odd integer ≥ 3, got ${window}`);
  }
  if (!Number.isInteger(order) || order < 0 || order >= window) {
    throw new AnalysisError('BAD_OPTION', `smoothing order must be an integer in [0, ${window - 1}], got ${order}`);
  }
}

/**
 * Convolution weights c[j], j = 0…window−1, such that Σ c[j]·y[centre − m + j] estimates the
 * `derivative`-th derivative (per sample) at `position` samples from the centre.
 */
export function savitzkyGolayCoefficients(
  window: number,
  order: number,
  options: SavitzkyGolayCoefficientOptions = {},
): Float64Array {
  checkWindow(window, order);
  const d = options.derivative ?? 0;
  const s = options.position ?? 0;
  const m = (window - 1) / 2;
  const q = order + 1;
  const w = solveSmall(windowNormalMatrix(window, order), monomialDerivativeRow(window, order, d, s));
  const out = new Float64Array(window);
  for (let j = 0; j < window; j++) {
    const x = (j - m) / m;
    let v = 0;
    for (let r = 0; r < q; r++) v += w[r]! * x ** r;
    out[j] = v;
  }
  return out;
}

/** Weights depend only on (window, order, derivative, position): computed once, then reused. */
const weightCache = new Map<string, Float64Array>();

function cachedCoefficients(window: number, order: number, derivative: number, position: number): Float64Array {
  const key = `${window}/${order}/${derivative}/${position}`;
  let w = weightCache.get(key);
  if (!w) {
    w = savitzkyGolayCoefficients(window, order, { derivative, position });
    if (weightCache.size > 4096) weightCache.clear();
    weightCache.set(key, w);
  }
  return w;
}

/**
 * Widest window filtered by direct convolution. Wider windows (finely sampled sweeps: 15 mV at
 * 1 µV steps is 15,001 points) go through the sliding moments, whose cost does not grow with the
 * window; below this the convolution is as fast and keeps results bit for bit as before.
 */
const DIRECT_MAX_WINDOW = 101;

function applyFilter(y: ArrayLike<number>, window: number, order: number, derivative: number, into?: Float64Array): Float64Array {
  const n = y.length;
  if (into && into.length !== n) throw new AnalysisError('LENGTH_MISMATCH', `Savitzky–Golay output holds ${into.length} points, the signal ${n}`);
  const out = into ?? new Float64Array(n);
  if (n === 0) return out;
  if (n < window) {
    throw new AnalysisError('TOO_FEW_POINTS', `Savitzky–Golay window ${window} is longer than the ${n}-point signal`);
  }
  if (window > DIRECT_MAX_WINDOW && order <= MAX_MOMENT_ORDER) {
    const moved = filterBySlidingMoments(y, window, order, derivative);
    if (!into) return moved;
    into.set(moved);
    return into;
  }
  const m = (window - 1) / 2;
  const centre = cachedCoefficients(window, order, derivative, 0);
  for (let i = m; i < n - m; i++) {
    let v = 0;
    for (let j = 0; j < window; j++) v += centre[j]! * (y[i - m + j] as number);
    out[i] = v;
  }
  for (let e = 0; e < m; e++) {
    const left = cachedCoefficients(window, order, derivative, e - m);
    const right = cachedCoefficients(window, order, derivative, m - e);
    let a = 0;
    let b = 0;
    for (let j = 0; j < window; j++) {
      a += left[j]! * (y[j] as number);
      b += right[j]! * (y[n - window + j] as number);
    }
    out[e] = a;
    out[n - 1 - e] = b;
  }
  return out;
}

/**
 * Smoothed copy of `y`; written into `into` (as long as `y`, and not `y` itself) when given,
 * which spares a new array (why: ../scratch.ts).
 */
export function savitzkyGolaySmooth(y: ArrayLike<number>, options: SavitzkyGolayOptions = {}, into?: Float64Array): Float64Array {
  const window = options.window ?? 5;
  const order = options.order ?? 2;
  checkWindow(window, order);
  return applyFilter(y, window, order, 0, into);
}

/** First derivative dy/dx of `y` sampled every `spacing` units of x; written into `into` when given, as savitzkyGolaySmooth. */
export function savitzkyGolayDerivative(y: ArrayLike<number>, options: SavitzkyGolayDerivativeOptions = {}, into?: Float64Array): Float64Array {
  const window = options.window ?? 5;
  const order = options.order ?? 2;
  const spacing = options.spacing ?? 1;
  checkWindow(window, order);
  if (order < 1) throw new AnalysisError('BAD_OPTION', 'a derivative needs smoothing order ≥ 1');
  if (!Number.isFinite(spacing) || spacing === 0) {
    throw new AnalysisError('BAD_OPTION', `derivative spacing must be finite and non-zero, got ${spacing}`);
  }
  const out = applyFilter(y, window, order, 1, into);
  for (let i = 0; i < out.length; i++) out[i]! /= spacing;
  return out;
}
