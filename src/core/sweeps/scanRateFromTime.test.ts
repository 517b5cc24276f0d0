import { describe, expect, it } from 'vitest';
import { findSweepSegments } from './findSweepSegments';
import { scanRateFromTime } from './scanRateFromTime';

/**
 * Definition checked: v = |dE/dt| for a linear sweep (IUPAC, Terminology of electrochemical
 * methods of analysis, Pure Appl. Chem. 92 (2020) 641). Inputs are triangle waves built here,
 * so the expected rate is known exactly by construction.
 */
function triangleWithTime(vVPerS: number, dtS: number, e0: number, e1: number, cycles: number) {
  const e: number[] = [];
  const t: number[] = [];
  const halfS = Math.abs(e1 - e0) / vVPerS;
  const total = Math.round((2 * halfS * cycles) / dtS);
  for (let i = 0; i <= total; i++) {
    const ti = i * dtS;
    const phase = (ti % (2 * halfS)) / halfS;
    e.push(phase <= 1 ? e0 + (e1 - e0) * phase : e1 - (e1 - e0) * (phase - 1));
    t.push(ti);
  }
  return { e: Float64Array.from(e), t: Float64Array.from(t) };
}

describe('scanRateFromTime (v = |dE/dt|, IUPAC 2020 definition)', () => {
  it('hand example: E = 0, 0.1, 0.2, 0.3, 0.4 V at t = 0..4 s gives 0.1 V/s', () => {
    const e = new Float64Array([0, 0.1, 0.2, 0.3, 0.4]);
    const t = new Float64Array([0, 1, 2, 3, 4]);
    const r = scanRateFromTime(e, t, [{ start: 0, end: 5, direction: 'positive', cycle: 1 }]);
    expect(r.scanRateVPerS).toBeCloseTo(0.1, 12);
    expect(r.relativeSpread).toBe(0);
  });

  it('three cycles at 50 mV/s read back 0.050 V/s within 1e-9 relative', () => {
    const { e, t } = triangleWithTime(0.05, 0.01, -0.2, 0.6, 3);
    const { segments } = findSweepSegments(e);
    const r = scanRateFromTime(e, t, segments);
    expect(r.perSegmentVPerS.length).toBe(6);
    expect(Math.abs(r.scanRateVPerS - 0.05) / 0.05).toBeLessThan(1e-9);
  });

  it('a staircase ramp (2 mV steps every 20 ms, 0.1 V/s) reads its mean rate within 1 %', () => {
    const e: number[] = [];
    const t: number[] = [];
    for (let i = 0; i < 500; i++) {
      e.push(Math.floor(i / 4) * 0.002);
      t.push(i * 0.005);
    }
    const r = scanRateFromTime(e, t, [{ start: 0, end: 500, direction: 'positive', cycle: 1 }]);
    expect(Math.abs(r.scanRateVPerS - 0.1) / 0.1).toBeLessThan(0.01);
  });

  it('one interrupted segment does not move the median', () => {
    const { e, t } = triangleWithTime(0.1, 0.01, 0, 0.5, 2);
    const { segments } = findSweepSegments(e);
    const slowed = Float64Array.from(t);
    const seg1 = segments[1];
    if (!seg1) throw new Error('expected a second segment');
    for (let i = seg1.start + 1; i < seg1.end; i++) slowed[i] = (slowed[i - 1] as number) + 0.02;
    for (let i = seg1.end; i < slowed.length; i++) slowed[i] = (slowed[i - 1] as number) + 0.01;
    const r = scanRateFromTime(e, slowed, segments);
    expect(r.scanRateVPerS).toBeCloseTo(0.1, 9);
    expect(r.relativeSpread).toBeGreaterThan(0.4);
  });

  it('edges: time that never advances, and unequal lengths, are refused', () => {
    const e = new Float64Array([0, 0.1, 0.2, 0.3, 0.4]);
    expect(() => scanRateFromTime(e, new Float64Array(5), [{ start: 0, end: 5, direction: 'positive', cycle: 1 }])).toThrow(/no sweep segment/);
    expect(() => scanRateFromTime(e, new Float64Array(4), [])).toThrow(/points/);
  });
});
