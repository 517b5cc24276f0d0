/**
 * Assembles the FitResult of a finished fit: couples put in order of E°′ (estimates, values,
 * starting values and correlation labels follow), the per-voltammogram residuals, background
 * lines and model currents, the information criteria and the notes (a systematic misfit,
 * lackOfFit.ts, first).
 * Criteria: AIC = m·ln(S/m) + 2k (H. Akaike, IEEE Trans. Autom. Control 19 (1974) 716) and
 *   BIC = m·ln(S/m) + k·ln m (G. Schwarz, Ann. Stat. 6 (1978) 461), for Gaussian errors of
 *   unknown variance, k = free parameters including the background terms (from memory).
 */
import type { EstimatesResult } from './fitEstimates';
import { fitNotes } from './fitNotes';
import { lackOfFit } from './lackOfFit';
import type { StraightLine } from './backgroundProjection';
import { residualsAt, type FitContext } from './fitProblem';
import type { FitMechanism, FitModelValues, FitResult, RecordFit } from './fitTypes';

export interface ReportInput {
  ctx: FitContext;
  mechanism: FitMechanism;
  values: FitModelValues;
  start: FitModelValues;
  costA2: number;
  estimates: EstimatesResult;
  windowV: [number, number];
  iterations: number;
  evaluations: number;
  converged: boolean;
  stopReason: string;
  notes: string[];
}

export function informationCriteria(costA2: number, pointCount: number, parameterCount: number): FitResult['criteria'] {
  const base = pointCount * Math.log(costA2 / pointCount);
  return { aic: base + 2 * parameterCount, bic: base + parameterCount * Math.log(pointCount), parameterCount };
}

export function assembleFitResult(a: ReportInput): FitResult {
  const { ctx, values } = a;
  const order = values.couples.map((c, j) => ({ e: c.formalPotentialV, j })).sort((x, y) => x.e - y.e).map((x) => x.j);
  const rank = (j: number | null) => (j === null ? null : order.indexOf(j));
  const reorder = (v: FitModelValues): FitModelValues => ({ couples: order.map((j) => ({ ...v.couples[j]! })), shared: { ...v.shared } });
  const parameters = a.estimates.estimates.map((e) => ({ ...e, couple: rank(e.couple) }));
  // The correlation is over the fit's free parameters (its layout), which a rate held at the
  // reversible limit has left (fitVoltammograms.ts) though it is still reported as asked free.
  const labels = ctx.layout.entries.map((e) => (e.couple === null ? e.parameter : `${e.parameter}[${(rank(e.couple) as number) + 1}]`));
  const correlation = { labels, matrix: a.estimates.covariance.correlation.map((row) => row.map((x) => (x === null ? null : Number(x.toFixed(6))))) };
  const m = ctx.measuredA.length;
  const extra = ctx.background ? 2 * ctx.model.records.length : 0;
  const residualsA = new Float64Array(m);
  const lines = residualsAt(ctx, values, residualsA);
  const result: FitResult = {
    mechanism: a.mechanism, values: reorder(values), start: reorder(a.start), parameters, correlation, windowV: a.windowV,
    pointCount: m, rmsA: Math.sqrt(a.costA2 / m), residualStdA: a.estimates.covariance.residualStdA,
    degreesOfFreedom: a.estimates.covariance.degreesOfFreedom, iterations: a.iterations, evaluations: a.evaluations,
    converged: a.converged, stopReason: a.stopReason, criteria: informationCriteria(a.costA2, m, ctx.layout.size + extra),
    records: recordFits(ctx, residualsA, lines), notes: [],
  };
  const misfit = lackOfFit(ctx.model.records, residualsA, a.mechanism).note;
  result.notes = [...(misfit ? [misfit] : []), ...fitNotes(result, values.couples.length), ...a.notes];
  return result;
}

function recordFits(ctx: FitContext, r: Float64Array, lines: StraightLine[] | null): RecordFit[] {
  return ctx.model.records.map((rec, k) => {
    const n = rec.indices.length;
    const modelA = new Float64Array(n);
    let ss = 0;
    for (let i = 0; i < n; i++) {
      const res = r[rec.offset + i] as number;
      modelA[i] = (rec.currentA[i] as number) - res;
      ss += res * res;
    }
    return { scanRateVPerS: rec.scanRateVPerS, pointCount: n, rmsA: Math.sqrt(ss / n), background: lines ? lines[k]! : null, indices: rec.indices, modelA };
  });
}
