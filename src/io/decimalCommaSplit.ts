/**
 * A comma-delimited table whose numbers also carry an unquoted decimal comma ("0,00,-0,1000,0,0707"
 * under "Time (s),Potential (V),Current (µA)") splits every number in two at its decimal mark.
 * The fields then read as numbers, but not as the file's numbers: the header names half as many
 * columns as the rows hold, and every second field is a bare run of digits (the decimals). Such a
 * file is refused with what to do; it cannot be read back reliably (a value written without
 * decimals would shift every column after it). Method: common practice, no source.
 */
import { ImportError } from './errors';
import type { TableLayout } from './detectFormat';
import { parseNumber, splitFields } from './textLines';

/** Rows looked at, and the share of them that must show the split (common practice, no source). */
const ROWS_LOOKED_AT = 50;
const SPLIT_SHARE = 0.9;

/** An integer part, and the decimals after it (maybe with an exponent: "0000e-07" of "2,0000e-07"). */
const WHOLE = /^[+-]?\d+$/;
const DECIMALS = /^\d+([eE][+-]?\d+)?$/;

/** Throws AMBIGUOUS_DECIMAL_COMMA when the table's commas are decimal marks too. */
export function refuseSplitDecimalComma(fileName: string, lines: string[], layout: TableLayout): void {
  if (layout.delimiter.value !== ',' || layout.fieldCount % 2 !== 0) return;
  const headerAt = nonBlankAbove(lines, layout.firstDataLine);
  const names = headerAt < 0 ? [] : splitFields(lines[headerAt] as string, ',').filter((f) => f !== '');
  const named = names.length >= 2 && layout.fieldCount === 2 * names.length && !names.some((n) => Number.isFinite(parseNumber(n, false)));
  // Without names to count, the split must show in the digits themselves (fieldCount 4 or more).
  if (!named && layout.fieldCount < 4) return;
  const m = layout.fieldCount / 2;
  let looked = 0;
  let split = 0;
  /** Rows whose decimals keep a leading zero or an exponent, and each decimals column's widths. */
  let telling = 0;
  const widths = Array.from({ length: m }, () => new Set<number>());
  for (let i = layout.firstDataLine; i < lines.length && looked < ROWS_LOOKED_AT; i++) {
    const fields = splitFields(lines[i] as string, ',');
    if (fields.length < 2) continue;
    looked++;
    if (fields.length !== 2 * m || !fields.every((f, j) => (j % 2 === 1 ? DECIMALS : WHOLE).test(f))) continue;
    split++;
    if (fields.some((f, j) => j % 2 === 1 && ((f.length > 1 && f[0] === '0') || /[eE]/.test(f)))) telling++;
    fields.forEach((f, j) => j % 2 === 1 && widths[(j - 1) / 2]?.add(f.replace(/[eE].*$/, '').length));
  }
  if (looked === 0 || split < SPLIT_SHARE * looked) return;
  // Decimals written to a fixed number of places, or keeping their leading zeros: a column of
  // whole numbers (a point index, a potential in mV) varies in width and drops its leading zeros.
  const fixedPlaces = looked >= 10 && widths.every((w) => w.size === 1);
  if (!named && !(fixedPlaces || telling >= SPLIT_SHARE * looked)) return;
  const example = (lines[layout.firstDataLine] as string).slice(0, 60);
  const why = named
    ? `the header on line ${headerAt + 1} names ${m} columns, but the rows split at ',' into ${2 * m} fields ("${example}")`
    : `the rows split at ',' into ${2 * m} fields ("${example}"), each second one a run of decimals (${fixedPlaces ? 'always as many digits' : 'with leading zeros or an exponent'}), as numbers written with a decimal comma would`;
  throw new ImportError('AMBIGUOUS_DECIMAL_COMMA', fileName, `${why}: the numbers are written with a decimal comma and the comma also separates the fields, so the columns cannot be told apart. Export the file again with ';' or tab between the fields, or with the numbers in quotes ("0,12")`, { line: layout.firstDataLine + 1 });
}

function nonBlankAbove(lines: string[], first: number): number {
  for (let i = first - 1; i >= 0; i--) if ((lines[i] as string).trim() !== '') return i;
  return -1;
}
