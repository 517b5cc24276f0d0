/**
 * Finds the numeric table in a text export: tries every delimiter × decimal-mark pair on a head
 * sample of lines, keeps the pair under which the longest block of lines splits into the same
 * number of mostly numeric fields, and explains the choice in words. Method: common practice,
 * no source (the same idea as spreadsheet "text import" wizards: consistency of field counts).
 */
import { ImportError } from './errors';
import { isNonFiniteToken, parseNumber, splitFields } from './textLines';
import { readHeader } from './headerNames';
import { readUnusualNumber, whyNotANumber } from './unusualNumber';
import { DELIMITER_CHOICES, labelOf } from './overrideChoices';
import type { DecimalMark, Delimiter, Guess, ImportOverrides } from './types';

export interface TableLayout {
  delimiter: Guess<Delimiter>;
  decimalMark: Guess<DecimalMark>;
  /** Fields per data row. */
  fieldCount: number;
  /** 0-based index (in the sampled lines) of the first data row. */
  firstDataLine: number;
  /** 0-based index of the last data row seen in the sample. */
  lastDataLine: number;
  /** Data rows of the modal width inside the sample. */
  dataRows: number;
  /** Lines split into fields under the chosen layout, for later steps. */
  split: (line: string) => string[];
}

interface Candidate {
  delimiter: Delimiter;
  decimal: DecimalMark;
}

const DELIMITERS: Delimiter[] = [',', ';', '\t', 'whitespace'];
/** A delimiter in words, from the one table of choices: "semicolon", "tab", "spaces". */
const delimiterName = (d: Delimiter): string => labelOf(DELIMITER_CHOICES, d);

/**
 * Each line under one candidate: its field count, how many fields read as numbers, and whether it
 * is a data row (two or more fields, two or more numbers, at least half the fields numeric or an
 * instrument's token for a missing value).
 */
interface LineClasses {
  fields: Int32Array;
  numbers: Int32Array;
  /** Numbers read only as grouped digits or with a D exponent (unusualNumber.ts). */
  unusual: Int32Array;
  data: Uint8Array;
}

// Plain index loops over typed arrays here and below, each in a small function of its own: these
// run on every sampled line of every candidate while a page's first files are read, and the engine
// compiles such code quickly (a Map, iterators or closures in one long loop made this step the
// costliest to optimise of the import).
function classifyLines(split: string[][], decimalComma: boolean): LineClasses {
  const n = split.length;
  const out: LineClasses = { fields: new Int32Array(n), numbers: new Int32Array(n), unusual: new Int32Array(n), data: new Uint8Array(n) };
  for (let l = 0; l < n; l++) {
    const fields = split[l] as string[];
    let numbers = 0;
    let numericLike = 0;
    let unusual = 0;
    for (let i = 0; i < fields.length; i++) {
      const f = fields[i] as string;
      if (Number.isFinite(parseNumber(f, decimalComma))) {
        numbers++;
        numericLike++;
      } else if (f === '' || isNonFiniteToken(f)) numericLike++;
      else if (readUnusualNumber(f, decimalComma)) {
        numbers++;
        numericLike++;
        unusual++;
      }
    }
    out.fields[l] = fields.length;
    out.numbers[l] = numbers;
    out.unusual[l] = unusual;
    out.data[l] = fields.length >= 2 && numbers >= 2 && numericLike * 2 >= fields.length ? 1 : 0;
  }
  return out;
}

/** The field count most data rows share; the wider one on a tie; 0 when there is no data row. */
function modalWidth(cls: LineClasses): number {
  const counts = new Map<number, number>();
  let k = 0;
  let best = 0;
  for (let l = 0; l < cls.fields.length; l++) {
    if (!cls.data[l]) continue;
    const w = cls.fields[l] as number;
    const count = (counts.get(w) ?? 0) + 1;
    counts.set(w, count);
    if (count > best || (count === best && w > k)) {
      k = w;
      best = count;
    }
  }
  return k;
}

