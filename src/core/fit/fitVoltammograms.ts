/**
 * Whole-curve fit: nonlinear least squares of simulated to measured current over a potential
 * window, for one voltammogram or a scan-rate series fitted jointly (all parameters shared
 * except a per-voltammogram straight background).
 * Model: simulateCvCouples (E, EC or surface couples at one electrode, faradaic currents summed,
 *   R_u and C_dl solved once for the sum), interpolated onto the measured points (fitModel.ts).
 * Method: starting values from the peak analysis (fitStartingValues.ts) or given ones, refined
 *   by a small grid over rate constants and R_u (scanStart.ts); Levenberg–Marquardt with box
 *   limits (levenbergMarquardt.ts; Marquardt 1963) on log-scale rate constants, D, Γ, C_dl and
 *   α within (0.05, 0.95) (fitParameters.ts); space grids frozen during the iteration and made
 *   again when D or k_f moves past their margin (fitStages.ts); errors from the Jacobian at the
 *   optimum with the noise estimated from the residuals, and profile-likelihood bounds for
 *   rate constants whose linearised interval cannot be trusted, including a check of the
 *   reversible (or no-follow-up) limit (fitEstimates.ts; Bates & Watts 1988); identifiability
 *   in words (fitNotes.ts); AIC and BIC (fitReport.ts). When the profile meets a lower sum of
 *   squares than the iteration stopped at, the iteration is run again from there.
 * In: FitInput (voltammograms with IUPAC currents and scan rates; cell: A, C, n, T), options.
 * Out: FitResult (values in E°′ order, estimates with errors, intervals and status, correlation,
 *   per-voltammogram model currents, criteria, notes). Progress per iteration; cancel via
 *   `signal` between simulations (AnalysisError 'CANCELLED').
 */
import { fitEstimates, type EstimatesResult } from './fitEstimates';
import { FitModel } from './fitModel';
import { PARAMETER_SPECS, ParameterLayout, cloneValues } from './fitParameters';
import { measuredCurrents, type FitContext } from './fitProblem';
import { prepareRecords } from './fitRecords';
import { assembleFitResult } from './fitReport';
import { runStage, type StageResult } from './fitStages';
import { fitStartingValues } from './fitStartingValues';
import { scanStart } from './scanStart';
import type { FitInput, FitModelValues, FitResult, FitVoltammogramsOptions } from './fitTypes';
import { resolveFitOptions, type ResolvedFit } from './resolveFitOptions';

export function fitVoltammograms(input: FitInput, options: FitVoltammogramsOptions = {}): FitResult {
  const fit = resolveFitOptions(input, options);
  const { records, windowV } = prepareRecords(fit.records, { cycle: fit.cycle, windowV: fit.windowV, electronCount: Math.max(...fit.electronCounts) });
  const start = startingValues(fit, options);
  const layout = ParameterLayout.build(fit.mechanism, fit.coupleCount, fit.free, fit.cell.temperatureK);
  const model = new FitModel(records, { mechanism: fit.mechanism, cell: fit.cell, electronCounts: fit.electronCounts, initialSpecies: fit.initialSpecies }, {});
  const ctx: FitContext = { layout, model, base: start.values, background: fit.background, measuredA: measuredCurrents(model), signal: options.signal };
  ctx.model.freezeGrids(start.values, {});
  const scanned = scanStart(ctx, start.values);
  let stage = iterate(ctx, fit, scanned.values, options);
  let iterations = stage.iterations;
  let evaluations = scanned.evaluations + stage.evaluations;
  let est = errors(ctx, fit, stage, options);
  if (est.better && est.better.costA2 < stage.lm.costA2 * (1 - 1e-6)) {
    // The profile met a lower sum of squares: the iteration had stopped on a flat stretch.
    evaluations += est.evaluations;
    stage = iterate(ctx, fit, est.better.values, options);
    iterations += stage.iterations;
    evaluations += stage.evaluations;
    est = errors(ctx, fit, stage, options);
  }
  const limit = refitAtReversibleLimit(ctx, fit, stage, est, options);
  if (limit) {
    return assembleFitResult({
      ctx: limit.ctx, mechanism: fit.mechanism, values: limit.stage.values, start: start.values, costA2: limit.stage.lm.costA2, estimates: limit.est, windowV,
      iterations: iterations + limit.stage.iterations, evaluations: evaluations + est.evaluations + limit.stage.evaluations + limit.est.evaluations,
      converged: limit.stage.lm.converged, stopReason: limit.stage.lm.reason, notes: [...start.notes, limit.note],
    });
  }
  return assembleFitResult({
    ctx, mechanism: fit.mechanism, values: stage.values, start: start.values, costA2: stage.lm.costA2, estimates: est, windowV,
    iterations, evaluations: evaluations + est.evaluations, converged: stage.lm.converged, stopReason: stage.lm.reason, notes: start.notes,
  });
}

