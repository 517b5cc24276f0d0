import { describe, expect, it } from 'vitest';
import { polynomialCoefficients } from './polynomialCoefficients';

describe('polynomialCoefficients', () => {
  // Hand check: points of an exact cubic are fitted with zero residual, so its coefficients come back.
  it('recovers an exact parabola and an exact cubic', () => {
    const u = [-1, -0.6, -0.2, 0.1, 0.4, 0.8, 1];
    const cubic = (x: number) => 0.3 - 1.2 * x + 2.5 * x * x - 0.7 * x * x * x;
    const c = polynomialCoefficients(u, u.map(cubic), 3)!;
    [0.3, -1.2, 2.5, -0.7].forEach((v, k) => expect(c[k]).toBeCloseTo(v, 12));
    const p = polynomialCoefficients(u, u.map((x) => 1 + 2 * x - 3 * x * x), 2)!;
    [1, 2, -3].forEach((v, k) => expect(p[k]).toBeCloseTo(v, 12));
  });

  // Least squares (Draper & Smith 1998, ch. 5): a line through (0, 0), (1, 1), (2, 1) has slope 1/2, intercept 1/6.
  it('gives the least-squares line through points that are not on one', () => {
    const c = polynomialCoefficients([0, 1, 2], [0, 1, 1], 1)!;
    expect(c[0]).toBeCloseTo(1 / 6, 12);
    expect(c[1]).toBeCloseTo(0.5, 12);
  });

  // Weighted least squares (Draper & Smith 1998, from memory): a weight of 2 counts a point twice, a
  // weight of 0 leaves it out.
  it('weights count a point as often as its weight says', () => {
    const u = [-1, -0.5, 0, 0.5, 1];
    const y = [0.2, 0.9, 1.1, 0.7, 0.4];
    const weighted = polynomialCoefficients(u, y, 2, [2, 1, 0, 1, 1])!;
    const repeated = polynomialCoefficients([-1, -1, -0.5, 0.5, 1], [0.2, 0.2, 0.9, 0.7, 0.4], 2)!;
    weighted.forEach((c, k) => expect(c).toBeCloseTo(repeated[k]!, 12));
    expect(polynomialCoefficients(u, y, 2, [1, 1, 1, 1, 1])).toEqual(polynomialCoefficients(u, y, 2));
    expect(polynomialCoefficients(u, y, 2, [1, 0, 0, 0, 1])).toBeNull();
  });

  it('returns null when there are fewer distinct abscissae than coefficients', () => {
    expect(polynomialCoefficients([0.5, 0.5, 0.5, 1, 1], [1, 2, 3, 4, 5], 2)).toBeNull();
  });
});
