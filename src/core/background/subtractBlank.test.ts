import { describe, expect, it } from 'vitest';
import { simulateCv } from '../simulation';
import { findSweepSegments } from '../sweeps/findSweepSegments';
import type { Voltammogram } from '../types';
import { subtractBlank } from './subtractBlank';

function asVoltammogram(potentialV: Float64Array, currentA: Float64Array, scanRateVPerS: number): Voltammogram {
  const split = findSweepSegments(potentialV);
  return { potentialV, currentA, timeS: null, segments: split.segments, cycles: split.cycles, scanRateVPerS, scanRateSource: 'option' };
}

describe('subtractBlank', () => {
  // Worked by hand: a blank of constant +1 µA on the way up and −1 µA on the way down (pure charging)
  // subtracted from itself plus a known signal leaves the signal.
  it('removes a charging step exactly when both share the potential grid', () => {
    const e = Float64Array.from([0, 0.1, 0.2, 0.3, 0.2, 0.1, 0]);
    const charging = Float64Array.from([1e-6, 1e-6, 1e-6, 1e-6, -1e-6, -1e-6, -1e-6]);
    const signal = Float64Array.from([0, 2e-6, 5e-6, 1e-6, -3e-6, -1e-6, 0]);
    const r = subtractBlank(asVoltammogram(e, charging.map((c, k) => c + signal[k]!), 0.1), asVoltammogram(e, charging, 0.1));
    // The vertex belongs to both sweeps; the down sweep subtracts the blank's −1 µA there.
    r.currentA.forEach((x, k) => expect(x).toBeCloseTo(signal[k]!, 15));
    expect(r.pointsOutsideBlank).toBe(0);
  });
  // The simulator's faradaic and charging currents are computed separately (its own validation:
  // Nicholson & Shain 1964 peak; RC charging of the double layer): a blank with only Cdl, at the
  // same rate, takes the measurement back to the faradaic current; on another grid it interpolates.
  it('takes a simulated couple with double-layer charging back to its faradaic current', () => {
    const full = simulateCv({ k0CmPerS: Infinity, doubleLayerFPerCm2: 30e-6, stepV: 0.001 });
    const blankSim = simulateCv({ k0CmPerS: Infinity, doubleLayerFPerCm2: 30e-6, concentrationOMolPerCm3: 0, stepV: 0.001 });
    const r = subtractBlank(asVoltammogram(full.potentialV, full.currentA, 0.1), asVoltammogram(blankSim.potentialV, blankSim.currentA, 0.1));
    let worst = 0;
    const peak = Math.max(...Array.from(full.faradaicCurrentA, Math.abs));
    for (let k = 5; k < r.currentA.length - 5; k++) worst = Math.max(worst, Math.abs(r.currentA[k]! - full.faradaicCurrentA[k]!));
    expect(worst / peak).toBeLessThan(0.001);
    expect(r.scanRateRatio).toBe(1);
  });
  // Linear interpolation is exact for a blank that is linear in E (worked by hand).
  it('interpolates a blank recorded on another potential grid', () => {
    const e = Float64Array.from([0, 0.05, 0.1, 0.15, 0.2, 0.15, 0.1, 0.05, 0]);
    const blankE = Float64Array.from([0, 0.08, 0.2, 0.12, 0]);
    const line = (x: number, up: boolean) => (up ? 1e-6 + 2e-6 * x : -1e-6 + 3e-6 * x);
    const blank = asVoltammogram(blankE, Float64Array.from(blankE, (x, k) => line(x, k <= 2)), 0.1);
    const r = subtractBlank(asVoltammogram(e, Float64Array.from(e, (x, k) => line(x, k <= 4)), 0.1), blank);
    r.currentA.forEach((x) => expect(x).toBeCloseTo(0, 15));
  });
  it('counts points outside the blank range and refuses a blank without the needed sweep', () => {
    const e = Float64Array.from([0, 0.1, 0.2, 0.3, 0.2, 0.1, 0]);
    const short = Float64Array.from([0.1, 0.15, 0.2, 0.15, 0.1]);
    const r = subtractBlank(asVoltammogram(e, new Float64Array(7), 0.1), asVoltammogram(short, new Float64Array(5), 0.2));
    // Up sweep: 0 and 0.3 V lie outside 0.1–0.2 V; down sweep (its vertex counted once): 0 V.
    expect(r.pointsOutsideBlank).toBe(3);
    expect(r.scanRateRatio).toBeCloseTo(0.5, 12);
    const upOnly = asVoltammogram(Float64Array.from([0, 0.1, 0.2, 0.3]), new Float64Array(4), 0.1);
    expect(() => subtractBlank(asVoltammogram(e, new Float64Array(7), 0.1), upOnly)).toThrow(/negative-going/);
  });
});
