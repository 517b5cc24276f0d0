/**
 * Straight-line least-squares fit y = slope·x + intercept, with standard errors, R² and
 * confidence intervals of slope and intercept.
 * In: x and y of equal length (any units; the slope carries unit(y)/unit(x)); optional weights
 *   (inverse variances, relative values suffice). Out: FitLineResult.
 * Source: ordinary and weighted least squares as in N. R. Draper, H. Smith, Applied Regression
 *   Analysis, 3rd ed. (Wiley, 1998), ch. 1 (standard errors, eqs. 1.4.x) and ch. 9 (weights);
 *   confidence intervals with Student's t quantile (see studentTQuantile.ts).
 * Differences: with `throughOrigin` the intercept is fixed at 0 and R² is the uncentred
 *   R² = 1 − SSres/Σw·y², the usual definition for a model without a constant term.
 *   With weights, standard errors use the residual variance estimated from the data (weights are
 *   treated as relative), as in Draper & Smith ch. 9.
 */
import { AnalysisError, assertSameLength } from '../errors';
import { studentTQuantile } from './studentTQuantile';

export interface FitLineOptions {
  /** Fix the intercept at zero. @default false */
  throughOrigin?: boolean;
  /** Relative weights (e.g. 1/σ²), one per point, all > 0. @default equal weights */
  weights?: ArrayLike<number> | null;
  /** Two-sided confidence level of the intervals, in (0, 1). @default 0.95 */
  confidenceLevel?: number;
}

export interface FitLineResult {
  slope: number;
  intercept: number;
  /** Standard error of the slope; null when no degree of freedom is left. */
  slopeStdError: number | null;
  /** Standard error of the intercept; 0 when fixed through the origin, null without dof. */
  interceptStdError: number | null;
  /** [low, high] of the slope at `confidenceLevel`; null without dof. */
  slopeInterval: [number, number] | null;
  interceptInterval: [number, number] | null;
  /** Coefficient of determination (uncentred when through the origin). NaN if y is constant. */
  r2: number;
  /** Residual standard deviation (unit of y); null without dof. */
  residualStdDev: number | null;
  pointCount: number;
  degreesOfFreedom: number;
  confidenceLevel: number;
  /** The t quantile used for the intervals; null without dof. */
  tQuantile: number | null;
}

interface Sums {
  sw: number;
  mx: number;
  my: number;
  sxx: number;
  sxy: number;
  syy: number;
}

function weightedSums(x: ArrayLike<number>, y: ArrayLike<number>, w: ArrayLike<number> | null, centred: boolean): Sums {
  const n = x.length;
  let sw = 0;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    const wi = w ? (w[i] as number) : 1;
    sw += wi;
    mx += wi * (x[i] as number);
    my += wi * (y[i] as number);
  }
  mx = centred ? mx / sw : 0;
  my = centred ? my / sw : 0;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const wi = w ? (w[i] as number) : 1;
    const dx = (x[i] as number) - mx;
    const dy = (y[i] as number) - my;
    sxx += wi * dx * dx;
    sxy += wi * dx * dy;
    syy += wi * dy * dy;
  }
  return { sw, mx, my, sxx, sxy, syy };
}

/**
 * Σw·(y − ŷ)² from the residuals themselves. The shortcut Syy − b·Sxy subtracts two nearly equal
 * numbers when the fit is close and y is large against its scatter, and loses every digit.
 */
function residualSumOfSquares(x: ArrayLike<number>, y: ArrayLike<number>, w: ArrayLike<number> | null, slope: number, intercept: number): number {
  let ss = 0;
  for (let i = 0; i < x.length; i++) {
    const r = (y[i] as number) - (slope * (x[i] as number) + intercept);
    ss += (w ? (w[i] as number) : 1) * r * r;
  }
  return ss;
}

function checkInput(x: ArrayLike<number>, y: ArrayLike<number>, options: FitLineOptions): void {
  const minPoints = options.throughOrigin ? 1 : 2;
  assertSameLength({ x, y }, minPoints);
  if (options.weights) assertSameLength({ x, weights: options.weights });
  for (let i = 0; i < x.length; i++) {
    if (!Number.isFinite(x[i]) || !Number.isFinite(y[i])) {
      throw new AnalysisError('NON_FINITE', `fitLine: point ${i} is not finite (x=${String(x[i])}, y=${String(y[i])})`);
    }
    const wi = options.weights ? (options.weights[i] as number) : 1;
    if (!(wi > 0) || !Number.isFinite(wi)) throw new AnalysisError('BAD_OPTION', `fitLine: weight ${i} must be > 0, got ${wi}`);
  }
  const level = options.confidenceLevel ?? 0.95;
  if (!(level > 0 && level < 1)) throw new AnalysisError('BAD_OPTION', `confidenceLevel must lie in (0, 1), got ${level}`);
}

export function fitLine(x: ArrayLike<number>, y: ArrayLike<number>, options: FitLineOptions = {}): FitLineResult {
  checkInput(x, y, options);
  const origin = options.throughOrigin ?? false;
  const level = options.confidenceLevel ?? 0.95;
  const n = x.length;
  const s = weightedSums(x, y, options.weights ?? null, !origin);
  if (!(s.sxx > 0)) throw new AnalysisError('OUT_OF_RANGE', 'fitLine: all x values are equal, so no slope can be fitted');
  const slope = s.sxy / s.sxx;
  const intercept = origin ? 0 : s.my - slope * s.mx;
  const ssRes = residualSumOfSquares(x, y, options.weights ?? null, slope, intercept);
  const dof = n - (origin ? 1 : 2);
  const r2 = s.syy > 0 ? 1 - ssRes / s.syy : Number.NaN;
  if (dof < 1) {
    return {
      slope, intercept, slopeStdError: null, interceptStdError: origin ? 0 : null, slopeInterval: null,
      interceptInterval: origin ? [0, 0] : null, r2, residualStdDev: null, pointCount: n, degreesOfFreedom: dof,
      confidenceLevel: level, tQuantile: null,
    };
  }
  const variance = ssRes / dof;
  const slopeSe = Math.sqrt(variance / s.sxx);
  const interceptSe = origin ? 0 : Math.sqrt(variance * (1 / s.sw + (s.mx * s.mx) / s.sxx));
  const t = studentTQuantile(0.5 + level / 2, dof);
  return {
    slope,
    intercept,
    slopeStdError: slopeSe,
    interceptStdError: interceptSe,
    slopeInterval: [slope - t * slopeSe, slope + t * slopeSe],
    interceptInterval: [intercept - t * interceptSe, intercept + t * interceptSe],
    r2,
    residualStdDev: Math.sqrt(variance),
    pointCount: n,
    degreesOfFreedom: dof,
    confidenceLevel: level,
    tQuantile: t,
  };
}
