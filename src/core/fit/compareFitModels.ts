/**
 * Model choice: fits the same voltammograms with each candidate model (E against EC, or R_u free
 * against R_u held) and ranks them by criteria that count parameters; the result is a
 * recommendation in words, never a silent switch.
 * Sources: H. Akaike, "A new look at the statistical model identification", IEEE Trans. Autom.
 *   Control 19 (1974) 716 (AIC); G. Schwarz, "Estimating the dimension of a model", Ann. Stat. 6
 *   (1978) 461 (BIC); grades of ΔBIC from R. E. Kass, A. E. Raftery, "Bayes factors", J. Am. Stat.
 *   Assoc. 90 (1995) 773: 0–2 not worth more than a mention, 2–6 positive, 6–10 strong, > 10
 *   very strong (all from memory). The ranking is by BIC, which penalises an extra parameter by
 *   ln m rather than 2 and so does not favour the larger model on thousands of points.
 * In: the fit input, the candidates (label + fit options), shared progress/cancel.
 * Out: each candidate's fit and criteria (Δ relative to the best), the preferred label, the
 *   evidence grade and the recommendation text.
 */
import { AnalysisError } from '../errors';
import { fitVoltammograms } from './fitVoltammograms';
import type { FitInput, FitParameter, FitResult, FitVoltammogramsOptions } from './fitTypes';
import { DEFAULT_FREE } from './fitParameters';

export interface FitCandidate {
  label: string;
  options: FitVoltammogramsOptions;
}

export type EvidenceGrade = 'not worth more than a mention' | 'positive' | 'strong' | 'very strong';

export interface ModelComparison {
  candidates: { label: string; result: FitResult; aic: number; bic: number; deltaAic: number; deltaBic: number }[];
  preferred: string;
  evidence: EvidenceGrade;
  recommendation: string;
}

export interface CompareFitModelsOptions {
  onProgress?: FitVoltammogramsOptions['onProgress'];
  signal?: FitVoltammogramsOptions['signal'];
  /** Called before each candidate's fit starts (0-based index in the given order). */
  onCandidate?: ((label: string, index: number) => void) | undefined;
}

export function compareFitModels(input: FitInput, candidates: FitCandidate[], options: CompareFitModelsOptions = {}): ModelComparison {
  if (candidates.length < 2) throw new AnalysisError('BAD_OPTION', `a comparison needs two or more candidate models, got ${candidates.length}`);
  const { onCandidate, ...shared } = options;
  const fits = candidates.map((c, k) => {
    onCandidate?.(c.label, k);
    return { label: c.label, result: fitVoltammograms(input, { ...c.options, ...shared }) };
  });
  const bestBic = Math.min(...fits.map((f) => f.result.criteria.bic));
  const bestAic = Math.min(...fits.map((f) => f.result.criteria.aic));
  const ranked = fits
    .map((f) => ({ ...f, aic: f.result.criteria.aic, bic: f.result.criteria.bic, deltaAic: f.result.criteria.aic - bestAic, deltaBic: f.result.criteria.bic - bestBic }))
    .sort((a, b) => a.bic - b.bic);
  const best = ranked[0]!;
  const runnerUp = ranked[1]!;
  const gap = runnerUp.deltaBic;
  const evidence: EvidenceGrade = gap > 10 ? 'very strong' : gap > 6 ? 'strong' : gap > 2 ? 'positive' : 'not worth more than a mention';
  const simpler = best.result.criteria.parameterCount <= runnerUp.result.criteria.parameterCount;
  const recommendation = gap <= 2
    ? `${best.label} and ${runnerUp.label} fit about equally well (ΔBIC ${gap.toFixed(1)}, ΔAIC ${runnerUp.deltaAic.toFixed(1)}): ${simpler ? `the simpler ${best.label} is enough` : `prefer the simpler ${runnerUp.label} unless other evidence favours ${best.label}`}`
    : `${best.label} is preferred over ${runnerUp.label}: ΔBIC ${gap.toFixed(1)} (${evidence} evidence), ΔAIC ${runnerUp.deltaAic.toFixed(1)}; this is a recommendation, the fit shown is the one you chose`;
  return { candidates: ranked, preferred: best.label, evidence, recommendation };
}

/** E against EC with the same free parameters (k_f added for EC, removed for E). */
export function mechanismCandidates(base: FitVoltammogramsOptions): FitCandidate[] {
  const free = base.free ?? DEFAULT_FREE[base.mechanism ?? 'E'];
  const withoutKf = free.filter((p) => p !== 'followUpRatePerS');
  return [
    { label: 'E', options: { ...base, mechanism: 'E', free: withoutKf } },
    { label: 'EC', options: { ...base, mechanism: 'EC', free: [...withoutKf, 'followUpRatePerS'] } },
  ];
}

/** The chosen model with R_u free against R_u held at its given value (0 Ω by default). */
export function ohmicCandidates(base: FitVoltammogramsOptions): FitCandidate[] {
  const free: FitParameter[] = (base.free ?? DEFAULT_FREE[base.mechanism ?? 'E']).filter((p) => p !== 'uncompensatedOhm');
  const held = base.start?.shared?.uncompensatedOhm ?? 0;
  return [
    { label: `R_u held at ${held} Ω`, options: { ...base, free } },
    { label: 'R_u fitted', options: { ...base, free: [...free, 'uncompensatedOhm'] } },
  ];
}
