/**
 * Profile-t interval of one parameter, for when the linearised interval cannot be trusted (a
 * rate constant in the reversible limit, where the sum of squares flattens out on one side).
 * Source: D. M. Bates, D. G. Watts, Nonlinear Regression Analysis and Its Applications, Wiley
 *   (1988), §6.1 (profile t): τ(y) = sign(y − ŷ)·√(S̃(y) − Ŝ)/s, with S̃(y) the least sum of
 *   squares with the parameter held at y and all others re-optimised; the (1 − a) interval is
 *   where |τ(y)| ≤ t(ν, 1 − a/2) (from memory).
 * Method: on each side the search limit is tried first; when |τ| stays below t there the side
 *   is open (null). Otherwise steps outward from ŷ (growing by 1.5×) until |τ| passes t, then
 *   interpolates linearly in τ between the last two points and checks the interpolated point
 *   once. For log-scale parameters only (rate constants), in report coordinates ln x.
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
/** Each profile point re-optimises the other parameters loosely: an offset of 0.05 leaves S within ~0.01·s² of its minimum, far below the t² threshold. */
const POINT_ITERATIONS = 8;
const POINT_TOLERANCE = 0.05;

export function profileParameter(ctx: FitContext, req: ProfileRequest): ProfileResult {
  const profile = new Profile(ctx, req);
  profile.side(-1);
  profile.side(1);
  profile.out.points.sort((a, b) => a.y - b.y);
  return profile.out;
}

/** τ at one search limit (−1 lower, +1 upper) and the evaluations it took: is that limit compatible with the data? */
export function limitTau(ctx: FitContext, req: ProfileRequest, side: -1 | 1): { tau: number; evaluations: number } {
  const profile = new Profile(ctx, req);
  const y = profile.limits[side < 0 ? 0 : 1];
  return { tau: profile.tauOf(y, profile.costAt(y, req.best).cost), evaluations: profile.out.evaluations };
}

class Profile {
  readonly out: ProfileResult = { lower: null, upper: null, points: [], evaluations: 0, better: null };
  readonly limits: [number, number];
  private readonly sub: FitContext;
  private readonly yHat: number;

  constructor(private readonly ctx: FitContext, private readonly req: ProfileRequest) {
    this.sub = { ...ctx, layout: ctx.layout.without(req.index) };
    this.yHat = ctx.layout.toReport(req.best, ctx.layout.entries[req.index]!);
    this.limits = reportLimits(ctx.layout, req.index);
  }

  costAt(y: number, warm: FitModelValues): { cost: number; values: FitModelValues } {
    const start = cloneValues(warm);
    this.ctx.layout.fromReport(start, this.ctx.layout.entries[this.req.index]!, y);
    const r = minimiseOthers(this.sub, start);
    this.out.evaluations += r.evaluations;
    if (r.cost < this.req.bestCostA2 && (!this.out.better || r.cost < this.out.better.costA2)) this.out.better = { costA2: r.cost, values: r.values };
    return { cost: r.cost, values: r.values };
  }

  tauOf(y: number, cost: number): number {
    return (Math.sign(y - this.yHat) * Math.sqrt(Math.max(cost - this.req.bestCostA2, 0))) / this.req.residualStdA;
  }

  /** First the limit itself (open side when it is compatible), else a walk outward to the crossing. */
  side(side: -1 | 1): void {
    const t = this.req.tQuantile;
    const limit = side < 0 ? this.limits[0] : this.limits[1];
    const atLimit = this.costAt(limit, this.req.best);
    this.out.points.push({ y: limit, tau: this.tauOf(limit, atLimit.cost) });
    if (Math.abs(this.tauOf(limit, atLimit.cost)) < t) return;
    let step = this.req.firstStep;
    let prev = { y: this.yHat, tau: 0, values: this.req.best };
    for (let k = 0; k < MAX_STEPS; k++) {
      const y = side < 0 ? Math.max(prev.y - step, limit) : Math.min(prev.y + step, limit);
      const at = y === limit ? atLimit : this.costAt(y, prev.values);
      const tau = this.tauOf(y, at.cost);
      this.out.points.push({ y, tau });
      if (Math.abs(tau) >= t) {
        const end = refine(prev, { y, tau }, t, (yy) => this.tauOf(yy, this.costAt(yy, at.values).cost));
        if (side < 0) this.out.lower = end;
        else this.out.upper = end;
        return;
      }
      prev = { y, tau, values: at.values };
      step *= 1.5;
    }
  }
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
  const lm = levenbergMarquardt(leastSquaresProblem(ctx), sub.layout.toInternal(start), { maxIterations: POINT_ITERATIONS, relativeOffsetTolerance: POINT_TOLERANCE, signal: sub.signal });
  return { cost: lm.costA2, values: sub.layout.fromInternal(lm.u, start), evaluations: lm.evaluations };
}

/** Search limits of entry `index` in report coordinates (just inside, where the transform still moves). */
function reportLimits(layout: ParameterLayout, index: number): [number, number] {
  const { lo, hi } = layout.entries[index]!.spec;
  const a = Math.log(lo);
  const b = Math.log(hi);
  return [a + 0.01 * (b - a), b - 0.01 * (b - a)];
}
