/**
 * Tokenises the numeric table with papaparse, chunk by chunk, into one Float64Array per column.
 * Rows with extra non-empty fields, or fewer than two numbers, are skipped and located by line; a copy
 * of the header line inside the table (files concatenated from several exports) is recognised;
 * non-numeric lines after the last data row are a footer. Written as a generator that yields its
 * progress, so that a synchronous and an asynchronous (yielding) driver share one code path.
 */
import Papa from 'papaparse';
import { parseNumber } from './textLines';
import type { Delimiter } from './types';

export interface TableSpec {
  delimiter: Delimiter;
  decimalComma: boolean;
  fieldCount: number;
  /** Character offset in the LF-normalised text where the table starts. */
  startOffset: number;
  /** 1-based file line number of the line at startOffset. */
  startLine: number;
  /** Trimmed header line text, to recognise repeats inside the table; null when none. */
  headerText: string | null;
}

export interface ParsedTable {
  columns: Float64Array[];
  /** 1-based file line of each kept row. */
  lineOfRow: Int32Array;
  rowCount: number;
  skippedLines: number[];
  skippedCount: number;
  /** Seams where another export's header (and preamble) sits inside the table. */
  repeatedHeaderCount: number;
  /** Lines in those seams. */
  seamLines: number;
  footerLines: number;
  firstFooterLine: number | null;
  lastDataLine: number;
}

/** Characters per tokeniser chunk: large enough that papaparse's per-call cost vanishes. */
export const CHUNK_CHARS = 1 << 21;

class Growable {
  columns: Float64Array[];
  lines: Int32Array;
  n = 0;
  constructor(k: number, capacity: number) {
    this.columns = Array.from({ length: k }, () => new Float64Array(capacity));
    this.lines = new Int32Array(capacity);
  }
  ensure(): void {
    if (this.n < this.lines.length) return;
    const cap = this.lines.length * 2;
    this.columns = this.columns.map((c) => {
      const g = new Float64Array(cap);
      g.set(c);
      return g;
    });
    const l = new Int32Array(cap);
    l.set(this.lines);
    this.lines = l;
  }
}

interface Pending {
  line: number;
  header: boolean;
}

/** Yields the fraction done after each chunk and returns the parsed table. */
export function* parseTable(text: string, spec: TableSpec): Generator<number, ParsedTable> {
  const k = spec.fieldCount;
  const store = new Growable(k, Math.max(1024, Math.min(1 << 20, Math.ceil((text.length - spec.startOffset) / 16))));
  const out: ParsedTable = { columns: [], lineOfRow: new Int32Array(0), rowCount: 0, skippedLines: [], skippedCount: 0, repeatedHeaderCount: 0, seamLines: 0, footerLines: 0, firstFooterLine: null, lastDataLine: 0 };
  let pending: Pending[] = [];
  const values = new Float64Array(k);
  let pos = spec.startOffset;
  let line = spec.startLine;
  const delimiter = spec.delimiter === 'whitespace' ? ' ' : spec.delimiter;
  while (pos < text.length) {
    let end = text.indexOf('\n', Math.min(text.length, pos + CHUNK_CHARS));
    if (end === -1) end = text.length;
    let chunk = text.slice(pos, end);
    if (spec.delimiter === 'whitespace') chunk = chunk.replace(/\t/g, ' ');
    const rows = Papa.parse<string[]>(chunk, { delimiter, newline: '\n', quoteChar: '"', header: false, dynamicTyping: false, skipEmptyLines: false }).data;
    for (const raw of rows) {
      const fields = spec.delimiter === 'whitespace' ? raw.filter((f) => f !== '') : raw;
      const kind = readRow(fields, k, spec.decimalComma, values);
      if (kind === 'data') {
        flushPending(out, pending);
        pending = [];
        store.ensure();
        for (let j = 0; j < k; j++) (store.columns[j] as Float64Array)[store.n] = values[j] as number;
        store.lines[store.n++] = line;
        out.lastDataLine = line;
      } else if (kind === 'bad') {
        pending.push({ line, header: spec.headerText !== null && fields.map((f) => f.trim()).join('|') === spec.headerText });
      }
      line++;
    }
    pos = end + 1;
    yield Math.min(1, (pos - spec.startOffset) / Math.max(1, text.length - spec.startOffset));
  }
  out.footerLines = pending.length;
  out.firstFooterLine = pending[0]?.line ?? null;
  out.columns = store.columns.map((c) => c.slice(0, store.n));
  out.lineOfRow = store.lines.slice(0, store.n);
  out.rowCount = store.n;
  return out;
}

/**
 * Text lines between two data rows. A group that holds a copy of the header line is the seam of
 * two joined exports (their preamble and header), not damaged data, so it is not counted as skipped.
 */
function flushPending(out: ParsedTable, pending: Pending[]): void {
  if (pending.some((p) => p.header)) {
    out.repeatedHeaderCount++;
    out.seamLines += pending.length;
    return;
  }
  for (const p of pending) {
    out.skippedCount++;
    if (out.skippedLines.length < 20) out.skippedLines.push(p.line);
  }
}

/** Reads one tokenised row into `values`: 'data', 'blank' or 'bad'. */
function readRow(fields: string[], k: number, decimalComma: boolean, values: Float64Array): 'data' | 'blank' | 'bad' {
  const n = fields.length;
  if (n === 0 || (n === 1 && (fields[0] as string).trim() === '')) return 'blank';
  for (let j = k; j < n; j++) if ((fields[j] as string).trim() !== '') return 'bad';
  // A short row keeps its leading fields; the missing ones are NaN, and the row is dropped
  // later only if one of them was needed (potential, current, time, cycle).
  let finite = 0;
  for (let j = 0; j < k; j++) {
    const v = j < n ? parseNumber(fields[j] as string, decimalComma) : NaN;
    values[j] = v;
    if (Number.isFinite(v)) finite++;
  }
  return finite >= 2 ? 'data' : 'bad';
}

/** Bare tokenising of the same text, for the benchmark's ratio (no number parsing). */
export function tokeniseOnly(text: string, delimiter: string): number {
  let rows = 0;
  for (let pos = 0; pos < text.length; ) {
    let end = text.indexOf('\n', Math.min(text.length, pos + CHUNK_CHARS));
    if (end === -1) end = text.length;
    rows += Papa.parse<string[]>(text.slice(pos, end), { delimiter, newline: '\n', header: false, skipEmptyLines: false }).data.length;
    pos = end + 1;
  }
  return rows;
}
