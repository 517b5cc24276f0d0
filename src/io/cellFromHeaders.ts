/**
 * The cell values a series' files state in their headers (electrode area or disk diameter,
 * concentration, temperature, reference electrode), read the same way for the screen and the
 * command line: the first file that states a value gives it, with the line it was read from as
 * evidence; a file that states another value, or a reference electrode not in the table, is noted
 * in words. Values in core units (cm², mol/cm³, K).
 * A disk diameter d gives the geometric area π d²/4 (core/units.ts diskAreaCm2).
 */
import { findReferenceElectrode, type ReferenceId } from '../core/reference';
import { diskAreaCm2 } from '../core/units';
import type { Measurement } from './types';

export interface HeaderCell {
  areaCm2?: number;
  concentrationMolPerCm3?: number;
  temperatureK?: number;
  inputReference?: ReferenceId;
}

type Field = keyof HeaderCell;

/** Where a header value came from: the file, its 1-based line (0 when unknown) and the text read. */
export interface HeaderEvidence {
  fileName: string;
  line: number;
  text: string;
}

const FIELD_WORDS: Record<Field, string> = {
  areaCm2: 'area (cm²)', concentrationMolPerCm3: 'concentration (mol/cm³)', temperatureK: 'temperature (K)', inputReference: 'reference',
};

/**
 * Reference electrode named in a header ("Ag/AgCl (3 M KCl)") → table id, or null. The table's
 * aliases are written without brackets or commas, so those are tried as spaces too.
 */
export function referenceIdOf(name: string): ReferenceId | null {
  return (findReferenceElectrode(name) ?? findReferenceElectrode(name.replace(/[(),]/g, ' ').trim()))?.id ?? null;
}

const NUM = '(\\d+(?:[.,]\\d+)?)';
const LENGTH_CM: Record<string, number> = { mm: 0.1, cm: 1, µm: 1e-4, um: 1e-4, μm: 1e-4 };
/** "3 mm disk", "disk, 2 mm", "d = 2 mm", "diameter: 1.6 mm", "Ø 3 mm" on an electrode line. */
const DIAMETER = [
  new RegExp(`${NUM}\\s*(mm|cm|µm|μm|um)\\b[^,;]{0,20}?\\b(?:disk|disc|diameter|dia\\b)`, 'i'),
  new RegExp(`\\b(?:disk|disc)\\b[^0-9,;]{0,20}?${NUM}\\s*(mm|cm|µm|μm|um)\\b(?!\\s*[²2^])`, 'i'),
  new RegExp(`(?:\\bdiameter|\\bdia\\.?|Ø|\\bd)\\s*[=:]?\\s*${NUM}\\s*(mm|cm|µm|μm|um)\\b(?!\\s*[²2^])`, 'i'),
];
/** "A = 0.071 cm²" (a lone A as the key). */
const AREA_A = new RegExp(`(?:^|[\\s,;])A\\s*[=:]\\s*${NUM}\\s*(cm\\^?2|cm²|mm\\^?2|mm²)`);

interface Found {
  values: HeaderCell;
  evidence: Partial<Record<Field, HeaderEvidence>>;
  unknownReference?: string;
}

