/**
 * The fit a user asks for, and, when asked, its alternative model fitted to the same data and
 * ranked by BIC (compareFitModels.ts): E against EC, or R_u fitted against R_u held. The chosen
 * model is the one returned; the comparison is advice beside it, never a silent switch. Only the
 * chosen model gets profile-likelihood bounds: the alternative needs only its sum of squares.
 * One path for the command line (`fit --compare`) and the worker's `fit` request.
 * In: the fit input, the fit options, the comparison wanted, progress/cancel, the names of the
 *   voltammograms (files) for error messages. Out: the chosen fit and the comparison (or null).
 * Errors: AnalysisError as fitVoltammograms throws it, with "voltammogram k" replaced by the
 *   k-th name; BAD_OPTION for an E-against-EC comparison of a surface model.
 */
import { AnalysisError } from '../errors';
import { compareFitModels, mechanismCandidates, ohmicCandidates, type ModelComparison } from './compareFitModels';
import type { FitInput, FitResult, FitVoltammogramsOptions } from './fitTypes';
import { fitVoltammograms } from './fitVoltammograms';

/** 'mechanism': E against EC; 'ru': R_u fitted against R_u held at its given value. */
export type FitComparisonChoice = 'none' | 'mechanism' | 'ru';

export interface FitWithComparisonOptions {
  /** @default 'none' */
  compare?: FitComparisonChoice;
  onProgress?: FitVoltammogramsOptions['onProgress'];
  signal?: FitVoltammogramsOptions['signal'];
  /** Called before each model's fit starts, with its label, index and the number of models. */
  onModel?: ((label: string, index: number, count: number) => void) | undefined;
  /** Names of the voltammograms in input order (file names), used in error messages. @default none */
  recordNames?: readonly string[];
}

export interface FitWithComparisonResult {
  result: FitResult;
  comparison: ModelComparison | null;
  /** Label of the chosen model in the comparison (the mechanism, or 'R_u fitted' / 'R_u held at … Ω'). */
  chosen: string;
}

export function fitWithComparison(input: FitInput, fit: FitVoltammogramsOptions, options: FitWithComparisonOptions = {}): FitWithComparisonResult {
  const names = options.recordNames ?? [];
  try {
    return run(input, fit, options);
  } catch (err) {
    if (!(err instanceof AnalysisError) || names.length === 0) throw err;
    throw new AnalysisError(err.code, err.message.replace(/voltammogram (\d+)/g, (_, k: string) => `"${names[Number(k) - 1] ?? `voltammogram ${k}`}"`));
  }
}

function run(input: FitInput, fit: FitVoltammogramsOptions, options: FitWithComparisonOptions): FitWithComparisonResult {
  const compare = options.compare ?? 'none';
  const mechanism = fit.mechanism ?? 'E';
  const progress = { onProgress: options.onProgress, signal: options.signal };
  if (compare === 'none') {
    options.onModel?.(mechanism, 0, 1);
    return { result: fitVoltammograms(input, { ...fit, ...progress }), comparison: null, chosen: mechanism };
  }
  if (compare === 'mechanism' && mechanism === 'surface') throw new AnalysisError('BAD_OPTION', 'comparing E with EC does not apply to a surface-confined film');
  const all = compare === 'mechanism' ? mechanismCandidates(fit) : ohmicCandidates(fit);
  const ruFitted = (fit.free ?? []).includes('uncompensatedOhm');
  const chosen = compare === 'mechanism' ? mechanism : ruFitted ? 'R_u fitted' : (all[0]?.label as string);
  const candidates = all.map((c) => (c.label === chosen ? c : { ...c, options: { ...c.options, profile: false } }));
  const comparison = compareFitModels(input, candidates, { ...progress, onCandidate: (label, k) => options.onModel?.(label, k, candidates.length) });
  const result = comparison.candidates.find((c) => c.label === chosen)?.result as FitResult;
  return { result, comparison, chosen };
}
