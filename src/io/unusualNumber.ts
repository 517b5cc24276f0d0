/**
 * Numbers the strict reader (textLines.ts parseNumber) refuses but whose value is not in doubt:
 * - digits grouped in threes: "1,234.5" where the decimal mark is a point, "1.234,5" where it is a
 *   comma, and "1 234,5" with a space, a no-break space or a thin space under either mark.
 *   Grouping in threes by a space: BIPM, The International System of Units (SI Brochure), 9th ed.
 *   (2019), sect. 5.4.4; by a comma or point opposite the decimal mark: common practice, no source.
 *   The groups must be exactly three digits after a first group of one to three that does not
 *   start with 0, so that "0,123" (a decimal comma) is never taken for a group;
 * - a Fortran D exponent, "1.234567D-05" (= 1.234567e-05): ISO/IEC 1539-1 (Fortran), the
 *   double-precision real literal constant (from memory).
 * Called only for a field the strict reader gave NaN, so ordinary tables pay nothing for it.
 * The decimal mark is the file's (one per file): a comma can group digits only where the point
 * is the decimal mark, and a point only where the comma is.
 */

import { parseUnit } from './units';

export type UnusualKind = 'grouped' | 'exponentD';

export interface UnusualReading {
  value: number;
  kind: UnusualKind;
  /** The grouping character (',', '.', ' ', U+00A0…) for 'grouped'; 'D' for 'exponentD'. */
  mark: string;
}

const EXPONENT = '(?:[eE][+-]?\\d{1,3})?';
const GROUPED_COMMA = new RegExp(`^[+-]?[1-9]\\d{0,2}(?:,\\d{3})+(?:\\.\\d*)?${EXPONENT}$`);
const GROUPED_POINT = /^[+-]?[1-9]\d{0,2}(?:\.\d{3})+(?:,\d*)?$/;
const GROUPED_SPACE_POINT = /^[+-]?[1-9]\d{0,2}(?:([ \u00a0\u2009\u202f])\d{3})(?:\1\d{3})*(?:\.\d*)?$/;
const GROUPED_SPACE_COMMA = /^[+-]?[1-9]\d{0,2}(?:([ \u00a0\u2009\u202f])\d{3})(?:\1\d{3})*(?:,\d*)?$/;
const EXPONENT_D = /^[+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+)[dD][+-]?\d{1,3}$/;

/** The value of a field the strict reader refused, or null when it is not a number either way. */
export function readUnusualNumber(field: string, decimalComma: boolean): UnusualReading | null {
  const t = field.trim();
  if (t.length < 3 || t.length > 40) return null;
  if (EXPONENT_D.test(t)) {
    const mark = decimalComma ? ',' : '.';
    if (t.includes(decimalComma ? '.' : ',')) return null;
    const value = Number(t.replace(mark, '.').replace(/[dD]/, 'e'));
    return Number.isFinite(value) ? { value, kind: 'exponentD', mark: 'D' } : null;
  }
  const grouped = groupedValue(t, decimalComma);
  return grouped && Number.isFinite(grouped.value) ? grouped : null;
}

function groupedValue(t: string, decimalComma: boolean): UnusualReading | null {
  if (!decimalComma && GROUPED_COMMA.test(t)) return { value: Number(t.replace(/,/g, '')), kind: 'grouped', mark: ',' };
  if (decimalComma && GROUPED_POINT.test(t)) return { value: Number(t.replace(/\./g, '').replace(',', '.')), kind: 'grouped', mark: '.' };
  const spaced = (decimalComma ? GROUPED_SPACE_COMMA : GROUPED_SPACE_POINT).exec(t);
  if (!spaced) return null;
  const digits = t.split(spaced[1] as string).join('');
  return { value: Number(decimalComma ? digits.replace(',', '.') : digits), kind: 'grouped', mark: spaced[1] as string };
}

/** A grouping character in words, for messages. */
export function describeMark(mark: string): string {
  if (mark === ',') return "',' (comma)";
  if (mark === '.') return "'.' (point)";
  if (mark === ' ') return "' ' (space)";
  if (mark === 'D') return 'D exponent';
  return `U+${mark.charCodeAt(0).toString(16).toUpperCase().padStart(4, '0')} (a no-break or thin space)`;
}

/**
 * Why a field is not a number, in words, when one of the usual causes shows; '' otherwise.
 * `decimalComma` is the file's decimal mark.
 */
export function whyNotANumber(field: string, decimalComma: boolean): string {
  const t = field.trim();
  if (t === '') return 'the cell is empty';
  const mark = decimalComma ? ',' : '.';
  const other = decimalComma ? '.' : ',';
  if (t.split(mark).length > 2) return `the decimal mark ${describeMark(mark)} appears more than once, as a thousands separator would; such a number cannot be read either way`;
  if (/^[+-]?[\d.,]+$/.test(t) && t.includes(other)) {
    return `it holds ${describeMark(other)} where the decimal mark is ${describeMark(mark)}; if ${describeMark(other)} is a thousands separator, the groups are not of three digits`;
  }
  const unit = /^[+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][+-]?\d+)?\s*([^\d\s+-][^\s]{0,15})$/.exec(t);
  if (unit && parseUnit(unit[1] as string)) return `the cell holds a number followed by the unit "${unit[1] as string}": units are written in the cells as well as in the header`;
  return '';
}
