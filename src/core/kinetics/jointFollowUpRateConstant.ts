/**
 * One first-order rate constant k_f of a follow-up reaction (EC) from the return/forward ratios of
 * all the files of a scan-rate series at once, with its interval, or a bound when the ratios only
 * bound it.
 * In: per file the Nicholson (1966) ratio, |Eλ − E½| (V) and v (V/s); n, T; the uncertainty of one
 *   ratio. Out: k_f (1/s) or null, its interval, a lower or an upper bound, and λ of each file.
 * Source: R. S. Nicholson, I. Shain, Anal. Chem. 36 (1964) 706 (from memory): for a reversible E
 *   step the ratio depends on λ = k_f·RT/(nFv) only, and k_f is the same at every scan rate, so
 *   one k_f must explain the ratio rising towards 1 with v; working curves simulated as in
 *   followUpRateConstant.ts (followUpRatioCurve), extended to λ = 20.
 * Method (ours): least squares in the ratios over ln k_f (grid of 400 points, then a golden-section
 *   step); the interval holds every k_f whose sum of squares stays within SSR_min + 4σ², with σ the
 *   larger of the given ratio uncertainty and the residual scatter (the Δχ² = 4 profile interval
 *   of one parameter, about 95 %: common practice). Beyond λ ≈ 1 the ratio hardly moves (the
 *   return peak is nearly gone), so an interval that runs into that flat end has no upper limit:
 *   k_f is then reported as a lower bound only; one that runs into λ = 0.001 gives an upper bound.
 */
import { AnalysisError, assertFiniteInRange } from '../errors';
import { STANDARD_TEMPERATURE_K, inverseThermalVoltagePerV } from '../constants';
import { followUpRatioCurve } from './followUpRateConstant';

export interface FollowUpFile {
  ratio: number;
  switchPastHalfWaveV: number;
  scanRateVPerS: number;
}

export interface JointFollowUpOptions {
  /** @default 1 */
  electronCount?: number;
  /** @default 298.15 */
  temperatureK?: number;
  /** Standard uncertainty of one Nicholson ratio (baseline extrapolation, noise). @default 0.03 */
  ratioUncertainty?: number;
}

export interface JointFollowUpResult {
  /** Best k_f (1/s) when the interval is closed; null otherwise. */
  rateConstantPerS: number | null;
  /** Best-fitting k_f whatever the interval (1/s). */
  bestPerS: number;
  intervalPerS: [number, number] | null;
  lowerBoundPerS: number | null;
  upperBoundPerS: number | null;
  lambdas: number[];
}

/** Standard uncertainty of one Nicholson ratio (baseline extrapolation, noise; our estimate). */
export const FOLLOW_UP_RATIO_UNCERTAINTY = 0.03;

type Curve = { lambdas: number[]; ratios: number[] };

/** Ratio at λ, linear in ln λ between grid points, held at the ends. */
function ratioAt(c: Curve, lambda: number): number {
  const { lambdas: l, ratios: r } = c;
  if (lambda <= l[0]!) return r[0]!;
  for (let k = 1; k < l.length; k++) {
    if (lambda <= l[k]!) return r[k - 1]! + (Math.log(lambda / l[k - 1]!) / Math.log(l[k]! / l[k - 1]!)) * (r[k]! - r[k - 1]!);
  }
  return r[r.length - 1]!;
}

export function jointFollowUpRateConstant(files: FollowUpFile[], options: JointFollowUpOptions = {}): JointFollowUpResult {
  const n = options.electronCount ?? 1;
  const t = options.temperatureK ?? STANDARD_TEMPERATURE_K;
  const delta = options.ratioUncertainty ?? FOLLOW_UP_RATIO_UNCERTAINTY;
  if (!files.length) throw new AnalysisError('EMPTY_INPUT', 'a k_f fit over the series needs at least one file with a return/forward ratio');
  files.forEach((f, i) => {
    assertFiniteInRange(`ratio of file ${i}`, f.ratio, 0, 2);
    assertFiniteInRange(`scan rate of file ${i}`, f.scanRateVPerS, Number.MIN_VALUE);
  });
  const nf = n * inverseThermalVoltagePerV(t);
  const curves = files.map((f) => followUpRatioCurve((n * f.switchPastHalfWaveV * STANDARD_TEMPERATURE_K) / t));
  const lambdaOf = (k: number, i: number) => k / (nf * files[i]!.scanRateVPerS);
  const ssr = (lnK: number) => files.reduce((s, f, i) => s + (f.ratio - ratioAt(curves[i]!, lambdaOf(Math.exp(lnK), i))) ** 2, 0);
  const rates = files.map((f) => nf * f.scanRateVPerS);
  const lo = Math.log(0.001 * Math.min(...rates));
  const hi = Math.log(20 * Math.max(...rates));
  const grid = Array.from({ length: 400 }, (_, j) => lo + ((hi - lo) * j) / 399);
  const values = grid.map(ssr);
  let best = 0;
  for (let j = 1; j < grid.length; j++) if (values[j]! < values[best]!) best = j;
  const lnBest = refine(ssr, grid[Math.max(0, best - 1)]!, grid[Math.min(grid.length - 1, best + 1)]!);
  const ssrMin = Math.min(ssr(lnBest), values[best]!);
  const sigma2 = Math.max(delta * delta, ssrMin / Math.max(1, files.length - 1));
  const limit = ssrMin + 4 * sigma2;
  let a = best;
  let b = best;
  while (a > 0 && values[a - 1]! <= limit) a--;
  while (b < grid.length - 1 && values[b + 1]! <= limit) b++;
  const openLow = a === 0;
  const openHigh = b === grid.length - 1;
  const bestPerS = Math.exp(lnBest);
  const interval: [number, number] = [Math.exp(grid[a]!), Math.exp(grid[b]!)];
  return {
    rateConstantPerS: openLow || openHigh ? null : bestPerS,
    bestPerS,
    intervalPerS: openLow || openHigh ? null : interval,
    lowerBoundPerS: openHigh && !openLow ? interval[0] : null,
    upperBoundPerS: openLow && !openHigh ? interval[1] : null,
    lambdas: files.map((_, i) => lambdaOf(bestPerS, i)),
  };
}

/** Golden-section minimum of f on [a, b]. */
function refine(f: (x: number) => number, a: number, b: number): number {
  const g = (Math.sqrt(5) - 1) / 2;
  let c = b - g * (b - a);
  let d = a + g * (b - a);
  for (let k = 0; k < 40; k++) {
    if (f(c) < f(d)) b = d;
    else a = c;
    c = b - g * (b - a);
    d = a + g * (b - a);
  }
  return (a + b) / 2;
}
