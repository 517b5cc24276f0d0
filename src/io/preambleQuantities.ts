/**
 * The cell quantities a preamble line states, read from its key and value: the electrode area
 * ("Area: 0.0707 cm2", "Area (mm2): 7.07", "Fläche;0,0707 cm²"), a disk's diameter ("Electrode
 * diameter: 3 mm", "Diameter (mm) = 3"), the temperature ("Temperature (K): 298.15") and the
 * concentration ("Concentration (mM): 1"). A unit written after the number wins over one in
 * brackets at the end of the key; the number is always read from the value, never from the key
 * (the "2" of "cm2" is a unit's exponent, not an area). Values in core units (cm², K, mol/cm³).
 * Unit factors: BIPM SI Brochure, 9th ed. (2019), Table 7 (prefixes); 0 °C = 273.15 K (sect.
 * 2.3.1); 1 L = 1000 cm³ (Table 8). Area of a disk π d²/4 (core/units.ts diskAreaCm2). Key words
 * in the languages of the column names (headerNames.ts): common practice, no source.
 */
import { diskAreaCm2 } from '../core/units';
import { NUMBER_PATTERN as NUMBER } from './textLines';
import type { PreambleValue } from './types';

/** "Area (cm2)" → name "Area", unit "cm2"; "Area" → unit ''. */
export function splitKeyUnit(key: string): { name: string; unit: string } {
  const m = /^(.*?)\s*[([]\s*([^()[\]]{0,30}?)\s*[)\]]\s*$/.exec(key);
  return m ? { name: (m[1] as string).trim(), unit: m[2] as string } : { name: key.trim(), unit: '' };
}

/** Words for the electrode area; only "area" itself is read without a unit (then cm² is assumed, as before). */
export const AREA_KEY = /area|[áa]rea|fl[äa]che|flaeche|superficie|powierzchnia|surface/i;
export const DIAMETER_KEY = /diameter|durchmesser|di[áa]metro|diam[èe]tre|[śs]rednica/i;
export const CONCENTRATION_KEY = /conc|konz|st[eę][zż]enie|^c$|^c0$/i;

const AREA_UNITS: [RegExp, number][] = [[/^mm\s*\^?\s*[2²]$/i, 0.01], [/^cm\s*\^?\s*[2²]$|^sq\.?\s*cm$/i, 1], [/^[µμu]m\s*\^?\s*[2²]$/i, 1e-8], [/^m\s*\^?\s*[2²]$/i, 1e4]];
const LENGTH_UNITS: Record<string, number> = { mm: 0.1, cm: 1, µm: 1e-4, μm: 1e-4, um: 1e-4 };
const VALUE_AREA = new RegExp(`${NUMBER}\\s*((?:mm|cm|[µμu]m|m)\\s*\\^?\\s*[2²]|sq\\.?\\s*cm)?(?!\\s*[a-zµμ0-9])`, 'i');
const VALUE_LENGTH = new RegExp(`${NUMBER}\\s*(mm|cm|[µμu]m)?(?![a-z0-9²^])`, 'i');

const toNumber = (s: string) => Number(s.replace(',', '.'));
const factorOf = (unit: string, table: [RegExp, number][]) => table.find(([re]) => re.test(unit.trim()))?.[1] ?? null;

/**
 * The area a key/value pair states, or null. `unitRequired`: a key word other than "area" itself
 * (a localized or wider word) counts only with an area unit in the value or the key.
 */
export function readArea(key: string, value: string, line: number, text: string, unitRequired: boolean): PreambleValue | null {
  const m = VALUE_AREA.exec(value);
  if (!m) return null;
  // A bracketed word in the key ("Area (geometric)") is no unit; "(in2)" is one, and not an area unit here.
  const keyUnit = splitKeyUnit(key).unit;
  const written = m[2] ?? (/[2²^]|^sq/i.test(keyUnit) ? keyUnit : '');
  const f = written ? factorOf(written, AREA_UNITS) : unitRequired ? null : 1;
  const v = toNumber(m[1] as string);
  return f !== null && Number.isFinite(v) && v > 0 ? { value: v * f, line, text } : null;
}

