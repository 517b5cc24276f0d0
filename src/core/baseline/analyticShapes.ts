/**
 * Analytic test shapes (evenly spaced grids, Gaussian bumps) used by the unit tests of the
 * baseline, peak and couple code. Pure helpers, no physics: physical checks use the simulator.
 */

/** n evenly spaced values from a to b inclusive. */
export function uniformGrid(n: number, a: number, b: number): Float64Array {
  return Float64Array.from({ length: n }, (_, k) => a + ((b - a) * k) / (n - 1));
}

/** exp(−((x − centre)/width)²). */
export function gaussianShape(x: number, centre: number, width: number): number {
  return Math.exp(-(((x - centre) / width) ** 2));
}
