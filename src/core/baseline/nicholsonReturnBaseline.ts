/**
 * Baseline for the return peak by Nicholson's convention: the current the forward sweep would have
 * carried had the potential stayed past the switch, i.e. the decaying forward current extended
 * in time under the return peak.
 * Source of the convention: R. S. Nicholson, Anal. Chem. 38 (1966) 1406 (return peak measured
 *   from the extended forward decay; from memory; also Wang, Analytical Electrochemistry, 2nd ed.
 *   (2000), §2-1.1.1).
 * Model of the decay (our choice): far past the formal potential the surface concentration is
 *   ~0, so the faradaic current decays like a Cottrell transient, I = a + b/√(t − t0)
 *   (F. G. Cottrell, Z. Phys. Chem. 42 (1903) 385; Bard & Faulkner, Electrochemical Methods,
 *   2nd ed. (2001) eq. 5.2.11, from memory). a and b are fitted by least squares for each trial
 *   t0; t0 itself is chosen by a grid then golden-section search on the residual sum of squares.
 *   When a forward background (e.g. the pre-peak line) is supplied, it is subtracted first and
 *   a is held at 0.
 * Charging step: at the switch the double-layer current reverses, so the return baseline is
 *   shifted by the median difference between the first return points and the extended decay.
 *   A forward background given as a function keeps being evaluated on the return sweep (a line in
 *   E keeps its slope there); only its offset is re-measured by the step.
 * In: potential (V), current (A, IUPAC), time (s, or any monotonic time-like clock), the forward
 *   fit window [forwardFitStart, forwardFitEnd) ending at or before the vertex, the vertex index,
 *   and the end of the drawn span on the return sweep.
 * Out: the curve over [forwardFitStart, spanEnd): the fitted decay on the forward window, then the
 *   extended decay plus the charging step on the return sweep.
 */
import { AnalysisError } from '../errors';
import type { BaselineCurve } from './baselineTypes';
import { anchorAt, assertFinitePoints, assertRange, formatMv, sampleBaseline, type BaselineTrace } from './baselineCurve';

export interface NicholsonReturnBaselineInput extends BaselineTrace {
  timeS: ArrayLike<number>;
  forwardFitStart: number;
  forwardFitEnd: number;
  vertexIndex: number;
  spanEnd: number;
  /** Background of the forward sweep at point k (A), subtracted before fitting the decay. */
  forwardBackgroundA?: (index: number) => number;
}

export interface NicholsonReturnBaselineOptions {
  /** Return points used to measure the charging step at the switch. @default 3 (at least 1) */
  stepPoints?: number;
  /**
   * Measure the charging step after `vertexIndex`. Off when the decay is extended within one sweep
   * (a wave on the tail of an earlier one), where no switch reverses the charging current.
   * @default true
   */
  switchStep?: boolean;
}

export interface NicholsonReturnBaselineResult {
  curve: BaselineCurve;
  /** Fitted decay parameters: I = background + a + b/√(t − t0), plus the step after the switch. */
  t0S: number;
  constantA: number;
  cottrellCoefficientA: number;
  switchStepA: number;
  /** The baseline at any point later than t0 (A): the decay keeps going beyond the drawn span. */
  evaluate: (index: number) => number;
}

interface DecayFit { a: number; b: number; sse: number }

function fitDecay(t: Float64Array, y: Float64Array, t0: number, freeConstant: boolean): DecayFit {
  let sx = 0, sy = 0, sxx = 0, sxy = 0;
  const n = t.length;
  for (let k = 0; k < n; k++) {
    const x = 1 / Math.sqrt(t[k]! - t0);
    sx += x; sy += y[k]!; sxx += x * x; sxy += x * y[k]!;
  }
  let a = 0;
  let b = sxy / sxx;
  if (freeConstant) {
    const det = n * sxx - sx * sx;
    b = det !== 0 ? (n * sxy - sx * sy) / det : b;
    a = (sy - b * sx) / n;
  }
  let sse = 0;
  for (let k = 0; k < n; k++) sse += (y[k]! - a - b / Math.sqrt(t[k]! - t0)) ** 2;
  return { a, b, sse };
}