interface Scored {
  c: Candidate;
  k: number;
  first: number;
  last: number;
  rows: number;
  numericFraction: number;
  /** Fields of the table's rows read only as grouped digits or with a D exponent. */
  unusual: number;
}

function scoreCandidate(lines: string[], split: string[][], c: Candidate): Scored | null {
  const cls = classifyLines(split, c.decimal === ',');
  const k = modalWidth(cls);
  if (k === 0) return null;
  const rowOf = rowsOfWidth(cls, k);
  const start = findTableStart(lines, rowOf);
  if (start < 0) return null;
  const first = reachBackOverDamage(lines, rowOf, cls, k, start);
  const { last, rows, numbers } = tableFrom(rowOf, cls.numbers, first);
  return { c, k, first, last, rows, numericFraction: numbers / (rows * k), unusual: tableFrom(rowOf, cls.unusual, first).numbers };
}

/** 1 where a line is a data row of `k` fields. */
function rowsOfWidth(cls: LineClasses, k: number): Uint8Array {
  const rowOf = new Uint8Array(cls.fields.length);
  for (let i = 0; i < rowOf.length; i++) rowOf[i] = cls.data[i] === 1 && cls.fields[i] === k ? 1 : 0;
  return rowOf;
}

/** From the table's first row on: its last row, how many rows, how many numbers in them. */
function tableFrom(rowOf: Uint8Array, numbersOf: Int32Array, first: number): { last: number; rows: number; numbers: number } {
  let last = first;
  let rows = 0;
  let numbers = 0;
  for (let i = first; i < rowOf.length; i++) {
    if (!rowOf[i]) continue;
    last = i;
    rows++;
    numbers += numbersOf[i] as number;
  }
  return { last, rows, numbers };
}

/**
 * First row of the table: the start of the first run of consecutive rows (blank lines allowed
 * inside) that is at least 3 rows and at least a tenth of the longest run long. A short block of
 * numbers in the preamble (a settings table, a results summary) is thus not taken for the data,
 * while exports joined one after another (blocks of similar length) all stay in.
 * `isRow[i]` is 1 where line i is a row of the table's width.
 */
function findTableStart(lines: string[], isRow: Uint8Array): number {
  // Run lengths, kept at each run's first line.
  const runLength = new Int32Array(isRow.length);
  let current = -1;
  let longest = 0;
  for (let i = 0; i < isRow.length; i++) {
    if (isRow[i]) {
      if (current < 0) current = i;
      const length = ++runLength[current]!;
      if (length > longest) longest = length;
    } else if ((lines[i] as string).trim() !== '') current = -1;
  }
  const need = Math.min(longest, Math.max(3, Math.ceil(longest / 10)));
  for (let i = 0; i < runLength.length; i++) if (runLength[i]! > 0 && runLength[i]! >= need) return i;
  return -1;
}

/** Damaged lines bridged between the table and a few rows above it (common practice, no source). */
const BRIDGED_LINES = 2;

/**
 * The table's start moved up over a damaged line or two ("0.49x0,1.2e-7", "--,--") to the few rows
 * above them: those rows are the sweep's first points, not a preamble, and the damaged lines are
 * then counted and located with the table's other left-out rows. A damaged line splits into the
 * table's `k` fields, each a number or a missing-value token, or one or more of them a number; a
 * names or units line (no number in it) right above the rows stops the search, as does a blank
 * line between them.
 */
function reachBackOverDamage(lines: string[], isRow: Uint8Array, cls: LineClasses, k: number, start: number): number {
  let first = start;
  for (;;) {
    let i = first - 1;
    let damaged = 0;
    while (i >= 0 && !isRow[i] && damaged <= BRIDGED_LINES && damagedRow(lines[i] as string, cls, k, i)) {
      damaged++;
      i--;
    }
    if (i < 0 || !isRow[i] || damaged === 0 || damaged > BRIDGED_LINES) return first;
    // The run of rows above (blank lines inside it allowed, as in findTableStart).
    let top = i;
    for (let j = i - 1; j >= 0 && (isRow[j] || (lines[j] as string).trim() === ''); j--) if (isRow[j]) top = j;
    first = top;
  }
}

