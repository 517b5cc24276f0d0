import { SimpleLinearRegression } from 'ml-regression-simple-linear';
import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { fitLine } from './fitLine';

describe('fitLine', () => {
  // Worked by hand: points (0, 1), (1, 3), (2, 5) lie on y = 2x + 1 exactly.
  it('recovers an exact line with zero residual', () => {
    const fit = fitLine([0, 1, 2], [1, 3, 5]);
    expect(fit.slope).toBeCloseTo(2, 14);
    expect(fit.intercept).toBeCloseTo(1, 14);
    expect(fit.r2).toBeCloseTo(1, 14);
    expect(fit.slopeStdError).toBeCloseTo(0, 14);
    expect(fit.degreesOfFreedom).toBe(1);
  });

  // Worked by hand: y = 10⁶x + 5·10⁶ plus residuals r = (1, −1, −1, 1)·10⁻⁴, which are orthogonal to
  // 1 and x, so the fit is exactly that line and Σr² = 4·10⁻⁸: s = (4·10⁻⁸/2)^½ = 1.4142·10⁻⁴.
  // Syy − b·Sxy (5·10¹² − 5·10¹²) cannot give this; the residuals themselves can (Draper & Smith
  // 3rd ed. (1998) §1.3, residual sum of squares).
  it('computes the residual scatter from the residuals when y is large against it', () => {
    const r = [1e-4, -1e-4, -1e-4, 1e-4];
    const fit = fitLine([0, 1, 2, 3], [0, 1, 2, 3].map((x, i) => 1e6 * x + 5e6 + r[i]!));
    expect(Math.abs(fit.residualStdDev! / 1.41421356e-4 - 1)).toBeLessThan(1e-4);
    expect(fit.slopeInterval![1] - fit.slopeInterval![0]).toBeGreaterThan(0);
  });

  // F. J. Anscombe, "Graphs in statistical analysis", Am. Stat. 27, 17 (1973), data set I:
  // slope 0.500, intercept 3.00, r² 0.67; standard errors 0.118 (slope) and 1.125 (intercept)
  // as printed by common regression software for this set (from memory).
  const ax = [10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5];
  const ay = [8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68];
  it('reproduces Anscombe data set I', () => {
    const fit = fitLine(ax, ay);
    expect(fit.slope).toBeCloseTo(0.5001, 4);
    expect(fit.intercept).toBeCloseTo(3.0001, 4);
    expect(fit.r2).toBeCloseTo(0.6665, 4);
    expect(fit.slopeStdError).toBeCloseTo(0.1179, 4);
    expect(fit.interceptStdError).toBeCloseTo(1.1247, 4);
    // 95 % interval: slope ± t(0.975, 9)·SE with t = 2.262 (Abramowitz & Stegun Table 26.10, from memory).
    expect(fit.tQuantile).toBeCloseTo(2.262, 3);
    expect(fit.slopeInterval?.[0]).toBeCloseTo(0.5001 - 2.2622 * 0.11791, 3);
  });

  // Cross-check with a general-purpose library (ml-regression-simple-linear, OLS).
  it('agrees with ml-regression-simple-linear', () => {
    const ref = new SimpleLinearRegression(ax, ay);
    const fit = fitLine(ax, ay);
    expect(fit.slope).toBeCloseTo(ref.slope, 12);
    expect(fit.intercept).toBeCloseTo(ref.intercept, 12);
  });

  // Computed from Randles–Ševčík (Bard & Faulkner 2nd ed. §6.2): the five points give slope 5.23613e-5 A/(V/s)^½, intercept 0.
  it('fits the Randles–Ševčík peak currents against v^½', () => {
    const v = [0.025, 0.05, 0.1, 0.2, 0.4];
    const ip = [8.2791, 11.7083, 16.5581, 23.4167, 33.1162].map((u) => u * 1e-6);
    const fit = fitLine(v.map(Math.sqrt), ip);
    expect(fit.slope).toBeCloseTo(5.23613e-5, 9);
    expect(Math.abs(fit.intercept)).toBeLessThan(1e-10);
  });

  // Through the origin: slope = Σxy/Σx² (least squares without a constant term) — worked by hand.
  it('fits through the origin', () => {
    const fit = fitLine([1, 2, 3], [2, 4.2, 5.8], { throughOrigin: true });
    expect(fit.slope).toBeCloseTo((2 + 8.4 + 17.4) / 14, 12);
    expect(fit.intercept).toBe(0);
    expect(fit.degreesOfFreedom).toBe(2);
  });

  // Weights: doubling a point's weight equals duplicating that point (definition of weighted LS).
  it('treats an integer weight like a repeated point', () => {
    const w = fitLine([0, 1, 2, 3], [0.1, 1.2, 1.9, 3.3], { weights: [1, 2, 1, 1] });
    const d = fitLine([0, 1, 1, 2, 3], [0.1, 1.2, 1.2, 1.9, 3.3]);
    expect(w.slope).toBeCloseTo(d.slope, 12);
    expect(w.intercept).toBeCloseTo(d.intercept, 12);
  });

  it('returns null errors with two points', () => {
    const fit = fitLine([1, 2], [3, 5]);
    expect(fit.slope).toBeCloseTo(2, 14);
    expect(fit.slopeStdError).toBeNull();
    expect(fit.slopeInterval).toBeNull();
  });

  it('rejects bad input with a typed error', () => {
    expect(() => fitLine([], [])).toThrow(AnalysisError);
    expect(() => fitLine([1], [1])).toThrow(AnalysisError);
    expect(() => fitLine([1, 2], [1])).toThrow(AnalysisError);
    expect(() => fitLine([1, Number.NaN], [1, 2])).toThrow(/point 1/);
    expect(() => fitLine([2, 2, 2], [1, 2, 3])).toThrow(/all x values are equal/);
    expect(() => fitLine([1, 2, 3], [1, 2, 3], { weights: [1, 0, 1] })).toThrow(/weight 1/);
  });
});
