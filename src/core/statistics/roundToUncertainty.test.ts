import { describe, expect, it } from 'vitest';
import { decimalsFor, roundingExponent, roundToUncertainty } from './roundToUncertainty';

// JCGM 100:2008 (GUM) §7.2.6: at most two significant digits of the uncertainty, the value rounded
// to match; two digits when the leading digit is 1 or 2 (usual convention, from memory).
describe('roundToUncertainty', () => {
  it('worked by hand: 12.3456 ± 0.023 → 12.346; 12.3456 ± 0.45 → 12.3; 1234 ± 170 → 1230', () => {
    expect(roundToUncertainty(12.3456, 0.023)).toBe(12.346);
    expect(roundToUncertainty(12.3456, 0.45)).toBe(12.3);
    expect(roundToUncertainty(1234, 170)).toBe(1230);
    expect(decimalsFor(0.023)).toBe(3);
    expect(decimalsFor(0.45)).toBe(1);
  });
  // GUM §7.2.2 prints m_s = 100.021 47 g with u = 0.35 mg (two digits of u); with a leading 3 the
  // convention used here keeps one digit of u, so the same value prints as 100.0215 g.
  it('GUM §7.2.2 value with u = 0.35 mg rounds to the 0.1 mg place under the 1-or-2 convention', () => {
    expect(roundingExponent(0.00035)).toBe(-4);
    expect(roundToUncertainty(100.02147, 0.00035)).toBeCloseTo(100.0215, 10);
  });
  it('edges: zero, negative or non-finite uncertainty leaves the value alone', () => {
    expect(roundToUncertainty(1.23456, 0)).toBe(1.23456);
    expect(Number.isNaN(roundingExponent(-1))).toBe(true);
    expect(roundToUncertainty(Number.NaN, 0.1)).toBeNaN();
  });
});
