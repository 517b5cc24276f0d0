import { describe, expect, it } from 'vitest';
import { triangularWaveform } from './triangularWaveform';

describe('triangularWaveform', () => {
  it('0.2 → 0 → 0.2 V at 0.1 V/s in 0.05 V steps: five points per sweep, vertex at 2 s', () => {
    const w = triangularWaveform(0.2, 0, 0.1, 0.05, 1);
    expect(Array.from(w.potentialV)).toEqual([0.2, 0.15, 0.1, 0.05, 0, 0.05, 0.1, 0.15, 0.2].map((v) => expect.closeTo(v, 12)));
    expect(w.timeS[4]).toBeCloseTo(2, 12);
    expect(w.timeS[8]).toBeCloseTo(4, 12);
  });

  it('adjusts the step so that the vertex is a point, and repeats cycles', () => {
    const w = triangularWaveform(0, 0.1, 1, 0.03, 2);
    expect(w.pointsPerSweep).toBe(3);
    expect(w.potentialV.length).toBe(13);
    expect(w.potentialV[3]).toBeCloseTo(0.1, 12);
    expect(w.potentialV[6]).toBeCloseTo(0, 12);
    expect(w.potentialV[9]).toBeCloseTo(0.1, 12);
  });

  it('refuses an output that would not fit in memory', () => {
    expect(() => triangularWaveform(0, 1, 1, 1e-7, 100)).toThrow(/limit/);
  });
});
