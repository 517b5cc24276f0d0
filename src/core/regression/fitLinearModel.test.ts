import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { fitLine } from './fitLine';
import { fitLinearModel } from './fitLinearModel';

describe('fitLinearModel', () => {
  // Worked by hand: y = 1 + 2x + 3√x at x = 1, 4, 9, 16 is met exactly by (1, 2, 3).
  it('recovers an exact three-term model', () => {
    const x = [1, 4, 9, 16];
    const y = x.map((v) => 1 + 2 * v + 3 * Math.sqrt(v));
    const r = fitLinearModel([x.map(() => 1), x, x.map(Math.sqrt)], y);
    r.coefficients.forEach((b, j) => expect(b).toBeCloseTo([1, 2, 3][j]!, 9));
    expect(r.degreesOfFreedom).toBe(1);
  });
  // Draper & Smith 3rd ed. (1998) ch. 5: with columns (1, x) the matrix form is the straight line, so
  // it must agree with fitLine on Anscombe's set I (Am. Stat. 27, 17 (1973)), standard errors included.
  it('agrees with fitLine for a straight line', () => {
    const x = [10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5];
    const y = [8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68];
    const m = fitLinearModel([x.map(() => 1), x], y);
    const l = fitLine(x, y);
    expect(m.coefficients[1]).toBeCloseTo(l.slope, 12);
    expect(m.standardErrors![1]).toBeCloseTo(l.slopeStdError!, 12);
    expect(m.intervals![1]![0]).toBeCloseTo(l.slopeInterval![0], 10);
  });
  it('rejects dependent columns, short input and NaN', () => {
    expect(() => fitLinearModel([[1, 2, 3], [2, 4, 6]], [1, 2, 3])).toThrow(AnalysisError);
    expect(() => fitLinearModel([[1], [2]], [1])).toThrow(/at least 2 points/);
    expect(() => fitLinearModel([[1, Number.NaN]], [1, 2])).toThrow(/not finite/);
  });
});
