/**
 * The importer: any instrument text or CSV export → one Measurement with every guess explained.
 * Steps: decode bytes, normalise line ends, find the table (delimiter, decimal mark), the header
 * and the preamble, tokenise the table with papaparse chunk by chunk, give columns roles and
 * units, convert to V/A/s in the IUPAC convention, split sweeps and cycles, choose a scan rate.
 * The work is a generator that yields progress; `importVoltammogram` runs it straight through,
 * `importVoltammogramAsync` gives the event loop a turn between chunks.
 */
import { AnalysisError } from '../core/errors';
import { assignColumns } from './assignColumns';
import { chooseScanRate } from './chooseScanRate';
import { checkText, decodeBytes, rejectKnownBinaryText } from './decodeText';
import type { DecodedText } from './decodeText';
import { detectHeader } from './detectHeader';
import { describeDelimiter, detectLayout } from './detectFormat';
import { describeLines, ImportError, makeWarning } from './errors';
import type { ImportWarning } from './errors';
import { measurementId } from './measurementId';
import { createYielder } from './timeSlice';
import { parseTable } from './parseTable';
import type { ParsedTable } from './parseTable';
import { readPreamble } from './readPreamble';
import type { PreambleReading } from './readPreamble';
import { normaliseLineEnds, sampleLines } from './textLines';
import { buildColumns, chooseUnits } from './toMeasurement';
import type { CurrentConvention, Guess, ImportOptions, ImportOverrides, ImportResult, Measurement } from './types';

export type ImportInput = string | ArrayBuffer | Uint8Array;

export function importVoltammogram(fileName: string, data: ImportInput, options: ImportOptions = {}): ImportResult {
  const steps = importSteps(fileName, data, options.overrides ?? {});
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
  const steps = importSteps(fileName, data, options.overrides ?? {});
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

function* importSteps(fileName: string, data: ImportInput, o: ImportOverrides): Generator<number, ImportResult> {
  const warnings: ImportWarning[] = [];
  const decoded = decode(fileName, data, o);
  if (decoded.encoding.value === 'latin1' && !decoded.encoding.overridden) {
    warnings.push(makeWarning('ENCODING_GUESSED', `${fileName}: not valid UTF-8, read as Latin-1; check characters such as µ and °`));
  }
  const { text, lineEnding } = normaliseLineEnds(decoded.text);
  yield 0.05;
  const sample = sampleLines(text);
  const layout = detectLayout(fileName, sample.lines, o);
  const decimalComma = layout.decimalMark.value === ',';
  const header = detectHeader(fileName, sample.lines, layout.firstDataLine, layout.delimiter.value, decimalComma, layout.fieldCount, o);
  const preambleLines = sample.lines.slice(0, header.preambleEnd);
  const pre = readPreamble(preambleLines, 1);
  yield 0.1;
  const tableSteps = parseTable(text, {
    delimiter: layout.delimiter.value,
    decimalComma,
    fieldCount: layout.fieldCount,
    startOffset: sample.offsets[layout.firstDataLine] ?? 0,
    startLine: layout.firstDataLine + 1,
    headerText: header.headerKey,
  });
  let step = tableSteps.next();
  while (!step.done) {
    yield 0.1 + 0.8 * step.value;
    step = tableSteps.next();
  }
  const table = step.value;
  layout.delimiter.explanation = describeDelimiter(layout.delimiter.value, layout.delimiter.overridden, table.rowCount, table.rowCount + table.skippedCount, layout.fieldCount, layout.firstDataLine + 1);
  tableWarnings(fileName, table, warnings);
  const roles = assignColumns(fileName, header.names, table.columns, o);
  warnings.push(...roles.warnings);
  const convention = chooseConvention(o, pre);
  const units = chooseUnits(fileName, roles, o, warnings);
  if (units.currentDensity) {
    warnings.push(makeWarning('CURRENT_DENSITY', pre.areaCm2
      ? `${fileName}: the current column is a current density; multiplied by the area ${pre.areaCm2.value} cm² from line ${pre.areaCm2.line}`
      : `${fileName}: the current column is a current density and the file states no electrode area; values are kept per cm² (as if the area were 1 cm²)`));
  }
  const cols = buildColumns(fileName, table, roles, units, convention.value, pre.areaCm2, warnings);
  const scan = chooseScanRate({ fileName, override: o.scanRateVPerS, potentialV: cols.potentialV, timeS: cols.timeS, segments: cols.split.segments, preamble: pre.scanRateVPerS }, warnings);
  if (cols.timeS && !isNonDecreasing(cols.timeS)) {
    warnings.push(makeWarning('TIME_NOT_MONOTONIC', `${fileName}: the time column goes backwards in places (restarts per cycle?); it is kept as read`));
  }
  yield 1;
  const measurement: Measurement = {
    id: measurementId(fileName, text),
    fileName,
    potentialV: cols.potentialV,
    currentA: cols.currentA,
    timeS: cols.timeS,
    segments: cols.split.segments,
    cycles: cols.split.cycles,
    scanRateVPerS: scan.guess.value,
    scanRateSource: scan.source,
    metadata: pre.metadata,
    preamble: preambleLines,
    currentConvention: convention.value,
    referenceElectrode: pre.referenceElectrode?.value ?? roles.headers[roles.potential]?.reference ?? null,
    temperatureK: pre.temperatureK,
    areaCm2: pre.areaCm2,
    concentrationMolPerCm3: pre.concentrationMolPerCm3,
    cycleColumn: cols.cycleColumn,
    extraColumns: cols.extraColumns,
    detection: {
      encoding: decoded.encoding,
      lineEnding,
      delimiter: layout.delimiter,
      decimalMark: layout.decimalMark,
      headerLine: header.guess,
      columns: roles.columns,
      potentialUnit: units.potential,
      currentUnit: units.current,
      timeUnit: units.time,
      currentConvention: convention,
      scanRate: scan.guess,
      tableLines: { first: layout.firstDataLine + 1, last: table.lastDataLine },
      rowsRead: cols.rowsKept,
      rowsSkipped: table.skippedCount + cols.rowsDropped,
      cycleCount: cols.split.cycles.length,
    },
  };
  return { measurement, warnings };
}

function tableWarnings(fileName: string, t: ParsedTable, warnings: ImportWarning[]): void {
  if (t.skippedCount) {
    warnings.push(makeWarning('SKIPPED_ROWS', `${fileName}: ${t.skippedCount} lines inside the table skipped (too few fields or not numbers) — lines ${describeLines(t.skippedLines, t.skippedCount)}`, t.skippedLines, t.skippedCount));
  }
  if (t.repeatedHeaderCount) {
    warnings.push(makeWarning('REPEATED_HEADER', `${fileName}: the header line appears ${t.repeatedHeaderCount} more time(s) inside the table (several exports joined); ${t.seamLines} header/preamble lines at those seams were passed over`, undefined, t.repeatedHeaderCount));
  }
}

function chooseConvention(o: ImportOverrides, pre: PreambleReading): Guess<CurrentConvention> {
  if (o.currentConvention) return { value: o.currentConvention, overridden: true, explanation: `current convention ${o.currentConvention} (set by the user)` };
  if (pre.convention) return { value: pre.convention.value, overridden: false, explanation: `current convention ${pre.convention.value} — line ${pre.convention.line}: "${pre.convention.text}"` };
  return { value: 'iupac', overridden: false, explanation: 'current convention IUPAC (anodic positive) — the file does not say otherwise' };
}

function isNonDecreasing(a: Float64Array): boolean {
  for (let i = 1; i < a.length; i++) if ((a[i] as number) < (a[i - 1] as number)) return false;
  return true;
}
