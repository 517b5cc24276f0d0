import { describe, expect, it } from 'vitest';
import { baselineAt } from './baselineCurve';
import { polynomialBaseline } from './polynomialBaseline';
import { gaussianShape, uniformGrid } from './analyticShapes';

describe('polynomialBaseline', () => {
  // Hand check: a quadratic background fitted on both sides of a peak is reproduced under it.
  it('recovers a quadratic background from windows on both sides', () => {
    const e = uniformGrid(301, 0, 0.6);
    const bg = (x: number) => 1e-6 - 4e-6 * x + 9e-6 * x * x;
    const i = e.map((x) => bg(x) + 3e-6 * gaussianShape(x, 0.3, 0.02));
    const curve = polynomialBaseline({ potentialV: e, currentA: i, fitRanges: [[0, 100], [200, 301]], spanStart: 90, spanEnd: 210 }, { degree: 2 });
    expect(baselineAt(curve, 150)).toBeCloseTo(bg(e[150] as number), 13);
    expect(baselineAt(curve, 50)).toBeNull();
  });

  it('rejects a bad degree and too few points', () => {
    const e = uniformGrid(10, 0, 1);
    expect(() => polynomialBaseline({ potentialV: e, currentA: e, fitRanges: [[0, 5]], spanStart: 0, spanEnd: 10 }, { degree: 9 })).toThrow(/degree/);
    expect(() => polynomialBaseline({ potentialV: e, currentA: e, fitRanges: [[0, 3]], spanStart: 0, spanEnd: 10 }, { degree: 2 })).toThrow(/at least 4/);
  });
});
