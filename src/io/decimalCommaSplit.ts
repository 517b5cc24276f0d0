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

/** Throws AMBIGUOUS_DECIMAL_COMMA when the table's commas are decimal marks too. */
export function refuseSplitDecimalComma(fileName: string, lines: string[], layout: TableLayout): void {
  if (layout.delimiter.value !== ',') return;
  const headerAt = nonBlankAbove(lines, layout.firstDataLine);
  if (headerAt < 0) return;
  const names = splitFields(lines[headerAt] as string, ',').filter((f) => f !== '');
  const m = names.length;
  if (m < 2 || layout.fieldCount !== 2 * m || names.some((n) => Number.isFinite(parseNumber(n, false)))) return;
  let looked = 0;
  let split = 0;
  for (let i = layout.firstDataLine; i < lines.length && looked < ROWS_LOOKED_AT; i++) {
    const fields = splitFields(lines[i] as string, ',');
    if (fields.length < 2) continue;
    looked++;
    if (fields.length === 2 * m && fields.every((f, j) => (j % 2 === 1 ? /^\d+$/.test(f) : /^[+-]?\d+$/.test(f)))) split++;
  }
  if (looked === 0 || split < SPLIT_SHARE * looked) return;
  const example = (lines[layout.firstDataLine] as string).slice(0, 60);
  throw new ImportError('AMBIGUOUS_DECIMAL_COMMA', fileName, `the header on line ${headerAt + 1} names ${m} columns, but the rows split at ',' into ${2 * m} fields ("${example}"): the numbers are written with a decimal comma and the comma also separates the fields, so the columns cannot be told apart. Export the file again with ';' or tab between the fields, or with the numbers in quotes ("0,12")`, { line: layout.firstDataLine + 1 });
}

function nonBlankAbove(lines: string[], first: number): number {
  for (let i = first - 1; i >= 0; i--) if ((lines[i] as string).trim() !== '') return i;
  return -1;
}
