/**
 * Reads the free-text lines above the table: key/value pairs ("Operator: A. N. Other",
 * "scan rate = 100 mV/s", "Area;0,0707;cm2"), and from them the scan rate, reference electrode,
 * temperature, electrode area, concentration and the file's current sign convention.
 * Unit factors: BIPM SI Brochure, 9th ed. (2019), Table 7; 0 °C = 273.15 K (SI Brochure sect. 2.3.1).
 * 1 mM = 1e-6 mol/cm³ (1 L = 1000 cm³, SI Brochure Table 8).
 */
import type { CurrentConvention, PreambleValue } from './types';
import { readScanRateLine } from './readScanRate';
import { NUMBER_PATTERN as NUMBER } from './textLines';

export interface PreambleReading {
  metadata: Record<string, string>;
  scanRateVPerS: PreambleValue | null;
  referenceElectrode: { value: string; line: number } | null;
  temperatureK: PreambleValue | null;
  areaCm2: PreambleValue | null;
  concentrationMolPerCm3: PreambleValue | null;
  convention: { value: CurrentConvention; line: number; text: string } | null;
}

const MAX_LINE_CHARS = 1000;
/** "Reference electrode" in the languages of the column names (headerNames.ts): common practice, no source. */
const REFERENCE_KEY = /\bref(erence)?\b|^re$|referenz|bezugselektrode|referencia|r[ée]f[ée]rence|riferimento|refer[êe]ncia|odniesienia/;

