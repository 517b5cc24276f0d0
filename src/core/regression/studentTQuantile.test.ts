import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { logGamma, regularizedIncompleteBeta, studentTCdf, studentTQuantile } from './studentTQuantile';

describe('logGamma', () => {
  // Γ(n) = (n − 1)! and Γ(½) = √π (Abramowitz & Stegun 1964, eqs. 6.1.6 and 6.1.8).
  it('matches factorials and Γ(½)', () => {
    expect(logGamma(1)).toBeCloseTo(0, 12);
    expect(logGamma(5)).toBeCloseTo(Math.log(24), 12);
    expect(logGamma(0.5)).toBeCloseTo(0.5 * Math.log(Math.PI), 12);
  });
});

describe('regularizedIncompleteBeta', () => {
  // I_x(1, 1) = x and I_x(a, 1) = x^a (Abramowitz & Stegun 1964, eq. 26.5.1 worked by hand).
  it('reduces to x and x^a in the simple cases', () => {
    expect(regularizedIncompleteBeta(0.3, 1, 1)).toBeCloseTo(0.3, 13);
    expect(regularizedIncompleteBeta(0.3, 2.5, 1)).toBeCloseTo(0.3 ** 2.5, 13);
  });
  // Symmetry I_x(a, b) = 1 − I_{1−x}(b, a) (Abramowitz & Stegun 1964, eq. 26.5.2).
  it('obeys the symmetry relation', () => {
    expect(regularizedIncompleteBeta(0.7, 3, 0.5) + regularizedIncompleteBeta(0.3, 0.5, 3)).toBeCloseTo(1, 13);
  });
});

describe('studentTQuantile', () => {
  // Closed forms: ν = 1 is the Cauchy law, t = tan(π(p − ½)); ν = 2 gives t = (2p − 1)/√(2p(1 − p))
  // (Abramowitz & Stegun 1964, §26.7, the special cases of the t distribution).
  it('matches the closed forms for ν = 1 and ν = 2', () => {
    expect(studentTQuantile(0.975, 1)).toBeCloseTo(Math.tan(Math.PI * 0.475), 9);
    expect(studentTQuantile(0.975, 2)).toBeCloseTo(0.95 / Math.sqrt(2 * 0.975 * 0.025), 10);
  });
  // Published t table (Abramowitz & Stegun 1964, Table 26.10, percentage points of the t
  // distribution; the printed three-decimal values are from memory).
  it.each([
    [0.975, 4, 2.776],
    [0.975, 10, 2.228],
    [0.975, 3, 3.182],
    [0.975, 30, 2.042],
    [0.995, 5, 4.032],
    [0.95, 8, 1.86],
  ])('t(%f, %i) = %f', (p, nu, t) => {
    expect(studentTQuantile(p, nu)).toBeCloseTo(t, 3);
  });
  // Large ν tends to the normal quantile 1.959964 (Abramowitz & Stegun 1964, Table 26.1, from memory).
  it('tends to the normal quantile for large ν', () => {
    expect(studentTQuantile(0.975, 1e7)).toBeCloseTo(1.959964, 5);
  });
  it('is odd about p = ½ and inverts the CDF', () => {
    expect(studentTQuantile(0.5, 7)).toBe(0);
    expect(studentTQuantile(0.025, 7)).toBeCloseTo(-studentTQuantile(0.975, 7), 12);
    expect(studentTCdf(studentTQuantile(0.9, 3.5), 3.5)).toBeCloseTo(0.9, 12);
  });
  it('refuses p outside (0, 1) and ν ≤ 0', () => {
    expect(() => studentTQuantile(1, 4)).toThrow(AnalysisError);
    expect(() => studentTQuantile(0, 4)).toThrow(AnalysisError);
    expect(() => studentTQuantile(0.9, 0)).toThrow(AnalysisError);
    expect(() => studentTQuantile(Number.NaN, 3)).toThrow(AnalysisError);
  });
});
