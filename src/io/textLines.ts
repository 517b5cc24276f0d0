/**
 * Line handling shared by detection and parsing: line-ending detection and normalisation to LF,
 * a bounded head sample of lines with their character offsets, field splitting that agrees
 * with the tokeniser (RFC 4180 quoting for the single-character delimiters), and strict number
 * reading with either decimal mark (IEEE 754 doubles via ECMAScript Number()).
 */
import type { Delimiter, Guess } from './types';

export type LineEnding = 'LF' | 'CRLF' | 'CR' | 'mixed' | 'none';

/** Returns the text with every line ending turned into "\n", and what the file used. */
export function normaliseLineEnds(text: string): { text: string; lineEnding: Guess<LineEnding> } {
  const crlf = occursIn(text, /\r\n/, 200000);
  const cr = occursIn(text, /\r(?!\n)/, 200000);
  const lf = occursIn(text, /(?<!\r)\n/, 200000);
  const kinds = [crlf, cr, lf].filter(Boolean).length;
  const value: LineEnding = kinds === 0 ? 'none' : kinds > 1 ? 'mixed' : crlf ? 'CRLF' : cr ? 'CR' : 'LF';
  const names: Record<LineEnding, string> = { LF: 'LF (Unix)', CRLF: 'CRLF (Windows)', CR: 'CR (classic Mac)', mixed: 'mixed', none: 'none (a single line)' };
  const out = crlf || cr ? text.replace(/\r\n?/g, '\n') : text;
  return { text: out, lineEnding: { value, overridden: false, explanation: `line endings ${names[value]}` } };
}

/** Whether `re` matches within the first `limit` characters (a search that stops at the first match, listing none). */
function occursIn(text: string, re: RegExp, limit: number): boolean {
  return re.test(text.length > limit ? text.slice(0, limit) : text);
}

export interface SampledLines {
  lines: string[];
  /** Character offset of each line's start in the normalised text. */
  offsets: number[];
  /** True when the sample ends before the text does. */
  truncated: boolean;
}

/** The first lines of LF-normalised text, at most `maxLines` lines or about `maxChars` characters. */
export function sampleLines(text: string, maxLines = 4000, maxChars = 1 << 20): SampledLines {
  const lines: string[] = [];
  const offsets: number[] = [];
  let pos = 0;
  while (pos <= text.length && lines.length < maxLines && pos < maxChars) {
    const nl = text.indexOf('\n', pos);
    const end = nl === -1 ? text.length : nl;
    lines.push(text.slice(pos, end));
    offsets.push(pos);
    if (nl === -1) return { lines, offsets, truncated: false };
    pos = nl + 1;
  }
  return { lines, offsets, truncated: pos < text.length };
}

/** Splits one line into trimmed fields the way the tokeniser will. */
export function splitFields(line: string, delimiter: Delimiter): string[] {
  if (delimiter === 'whitespace') {
    const t = line.trim();
    if (t === '') return [];
    const parts = t.split(/\s+/);
    for (let i = 0; i < parts.length; i++) parts[i] = unquote(parts[i] as string);
    return parts;
  }
  if (line.indexOf('"') === -1) {
    const parts = line.split(delimiter);
    for (let i = 0; i < parts.length; i++) parts[i] = (parts[i] as string).trim();
    return parts;
  }
  return splitQuoted(line, delimiter).map((f) => f.trim());
}

function unquote(f: string): string {
  return f.length >= 2 && f.charCodeAt(0) === 34 && f.charCodeAt(f.length - 1) === 34 ? unescapeQuotes(f.slice(1, -1)) : f;
}

/** "" → " inside a quoted field (split/join: a 10 MB run of quotes stays fast). */
function unescapeQuotes(t: string): string {
  return t.indexOf('"') === -1 ? t : t.split('""').join('"');
}

/**
 * RFC 4180 splitting of one line: a field that starts (after blanks) with a double quote runs to
 * the closing quote, "" standing for one quote. Walks the line once, cutting slices rather than
 * adding characters one by one, so a 10 MB line of quotes stays linear.
 */
function splitQuoted(line: string, d: string): string[] {
  const out: string[] = [];
  const dc = d.charCodeAt(0);
  const n = line.length;
  let field = '';
  let blank = true; // field.trim() === ''
  let i = 0;
  for (;;) {
    let j = i;
    for (; j < n; j++) {
      const c = line.charCodeAt(j);
      if (c === dc || (c === 34 && blank)) break;
      if (blank && !isWhiteSpace(c)) blank = false;
    }
    field += line.slice(i, j);
    if (j >= n) break;
    if (line.charCodeAt(j) === dc) {
      out.push(field);
      field = '';
      blank = true;
      i = j + 1;
      continue;
    }
    const q = readQuoted(line, j + 1);
    field = q.text;
    blank = field.trim() === '';
    i = q.next;
    if (i > n) break;
  }
  out.push(field);
  return out;
}

/** The quoted field's text from `from` (just after its opening quote) and the index after its closing quote. */
function readQuoted(line: string, from: number): { text: string; next: number } {
  for (let p = from; ; ) {
    const q = line.indexOf('"', p);
    if (q === -1) return { text: unescapeQuotes(line.slice(from)), next: line.length + 1 };
    if (line.charCodeAt(q + 1) !== 34) return { text: unescapeQuotes(line.slice(from, q)), next: q + 1 };
    p = q + 2;
  }
}

/** The characters String.prototype.trim removes (ECMA-262 WhiteSpace and LineTerminator). */
function isWhiteSpace(c: number): boolean {
  return c === 32 || (c >= 9 && c <= 13) || (c > 127 && /\s/.test(String.fromCharCode(c)));
}

/**
 * A decimal number in free text (a preamble line, a column name), as a RegExp source with one
 * capture group. It starts where no digit, point or comma stands before it, and a run of digits
 * splits one way only (\d+(?:[.,]\d*)? rather than \d+[.,]?\d*): patterns built on it then
 * backtrack linearly, not cubically, on a long run of digits.
 */
export const NUMBER_PATTERN = '(?<![\\d.,])([+-]?(?:\\d+(?:[.,]\\d*)?|[.,]\\d+)(?:[eE][+-]?\\d+)?)';

/**
 * Reads a number strictly: surrounding blanks allowed, scientific notation allowed, decimal
 * comma when `decimalComma`; hexadecimal/binary/octal literals, thousands separators and text
 * give NaN. Empty fields give NaN (Number('') would give 0).
 */
export function parseNumber(field: string, decimalComma: boolean): number {
  let s = field;
  if (decimalComma) {
    if (s.indexOf('.') !== -1) return NaN;
    s = s.replace(',', '.');
  }
  const v = Number(s);
  if (v === 0) return s.trim() === '' ? NaN : v;
  if (v === v && s.length > 2) {
    // Number() also accepts 0x1F, 0b101 and 0o17; an instrument never means those.
    const t = s.charCodeAt(0) === 32 ? s.trim() : s;
    const c = t.charCodeAt(1) | 0x20;
    if (t.charCodeAt(0) === 48 && (c === 0x78 || c === 0x62 || c === 0x6f)) return NaN;
  }
  return v;
}

/** True for tokens an instrument writes for a missing or overflowed value. */
export function isNonFiniteToken(field: string): boolean {
  return /^[+-]?(nan|inf|infinity|-?1\.#(ind|inf|qnan)|n\/a|na|overflow|---?)$/i.test(field.trim());
}