function damagedRow(line: string, cls: LineClasses, k: number, i: number): boolean {
  if (line.trim() === '' || cls.fields[i] !== k) return false;
  if ((cls.numbers[i] as number) >= 1) return true;
  return line.split(/[,;\t ]+/).filter((f) => f !== '').every((f) => isNonFiniteToken(f));
}

function better(a: Scored, b: Scored | null): boolean {
  if (!b) return true;
  if (a.rows !== b.rows) return a.rows > b.rows;
  if (Math.abs(a.numericFraction - b.numericFraction) > 1e-9) return a.numericFraction > b.numericFraction;
  // "1,234" is 1234 under a decimal point and 1.234 under a decimal comma: the reading that needs
  // no grouping wins a tie, so a decimal-comma table with three decimals stays as it was.
  return a.unusual < b.unusual;
}

/** Widest table read (common practice, no source: exports hold a few to a few dozen columns). */
export const MAX_COLUMNS = 1000;

/** Lines tried first; most preambles are far shorter, and the rest of a table only repeats itself. */
const QUICK_LINES = 600;

/** Chooses delimiter and decimal mark; throws NO_TABLE / ONE_COLUMN when there is no table. */
export function detectLayout(fileName: string, lines: string[], overrides: ImportOverrides = {}): TableLayout {
  if (lines.length > QUICK_LINES && (overrides.headerLine ?? 0) < QUICK_LINES / 2) {
    try {
      return detectIn(fileName, lines.slice(0, QUICK_LINES), overrides);
    } catch (err) {
      if (!(err instanceof ImportError) || err.code === 'BAD_OVERRIDE') throw err;
    }
  }
  return detectIn(fileName, lines, overrides);
}

function detectIn(fileName: string, lines: string[], overrides: ImportOverrides): TableLayout {
  const h = overrides.headerLine;
  if (h !== undefined && (!Number.isInteger(h) || h < 0 || h >= lines.length)) {
    throw new ImportError('BAD_OVERRIDE', fileName, `the header line was set to ${h}, but the table must start below it and the file's first ${lines.length} lines were searched`);
  }
  const startAt = h && h > 0 ? h : 0;
  const body = lines.slice(startAt);
  let best: Scored | null = null;
  for (const delimiter of overrides.delimiter ? [overrides.delimiter] : DELIMITERS) {
    // A delimiter that no line holds splits no line into two fields, so it cannot score: not tried.
    if (!overrides.delimiter && delimiter !== 'whitespace' && !body.some((l) => l.includes(delimiter))) continue;
    const split = body.map((l) => splitFields(l, delimiter));
    // With ',' as delimiter a decimal comma is possible only inside quoted fields ("0,12","3,4").
    const decimals: DecimalMark[] = overrides.decimalMark ? [overrides.decimalMark] : ['.', ','];
    for (const decimal of decimals) {
      const s = scoreCandidate(body, split, { delimiter, decimal });
      if (s && better(s, best)) best = s;
    }
  }
  if (!best) throw noTableError(fileName, lines, overrides);
  const { c } = best;
  if (best.k > MAX_COLUMNS) {
    throw new ImportError('TOO_MANY_COLUMNS', fileName, `the table has ${best.k} columns (split at ${delimiterName(c.delimiter)}), more than the ${MAX_COLUMNS} any export of one voltammogram needs; export the potential, current and time columns, or choose another delimiter`, { line: best.first + startAt + 1 });
  }
  const first = best.first + startAt;
  const last = best.last + startAt;
  return {
    delimiter: { value: c.delimiter, overridden: !!overrides.delimiter, explanation: describeDelimiter(c.delimiter, !!overrides.delimiter, best.rows, last - first + 1, best.k, first + 1) },
    decimalMark: { value: c.decimal, overridden: !!overrides.decimalMark, explanation: decimalExplanation(c, lines.slice(first, last + 1), !!overrides.decimalMark) },
    fieldCount: best.k,
    firstDataLine: first,
    lastDataLine: last,
    dataRows: best.rows,
    split: (line) => splitFields(line, c.delimiter),
  };
}

