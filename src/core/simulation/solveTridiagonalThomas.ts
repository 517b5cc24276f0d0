/**
 * Thomas algorithm (Gaussian elimination without pivoting) for the tridiagonal systems of the
 * diffusion simulation, run from the bulk side towards the electrode so that the unknown surface
 * flux can stay a free parameter until the electrode boundary condition fixes it.
 * Source: L. H. Thomas (1949), as presented in D. Britz, T. Strutwolf, "Digital Simulation in
 *   Electrochemistry", 4th ed., Springer (2016), section on the Thomas algorithm ("u–v" form
 *   run in reverse, from memory).
 * System (i = 0 … N−1): a_i c_{i−1} + b_i c_i + d_i c_{i+1} = r_i, a_0 = 0, c_N folded into r.
 * Elimination gives c_i = u_i + w_i c_{i−1}; w depends only on the matrix and is factored once.
 * Stability: the matrices here are strictly diagonally dominant, so no pivoting is needed.
 */

/** Matrix-only part of the elimination; build once per time-step size. */
export interface ThomasFactor {
  lower: Float64Array;
  upper: Float64Array;
  /** 1 / (b_i + d_i w_{i+1}). */
  inverseDenominator: Float64Array;
  /** Multipliers w_i = −a_i / (b_i + d_i w_{i+1}); w_0 = 0. */
  w: Float64Array;
}

export function factorThomasFromBulkSide(lower: Float64Array, diagonal: Float64Array, upper: Float64Array): ThomasFactor {
  const n = diagonal.length;
  const inverseDenominator = new Float64Array(n);
  const w = new Float64Array(n);
  let wNext = 0;
  for (let i = n - 1; i >= 0; i--) {
    const den = (diagonal[i] as number) + (i === n - 1 ? 0 : (upper[i] as number) * wNext);
    inverseDenominator[i] = 1 / den;
    wNext = i === 0 ? 0 : -(lower[i] as number) / den;
    w[i] = wNext;
  }
  return { lower: lower.slice(), upper: upper.slice(), inverseDenominator, w };
}

/**
 * Forward elimination of a right-hand side. Fills `u` and returns u_0, the surface value the
 * solution would have if no flux term were added to r_0. Adding q to r_0 changes c_0 by
 * q·inverseDenominator[0].
 */
export function eliminateFromBulkSide(f: ThomasFactor, rhs: Float64Array, u: Float64Array): number {
  const n = rhs.length;
  let uNext = 0;
  for (let i = n - 1; i >= 0; i--) {
    const carry = i === n - 1 ? 0 : (f.upper[i] as number) * uNext;
    uNext = ((rhs[i] as number) - carry) * (f.inverseDenominator[i] as number);
    u[i] = uNext;
  }
  return uNext;
}

/** Back substitution from the now-known surface value c_0; writes c_0 … c_{N−1} into `out`. */
export function substituteTowardsBulk(f: ThomasFactor, u: Float64Array, surfaceValue: number, out: Float64Array): void {
  let prev = surfaceValue;
  out[0] = prev;
  for (let i = 1; i < u.length; i++) {
    prev = (u[i] as number) + (f.w[i] as number) * prev;
    out[i] = prev;
  }
}

/** Solves the whole system in one call (no free flux); used in tests and by simple callers. */
export function solveTridiagonalThomas(lower: Float64Array, diagonal: Float64Array, upper: Float64Array, rhs: Float64Array): Float64Array {
  const f = factorThomasFromBulkSide(lower, diagonal, upper);
  const u = new Float64Array(rhs.length);
  const out = new Float64Array(rhs.length);
  substituteTowardsBulk(f, u, eliminateFromBulkSide(f, rhs, u), out);
  return out;
}
