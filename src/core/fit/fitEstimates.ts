/**
 * Uncertainty of the fitted parameters: linearised standard errors, correlations and 95 %
 * intervals at the optimum (fitUncertainty.ts), and profile-likelihood intervals
 * (profileParameter.ts) for rate constants (k°, k_s, k_f) whose linearised interval cannot be
 * trusted: undetermined, at a search limit, wider than a factor 2 on either side, or with the
 * regime limit (k°, k_s → reversible; k_f → no follow-up reaction) still compatible with the
 * data (checked by one restricted fit at that limit). A profiled side whose limit is compatible
 * is open: the constant is then a lower (or upper) bound, never a number.
 * Source: Bates & Watts, Nonlinear Regression Analysis and Its Applications (1988), §2.3 and
 *   §6.1 (from memory); the factor-2 trigger is common practice, no source.
 * In: the fit context at its optimum. Out: one ParameterEstimate per parameter of the model
 *   (free and fixed), the covariance of the free ones, and a lower sum of squares met while
 *   profiling, if any.
 */
import { COUPLE_PARAMETERS, reportIsLinear, type LayoutEntry } from './fitParameters';
import { reportJacobian, residualsAt, type FitContext } from './fitProblem';
import type { EstimateStatus, FitMechanism, FitModelValues, FitStage, ParameterEstimate } from './fitTypes';
import { linearizedCovariance, type LinearizedCovariance } from './fitUncertainty';
import { limitTau, profileParameter, type ProfileResult } from './profileParameter';
import { reversibleLimitCheck } from './reversibleLimitCheck';

export interface EstimatesResult {
  estimates: ParameterEstimate[];
  covariance: LinearizedCovariance;
  evaluations: number;
  better: ProfileResult['better'];
}

export interface EstimatesOptions {
  mechanism: FitMechanism;
  /** Asked free but not identifiable: reported undetermined at their held value. */
  confounded: readonly string[];
  profile: boolean;
  /** Parameters solved outside the iteration (background lines). */
  extraParameters: number;
  onStage?: ((s: FitStage) => void) | undefined;
}


export function fitEstimates(ctx: FitContext, values: FitModelValues, costA2: number, o: EstimatesOptions): EstimatesResult {
  const { layout } = ctx;
  const r0 = new Float64Array(ctx.measuredA.length);
  residualsAt(ctx, values, r0);
  const cov = linearizedCovariance(reportJacobian(ctx, values, r0), costA2, { extraParameters: o.extraParameters });
  let evaluations = 1 + layout.size;
  let better: ProfileResult['better'] = null;
  const estimates = layout.entries.map((_, i) => {
    const r = estimateFor(ctx, values, costA2, cov, i, o);
    evaluations += r.evaluations;
    if (r.better && (!better || r.better.costA2 < better.costA2)) better = r.better;
    return r.estimate;
  });
  reversibleLimits(ctx, values, estimates);
  const held = fixedEstimates(ctx, values, o.mechanism).map((e): ParameterEstimate => (o.confounded.includes(e.parameter)
    ? { ...e, free: true, status: 'undetermined', standardError: Infinity, interval: [null, null] } : e));
  return { estimates: [...estimates, ...held], covariance: cov, evaluations, better };
}

/**
 * A fitted k° or k_s in the reversible zone at every scan rate, or whose peak shifts are below
 * the point spacing (reversibleLimitCheck.ts), becomes a lower bound at the lower end of its
 * interval; a rate constant that is a lower bound leaves its couple's α undetermined (α has no
 * effect on a reversible wave). An α interval is never reported beyond 0–1.
 */
function reversibleLimits(ctx: FitContext, values: FitModelValues, estimates: ParameterEstimate[]): void {
  for (const e of estimates) {
    if ((e.parameter !== 'k0CmPerS' && e.parameter !== 'surfaceRatePerS') || e.status !== 'estimate' || e.couple === null) continue;
    const check = reversibleLimitCheck(ctx, values, e.couple, e.parameter);
    if (!check) continue;
    e.status = 'lower-bound';
    e.interval = [e.interval?.[0] ?? null, null];
    e.reason = check.reason;
  }
  for (const e of estimates) {
    if (e.parameter !== 'alpha') continue;
    const rate = estimates.find((x) => (x.parameter === 'k0CmPerS' || x.parameter === 'surfaceRatePerS') && x.couple === e.couple);
    if (rate?.status === 'lower-bound' && e.status !== 'undetermined') {
      e.status = 'undetermined';
      e.interval = [null, null];
      e.standardError = Infinity;
      e.reason = 'α has no effect on a reversible wave, and the rate constant is only a lower bound';
    } else if (e.interval) {
      e.interval = [e.interval[0] === null ? null : Math.max(e.interval[0], 0), e.interval[1] === null ? null : Math.min(e.interval[1], 1)];
    }
  }
}

/** Search limit on the side where a rate constant's regime changes: reversible for k° and k_s, no follow-up for k_f. */
const REGIME_SIDE: Record<string, -1 | 1> = { k0CmPerS: 1, surfaceRatePerS: 1, followUpRatePerS: -1 };

