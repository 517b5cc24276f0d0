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
  const crlf = countMatches(text, /\r\n/g, 200000);
  const cr = countMatches(text, /\r(?!\n)/g, 200000);
  const lf = countMatches(text, /(?<!\r)\n/g, 200000);
  const kinds = [crlf > 0, cr > 0, lf > 0].filter(Boolean).length;
  const value: LineEnding = kinds === 0 ? 'none' : kinds > 1 ? 'mixed' : crlf ? 'CRLF' : cr ? 'CR' : 'LF';
  const names: Record<LineEnding, string> = { LF: 'LF (Unix)', CRLF: 'CRLF (Windows)', CR: 'CR (classic Mac)', mixed: 'mixed', none: 'none (a single line)' };
  const out = crlf || cr ? text.replace(/\r\n?/g, '\n') : text;
  return { text: out, lineEnding: { value, overridden: false, explanation: `line endings ${names[value]}` } };
}

function countMatches(text: string, re: RegExp, limit: number): number {
  const head = text.length > limit ? text.slice(0, limit) : text;
  return head.match(re)?.length ?? 0;
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
    return t === '' ? [] : t.split(/\s+/).map(unquote);
  }
  if (line.indexOf('"') === -1) {
    const parts = line.split(delimiter);
    for (let i = 0; i < parts.length; i++) parts[i] = (parts[i] as string).trim();
    return parts;
  }
  return splitQuoted(line, delimiter).map((f) => f.trim());
}

function unquote(f: string): string {
  return f.length >= 2 && f.charCodeAt(0) === 34 && f.charCodeAt(f.length - 1) === 34 ? f.slice(1, -1).replace(/""/g, '"') : f;
}

function splitQuoted(line: string, d: string): string[] {
  const out: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const c = line[i] as string;
    if (quoted) {
      if (c === '"' && line[i + 1] === '"') {
        field += '"';
        i++;
      } else if (c === '"') quoted = false;
      else field += c;
    } else if (c === '"' && field.trim() === '') {
      quoted = true;
      field = '';
    } else if (c === d) {
      out.push(field);
      field = '';
    } else field += c;
  }
  out.push(field);
  return out;
}

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