/** "delimiter semicolon — 412 of 412 table lines from line 6 split into 4 numeric fields". */
export function describeDelimiter(d: Delimiter, forced: boolean, good: number, total: number, k: number, firstLine: number): string {
  return `delimiter ${delimiterName(d)}${forced ? ' (set by the user)' : ''} — ${good} of ${total} table lines from line ${firstLine} split into ${k} numeric fields`;
}

function decimalExplanation(c: Candidate, rows: string[], forced: boolean): string {
  if (forced) return `decimal mark '${c.decimal}' (set by the user)`;
  if (c.delimiter === ',' && c.decimal === ',') return "decimal mark ',' — the numbers are quoted (\"0,12\") so the commas inside them are decimal marks";
  if (c.delimiter === ',') return "decimal mark '.' — the delimiter is ',' so unquoted commas cannot be decimal marks";
  const withComma = rows.filter((r) => /\d,\d/.test(r)).length;
  const withPoint = rows.filter((r) => /\d\.\d/.test(r)).length;
  if (c.decimal === ',') return `decimal mark ',' — ${withComma} of the first ${rows.length} table lines hold numbers like 1,5`;
  if (withPoint) return `decimal mark '.' — ${withPoint} of the first ${rows.length} table lines hold numbers like 1.5`;
  return "decimal mark '.' — the numbers have no fractional part, so either mark reads them the same";
}

function noTableError(fileName: string, lines: string[], overrides: ImportOverrides): ImportError {
  let numericLines = 0;
  let firstNumeric = -1;
  for (let i = 0; i < lines.length; i++) {
    const t = (lines[i] as string).trim();
    if (t !== '' && (Number.isFinite(parseNumber(t, false)) || Number.isFinite(parseNumber(t, true)))) {
      numericLines++;
      if (firstNumeric < 0) firstNumeric = i;
    }
  }
  if (numericLines >= 2) {
    return new ImportError('ONE_COLUMN', fileName, `found ${numericLines} lines holding a single number each, but a voltammogram needs at least a potential and a current column`, { line: firstNumeric + 1 });
  }
  const cause = noTableCause(fileName, lines);
  if (cause) return cause;
  const forced = overrides.delimiter || overrides.decimalMark ? ' with the delimiter/decimal mark you chose' : '';
  return new ImportError('NO_TABLE', fileName, `no table of numbers found${forced}: no run of lines splits into two or more numeric fields (looked at ${lines.length} lines)`);
}

/**
 * The two usual reasons for finding no table, said with their line: cells that hold a number and
 * its unit ("-0.1000 V"), and a header with no data rows under it.
 */
function noTableCause(fileName: string, lines: string[]): ImportError | null {
  let headerAt = -1;
  let anyNumber = false;
  for (let i = 0; i < Math.min(lines.length, QUICK_LINES); i++) {
    const line = lines[i] as string;
    if (/\d/.test(line)) anyNumber = true;
    for (const d of [',', ';', '\t'] as const) {
      if (!line.includes(d)) continue;
      const fields = splitFields(line, d);
      const withUnit = fields.findIndex((f) => whyNotANumber(f, d !== ',' && /\d,\d/.test(f)).includes('unit'));
      if (withUnit >= 0 && fields.length >= 2) {
        return new ImportError('NO_TABLE', fileName, `no table of numbers found: the cells hold units as well as numbers ("${fields[withUnit]}"); export the values without units (the units belong in the header), or remove them`, { line: i + 1, column: withUnit + 1 });
      }
      if (headerAt < 0 && fields.length >= 2 && fields.filter((f) => readHeader(f).role !== null).length >= 2) headerAt = i;
    }
  }
  if (headerAt >= 0 && !anyNumber) return new ImportError('NO_TABLE', fileName, 'the file has a header but no data rows under it', { line: headerAt + 1 });
  return null;
}
