import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { savitzkyGolayCoefficients, savitzkyGolayDerivative, savitzkyGolaySmooth } from './savitzkyGolaySmooth';

const sumSquares = (c: ArrayLike<number>) => Array.from(c).reduce((s, v) => s + v * v, 0);

describe('savitzkyGolayCoefficients', () => {
  // Hand check: a 3-point linear fit is the plain 3-point mean.
  it('3-point order-1 weights are 1/3 each', () => {
    for (const c of savitzkyGolayCoefficients(3, 1)) expect(c).toBeCloseTo(1 / 3, 14);
  });

  // Savitzky & Golay, Anal. Chem. 36 (1964) 1627, tables.
  it('5-point quadratic and cubic sets are (−3, 12, 17, 12, −3)/35', () => {
    const expected = [-3, 12, 17, 12, -3].map((v) => v / 35);
    for (const order of [2, 3]) {
      const c = savitzkyGolayCoefficients(5, order);
      expected.forEach((v, j) => expect(c[j]).toBeCloseTo(v, 12));
    }
  });

  // Savitzky & Golay, Anal. Chem. 36 (1964) 1627, tables: 7 and 9 points.
  it('7-point set is (−2, 3, 6, 7, 6, 3, −2)/21 and 9-point set matches /231', () => {
    const c7 = savitzkyGolayCoefficients(7, 2);
    [-2, 3, 6, 7, 6, 3, -2].forEach((v, j) => expect(c7[j]).toBeCloseTo(v / 21, 12));
    const c9 = savitzkyGolayCoefficients(9, 3);
    [-21, 14, 39, 54, 59, 54, 39, 14, -21].forEach((v, j) => expect(c9[j]).toBeCloseTo(v / 231, 12));
  });

  // Savitzky & Golay, Anal. Chem. 36 (1964) 1627, tables: 5-point quadratic first derivative (−2,−1,0,1,2)/10.
  it('5-point first-derivative set is (−2, −1, 0, 1, 2)/10 and sums to 0', () => {
    const c = savitzkyGolayCoefficients(5, 2, { derivative: 1 });
    [-2, -1, 0, 1, 2].forEach((v, j) => expect(c[j]).toBeCloseTo(v / 10, 12));
    expect(Array.from(c).reduce((s, v) => s + v, 0)).toBeCloseTo(0, 14);
  });

  // Computed from the Savitzky & Golay (1964) sets: white-noise variance ratio Σc² = 595/1225 and 1/3.
  it('noise variance ratio Σc² is 0.485714 (5 points) and 1/3 (7 points)', () => {
    expect(sumSquares(savitzkyGolayCoefficients(5, 2))).toBeCloseTo(595 / 1225, 12);
    expect(sumSquares(savitzkyGolayCoefficients(7, 2))).toBeCloseTo(1 / 3, 12);
  });

  it('rejects even windows and too-high orders', () => {
    expect(() => savitzkyGolayCoefficients(4, 2)).toThrow(AnalysisError);
    expect(() => savitzkyGolayCoefficients(5, 5)).toThrow(/order/);
  });
});

