import { describe, expect, it } from 'vitest';
import { seededGaussian } from './seededGaussian';

describe('seededGaussian (Box & Muller 1958)', () => {
  it('repeats for a seed and differs between seeds', () => {
    const a = seededGaussian(42);
    const b = seededGaussian(42);
    const c = seededGaussian(43);
    const xa = Array.from({ length: 5 }, a);
    expect(Array.from({ length: 5 }, b)).toEqual(xa);
    expect(Array.from({ length: 5 }, c)).not.toEqual(xa);
  });

  // A standard normal has mean 0 and variance 1; for 20,000 draws the sample mean has a standard
  // error of 0.007 and the variance about 0.01 (common practice, no source: 4-sigma bounds).
  it('has mean 0 and variance 1 within sampling error', () => {
    const g = seededGaussian(7);
    const n = 20000;
    let s = 0;
    let s2 = 0;
    for (let i = 0; i < n; i++) {
      const x = g();
      s += x;
      s2 += x * x;
    }
    expect(Math.abs(s / n)).toBeLessThan(0.03);
    expect(Math.abs(s2 / n - 1)).toBeLessThan(0.04);
  });
});
