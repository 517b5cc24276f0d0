/**
 * Residual evaluations for the least-squares iteration: counts them, checks for cancel before
 * each one, turns a refused parameter set into NaN, and builds the forward-difference Jacobian
 * (one evaluation per parameter; a backward step at an upper limit or where the forward one is
 * refused). Common practice, no source.
 */
import { AnalysisError } from '../errors';
import { dot, type Columns } from './leastSquaresAlgebra';
import type { LeastSquaresProblem } from './levenbergMarquardt';

/** Counts evaluations and checks for cancel before each. */
export class Evaluator {
  count = 0;
  constructor(private readonly problem: LeastSquaresProblem, private readonly signal: { readonly aborted: boolean } | undefined) {}

  /** S(u), or NaN when the model refuses u. */
  run(u: Float64Array, out: Float64Array): number {
    if (this.signal?.aborted) throw new AnalysisError('CANCELLED', `fit cancelled after ${this.count} evaluations`);
    this.count++;
    try {
      this.problem.residuals(u, out);
    } catch (err) {
      if (err instanceof AnalysisError && err.code !== 'CANCELLED') return Number.NaN;
      throw err;
    }
    return dot(out, out);
  }

  /** Forward-difference Jacobian ∂r/∂u at u (r0 = r(u)); backwards at an upper limit or where forward is refused. */
  jacobian(u: Float64Array, r0: Float64Array, columns: Columns): void {
    const work = u.slice();
    for (let j = 0; j < u.length; j++) {
      const col = columns[j] as Float64Array;
      let h = this.problem.stepSizes[j] as number;
      if ((u[j] as number) + h > (this.problem.upper[j] as number)) h = -h;
      work[j] = (u[j] as number) + h;
      if (Number.isNaN(this.run(work, col))) {
        h = -h;
        work[j] = (u[j] as number) + h;
        if (Number.isNaN(this.run(work, col))) throw new AnalysisError('NOT_CONVERGED', `the model cannot be evaluated next to parameter ${j} = ${u[j]}`);
      }
      for (let i = 0; i < col.length; i++) col[i] = ((col[i] as number) - (r0[i] as number)) / h;
      work[j] = u[j] as number;
    }
  }
}
