/** Thinning keeps extremes (worked by hand on small arrays; common practice, no source). */
import { describe, expect, it } from 'vitest';
import { chooseCurrentScale, maxAbs } from './currentScale';
import { decimateMinMax } from './decimate';

describe('decimateMinMax', () => {
  it('returns short traces unchanged', () => {
    expect(decimateMinMax([1, 2, 3], [4, 5, 6], 0, 3, 10)).toEqual({ x: [1, 2, 3], y: [4, 5, 6] });
  });

  it('keeps a one-point spike in a long flat trace at full height', () => {
    const n = 100_000;
    const x = Float64Array.from({ length: n }, (_, i) => i);
    const y = new Float64Array(n);
    y[54_321] = 7;
    y[12_345] = -3;
    const out = decimateMinMax(x, y, 0, n, 3000);
    expect(out.x.length).toBeLessThanOrEqual(3001);
    expect(Math.max(...out.y)).toBe(7);
    expect(Math.min(...out.y)).toBe(-3);
    expect(out.x[out.y.indexOf(7)]).toBe(54_321);
    // Points stay in trace order, first and last kept.
    expect(out.x.every((v, i) => i === 0 || v > (out.x[i - 1] as number))).toBe(true);
    expect(out.x[0]).toBe(0);
    expect(out.x[out.x.length - 1]).toBe(n - 1);
  });

  it('honours a sub-range', () => {
    expect(decimateMinMax([0, 1, 2, 3, 4], [0, 1, 2, 3, 4], 1, 4, 10)).toEqual({ x: [1, 2, 3], y: [1, 2, 3] });
  });
});

// SI prefixes: BIPM, The International System of Units, 9th ed. (2019), Table 7.
describe('chooseCurrentScale', () => {
  it.each([
    [2.5e-5, 'µA', 25],
    [3e-3, 'mA', 3],
    [4e-10, 'pA', 400],
    [1.5, 'A', 1.5],
  ])('%s A reads in %s', (a, unit, shown) => {
    const s = chooseCurrentScale(a);
    expect(s.unit).toBe(unit);
    expect(a * s.factor).toBeCloseTo(shown, 9);
  });
  it('falls back to µA for an all-zero trace', () => {
    expect(chooseCurrentScale(maxAbs([0, 0])).unit).toBe('µA');
  });
});

describe('decimateMinMax with maps', () => {
  it('applies the maps to the points it keeps, in one pass (worked by hand)', () => {
    expect(decimateMinMax([1, 2, 3], [4, 5, 6], 0, 3, 10, (v) => v + 0.5, (a) => -2 * a)).toEqual({ x: [1.5, 2.5, 3.5], y: [-8, -10, -12] });
  });

  it('keeps a bucket\'s minimum before its maximum when it comes first, each point once (worked by hand)', () => {
    // 9 points, 3 points allowed: one bucket of 9, then the last point.
    const y = [0, -5, 1, 2, 9, 3, 0, 0, 1];
    const x = y.map((_, i) => i);
    expect(decimateMinMax(x, y, 0, 9, 3)).toEqual({ x: [0, 1, 4, 8], y: [0, -5, 9, 1] });
    // The bucket's first point is its maximum: kept once.
    expect(decimateMinMax(x, [9, 1, -2, 3, 0, 0, 0, 0, 0], 0, 9, 3)).toEqual({ x: [0, 2, 8], y: [9, -2, 0] });
  });
});
