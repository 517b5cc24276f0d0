import { describe, expect, it } from 'vitest';
import { followUpLeastLambdaFromWidth, followUpPeakWidth } from './followUpPeakWidth';

describe('followUpPeakWidth', () => {
  // Nicholson & Shain, Anal. Chem. 36 (1964) 706 (from memory), and Bard & Faulkner 2nd ed. eq. 6.2.21:
  // |Ep − Ep/2| = 2.20·RT/nF with no reaction, 1.857·RT/nF in the pure kinetic zone.
  // Simulated: 55.9 mV at λ = 0.1, 49.4 at 5, 48.6 at 10, 47.7 at 1000 (n = 1, 25 °C).
  it('runs from the reversible width to the kinetic-zone width, falling with λ', () => {
    const grid = [0.1, 0.3, 1, 2, 3, 5, 10, 30, 100, 1000].map(followUpPeakWidth);
    expect(grid[0]!).toBeGreaterThan(2.1);
    expect(grid[0]!).toBeLessThan(2.21);
    expect(Math.abs(grid[grid.length - 1]! / 1.857 - 1)).toBeLessThan(0.01);
    grid.forEach((w, i) => { if (i) expect(w).toBeLessThanOrEqual(grid[i - 1]! + 1e-6); });
  });
  it('a width near the kinetic end bounds λ from below; a reversible width bounds nothing', () => {
    const rt = 0.025693;
    const l = followUpLeastLambdaFromWidth(1.88 * rt, 0.001)!;
    expect(l).toBeGreaterThan(1);
    expect(followUpPeakWidth(l) * rt).toBeCloseTo(1.88 * rt + 0.001, 5);
    expect(followUpLeastLambdaFromWidth(2.3 * rt, 0.001)).toBeNull();
  });
});
