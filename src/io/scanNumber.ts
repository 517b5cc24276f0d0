/**
 * Reads a number straight from a stretch of the text, without cutting a substring, for the
 * plain-table fast path. Gives exactly what parseNumber gives for the same characters: plain
 * decimals of at most 15 digits with a power-of-ten exponent within ±22 are built as m·10^e or
 * m/10^−e, which is correctly rounded because both m and 10^|e| are exact doubles (Clinger,
 * "How to read floating point numbers accurately", PLDI 1990, the "fast path"); anything else
 * (more digits, "Inf", hex, stray characters) is handed to parseNumber on the substring.
 */
import { parseNumber } from './textLines';

const POW10 = Array.from({ length: 23 }, (_, i) => 10 ** i);
const SPACE = 32;
const TAB = 9;

/** Value of text[from, to) as parseNumber(text.slice(from, to), decimalComma) would read it. */
export function scanNumber(text: string, from: number, to: number, decimalComma: boolean): number {
  let a = from;
  let b = to;
  while (a < b && isBlank(text.charCodeAt(a))) a++;
  while (b > a && isBlank(text.charCodeAt(b - 1))) b--;
  const v = a < b ? quickDecimal(text, a, b, decimalComma ? 44 : 46) : NaN;
  return v === v ? v : parseNumber(text.slice(from, to), decimalComma);
}

function isBlank(c: number): boolean {
  return c === SPACE || c === TAB;
}

/** NaN means "not handled here" (the caller then asks parseNumber), never "not a number". */
function quickDecimal(s: string, from: number, to: number, mark: number): number {
  let i = from;
  let c = s.charCodeAt(i);
  const negative = c === 45;
  if (c === 45 || c === 43) c = s.charCodeAt(++i);
  let mantissa = 0;
  let digits = 0;
  let scale = 0;
  let seenMark = false;
  for (; i < to; c = s.charCodeAt(++i)) {
    if (c >= 48 && c <= 57) {
      mantissa = mantissa * 10 + (c - 48);
      digits++;
      if (seenMark) scale--;
    } else if (c === mark && !seenMark) seenMark = true;
    else break;
  }
  if (digits === 0 || digits > 15) return NaN;
  if (i < to) {
    if (c !== 101 && c !== 69) return NaN;
    const e = readExponent(s, i + 1, to);
    if (e === null) return NaN;
    scale += e;
  }
  if (scale < -22 || scale > 22) return NaN;
  const v = scale >= 0 ? mantissa * (POW10[scale] as number) : mantissa / (POW10[-scale] as number);
  return negative ? -v : v;
}

function readExponent(s: string, from: number, to: number): number | null {
  let i = from;
  let sign = 1;
  const c = s.charCodeAt(i);
  if (c === 45 || c === 43) {
    sign = c === 45 ? -1 : 1;
    i++;
  }
  if (i >= to || to - i > 3) return null;
  let e = 0;
  for (; i < to; i++) {
    const d = s.charCodeAt(i) - 48;
    if (d < 0 || d > 9) return null;
    e = e * 10 + d;
  }
  return sign * e;
}
