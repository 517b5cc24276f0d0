/**
 * Profile-t interval of one parameter, for when the linearised interval cannot be trusted (a
 * rate constant in the reversible limit, where the sum of squares flattens out on one side).
 * Source: D. M. Bates, D. G. Watts, Nonlinear Regression Analysis and Its Applications, Wiley
 *   (1988), §6.1 (profile t): τ(y) = sign(y − ŷ)·√(S̃(y) − Ŝ)/s, with S̃(y) the least sum of
 *   squares with the parameter held at y and all others re-optimised; the (1 − a) interval is
 *   where |τ(y)| ≤ t(ν, 1 − a/2) (from memory).
 * Method: from ŷ, steps outward on each side (growing by 1.5×) until |τ| passes t, then
 *   interpolates linearly in τ between the last two points and checks the interpolated point
 *   once; a side that reaches the parameter's search limit first stays open (null).
 * In: the fit context, the entry's index, the optimum, Ŝ (A²), s (A), t, a first step (report
 *   coordinates). Out: the interval ends in report coordinates (null = open), the profile
 *   points, the evaluations used, and a lower S found on the way (the optimum was not reached).
 */
import { cloneValues, type ParameterLayout } from './fitParameters';
import { leastSquaresProblem, residualsAt, type FitContext } from './fitProblem';
import type { FitModelValues } from './fitTypes';
import { levenbergMarquardt } from './levenbergMarquardt';

export interface ProfileRequest {
  index: number;
  best: FitModelValues;
  bestCostA2: number;
  residualStdA: number;
  tQuantile: number;
  /** First step in report coordinates. */
  firstStep: number;
}

export interface ProfileResult {
  lower: number | null;
  upper: number | null;
  points: { y: number; tau: number }[];
  evaluations: number;
  /** Sum of squares below Ŝ met on the way, with its values (the caller may refit from there). */
  better: { costA2: number; values: FitModelValues } | null;
}

const MAX_STEPS = 12;
const POINT_ITERATIONS = 12;

export function profileParameter(ctx: FitContext, req: ProfileRequest): ProfileResult {
  const entry = ctx.layout.entries[req.index]!;
  const sub: FitContext = { ...ctx, layout: ctx.layout.without(req.index) };
  const yHat = ctx.layout.toReport(req.best, entry);
  const limits = reportLimits(ctx.layout, req.index);
  const out: ProfileResult = { lower: null, upper: null, points: [], evaluations: 0, better: null };
  const costAt = (y: number, warm: FitModelValues): { cost: number; values: FitModelValues } => {
    const start = cloneValues(warm);
    ctx.layout.fromReport(start, entry, y);
    const r = minimiseOthers(sub, start);
    out.evaluations += r.evaluations;
    if (r.cost < req.bestCostA2 && (!out.better || r.cost < out.better.costA2)) out.better = { costA2: r.cost, values: r.values };
    return { cost: r.cost, values: r.values };
  };
  const tauOf = (y: number, cost: number) => Math.sign(y - yHat) * Math.sqrt(Math.max(cost - req.bestCostA2, 0)) / req.residualStdA;
  for (const side of [-1, 1] as const) {
    let step = req.firstStep;
    let prev = { y: yHat, tau: 0, values: req.best };
    for (let k = 0; k < MAX_STEPS; k++) {
      const limit = side < 0 ? limits[0] : limits[1];
      const y = side < 0 ? Math.max(prev.y - step, limit) : Math.min(prev.y + step, limit);
      const at = costAt(y, prev.values);
      const tau = tauOf(y, at.cost);
      out.points.push({ y, tau });
      if (Math.abs(tau) >= req.tQuantile) {
        const end = refine(prev, { y, tau }, req.tQuantile, (yy) => tauOf(yy, costAt(yy, at.values).cost));
        if (side < 0) out.lower = end;
        else out.upper = end;
        break;
      }
      if (y === limit) break;
      prev = { y, tau, values: at.values };
      step *= 1.5;
    }
  }
  out.points.sort((a, b) => a.y - b.y);
  return out;
}

/** Linear interpolation of |τ| = t between two points, checked once and re-interpolated. */
function refine(a: { y: number; tau: number }, b: { y: number; tau: number }, t: number, tauAt: (y: number) => number): number {
  const cross = (p: { y: number; tau: number }, q: { y: number; tau: number }) => p.y + ((t - Math.abs(p.tau)) / (Math.abs(q.tau) - Math.abs(p.tau))) * (q.y - p.y);
  const y1 = cross(a, b);
  const mid = { y: y1, tau: tauAt(y1) };
  return Math.abs(mid.tau) >= t ? cross(a, mid) : cross(mid, b);
}

function minimiseOthers(sub: FitContext, start: FitModelValues): { cost: number; values: FitModelValues; evaluations: number } {
  const ctx = { ...sub, base: start };
  if (sub.layout.size === 0) {
    const r = new Float64Array(sub.measuredA.length);
    residualsAt(ctx, start, r);
    return { cost: r.reduce((s, x) => s + x * x, 0), values: start, evaluations: 1 };
  }
  const lm = levenbergMarquardt(leastSquaresProblem(ctx), sub.layout.toInternal(start), { maxIterations: POINT_ITERATIONS, relativeOffsetTolerance: 0.01, signal: sub.signal });
  return { cost: lm.costA2, values: sub.layout.fromInternal(lm.u, start), evaluations: lm.evaluations };
}

/** Search limits of entry `index` in report coordinates (just inside, where the transform still moves). */
function reportLimits(layout: ParameterLayout, index: number): [number, number] {
  const { lo, hi } = layout.entries[index]!.spec;
  const a = Math.log(lo);
  const b = Math.log(hi);
  return [a + 0.01 * (b - a), b - 0.01 * (b - a)];
}
