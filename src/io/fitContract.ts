/**
 * The `fit --json` object, also one entry of the results sheet's `fits` (fitSheet.ts). Fixed fields (outside checks depend on them): mechanism, params
 * (first couple in E°′ order, plus R_u and C_dl), stderr, bounds, couples[] (same keys per couple,
 * each with its own stderr, bounds and status), correlation, rms, iterations, converged, notes.
 * Everything else is an extra field. Units: E0 V, k0 cm/s, D cm²/s, kf and ks 1/s, gamma mol/cm²,
 * Ru Ω, Cdl F/cm², rms A. A value that the data give only as a bound, or not at all, is null in
 * params/couples; its interval is in bounds ([lo, null] for a lower bound).
 */
import type { CoupleParameter, EvidenceGrade, FitParameter, FitResult, ModelComparison, ParameterEstimate, SharedParameter } from '../core/fit';

/**
 * A model comparison without the candidates' whole fits: what the contract, the results sheet and
 * the screen show of it (and what crosses from the worker to the page).
 */
export interface ComparisonSummary {
  preferred: string;
  evidence: EvidenceGrade;
  recommendation: string;
  candidates: { label: string; aic: number; bic: number; deltaAic: number; deltaBic: number; converged: boolean; parameterCount: number }[];
}

export function summariseComparison(c: ModelComparison): ComparisonSummary {
  return {
    preferred: c.preferred, evidence: c.evidence, recommendation: c.recommendation,
    candidates: c.candidates.map((k) => ({ label: k.label, aic: k.aic, bic: k.bic, deltaAic: k.deltaAic, deltaBic: k.deltaBic, converged: k.result.converged, parameterCount: k.result.criteria.parameterCount })),
  };
}

/** Short CLI names of the fit parameters and their core names. */
export const PARAMETER_NAMES: Readonly<Record<string, FitParameter>> = {
  E0: 'formalPotentialV', k0: 'k0CmPerS', alpha: 'alpha', D: 'diffusionOCm2PerS', Dratio: 'diffusionRatio', kf: 'followUpRatePerS',
  gamma: 'coverageMolPerCm2', ks: 'surfaceRatePerS', Ru: 'uncompensatedOhm', Cdl: 'doubleLayerFPerCm2', background: 'background',
};
const SHORT: Record<string, string> = Object.fromEntries(Object.entries(PARAMETER_NAMES).map(([k, v]) => [v, k]));

const num = (x: number | null | undefined): number | null => (x === null || x === undefined || !Number.isFinite(x) ? null : x);

export const shortName = (p: CoupleParameter | SharedParameter | string): string => SHORT[p] ?? p;

/** Value as a number only when the data determine it (or it was held). */
function valueOf(e: ParameterEstimate): number | null {
  return e.status === 'estimate' || e.status === 'fixed' ? num(e.value) : null;
}

function coupleEntry(r: FitResult, couple: number) {
  const order = Object.values(PARAMETER_NAMES) as string[];
  const list = r.parameters.filter((e) => e.couple === couple || e.couple === null).sort((a, b) => order.indexOf(a.parameter) - order.indexOf(b.parameter));
  const out: Record<string, unknown> = {};
  const stderr: Record<string, number | null> = {};
  const bounds: Record<string, [number | null, number | null]> = {};
  const status: Record<string, string> = {};
  for (const e of list) {
    const key = shortName(e.parameter);
    out[key] = valueOf(e);
    stderr[key] = e.status === 'estimate' ? num(e.standardError) : null;
    if (e.interval) bounds[key] = [num(e.interval[0]), num(e.interval[1])];
    status[key] = e.status;
  }
  return { values: out, stderr, bounds, status };
}

export function fitContract(r: FitResult, files: string[], comparison: ComparisonSummary | null) {
  const couples = r.values.couples.map((_, j) => coupleEntry(r, j));
  const first = couples[0] ?? { values: {}, stderr: {}, bounds: {}, status: {} };
  return {
    mechanism: r.mechanism,
    params: first.values,
    stderr: first.stderr,
    bounds: first.bounds,
    couples: couples.map((c) => ({ ...c.values, stderr: c.stderr, bounds: c.bounds, status: c.status })),
    correlation: { labels: r.correlation.labels.map(shortLabel), matrix: r.correlation.matrix },
    rms: r.rmsA,
    iterations: r.iterations,
    converged: r.converged,
    notes: [...r.notes, ...(comparison ? [`model choice: ${comparison.recommendation}`] : [])],
    window: r.windowV,
    points: r.pointCount,
    residualStd: num(r.residualStdA),
    evaluations: r.evaluations,
    stopReason: r.stopReason,
    criteria: { aic: r.criteria.aic, bic: r.criteria.bic, parameters: r.criteria.parameterCount },
    files: r.records.map((rec, k) => ({ file: files[k] ?? `voltammogram ${k + 1}`, scanRate: rec.scanRateVPerS, points: rec.pointCount, rms: rec.rmsA, background: rec.background })),
    status: first.status,
    modelChoice: comparison ? {
      preferred: comparison.preferred, evidence: comparison.evidence, recommendation: comparison.recommendation,
      candidates: comparison.candidates.map((c) => ({ model: c.label, bic: c.bic, aic: c.aic, deltaBic: c.deltaBic, deltaAic: c.deltaAic, converged: c.converged })),
    } : null,
  };
}

/** 'k0CmPerS[2]' → 'k0[2]'. */
export function shortLabel(label: string): string {
  const m = /^(\w+)(\[\d+\])?$/.exec(label);
  return m ? `${shortName(m[1] as string)}${m[2] ?? ''}` : label;
}
