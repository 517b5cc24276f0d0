/**
 * Validation of the E mechanism in the reversible (Nernstian) limit against published values.
 */
import { describe, expect, it } from 'vitest';
import { FARADAY_C_PER_MOL as F, inverseThermalVoltagePerV } from '../constants';
import { simulateCv } from './simulateCv';
import { cathodicFirstPeaks } from './simulationTestSupport';

const f = inverseThermalVoltagePerV(298.15);
/** Maximum of π^½χ for a Nernstian wave (Simpson's rule in z, golden-section search in u). */
function nernstPeakFunction(): { value: number; atU: number } {
  const chi = (u: number): number => {
    const n = 4000;
    const zMax = Math.sqrt(u + 80);
    const h = zMax / n;
    let sum = 0;
    for (let k = 0; k <= n; k++) {
      const w = u - (k * h) ** 2;
      const g = 1 / (4 * Math.cosh(w / 2) ** 2);
      sum += (k === 0 || k === n ? 1 : k % 2 ? 4 : 2) * g;
    }
    return ((2 / Math.sqrt(Math.PI)) * (sum * h)) / 3;
  };
  let a = 0.5;
  let b = 1.7;
  const r = (Math.sqrt(5) - 1) / 2;
  for (let k = 0; k < 60; k++) {
    const c = b - r * (b - a);
    const d = a + r * (b - a);
    if (chi(c) > chi(d)) b = d;
    else a = c;
  }
  return { value: chi((a + b) / 2), atU: (a + b) / 2 };
}

const base = { k0CmPerS: Infinity, formalPotentialV: 0, startV: 0.4, switchV: -0.5, areaCm2: 0.0707, concentrationOMolPerCm3: 1e-6, diffusionOCm2PerS: 7.6e-6, diffusionRCm2PerS: 7.6e-6 };