/** `lines` are the preamble lines; `firstLine` is the 1-based file line of lines[0]. */
export function readPreamble(lines: string[], firstLine = 1): PreambleReading {
  const out: PreambleReading = { metadata: {}, scanRateVPerS: null, referenceElectrode: null, temperatureK: null, areaCm2: null, concentrationMolPerCm3: null, convention: null };
  let fromSample: PreambleValue | null = null;
  lines.forEach((raw, i) => {
    const line = firstLine + i;
    // Only the head of a very long line is read: the patterns below stay linear, the metadata short.
    const text = raw.slice(0, MAX_LINE_CHARS).replace(/^\s*(#|%|\/\/|;|!)+\s*/, '').trim();
    if (!text) return;
    const kv = splitKeyValue(text);
    if (kv) addMetadata(out.metadata, kv.key, kv.value);
    // "Scan rate;100;mV/s" reads as "Scan rate: 100 mV/s" once split into key and value.
    out.scanRateVPerS ??= readScanRateLine(text, line) ?? (kv ? withText(readScanRateLine(`${kv.key}: ${kv.value}`, line), text) : null);
    out.convention ??= readConvention(text, line);
    if (!kv) return;
    const key = kv.key.toLowerCase();
    const value = kv.value;
    if (!out.referenceElectrode && REFERENCE_KEY.test(key) && !/\d\s*(v|mv)\b/i.test(value)) out.referenceElectrode = { value, line };
    if (/temp/.test(key)) out.temperatureK ??= readTemperature(`${key} ${value}`, line, text);
    if (/area/.test(key)) out.areaCm2 ??= readArea(`${key} ${value}`, line, text);
    // "Working electrode: carbon paste, 3 mm disk (0.0707 cm2)": an area in squared units.
    const squared = /(\d+(?:[.,]\d+)?(?:[eE][+-]?\d+)?)\s*(cm\^?2|cm²|mm\^?2|mm²)/.exec(value);
    if (squared && /electrode|disk|disc|\bwe\b/.test(key)) out.areaCm2 ??= readArea(squared[0], line, text);
    if (/conc|^c$|^c0$/.test(key)) out.concentrationMolPerCm3 ??= readConcentration(`${key} ${value}`, line, text);
    // "Sample: 0.5 mM compound in 0.1 M KCl": the first concentration named is the analyte's.
    if (/sample|analyte|solution/.test(key)) fromSample ??= readConcentration(value, line, text);
  });
  out.concentrationMolPerCm3 ??= fromSample;
  return out;
}

/**
 * "Key: value" and "Key = value" first; otherwise a delimited "Key;value;unit" line, whose key
 * must look like a label (short, no unbalanced bracket), so prose with a comma is not split.
 */
function splitKeyValue(text: string): { key: string; value: string } | null {
  const named = /^([^:=]{1,60}?)\s*[:=]\s*(.*)$/.exec(text);
  if (named && !/^\d/.test(named[1] as string) && !/[([][^)\]]*$/.test(named[1] as string)) {
    return { key: (named[1] as string).trim(), value: (named[2] as string).replace(/[;,\t\s]+$/, '').trim() };
  }
  const fields = text.split(/\t|;|,(?!\d)/).map((f) => f.trim()).filter(Boolean);
  const key = fields[0] ?? '';
  if (fields.length < 2 || fields.length > 4 || key.length > 40 || /^\d/.test(key) || /[([][^)\]]*$/.test(key)) return null;
  return { key, value: fields.slice(1).join(' ') };
}

function withText(v: PreambleValue | null, text: string): PreambleValue | null {
  return v && { ...v, text };
}

function addMetadata(md: Record<string, string>, key: string, value: string): void {
  let k = key;
  for (let n = 2; k in md; n++) k = `${key} (${n})`;
  md[k] = value;
}

function toNumber(s: string): number {
  return Number(s.replace(',', '.'));
}

function readConvention(text: string, line: number): PreambleReading['convention'] {
  if (/polarographic|classical\s+convention|us\s+convention|cathodic\s+(currents?\s+)?(are\s+|is\s+)?positive|anodic\s+(currents?\s+)?(are\s+|is\s+)?negative/i.test(text)) return { value: 'polarographic', line, text };
  if (/\biupac\b|anodic\s+(currents?\s+)?(are\s+|is\s+)?positive|cathodic\s+(currents?\s+)?(are\s+|is\s+)?negative/i.test(text)) return { value: 'iupac', line, text };
  return null;
}

function readTemperature(s: string, line: number, text: string): PreambleValue | null {
  const m = new RegExp(`${NUMBER}\\s*(°\\s*C|ºC|deg\\s*C|C|K|°\\s*F|F)?\\b`, 'i').exec(s.replace(/^[a-z\s.]*?(?=[+-]?\d)/i, ''));
  if (!m) return null;
  const v = toNumber(m[1] as string);
  const unit = (m[2] ?? '').replace(/[\s°º]|deg/gi, '').toUpperCase();
  const k = unit === 'K' ? v : unit === 'F' ? ((v - 32) * 5) / 9 + 273.15 : v + 273.15;
  return Number.isFinite(k) && k > 0 ? { value: k, line, text } : null;
}

function readArea(s: string, line: number, text: string): PreambleValue | null {
  const m = new RegExp(`${NUMBER}\\s*(cm\\^?2|cm²|mm\\^?2|mm²|m\\^?2|m²)?`, 'i').exec(s.replace(/^[^\d+-]*/, ''));
  if (!m) return null;
  const v = toNumber(m[1] as string);
  const u = (m[2] ?? 'cm2').toLowerCase();
  const f = u.startsWith('mm') ? 0.01 : u.startsWith('cm') ? 1 : 1e4;
  const keyUnit = /\(\s*mm\^?[2²]\s*\)/i.test(s) ? 0.01 : 1;
  return Number.isFinite(v) && v > 0 ? { value: v * (m[2] ? f : keyUnit), line, text } : null;
}

function readConcentration(s: string, line: number, text: string): PreambleValue | null {
  const m = new RegExp(`${NUMBER}\\s*(mM|µM|uM|nM|M|mmol\\s*/\\s*L|mol\\s*/\\s*L|mol\\s*/\\s*cm3|mol\\s*/\\s*cm³|mol\\s*dm-3)\\b`, 'i').exec(s);
  if (!m) return null;
  const v = toNumber(m[1] as string);
  const u = (m[2] as string).replace(/\s/g, '');
  const perL: Record<string, number> = { mM: 1e-3, mm: 1e-3, 'µM': 1e-6, uM: 1e-6, um: 1e-6, nM: 1e-9, nm: 1e-9, M: 1, m: 1 };
  const molPerL = perL[u] ?? (/^mmol/i.test(u) ? 1e-3 : /cm/i.test(u) ? 1000 : 1);
  return Number.isFinite(v) && v >= 0 ? { value: (v * molPerL) / 1000, line, text } : null;
}
