/**
 * Validation of the surface-confined (adsorbed) couple against published values.
 */
import { describe, expect, it } from 'vitest';
import { FARADAY_C_PER_MOL as F, GAS_CONSTANT_J_PER_MOL_K as R, inverseThermalVoltagePerV } from '../constants';
import { simulateCv } from './simulateCv';
import { cathodicFirstPeaks, widthAtHalfHeightV } from './simulationTestSupport';

const T = 298.15;
const f = inverseThermalVoltagePerV(T);
const gamma = 1e-10;
const area = 0.0707;
const base = { mechanism: 'surface' as const, coverageMolPerCm2: gamma, areaCm2: area, formalPotentialV: 0, startV: 0.4, switchV: -0.4, stepV: 0.0005 };

describe('simulateCv, surface mechanism', () => {
  // Bard & Faulkner 2nd ed. §14.3 (from memory); E. Laviron, J. Electroanal. Chem. 52, 355 (1974):
  // i_p = n²F²AΓv/(4RT); FWHM = 4 ln(1+√2)·RT/(nF) = 90.58/n mV at 25 °C (quoted as 90.6/n).
  it.each([1, 2])('Nernstian film, n = %i: ip = n²F²AΓv/4RT and FWHM = 90.58/n mV within 1 %', (n) => {
    const v = 0.1;
    const r = simulateCv({ ...base, electronCount: n, surfaceRatePerS: Infinity, scanRateVPerS: v });
    const { cathodic, anodic } = cathodicFirstPeaks(r);
    expect(Math.abs(-cathodic.currentA / ((n * n * F * F * area * gamma * v) / (4 * R * T)) - 1)).toBeLessThan(0.01);
    const half = (r.currentA.length - 1) / 2;
    const width = widthAtHalfHeightV(r.potentialV, r.currentA, cathodic, 0, half + 1);
    expect(Math.abs(width / ((4 * Math.log(1 + Math.SQRT2)) / (n * f)) - 1)).toBeLessThan(0.01);
    // ΔEp = 0 for the Nernstian film (same sources); the reported step-mean current lags ≤ 0.03 mV.
    expect(Math.abs(anodic.potentialV - cathodic.potentialV)).toBeLessThan(1e-4);
  });

  // Faraday's law: the charge under the cathodic wave is nFAΓ.
  it('charge under the first sweep is nFAΓ within 0.1 %', () => {
    const r = simulateCv({ ...base, surfaceRatePerS: Infinity, startV: 0.5, switchV: -0.5 });
    let q = 0;
    const half = (r.currentA.length - 1) / 2;
    for (let i = 1; i <= half; i++) q += ((r.currentA[i] as number) + (r.currentA[i - 1] as number)) / 2 * ((r.timeS[i] as number) - (r.timeS[i - 1] as number));
    expect(Math.abs(-q / (F * area * gamma) - 1)).toBeLessThan(1e-3);
  });

  // E. Laviron, J. Electroanal. Chem. 101, 19 (1979) (from memory): for ΔE_p > 200/n mV,
  // log k_s = α log(1−α) + (1−α) log α − log(RT/nFv) − α(1−α)nFΔE_p/(2.303RT); worked example
  // computed from it: α = 0.5, v = 10 V/s, k_s = 10.51 s⁻¹ → ΔE_p = 300 mV.
  it('large-ΔEp Laviron relation: ks = 10.51 s⁻¹ at 10 V/s gives ΔEp = 300 mV within 3 mV, symmetric about E°′', () => {
    const r = simulateCv({ ...base, surfaceRatePerS: 10.51, scanRateVPerS: 10, startV: 0.6, switchV: -0.6 });
    const { cathodic, anodic } = cathodicFirstPeaks(r);
    expect(Math.abs(anodic.potentialV - cathodic.potentialV - 0.3)).toBeLessThan(3e-3);
    expect(Math.abs(anodic.potentialV + cathodic.potentialV)).toBeLessThan(5e-4);
  });

  it('peak current grows linearly with scan rate (log–log slope 1.000 ± 0.002) while the film is Nernstian', () => {
    const ip = (v: number) => -cathodicFirstPeaks(simulateCv({ ...base, surfaceRatePerS: Infinity, scanRateVPerS: v })).cathodic.currentA;
    expect(Math.abs(Math.log10(ip(1) / ip(0.01)) / 2 - 1)).toBeLessThan(0.002);
  });
});

describe('simulateCv, repeated cycles', () => {
  it('a Nernstian film returns to its starting state: cycle 2 repeats cycle 1 (1e-9 relative)', () => {
    const r = simulateCv({ ...base, surfaceRatePerS: Infinity, cycles: 2 });
    const perCycle = (r.currentA.length - 1) / 2;
    let worst = 0;
    for (let i = 1; i <= perCycle; i++) worst = Math.max(worst, Math.abs((r.currentA[i] as number) - (r.currentA[i + perCycle] as number)));
    expect(worst / Math.abs(cathodicFirstPeaks(r).cathodic.currentA)).toBeLessThan(1e-9);
  });

  // Common practice, no source: in solution the second forward peak is lower, because the
  // diffusion layer left by the first cycle is not replenished.
  it('a dissolved couple gives a lower forward peak on cycle 2 than on cycle 1', () => {
    const r = simulateCv({ k0CmPerS: Infinity, startV: 0.4, switchV: -0.4, cycles: 2 });
    const perCycle = (r.currentA.length - 1) / 2;
    let first = 0;
    let second = 0;
    for (let i = 0; i <= perCycle / 2; i++) {
      first = Math.min(first, r.currentA[i] as number);
      second = Math.min(second, r.currentA[i + perCycle] as number);
    }
    expect(-second).toBeLessThan(-first * 0.95);
    expect(-second).toBeGreaterThan(-first * 0.5);
  });
});
