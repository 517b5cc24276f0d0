import { describe, expect, it } from 'vitest';
import { seededGaussian } from '../random/seededGaussian';
import { windowMedianGap } from './windowMedianGap';

describe('windowMedianGap', () => {
  // By hand: a straight line sampled evenly about its centre has its centre value as median and
  // no scatter about itself.
  it('a line: the centre value, no scatter', () => {
    const e = [0, -0.002, -0.001, 0.001, 0.002];
    const r = windowMedianGap(e, e.map((x) => 1e-7 + 1e-6 * x));
    expect(r.gapA).toBeCloseTo(1e-7, 18);
    expect(r.standardUncertaintyA!).toBeLessThan(1e-20);
  });
  // Kendall & Stuart, The Advanced Theory of Statistics (from memory): the median of N normal
  // deviates has standard deviation √(π/2)·σ/√N; over 400 seeded windows of 21 points the spread of
  // the medians and the mean stated uncertainty agree within 15 %, and a bad point does not move it.
  it('states the median\'s own scatter, and one spike does not move it', () => {
    const e = Array.from({ length: 21 }, (_, i) => (i - 10) * 0.001);
    const medians: number[] = [];
    let stated = 0;
    for (let k = 0; k < 400; k++) {
      const g = seededGaussian(100 + k);
      const noise = e.map(() => 1e-9 * g());
      const r = windowMedianGap(e, e.map((_, i) => 5e-8 + noise[i]!));
      medians.push(r.gapA);
      stated += r.standardUncertaintyA! / 400;
    }
    const mean = medians.reduce((a, b) => a + b, 0) / medians.length;
    const sd = Math.sqrt(medians.reduce((a, b) => a + (b - mean) ** 2, 0) / (medians.length - 1));
    expect(Math.abs(sd / (Math.sqrt(Math.PI / 2) * 1e-9 / Math.sqrt(21)) - 1)).toBeLessThan(0.15);
    expect(Math.abs(stated / sd - 1)).toBeLessThan(0.2);
    const spiked = e.map(() => 5e-8);
    spiked[3] = 1e-6;
    expect(windowMedianGap(e, spiked).gapA).toBe(5e-8);
  });
  it('too few points: no uncertainty; unequal lengths refused', () => {
    expect(windowMedianGap([0.1], [1e-9]).standardUncertaintyA).toBeNull();
    expect(() => windowMedianGap([0.1, 0.2], [1e-9])).toThrow();
  });
});
