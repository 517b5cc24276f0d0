/**
 * The fast path of the table reader, for text without double quotes: walks each line's fields in
 * place and reads numbers with scanNumber, cutting no substrings for ordinary rows. It must give
 * what papaparse's tokens followed by the row rules of parseTable give for the same lines
 * (fields split at every delimiter character, or at runs of spaces and tabs; a line is one row);
 * the fuzz suite compares the two paths.
 */
import type { TableSpec } from './parseTable';
import { scanNumber } from './scanNumber';
import { badLine } from './tableRows';
import type { TableRows } from './tableRows';

const BLANK = 0;
const DATA = 1;
const BAD = 2;
type Kind = typeof BLANK | typeof DATA | typeof BAD;

/** Reads text[from, to), split at '\n', into `rows`; returns the file line after the last one. */
export function readPlainLines(text: string, from: number, to: number, firstLine: number, spec: TableSpec, rows: TableRows, values: Float64Array): number {
  const delimiter = spec.delimiter === 'whitespace' ? -1 : spec.delimiter.charCodeAt(0);
  const width = { n: 0 };
  let line = firstLine;
  let start = from;
  for (;;) {
    let end = text.indexOf('\n', start);
    if (end === -1 || end > to) end = to;
    const kind = delimiter < 0 ? readSpaced(text, start, end, spec, values, width, rows) : readDelimited(text, start, end, delimiter, spec, values, width, rows);
    if (kind === DATA) rows.data(values, width.n, line);
    else if (kind === BAD) badLine(headerFields(text.slice(start, end), spec.delimiter), line, spec, rows);
    else rows.blank();
    line++;
    if (end >= to) return line;
    start = end + 1;
  }
}

function readDelimited(text: string, from: number, to: number, d: number, spec: TableSpec, values: Float64Array, width: { n: number }, rows: TableRows): Kind {
  const k = spec.fieldCount;
  let n = 0;
  let finite = 0;
  let a = from;
  for (;;) {
    let b = a;
    while (b < to && text.charCodeAt(b) !== d) b++;
    const f = takeField(text, a, b, n++, k, spec.decimalComma, values, rows);
    if (f === EXTRA) {
      rows.forgetRow();
      return BAD;
    }
    finite += f;
    if (b >= to) break;
    a = b + 1;
  }
  return finish(text, from, to, n, finite, k, values, width);
}

function readSpaced(text: string, from: number, to: number, spec: TableSpec, values: Float64Array, width: { n: number }, rows: TableRows): Kind {
  const k = spec.fieldCount;
  let n = 0;
  let finite = 0;
  let a = from;
  for (;;) {
    while (a < to && isSpace(text.charCodeAt(a))) a++;
    if (a >= to) break;
    let b = a;
    while (b < to && !isSpace(text.charCodeAt(b))) b++;
    const f = takeField(text, a, b, n++, k, spec.decimalComma, values, rows);
    if (f === EXTRA) {
      rows.forgetRow();
      return BAD;
    }
    finite += f;
    a = b;
  }
  return finish(text, from, to, n, finite, k, values, width);
}

const EXTRA = -1;

/** Reads field `j` (text[a, b)) into values[j]: 1 when finite, 0 when not, EXTRA for a non-empty field past the k-th. */
function takeField(text: string, a: number, b: number, j: number, k: number, decimalComma: boolean, values: Float64Array, rows: TableRows): number {
  if (j >= k) return text.slice(a, b).trim() === '' ? 0 : EXTRA;
  let v = scanNumber(text, a, b, decimalComma);
  // Grouped digits, D exponents, and a note on what could not be read: only for refused fields.
  if (v !== v) v = rows.readOther(text.slice(a, b), j, decimalComma);
  values[j] = v;
  return v - v === 0 ? 1 : 0;
}

function finish(text: string, from: number, to: number, n: number, finite: number, k: number, values: Float64Array, width: { n: number }): Kind {
  if (n === 0 || (n === 1 && text.slice(from, to).trim() === '')) return BLANK;
  for (let j = n; j < k; j++) values[j] = NaN;
  width.n = n;
  return finite >= 2 ? DATA : BAD;
}

function isSpace(c: number): boolean {
  return c === 32 || c === 9;
}

/** The line's fields as papaparse would give them, trimmed. */
function headerFields(line: string, delimiter: TableSpec['delimiter']): string[] {
  const fields = delimiter === 'whitespace' ? line.split(/[ \t]/).filter((f) => f !== '') : line.split(delimiter);
  return fields.map((f) => f.trim());
}
