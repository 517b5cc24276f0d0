import { describe, expect, it } from 'vitest';
import type { SweepSegment } from '../types';
import { buildTimeAxis, prepareSweepSignals, windowForSpan } from './sweepSignals';

/** A 0 → 0.2 → 0 V triangle in 1 mV steps, 401 points, two sweeps sharing the vertex at 200. */
const potentialV = Float64Array.from({ length: 401 }, (_, k) => (k <= 200 ? k : 400 - k) / 1000);
const segments: SweepSegment[] = [
  { start: 0, end: 201, direction: 'positive', cycle: 1 },
  { start: 200, end: 401, direction: 'negative', cycle: 1 },
];

describe('sweepSignals', () => {
  // Linear sweep: t = Σ|ΔE| / v exactly.
  it('time axis from cumulative |ΔE| / v: 0.4 V at 0.1 V/s is 4 s', () => {
    const t = buildTimeAxis(potentialV, 0.1);
    expect(t[200]).toBeCloseTo(2, 12);
    expect(t[400]).toBeCloseTo(4, 12);
  });

  it('window covering 15 mV at 1 mV steps is 15 points; at least 5 points', () => {
    expect(windowForSpan(potentialV, segments[0]!, 0.015)).toBe(15);
    expect(windowForSpan(potentialV, segments[0]!, 0.001)).toBe(5);
  });

  // Savitzky–Golay preserves straight lines (Savitzky & Golay 1964); a current linear on each
  // sweep with a corner at the vertex stays exact only if no window straddles the vertex.
  it('smoothing runs per sweep: a corner at the vertex is not rounded', () => {
    const currentA = potentialV.map((e, k) => (k <= 200 ? 2 * e : -3 * e + 1));
    const sig = prepareSweepSignals({ potentialV, currentA, timeS: null, scanRateVPerS: 0.1, segments }, { window: 9, order: 2 }, () => ({ window: 15, order: 2 }));
    for (const k of [195, 199, 201, 205]) {
      expect(sig.shownA[k]).toBeCloseTo(currentA[k]!, 12);
      expect(sig.locatingA[k]).toBeCloseTo(currentA[k]!, 12);
    }
    expect(sig.shownSlopeAPerV[100]).toBeCloseTo(2, 9);
    expect(sig.shownSlopeAPerV[300]).toBeCloseTo(-3, 9);
    expect(sig.timeKnown).toBe(true);
  });

  it("smoothing 'off' copies the raw current; no time and no scan rate means timeKnown false", () => {
    const currentA = potentialV.map((e) => Math.sin(40 * e));
    const sig = prepareSweepSignals({ potentialV, currentA, timeS: null, scanRateVPerS: null, segments }, 'off', () => ({ window: 5, order: 2 }));
    expect(sig.shownA).toEqual(currentA);
    expect(sig.shownA).not.toBe(currentA);
    expect(sig.timeKnown).toBe(false);
  });
});
