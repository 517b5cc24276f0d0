/**
 * The importer: any instrument text or CSV export → one Measurement with every guess explained.
 * Steps: decode bytes, normalise line ends, find the table (delimiter, decimal mark), the header
 * and the preamble, tokenise the table with papaparse chunk by chunk, give columns roles and
 * units, convert to V/A/s in the IUPAC convention, split sweeps and cycles, choose a scan rate.
 * The work is a generator that yields progress; `importVoltammogram` runs it straight through,
 * `importVoltammogramAsync` gives the event loop a turn between chunks.
 */
import { AnalysisError } from '../core/errors';
import { assembleMeasurement } from './assembleMeasurement';
import { checkText, decodeBytes, rejectKnownBinaryText } from './decodeText';
import type { DecodedText } from './decodeText';
import { cutTruncatedLastRow } from './cutLastRow';
import { convertSeamBlocks, sameNamesOtherUnits } from './headerSeams';
import { refuseSplitDecimalComma } from './decimalCommaSplit';
import { detectHeader } from './detectHeader';
import { readHeader } from './headerNames';
import type { HeaderFound } from './detectHeader';
import { describeDelimiter, detectLayout } from './detectFormat';
import type { TableLayout } from './detectFormat';
import { ImportError, makeWarning } from './errors';
import type { ImportWarning } from './errors';
import { createYielder } from './timeSlice';
import { describeMark } from './unusualNumber';
import { parseTable } from './parseTable';
import type { ParsedTable } from './parseTable';
import { readConvention, readPreamble } from './readPreamble';
import type { PreambleReading } from './readPreamble';
import { normaliseLineEnds, sampleLines } from './textLines';
import type { ImportDetection, ImportOptions, ImportOverrides, ImportResult } from './types';

export type ImportInput = string | ArrayBuffer | Uint8Array;

export function importVoltammogram(fileName: string, data: ImportInput, options: ImportOptions = {}): ImportResult {
  const steps = importSteps(fileName, data, options.overrides ?? {}, options.tableReader ?? 'auto');
  for (;;) {
    const r = guard(fileName, () => steps.next());
    if (r.done) return r.value;
    options.onProgress?.(r.value);
  }
}

export interface AsyncImportOptions extends ImportOptions {
  /** Stops the import between chunks; the promise then rejects with the signal's reason. */
  signal?: AbortSignal;
  /** Gives the event loop a turn; shared across files by importBatch. @default a 16 ms slicer */
  maybeYield?: () => Promise<void>;
}

export async function importVoltammogramAsync(fileName: string, data: ImportInput, options: AsyncImportOptions = {}): Promise<ImportResult> {
  const steps = importSteps(fileName, data, options.overrides ?? {}, options.tableReader ?? 'auto');
  const maybeYield = options.maybeYield ?? createYielder();
  for (;;) {
    options.signal?.throwIfAborted();
    const r = guard(fileName, () => steps.next());
    if (r.done) return r.value;
    options.onProgress?.(r.value);
    await maybeYield();
  }
}

/** Lets ImportError through and turns every other failure into a typed ImportError. */
function guard<T>(fileName: string, step: () => T): T {
  try {
    return step();
  } catch (err) {
    if (err instanceof ImportError) throw err;
    if (err instanceof AnalysisError) throw new ImportError('NO_TABLE', fileName, err.message);
    const msg = err instanceof Error ? err.message : String(err);
    throw new ImportError('INTERNAL', fileName, `internal fault while reading this file (${msg}); please report it with the file`);
  }
}

function decode(fileName: string, data: ImportInput, o: ImportOverrides): DecodedText {
  if (typeof data === 'string') {
    rejectKnownBinaryText(fileName, data);
    const ignored = o.encoding ? `; the encoding override ${o.encoding} cannot apply to text that is already decoded — pass the bytes instead` : '';
    return { text: checkText(fileName, data), encoding: { value: 'utf-8', overridden: false, explanation: `text handed over already decoded (encoding chosen by the caller)${ignored}` } };
  }
  const bytes = data instanceof Uint8Array ? data : new Uint8Array(data);
  const d = decodeBytes(fileName, bytes, o.encoding);
  return { text: checkText(fileName, d.text), encoding: d.encoding };
}

/** Everything known before the table is tokenised. */
export interface FrontMatter {
  decoded: DecodedText;
  text: string;
  lineEnding: ImportDetection['lineEnding'];
  layout: TableLayout;
  header: HeaderFound;
  preambleLines: string[];
  headLines: string[];
  pre: PreambleReading;
  startOffset: number;
}

