import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { baselineAt } from './baselineCurve';
import { linearPrePeakBaseline } from './linearPrePeakBaseline';
import { gaussianShape, uniformGrid } from './analyticShapes';

describe('linearPrePeakBaseline', () => {
  // Hand check: exact line 2 µA + 5 µA/V·E under a Gaussian peak is recovered to rounding.
  it('recovers the background line under a peak', () => {
    const e = uniformGrid(201, -0.2, 0.6);
    const i = e.map((x) => 2e-6 + 5e-6 * x + 1e-5 * gaussianShape(x, 0.3, 0.03));
    const { curve, slopeAPerV, interceptA } = linearPrePeakBaseline({ potentialV: e, currentA: i, fitStart: 0, fitEnd: 60, spanStart: 0, spanEnd: 201 });
    expect(slopeAPerV).toBeCloseTo(5e-6, 15);
    expect(interceptA).toBeCloseTo(2e-6, 15);
    expect(baselineAt(curve, 125)).toBeCloseTo(2e-6 + 5e-6 * (e[125] as number), 15);
    expect(curve.method).toBe('linear');
    expect(curve.anchors.map((a) => a.index)).toEqual([0, 59]);
    expect(curve.currentA).toHaveLength(201);
  });

  it('rejects a one-point window and NaN in the window', () => {
    const e = uniformGrid(10, 0, 1);
    const i = new Float64Array(10);
    expect(() => linearPrePeakBaseline({ potentialV: e, currentA: i, fitStart: 0, fitEnd: 1, spanStart: 0, spanEnd: 10 })).toThrow(/at least 2/);
    i[2] = NaN;
    expect(() => linearPrePeakBaseline({ potentialV: e, currentA: i, fitStart: 0, fitEnd: 5, spanStart: 0, spanEnd: 10 })).toThrow(AnalysisError);
  });
});
