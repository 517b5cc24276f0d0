/**
 * The worker's `fit` request: the whole-curve fit of a series (core/fit: fitWithComparison, the
 * same path as `halfwave fit`), with a progress report per iteration and cancel between
 * simulations. The page sends the voltammograms' columns and the cell in core units; the answer
 * holds the chosen fit (with each file's model current at the fitted points, for the plots) and
 * the model comparison without its candidates' whole fits.
 */
import { fitWithComparison, type FitCell, type FitComparisonChoice, type FitResult, type FitStage, type FitVoltammogramsOptions } from '../core/fit';
import type { Voltammogram } from '../core/types';
import { summariseComparison, type ComparisonSummary } from '../io/fitContract';

/** The options a fit request carries (everything but the callbacks). */
export type FitRequestOptions = Omit<FitVoltammogramsOptions, 'onProgress' | 'signal'>;

export interface FitRequest {
  /** One voltammogram per file, IUPAC currents, potentials as recorded (the model has its own R_u). */
  records: Voltammogram[];
  /** File names in the order of `records`, for messages. */
  fileNames: string[];
  cell: FitCell;
  options: FitRequestOptions;
  compare: FitComparisonChoice;
}

export interface FitOutcome {
  result: FitResult;
  comparison: ComparisonSummary | null;
}

/** What one progress message of a fit says beside its fraction and stage text. */
export interface FitProgressDetail {
  kind: 'fit';
  /** Label of the model being fitted ('E', 'EC', 'R_u fitted', …), its index and the number of models. */
  model: string;
  modelIndex: number;
  modelCount: number;
  /** 'start': starting values from the peak analysis and a scan of the rate constants (no cost yet). */
  stage: 'start' | FitStage;
  iteration: number;
  /** Sum of squared residuals, A²; null before the first iteration. */
  costA2: number | null;
  evaluations: number;
}

export interface FitRunHooks {
  onProgress(fraction: number, stage: string, detail: FitProgressDetail): void;
  signal: { readonly aborted: boolean };
}

export function runFitRequest(input: FitRequest, hooks: FitRunHooks): FitOutcome {
  let model: { label: string; index: number; count: number } = { label: input.options.mechanism ?? 'E', index: 0, count: 1 };
  const maxIterations = input.options.maxIterations ?? 60;
  const { result, comparison } = fitWithComparison({ records: input.records, cell: input.cell }, input.options, {
    compare: input.compare,
    recordNames: input.fileNames,
    signal: hooks.signal,
    onModel: (label, index, count) => {
      model = { label, index, count };
      hooks.onProgress(index / count, `fitting ${label}: starting values`, { kind: 'fit', model: label, modelIndex: index, modelCount: count, stage: 'start', iteration: 0, costA2: null, evaluations: 0 });
    },
    onProgress: (p) => {
      // Iterations have no known total: the fraction counts models done plus this model's share of the iteration limit.
      const fraction = Math.min(1, (model.index + Math.min(p.iteration / maxIterations, 0.95)) / model.count);
      const words = p.stage === 'profile' ? 'bounds of the rate constants' : `iteration ${p.iteration}`;
      hooks.onProgress(fraction, `fitting ${model.label}: ${words}`, {
        kind: 'fit', model: model.label, modelIndex: model.index, modelCount: model.count, stage: p.stage, iteration: p.iteration, costA2: p.costA2, evaluations: p.evaluations,
      });
    },
  });
  return { result, comparison: comparison ? summariseComparison(comparison) : null };
}
