/**
 * Least-squares polynomial on a symmetric window of equally spaced points: the pieces shared by
 * the convolution weights (savitzkyGolaySmooth.ts) and the sliding-moments filter
 * (slidingMomentsFilter.ts).
 * Source: A. Savitzky, M. J. E. Golay, Anal. Chem. 36 (1964) 1627–1639 (the least-squares fit of
 *   a polynomial of degree `order` to `window` points).
 * In: window (odd count of points), order, derivative order d, position s in samples from the
 *   centre. Abscissae are scaled to x = k/m ∈ [−1, 1] (m = (window − 1)/2), which keeps the normal
 *   matrix well conditioned for wide windows. Out: plain number arrays, no units.
 */
import { AnalysisError } from '../errors';

/** Solves the small dense system A x = b in place by Gaussian elimination with partial pivoting. */
export function solveSmall(a: number[][], b: number[]): number[] {
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

/** Normal matrix N[r][c] = Σ x^(r+c) over the window's scaled abscissae x = k/m, k = −m…m. */
export function windowNormalMatrix(window: number, order: number): number[][] {
  const m = (window - 1) / 2;
  const q = order + 1;
  const normal = Array.from({ length: q }, () => new Array<number>(q).fill(0));
  for (let k = -m; k <= m; k++) {
    const x = k / m;
    for (let r = 0; r < q; r++) for (let c = 0; c < q; c++) normal[r]![c]! += x ** (r + c);
  }
  return normal;
}

/**
 * Row of the d-th derivative (per sample) of the monomials x^0…x^order at `position` samples from
 * the centre: the fitted polynomial's d-th derivative there is this row times its coefficients.
 */
export function monomialDerivativeRow(window: number, order: number, derivative: number, position: number): number[] {
  const m = (window - 1) / 2;
  const xs = position / m;
  const row = new Array<number>(order + 1).fill(0);
  for (let r = derivative; r <= order; r++) {
    let f = 1;
    for (let t = 0; t < derivative; t++) f *= r - t;
    row[r] = (f * xs ** (r - derivative)) / m ** derivative;
  }
  return row;
}
