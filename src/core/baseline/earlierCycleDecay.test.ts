/**
 * The decay the earlier cycles drive in a later one, against the superposition it rests on.
 * For a reversible couple the surface concentrations are a function of the potential alone, and
 * the semi-integral of the current is linear in the surface concentration (Bard & Faulkner,
 * Electrochemical Methods, 2nd ed. (2001), §6.7, section number from memory): a later cycle that
 * starts with the surface back at rest is the first cycle's wave plus the decay of the earlier
 * ones. So the decay is the later cycle's current less the first cycle's, shifted to its start.
 * Both come from this project's simulator, itself tied to Randles–Ševčík (0.4463).
 */
import { describe, expect, it } from 'vitest';
import { seededGaussian, simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import { simulateCv } from '../simulation';
import { prepareSweepSignals } from '../peaks/sweepSignals';
import type { Voltammogram } from '../types';
import { findSweepSegments } from '../sweeps/findSweepSegments';
import { earlierCycleDecay } from './earlierCycleDecay';

const A = 0.0707;
const reversible = { k0CmPerS: Infinity, formalPotentialV: 0, startV: 0.3, switchV: -0.3, scanRateVPerS: 0.1, stepV: 0.001, areaCm2: A, concentrationOMolPerCm3: 1e-6, diffusionOCm2PerS: 1e-5, diffusionRCm2PerS: 1e-5 };

const signals = (v: Voltammogram) => prepareSweepSignals({ potentialV: v.potentialV, currentA: v.currentA, timeS: v.timeS, scanRateVPerS: 0.1, segments: v.segments }, 'off', () => ({ window: 5, order: 2 }));

describe('earlierCycleDecay', () => {
  it('is the later cycle less the first cycle shifted to its start, within 0.3 % of ip at every point (reversible, cycles 2 and 3)', () => {
    const three = simulatedVoltammogram({ ...reversible, cycles: 3 });
    const one = simulateCv({ ...reversible, cycles: 1 });
    const sig = signals(three);
    const ip = Math.max(...Array.from(one.currentA, (y) => -y));
    for (const cycle of three.cycles.slice(1)) {
      const d = earlierCycleDecay(sig, cycle);
      expect(d?.kind).toBe('decay');
      if (d?.kind !== 'decay') return;
      expect(d.startIndex).toBe(cycle.start);
      let worst = 0;
      for (let j = 1; j < d.currentA.length; j++) {
        const truth = (three.currentA[d.startIndex + j] as number) - (one.currentA[j] as number);
        worst = Math.max(worst, Math.abs((d.currentA[j] as number) - truth));
      }
      expect(worst / ip).toBeLessThan(0.003);
      // The decay is anodic (the product is turned back at the start) and falls.
      expect(d.atTurnA).toBeGreaterThan(0);
      expect(d.currentA[d.currentA.length - 1]!).toBeLessThan(d.atTurnA);
    }
  });

  it('holds on a record sampled unevenly in time (the general weights), within 0.5 % of ip', () => {
    const three = simulatedVoltammogram({ ...reversible, cycles: 3, stepV: 0.0005 });
    const one = simulateCv({ ...reversible, cycles: 1, stepV: 0.0005 });
    // Drop about a third of the points at random (never a vertex): steps of one to several intervals.
    const g = seededGaussian(5);
    const vertex = new Set(three.segments.flatMap((s) => [s.start, s.end - 1]));
    const keep = Array.from(three.potentialV.keys()).filter((k) => vertex.has(k) || g() > -0.43);
    const pick = (a: Float64Array) => Float64Array.from(keep, (k) => a[k] as number);
    const uneven: Voltammogram = { ...three, potentialV: pick(three.potentialV), currentA: pick(three.currentA), timeS: pick(three.timeS!) };
    const split = findSweepSegments(uneven.potentialV);
    const sig = signals({ ...uneven, segments: split.segments, cycles: split.cycles });
    const ip = Math.max(...Array.from(one.currentA, (y) => -y));
    const cycle = split.cycles[1]!;
    const d = earlierCycleDecay(sig, cycle);
    expect(d?.kind).toBe('decay');
    if (d?.kind !== 'decay') return;
    let worst = 0;
    for (let j = 1; j < d.currentA.length; j++) {
      const k = keep[d.startIndex + j]!;
      const truth = (three.currentA[k] as number) - (one.currentA[k - keep[d.startIndex]!] as number);
      worst = Math.max(worst, Math.abs((d.currentA[j] as number) - truth));
    }
    expect(worst / ip).toBeLessThan(0.005);
  });

  // A capacitor's current is A·Cd·v, with the sweep's sign (Bard & Faulkner 2nd ed. §1.2.2, from memory).
  it('finds the charging current A·Cd·v within 3 %, and the decay under it as without it', () => {
    const cd = 20e-6;
    const sig = signals(simulatedVoltammogram({ ...reversible, cycles: 2, doubleLayerFPerCm2: cd }));
    const bare = signals(simulatedVoltammogram({ ...reversible, cycles: 2 }));
    const cycle = { index: 2, start: sig.segments[2]!.start, end: sig.potentialV.length };
    const d = earlierCycleDecay(sig, cycle);
    const plain = earlierCycleDecay(bare, cycle);
    expect(d?.kind).toBe('decay');
    expect(plain?.kind).toBe('decay');
    if (d?.kind !== 'decay' || plain?.kind !== 'decay') return;
    expect(Math.abs(d.chargingA / (A * cd * 0.1) - 1)).toBeLessThan(0.03);
    expect(plain.chargingA).toBeLessThan(1e-3 * A * cd * 0.1 + 1e-12);
    const ip = 0.4463 * 96485.33212 * A * 1e-6 * Math.sqrt((96485.33212 / (8.314462618 * 298.15)) * 0.1 * 1e-5);
    let worst = 0;
    for (let j = 0; j < d.currentA.length; j++) worst = Math.max(worst, Math.abs((d.currentA[j] as number) - (plain.currentA[j] as number)));
    expect(worst / ip).toBeLessThan(0.005);
  });

  it('gives nothing for the first cycle, nor for a film, whose product is all turned back by the start (Laviron, Nernstian film)', () => {
    const film = simulatedVoltammogram({ mechanism: 'surface', surfaceRatePerS: Infinity, coverageMolPerCm2: 1e-10, formalPotentialV: 0, startV: 0.3, switchV: -0.3, scanRateVPerS: 1, stepV: 0.001, areaCm2: A, cycles: 2 });
    const sig = signals(film);
    expect(earlierCycleDecay(sig, film.cycles[0]!)).toBeNull();
    expect(earlierCycleDecay(sig, film.cycles[1]!)).toBeNull();
  });

  it('says when a slow couple is not back at rest at the start of the next cycle', () => {
    // k° = 1e-4 cm/s at 0.1 V/s: the return wave still runs at the start, 0.25 V past E°′
    // (14 % of the product left); from 0.35 V it is back below 2 %.
    const slow = simulatedVoltammogram({ ...reversible, k0CmPerS: 1e-4, startV: 0.25, switchV: -0.5, cycles: 2 });
    const d = earlierCycleDecay(signals(slow), slow.cycles[1]!);
    expect(d?.kind).toBe('not-at-rest');
    if (d?.kind === 'not-at-rest') expect(d.share).toBeGreaterThan(0.1);
    const later = simulatedVoltammogram({ ...reversible, k0CmPerS: 1e-4, startV: 0.35, switchV: -0.5, cycles: 2 });
    expect(earlierCycleDecay(signals(later), later.cycles[1]!)?.kind).toBe('decay');
  });
});
