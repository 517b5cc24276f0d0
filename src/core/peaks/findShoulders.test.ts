import { describe, expect, it } from 'vitest';
import { gaussianShape, uniformGrid } from '../baseline/analyticShapes';
import { savitzkyGolayDerivative } from '../smoothing/savitzkyGolaySmooth';
import { findShoulders } from './findShoulders';

describe('findShoulders', () => {
  // Hand example: the slope falls from 4 to 0.5 and rises to 3 without changing sign.
  it('hand example: a dip of the slope to 0.5 between 4 and 3 is a rising-flank shoulder', () => {
    const d = [0, 0.5, 1, 2, 4, 2, 0.5, 1, 3, 1, -2, -1, -0.5, 0];
    expect(findShoulders(d)).toEqual([{ index: 6, flank: 'rising', slopeRatio: 0.5 / 3, leftBracket: 4, rightBracket: 8 }]);
  });

  it('a slope that is steepest at the very start of the range is no bracket', () => {
    expect(findShoulders([5, 4, 2, 1, 0.3, 1, 3, 4, 1, -2, -1, -0.5, 0])).toEqual([]);
  });

  // Analytic shape: a small Gaussian 60 mV before a large one shows no maximum of its own but a
  // flattening of the rising flank, which the derivative finds.
  it('finds a shoulder on the rising flank of a larger peak', () => {
    const e = uniformGrid(601, 0, 0.6);
    const y = e.map((x) => 0.3 * gaussianShape(x, 0.27, 0.03) + gaussianShape(x, 0.33, 0.03));
    const d = savitzkyGolayDerivative(y, { window: 7, spacing: 0.001 });
    const s = findShoulders(d);
    expect(s).toHaveLength(1);
    expect(s[0]!.flank).toBe('rising');
    expect(e[s[0]!.index]!).toBeGreaterThan(0.26);
    expect(e[s[0]!.index]!).toBeLessThan(0.3);
  });

  it('a single clean peak has no shoulder; empty input gives none', () => {
    const e = uniformGrid(301, 0, 0.6);
    const d = savitzkyGolayDerivative(e.map((x) => gaussianShape(x, 0.3, 0.03)), { window: 7, spacing: 0.002 });
    expect(findShoulders(d)).toEqual([]);
    expect(findShoulders([])).toEqual([]);
  });
});
