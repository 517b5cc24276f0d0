/**
 * Straight background solved and projected out per voltammogram (variable projection, Golub &
 * Pereyra, SIAM J. Numer. Anal. 10 (1973) 413), by hand and inside a fit.
 */
import { describe, expect, it } from 'vitest';
import { projectOutBackground } from './backgroundProjection';
import { estimateOf, noisyVoltammograms, relativeError, TEST_CELL } from './fitTestSupport';
import type { PreparedRecord } from './fitRecords';
import { fitVoltammograms } from './fitVoltammograms';

const record = (potentialV: number[], offset: number): PreparedRecord => ({
  scanRateVPerS: 0.1, startV: 0, switchV: 1, stepV: 0.001, cycles: 1, indices: new Int32Array(potentialV.length),
  potentialV: Float64Array.from(potentialV), currentA: new Float64Array(potentialV.length), position: new Float64Array(potentialV.length), offset,
});

describe('projectOutBackground', () => {
  it('removes an exact line from each record and returns it (worked by hand: 2 + 3E and −1 − E)', () => {
    const a = [0, 0.1, 0.2, 0.3];
    const b = [0.5, 0.4, 0.3];
    const r = Float64Array.from([...a.map((e) => 2 + 3 * e), ...b.map((e) => -1 - e)]);
    const lines = projectOutBackground([record(a, 0), record(b, 4)], r);
    expect(lines[0]?.offsetA).toBeCloseTo(2, 12);
    expect(lines[0]?.slopeAPerV).toBeCloseTo(3, 12);
    expect(lines[1]?.offsetA).toBeCloseTo(-1, 12);
    expect(lines[1]?.slopeAPerV).toBeCloseTo(-1, 12);
    r.forEach((x) => expect(Math.abs(x)).toBeLessThan(1e-12));
  });

  it('leaves residuals orthogonal to 1 and E (least squares, by hand: mean 0, no trend)', () => {
    const e = [0, 0.1, 0.2, 0.3, 0.4];
    const r = Float64Array.from([1, -2, 0.5, 3, -1]);
    projectOutBackground([record(e, 0)], r);
    expect(r.reduce((s, x) => s + x, 0)).toBeCloseTo(0, 12);
    expect(r.reduce((s, x, i) => s + x * e[i]!, 0)).toBeCloseTo(0, 12);
  });

  // Oracle: the validated simulator (Nicholson 1965 ψ table) plus a known sloping leak.
  it('inside a fit: a leak of 0.2 µA + 1 µA/V is found within 5 % and k°, D stay within their tolerances', () => {
    const [v] = noisyVoltammograms({ startV: 0.45, switchV: -0.35, stepV: 0.002, uncompensatedOhm: 50, doubleLayerFPerCm2: 20e-6 },
      [{ formalPotentialV: 0.05, k0CmPerS: 0.01, alpha: 0.45, diffusionOCm2PerS: 8e-6, diffusionRCm2PerS: 8e-6 }], [0.2]);
    const leaky = { ...v!, currentA: v!.currentA.map((x, i) => x + 0.2e-6 + 1e-6 * v!.potentialV[i]!) };
    const r = fitVoltammograms({ records: [leaky], cell: TEST_CELL }, {
      free: ['formalPotentialV', 'k0CmPerS', 'alpha', 'diffusionOCm2PerS', 'doubleLayerFPerCm2', 'background'], start: { shared: { uncompensatedOhm: 50 } },
    });
    expect(relativeError(r.records[0]?.background?.offsetA ?? 0, 0.2e-6)).toBeLessThan(0.05);
    expect(relativeError(r.records[0]?.background?.slopeAPerV ?? 0, 1e-6)).toBeLessThan(0.05);
    expect(relativeError(estimateOf(r, 'k0CmPerS').value, 0.01)).toBeLessThan(0.25);
    expect(relativeError(estimateOf(r, 'diffusionOCm2PerS').value, 8e-6)).toBeLessThan(0.05);
    expect(r.criteria.parameterCount).toBe(7);
    expect(r.notes.some((n) => n.startsWith('a straight background'))).toBe(true);
  });
});
