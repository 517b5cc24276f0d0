/**
 * Cycles after the first, measured as waves from rest (laterCycles.ts). For a reversible couple
 * whose sweep starts with the surface back at rest, every cycle's baseline-corrected wave is the
 * first cycle's (superposition through the semi-integral, Bard & Faulkner, Electrochemical
 * Methods, 2nd ed. (2001), §6.7, section number from memory), so cycles 2 and 3 must give cycle
 * 1's ipc, ipa, ipa/ipc and ΔEp, and Randles–Ševčík ip = 0.4463·nFAC(nFvD/RT)^½ (same book, §6.2).
 * Read as waves from rest on the earlier cycles' decay, they gave ipc 4 % low, ipa 12 % low
 * (ipa/ipc 0.91) and ΔEp 2 mV narrow (an independent semi-integral simulation, outside this
 * repository). Data from this project's simulator.
 */
import { describe, expect, it } from 'vitest';
import { FARADAY_C_PER_MOL as F, inverseThermalVoltagePerV } from '../constants';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import { analyzeVoltammogram } from './analyzeVoltammogram';
import { EARLIER_CYCLES_NOTE } from './laterCycles';
import { findSweepSegments } from '../sweeps/findSweepSegments';

const A = 0.0707;
const D = 1e-5;
const base = { k0CmPerS: Infinity, formalPotentialV: 0, startV: 0.3, switchV: -0.3, scanRateVPerS: 0.1, stepV: 0.001, areaCm2: A, concentrationOMolPerCm3: 1e-6, diffusionOCm2PerS: D, diffusionRCm2PerS: D, cycles: 3 };
const randlesSevcik = 0.4463 * F * A * 1e-6 * Math.sqrt(inverseThermalVoltagePerV(298.15) * 0.1 * D);

describe('later cycles of a reversible couple', () => {
  it.each([
    ['no charging', 0],
    ['Cd 20 µF/cm²', 20e-6],
  ])('%s: cycles 2 and 3 give cycle 1\'s ipc and ipa within 0.5 %, ipa/ipc within 0.005, ΔEp within 0.5 mV; ipc within 1.5 % of Randles–Ševčík', (_name, cd) => {
    const v = simulatedVoltammogram({ ...base, doubleLayerFPerCm2: cd });
    const a = analyzeVoltammogram(v);
    const first = a.cycles[0]!.couples[0]!;
    expect(Math.abs(first.ipcA! / randlesSevcik - 1)).toBeLessThan(0.015);
    for (const cycle of a.cycles.slice(1)) {
      const c = cycle.couples[0]!;
      expect(Math.abs(c.ipcA! / first.ipcA! - 1)).toBeLessThan(0.005);
      expect(Math.abs(c.ipaA! / first.ipaA! - 1)).toBeLessThan(0.005);
      expect(Math.abs(c.ratio! - first.ratio!)).toBeLessThan(0.005);
      expect(Math.abs(c.deltaEpV! - first.deltaEpV!)).toBeLessThan(0.0005);
      expect(Math.abs(c.ipcA! / randlesSevcik - 1)).toBeLessThan(0.015);
      expect(c.verdict.category).toBe('reversible');
      // Each baseline is drawn on the data: it says it carries the decay, and the peak's current
      // is the measured one.
      for (const p of cycle.peaks) {
        expect(p.baseline.description).toContain(EARLIER_CYCLES_NOTE);
        expect(Math.abs(p.rawCurrentA - (v.currentA[p.index] as number)) / p.heightA).toBeLessThan(0.01);
        expect(Math.abs(p.rawCurrentA - p.baselineCurrentA - (p.direction === 'anodic' ? p.heightA : -p.heightA)) / p.heightA).toBeLessThan(1e-9);
      }
    }
    expect(a.cycles[0]!.peaks.every((p) => !p.baseline.description.includes(EARLIER_CYCLES_NOTE))).toBe(true);
  });

  it('a record that starts inside its range (three sweeps a cycle) has its later cycles measured from the vertex where the surface is back at rest', () => {
    const v = simulatedVoltammogram(base);
    // A sweep at rest from 0.15 V up to the 0.3 V start is put in front (no faradaic current
    // there: 0.15 V is 5.8 RT/F from E°′): each cycle then runs 0.15 → 0.3 → −0.3 → 0.15 V.
    const dE = (v.potentialV[0] as number) - (v.potentialV[1] as number);
    const dt = (v.timeS![1] as number) - (v.timeS![0] as number);
    const lead = Math.round(0.15 / dE);
    const potentialV = Float64Array.from({ length: lead + v.potentialV.length }, (_, k) => (k < lead ? 0.15 + k * dE : (v.potentialV[k - lead] as number)));
    const currentA = Float64Array.from({ length: potentialV.length }, (_, k) => (k < lead ? 0 : (v.currentA[k - lead] as number)));
    const timeS = Float64Array.from({ length: potentialV.length }, (_, k) => k * dt);
    const split = findSweepSegments(potentialV);
    // Three whole cycles, and the last rise from 0.15 to 0.3 V as a fourth.
    expect(split.cycles.length).toBe(4);
    const a = analyzeVoltammogram({ ...v, potentialV, currentA, timeS, segments: split.segments, cycles: split.cycles });
    const first = a.cycles[0]!.couples[0]!;
    expect(Math.abs(first.ipcA! / randlesSevcik - 1)).toBeLessThan(0.015);
    for (const cycle of a.cycles.slice(1, 3)) {
      const c = cycle.couples[0]!;
      expect(Math.abs(c.ipcA! / first.ipcA! - 1)).toBeLessThan(0.005);
      expect(Math.abs(c.ipaA! / first.ipaA! - 1)).toBeLessThan(0.005);
      expect(Math.abs(c.deltaEpV! - first.deltaEpV!)).toBeLessThan(0.0005);
    }
  });

  it('a slow couple whose return wave still runs at the start gets a NOT_AT_REST warning on its later cycle', () => {
    const a = analyzeVoltammogram(simulatedVoltammogram({ ...base, k0CmPerS: 1e-4, startV: 0.25, switchV: -0.5, cycles: 2 }));
    expect(a.cycles[0]!.warnings.some((w) => w.code === 'NOT_AT_REST')).toBe(false);
    const w = a.cycles[1]!.warnings.find((x) => x.code === 'NOT_AT_REST');
    expect(w?.message).toMatch(/^this cycle starts before the earlier cycles' product is turned back \(\d+ % of it still at the surface/);
  });
});
