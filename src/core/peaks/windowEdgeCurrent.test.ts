/**
 * A current still rising at the switching potential is not a peak. Built from this project's
 * simulator (a Nernstian couple, E°′ = 0, oxidation first to +0.6 V) plus, added here, the anodic
 * Tafel branch of a Butler–Volmer solvent oxidation, I = i0·exp((1 − α)F(E − E_bd)/RT) with α = 0.5,
 * E_bd = 0.45 V, i0 = 3 µA (Bard & Faulkner 2nd ed. (2001) §3.4): about three times the couple's peak
 * at the vertex. A second case lets that current give way just before the vertex (a film or
 * bubbles blocking the electrode: the factor 1 − exp(−(E_v + 1 mV − E)/2 mV)), which makes a true
 * maximum a few points before the switch.
 */
import { describe, expect, it } from 'vitest';
import { inverseThermalVoltagePerV } from '../constants';
import { analyzeVoltammogram } from '../analysis/analyzeVoltammogram';
import { simulatedVoltammogram } from './simulatedVoltammogram';
import { prepareSweepSignals } from './sweepSignals';
import { locatePeaksInSweep } from './locatePeaksInSweep';

const f = inverseThermalVoltagePerV(298.15);
const couple = () => simulatedVoltammogram({ k0CmPerS: Infinity, startV: -0.3, switchV: 0.6, concentrationOMolPerCm3: 0, concentrationRMolPerCm3: 1e-6, doubleLayerFPerCm2: 2e-5 }, { noiseA: 1e-8, seed: 2 });
const tafel = (e: number) => 3e-6 * Math.exp(0.5 * f * (e - 0.45));
const withBreakdown = (giveWay: boolean) => {
  const v = couple();
  v.currentA.forEach((c, k) => {
    const e = v.potentialV[k]!;
    v.currentA[k] = c + tafel(e) * (giveWay ? 1 - Math.exp(-(0.601 - e) / 0.002) : 1);
  });
  return v;
};

describe('breakdown or catalytic current at the window edge', () => {
  it('Tafel breakdown to the switch: flagged anodic, shaded from ~0.39 V to 0.6 V, the couple kept with its return peak within 6 %', () => {
    const a = analyzeVoltammogram(withBreakdown(false));
    const c = a.cycles[0]!;
    expect(c.windowEdges).toHaveLength(1);
    const edge = c.windowEdges![0]!;
    expect(edge.direction).toBe('anodic');
    expect(edge.atSwitch).toBe(true);
    expect(edge.toV).toBeCloseTo(0.6, 6);
    expect(edge.fromV).toBeGreaterThan(0.3);
    expect(edge.fromV).toBeLessThan(0.5);
    expect(c.warnings.some((w) => w.code === 'WINDOW_EDGE' && /breakdown or catalytic current at the window edge/.test(w.message))).toBe(true);
    expect(c.couples).toHaveLength(1);
    expect(Math.abs(c.couples[0]!.ratio! - 1)).toBeLessThan(0.06);
  });

  it('a current that gives way just before the switch: its maximum is found by the locator, but it is not a peak', () => {
    const v = withBreakdown(true);
    const sig = prepareSweepSignals({ ...v, scanRateVPerS: 0.1 }, { window: 5, order: 2 }, () => ({ window: 15, order: 2 }));
    const raw = locatePeaksInSweep(sig, 0, { windows: null, minProminenceA: 1e-7, locatingWindow: 15 });
    const vertex = v.segments[0]!.end - 1;
    expect(raw.some((p) => vertex - p.index <= 8)).toBe(true);
    const a = analyzeVoltammogram(v);
    const c = a.cycles[0]!;
    expect(c.peaks.filter((p) => p.potentialV > 0.4)).toEqual([]);
    expect(c.windowEdges).toHaveLength(1);
    expect(c.warnings.find((w) => w.code === 'WINDOW_EDGE')?.message).toMatch(/the extremum there is not a peak/);
  });

  // A Nernstian couple's current decays towards the vertex (Cottrell-like tail): nothing to flag.
  it('a plain Nernstian couple whose vertex current is flat is not flagged', () => {
    for (const v of [couple(), simulatedVoltammogram({ k0CmPerS: Infinity, startV: 0.4, switchV: -0.4, doubleLayerFPerCm2: 2e-5 }, { noiseA: 1e-8, seed: 1 })]) {
      const c = analyzeVoltammogram(v).cycles[0]!;
      expect(c.windowEdges).toEqual([]);
      expect(c.warnings.filter((w) => w.code === 'WINDOW_EDGE')).toEqual([]);
    }
  });
});
