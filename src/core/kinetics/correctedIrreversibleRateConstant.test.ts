/**
 * correctedIrreversibleRateConstant against this project's simulator (validated against the 0.4958
 * current function and Nicholson's ΔEp table) with known k°, αc and E°′.
 * Source of the peak equation: J. Wang, Analytical Electrochemistry 2nd ed. (2000) eq. 2-5; Bard &
 * Faulkner 2nd ed. (2001) §6.3. Its bare two-peak solution is biased by the return peak (measured
 * here: +5 % at αc = 0.5, +10 % for an oxidation first at αc = 0.3); the corrected one must be
 * within 2 % (1 mV of peak location on a 2 mV grid with noise is 1–2 % of k°).
 */
import { describe, expect, it } from 'vitest';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import { analyzeVoltammogram } from '../analysis/analyzeVoltammogram';
import { correctedIrreversibleRateConstant } from './correctedIrreversibleRateConstant';

function measured(alpha: number, oxidationFirst: boolean, k0: number, v: number) {
  const window = oxidationFirst
    ? { startV: -0.9, switchV: 0.9, concentrationOMolPerCm3: 0, concentrationRMolPerCm3: 1e-6 }
    : { startV: 0.9, switchV: -0.9 };
  const vg = simulatedVoltammogram({ k0CmPerS: k0, alpha, scanRateVPerS: v, stepV: 0.002, formalPotentialV: 0, ...window }, { noiseA: 2e-9, seed: 3 });
  const c = analyzeVoltammogram(vg).cycles[0]!.couples[0]!;
  return { epaV: c.epaV!, epcV: c.epcV!, switchPotentialV: c.switchPotentialV ?? null, forwardDirection: c.forwardDirection, scanRateVPerS: v, diffusionOxCm2PerS: 1e-5 };
}

describe('correctedIrreversibleRateConstant', () => {
  it.each([
    [0.5, false, 0.05],
    [0.5, false, 1],
    [0.3, true, 0.05],
    [0.3, true, 1],
  ])('αc = %f, oxidation first %s, %f V/s: k° = 1e-4 cm/s within 2 %, E°′ = 0 within 1.5 mV, better than the bare two-peak solution', (alpha, ox, v) => {
    const r = correctedIrreversibleRateConstant(measured(alpha, ox, 1e-4, v), { alpha });
    expect(Math.abs(r.k0CmPerS / 1e-4 - 1)).toBeLessThan(0.02);
    expect(Math.abs(r.formalPotentialV)).toBeLessThan(0.0015);
    expect(Math.abs(r.twoPeakK0CmPerS / 1e-4 - 1)).toBeGreaterThan(0.015);
    // The forward peak obeys eq. 2-5 (a uniform solution); the return peak departs from it.
    const fwd = ox ? r.departureV.anodic : r.departureV.cathodic;
    const ret = ox ? r.departureV.cathodic : r.departureV.anodic;
    expect(Math.abs(fwd)).toBeLessThan(0.001);
    expect(Math.abs(ret)).toBeGreaterThan(0.002);
  });

  // nₐ = 2 (a one-step two-electron couple, simulated with n = 2): αnₐ = 1, still within 2 %.
  it('two-electron step (nₐ = 2, αc = 0.5): k° within 2 %', () => {
    const vg = simulatedVoltammogram({ k0CmPerS: 1e-4, alpha: 0.5, electronCount: 2, scanRateVPerS: 0.1, stepV: 0.001, startV: 0.6, switchV: -0.6 }, { noiseA: 2e-9, seed: 5 });
    const c = analyzeVoltammogram(vg, { electronCount: 2 }).cycles[0]!.couples[0]!;
    const r = correctedIrreversibleRateConstant({ epaV: c.epaV!, epcV: c.epcV!, switchPotentialV: c.switchPotentialV ?? null, forwardDirection: 'cathodic', scanRateVPerS: 0.1, diffusionOxCm2PerS: 1e-5 }, { alpha: 0.5, transferElectronCount: 2 });
    expect(Math.abs(r.k0CmPerS / 1e-4 - 1)).toBeLessThan(0.02);
  });

  it('refuses α outside 0.05–0.95', () => {
    expect(() => correctedIrreversibleRateConstant({ ...measured(0.5, false, 1e-4, 0.1) }, { alpha: 0.99 })).toThrow(/αc/);
  });
});
