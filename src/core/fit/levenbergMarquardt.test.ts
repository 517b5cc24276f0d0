/**
 * The Levenberg–Marquardt iteration on problems with known answers: a straight line worked by
 * hand, the NIST StRD nonlinear benchmark Misra1a with its certified values, a box limit that
 * binds, a model that refuses some parameter sets, cancel, and bad input.
 */
import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { levenbergMarquardt, type LeastSquaresProblem } from './levenbergMarquardt';
import { MISRA1A, misraProblem } from './misra1aReference';

function problem(p: number, m: number, residuals: LeastSquaresProblem['residuals']): LeastSquaresProblem {
  return { parameterCount: p, residualCount: m, residuals, stepSizes: new Float64Array(p).fill(1e-6), lower: new Float64Array(p).fill(-Infinity), upper: new Float64Array(p).fill(Infinity) };
}

const LINE_X = [0, 1, 2, 3, 4];
const LINE_Y = [1, 3, 4, 8, 9];
const line = () => problem(2, 5, (u, out) => LINE_X.forEach((x, i) => { out[i] = LINE_Y[i]! - u[0]! - u[1]! * x; }));

describe('levenbergMarquardt', () => {
  // By hand: x̄ = 2, ȳ = 5, Sxy = 21, Sxx = 10 → b = 2.1, a = 0.8, S = 1.9.
  it('a straight line: a = 0.8, b = 2.1, S = 1.9 (worked by hand)', () => {
    const r = levenbergMarquardt(line(), new Float64Array([0, 0]), { relativeOffsetTolerance: 1e-6 });
    expect(r.converged).toBe(true);
    expect(r.u[0]).toBeCloseTo(0.8, 6);
    expect(r.u[1]).toBeCloseTo(2.1, 6);
    expect(r.costA2).toBeCloseTo(1.9, 9);
  });

  it.each([[[5, 1]], [[2.5, 5]]])('NIST StRD Misra1a from start %j: certified b1, b2 to 1e-5 and S to 1e-8 (relative)', (start) => {
    const r = levenbergMarquardt(misraProblem(), new Float64Array(start));
    expect(r.converged).toBe(true);
    expect(Math.abs((100 * r.u[0]!) / MISRA1A.b1 - 1)).toBeLessThan(1e-5);
    expect(Math.abs((1e-4 * r.u[1]!) / MISRA1A.b2 - 1)).toBeLessThan(1e-5);
    expect(Math.abs(r.costA2 / MISRA1A.rss - 1)).toBeLessThan(1e-8);
  });

  // Bounded least squares: the minimum over the box lies on the face b ≤ 1.5 (common practice, no source).
  it('holds a parameter at a box limit when the optimum lies beyond it, and still converges', () => {
    const bounded = { ...line(), upper: new Float64Array([Infinity, 1.5]) };
    const r = levenbergMarquardt(bounded, new Float64Array([0, 0]), { relativeOffsetTolerance: 1e-6 });
    expect(r.u[1]).toBe(1.5);
    // With b held at 1.5 the best a is ȳ − 1.5·x̄ = 2.
    expect(r.u[0]).toBeCloseTo(2, 6);
    expect(r.converged).toBe(true);
  });

  it('treats a parameter set the model refuses as a failed step and finds the optimum beside it', () => {
    const refusing = problem(2, 5, (u, out) => {
      if (u[1]! > 2.2) throw new AnalysisError('OUT_OF_RANGE', 'refused');
      LINE_X.forEach((x, i) => { out[i] = LINE_Y[i]! - u[0]! - u[1]! * x; });
    });
    const r = levenbergMarquardt(refusing, new Float64Array([0, 0]));
    expect(r.u[1]).toBeCloseTo(2.1, 4);
  });

  it('stops with CANCELLED at the first check after the signal is raised; no evaluation runs after it', () => {
    let calls = 0;
    const signal = { aborted: false };
    const counting = problem(2, 14, (u, out) => {
      calls++;
      if (calls === 4) signal.aborted = true;
      misraProblem().residuals(u, out);
    });
    expect(() => levenbergMarquardt(counting, new Float64Array([5, 1]), { signal })).toThrow(expect.objectContaining({ code: 'CANCELLED' }));
    expect(calls).toBe(4);
  });

  it('refuses a start of the wrong length, too few residuals and a start the model refuses', () => {
    expect(() => levenbergMarquardt(line(), new Float64Array(3))).toThrow(expect.objectContaining({ code: 'LENGTH_MISMATCH' }));
    expect(() => levenbergMarquardt(problem(2, 2, () => {}), new Float64Array(2))).toThrow(expect.objectContaining({ code: 'TOO_FEW_POINTS' }));
    const never = problem(1, 3, () => { throw new AnalysisError('OUT_OF_RANGE', 'no'); });
    expect(() => levenbergMarquardt(never, new Float64Array(1))).toThrow(expect.objectContaining({ code: 'NOT_CONVERGED' }));
  });
});
