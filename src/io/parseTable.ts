/**
 * Reads the numeric table, chunk by chunk, into one Float64Array per column. A chunk without a
 * double quote is read line by line straight from the text (plainRows.ts, the fast path); a chunk
 * with quotes goes through papaparse, which knows RFC 4180 quoting. Both read the same lines into
 * the same rows (the fuzz suite checks this). Rows with extra non-empty fields, or fewer than two
 * numbers, are skipped and located by line; a copy of the header line inside the table (files
 * concatenated from several exports) is recognised; non-numeric lines after the last data row are
 * a footer. Written as a generator that yields its progress, so that a synchronous and an
 * asynchronous (yielding) driver share one code path.
 */
import Papa from 'papaparse';
import { readPlainLines } from './plainRows';
import { badLine, TableRows } from './tableRows';
import type { UnreadableCells, UnusualCells } from './tableRows';
import { parseNumber } from './textLines';
import type { Delimiter } from './types';

/** A repeated header line inside the table, before row `row`. */
export interface HeaderSeam {
  /** 0-based row of the table the repeated header stands before. */
  row: number;
  /** 1-based file line of the repeated header. */
  line: number;
  /** Its fields when they name the table's columns with other units; null for an exact repeat. */
  names: string[] | null;
}

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
  /**
   * Tells a line that names the header's columns with other units ("Potential (mV)" under a
   * header "Potential (V)"), given its trimmed fields. @default none
   */
  sameNamesOtherUnits?: ((fields: string[]) => boolean) | undefined;
  /** For error messages. @default 'the file' */
  fileName?: string;
  /** 'papaparse' reads every chunk through papaparse (the reference the fast path is fuzzed against). @default 'auto' */
  reader?: 'auto' | 'papaparse';
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
  /** Columns with grouped digits ("1,234.5") or D exponents, read as numbers. */
  unusual: UnusualCells[];
  /** Columns with fields no reader could read, in data rows. */
  unreadable: UnreadableCells[];
  /** First row after the last blank or non-data line between rows (0 when none). */
  lastBlockRow: number;
  /** Repeated header lines inside the table (the first 10,000). */
  headerSeams: HeaderSeam[];
  /** 1-based number of the text's last line (the empty one after a final line break included). */
  lineCount: number;
  /** Line of a last row left out as cut off (cutLastRow.ts), or null. */
  cutLastLine: number | null;
}

/** Characters per chunk: large enough that papaparse's per-call cost vanishes. */
export const CHUNK_CHARS = 1 << 21;

/** Yields the fraction done after each chunk and returns the parsed table. */
export function* parseTable(text: string, spec: TableSpec): Generator<number, ParsedTable> {
  const rows = new TableRows(spec.fieldCount, text.length - spec.startOffset, spec.fileName ?? 'the file');
  const values = new Float64Array(spec.fieldCount);
  let pos = spec.startOffset;
  let line = spec.startLine;
  while (pos < text.length) {
    let end = text.indexOf('\n', Math.min(text.length, pos + CHUNK_CHARS));
    if (end === -1) end = text.length;
    const quoted = spec.reader === 'papaparse' || hasQuote(text, pos, end);
    line = quoted ? readQuotedChunk(text.slice(pos, end), line, spec, rows, values) : readPlainLines(text, pos, end, line, spec, rows, values);
    pos = end + 1;
    yield Math.min(1, (pos - spec.startOffset) / Math.max(1, text.length - spec.startOffset));
  }
  // A text that ends with a line break at a chunk's seam has one more (empty) line than was read.
  rows.out.lineCount = text.endsWith('\n') && pos === text.length ? line : line - 1;
  return rows.finish();
}

function hasQuote(text: string, from: number, to: number): boolean {
  const q = text.indexOf('"', from);
  return q !== -1 && q < to;
}

/** Papaparse reads a chunk; returns the file line after it. */
function readQuotedChunk(chunk: string, firstLine: number, spec: TableSpec, rows: TableRows, values: Float64Array): number {
  const whitespace = spec.delimiter === 'whitespace';
  const delimiter = whitespace ? ' ' : spec.delimiter;
  const source = whitespace ? chunk.replace(/\t/g, ' ') : chunk;
  const parsed = Papa.parse<string[]>(source, { delimiter, newline: '\n', quoteChar: '"', header: false, dynamicTyping: false, skipEmptyLines: false }).data;
  let line = firstLine;
  for (const raw of parsed) {
    const fields = whitespace ? raw.filter((f) => f !== '') : raw;
    const kind = readRow(fields, spec.fieldCount, spec.decimalComma, values, rows);
    if (kind === 'data') rows.data(values, fields.length, line);
    else if (kind === 'bad') badLine(fields.map((f) => f.trim()), line, spec, rows);
    else rows.blank();
    line++;
  }
  return line;
}

/** Reads one tokenised row into `values`: 'data', 'blank' or 'bad'. */
function readRow(fields: string[], k: number, decimalComma: boolean, values: Float64Array, rows: TableRows): 'data' | 'blank' | 'bad' {
  const n = fields.length;
  if (n === 0 || (n === 1 && (fields[0] as string).trim() === '')) return 'blank';
  for (let j = k; j < n; j++) if ((fields[j] as string).trim() !== '') return 'bad';
  // A short row keeps its leading fields; the missing ones are NaN, and the row is dropped
  // later only if one of them was needed (potential, current, time, cycle).
  let finite = 0;
  for (let j = 0; j < k; j++) {
    let v = j < n ? parseNumber(fields[j] as string, decimalComma) : NaN;
    if (v !== v && j < n) v = rows.readOther(fields[j] as string, j, decimalComma);
    values[j] = v;
    if (Number.isFinite(v)) finite++;
  }
  return finite >= 2 ? 'data' : 'bad';
}
