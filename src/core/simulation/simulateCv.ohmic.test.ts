/**
 * Double-layer charging and uncompensated resistance.
 */
import { describe, expect, it } from 'vitest';
import { simulateCv } from './simulateCv';
import { cathodicFirstPeaks } from './simulationTestSupport';

const area = 0.0707;
const cdl = 20e-6;
const v = 0.1;
const blank = { concentrationOMolPerCm3: 0, concentrationRMolPerCm3: 0, areaCm2: area, doubleLayerFPerCm2: cdl, scanRateVPerS: v };

describe('simulateCv, charging current and ohmic drop', () => {
  // Bard & Faulkner 2nd ed. §1.2 (from memory), computed for A = 0.0707 cm², Cdl = 20 µF/cm², v = 0.1 V/s:
  // i_c = A·C_d·v = 0.1414 µA, forward-to-reverse gap 0.2828 µA.
  it('a blank electrode without Ru draws ±A·Cdl·v = 0.1414 µA', () => {
    const r = simulateCv(blank);
    const quarter = Math.round((r.currentA.length - 1) / 4);
    expect((r.currentA[quarter] as number) * 1e6).toBeCloseTo(-0.1414, 4);
    expect(((r.currentA[3 * quarter] as number) - (r.currentA[quarter] as number)) * 1e6).toBeCloseTo(0.2828, 4);
  });

  // Bard & Faulkner 2nd ed. §1.2 (linear sweep applied to series R_u–C_d, from memory):
  // i(t) = v·C_d·[1 − exp(−t/(R_u C_d))] for a sweep starting at t = 0.
  it('with Ru the charging current rises as vC(1 − e^(−t/RuC)) within 0.5 %', () => {
    const ru = 1e4;
    const c = area * cdl;
    const r = simulateCv({ ...blank, uncompensatedOhm: ru, switchV: 0.3 - 0.2, stepV: 0.0002 }, { substepsPerPoint: 20 });
    const tau = ru * c;
    for (const t of [tau, 2 * tau, 5 * tau]) {
      const k = Math.round(t / (r.timeS[1] as number));
      const expected = -v * c * (1 - Math.exp(-(r.timeS[k] as number) / tau));
      expect(Math.abs((r.currentA[k] as number) / expected - 1)).toBeLessThan(0.005);
    }
  });

  // Bard & Faulkner 2nd ed. §1.2.4, eq. 1.2.15 (numbering from memory): a ramp −v from rest on
  // R_u in series with C gives i = −vC(1 − e^(−t/τ)), τ = R_u·C. The switch adds a ramp +2v from
  // t_s (superposition, the circuit is linear): i = vC(1 − 2e^(−(t−t_s)/τ) + e^(−t/τ)), which
  // rises monotonically to +vC and never overshoots it. Case of our own: A = 0.0707 cm²,
  // C_dl = 40 µF/cm², R_u = 80 Ω (τ = 0.226 ms), 2 V/s, 1 mV points (Δt = 0.5 ms > τ).
  it('a blank with Ru follows the analytic RC response through the switch within 0.1 % of vC (no overshoot)', () => {
    const c = area * 40e-6;
    const ru = 80;
    const rate = 2;
    const tau = ru * c;
    const r = simulateCv({ ...blank, doubleLayerFPerCm2: 40e-6, uncompensatedOhm: ru, scanRateVPerS: rate, startV: 0.3, switchV: -0.5 });
    const h = (r.currentA.length - 1) / 2;
    const steady = rate * c;
    let worst = 0;
    let highest = -Infinity;
    for (let k = 1; k < r.currentA.length; k++) {
      const t = r.timeS[k] as number;
      const ts = r.timeS[h] as number;
      const expected = k <= h ? -steady * (1 - Math.exp(-t / tau)) : steady * (1 - 2 * Math.exp(-(t - ts) / tau) + Math.exp(-t / tau));
      worst = Math.max(worst, Math.abs((r.currentA[k] as number) - expected));
      if (k > h) highest = Math.max(highest, r.currentA[k] as number);
    }
    expect(worst / steady).toBeLessThan(1e-3);
    expect(highest).toBeLessThanOrEqual(steady * (1 + 1e-3));
    // 1 ms after the switch: vC(1 − 2e^(−1/0.2262)) = 5.520 µA.
    expect((r.currentA[h + 2] as number) * 1e6).toBeCloseTo(5.520, 2);
  });

  it.each(['E', 'EC', 'surface'] as const)('%s: applied potential = interfacial potential + i·Ru at every point (to 1 nV)', (mechanism) => {
    const ru = 500;
    const r = simulateCv({ mechanism, k0CmPerS: 0.05, surfaceRatePerS: 20, coverageMolPerCm2: 1e-9, doubleLayerFPerCm2: cdl, uncompensatedOhm: ru, cycles: 2 });
    for (let k = 1; k < r.currentA.length; k++) {
      expect(Math.abs((r.potentialV[k] as number) - (r.interfacialPotentialV[k] as number) - (r.currentA[k] as number) * ru)).toBeLessThan(1e-9);
      expect(r.currentA[k]).toBeCloseTo((r.faradaicCurrentA[k] as number) + (r.chargingCurrentA[k] as number), 15);
    }
  });

  // Common practice, no source: uncompensated resistance widens ΔEp and lowers the peaks.
  it('ΔEp widens and |ip| falls as Ru grows', () => {
    const results = [0, 200, 1000].map((ru) => cathodicFirstPeaks(simulateCv({ k0CmPerS: Infinity, concentrationOMolPerCm3: 5e-6, uncompensatedOhm: ru })));
    const widths = results.map((p) => p.anodic.potentialV - p.cathodic.potentialV);
    const heights = results.map((p) => -p.cathodic.currentA);
    expect(widths[1]).toBeGreaterThan((widths[0] as number) + 1e-3);
    expect(widths[2]).toBeGreaterThan((widths[1] as number) + 1e-3);
    expect(heights[2]).toBeLessThan(heights[1] as number);
    expect(heights[1]).toBeLessThan(heights[0] as number);
  });
});
