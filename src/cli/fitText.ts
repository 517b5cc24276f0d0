/** The readable `fit` report (no --json): one block per couple, the shared values, the files, correlations, model choice and notes. */
import type { FitResult, ParameterEstimate } from '../core/fit';
import { shortLabel, shortName, type ComparisonSummary } from '../io';

const UNITS: Record<string, string> = { E0: 'V', k0: 'cm/s', alpha: '', D: 'cm²/s', Dratio: '', kf: '1/s', gamma: 'mol/cm²', ks: '1/s', Ru: 'Ω', Cdl: 'F/cm²' };
/** `digits` significant digits; exponent notation for very small or large magnitudes. */
function sig(x: number, digits: number): string {
  const a = Math.abs(x);
  return a !== 0 && (a < 1e-3 || a >= 1e5) ? x.toExponential(digits - 1) : x.toPrecision(digits);
}

/** A given or held number as it was entered: no padding zeros. */
const plain = (x: number) => (Math.abs(x) !== 0 && Math.abs(x) < 1e-3 ? Number(x.toPrecision(6)).toExponential() : String(Number(x.toPrecision(6))));

const g = (x: number | null | undefined) => (x === null || x === undefined || !Number.isFinite(x) ? '—' : sig(x, 4));

/** x with as many digits as its standard error warrants (two significant digits of the error, at least four of x). */
function withError(x: number | null | undefined, se: number | null | undefined): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '—';
  if (se === null || se === undefined || !Number.isFinite(se) || se <= 0 || x === 0) return g(x);
  const digits = Math.min(Math.max(Math.floor(Math.log10(Math.abs(x))) - Math.floor(Math.log10(se)) + 2, 4), 12);
  return sig(x, digits);
}

function estimateLine(e: ParameterEstimate): string {
  const key = shortName(e.parameter);
  const unit = UNITS[key] ?? '';
  const head = `  ${key.padEnd(7)}`;
  const lo = e.interval?.[0];
  const hi = e.interval?.[1];
  switch (e.status) {
    case 'fixed': return `${head}${plain(e.value)} ${unit} (held)`;
    case 'lower-bound': return `${head}> ${g(lo)} ${unit} (lower bound at 95 %, ${e.intervalMethod})`;
    case 'upper-bound': return `${head}< ${g(hi)} ${unit} (upper bound at 95 %, ${e.intervalMethod})`;
    case 'undetermined': return `${head}not determined by these data (value used: ${plain(e.value)})`;
    default: {
      const se = e.standardError;
      return `${head}${withError(e.value, se)} ${unit} ± ${se === null || !Number.isFinite(se) ? '—' : sig(se, 2)}   95 %: ${withError(lo, se)} … ${withError(hi, se)} (${e.intervalMethod})`;
    }
  }
}

function strongCorrelations(r: FitResult): string[] {
  const { labels, matrix } = r.correlation;
  const out: string[] = [];
  for (let i = 0; i < labels.length; i++) {
    for (let j = 0; j < i; j++) {
      const rho = matrix[i]?.[j];
      if (rho != null && Math.abs(rho) >= 0.8) out.push(`  ${shortLabel(labels[i] as string)} – ${shortLabel(labels[j] as string)}: ${rho.toFixed(3)}`);
    }
  }
  return out;
}

export function fitText(r: FitResult, files: string[], comparison: ComparisonSummary | null): string {
  const count = r.records.length;
  const lines = [
    `halfwave fit: mechanism ${r.mechanism}, ${r.values.couples.length} couple(s), ${count} voltammogram${count > 1 ? 's fitted jointly' : ''}`,
    `window ${r.windowV[0].toFixed(3)} … ${r.windowV[1].toFixed(3)} V, ${r.pointCount} points; ${r.converged ? 'converged' : 'NOT converged'} after ${r.iterations} iterations (${r.evaluations} evaluations, ${r.stopReason}); rms ${g(r.rmsA)} A`,
  ];
  r.values.couples.forEach((_, j) => {
    lines.push('', `couple ${j + 1} (in order of E°′)`, ...r.parameters.filter((e) => e.couple === j).map(estimateLine));
  });
  lines.push('', 'shared by all couples and files', ...r.parameters.filter((e) => e.couple === null).map(estimateLine));
  lines.push('', 'files');
  r.records.forEach((rec, k) => {
    const bg = rec.background ? `, background ${g(rec.background.offsetA)} A + ${g(rec.background.slopeAPerV)} A/V·E` : '';
    lines.push(`  ${files[k] ?? `voltammogram ${k + 1}`}: v = ${plain(rec.scanRateVPerS)} V/s, ${rec.pointCount} points, rms ${g(rec.rmsA)} A${bg}`);
  });
  const strong = strongCorrelations(r);
  if (strong.length) lines.push('', 'correlations with |ρ| ≥ 0.8', ...strong);
  lines.push('', `AIC ${r.criteria.aic.toFixed(1)}, BIC ${r.criteria.bic.toFixed(1)} (${r.criteria.parameterCount} fitted parameters)`);
  if (comparison) {
    lines.push('', 'model choice (recommendation only)', ...comparison.candidates.map((c) => `  ${c.label.padEnd(18)} BIC ${c.bic.toFixed(1)} (Δ ${c.deltaBic.toFixed(1)}), AIC ${c.aic.toFixed(1)} (Δ ${c.deltaAic.toFixed(1)})`), `  ${comparison.recommendation}`);
  }
  if (r.notes.length) lines.push('', 'notes', ...r.notes.map((n) => `  - ${n}`));
  return `${lines.join('\n')}\n`;
}