/** A disk's diameter as its geometric area, or null; the length unit must be written (value or key). */
export function readDiameterArea(key: string, value: string, line: number, text: string): PreambleValue | null {
  const m = VALUE_LENGTH.exec(value);
  if (!m) return null;
  const unit = (m[2] ?? splitKeyUnit(key).unit).trim();
  const f = LENGTH_UNITS[unit.toLowerCase()] ?? LENGTH_UNITS[unit];
  const dCm = toNumber(m[1] as string) * (f ?? NaN);
  return dCm > 0 && dCm < 10 ? { value: diskAreaCm2(dCm), line, text: `${text} (disk of ${m[1]} ${unit}: π d²/4)` } : null;
}

/**
 * Temperature in K. With no unit anywhere, a value up to 150 is taken as °C (as labs write it), one
 * from 200 to 400 as K (no liquid cell runs at 200–400 °C in such files, and 298 read as °C would
 * be 571 K), and anything else is not used; the text says which reading was made.
 */
export function readTemperature(key: string, value: string, line: number, text: string): PreambleValue | null {
  const m = new RegExp(`${NUMBER}\\s*(°\\s*C|ºC|deg\\s*C|C|K|°\\s*F|F)?\\b`, 'i').exec(value);
  if (!m) return null;
  const written = m[2] ?? splitKeyUnit(key).unit;
  const unit = written.replace(/[\s°º.]|deg(rees?)?/gi, '').replace(/^celsius$/i, 'C').replace(/^kelvin$/i, 'K').replace(/^fahrenheit$/i, 'F').toUpperCase();
  if (unit && !['C', 'K', 'F'].includes(unit)) return null;
  const v = toNumber(m[1] as string);
  if (!unit) {
    if (v >= 200 && v <= 400) return { value: v, line, text: `${text} (no unit: read as K)` };
    if (!(v > -50 && v <= 150)) return null;
    return { value: v + 273.15, line, text: `${text} (no unit: read as °C)` };
  }
  const k = unit === 'K' ? v : unit === 'F' ? ((v - 32) * 5) / 9 + 273.15 : v + 273.15;
  return Number.isFinite(k) && k > 0 ? { value: k, line, text } : null;
}

const CONC_UNIT = '(mM|µM|μM|uM|nM|M|mmol\\s*/\\s*L|mol\\s*/\\s*L|mol\\s*/\\s*cm3|mol\\s*/\\s*cm³|mol\\s*dm-3)';
const PER_L: Record<string, number> = { mM: 1e-3, mm: 1e-3, µM: 1e-6, μM: 1e-6, uM: 1e-6, um: 1e-6, nM: 1e-9, nm: 1e-9, M: 1, m: 1 };

/** Concentration in mol/cm³ from a number followed by its unit, or from a number and the key's unit. */
export function readConcentration(key: string, value: string, line: number, text: string): PreambleValue | null {
  const withUnit = new RegExp(`${NUMBER}\\s*${CONC_UNIT}\\b`, 'i').exec(value);
  const keyUnit = splitKeyUnit(key).unit.trim();
  const bare = !withUnit && keyUnit && new RegExp(`^${CONC_UNIT}$`, 'i').test(keyUnit) ? new RegExp(`^\\s*${NUMBER}\\s*$`).exec(value) : null;
  const num = withUnit?.[1] ?? bare?.[1];
  const unitText = withUnit?.[2] ?? (bare ? keyUnit : undefined);
  if (num === undefined || unitText === undefined) return null;
  const u = unitText.replace(/\s/g, '');
  const molPerL = PER_L[u] ?? (/^mmol/i.test(u) ? 1e-3 : /cm/i.test(u) ? 1000 : 1);
  const v = toNumber(num);
  return Number.isFinite(v) && v >= 0 ? { value: (v * molPerL) / 1000, line, text } : null;
}