function readFrontMatter(fileName: string, data: ImportInput, o: ImportOverrides, warnings: ImportWarning[]): FrontMatter {
  const decoded = decode(fileName, data, o);
  if (decoded.encoding.value === 'latin1' && !decoded.encoding.overridden) {
    warnings.push(makeWarning('ENCODING_GUESSED', `${fileName}: not valid UTF-8, read as Latin-1; check characters such as µ and °`));
  }
  const ended = normaliseLineEnds(decoded.text);
  const lineEnding = ended.lineEnding;
  const text = plainMinusSigns(fileName, ended.text, warnings);
  const sample = sampleLines(text);
  const layout = detectLayout(fileName, sample.lines, o);
  refuseSplitDecimalComma(fileName, sample.lines, layout);
  const decimalComma = layout.decimalMark.value === ',';
  const header = detectHeader(fileName, sample.lines, layout.firstDataLine, layout.delimiter.value, decimalComma, layout.fieldCount, o);
  // Everything above the table but the names and units rows is read as preamble: comment lines
  // inside the header block too. Those two rows become blank, so line numbers stay right.
  const namesLine = header.guess.value === null ? -1 : header.guess.value - 1;
  const above = sample.lines.slice(0, layout.firstDataLine).map((l, i) => (i === namesLine || i === header.unitsLine ? '' : l));
  const preambleLines = above.filter((_, i) => i !== namesLine && i !== header.unitsLine);
  const headLines = sample.lines.slice(0, 40).map((l) => (l.length > 240 ? `${l.slice(0, 240)}…` : l));
  const pre = readPreamble(above, 1);
  // A convention stated in the current column's own name: "I (µA, cathodic positive)".
  pre.convention ??= header.names?.filter((n) => readHeader(n).role === 'current').map((n) => readConvention(n, namesLine + 1)).find((c) => c !== null) ?? null;
  return { decoded, text, lineEnding, layout, header, preambleLines, headLines, pre, startOffset: sample.offsets[layout.firstDataLine] ?? 0 };
}

/**
 * The typographic minus sign (U+2212, and its small and full-width forms), which text copied from
 * a report or a word processor carries, read as the ASCII hyphen-minus that numbers are parsed with.
 * Said once, with the first line that holds one.
 */
function plainMinusSigns(fileName: string, text: string, warnings: ImportWarning[]): string {
  const at = text.search(/[\u2212\uFE63\uFF0D]/);
  if (at === -1) return text;
  const line = countLinesBefore(text, at) + 1;
  warnings.push(makeWarning('MINUS_SIGNS_READ', `${fileName}: minus signs written as the typographic "−" (from line ${line} on) were read as "-"`, [line]));
  return text.replace(/[\u2212\uFE63\uFF0D]/g, '-');
}

function countLinesBefore(text: string, at: number): number {
  let n = 0;
  for (let i = text.indexOf('\n'); i !== -1 && i < at; i = text.indexOf('\n', i + 1)) n++;
  return n;
}

function* importSteps(fileName: string, data: ImportInput, o: ImportOverrides, reader: 'auto' | 'papaparse'): Generator<number, ImportResult> {
  const warnings: ImportWarning[] = [];
  const front = readFrontMatter(fileName, data, o, warnings);
  const { layout } = front;
  yield 0.1;
  const tableSteps = parseTable(front.text, {
    delimiter: layout.delimiter.value,
    decimalComma: layout.decimalMark.value === ',',
    fieldCount: layout.fieldCount,
    startOffset: front.startOffset,
    startLine: layout.firstDataLine + 1,
    headerText: front.header.headerKey,
    sameNamesOtherUnits: sameNamesOtherUnits(front.header),
    fileName,
    reader,
  });
  let step = tableSteps.next();
  while (!step.done) {
    yield 0.1 + 0.8 * step.value;
    step = tableSteps.next();
  }
  const table = step.value;
  layout.delimiter.explanation = describeDelimiter(layout.delimiter.value, layout.delimiter.overridden, table.rowCount, table.rowCount + table.skippedCount, layout.fieldCount, layout.firstDataLine + 1);
  layout.decimalMark.explanation += describeUnusual(table);
  cutTruncatedLastRow(fileName, front.text, table, layout, layout.decimalMark.value === ',', warnings);
  convertSeamBlocks(fileName, table, front.header, warnings);
  tableWarnings(fileName, table, warnings);
  const measurement = assembleMeasurement(fileName, front, table, o, warnings);
  yield 1;
  return { measurement, warnings };
}

/** "; digits grouped by ',' (comma) in column 3 read as one number (2096 values, first on line 215)". */
function describeUnusual(t: ParsedTable): string {
  const groups = new Map<string, ParsedTable['unusual']>();
  for (const u of t.unusual) groups.set(u.kind + u.mark, [...(groups.get(u.kind + u.mark) ?? []), u]);
  let out = '';
  for (const g of groups.values()) {
    const first = g[0] as ParsedTable['unusual'][number];
    const cols = `column${g.length > 1 ? 's' : ''} ${g.map((u) => u.column + 1).join(', ')}`;
    const count = g.reduce((n, u) => n + u.count, 0);
    const where = `${count} values, first on line ${Math.min(...g.map((u) => u.firstLine))}`;
    out += first.kind === 'grouped' ? `; digits grouped by ${describeMark(first.mark)} in ${cols} read as one number (${where})` : `; D exponents (1.5D-05 = 1.5e-05) in ${cols} (${where})`;
  }
  return out;
}

function tableWarnings(fileName: string, t: ParsedTable, warnings: ImportWarning[]): void {
  // Lines skipped inside the table are reported with the rows left out later (droppedRows.ts).
  if (t.repeatedHeaderCount) {
    warnings.push(makeWarning('REPEATED_HEADER', `${fileName}: the header line appears ${t.repeatedHeaderCount} more time(s) inside the table (several exports joined); ${t.seamLines} header/preamble lines at those seams were passed over`, undefined, t.repeatedHeaderCount));
  }
}
