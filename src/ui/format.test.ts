/** Table formatting (hand-worked cases; common practice, no source). */
import { describe, expect, it } from 'vitest';
import { byNoise, bytes, count, digitsForInterval, digitsForNoise, fixed, scanRate, sci, sig, valueWithInterval } from './format';

describe('format', () => {
  it('fixed and sig show a dash for missing values', () => {
    expect(fixed(null, 3)).toBe('—');
    expect(sig(Number.NaN)).toBe('—');
    expect(fixed(0.0601, 1, 1000)).toBe('60.1');
    expect(fixed(-0.00001, 4)).toBe('0.0000');
    expect(fixed(-0.0001, 4)).toBe('-0.0001');
    expect(sig(4.9489e-6, 4, 1e6)).toBe('4.949');
  });
  it('sci writes powers of ten with superscripts outside 1e-3…1e4', () => {
    expect(sci(6.46e-6)).toBe('6.46 × 10⁻⁶');
    expect(sci(1.2e-10)).toBe('1.20 × 10⁻¹⁰');
    expect(sci(0.0501)).toBe('0.0501');
    expect(sci(25000)).toBe('2.50 × 10⁴');
  });
  it('bytes', () => {
    expect(bytes(512)).toBe('512 B');
    expect(bytes(62_200)).toBe('60.7 kB');
  });
  it('count groups thousands', () => {
    expect(count(1_000_000)).toBe('1,000,000');
  });
  it('a scan rate never shows a binary-float tail', () => {
    expect(scanRate(0.009999999999999988)).toBe('0.01');
    expect(scanRate(0.1 + 0.2)).toBe('0.3');
  });
  // Decimals from the uncertainty: two significant digits in an uncertainty starting with 1 or 2,
  // else one (JCGM 100:2008, Guide to the expression of uncertainty in measurement, §7.2.6).
  it('digits follow the noise', () => {
    expect(digitsForNoise(0.012)).toBe(3);
    expect(digitsForNoise(0.05)).toBe(2);
    expect(digitsForNoise(3)).toBe(0);
    expect(digitsForNoise(0)).toBeNull();
    expect(byNoise(0.123456, 0.0004, 1000, 1)).toBe('123.5');
    expect(byNoise(0.123456, null, 1000, 1)).toBe('123.5');
    expect(byNoise(0.123456, 0.00002, 1000, 1)).toBe('123.456');
  });
  // The same rule (JCGM 100:2008 §7.2.6) with the interval's half-width as the uncertainty;
  // at least three significant digits (common practice, no source).
  it('a value with its interval gets the digits the interval supports', () => {
    const narrow: [number, number] = [0.9996e-5, 1.0004e-5];
    const d = digitsForInterval(1.0e-5, narrow);
    expect(d).toBe(5);
    expect(sci(1.0e-5, d)).toBe('1.0000 × 10⁻⁵');
    expect(sci(narrow[0], d)).not.toBe(sci(narrow[1], d));
    expect(digitsForInterval(1.0e-5, [0.9e-5, 1.1e-5])).toBe(3);
    expect(digitsForInterval(2.5e-6, [2.4e-6, 2.6e-6])).toBe(3);
    expect(digitsForInterval(1.0e-5, [1.0e-5 - 2e-10, 1.0e-5 + 2e-10])).toBe(6);
    expect(digitsForInterval(1.0e-5, null)).toBe(3);
    expect(digitsForInterval(0, [1, 2])).toBe(3);
  });

  it('an interval too narrow for five digits is given as its relative half-width', () => {
    expect(valueWithInterval(1.0e-5, [0.9e-5, 1.1e-5])).toEqual({ value: '1.00 × 10⁻⁵', interval: '9.00 × 10⁻⁶ to 1.10 × 10⁻⁵' });
    expect(valueWithInterval(1.00097e-5, [1.00097e-5 - 4e-11, 1.00097e-5 + 4e-11])).toEqual({ value: '1.0010 × 10⁻⁵', interval: '±0.0004 %' });
    expect(valueWithInterval(1.0e-5, [1.0e-5 - 1e-15, 1.0e-5 + 1e-15]).interval).toBe('within ±0.0001 %');
    expect(valueWithInterval(1.0e-5, null)).toEqual({ value: '1.00 × 10⁻⁵', interval: null });
  });
});