/** Best t0 = tStart − δ with δ searched on a log scale between 0.02 and 50 window durations. */
function searchT0(t: Float64Array, y: Float64Array, freeConstant: boolean): number {
  const tStart = t[0]!;
  const span = Math.max(t[t.length - 1]! - tStart, 1e-12);
  const cost = (u: number) => fitDecay(t, y, tStart - span * Math.exp(u), freeConstant).sse;
  let lo = Math.log(0.02);
  let hi = Math.log(50);
  const steps = 24;
  let best = lo;
  let bestCost = Infinity;
  for (let s = 0; s <= steps; s++) {
    const u = lo + ((hi - lo) * s) / steps;
    const c = cost(u);
    if (c < bestCost) { bestCost = c; best = u; }
  }
  const h = (hi - lo) / steps;
  lo = best - h;
  hi = best + h;
  const g = (Math.sqrt(5) - 1) / 2;
  for (let it = 0; it < 40; it++) {
    const u1 = hi - g * (hi - lo);
    const u2 = lo + g * (hi - lo);
    if (cost(u1) < cost(u2)) hi = u2; else lo = u1;
  }
  return tStart - span * Math.exp((lo + hi) / 2);
}

export function nicholsonReturnBaseline(
  input: NicholsonReturnBaselineInput,
  options: NicholsonReturnBaselineOptions = {},
): NicholsonReturnBaselineResult {
  const n = input.currentA.length;
  const { forwardFitStart: fs, forwardFitEnd: fe, vertexIndex: v, spanEnd } = input;
  assertRange('Nicholson forward fit window', fs, fe, n, 3);
  assertRange('Nicholson return span', v, spanEnd, n, 2);
  if (input.timeS.length !== n) throw new AnalysisError('LENGTH_MISMATCH', `timeS has ${input.timeS.length} points, currentA has ${n}`);
  if (fe - 1 > v) throw new AnalysisError('OUT_OF_RANGE', `forward fit window must end at or before the vertex (index ${v})`);
  assertFinitePoints(input, fs, fe);
  const bg = input.forwardBackgroundA ?? (() => 0);
  const freeConstant = input.forwardBackgroundA === undefined;
  const t = new Float64Array(fe - fs);
  const y = new Float64Array(fe - fs);
  for (let k = fs; k < fe; k++) {
    t[k - fs] = input.timeS[k] as number;
    y[k - fs] = (input.currentA[k] as number) - bg(k);
  }
  for (let k = 1; k < t.length; k++) {
    if (!(t[k]! > t[k - 1]!)) throw new AnalysisError('OUT_OF_RANGE', `time must increase through the Nicholson fit window (index ${fs + k})`);
  }
  const t0 = searchT0(t, y, freeConstant);
  const { a, b } = fitDecay(t, y, t0, freeConstant);
  const decay = (k: number) => bg(k) + a + b / Math.sqrt((input.timeS[k] as number) - t0);
  const step = options.switchStep === false ? 0 : switchStep(input, decay, options.stepPoints ?? 3);
  const curve = sampleBaseline(input.potentialV, fs, spanEnd, (k) => decay(k) + (k > v ? step : 0), {
    method: 'nicholson',
    anchors: [anchorAt(input, fs), anchorAt(input, v)],
    description:
      `decay fitted as a + b/√(t − t0) on ${fe - fs} points from ${formatMv(input.potentialV[fs] as number)} to ` +
      `${formatMv(input.potentialV[fe - 1] as number)}, extended in time under the peak` +
      (options.switchStep === false ? '' : `; charging step at the switch ${step.toExponential(3)} A`),
  });
  const evaluate = (k: number) => decay(k) + (k > v ? step : 0);
  return { curve, t0S: t0, constantA: a, cottrellCoefficientA: b, switchStepA: step, evaluate };
}

/** Median difference between the first return points and the extended decay. */
function switchStep(input: NicholsonReturnBaselineInput, decay: (k: number) => number, points: number): number {
  const v = input.vertexIndex;
  const count = Math.max(1, Math.min(points, input.spanEnd - v - 1));
  const diffs: number[] = [];
  for (let k = v + 1; k <= v + count; k++) diffs.push((input.currentA[k] as number) - decay(k));
  diffs.sort((p, q) => p - q);
  return diffs[Math.floor(diffs.length / 2)] ?? 0;
}
