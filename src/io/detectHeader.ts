/**
 * Finds the header block above the numeric table: a line of column names and a line of units
 * (in either order), with comment lines (a sample code, a note) among or below them. Up to
 * HEADER_BLOCK_LINES non-blank lines above the first data row are looked at. The names line is
 * the nearest line that splits into as many fields as the table and is mostly text, and either
 * sits right above the table (or the units row) or names two known quantities; the units row is the
 * nearest line whose every entry is a unit ("V RHE", "", "mA cm-2"). Common practice, no source.
 */
import { ImportError } from './errors';
import { readHeader } from './headerNames';
import { parseNumber, splitFields } from './textLines';
import { parseUnit } from './units';
import { splitUnitReference } from './unitReference';
import type { Delimiter, Guess, ImportOverrides } from './types';

export interface HeaderFound {
  guess: Guess<number | null>;
  /** Column names, one per field, or null without a header. */
  names: string[] | null;
  /** Entries of the units row, one per field ('' where blank), or null without one. */
  units: string[] | null;
  /** 0-based sample index of the units row, or null. */
  unitsLine: number | null;
  /** 0-based sample indices of the other lines of the header block (comments). */
  commentLines: number[];
  /** 0-based sample index of the first line that is not preamble (the header block or first data row). */
  preambleEnd: number;
  /** Trimmed fields of the names line joined by '|', to recognise repeats. */
  headerKey: string | null;
}

/** Non-blank lines above the table searched for names and units (common practice, no source). */
export const HEADER_BLOCK_LINES = 6;

/**
 * The names (or units) of a header line: `k` fields split on the table's delimiter; failing that,
 * the same line read as exports also write it (`headerFields`). Null when no reading gives `k`.
 */
export function splitHeader(line: string, delimiter: Delimiter, k: number): string[] | null {
  const plain = splitOnTableDelimiter(line, delimiter, k);
  return plain ?? headerFields(line, delimiter, k);
}

