import { describe, expect, it } from 'vitest';
import { baselineAt } from './baselineCurve';
import { twoPointBaseline } from './twoPointBaseline';
import { uniformGrid } from './analyticShapes';

describe('twoPointBaseline', () => {
  // Worked by hand: the line through (0.2 V, 1 µA) and (0.7 V, 3 µA) has slope 4 µA/V, so at
  // 0.5 V it carries 1 µA + 0.3 V · 4 µA/V = 2.2 µA.
  it('draws the line through two anchors', () => {
    const e = uniformGrid(11, 0, 1);
    const curve = twoPointBaseline({ potentialV: e, spanStart: 0, spanEnd: 11, anchors: [{ potentialV: 0.2, currentA: 1e-6 }, { potentialV: 0.7, currentA: 3e-6 }] });
    expect(baselineAt(curve, 5)).toBeCloseTo(1e-6 + (2e-6 * 0.3) / 0.5, 15);
    expect(curve.method).toBe('two-point');
  });

  it('rejects anchors at the same potential', () => {
    const e = uniformGrid(11, 0, 1);
    expect(() => twoPointBaseline({ potentialV: e, spanStart: 0, spanEnd: 11, anchors: [{ potentialV: 0.2, currentA: 1 }, { potentialV: 0.2, currentA: 2 }] })).toThrow(/differ/);
  });
});
