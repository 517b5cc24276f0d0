/** Table formatting (hand-worked cases; common practice, no source). */
import { describe, expect, it } from 'vitest';
import { byNoise, bytes, count, digitsForNoise, fixed, scanRate, sci, sig } from './format';

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
});
