/**
 * Grouped digits and D exponents. Sources: BIPM, The International System of Units (SI
 * Brochure), 9th ed. (2019), sect. 5.4.4: the decimal marker is a point or a comma, and long
 * numbers may be divided in groups of three digits by a (thin) space; comma or point as a
 * thousands separator opposite the decimal mark: common practice, no source; the D exponent of a
 * double-precision literal: ISO/IEC 1539-1 (Fortran), from memory.
 */
import { describe, expect, it } from 'vitest';
import { readUnusualNumber, whyNotANumber } from './unusualNumber';

const value = (f: string, comma = false) => readUnusualNumber(f, comma)?.value ?? null;

describe('readUnusualNumber', () => {
  it('digits grouped in threes are one number: 1,234.5 (point), 1.234,5 (comma), 1 234,5 and 12 345.25 (space)', () => {
    expect(value('1,234.5')).toBe(1234.5);
    expect(value('-13,400.12')).toBe(-13400.12);
    expect(value('1,234,567')).toBe(1234567);
    expect(value('1.234,5', true)).toBe(1234.5);
    expect(value('1 234,5', true)).toBe(1234.5);
    expect(value('12\u202f345.25')).toBe(12345.25);
    expect(readUnusualNumber('1,234.5', false)?.mark).toBe(',');
  });

  it('a comma or point that cannot group digits is not read: groups of other than three, a leading 0, the mark twice', () => {
    expect(value('1,23.5')).toBeNull();
    expect(value('0,123')).toBeNull();
    expect(value('1,234.5', true)).toBeNull();
    expect(value('5,108,28', true)).toBeNull();
    expect(value('1.234,5')).toBeNull();
    expect(value('1 23')).toBeNull();
  });

  it('a D exponent is a power of ten: 1.234567D-05 = 1.234567e-05, 7.07d+02 = 707', () => {
    expect(value('1.234567D-05')).toBeCloseTo(1.234567e-5, 20);
    expect(value('7.07d+02')).toBe(707);
    expect(value('-2,5D-03', true)).toBeCloseTo(-2.5e-3, 18);
    expect(value('D-05')).toBeNull();
  });

  it('says why a cell is not a number: the decimal mark twice, a unit in the cell', () => {
    expect(whyNotANumber('5,108,28', true)).toContain('more than once');
    expect(whyNotANumber('-0.1000 V', false)).toContain('"V"');
    expect(whyNotANumber('abc', false)).toBe('');
  });
});
