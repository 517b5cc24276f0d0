/**
 * The results table across files: one row per file, cycle and couple, for one series or for every
 * loaded file, with the numbers of each file's own analysis (already on the display scale), in the
 * order the user sorted them; and the same rows as tab-separated text for a spreadsheet, with the
 * units in the header. Pure: reads the store's state, changes nothing.
 */
import type { CoupleResult } from '../core/couples/coupleTypes';
import type { HalfwaveState } from './types';

export interface ResultsRow extends Pick<CoupleResult, 'epaV' | 'epcV' | 'eHalfV' | 'deltaEpV' | 'ipaA' | 'ipcA' | 'ratio'> {
  fileId: string;
  fileName: string;
  group: string;
  scanRateVPerS: number | null;
  cycle: number;
  couple: number;
  /** |Ep − Ep/2| of the couple's forward peak (V). */
  forwardHalfWidthV: number | null;
  /** The verdict's one-word reading; `readingText` says it in full. */
  reading: string;
  readingText: string;
  warnings: number;
  /** Current noise of the file (A): the current columns show the digits it allows. */
  noiseA: number;
  /** True when the file gave current densities: ipa and ipc are then A/cm². */
  perArea: boolean;
}

export type ResultsColumn = 'file' | 'scanRate' | 'cycle' | 'epa' | 'epc' | 'eHalf' | 'deltaEp' | 'ipa' | 'ipc' | 'ratio' | 'halfWidth' | 'reading' | 'warnings';

export interface ResultsSort {
  column: ResultsColumn;
  descending: boolean;
}

const VALUE: Record<ResultsColumn, (r: ResultsRow) => number | string | null> = {
  file: (r) => r.fileName, scanRate: (r) => r.scanRateVPerS, cycle: (r) => r.cycle, epa: (r) => r.epaV, epc: (r) => r.epcV,
  eHalf: (r) => r.eHalfV, deltaEp: (r) => r.deltaEpV, ipa: (r) => r.ipaA, ipc: (r) => r.ipcA, ratio: (r) => r.ratio,
  halfWidth: (r) => r.forwardHalfWidthV, reading: (r) => r.reading, warnings: (r) => r.warnings,
};

function rowOf(id: string, s: Pick<HalfwaveState, 'files' | 'results'>, cycle: number, k: CoupleResult, noiseA: number): ResultsRow | null {
  const f = s.files[id];
  const run = s.results[id]?.run;
  if (!f || !run) return null;
  return {
    fileId: id, fileName: f.fileName, group: f.group, scanRateVPerS: run.scanRateVPerS || null, cycle, couple: k.index,
    epaV: k.epaV, epcV: k.epcV, eHalfV: k.eHalfV, deltaEpV: k.deltaEpV, ipaA: k.ipaA, ipcA: k.ipcA, ratio: k.ratio,
    forwardHalfWidthV: k.forwardDirection === 'anodic' ? k.anodicHalfPeakWidthV : k.cathodicHalfPeakWidthV,
    reading: k.verdict.category, readingText: k.verdict.label, warnings: run.warnings.length + f.warnings.length, noiseA,
    perArea: run.currentKind === 'density',
  };
}

/**
 * A file's rows are kept while its result and its name, series and import warnings stay the same,
 * so a table re-rendered for another file's result gets the same row objects (and skips them).
 */
const fileRows = new WeakMap<object, { key: string; rows: ResultsRow[] }>();

function rowsOfFile(s: Pick<HalfwaveState, 'files' | 'results'>, id: string): ResultsRow[] {
  const run = s.results[id]?.run;
  const f = s.files[id];
  if (!run || !f) return [];
  const key = `${f.fileName}\u0000${f.group}\u0000${f.warnings.length}`;
  const hit = fileRows.get(run);
  if (hit && hit.key === key) return hit.rows;
  const rows = run.analysis.cycles.flatMap((c) => c.couples.flatMap((k) => rowOf(id, s, c.index, k, run.analysis.noiseA) ?? []));
  fileRows.set(run, { key, rows });
  return rows;
}

/** Rows of the files of `group` (null: every file), sorted; files without a result yet are left out. */
export function resultsRows(s: Pick<HalfwaveState, 'fileOrder' | 'files' | 'results'>, group: string | null, sort: ResultsSort | null = null): ResultsRow[] {
  const rows = s.fileOrder.flatMap((id) => (group !== null && s.files[id]?.group !== group ? [] : rowsOfFile(s, id)));
  return sort ? sortRows(rows, sort) : rows;
}

/** Stable sort; missing values go last whichever way. */
export function sortRows(rows: ResultsRow[], sort: ResultsSort): ResultsRow[] {
  const get = VALUE[sort.column];
  const sign = sort.descending ? -1 : 1;
  return rows.map((r, i) => ({ r, i })).sort((a, b) => {
    const x = get(a.r);
    const y = get(b.r);
    if (x === null || y === null) return x === y ? a.i - b.i : x === null ? 1 : -1;
    const c = typeof x === 'number' && typeof y === 'number' ? x - y : String(x).localeCompare(String(y), 'en', { numeric: true });
    return c !== 0 ? sign * c : a.i - b.i;
  }).map((e) => e.r);
}

const cell = (v: number | null, factor = 1, digits = 6) => (v === null || !Number.isFinite(v) ? '' : String(Number((v * factor).toPrecision(digits))));

/** The unit of the peak-current columns: per cm² when every row is a density; 'mixed' when some are. */
export function currentColumnsPerArea(rows: ResultsRow[]): boolean | 'mixed' {
  const n = rows.filter((r) => r.perArea).length;
  return n === 0 ? false : n === rows.length ? true : 'mixed';
}

/**
 * Tab-separated text with a header line (units in the heads), one line per row. Values in the
 * header's units, six significant digits at most (no float tails), empty where not determined.
 * Current densities: the heads say µA cm⁻² when every row is one; a mix gets a 'currents' column.
 */
export function resultsTsv(rows: ResultsRow[], scaleName: string): string {
  const perArea = currentColumnsPerArea(rows);
  const ipUnit = perArea === true ? 'µA cm⁻²' : perArea === 'mixed' ? 'µA or µA cm⁻²' : 'µA';
  const head = ['file', 'series', 'v / (V/s)', 'cycle', 'couple', `Epa / V vs ${scaleName}`, `Epc / V vs ${scaleName}`, `E½ / V vs ${scaleName}`, 'ΔEp / mV',
    `ipa / ${ipUnit}`, `ipc / ${ipUnit}`, 'ip return / ip forward', '|Ep − Ep/2| forward / mV', 'reading', 'warnings', ...(perArea === 'mixed' ? ['currents'] : [])];
  const lines = rows.map((r) => [r.fileName, r.group, cell(r.scanRateVPerS, 1, 3), String(r.cycle), String(r.couple + 1), cell(r.epaV), cell(r.epcV), cell(r.eHalfV),
    cell(r.deltaEpV, 1000, 4), cell(r.ipaA, 1e6), cell(r.ipcA, 1e6), cell(r.ratio, 1, 4), cell(r.forwardHalfWidthV, 1000, 4), r.readingText, String(r.warnings),
    ...(perArea === 'mixed' ? [r.perArea ? 'per cm²' : 'current'] : [])]
    .map((t) => t.replace(/[\t\n\r]+/g, ' ')).join('\t'));
  return `${[head.join('\t'), ...lines].join('\n')}\n`;
}