describe('savitzkyGolaySmooth', () => {
  // Savitzky & Golay (1964) 5-point set, computed: centre of [2, 8, 5, 7, 3] → 250/35 = 7.142857.
  it('5-point window on [2, 8, 5, 7, 3] gives 7.142857 at the centre', () => {
    expect(savitzkyGolaySmooth([2, 8, 5, 7, 3])[2]).toBeCloseTo(7.142857142857, 10);
  });

  // Savitzky & Golay (1964) 7-point set, computed: centre of [1, 4, 2, 8, 5, 7, 3] → 123/21 = 5.857143.
  it('7-point window on [1, 4, 2, 8, 5, 7, 3] gives 5.857143 at the centre', () => {
    expect(savitzkyGolaySmooth([1, 4, 2, 8, 5, 7, 3], { window: 7 })[3]).toBeCloseTo(5.857142857143, 10);
  });

  // Savitzky & Golay, Anal. Chem. 36 (1964) 1627: a polynomial of degree ≤ order is preserved.
  it('returns x² and x³ unchanged everywhere, edges included (cubic fit)', () => {
    const x2 = Array.from({ length: 20 }, (_, k) => (k - 7) ** 2);
    const x3 = Array.from({ length: 20 }, (_, k) => 0.1 * (k - 7) ** 3 - k);
    const s2 = savitzkyGolaySmooth(x2, { window: 7, order: 3 });
    const s3 = savitzkyGolaySmooth(x3, { window: 7, order: 3 });
    x2.forEach((v, k) => expect(s2[k]).toBeCloseTo(v, 9));
    x3.forEach((v, k) => expect(s3[k]).toBeCloseTo(v, 9));
  });

  it('impulse response at an interior point is the coefficient vector', () => {
    const y = new Float64Array(15);
    y[7] = 1;
    const s = savitzkyGolaySmooth(y, { window: 7 });
    const c = savitzkyGolayCoefficients(7, 2);
    for (let j = 0; j < 7; j++) expect(s[4 + j]).toBeCloseTo(c[6 - j]!, 14);
  });

  it('does not modify its input and keeps the length', () => {
    const y = new Float64Array([1, 5, 2, 6, 3, 7, 4]);
    const copy = Float64Array.from(y);
    expect(savitzkyGolaySmooth(y)).toHaveLength(7);
    expect(y).toEqual(copy);
  });

  it('empty input gives an empty result; a signal shorter than the window is an error', () => {
    expect(savitzkyGolaySmooth([])).toHaveLength(0);
    expect(() => savitzkyGolaySmooth([1, 2, 3])).toThrow(/longer than/);
  });
});

describe('savitzkyGolayDerivative', () => {
  // Exact for polynomials up to the fit order (least-squares property, Savitzky & Golay 1964).
  it('derivative of 3x² − 2x sampled every 0.01 is 6x − 2, edges included', () => {
    const h = 0.01;
    const y = Array.from({ length: 30 }, (_, k) => 3 * (k * h) ** 2 - 2 * k * h);
    const d = savitzkyGolayDerivative(y, { window: 9, order: 2, spacing: h });
    for (let k = 0; k < 30; k++) expect(d[k]).toBeCloseTo(6 * k * h - 2, 9);
  });

  it('rejects order 0 and zero spacing', () => {
    expect(() => savitzkyGolayDerivative([1, 2, 3, 4, 5], { order: 0 })).toThrow(/order ≥ 1/);
    expect(() => savitzkyGolayDerivative([1, 2, 3, 4, 5], { spacing: 0 })).toThrow(/spacing/);
  });
});

describe('written into a given array', () => {
  // The same filter, so the same numbers bit for bit: a property of the code, no published value.
  const y = Float64Array.from({ length: 400 }, (_, k) => Math.sin(k / 17) + 0.01 * Math.cos(k * 1.3));
  it('gives what a new array gets, by convolution and by sliding moments, smoothing and derivative', () => {
    for (const window of [7, 151]) {
      const into = new Float64Array(y.length).fill(123);
      expect(savitzkyGolaySmooth(y, { window, order: 2 }, into)).toBe(into);
      expect(into).toEqual(savitzkyGolaySmooth(y, { window, order: 2 }));
      const slope = new Float64Array(y.length).fill(-5);
      expect(savitzkyGolayDerivative(y, { window, order: 2, spacing: 0.5 }, slope)).toBe(slope);
      expect(slope).toEqual(savitzkyGolayDerivative(y, { window, order: 2, spacing: 0.5 }));
    }
  });

  it('into a stretch of a longer array, leaving the rest', () => {
    const out = new Float64Array(600).fill(9);
    savitzkyGolaySmooth(y, { window: 11, order: 3 }, out.subarray(100, 500));
    expect(out.subarray(100, 500)).toEqual(savitzkyGolaySmooth(y, { window: 11, order: 3 }));
    expect(out[99]).toBe(9);
    expect(out[500]).toBe(9);
  });

  it('refuses an array of another length', () => {
    expect(() => savitzkyGolaySmooth(y, { window: 7, order: 2 }, new Float64Array(10))).toThrow(AnalysisError);
  });
});
