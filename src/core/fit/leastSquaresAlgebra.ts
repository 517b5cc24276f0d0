/**
 * Small dense pieces shared by the Levenberg–Marquardt iteration and the error analysis: the
 * normal equations JᵀJ and Jᵀr from a Jacobian stored as columns, a damped solve, and the
 * symmetric eigen-decomposition used for a covariance that survives a rank-deficient JᵀJ.
 * The p × p algebra uses ml-matrix (Cholesky, symmetric eigenvalue decomposition); the m × p
 * products are plain loops over typed arrays, since m (thousands of points) ≫ p (a few parameters).
 * Source: the normal equations of linear least squares (D. M. Bates, D. G. Watts, Nonlinear
 *   Regression Analysis and Its Applications, Wiley (1988), §1.1 and §2.1, from memory).
 */
import { CholeskyDecomposition, EigenvalueDecomposition, Matrix } from 'ml-matrix';

/** A Jacobian (or any m × p matrix) as p columns of length m. */
export type Columns = Float64Array[];

export function dot(a: Float64Array, b: Float64Array): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += (a[i] as number) * (b[i] as number);
  return s;
}

/** A = JᵀJ (p × p) and g = Jᵀr (p). */
export function normalEquations(jacobian: Columns, residuals: Float64Array): { a: number[][]; g: number[] } {
  const p = jacobian.length;
  const a = Array.from({ length: p }, () => new Array<number>(p).fill(0));
  const g = new Array<number>(p).fill(0);
  for (let i = 0; i < p; i++) {
    const ci = jacobian[i] as Float64Array;
    g[i] = dot(ci, residuals);
    for (let j = 0; j <= i; j++) {
      const v = dot(ci, jacobian[j] as Float64Array);
      (a[i] as number[])[j] = v;
      (a[j] as number[])[i] = v;
    }
  }
  return { a, g };
}

/**
 * Solves (A + λ·D) x = b with D = diag(A) floored at 1e-12 of its largest entry (Marquardt's
 * scaling); null when the matrix is not positive definite.
 */
export function solveDamped(a: number[][], b: number[], lambda: number): number[] | null {
  const p = b.length;
  const m = new Matrix(a.map((row) => row.slice()));
  for (let i = 0; i < p; i++) m.set(i, i, ((a[i] as number[])[i] as number) + lambda * dampingWeight(a, i));
  const chol = new CholeskyDecomposition(m);
  if (!chol.isPositiveDefinite()) return null;
  const x = chol.solve(Matrix.columnVector(b)).getColumn(0);
  return x.every(Number.isFinite) ? x : null;
}

/** Marquardt's scaling D_ii = (JᵀJ)_ii, floored at 1e-12 of the largest diagonal entry. */
export function dampingWeight(a: number[][], i: number): number {
  let largest = Number.MIN_VALUE;
  for (let k = 0; k < a.length; k++) largest = Math.max(largest, (a[k] as number[])[k] as number);
  return Math.max((a[i] as number[])[i] as number, 1e-12 * largest);
}

/** Eigenvalues (ascending) and eigenvectors (columns) of a symmetric matrix. */
export function symmetricEigen(a: number[][]): { values: number[]; vectors: number[][] } {
  const evd = new EigenvalueDecomposition(new Matrix(a), { assumeSymmetric: true });
  const vectors = evd.eigenvectorMatrix.to2DArray();
  return { values: evd.realEigenvalues, vectors };
}
