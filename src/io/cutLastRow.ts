/**
 * A file cut short (a copy stopped, a disk full) can end in a row that still reads as numbers:
 * "…,-2.570897e-06" cut to "…,-2.5" or "-2.". When every row above it writes a column the same way
 * (the same number of decimals, an exponent or none) and the last row writes it shorter and
 * otherwise, the last row is taken for cut off and left out, with a warning naming its line; a
 * file that ends without a line break says so too. Rows written with varying shapes (%g) are
 * never judged. Method: common practice, no source.
 */
import { makeWarning } from './errors';
import type { ImportWarning } from './errors';
import type { TableLayout } from './detectFormat';
import type { ParsedTable } from './parseTable';
import { parseNumber } from './textLines';

/** Rows above the last one compared, and how many of them must share one shape (common practice, no source). */
const ROWS_COMPARED = 20;
const ROWS_NEEDED = 5;

interface Shape {
  decimals: number;
  exponent: boolean;
  length: number;
}

function shapeOf(field: string): Shape | null {
  const m = /^[+-]?\d*(?:[.,](\d*))?([eEdD][+-]?\d*)?$/.exec(field);
  return m ? { decimals: (m[1] ?? '').length + (field.search(/[.,]/) >= 0 ? 0 : -1), exponent: m[2] !== undefined, length: field.length } : null;
}

/** Leaves out the table's last row when it looks cut off; warns naming its line. */
export function cutTruncatedLastRow(fileName: string, text: string, t: ParsedTable, layout: TableLayout, decimalComma: boolean, warnings: ImportWarning[]): void {
  const n = t.rowCount;
  if (n <= ROWS_NEEDED) return;
  const tail = linesBefore(text, t.lineCount - (t.lineOfRow[n - 1] as number), ROWS_COMPARED * 3);
  if (!tail) return;
  const last = layout.split(tail.last);
  if (!sameValues(last, t, n - 1, decimalComma)) return;
  const above = tail.above.map(layout.split).filter((f) => f.length === last.length).slice(0, ROWS_COMPARED);
  if (above.length < ROWS_NEEDED) return;
  const column = cutColumn(last, above);
  if (column < 0) return;
  const line = t.lineOfRow[n - 1] as number;
  t.rowCount = n - 1;
  t.columns = t.columns.map((c) => c.subarray(0, n - 1));
  t.lineOfRow = t.lineOfRow.subarray(0, n - 1);
  t.lastDataLine = t.lineOfRow[n - 2] as number;
  t.cutLastLine = line;
  const ending = text.endsWith('\n') ? '' : '; the file ends without a line break';
  warnings.push(makeWarning('LAST_ROW_CUT', `${fileName}: the last row (line ${line}: "${tail.last.slice(0, 60)}") writes column ${column + 1} as "${last[column] ?? ''}", shorter and otherwise than the ${above.length} rows above it ("${above[0]?.[column] ?? ''}")${ending}: it looks cut off and was left out`, [line], 1));
}

/** The first column whose field in `last` breaks the one shape all rows `above` share, and is shorter than all of them; -1 when none. */
function cutColumn(last: string[], above: string[][]): number {
  for (let j = 0; j < last.length; j++) {
    const s = shapeOf(last[j] as string);
    const shapes = above.map((f) => shapeOf(f[j] as string));
    const first = shapes[0];
    if (!s || !first || shapes.some((x) => !x || x.decimals !== first.decimals || x.exponent !== first.exponent)) continue;
    const shortest = Math.min(...shapes.map((x) => (x as Shape).length));
    if ((s.decimals !== first.decimals || s.exponent !== first.exponent) && s.length < shortest) return j;
  }
  return -1;
}

/** The row's fields read to the table's values at row `r` (so that the line found is the last row). */
function sameValues(fields: string[], t: ParsedTable, r: number, decimalComma: boolean): boolean {
  for (let j = 0; j < t.columns.length; j++) {
    const v = (t.columns[j] as Float64Array)[r] as number;
    const f = parseNumber(fields[j] ?? '', decimalComma);
    if (Number.isFinite(v) && Number.isFinite(f) && v !== f) return false;
  }
  return true;
}

/** The line `back` lines above the text's last line, and up to `count` non-blank lines above it (nearest first). */
function linesBefore(text: string, back: number, count: number): { last: string; above: string[] } | null {
  // The start of the line that ends at `end` (exclusive); a line ending at 0 starts there too
  // (lastIndexOf with a negative start would look at index 0 again, and never get past it).
  const lineStart = (end: number) => (end <= 0 ? 0 : text.lastIndexOf('\n', end - 1) + 1);
  let end = text.length;
  let start = lineStart(end);
  for (let b = 0; b < back; b++) {
    if (start === 0) return null;
    end = start - 1;
    start = lineStart(end);
  }
  const last = text.slice(start, end);
  const above: string[] = [];
  while (start > 0 && above.length < count) {
    end = start - 1;
    start = lineStart(end);
    const l = text.slice(start, end);
    if (l.trim() !== '') above.push(l);
  }
  return { last, above };
}
