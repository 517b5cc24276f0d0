import { describe, expect, it } from 'vitest';
import { seededGaussian } from '../random/seededGaussian';
import { filterBySlidingMoments } from './slidingMomentsFilter';
import { savitzkyGolayCoefficients, savitzkyGolayDerivative, savitzkyGolaySmooth } from './savitzkyGolaySmooth';

/** Reference: the plain convolution with the least-squares weights of every output point. */
function convolve(y: Float64Array, window: number, order: number, derivative: number): Float64Array {
  const n = y.length;
  const m = (window - 1) / 2;
  const out = new Float64Array(n);
  const centre = savitzkyGolayCoefficients(window, order, { derivative });
  for (let i = 0; i < n; i++) {
    const from = Math.min(Math.max(i - m, 0), n - window);
    const c = i - from === m ? centre : savitzkyGolayCoefficients(window, order, { derivative, position: i - from - m });
    let v = 0;
    for (let j = 0; j < window; j++) v += c[j]! * y[from + j]!;
    out[i] = v;
  }
  return out;
}

/** A peak-shaped current on a large offset with seeded noise (offset ≫ variation is the hard case for rounding). */
function noisyPeak(n: number, seed: number): Float64Array {
  const g = seededGaussian(seed);
  return Float64Array.from({ length: n }, (_, k) => 1e-3 + 2e-5 * Math.exp(-(((k - n / 3) / (n / 12)) ** 2)) + 1e-7 * g());
}

const maxAbs = (a: Float64Array) => a.reduce((s, v) => Math.max(s, Math.abs(v)), 0);

describe('filterBySlidingMoments', () => {
  // Hand check: order 0 is the plain moving mean; y = k gives the centre index back.
  it('order 0 on y = k returns k in the interior (the moving mean of a line)', () => {
    const y = Float64Array.from({ length: 40 }, (_, k) => k);
    const out = filterBySlidingMoments(y, 7, 0, 0);
    for (let k = 3; k < 37; k++) expect(out[k]).toBeCloseTo(k, 12);
  });

  // Savitzky & Golay, Anal. Chem. 36 (1964) 1627: a polynomial of degree ≤ order is reproduced exactly.
  it('reproduces a cubic and its slope everywhere, ends included (order 3, window 151)', () => {
    const p = (k: number) => 2 - 0.01 * k + 3e-5 * k * k - 1e-8 * k ** 3;
    const dp = (k: number) => -0.01 + 6e-5 * k - 3e-8 * k * k;
    const y = Float64Array.from({ length: 3000 }, (_, k) => p(k));
    const s = filterBySlidingMoments(y, 151, 3, 0);
    const d = filterBySlidingMoments(y, 151, 3, 1);
    // Rounding only: relative to the largest |y| (≈ 28 here).
    for (let k = 0; k < y.length; k += 7) {
      expect(Math.abs(s[k]! - p(k))).toBeLessThan(1e-11 * 28);
      expect(Math.abs(d[k]! - dp(k))).toBeLessThan(1e-12 * 28);
    }
  });

  // Same least-squares fit as the convolution (Savitzky & Golay 1964). Tolerance: rounding only,
  // relative to the largest |y| (what both sums round against), 1e-12.
  for (const [window, order] of [[103, 2], [257, 2], [1001, 2], [301, 4]] as const) {
    it(`equals the convolution for window ${window}, order ${order}, value and slope`, () => {
      const y = noisyPeak(4000, window);
      for (const derivative of [0, 1]) {
        const ref = convolve(y, window, order, derivative);
        const got = filterBySlidingMoments(y, window, order, derivative);
        let worst = 0;
        for (let k = 0; k < y.length; k++) worst = Math.max(worst, Math.abs(got[k]! - ref[k]!));
        expect(worst).toBeLessThan(1e-12 * maxAbs(y));
      }
    });
  }

  it('is what savitzkyGolaySmooth and savitzkyGolayDerivative return for wide windows', () => {
    const y = noisyPeak(5000, 3);
    expect(Array.from(savitzkyGolaySmooth(y, { window: 401, order: 2 }))).toEqual(Array.from(filterBySlidingMoments(y, 401, 2, 0)));
    const d = savitzkyGolayDerivative(y, { window: 401, order: 2, spacing: 0.5 });
    const ref = filterBySlidingMoments(y, 401, 2, 1);
    for (let k = 0; k < y.length; k += 11) expect(d[k]).toBeCloseTo(ref[k]! / 0.5, 15);
  });

  it('a window as long as the signal is one fit evaluated at every point', () => {
    const y = noisyPeak(201, 9);
    const ref = convolve(y, 201, 2, 0);
    const got = filterBySlidingMoments(y, 201, 2, 0);
    for (let k = 0; k < y.length; k++) expect(Math.abs(got[k]! - ref[k]!)).toBeLessThan(1e-12);
  });
});
