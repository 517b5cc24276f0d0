/**
 * Reads the free-text lines above the table: key/value pairs ("Operator: A. N. Other",
 * "scan rate = 100 mV/s", "Area;0,0707;cm2"), and from them the scan rate, reference electrode,
 * temperature, electrode area, concentration and the file's current sign convention.
 * Unit factors: BIPM SI Brochure, 9th ed. (2019), Table 7; 0 °C = 273.15 K (SI Brochure sect. 2.3.1).
 * 1 mM = 1e-6 mol/cm³ (1 L = 1000 cm³, SI Brochure Table 8).
 */
import type { CurrentConvention, PreambleValue } from './types';
import { readScanRateLine, unitlessScanRateLine } from './readScanRate';
import { AREA_KEY, CONCENTRATION_KEY, DIAMETER_KEY, readArea, readConcentration, readDiameterArea, readTemperature, splitKeyUnit } from './preambleQuantities';

export interface PreambleReading {
  metadata: Record<string, string>;
  scanRateVPerS: PreambleValue | null;
  /** A scan-rate line with a number but no unit (the bare number), not used as the rate. */
  scanRateWithoutUnit: PreambleValue | null;
  referenceElectrode: { value: string; line: number } | null;
  temperatureK: PreambleValue | null;
  areaCm2: PreambleValue | null;
  concentrationMolPerCm3: PreambleValue | null;
  convention: { value: CurrentConvention; line: number; text: string } | null;
}

const MAX_LINE_CHARS = 1000;
/** "Reference electrode" in the languages of the column names (headerNames.ts): common practice, no source. */
const REFERENCE_KEY = /\bref(erence)?\b|^re$|referenz|bezugselektrode|referencia|r[ée]f[ée]rence|riferimento|refer[êe]ncia|odniesienia/;
/** A counter electrode's size is not the working electrode's: common practice, no source. */
const COUNTER_KEY = /counter|auxiliary|\bce\b|gegenelektrode|contraelectrodo|contre/;

/** `lines` are the preamble lines; `firstLine` is the 1-based file line of lines[0]. */
export function readPreamble(lines: string[], firstLine = 1): PreambleReading {
  const out: PreambleReading = { metadata: {}, scanRateVPerS: null, scanRateWithoutUnit: null, referenceElectrode: null, temperatureK: null, areaCm2: null, concentrationMolPerCm3: null, convention: null };
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
    out.scanRateWithoutUnit ??= unitlessScanRateLine(text, line) ?? (kv ? withText(unitlessScanRateLine(`${kv.key}: ${kv.value}`, line), text) : null);
    out.convention ??= readConvention(text, line);
    if (!kv) return;
    const key = kv.key.toLowerCase();
    const value = kv.value;
    if (!out.referenceElectrode && REFERENCE_KEY.test(key) && !/\d\s*(v|mv)\b/i.test(value)) out.referenceElectrode = { value, line };
    const keyName = splitKeyUnit(key).name;
    if (/temp/.test(keyName)) out.temperatureK ??= readTemperature(kv.key, value, line, text);
    if (AREA_KEY.test(keyName)) out.areaCm2 ??= readArea(kv.key, value, line, text, !/\barea\b/.test(keyName));
    if (DIAMETER_KEY.test(keyName) && !REFERENCE_KEY.test(keyName) && !COUNTER_KEY.test(keyName)) out.areaCm2 ??= readDiameterArea(kv.key, value, line, text);
    // "Working electrode: carbon paste, 3 mm disk (0.0707 cm2)": an area in squared units.
    const squared = /(\d+(?:[.,]\d+)?(?:[eE][+-]?\d+)?)\s*(cm\^?2|cm²|mm\^?2|mm²)/.exec(value);
    if (squared && /electrode|disk|disc|\bwe\b/.test(key)) out.areaCm2 ??= readArea('', squared[0], line, text, true);
    if (CONCENTRATION_KEY.test(keyName)) out.concentrationMolPerCm3 ??= readConcentration(kv.key, value, line, text);
    // "Sample: 0.5 mM compound in 0.1 M KCl": the first concentration named is the analyte's.
    if (/sample|analyte|solution/.test(key)) fromSample ??= readConcentration('', value, line, text);
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
  // Quoted fields ("Fläche";"0,0707 cm²") are read without their quotes.
  const fields = text.split(/\t|;|,(?!\d)/).map((f) => f.trim().replace(/^"(.*)"$/, '$1').trim()).filter(Boolean);
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

/** The current sign convention a line of text states ("cathodic positive", "IUPAC"), or null. */
export function readConvention(text: string, line: number): PreambleReading['convention'] {
  if (/polarographic|classical\s+convention|us\s+convention|cathodic\s+(currents?\s+)?(are\s+|is\s+)?positive|anodic\s+(currents?\s+)?(are\s+|is\s+)?negative/i.test(text)) return { value: 'polarographic', line, text };
  if (/\biupac\b|anodic\s+(currents?\s+)?(are\s+|is\s+)?positive|cathodic\s+(currents?\s+)?(are\s+|is\s+)?negative/i.test(text)) return { value: 'iupac', line, text };
  return null;
}
