import { describe, expect, it } from 'vitest';
import { vertexStepSchedule } from './vertexStepSchedule';

describe('vertexStepSchedule', () => {
  // Hairer, Nørsett & Wanner, Solving ODEs I, 2nd ed. (1993) §III.1 (from memory): BDF2 with equal
  // steps is (3/2)y_{n+1} − 2y_n + (1/2)y_{n−1} = h·f_{n+1}.
  it('equal steps give the classical BDF2 weights 3/(2h), 2/h, −1/(2h)', () => {
    const s = vertexStepSchedule(0.01, 0);
    const base = s.equal[s.halvings]!;
    expect(base.dtS).toBeCloseTo(0.01, 15);
    expect(base.sigmaPerS * base.dtS).toBeCloseTo(1.5, 12);
    expect(base.latestWeightPerS * base.dtS).toBeCloseTo(2, 12);
    expect(base.previousWeightPerS * base.dtS).toBeCloseTo(-0.5, 12);
  });

  // Hairer & Wanner, Solving ODEs II, 2nd ed. (1996) §V.1 (from memory): BDF3 is
  // (11/6)y_{n+1} − 3y_n + (3/2)y_{n−1} − (1/3)y_{n−2} = h·f_{n+1}; being third order it
  // differentiates a cubic exactly (worked by hand below).
  it('BDF3 has the weights 11/(6h), 3/h, −3/(2h), 1/(3h) and differentiates t³ exactly', () => {
    const r = vertexStepSchedule(1, 0).third;
    expect(r.sigmaPerS).toBeCloseTo(11 / 6, 12);
    expect(r.latestWeightPerS).toBeCloseTo(3, 12);
    expect(r.previousWeightPerS).toBeCloseTo(-1.5, 12);
    expect(r.olderWeightPerS).toBeCloseTo(1 / 3, 12);
    // y = (t + 1)³ at t = −3, −2, −1, 0 → −8, −1, 0, 1; y′(0) = 3.
    expect(r.sigmaPerS * 1 - r.latestWeightPerS * 0 - r.previousWeightPerS * -1 - r.olderWeightPerS * -8).toBeCloseTo(3, 12);
  });

  // Worked by hand: a variable-step formula must differentiate a quadratic exactly. With steps
  // h′ = 1 then h = 2 (ω = 2) on y = t² at t = −1, 0, 2: dy/dt(2) = 4.
  it('the doubled step differentiates t² exactly', () => {
    const s = vertexStepSchedule(8, 0);
    const r = s.doubled.find((x) => x.dtS === 2)!;
    expect(r.sigmaPerS * 4 - r.latestWeightPerS * 0 - r.previousWeightPerS * 1).toBeCloseTo(4, 12);
  });

  // Common practice, no source: the shortest step resolves the charging time constant (τ/4),
  // within 3 to 16 halvings of Δt.
  it('halves Δt until the step is at most τ/4, within 3 to 16 halvings', () => {
    expect(vertexStepSchedule(0.5e-3, 0.226e-3).restart.dtS).toBeLessThanOrEqual(0.226e-3 / 4);
    expect(vertexStepSchedule(0.5e-3, 0).halvings).toBe(3);
    expect(vertexStepSchedule(0.5e-3, 1e-15).halvings).toBe(16);
    expect(vertexStepSchedule(0.5e-3, 1).halvings).toBe(3);
  });
});