describe('simulateCv, E mechanism, reversible limit', () => {
  // Nicholson & Shain, Anal. Chem. 36, 706 (1964), Table I; Bard & Faulkner, Electrochemical
  // Methods, 2nd ed. (2001), §6.2 (eq. 6.2.18–6.2.19, numbering from memory): maximum of the
  // Nernstian current function π^½χ = 0.4463.
  it.each([
    [1, 0.1],
    [1, 1],
    [2, 0.1],
  ])('peak current is 0.4463·nFAC(nFvD/RT)^½ within 0.5 % (n = %i, v = %f V/s)', (n, v) => {
    const r = simulateCv({ ...base, electronCount: n, scanRateVPerS: v });
    const expected = 0.4463 * n * F * 0.0707 * 1e-6 * Math.sqrt(n * f * v * 7.6e-6);
    const { cathodic } = cathodicFirstPeaks(r);
    expect(Math.abs(-cathodic.currentA / expected - 1)).toBeLessThan(0.005);
  });

  // Bard & Faulkner 2nd ed. §6.2 (from memory): E_p = E_1/2 − 1.109 RT/(nF) for a reduction,
  // E_1/2 = E°′ + (RT/2nF)·ln(D_R/D_O).
  it('cathodic peak sits 1.109 RT/F below E½ (±0.2 mV), and E½ moves with ln(D_R/D_O)', () => {
    const equal = cathodicFirstPeaks(simulateCv(base)).cathodic.potentialV;
    expect(Math.abs(equal + 1.109 / f)).toBeLessThan(2e-4);
    const unequal = cathodicFirstPeaks(simulateCv({ ...base, diffusionRCm2PerS: 7.6e-6 / 4 })).cathodic.potentialV;
    expect(Math.abs(unequal - (equal + Math.log(1 / 4) / (2 * f)))).toBeLessThan(2e-4);
  });

  // Nicholson, Anal. Chem. 37, 1351 (1965), as tabulated in Bard & Faulkner 2nd ed. §6.5
  // (Table 6.5.1, number from memory): n·ΔE_p against the switching potential. The table's first
  // column is read as n(E_pc − E_λ), the distance past the forward peak; read as E_1/2 − E_λ the
  // 71.5 mV row would be 1.5 mV off (checked with this simulator at 0.25 mV resolution).
  it.each([
    [71.5, 60.5],
    [121.5, 59.2],
    [171.5, 58.3],
    [271.5, 57.8],
  ])('ΔEp with E_λ %f mV past the cathodic peak is %f mV within 1 mV', (pastPeakMV, deltaMV) => {
    const peakV = -1.109 / f;
    const r = simulateCv({ ...base, switchV: peakV - pastPeakMV / 1000, stepV: 0.0005 });
    const { cathodic, anodic } = cathodicFirstPeaks(r);
    expect(Math.abs((anodic.potentialV - cathodic.potentialV) * 1000 - deltaMV)).toBeLessThan(1);
  });

  // Nicholson & Shain, Anal. Chem. 36, 706 (1964), Table I: max π^½χ = 0.4463 at −28.5/n mV.
  // More digits from the same exact current function, computed here independently of the
  // simulator: π^½χ is the semi-derivative of the Nernst surface fraction 1/(1 + e^u), so
  // π^½χ(u) = (2/√π)∫₀^∞ s′(u − z²) dz with s′(w) = 1/(4·cosh²(w/2)); its maximum is
  // 0.446295 at u = 1.1090 (also 0.446295 with scipy's adaptive quadrature in a separate script).
  it('exact reversible peak function: the quadrature gives 0.446295, which rounds to Table I', () => {
    expect(nernstPeakFunction().value).toBeCloseTo(0.446295, 6);
    expect(Number(nernstPeakFunction().value.toFixed(4))).toBe(0.4463);
  });

  it.each([0.1, 5])('default numerics: reversible peak current within 0.005 %% of 0.446295·nFAC(nFvD/RT)^½ (v = %f V/s)', (rate) => {
    const r = simulateCv({ ...base, diffusionRCm2PerS: 7.6e-6, scanRateVPerS: rate, startV: 0.5, switchV: -0.5 });
    const exact = nernstPeakFunction().value * F * 0.0707 * 1e-6 * Math.sqrt(f * rate * 7.6e-6);
    const { cathodic } = cathodicFirstPeaks(r);
    expect(Math.abs(-cathodic.currentA / exact - 1)).toBeLessThan(5e-5);
  });

  // Same sources: the current function and the peak offset scale with RT, so at 37 °C
  // i_p = 0.4463·nFAC(nFvD/RT)^½ and E_p − E½ = −1.109 RT/nF with T = 310.15 K.
  it('at 37 °C the peak current and position follow RT (0.5 % and 0.2 mV)', () => {
    const t = 310.15;
    const ft = inverseThermalVoltagePerV(t);
    const { cathodic } = cathodicFirstPeaks(simulateCv({ ...base, temperatureK: t }));
    expect(Math.abs(-cathodic.currentA / (0.4463 * F * 0.0707 * 1e-6 * Math.sqrt(ft * 0.1 * 7.6e-6)) - 1)).toBeLessThan(0.005);
    expect(Math.abs(cathodic.potentialV + 1.109 / ft)).toBeLessThan(2e-4);
  });

  // Bard & Faulkner 2nd ed. §6.2 (Randles–Ševčík): i_p ∝ v^½, slope of log|i_p| vs log v = 0.5.
  it('log|ip| against log v has slope 0.500 ± 0.002 over two decades', () => {
    const rates = [0.01, 0.1, 1];
    const logs = rates.map((v) => Math.log10(-cathodicFirstPeaks(simulateCv({ ...base, scanRateVPerS: v })).cathodic.currentA));
    const slope = ((logs[2] as number) - (logs[0] as number)) / 2;
    expect(Math.abs(slope - 0.5)).toBeLessThan(0.002);
  });

  it('starting with R instead of O mirrors the voltammogram (anodic peak at +1.109 RT/F)', () => {
    const r = simulateCv({ ...base, concentrationOMolPerCm3: 0, concentrationRMolPerCm3: 1e-6, startV: -0.4, switchV: 0.5 });
    const o = simulateCv(base);
    let maxA = 0;
    let minO = 0;
    for (let i = 0; i < r.currentA.length; i++) {
      maxA = Math.max(maxA, r.currentA[i] as number);
      minO = Math.min(minO, o.currentA[i] as number);
    }
    expect(maxA / -minO).toBeCloseTo(1, 6);
  });

  // Nernst equation (Bard & Faulkner 2nd ed. §2.1): with both forms present, the rest potential
  // is E°′ + (RT/nF) ln(C_O/C_R); a sweep started there begins without a faradaic transient.
  it('with both forms present a sweep started at the Nernst rest potential starts at zero current', () => {
    const restV = Math.log(0.25e-6 / 1e-6) / f;
    const mixed = { ...base, k0CmPerS: 0.1, concentrationOMolPerCm3: 0.25e-6, concentrationRMolPerCm3: 1e-6, startV: restV, switchV: restV + 0.05, stepV: 1e-5 };
    const r = simulateCv(mixed, { substepsPerPoint: 1 });
    const offRest = simulateCv({ ...mixed, startV: restV - 0.05, switchV: restV }, { substepsPerPoint: 1 });
    // One 10 µV step from rest gives a tiny current; 50 mV off rest gives a large initial transient.
    expect(Math.abs(r.currentA[1] as number)).toBeLessThan(1e-3 * Math.abs(offRest.currentA[1] as number));
  });
});