/**
 * Largest relative rise of the sum of squares the fit at the reversible limit may bring: on data
 * with little noise a finite rate in the reversible zone also soaks up the model's own small
 * systematic errors (a few 0.01 % of the current), which four residual variances do not cover
 * (common practice, no source).
 */
const LIMIT_COST_SHARE = 0.02;

/** How far past its fitted value (or its lower bound, when higher) a rate constant is held for the fit at the reversible limit. */
const REVERSIBLE_HOLD_FACTOR = 100;

/**
 * A rate constant (k° or k_s) the data give only as a lower bound took, in the fit, whatever
 * finite value met the noise best, and the other parameters (E°′, D, k_f, C_dl) followed it. They
 * are taken instead from the fit again with that rate held far into the reversible zone
 * (REVERSIBLE_HOLD_FACTOR × its fitted value or bound, within its search limit) and its α held (α has no effect
 * there): the model the data cannot tell from the fitted one, without the rate the data do not
 * give. Kept only when that fit's sum of squares is no worse than the first by more than
 * 4 residual variances (two standard errors on one parameter) or LIMIT_COST_SHARE of it
 * (common practice, no source); the rate's bound and α's status stay those of the first fit.
 */
function refitAtReversibleLimit(ctx: FitContext, fit: ResolvedFit, stage: StageResult, est: EstimatesResult, options: FitVoltammogramsOptions): { ctx: FitContext; stage: StageResult; est: EstimatesResult; note: string } | null {
  const bounded = est.estimates.filter((e) => e.free && e.couple !== null && e.status === 'lower-bound' && (e.parameter === 'k0CmPerS' || e.parameter === 'surfaceRatePerS'));
  if (bounded.length === 0) return null;
  const held = new Set(bounded.flatMap((e) => [`${e.parameter}/${e.couple}`, `alpha/${e.couple}`]));
  const entries = ctx.layout.entries.filter((e) => !held.has(`${e.parameter}/${e.couple}`));
  if (entries.length === 0) return null;
  const values = cloneValues(stage.values);
  const heldAt: string[] = [];
  for (const e of bounded) {
    const couple = values.couples[e.couple as number]!;
    const spec = PARAMETER_SPECS[e.parameter as 'k0CmPerS'];
    const value = Math.min(spec.hi, REVERSIBLE_HOLD_FACTOR * Math.max(e.interval?.[0] ?? 0, e.value));
    couple[e.parameter as 'k0CmPerS'] = value;
    heldAt.push(`${spec.label} at ${value.toPrecision(2)} ${e.parameter === 'k0CmPerS' ? 'cm/s' : '1/s'}`);
  }
  const limitCtx: FitContext = { ...ctx, layout: new ParameterLayout(entries, fit.cell.temperatureK), base: values };
  const again = iterate(limitCtx, fit, values, options);
  const variance = stage.lm.costA2 / Math.max(1, est.covariance.degreesOfFreedom);
  if (!(again.lm.costA2 <= Math.max(stage.lm.costA2 + 4 * variance, stage.lm.costA2 * (1 + LIMIT_COST_SHARE)))) {
    // Held at the limit the data fit worse: keep the first fit (its grids back as they were).
    ctx.model.freezeGrids(stage.values, {});
    return null;
  }
  const limitEst = errors(limitCtx, fit, again, options);
  // The held rate and α are reported as the first fit found them: a lower bound and undetermined.
  const first = new Map(est.estimates.filter((e) => held.has(`${e.parameter}/${e.couple}`)).map((e) => [`${e.parameter}/${e.couple}`, e]));
  limitEst.estimates = limitEst.estimates.map((e) => first.get(`${e.parameter}/${e.couple}`) ?? e);
  const names = [...new Set(bounded.map((e) => PARAMETER_SPECS[e.parameter as 'k0CmPerS'].label))].join(' and ');
  const tradeOff = ohmicTradeOff(ctx, est, bounded);
  const note = `the other values are those of the fit at the reversible limit, ${heldAt.join(' and ')} (${REVERSIBLE_HOLD_FACTOR}× the fitted value, within its search limit) with α held: the data give ${names} only as a lower bound, and the fit with ${names} free had stopped at a finite value the noise allowed, moving the others with it`;
  return { ctx: limitCtx, stage: again, est: limitEst, note: tradeOff ? `${note}; ${tradeOff}` : note };
}

