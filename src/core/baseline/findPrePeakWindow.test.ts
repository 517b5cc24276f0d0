import { describe, expect, it } from 'vitest';
import { gaussianShape, uniformGrid } from './analyticShapes';
import { findPrePeakWindow } from './findPrePeakWindow';

describe('findPrePeakWindow', () => {
  // Analytic shape: sloping line plus a Gaussian of width 0.03 V at 0.3 V. 1 % of the height is
  // reached √ln(100)·0.03 = 0.0644 V before the centre, so the foot lies near 0.236 V.
  it('ends the window at the foot of a Gaussian on a sloping line', () => {
    const e = uniformGrid(601, 0, 0.6);
    const y = e.map((x) => 0.2 + 0.5 * x + gaussianShape(x, 0.3, 0.03));
    const w = findPrePeakWindow(y, 0, 300)!;
    expect(w.start).toBe(0);
    expect(e[w.end]!).toBeGreaterThan(0.225);
    expect(e[w.end]!).toBeLessThan(0.245);
  });

  it('returns null with fewer than 5 points before the peak', () => {
    expect(findPrePeakWindow([0, 1, 2, 3, 4, 5], 0, 4)).toBeNull();
  });
});
