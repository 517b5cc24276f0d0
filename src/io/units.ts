/**
 * Units as instruments write them, and their factors to the core's units (V, A, s, A/cm²).
 * Prefixes and symbols: BIPM, The International System of Units (SI Brochure), 9th ed. (2019),
 * Table 7 (SI prefixes) and sect. 5.2 (writing unit symbols). "u" for micro is a common ASCII
 * stand-in (common practice, no source); U+00B5 MICRO SIGN and U+03BC GREEK SMALL LETTER MU are
 * both accepted, as is "Âµ" (a UTF-8 µ wrongly read as Latin-1).
 */
import type { CurrentUnit, PotentialUnit, TimeUnit } from './types';

export type UnitKind = 'potential' | 'current' | 'currentDensity' | 'time' | 'charge';

export interface ParsedUnit {
  kind: UnitKind;
  /** Canonical symbol, e.g. 'mV', 'µA', 'mA/cm²'. */
  symbol: string;
  /** Multiply a value in this unit by `factor` to get V, A, A/cm², s or C. */
  factor: number;
}

const PER_AREA_TO_PER_CM2: Record<string, number> = { 'mm²': 100, 'cm²': 1, 'm²': 1e-4 };
const PREFIX: Record<string, number> = { '': 1, k: 1e3, m: 1e-3, 'µ': 1e-6, n: 1e-9, p: 1e-12 };

export const POTENTIAL_FACTORS: Record<PotentialUnit, number> = { V: 1, mV: 1e-3, 'µV': 1e-6 };
export const CURRENT_FACTORS: Record<CurrentUnit, number> = { A: 1, mA: 1e-3, 'µA': 1e-6, nA: 1e-9, pA: 1e-12 };
export const TIME_FACTORS: Record<TimeUnit, number> = { s: 1, ms: 1e-3, 'µs': 1e-6, min: 60, h: 3600 };

/**
 * Replaces the spellings of micro by U+00B5 (also "Âµ" and "Î¼": a UTF-8 µ or μ read as
 * Latin-1), superscripts and the minus sign U+2212 by ASCII, and strips blanks, brackets and
 * the multiplication dot: "µA·cm⁻²" → "µAcm-2".
 */
export function normaliseUnitText(raw: string): string {
  return raw
    .replace(/Âµ|Î¼|\u03bc/g, 'µ')
    .replace(/[[\](){}·]/g, '')
    .replace(/\s+/g, '')
    .replace(/[−⁻]/g, '-')
    .replace(/²/g, '2')
    .replace(/¹/g, '1')
    .replace(/\^/g, '');
}

/** Parses a unit symbol such as "mV", "uA", "µA/cm2", "ms", "min"; null when not recognised. */
export function parseUnit(raw: string): ParsedUnit | null {
  const u = unitWords(normaliseUnitText(raw));
  const time = /^(ms|µs|us|s|sec|secs|seconds?|min|mins|minutes?|h|hr|hours?)$/i.exec(u);
  if (time) return timeUnit(time[1] as string);
  const m = /^([kmµunp]?)(V|A|C)((?:\/|per)?(?:cm2|cm-2|mm2|mm-2|m2|m-2))?$/i.exec(u);
  if (!m) return null;
  const prefixRaw = m[1] as string;
  const prefix = prefixRaw === 'u' || prefixRaw === 'U' ? 'µ' : prefixRaw === 'K' ? 'k' : prefixRaw === 'M' ? 'm' : prefixRaw;
  const base = (m[2] as string).toUpperCase();
  const factor = PREFIX[prefix];
  if (factor === undefined) return null;
  // Only a current comes per area here ("cm2" alone is not "C per m²").
  if (base !== 'A' && m[3]) return null;
  if (base === 'V') return { kind: 'potential', symbol: `${prefix}V`, factor };
  if (base === 'C') return { kind: 'charge', symbol: `${prefix}C`, factor };
  const area = m[3];
  if (!area) return { kind: 'current', symbol: `${prefix}A`, factor };
  // Factors to A/cm²: 1 mm² = 1e-2 cm², 1 m² = 1e4 cm² (SI Brochure Table 8 area units).
  const per = /mm/i.test(area) ? 'mm²' : /cm/i.test(area) ? 'cm²' : 'm²';
  return { kind: 'currentDensity', symbol: `${prefix}A/${per}`, factor: factor * (PER_AREA_TO_PER_CM2[per] as number) };
}

/**
 * Units spelt out, as some exports write them: "Volts", "millivolts", "microamps", "Amperes",
 * "nanoamperes" → V, mV, µA, A, nA. Only whole words of a potential or a current.
 */
function unitWords(u: string): string {
  const m = /^(milli|micro|nano|pico|kilo)?(volts?|amps?|amperes?)$/i.exec(u);
  if (!m) return u;
  const prefix = { milli: 'm', micro: 'µ', nano: 'n', pico: 'p', kilo: 'k' }[(m[1] ?? '').toLowerCase()] ?? '';
  return `${prefix}${/^v/i.test(m[2] as string) ? 'V' : 'A'}`;
}

function timeUnit(t: string): ParsedUnit {
  const l = t.toLowerCase();
  if (l === 'ms') return { kind: 'time', symbol: 'ms', factor: 1e-3 };
  if (l === 'µs' || l === 'us') return { kind: 'time', symbol: 'µs', factor: 1e-6 };
  if (l.startsWith('min')) return { kind: 'time', symbol: 'min', factor: 60 };
  if (l.startsWith('h')) return { kind: 'time', symbol: 'h', factor: 3600 };
  return { kind: 'time', symbol: 's', factor: 1 };
}

/** Parses a user-given unit for one quantity; null when the text is not a unit of that kind. */
export function parseUnitOf<K extends 'potential' | 'current' | 'time'>(kind: K, raw: string): string | null {
  const p = parseUnit(raw);
  if (!p || p.kind !== kind) return null;
  const table: Record<string, number> = kind === 'potential' ? POTENTIAL_FACTORS : kind === 'current' ? CURRENT_FACTORS : TIME_FACTORS;
  return p.symbol in table ? p.symbol : null;
}

/**
 * Scan-rate units: V/s, mV/s, mV s-1, mV·s⁻¹, mVs, Vps, mV/sec; returns the factor to V/s.
 */
export function scanRateUnitFactor(raw: string): number | null {
  const u = normaliseUnitText(raw).replace(/[·.*]/g, '').replace(/⁻¹/g, '-1');
  const m = /^([mµu]?)V(?:\/s|\/sec|s-1|sec-1|ps|s|pers|persec|\/second)$/i.exec(u);
  if (!m) return null;
  const p = (m[1] as string).toLowerCase();
  return p === 'm' ? 1e-3 : p === '' ? 1 : 1e-6;
}