/** R_u against a bounded k° in the fit with k° free: the trade-off the fit at the limit no longer shows. */
function ohmicTradeOff(ctx: FitContext, est: EstimatesResult, bounded: EstimatesResult['estimates']): string | null {
  const at = (parameter: string, couple: number | null) => ctx.layout.entries.findIndex((e) => e.parameter === parameter && e.couple === couple);
  const ru = at('uncompensatedOhm', null);
  if (ru < 0) return null;
  for (const e of bounded) {
    if (e.parameter !== 'k0CmPerS') continue;
    const rho = est.covariance.correlation[at(e.parameter, e.couple)]?.[ru];
    // The threshold of fitNotes.ts for the same pair.
    if (rho != null && Math.abs(rho) >= 0.8) {
      return `R_u and k° trade off in the fit with k° free (correlation ${rho.toFixed(2)}): both widen ΔEp, so R_u is given here for the reversible couple, and a slower couple would leave less of the widening to R_u; scan rates over a wider range separate them`;
    }
  }
  return null;
}

function iterate(ctx: FitContext, fit: ResolvedFit, from: FitModelValues, options: FitVoltammogramsOptions): StageResult {
  return runStage(ctx, from, { maxIterations: fit.maxIterations, numerics: {}, stage: 'iterate', onProgress: options.onProgress });
}

function errors(ctx: FitContext, fit: ResolvedFit, stage: StageResult, options: FitVoltammogramsOptions): EstimatesResult {
  return fitEstimates(ctx, stage.values, stage.lm.costA2, {
    mechanism: fit.mechanism, confounded: fit.confounded, profile: fit.profile, extraParameters: fit.background ? 2 * ctx.model.records.length : 0,
    onStage: (s) => options.onProgress?.({ iteration: stage.iterations, costA2: stage.lm.costA2, evaluations: stage.evaluations, relativeOffset: stage.lm.relativeOffset, stage: s }),
  });
}

/** Peak-analysis starting values, overridden by the user's; R_u is 0 unless given or free. */
function startingValues(fit: ResolvedFit, options: FitVoltammogramsOptions): { values: FitModelValues; notes: string[] } {
  const ruFree = fit.free.includes('uncompensatedOhm');
  const givenRu = options.start?.shared?.uncompensatedOhm;
  const est = fitStartingValues({ ...fit, ruOhm: ruFree ? null : givenRu ?? 0 });
  const v = cloneValues(est.values);
  v.couples = v.couples.map((c, j) => ({ ...c, ...(options.start?.couples?.[j] ?? {}) }));
  v.shared = { ...v.shared, ...(options.start?.shared ?? {}) };
  const notes = [...est.notes];
  if (!fit.free.includes('doubleLayerFPerCm2') && options.start?.shared?.doubleLayerFPerCm2 === undefined) {
    notes.push(`C_dl held at ${v.shared.doubleLayerFPerCm2.toPrecision(2)} F/cm², estimated from the current early in the first sweep`);
  }
  if (fit.confounded.includes('diffusionRatio')) {
    const ratio = v.couples[0]?.diffusionRatio ?? 1;
    notes.push(`D_O/D_R cannot be told apart from E°′ and k° by the voltammograms of one dissolved species under planar diffusion: (E°′, k°, D_O/D_R) and (E°′ − (RT/2nF)·ln(D_O/D_R), k°·(D_O/D_R)^(α/2), 1) give the same current (Nicholson 1965: ψ carries (D_O/D_R)^(α/2)). E°′ and k° are given for D_O/D_R = ${ratio}; hold the ratio at a value known from elsewhere to move them`);
  }
  if (fit.background) notes.push('a straight background a + b·E was fitted to each voltammogram (solved exactly at every step)');
  return { values: v, notes };
}