function estimateFor(ctx: FitContext, values: FitModelValues, costA2: number, cov: LinearizedCovariance, i: number, o: EstimatesOptions): { estimate: ParameterEstimate; evaluations: number; better: ProfileResult['better'] } {
  const { layout } = ctx;
  const e = layout.entries[i]!;
  const se = cov.standardErrors[i] as number;
  const half = cov.tQuantile * se;
  const atSearchLimit = layout.atLimit(values, e);
  const base = { parameter: e.parameter, couple: e.couple, value: layout.valueOf(values, e), free: true, standardError: reportIsLinear(e) ? se : layout.valueOf(values, e) * se, atSearchLimit };
  const wald = (evaluations: number) => {
    const interval = waldInterval(e, layout.toReport(values, e), half);
    const status: EstimateStatus = cov.undetermined[i] || coversRange(e, interval) ? 'undetermined' : 'estimate';
    return { estimate: { ...base, interval, intervalMethod: 'linearized' as const, status }, evaluations, better: null };
  };
  if (!o.profile || !(e.parameter in REGIME_SIDE)) return wald(0);
  const critical = pairedWithAlpha(ctx, e) ? jointCritical(cov.degreesOfFreedom) : cov.tQuantile;
  const req = { index: i, best: values, bestCostA2: costA2, residualStdA: cov.residualStdA, tQuantile: critical, firstStep: Math.min(Math.max(Number.isFinite(se) ? se : 1, 0.2), 1) };
  let evaluations = 0;
  if (Number.isFinite(se) && !atSearchLimit && half <= Math.LN2) {
    // A narrow linearised interval can still hide a flat sum of squares towards the regime limit.
    const check = limitTau(ctx, req, REGIME_SIDE[e.parameter]!);
    evaluations += check.evaluations;
    if (Math.abs(check.tau) >= critical) return wald(evaluations);
  }
  o.onStage?.('profile');
  const p = profileParameter(ctx, req);
  const interval: [number | null, number | null] = [p.lower === null ? null : Math.exp(p.lower), p.upper === null ? null : Math.exp(p.upper)];
  return { estimate: { ...base, interval, intervalMethod: 'profile', status: profiledStatus(p) }, evaluations: evaluations + p.evaluations, better: p.better };
}

/** k° or k_s with the same couple's α free: α is determined only together with the rate constant. */
function pairedWithAlpha(ctx: FitContext, e: LayoutEntry): boolean {
  return (e.parameter === 'k0CmPerS' || e.parameter === 'surfaceRatePerS') && ctx.layout.entries.some((x) => x.parameter === 'alpha' && x.couple === e.couple);
}

/**
 * √(2·F(2, ν; 0.95)): the profile of k° (or k_s) is read against the joint 95 % region of the
 * pair (rate constant, α) — Bates & Watts (1988) §6.1 (joint likelihood regions, from memory) —
 * because in the reversible limit α drops out, so "reversible or not" is a test of two
 * parameters; the one-parameter t would exclude the reversible limit too often (seen in 3 of 8
 * seeded simulated series here). F(2, ν) has the closed-form quantile (ν/2)(0.05^(−2/ν) − 1).
 */
export function jointCritical(degreesOfFreedom: number): number {
  const f = (degreesOfFreedom / 2) * (0.05 ** (-2 / degreesOfFreedom) - 1);
  return Math.sqrt(2 * f);
}

function profiledStatus(p: ProfileResult): EstimateStatus {
  if (p.lower !== null && p.upper !== null) return 'estimate';
  if (p.lower !== null) return 'lower-bound';
  return p.upper !== null ? 'upper-bound' : 'undetermined';
}

function waldInterval(e: LayoutEntry, y: number, half: number): [number | null, number | null] {
  if (!Number.isFinite(half)) return [null, null];
  return reportIsLinear(e) ? [y - half, y + half] : [Math.exp(y - half), Math.exp(y + half)];
}

/** The interval reaches past both search limits: the data say nothing about the parameter. */
function coversRange(e: LayoutEntry, [a, b]: [number | null, number | null]): boolean {
  if (a === null || b === null) return true;
  return Number.isFinite(e.spec.lo) && a <= e.spec.lo && b >= e.spec.hi;
}

/** Parameters of the model that were held at their values. */
function fixedEstimates(ctx: FitContext, values: FitModelValues, mechanism: FitMechanism): ParameterEstimate[] {
  const free = new Set(ctx.layout.entries.map((e) => `${e.parameter}/${e.couple}`));
  const fixed = (parameter: ParameterEstimate['parameter'], couple: number | null, value: number): ParameterEstimate => ({
    parameter, couple, value, free: false, standardError: null, interval: null, intervalMethod: null, status: 'fixed', atSearchLimit: false,
  });
  const all = values.couples.flatMap((c, j) => COUPLE_PARAMETERS[mechanism].map((n) => fixed(n, j, c[n])));
  all.push(fixed('uncompensatedOhm', null, values.shared.uncompensatedOhm), fixed('doubleLayerFPerCm2', null, values.shared.doubleLayerFPerCm2));
  return all.filter((e) => !free.has(`${e.parameter}/${e.couple}`));
}
