/**
 * scanNumber must read every stretch of text exactly as parseNumber (ECMAScript Number()) reads
 * the same characters cut out: the fast path is Clinger's, "How to read floating point numbers
 * accurately", PLDI 1990 (m·10^e exact when m < 2^53 and |e| ≤ 22); the rest falls back.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { scanNumber } from './scanNumber';
import { parseNumber } from './textLines';

const same = (s: string, decimalComma: boolean) => {
  const text = `;${s};`;
  expect(Object.is(scanNumber(text, 1, 1 + s.length, decimalComma), parseNumber(s, decimalComma))).toBe(true);
};

describe('scanNumber', () => {
  it('reads plain decimals by hand: "-1.25e-3" is −0.00125, " 42 " is 42, "0,5" with a decimal comma is 0.5', () => {
    expect(scanNumber('-1.25e-3', 0, 8, false)).toBe(-0.00125);
    expect(scanNumber(' 42 ', 0, 4, false)).toBe(42);
    expect(scanNumber('0,5', 0, 3, true)).toBe(0.5);
  });

  it('agrees with parseNumber on edge spellings (sign, empty, hex, Infinity, 17 digits, far exponents)', () => {
    const cases = ['', ' ', '-0', '+.5', '5.', '.', '-', '1e', '1e+', '1e-400', '1e400', '0x1F', '0b1', 'Infinity', '-Infinity', 'NaN', '1,5', '1.5',
      '0.1', '0.30000000000000004', '123456789012345', '1234567890123456', '9007199254740993', '1E22', '1e23', '1e-22', '1e-23', '\u00a01', '1\u00a0', '1 2', '٣'];
    for (const s of cases) {
      same(s, false);
      same(s, true);
    }
  });

  it('agrees with parseNumber on 20,000 seeded random spellings', () => {
    const ch = fc.constantFrom('0', '1', '2', '5', '9', '.', ',', 'e', 'E', '-', '+', ' ', '\t', 'x', 'I');
    fc.assert(fc.property(fc.array(ch, { maxLength: 24 }).map((a) => a.join('')), fc.boolean(), (s, dc) => same(s, dc)), { seed: 20261202, numRuns: 10_000 });
    fc.assert(fc.property(fc.double(), fc.boolean(), (x, dc) => {
      for (const s of [String(x), x.toExponential(), x.toPrecision(9), x.toFixed(4)]) same(dc ? s.replace('.', ',') : s, dc);
    }), { seed: 20261203, numRuns: 10_000 });
  });
});
