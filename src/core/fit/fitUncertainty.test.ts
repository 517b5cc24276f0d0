/**
 * Linearised standard errors and correlations against a line worked by hand and the certified
 * standard errors of NIST StRD Misra1a; an unidentifiable parameter; no degrees of freedom.
 * Source of the method: Bates & Watts, Nonlinear Regression Analysis and Its Applications (1988), §2.3.
 */
import { describe, expect, it } from 'vitest';
import { linearizedCovariance } from './fitUncertainty';
import { levenbergMarquardt } from './levenbergMarquardt';
import { MISRA1A, misraProblem } from './misra1aReference';

/** ∂r/∂θ of r = y − a − b·x. */
const lineJacobian = (x: number[]) => [Float64Array.from(x, () => -1), Float64Array.from(x, (xi) => -xi)];

describe('linearizedCovariance', () => {
  // By hand for x = 0…4, S = 1.9, ν = 3: s² = 0.6333, SE(b) = √(s²/Sxx) = 0.25166,
  // SE(a) = √(s²(1/n + x̄²/Sxx)) = 0.61644, ρ(a, b) = −x̄/√(Sxx/n + x̄²) = −0.8165.
  it('a straight line: standard errors, correlation and ν worked by hand', () => {
    const c = linearizedCovariance(lineJacobian([0, 1, 2, 3, 4]), 1.9);
    expect(c.degreesOfFreedom).toBe(3);
    expect(c.standardErrors[0]).toBeCloseTo(0.61644, 5);
    expect(c.standardErrors[1]).toBeCloseTo(0.25166, 5);
    expect(c.correlation[0]?.[1]).toBeCloseTo(-0.8165, 4);
    // Student t, ν = 3, two-sided 95 %: 3.1824 (statistical tables, e.g. Abramowitz & Stegun Table 26.10).
    expect(c.tQuantile).toBeCloseTo(3.1824, 3);
  });

  it('NIST StRD Misra1a: certified standard errors of b1 and b2 to 1e-4 (relative)', () => {
    const r = levenbergMarquardt(misraProblem(), new Float64Array([5, 1]), { relativeOffsetTolerance: 1e-6 });
    const b = [100 * r.u[0]!, 1e-4 * r.u[1]!];
    const jac = [0, 1].map((j) => Float64Array.from(MISRA1A.x, (x) => (j === 0 ? -(1 - Math.exp(-b[1]! * x)) : -b[0]! * x * Math.exp(-b[1]! * x))));
    const c = linearizedCovariance(jac, r.costA2);
    expect(Math.abs(c.standardErrors[0]! / MISRA1A.se1 - 1)).toBeLessThan(1e-4);
    expect(Math.abs(c.standardErrors[1]! / MISRA1A.se2 - 1)).toBeLessThan(1e-4);
  });

  it('marks a parameter the data cannot see (a zero or duplicated column) undetermined', () => {
    const x = [0, 1, 2, 3, 4];
    const [a, b] = lineJacobian(x);
    const zero = linearizedCovariance([a!, b!, new Float64Array(5)], 1.9);
    expect(zero.undetermined).toEqual([false, false, true]);
    expect(zero.standardErrors[2]).toBe(Infinity);
    expect(zero.correlation[0]?.[2]).toBeNull();
    const twin = linearizedCovariance([a!, b!, Float64Array.from(b!)], 1.9);
    expect(twin.undetermined).toEqual([false, true, true]);
  });

  it('refuses a fit without degrees of freedom', () => {
    expect(() => linearizedCovariance(lineJacobian([0, 1]), 1)).toThrow(expect.objectContaining({ code: 'TOO_FEW_POINTS' }));
  });
});
