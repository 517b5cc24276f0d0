/**
 * Linearised (Wald) uncertainty of least-squares estimates: covariance s²(JᵀJ)⁻¹ with
 * s² = S/(m − p − q) estimated from the residuals, standard errors, the correlation matrix and
 * the two-sided Student-t quantile for the intervals.
 * Source: D. M. Bates, D. G. Watts, Nonlinear Regression Analysis and Its Applications, Wiley
 *   (1988), §2.3.1 (approximate inference regions, from memory).
 * In: the Jacobian ∂r/∂θ at the optimum as p columns (θ in the coordinates the errors are wanted
 *   in), S in A², the residual count m, q parameters solved outside the Jacobian (a projected-out
 *   linear background). Out: see LinearizedCovariance.
 * Difference from the source: JᵀJ is scaled to unit diagonal and inverted through its
 *   eigen-decomposition; a parameter with weight in a direction whose eigenvalue is below
 *   1e-10 of the largest (no information in the data) is reported undetermined (standard error
 *   Infinity) instead of a number from a near-singular inverse.
 */
import { AnalysisError } from '../errors';
import { studentTQuantile } from '../regression/studentTQuantile';
import { normalEquations, symmetricEigen, type Columns } from './leastSquaresAlgebra';

export interface LinearizedCovarianceOptions {
  /** Parameters fitted outside the Jacobian (counted in the degrees of freedom). @default 0 */
  extraParameters?: number;
  /** Two-sided confidence level of the t quantile. @default 0.95 */
  confidence?: number;
}

export interface LinearizedCovariance {
  degreesOfFreedom: number;
  /** Residual standard deviation s, A. */
  residualStdA: number;
  standardErrors: number[];
  /** ρ_ij; null where a standard error is not finite. */
  correlation: (number | null)[][];
  covariance: number[][];
  /** True for a parameter the data do not determine. */
  undetermined: boolean[];
  /** t quantile for the chosen two-sided confidence. */
  tQuantile: number;
}

const NULL_EIGENVALUE = 1e-10;
const NULL_WEIGHT = 0.1;

export function linearizedCovariance(jacobian: Columns, costA2: number, options: LinearizedCovarianceOptions = {}): LinearizedCovariance {
  const p = jacobian.length;
  const m = jacobian[0]?.length ?? 0;
  const dof = m - p - (options.extraParameters ?? 0);
  if (!(dof > 0)) throw new AnalysisError('TOO_FEW_POINTS', `${m} residuals leave no degrees of freedom for ${p} parameters`);
  const s2 = costA2 / dof;
  const { a } = normalEquations(jacobian, new Float64Array(m));
  const scale = a.map((row, i) => Math.sqrt(row[i] as number));
  const scaled = a.map((row, i) => row.map((v, j) => (scale[i]! > 0 && scale[j]! > 0 ? v / (scale[i]! * scale[j]!) : i === j ? 1 : 0)));
  const { values, vectors } = symmetricEigen(scaled);
  const largest = Math.max(...values);
  const undetermined = scale.map((s) => !(s > 0));
  const inverse = scaled.map(() => new Array<number>(p).fill(0));
  values.forEach((lambda, k) => {
    const v = vectors.map((row) => row[k] as number);
    if (lambda < NULL_EIGENVALUE * largest) {
      v.forEach((vi, i) => { if (Math.abs(vi) > NULL_WEIGHT) undetermined[i] = true; });
      return;
    }
    for (let i = 0; i < p; i++) for (let j = 0; j < p; j++) inverse[i]![j]! += (v[i]! * v[j]!) / lambda;
  });
  const covariance = inverse.map((row, i) => row.map((v, j) => (undetermined[i] || undetermined[j] ? (i === j ? Infinity : 0) : (s2 * v) / (scale[i]! * scale[j]!))));
  const standardErrors = covariance.map((row, i) => Math.sqrt(row[i] as number));
  const correlation = covariance.map((row, i) => row.map((c, j) => (undetermined[i] || undetermined[j] ? (i === j ? 1 : null) : c / (standardErrors[i]! * standardErrors[j]!))));
  const confidence = options.confidence ?? 0.95;
  return { degreesOfFreedom: dof, residualStdA: Math.sqrt(s2), standardErrors, correlation, covariance, undetermined, tQuantile: studentTQuantile(0.5 + confidence / 2, dof) };
}