const clean = (raw: string) => raw.replace(/^\s*(#|%|\/\/|;|!)+\s*/, '').trim();
const lineOf = (m: Pick<Measurement, 'preamble'>, text: string) => {
  const k = m.preamble.findIndex((l) => clean(l) === text);
  return k < 0 ? 0 : k + 1;
};

/** A disk diameter or an "A = …" area written on an electrode line of the preamble. */
function areaFromLines(m: Pick<Measurement, 'preamble' | 'fileName'>): { value: number; evidence: HeaderEvidence } | null {
  for (const [k, raw] of m.preamble.entries()) {
    const text = clean(raw);
    const a = AREA_A.exec(text);
    if (a) {
      const v = Number((a[1] as string).replace(',', '.')) * ((a[2] as string).startsWith('mm') ? 0.01 : 1);
      if (v > 0) return { value: v, evidence: { fileName: m.fileName, line: k + 1, text } };
    }
    if (!/electrode|\bwe\b|disk|disc|diameter|Ø/i.test(text) || /\b(ref|counter|ce\b|re\b)/i.test(text.split(/[:=]/)[0] ?? '')) continue;
    for (const re of DIAMETER) {
      const d = re.exec(text);
      const unit = d ? LENGTH_CM[(d[2] as string).toLowerCase()] : undefined;
      if (!d || unit === undefined) continue;
      const diameterCm = Number((d[1] as string).replace(',', '.')) * unit;
      if (diameterCm > 0 && diameterCm < 10) return { value: diskAreaCm2(diameterCm), evidence: { fileName: m.fileName, line: k + 1, text: `${text} (disk of ${d[1]} ${d[2]}: π d²/4)` } };
    }
  }
  return null;
}

type HeaderSource = Pick<Measurement, 'fileName' | 'preamble' | 'areaCm2' | 'concentrationMolPerCm3' | 'temperatureK' | 'referenceElectrode'>;

/**
 * What one file's header states, kept per file (a file's reading never changes): a series' cell is
 * resolved again as each of its files is read, over all of them, and a folder of a hundred files
 * would read every header a hundred times.
 */
const stated = new WeakMap<HeaderSource, Found>();

function valuesOf(m: HeaderSource): Found {
  let found = stated.get(m);
  if (!found) {
    found = readValues(m);
    stated.set(m, found);
  }
  return found;
}

function readValues(m: HeaderSource): Found {
  const out: Found = { values: {}, evidence: {} };
  const put = (field: Field, value: number | ReferenceId, line: number, text: string) => {
    (out.values as Record<Field, unknown>)[field] = value;
    out.evidence[field] = { fileName: m.fileName, line, text };
  };
  if (m.areaCm2) put('areaCm2', m.areaCm2.value, m.areaCm2.line, m.areaCm2.text);
  else {
    const a = areaFromLines(m);
    if (a) {
      out.values.areaCm2 = a.value;
      out.evidence.areaCm2 = a.evidence;
    }
  }
  if (m.concentrationMolPerCm3) put('concentrationMolPerCm3', m.concentrationMolPerCm3.value, m.concentrationMolPerCm3.line, m.concentrationMolPerCm3.text);
  if (m.temperatureK) put('temperatureK', m.temperatureK.value, m.temperatureK.line, m.temperatureK.text);
  if (m.referenceElectrode) {
    const id = referenceIdOf(m.referenceElectrode);
    if (id) put('inputReference', id, lineOf(m, m.preamble.map(clean).find((l) => l.includes(m.referenceElectrode as string)) ?? ''), m.referenceElectrode);
    else out.unknownReference = m.referenceElectrode;
  }
  return out;
}

export interface CellFromHeaders {
  values: HeaderCell;
  /** Which file and line gave each value. */
  evidence: Partial<Record<Field, HeaderEvidence>>;
  notes: string[];
}

export function cellFromHeaders(measurements: readonly HeaderSource[]): CellFromHeaders {
  const values: HeaderCell = {};
  const evidence: Partial<Record<Field, HeaderEvidence>> = {};
  const notes: string[] = [];
  for (const m of measurements) {
    const found = valuesOf(m);
    if (found.unknownReference) notes.push(`${m.fileName}: reference electrode "${found.unknownReference}" is not in the table; choose it by hand.`);
    for (const key of ['areaCm2', 'concentrationMolPerCm3', 'temperatureK', 'inputReference'] as const) {
      const v = found.values[key];
      if (v === undefined) continue;
      if (values[key] === undefined) {
        (values as Record<Field, unknown>)[key] = v;
        evidence[key] = found.evidence[key] as HeaderEvidence;
      } else if (values[key] !== v) {
        // Each file is converted from the reference it states (core/analysis/runReference.ts); other values: the first.
        const use = key === 'inputReference' ? 'each file is converted from its own' : 'the series uses the first';
        notes.push(`${m.fileName} states ${FIELD_WORDS[key]} ${String(v)}, ${evidence[key]?.fileName ?? ''} ${String(values[key])}; ${use}.`);
      }
    }
  }
  return { values, evidence, notes };
}