function splitOnTableDelimiter(line: string, delimiter: Delimiter, k: number): string[] | null {
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

/** Longest line read as names by the ways of `headerFields` (common practice, no source). */
const MAX_NAMES_LINE_CHARS = 2000;

/** A comment mark before the names: "# t/s, E/V, I/A", "% time  potential  current". */
const LEADING_MARK = /^\s*[#%]\s+(?=\S)/;

/**
 * Header lines that the table's own delimiter does not split into `k` names, read the ways exports
 * write them (common practice, no source), each taken only when it gives exactly `k` non-empty names:
 * 1. a unit or note in brackets holds the delimiter: "I (µA, cathodic positive),E (V)";
 * 2. the header is delimited unlike the numbers: names by commas above tab-separated data;
 * 3. single spaces between names that carry their units in brackets: "Time (s) Potential (V) Current (A)".
 */
function headerFields(line: string, delimiter: Delimiter, k: number): string[] | null {
  // A names line is short; a long line (a hostile or damaged file) is not searched this way.
  if (line.length > MAX_NAMES_LINE_CHARS) return null;
  const text = line.replace(LEADING_MARK, '');
  const tries: Array<string[] | null> = [
    text === line ? null : splitOnTableDelimiter(text, delimiter, k),
    ...(['\t', ';', ',', 'wide'] as const).map((d) => splitOutsideBrackets(text, d)),
    namesWithBracketedUnits(text),
  ];
  for (const f of tries) if (f && f.length === k && f.every((x) => x !== '')) return f;
  return null;
}

const OPEN = '([{';
const CLOSE = ')]}';

/** Splits on the delimiter (or on a tab or two or more spaces, "wide") outside brackets and quotes; null when the brackets do not balance. */
function splitOutsideBrackets(line: string, d: '\t' | ';' | ',' | 'wide'): string[] | null {
  const out: string[] = [];
  let depth = 0;
  let quoted = false;
  let start = 0;
  for (let i = 0; i < line.length; i++) {
    const c = line[i] as string;
    if (c === '"') quoted = !quoted;
    if (quoted) continue;
    if (OPEN.includes(c)) depth++;
    else if (CLOSE.includes(c)) depth--;
    if (depth < 0) return null;
    if (depth > 0) continue;
    const wideAt = d === 'wide' && (c === '\t' || (c === ' ' && line[i + 1] === ' '));
    if (c === d || wideAt) {
      out.push(line.slice(start, i));
      if (wideAt) while (line[i + 1] === ' ' || line[i + 1] === '\t') i++;
      start = i + 1;
    }
  }
  if (depth !== 0 || quoted) return null;
  out.push(line.slice(start));
  const fields = out.map((f) => f.trim().replace(/^"(.*)"$/, '$1'));
  return fields.length > 1 ? fields : null;
}

/** Words joined to the bracketed unit that follows them; each name must end in its unit. */
function namesWithBracketedUnits(line: string): string[] | null {
  const names = line.trim().match(/[^\s([{]+(?:\s*[([{][^)\]}]*[)\]}])+/g);
  if (!names) return null;
  // The names must use up the whole line (no stray words between them).
  return names.join(' ').replace(/\s+/g, '') === line.replace(/\s+/g, '') ? names.map((n) => n.trim()) : null;
}

function mostlyText(fields: string[], decimalComma: boolean): boolean {
  const text = fields.filter((f) => f !== '' && !Number.isFinite(parseNumber(f, decimalComma))).length;
  return text * 2 > fields.length;
}

/** Entries a units row may hold besides the units the importer converts. */
const OTHER_UNIT = /^(#|-|–|—|a\.?\s*u\.?|°\s*c|ºc|k|ohms?|ω|hz|rpm|%|w|mw|cm2|cm²|mm2|mm²|1|n\/a|none|no\.?|°)$/i;

function isUnitsLine(fields: string[]): boolean {
  let units = 0;
  for (const f of fields) {
    if (f === '') continue;
    if (parseUnit(splitUnitReference(f).unitText)) units++;
    else if (!OTHER_UNIT.test(f.trim())) return false;
  }
  return units > 0;
}

/** A names line away from the numbers must name two quantities ("E", "j"), so that a preamble
 * line such as "Scan rate;100;mV/s" is not taken for one. */
const namesQuantities = (fields: string[]) => fields.filter((f) => {
  const r = readHeader(f).role;
  return r === 'potential' || r === 'current' || r === 'time';
}).length >= 2;

export function detectHeader(fileName: string, lines: string[], firstData: number, delimiter: Delimiter, decimalComma: boolean, k: number, o: ImportOverrides): HeaderFound {
  if (o.headerLine !== undefined) return forcedHeader(fileName, lines, firstData, delimiter, k, o.headerLine);
  const block = blockAbove(lines, firstData);
  if (!block.length) return none(firstData, 'no header line — the table starts on the first line');
  const split = block.map((i) => splitHeader(lines[i] as string, delimiter, k));
  const unitsAt = split.findIndex((f) => f !== null && isUnitsLine(f));
  const adjacent = (b: number) => b === 0 || (unitsAt >= 0 && Math.abs(b - unitsAt) === 1);
  const namesAt = split.findIndex((f, b) => b !== unitsAt && f !== null && mostlyText(f, decimalComma) && (adjacent(b) || namesQuantities(f)));
  if (namesAt < 0 && unitsAt < 0) return none(firstData, `no header line — line ${(block[0] as number) + 1} above the table does not split into ${k} names`);
  // A units row alone ("V;µA" right above the numbers) names the columns by their units.
  const names = (namesAt >= 0 ? split[namesAt] : split[unitsAt]) as string[];
  const units = namesAt >= 0 && unitsAt >= 0 ? (split[unitsAt] as string[]) : null;
  const namesLine = block[namesAt >= 0 ? namesAt : unitsAt] as number;
  const unitsLine = units ? (block[unitsAt] as number) : null;
  const top = Math.min(namesLine, unitsLine ?? namesLine);
  const commentLines = block.filter((i) => i > top && i !== namesLine && i !== unitsLine).sort((a, b) => a - b);
  return {
    guess: { value: namesLine + 1, overridden: false, explanation: describe(names, units, namesLine, unitsLine, commentLines, k) },
    names, units, unitsLine, commentLines,
    preambleEnd: top,
    headerKey: names.join('|'),
  };
}

/** 0-based indices of the non-blank lines above the table, nearest first. */
function blockAbove(lines: string[], firstData: number): number[] {
  const out: number[] = [];
  for (let i = firstData - 1; i >= 0 && out.length < HEADER_BLOCK_LINES; i--) if ((lines[i] as string).trim() !== '') out.push(i);
  return out;
}

function describe(names: string[], units: string[] | null, namesLine: number, unitsLine: number | null, comments: number[], k: number): string {
  const shown = names.map((n, j) => `"${n}${units?.[j] ? ` [${units[j]}]` : ''}"`).join(', ');
  const unitNote = unitsLine !== null ? ` with the units on line ${unitsLine + 1}` : '';
  const commentNote = comments.length ? `; line${comments.length > 1 ? 's' : ''} ${comments.map((c) => c + 1).join(', ')} of the header block read as comment${comments.length > 1 ? 's' : ''}` : '';
  return `header on line ${namesLine + 1}${unitNote} — ${k} names above the numbers: ${shown}${commentNote}`;
}

function none(firstData: number, explanation: string): HeaderFound {
  return { guess: { value: null, overridden: false, explanation }, names: null, units: null, unitsLine: null, commentLines: [], preambleEnd: firstData, headerKey: null };
}

function forcedHeader(fileName: string, lines: string[], firstData: number, delimiter: Delimiter, k: number, headerLine: number): HeaderFound {
  if (headerLine === 0) return { ...none(firstData, 'no header line (set by the user)'), guess: { value: null, overridden: true, explanation: 'no header line (set by the user)' } };
  const raw = lines[headerLine - 1];
  if (!Number.isInteger(headerLine) || headerLine < 0 || raw === undefined) {
    throw new ImportError('BAD_OVERRIDE', fileName, `the header line was set to ${headerLine}, but the file's first ${lines.length} lines were searched`);
  }
  const names = splitHeader(raw, delimiter, k);
  if (!names) throw new ImportError('BAD_OVERRIDE', fileName, `line ${headerLine} was chosen as the header, but it does not split into the table's ${k} columns`, { line: headerLine });
  // A units row may still sit between the chosen names and the numbers.
  let unitsLine: number | null = null;
  for (let i = headerLine; i < firstData && unitsLine === null; i++) {
    const f = splitHeader(lines[i] as string, delimiter, k);
    if (f && isUnitsLine(f)) unitsLine = i;
  }
  const units = unitsLine === null ? null : splitHeader(lines[unitsLine] as string, delimiter, k);
  const note = unitsLine === null ? '' : `, units on line ${unitsLine + 1}`;
  return { guess: { value: headerLine, overridden: true, explanation: `header on line ${headerLine} (set by the user)${note}` }, names, units, unitsLine, commentLines: [], preambleEnd: headerLine - 1, headerKey: names.join('|') };
}
