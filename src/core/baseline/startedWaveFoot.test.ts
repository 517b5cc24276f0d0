/**
 * A sweep that starts on the wave's own foot: the started reversible wave (Nicholson & Shain's
 * eq. 24 solved from the start) against an independent quadrature of the same equation, then
 * whole voltammograms of this project's simulator (planar diffusion, a double layer of
 * 20 µF/cm²) started 150-100 mV before E½ against Randles–Ševčík and the reversible couple's
 * return/forward ratio and ΔEp.
 */
import { describe, expect, it } from 'vitest';
import { FARADAY_C_PER_MOL as F, inverseThermalVoltagePerV } from '../constants';
import { analyzeVoltammogram } from '../analysis/analyzeVoltammogram';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import { startedReversibleWave } from './reversibleWaveShape';

const A = 0.0707;
const C = 1e-6;
const D = 1e-5;
const f = inverseThermalVoltagePerV(298.15);
const randlesSevcikA = 0.4463 * F * A * C * Math.sqrt(f * 0.1 * D);

function analyse(before: number, oxidation: boolean, extra: object = {}) {
  const e0 = 0.2;
  const cell = oxidation
    ? { concentrationOMolPerCm3: 0, concentrationRMolPerCm3: C, startV: e0 - before, switchV: e0 + 0.3 }
    : { concentrationOMolPerCm3: C, concentrationRMolPerCm3: 0, startV: e0 + before, switchV: e0 - 0.3 };
  const v = simulatedVoltammogram({ k0CmPerS: Infinity, formalPotentialV: e0, areaCm2: A, diffusionOCm2PerS: D, diffusionRCm2PerS: D, scanRateVPerS: 0.1, doubleLayerFPerCm2: 2e-5, ...cell, ...extra });
  const cycle = analyzeVoltammogram(v).cycles[0]!;
  return { couple: cycle.couples[0]!, peaks: cycle.peaks, warnings: cycle.warnings.filter((w) => w.code === 'START_ON_FOOT') };
}

describe('startedReversibleWave', () => {
  // Nicholson & Shain, Anal. Chem. 36 (1964) 706, eq. 24, ∫₀^x χ(z)/√(x − z) dz = F(x) with
  // F = 1/(1 + e^(ξᵢ − x)) from the start (x = σt): Abel's inversion gives
  // χ(x) = (1/π)[F(0)/√x + ∫₀^x F′(u)/√(x − u) du]; evaluated here by Simpson's rule with u = x − w².
  it('agrees with the Abel inversion of eq. 24 for a start 120 mV before E½ within 1 %', () => {
    const startXi = 0.12 * f;
    const wave = startedReversibleWave(startXi);
    const big = (x: number) => 1 / (1 + Math.exp(startXi - x));
    const slope = (u: number) => big(u) * (1 - big(u));
    for (const x of [0.5, 1, 2, 4, 6]) {
      const m = 400;
      const h = Math.sqrt(x) / m;
      let sum = 0;
      for (let k = 0; k <= m; k++) sum += (k === 0 || k === m ? 1 : k % 2 ? 4 : 2) * 2 * slope(x - (k * h) ** 2);
      const chi = (big(0) / Math.sqrt(x) + (sum * h) / 3) / Math.PI;
      const ours = (wave.at(startXi - x) * wave.peakCurrentFunction) / Math.sqrt(Math.PI);
      expect(Math.abs(ours / chi - 1)).toBeLessThan(0.01);
    }
  });

  // Nicholson & Shain 1964, Table I: √π·χ = 0.4463 at the peak, ξ = −1.109, for a start far before the wave.
  it('tends to the far-started wave: √π·χp = 0.4463 at ξ = −1.109', () => {
    const far = startedReversibleWave(0.3 * f);
    expect(far.peakCurrentFunction).toBeCloseTo(0.4463, 3);
    expect(far.peakXi).toBeCloseTo(-1.109, 1);
  });
});

describe('a sweep started on the wave’s foot', () => {
  // Randles–Ševčík 0.4463·nFAC(nFvD/RT)^½ (Nicholson & Shain 1964, Table I; Bard & Faulkner 2nd ed.
  // (2001) eq. 6.2.19); a reversible couple's return/forward ratio 1 from the extended decay
  // (Nicholson, Anal. Chem. 38 (1966) 1406); ΔEp 57.0-58.3 mV for a switch 170-∞ mV past E½
  // (Bard & Faulkner 2nd ed. Table 6.2.1, from memory). A plain line read ipc 20 % low and ΔEp
  // 50 mV from 120 mV, 31 % and 46 mV from 100 mV.
  it.each([
    [0.15, false], [0.12, false], [0.1, false], [0.12, true], [0.1, true],
  ])('start %f V before E½ (oxidation first: %s): forward ip within 1 % of Randles–Ševčík, ratio within 2 % of 1, ΔEp 56.5-58.5 mV', (before, oxidation) => {
    const { couple, peaks, warnings } = analyse(before, oxidation);
    const forward = oxidation ? couple.ipaA! : couple.ipcA!;
    expect(Math.abs(forward / randlesSevcikA - 1)).toBeLessThan(0.01);
    expect(Math.abs(couple.ratio! - 1)).toBeLessThan(0.02);
    expect(couple.deltaEpV! * 1000).toBeGreaterThan(56.5);
    expect(couple.deltaEpV! * 1000).toBeLessThan(58.5);
    expect(peaks.some((p) => p.baseline.description.includes('for a sweep started'))).toBe(true);
    expect(warnings.length).toBe(1);
    expect(warnings[0]!.message).toContain(`${Math.round(before * 1000)} mV before the couple's E½`);
    expect(warnings[0]!.message).not.toContain('UNRELIABLE');
  });

  // The far-started foot is below 0.3 % of the peak 200 mV before E½ (e^(−ξ)/0.4463, Nicholson & Shain eq. 24).
  it('says nothing of a start 200 mV before E½', () => {
    expect(analyse(0.2, false).warnings).toEqual([]);
  });

  // A slow couple (k° = 0.003 cm/s, ψ ≈ 0.3) started 100 mV before E°′ fits no reversible shape: the warning is loud.
  it('calls a slow wave started on its foot unreliable', () => {
    const { warnings } = analyse(0.1, false, { k0CmPerS: 0.003, alpha: 0.5 });
    expect(warnings.length).toBe(1);
    expect(warnings[0]!.message).toContain('UNRELIABLE');
  });
});
