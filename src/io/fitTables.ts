/**
 * A whole-curve fit in words and rounded numbers, as the fit panel and the readable part of the
 * results sheet show it (one function for both, so the screen and the sheet cannot differ): one
 * row per parameter (value, standard error, 95 % interval, what the data say of it, the starting
 * value), the strongest correlations, and one line per fit for the sheet's model table. Values
 * carry the digits their standard error supports (core/statistics/roundToUncertainty: GUM §7.2.6);
 * a rate constant the data bound on one side only is written as that bound ("> 0.21"), never as a
 * number; C_dl is shown in µF cm⁻².
 */
import type { EstimateStatus, FitResult, ParameterEstimate } from '../core/fit';
import { roundingExponent } from '../core/statistics/roundToUncertainty';
import { shortLabel, shortName } from './fitContract';

/** Symbol, unit and display factor of each parameter (short names of the fit contract). */
export const FIT_PARAMETER_TEXT: Readonly<Record<string, { symbol: string; unit: string; factor: number }>> = {
  E0: { symbol: 'E°′', unit: 'V', factor: 1 },
  k0: { symbol: 'k°', unit: 'cm s⁻¹', factor: 1 },
  alpha: { symbol: 'α', unit: '', factor: 1 },
  D: { symbol: 'D_O', unit: 'cm² s⁻¹', factor: 1 },
  Dratio: { symbol: 'D_O/D_R', unit: '', factor: 1 },
  kf: { symbol: 'k_f', unit: 's⁻¹', factor: 1 },
  gamma: { symbol: 'Γ', unit: 'mol cm⁻²', factor: 1 },
  ks: { symbol: 'k_s', unit: 's⁻¹', factor: 1 },
  Ru: { symbol: 'R_u', unit: 'Ω', factor: 1 },
  Cdl: { symbol: 'C_dl', unit: 'µF cm⁻²', factor: 1e6 },
};

const READING: Record<EstimateStatus, string> = {
  estimate: 'fitted',
  'lower-bound': 'lower bound only',
  'upper-bound': 'upper bound only',
  undetermined: 'not determined by these data',
  fixed: 'held',
};

export interface FitParameterRow {
  /** 0-based couple in order of E°′; null for a value shared by all couples and files. */
  couple: number | null;
  /** Short name of the fit contract (E0, k0, alpha, …). */
  key: string;
  symbol: string;
  /** Unit of value, error and interval (E°′: "V vs <scale>"). */
  unit: string;
  value: string;
  error: string;
  interval: string;
  reading: string;
  start: string;
  status: EstimateStatus;
}

/** Plain number with `digits` significant digits, exponent form for very small or large magnitudes. */
function sig(x: number, digits: number): string {
  const a = Math.abs(x);
  if (a !== 0 && (a < 1e-3 || a >= 1e5)) return x.toExponential(digits - 1);
  return String(Number(x.toPrecision(digits)));
}

/** x to the last digit its standard error supports (at least two significant digits). */
export function withError(x: number, se: number | null): string {
  if (!Number.isFinite(x)) return '';
  if (se === null || !(se > 0) || x === 0) return sig(x, 4);
  const digits = Math.max(2, Math.min(12, Math.floor(Math.log10(Math.abs(x))) - roundingExponent(se) + 1));
  const a = Math.abs(x);
  if (a < 1e-3 || a >= 1e5) return x.toExponential(digits - 1);
  return x.toFixed(Math.max(0, -roundingExponent(se)));
}

/** The standard error to the one or two digits GUM §7.2.6 keeps, in the notation of its value x (fixed decimals or exponent). */
function errorText(se: number, x: number): string {
  const e = roundingExponent(se);
  const a = Math.abs(x);
  if (a >= 1e-3 && a < 1e5) return se.toFixed(Math.max(0, -e));
  return sig(se, Math.max(1, Math.floor(Math.log10(se)) - e + 1));
}

function parameterRow(r: FitResult, e: ParameterEstimate, scaleName: string): FitParameterRow {
  const key = shortName(e.parameter);
  const text = FIT_PARAMETER_TEXT[key] ?? { symbol: key, unit: '', factor: 1 };
  const f = text.factor;
  const se = e.standardError === null ? null : e.standardError * f;
  const lo = e.interval?.[0] ?? null;
  const hi = e.interval?.[1] ?? null;
  const at = (x: number | null) => (x === null ? '' : withError(x * f, se));
  const method = e.intervalMethod === 'profile' ? ' (95 %, profile)' : ' (95 %)';
  let value = at(e.value);
  if (e.status === 'lower-bound') value = `> ${sig((lo ?? Number.NaN) * f, 2)}`;
  else if (e.status === 'upper-bound') value = `< ${sig((hi ?? Number.NaN) * f, 2)}`;
  else if (e.status === 'undetermined') value = '';
  else if (e.status === 'fixed') value = sig(e.value * f, 6);
  const startValues = e.couple === null ? r.start.shared : r.start.couples[e.couple];
  const startRaw = startValues ? (startValues as unknown as Record<string, number>)[e.parameter] : undefined;
  return {
    couple: e.couple, key, symbol: text.symbol, unit: key === 'E0' ? `V vs ${scaleName}` : text.unit, value,
    error: e.status === 'estimate' && se !== null && se > 0 ? errorText(se, e.value * f) : '',
    interval: e.status === 'estimate' || e.status === 'lower-bound' || e.status === 'upper-bound' ? `${lo === null ? '' : at(lo)} … ${hi === null ? 'open' : at(hi)}` : '',
    reading: `${READING[e.status]}${e.status === 'lower-bound' || e.status === 'upper-bound' ? method : ''}${e.atSearchLimit && e.status === 'estimate' ? ', at the edge of its search range' : ''}`,
    start: e.free && startRaw !== undefined ? sig(startRaw * f, 3) : '',
    status: e.status,
  };
}

/** One row per parameter: each couple's in order of E°′, then the shared ones. */
export function fitParameterRows(r: FitResult, scaleName: string): FitParameterRow[] {
  return [...r.parameters].sort((a, b) => (a.couple ?? 99) - (b.couple ?? 99)).map((e) => parameterRow(r, e, scaleName));
}

export interface CorrelationPair {
  a: string;
  b: string;
  rho: number;
}

/** The `count` free-parameter pairs with the largest |ρ|, in symbols ("k° [1]" when there are several couples). */
export function strongestCorrelations(r: FitResult, count = 4): CorrelationPair[] {
  const { labels, matrix } = r.correlation;
  const several = r.values.couples.length > 1;
  const name = (label: string) => {
    const m = /^(\w+)(?:\[(\d+)\])?$/.exec(shortLabel(label));
    const symbol = FIT_PARAMETER_TEXT[m?.[1] ?? '']?.symbol ?? label;
    return several && m?.[2] ? `${symbol} [${m[2]}]` : symbol;
  };
  const pairs: CorrelationPair[] = [];
  for (let i = 0; i < labels.length; i++) {
    for (let j = 0; j < i; j++) {
      const rho = matrix[i]?.[j];
      if (rho !== null && rho !== undefined && Number.isFinite(rho)) pairs.push({ a: name(labels[j] as string), b: name(labels[i] as string), rho });
    }
  }
  return pairs.sort((x, y) => Math.abs(y.rho) - Math.abs(x.rho)).slice(0, count);
}
