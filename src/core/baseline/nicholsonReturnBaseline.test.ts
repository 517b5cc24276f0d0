import { describe, expect, it } from 'vitest';
import { baselineAt } from './baselineCurve';
import { nicholsonReturnBaseline } from './nicholsonReturnBaseline';
import { gaussianShape, uniformGrid } from './analyticShapes';

describe('nicholsonReturnBaseline', () => {
  // Built case: a pure b/√(t − t0) decay plus a capacitive ±c that flips at the switch, plus a
  // return peak. The baseline must reproduce decay − c under the return peak.
  function makeTrace(c: number) {
    const n = 401;
    const t = uniformGrid(n, 0, 2);
    const v = 200;
    const e = t.map((x, k) => (k <= v ? -0.2 + 0.5 * x : 0.3 - 0.5 * (x - 1)));
    const t0 = 0.45;
    const decay = (x: number) => 4e-6 / Math.sqrt(x - t0);
    const i = t.map((x, k) => (k <= v ? c : -c) + (x > t0 ? decay(x) : 0) - (k > v ? 5e-6 * gaussianShape(e[k] as number, 0.0, 0.04) : 0));
    return { t, e, i, v, expected: (k: number) => decay(t[k] as number) + (k <= v ? c : -c) };
  }

  it('extends the decay and steps by the charging jump (free constant)', () => {
    const { t, e, i, v, expected } = makeTrace(3e-7);
    const r = nicholsonReturnBaseline({ potentialV: e, currentA: i, timeS: t, forwardFitStart: 140, forwardFitEnd: 201, vertexIndex: v, spanEnd: 401 });
    expect(r.switchStepA).toBeCloseTo(-6e-7, 9);
    for (const k of [250, 300, 380]) expect(baselineAt(r.curve, k)! / expected(k)).toBeCloseTo(1, 3);
  });

  it('with a known forward background, holds the constant at 0 and recovers t0', () => {
    const { t, e, i, v, expected } = makeTrace(3e-7);
    const r = nicholsonReturnBaseline({ potentialV: e, currentA: i, timeS: t, forwardFitStart: 140, forwardFitEnd: 201, vertexIndex: v, spanEnd: 401, forwardBackgroundA: () => 3e-7 });
    expect(r.t0S).toBeCloseTo(0.45, 4);
    expect(r.constantA).toBe(0);
    for (const k of [250, 300, 380]) expect(baselineAt(r.curve, k)! / expected(k)).toBeCloseTo(1, 6);
  });

  it('rejects a fit window that runs past the vertex and a time column of the wrong length', () => {
    const { t, e, i, v } = makeTrace(0);
    expect(() => nicholsonReturnBaseline({ potentialV: e, currentA: i, timeS: t, forwardFitStart: 140, forwardFitEnd: 260, vertexIndex: v, spanEnd: 401 })).toThrow(/before the vertex/);
    expect(() => nicholsonReturnBaseline({ potentialV: e, currentA: i, timeS: t.subarray(1), forwardFitStart: 140, forwardFitEnd: 201, vertexIndex: v, spanEnd: 401 })).toThrow(/timeS/);
  });
});
