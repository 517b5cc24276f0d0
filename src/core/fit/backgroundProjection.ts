/**
 * Straight background a + b·E per voltammogram, solved in closed form at every evaluation and
 * projected out of the residuals (variable projection), so the nonlinear iteration never
 * carries the 2 × (voltammograms) linear parameters.
 * Source: G. H. Golub, V. Pereyra, "The differentiation of pseudo-inverses and nonlinear least
 *   squares problems whose variables separate", SIAM J. Numer. Anal. 10 (1973) 413 (from memory).
 *   The basis {1, E} does not depend on the nonlinear parameters, so the projected residual
 *   P⊥(y − f(θ)) and its Jacobian −P⊥·∂f/∂θ are exact, and the covariance of θ from the projected
 *   Jacobian equals the one of the full problem.
 * In: residuals (A) concatenated over records; each record's potentials (V). Out: the residuals
 *   with each record's least-squares line removed (in place); the lines, A and A/V.
 */
import type { PreparedRecord } from './fitRecords';

export interface StraightLine {
  offsetA: number;
  slopeAPerV: number;
}

export function projectOutBackground(records: readonly PreparedRecord[], residuals: Float64Array): StraightLine[] {
  return records.map((r) => {
    const e = r.potentialV;
    const n = e.length;
    let meanE = 0;
    let meanR = 0;
    for (let i = 0; i < n; i++) {
      meanE += e[i] as number;
      meanR += residuals[r.offset + i] as number;
    }
    meanE /= n;
    meanR /= n;
    let sxx = 0;
    let sxr = 0;
    for (let i = 0; i < n; i++) {
      const dx = (e[i] as number) - meanE;
      sxx += dx * dx;
      sxr += dx * ((residuals[r.offset + i] as number) - meanR);
    }
    const slope = sxx > 0 ? sxr / sxx : 0;
    for (let i = 0; i < n; i++) residuals[r.offset + i] = (residuals[r.offset + i] as number) - meanR - slope * ((e[i] as number) - meanE);
    return { offsetA: meanR - slope * meanE, slopeAPerV: slope };
  });
}
