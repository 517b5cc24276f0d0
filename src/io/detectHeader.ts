/**
 * Finds the header line above the numeric table: the nearest non-blank line above the first data
 * row that splits into as many fields as the table and is mostly text. A line of bare units under
 * the names ("Potential;Current" then "V;µA") is folded into the names. Common practice, no source.
 */
import { ImportError } from './errors';
import { parseNumber, splitFields } from './textLines';
import { parseUnit } from './units';
import type { Delimiter, Guess, ImportOverrides } from './types';

export interface HeaderFound {
  guess: Guess<number | null>;
  /** Column names, one per field, or null without a header. */
  names: string[] | null;
  /** 0-based sample index of the first line that is not preamble (the header or first data row). */
  preambleEnd: number;
  /** Trimmed fields of the header line joined by '|', to recognise repeats. */
  headerKey: string | null;
}

export function splitHeader(line: string, delimiter: Delimiter, k: number): string[] | null {
  if (delimiter !== 'whitespace') {
    const f = splitFields(line, delimiter);
    // One missing trailing name: the data rows end with a delimiter and the header does not.
    if (f.length === k - 1 && k > 2) return [...f, ''];
    return f.length === k || (f.length > k && f.slice(k).every((x) => x === '')) ? f.slice(0, k) : null;
  }
  const wide = line.trim().split(/\t|\s{2,}/);
  if (wide.length === k) return wide.map((s) => s.trim().replace(/^"(.*)"$/, '$1'));
  const narrow = splitFields(line, 'whitespace');
  return narrow.length === k ? narrow : null;
}

function mostlyText(fields: string[], decimalComma: boolean): boolean {
  const text = fields.filter((f) => f !== '' && !Number.isFinite(parseNumber(f, decimalComma))).length;
  return text * 2 > fields.length;
}

const isUnitsLine = (fields: string[]) => fields.every((f) => f === '' || parseUnit(f) !== null) && fields.some((f) => f !== '');

export function detectHeader(fileName: string, lines: string[], firstData: number, delimiter: Delimiter, decimalComma: boolean, k: number, o: ImportOverrides): HeaderFound {
  if (o.headerLine !== undefined) return forcedHeader(fileName, lines, firstData, delimiter, k, o.headerLine);
  let i = firstData - 1;
  while (i >= 0 && (lines[i] as string).trim() === '') i--;
  if (i < 0) return none(firstData, 'no header line — the table starts on the first line');
  const fields = splitHeader(lines[i] as string, delimiter, k);
  if (!fields || !mostlyText(fields, decimalComma)) return none(firstData, `no header line — line ${i + 1} above the table does not split into ${k} names`);
  let names = fields;
  let line = i;
  let note = '';
  if (isUnitsLine(fields) && i > 0) {
    const above = splitHeader(lines[i - 1] as string, delimiter, k);
    if (above && mostlyText(above, decimalComma)) {
      names = above.map((n, j) => (fields[j] ? `${n} (${fields[j]})` : n));
      line = i - 1;
      note = ` with the units on line ${i + 1}`;
    }
  }
  return {
    guess: { value: line + 1, overridden: false, explanation: `header on line ${line + 1}${note} — ${k} names right above the numbers: ${names.map((n) => `"${n}"`).join(', ')}` },
    names,
    preambleEnd: line,
    headerKey: fields.join('|'),
  };
}

function none(firstData: number, explanation: string): HeaderFound {
  return { guess: { value: null, overridden: false, explanation }, names: null, preambleEnd: firstData, headerKey: null };
}

function forcedHeader(fileName: string, lines: string[], firstData: number, delimiter: Delimiter, k: number, headerLine: number): HeaderFound {
  if (headerLine === 0) return { ...none(firstData, 'no header line (set by the user)'), guess: { value: null, overridden: true, explanation: 'no header line (set by the user)' } };
  const raw = lines[headerLine - 1];
  if (!Number.isInteger(headerLine) || headerLine < 0 || raw === undefined) {
    throw new ImportError('BAD_OVERRIDE', fileName, `the header line was set to ${headerLine}, but the file's first ${lines.length} lines were searched`);
  }
  const names = splitHeader(raw, delimiter, k);
  if (!names) throw new ImportError('BAD_OVERRIDE', fileName, `line ${headerLine} was chosen as the header, but it does not split into the table's ${k} columns`, { line: headerLine });
  return { guess: { value: headerLine, overridden: true, explanation: `header on line ${headerLine} (set by the user)` }, names, preambleEnd: headerLine - 1, headerKey: names.join('|') };
}
