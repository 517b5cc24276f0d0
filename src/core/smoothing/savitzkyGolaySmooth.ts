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
 * Difference from the source (edge handling): the paper defines no value for the first and last
 *   (window−1)/2 points. Here those points take the value of the same-degree polynomial fitted to
 *   the first (or last) `window` points, evaluated at the point itself (an off-centre fit). So a
 *   polynomial of degree ≤ order is reproduced exactly everywhere, including the ends.
 * The input is never modified; a new array is returned.
 */
import { AnalysisError } from '../errors';

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

/** Solves the small dense system A x = b in place by Gaussian elimination with partial pivoting. */
function solveSmall(a: number[][], b: number[]): number[] {
  const n = b.length;
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(a[r]![c]!) > Math.abs(a[p]![c]!)) p = r;
    [a[c], a[p]] = [a[p]!, a[c]!];
    [b[c], b[p]] = [b[p]!, b[c]!];
    const pivot = a[c]![c]!;
    if (pivot === 0) throw new AnalysisError('BAD_OPTION', 'Savitzky–Golay normal matrix is singular');
    for (let r = c + 1; r < n; r++) {
      const f = a[r]![c]! / pivot;
      for (let k = c; k < n; k++) a[r]![k]! -= f * a[c]![k]!;
      b[r]! -= f * b[c]!;
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let s = b[r]!;
    for (let k = r + 1; k < n; k++) s -= a[r]![k]! * x[k]!;
    x[r] = s / a[r]![r]!;
  }
  return x;
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
  // Abscissae scaled to [−1, 1] keep the normal matrix well conditioned for wide windows.
  const scale = m;
  const q = order + 1;
  const normal = Array.from({ length: q }, () => new Array<number>(q).fill(0));
  for (let k = -m; k <= m; k++) {
    const x = k / scale;
    for (let r = 0; r < q; r++) for (let c = 0; c < q; c++) normal[r]![c]! += x ** (r + c);
  }
  // Row vector of the d-th derivative of the monomials at s, in scaled units.
  const xs = s / scale;
  const basis = new Array<number>(q).fill(0);
  for (let r = d; r < q; r++) {
    let f = 1;
    for (let t = 0; t < d; t++) f *= r - t;
    basis[r] = (f * xs ** (r - d)) / scale ** d;
  }
  const w = solveSmall(normal, basis);
  const out = new Float64Array(window);
  for (let j = 0; j < window; j++) {
    const x = (j - m) / scale;
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

function applyFilter(y: ArrayLike<number>, window: number, order: number, derivative: number): Float64Array {
  const n = y.length;
  const out = new Float64Array(n);
  if (n === 0) return out;
  if (n < window) {
    throw new AnalysisError('TOO_FEW_POINTS', `Savitzky–Golay window ${window} is longer than the ${n}-point signal`);
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

/** Smoothed copy of `y`. */
export function savitzkyGolaySmooth(y: ArrayLike<number>, options: SavitzkyGolayOptions = {}): Float64Array {
  const window = options.window ?? 5;
  const order = options.order ?? 2;
  checkWindow(window, order);
  return applyFilter(y, window, order, 0);
}

/** First derivative dy/dx of `y` sampled every `spacing` units of x. */
export function savitzkyGolayDerivative(y: ArrayLike<number>, options: SavitzkyGolayDerivativeOptions = {}): Float64Array {
  const window = options.window ?? 5;
  const order = options.order ?? 2;
  const spacing = options.spacing ?? 1;
  checkWindow(window, order);
  if (order < 1) throw new AnalysisError('BAD_OPTION', 'a derivative needs smoothing order ≥ 1');
  if (!Number.isFinite(spacing) || spacing === 0) {
    throw new AnalysisError('BAD_OPTION', `derivative spacing must be finite and non-zero, got ${spacing}`);
  }
  const out = applyFilter(y, window, order, 1);
  for (let i = 0; i < out.length; i++) out[i]! /= spacing;
  return out;
}
