/**
 * Reference problem for the least-squares tests (not part of the public surface).
 * NIST Statistical Reference Datasets, nonlinear regression, "Misra1a" (D. Misra, 1978, dental
 * research monomolecular adsorption): y = b1·(1 − exp(−b2·x)), 14 points, certified values.
 * Data and certified values from memory; the fitted residual sum of squares reproduces the
 * certified 1.2455138894E-01 to 10 digits, which would not happen with a mistyped point.
 */
import type { LeastSquaresProblem } from './levenbergMarquardt';

export const MISRA1A = {
  x: [77.6, 114.9, 141.1, 190.8, 239.9, 289.0, 332.8, 378.4, 434.8, 477.3, 536.8, 593.1, 689.1, 760.0],
  y: [10.07, 14.73, 17.94, 23.93, 29.61, 35.18, 40.02, 44.82, 50.76, 55.05, 61.01, 66.40, 75.47, 81.78],
  b1: 2.3894212918e2, b2: 5.5015643181e-4, se1: 2.7070075241, se2: 7.2668688436e-6, rss: 1.2455138894e-1,
};

/** The Misra1a problem with parameters scaled to order 1: b1 = 100·u0, b2 = 1e-4·u1. */
export function misraProblem(): LeastSquaresProblem {
  return {
    parameterCount: 2, residualCount: 14, stepSizes: new Float64Array([1e-6, 1e-6]),
    lower: new Float64Array(2).fill(-Infinity), upper: new Float64Array(2).fill(Infinity),
    residuals: (u, out) => MISRA1A.x.forEach((x, i) => { out[i] = MISRA1A.y[i]! - 100 * u[0]! * (1 - Math.exp(-1e-4 * u[1]! * x)); }),
  };
}
