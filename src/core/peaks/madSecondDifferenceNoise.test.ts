import { describe, expect, it } from 'vitest';
import { madSecondDifferenceNoise } from './madSecondDifferenceNoise';
import { median } from '../statistics/median';
import { seededGaussian } from './simulatedVoltammogram';


describe('madSecondDifferenceNoise', () => {
  it('median of small lists', () => {
    expect(median([3, 1, 2])).toBe(2);
    expect(median([4, 1, 3, 2])).toBe(2.5);
  });

  // Hampel 1974 (MAD consistency 1.4826) and var(second difference) = 6σ²: with 20 000 seeded
  // normal deviates of σ = 1e-8 A the estimate lies within 3 % of σ (sampling error ~1 %).
  it('recovers σ of seeded Gaussian noise on a smooth wave within 3 %', () => {
    const rnd = seededGaussian(42);
    const n = 20000;
    const y = Float64Array.from({ length: n }, (_, k) => 1e-6 * Math.sin(k / 800) + 1e-8 * rnd());
    expect(madSecondDifferenceNoise(y) / 1e-8).toBeGreaterThan(0.97);
    expect(madSecondDifferenceNoise(y) / 1e-8).toBeLessThan(1.03);
  });

  it('is zero for a straight line and rejects too few points', () => {
    expect(madSecondDifferenceNoise([1, 2, 3, 4, 5])).toBeCloseTo(0, 15);
    expect(() => madSecondDifferenceNoise([1, 2])).toThrow(/at least 3/);
  });
});
