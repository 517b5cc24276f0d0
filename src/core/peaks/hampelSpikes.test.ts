/**
 * Isolated bad points against a running median: the Hampel identifier (F. R. Hampel, J. Am. Stat.
 * Assoc. 69, 383 (1974); its moving-window form, R. K. Pearson, IEEE Trans. Control Syst. Technol.
 * 10, 55 (2002), from memory), and a simulated voltammogram (this project's simulator) with six
 * single-point glitches of three times the peak current, as a real record can have.
 */
import { describe, expect, it } from 'vitest';
import { seededGaussian } from '../random/seededGaussian';
import { simulatedVoltammogram } from './simulatedVoltammogram';
import { analyzeVoltammogram } from '../analysis/analyzeVoltammogram';
import { hampelSpikes } from './hampelSpikes';

const oneSweep = (n: number) => [{ start: 0, end: n, direction: 'positive' as const, cycle: 1 }];

describe('hampelSpikes', () => {
  // Worked by hand: a line 0, 1, 2, … with noise of 0.01 and point 10 set to 100: its window holds
  // 7, 8, 9, 100, 11, 12, 13, median 11 and MAD 2, so 100 is 30 robust deviations out; nothing else is.
  it('finds one glitch on a sloping line and puts the running median in its place', () => {
    const g = seededGaussian(2);
    const y = Float64Array.from({ length: 30 }, (_, i) => i + 0.01 * g());
    y[10] = 100;
    const r = hampelSpikes(y, oneSweep(30));
    expect(r.indices).toEqual([10]);
    expect(r.cleanedA[10]).toBeCloseTo(11, 1);
    expect(y[10]).toBe(100);
  });
  // A run longer than the half-window is a feature, not a glitch.
  it('leaves a four-point feature alone', () => {
    const y = Float64Array.from({ length: 40 }, (_, i) => Math.sin(i / 7) + (i >= 20 && i < 24 ? 5 : 0));
    expect(hampelSpikes(y, oneSweep(40)).indices).toEqual([]);
  });
  it('flags nothing on a smooth noise-free voltammogram', () => {
    const v = simulatedVoltammogram({ k0CmPerS: Infinity, startV: 0.4, switchV: -0.4, doubleLayerFPerCm2: 2e-5 });
    expect(hampelSpikes(v.currentA, v.segments).indices).toEqual([]);
  });

  // Issue case: six single-point spikes of 3× the peak current, far from the peaks, made seven
  // one-way couples and hid the real one. With the test the couple is found as without spikes
  // (E½ and ΔEp within 0.5 mV, ip within 1 %), and the six points are listed.
  it('six spikes of 3× ip: the real couple survives and the spikes are listed', () => {
    const sim = { k0CmPerS: Infinity, startV: 0.4, switchV: -0.4, doubleLayerFPerCm2: 2e-5 };
    const clean = analyzeVoltammogram(simulatedVoltammogram(sim, { noiseA: 5e-9, seed: 9 })).cycles[0]!.couples[0]!;
    const v = simulatedVoltammogram(sim, { noiseA: 5e-9, seed: 9 });
    const ip = clean.ipcA!;
    const at = [60, 140, 300, 560, 650, 760];
    at.forEach((k, j) => { v.currentA[k] = (j % 2 ? -3 : 3) * ip; });
    const spoiled = analyzeVoltammogram(v, { spikeFilter: 'off' }).cycles[0]!.couples;
    expect(spoiled.filter((c) => c.deltaEpV === null).length).toBeGreaterThan(2);
    const a = analyzeVoltammogram(v);
    expect(a.spikes?.map((p) => p.index)).toEqual(at);
    expect(a.warnings.some((w) => w.code === 'SPIKES' && /6 isolated bad points/.test(w.message))).toBe(true);
    const c = a.cycles[0]!.couples;
    expect(c).toHaveLength(1);
    expect(Math.abs(c[0]!.eHalfV! - clean.eHalfV!)).toBeLessThan(0.0005);
    expect(Math.abs(c[0]!.deltaEpV! - clean.deltaEpV!)).toBeLessThan(0.0005);
    expect(Math.abs(c[0]!.ipcA! / ip - 1)).toBeLessThan(0.01);
  });
});
