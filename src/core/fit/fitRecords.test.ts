/**
 * Preparing measured voltammograms for a fit: waveform, window, positions on the simulated grid.
 * Common practice, no source (the mapping is checked against the simulator's own waveform).
 */
import { describe, expect, it } from 'vitest';
import { simulatedVoltammogram } from '../simulation';
import { prepareRecords } from './fitRecords';

describe('prepareRecords', () => {
  const v = simulatedVoltammogram({ startV: 0.3, switchV: -0.3, stepV: 0.002, scanRateVPerS: 0.1 });

  it('takes start, vertex and scan rate from the record and puts 2 mV points on a 1 mV simulated grid', () => {
    const { records, windowV } = prepareRecords([v], { cycle: 1, electronCount: 1 });
    const r = records[0]!;
    expect([r.startV, r.switchV, r.scanRateVPerS, r.cycles]).toEqual([0.3, -0.3, 0.1, 1]);
    expect(r.stepV).toBeCloseTo(0.001, 12);
    expect(windowV).toEqual([-0.3, 0.3]);
    // 601 points, the vertex once: every point fitted; the k-th measured point is simulated point 2k.
    expect(r.indices.length).toBe(601);
    r.position.forEach((p, k) => expect(p).toBeCloseTo(2 * (r.indices[k] as number), 9));
  });

  it('keeps only the points inside the window, on both sweeps, and offsets records one after another', () => {
    const { records } = prepareRecords([v, v], { cycle: 1, electronCount: 1, windowV: [0.1005, -0.1005] });
    const r = records[0]!;
    expect(Array.from(r.potentialV).every((e) => e >= -0.1005 && e <= 0.1005)).toBe(true);
    expect(r.indices.length).toBe(2 * 101);
    expect(records[1]?.offset).toBe(r.indices.length);
  });

  it('n = 2 halves the simulated step (1 mV/n); a 0.25 mV record is simulated at 1 mV and interpolated', () => {
    expect(prepareRecords([v], { cycle: 1, electronCount: 2 }).records[0]?.stepV).toBeCloseTo(0.0005, 12);
    const fine = simulatedVoltammogram({ startV: 0.3, switchV: -0.3, stepV: 0.00025, scanRateVPerS: 0.1 });
    const r = prepareRecords([fine], { cycle: 1, electronCount: 1 }).records[0]!;
    expect(r.stepV).toBeCloseTo(0.001, 12);
    expect(r.position[1]).toBeCloseTo(0.25, 9);
  });

  it('fits cycle 2 of a two-cycle record on the second simulated cycle, and refuses a missing cycle', () => {
    const two = simulatedVoltammogram({ startV: 0.3, switchV: -0.3, stepV: 0.002, scanRateVPerS: 0.1, cycles: 2 });
    const r = prepareRecords([two], { cycle: 2, electronCount: 1 }).records[0]!;
    expect(r.cycles).toBe(2);
    expect(r.position[0]).toBeCloseTo(1200, 9);
    expect(() => prepareRecords([v], { cycle: 3, electronCount: 1 })).toThrow(/has no cycle 3/);
  });
});
