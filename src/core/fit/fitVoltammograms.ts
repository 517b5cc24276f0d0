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
import { ParameterLayout, cloneValues } from './fitParameters';
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
  return assembleFitResult({
    ctx, mechanism: fit.mechanism, values: stage.values, start: start.values, costA2: stage.lm.costA2, estimates: est, windowV,
    iterations, evaluations: evaluations + est.evaluations, converged: stage.lm.converged, stopReason: stage.lm.reason, notes: start.notes,
  });
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
