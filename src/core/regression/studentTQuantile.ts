/**
 * Quantile of Student's t distribution, for confidence intervals of fitted lines.
 * In: a cumulative probability p in (0, 1) and the degrees of freedom ν > 0. Out: t such that
 *   P(T ≤ t) = p (a pure number).
 * Method: the t CDF is written with the regularized incomplete beta function,
 *   P(T ≤ t) = 1 − ½·I_{ν/(ν+t²)}(ν/2, ½) for t ≥ 0 (Abramowitz & Stegun, Handbook of
 *   Mathematical Functions (1964), eq. 26.7.1 with 26.5.27), and I_x(a, b) is evaluated by its
 *   continued fraction with the modified Lentz algorithm (Press, Teukolsky, Vetterling, Flannery,
 *   Numerical Recipes, 3rd ed. (2007), §6.4, "betacf"). ln Γ uses the Lanczos approximation
 *   (Numerical Recipes §6.1, g = 7, n = 9 coefficients). The CDF is inverted by bisection.
 * Difference from the sources: bisection instead of Newton steps, for robustness; 200 halvings
 *   give full double precision on any bracket used here.
 */
import { AnalysisError, assertFiniteInRange } from '../errors';

const LANCZOS = [
  0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059,
  12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6, 1.5056327351493116e-7,
];

/** Natural log of the gamma function for x > 0 (Lanczos, g = 7). */
export function logGamma(x: number): number {
  if (x < 0.5) return Math.log(Math.PI / Math.sin(Math.PI * x)) - logGamma(1 - x);
  const z = x - 1;
  let a = LANCZOS[0] as number;
  const t = z + 7.5;
  for (let i = 1; i < 9; i++) a += (LANCZOS[i] as number) / (z + i);
  return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(a);
}

/** Continued fraction of the incomplete beta function (Numerical Recipes §6.4, modified Lentz). */
function betaContinuedFraction(x: number, a: number, b: number): number {
  const tiny = 1e-300;
  let c = 1;
  let d = 1 - ((a + b) * x) / (a + 1);
  if (Math.abs(d) < tiny) d = tiny;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= 500; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((a + m2 - 1) * (a + m2));
    d = 1 + aa * d;
    d = Math.abs(d) < tiny ? 1 / tiny : 1 / d;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    h *= d * c;
    aa = (-(a + m) * (a + b + m) * x) / ((a + m2) * (a + m2 + 1));
    d = 1 + aa * d;
    d = Math.abs(d) < tiny ? 1 / tiny : 1 / d;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < 1e-15) return h;
  }
  throw new AnalysisError('NOT_CONVERGED', `incomplete beta continued fraction did not converge (x=${x}, a=${a}, b=${b})`);
}

/** Regularized incomplete beta function I_x(a, b) for 0 ≤ x ≤ 1, a, b > 0. */
export function regularizedIncompleteBeta(x: number, a: number, b: number): number {
  assertFiniteInRange('x', x, 0, 1);
  if (x === 0 || x === 1) return x;
  const lnFront = logGamma(a + b) - logGamma(a) - logGamma(b) + a * Math.log(x) + b * Math.log(1 - x);
  const front = Math.exp(lnFront);
  // Use the continued fraction where it converges fast, the symmetry relation elsewhere.
  if (x < (a + 1) / (a + b + 2)) return (front * betaContinuedFraction(x, a, b)) / a;
  return 1 - (front * betaContinuedFraction(1 - x, b, a)) / b;
}

/** Cumulative distribution P(T ≤ t) of Student's t with ν degrees of freedom. */
export function studentTCdf(t: number, degreesOfFreedom: number): number {
  assertFiniteInRange('degreesOfFreedom', degreesOfFreedom, Number.MIN_VALUE);
  if (Number.isNaN(t)) throw new AnalysisError('NON_FINITE', 't must be a number');
  if (!Number.isFinite(t)) return t > 0 ? 1 : 0;
  const nu = degreesOfFreedom;
  const tail = 0.5 * regularizedIncompleteBeta(nu / (nu + t * t), nu / 2, 0.5);
  return t >= 0 ? 1 - tail : tail;
}

/** t such that P(T ≤ t) = p for Student's t with ν degrees of freedom. */
export function studentTQuantile(p: number, degreesOfFreedom: number): number {
  assertFiniteInRange('p', p, 0, 1);
  if (p <= 0 || p >= 1) throw new AnalysisError('OUT_OF_RANGE', `p must lie strictly between 0 and 1, got ${p}`);
  if (p === 0.5) return 0;
  if (p < 0.5) return -studentTQuantile(1 - p, degreesOfFreedom);
  let lo = 0;
  let hi = 1;
  while (studentTCdf(hi, degreesOfFreedom) < p) {
    hi *= 2;
    if (hi > 1e300) throw new AnalysisError('NOT_CONVERGED', `t quantile for p=${p}, ν=${degreesOfFreedom} is unbounded`);
  }
  for (let i = 0; i < 200 && hi - lo > 1e-15 * hi; i++) {
    const mid = 0.5 * (lo + hi);
    if (studentTCdf(mid, degreesOfFreedom) < p) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
