import { describe, expect, it } from 'vitest';
import { uniformGrid } from '../baseline/analyticShapes';
import { refinePeakQuadratic } from './refinePeakQuadratic';

describe('refinePeakQuadratic', () => {
  // Hand check: an exact parabola with its vertex between samples (0.2437 V, 5 µA) is recovered.
  it('recovers the vertex of an exact parabola between samples', () => {
    const e = uniformGrid(21, 0.2, 0.3);
    const i = e.map((x) => 5e-6 - 2e-3 * (x - 0.2437) ** 2);
    const v = refinePeakQuadratic({ potentialV: e, currentA: i, from: 4, to: 15 })!;
    expect(v.potentialV).toBeCloseTo(0.2437, 12);
    expect(v.currentA).toBeCloseTo(5e-6, 15);
  });

  it('finds a minimum with orientation −1 and refuses the wrong orientation', () => {
    const e = uniformGrid(21, -0.1, 0.1);
    const i = e.map((x) => -3e-6 + 1e-3 * (x - 0.012) ** 2);
    expect(refinePeakQuadratic({ potentialV: e, currentA: i, from: 0, to: 21 }, { orientation: -1 })!.potentialV).toBeCloseTo(0.012, 12);
    expect(refinePeakQuadratic({ potentialV: e, currentA: i, from: 0, to: 21 })).toBeNull();
  });

  it('returns null when the vertex lies outside the window, and rejects < 3 points', () => {
    const e = uniformGrid(21, 0, 0.2);
    const i = e.map((x) => -((x - 0.5) ** 2));
    expect(refinePeakQuadratic({ potentialV: e, currentA: i, from: 0, to: 21 })).toBeNull();
    expect(() => refinePeakQuadratic({ potentialV: e, currentA: i, from: 0, to: 2 })).toThrow(/at least 3/);
  });

  // A least-squares parabola is determined only by three or more distinct abscissae (common practice, no source).
  it('returns null, not a solver fault, when the window holds fewer than three distinct potentials (a staircase step)', () => {
    const e = [0.1, 0.1, 0.1, 0.2, 0.2, 0.2];
    const i = [1e-6, 2e-6, 1.5e-6, 1e-6, 2e-6, 1e-6];
    expect(refinePeakQuadratic({ potentialV: e, currentA: i, from: 0, to: 6 })).toBeNull();
    const tiny = [0, 1e-300, 2e-300, 3e-300, 4e-300];
    expect(refinePeakQuadratic({ potentialV: tiny, currentA: [0, 1, 2, 1, 0], from: 0, to: 5 })).toBeNull();
  });
});
