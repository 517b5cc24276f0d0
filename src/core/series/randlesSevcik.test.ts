import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { fitLine } from '../regression';
import { randlesSevcikDiffusion, randlesSevcikPeakCurrent } from './randlesSevcik';

// Worked example (computed from the forms cited below): 3 mm disk, 1 mM, D = 7.6e-6 cm²/s, 0.1 V/s, 25 °C.
const cell = { electronCount: 1, areaCm2: 0.0707, concentrationMolPerCm3: 1e-6 };
const input = { ...cell, diffusionCm2PerS: 7.6e-6, scanRateVPerS: 0.1 };

describe('randlesSevcikPeakCurrent', () => {
  // Bard & Faulkner, Electrochemical Methods 2nd ed. (2001) §6.2; IUPAC PAC 92, 641 (2020): 16.558 µA.
  it('full reversible form gives 16.558 µA', () => {
    expect(randlesSevcikPeakCurrent(input) * 1e6).toBeCloseTo(16.558, 2);
    expect(Math.abs(randlesSevcikPeakCurrent(input) / 16.558e-6 - 1)).toBeLessThan(1e-3);
  });
  // Wang, Analytical Electrochemistry 2nd ed. (2000) eq. 2-1 (2.69e5 form): 16.580 µA, ratio 1.0013.
  it('25 °C reversible form gives 16.580 µA, 0.13 % above the full form', () => {
    const ip25 = randlesSevcikPeakCurrent(input, { constant: '25C' });
    expect(Math.abs(ip25 / 16.58e-6 - 1)).toBeLessThan(1e-3);
    expect(ip25 / randlesSevcikPeakCurrent(input)).toBeCloseTo(1.0013, 4);
  });
  // Bard & Faulkner 2nd ed. §6.3 (0.4958, from memory); IUPAC PAC 2020 (k′ = 0.496):
  // α = 0.5, nₐ = 1 → 13.007 µA (full), 13.031 µA (2.99e5 form).
  it('irreversible form gives 13.007 µA (full) and 13.031 µA (25 °C)', () => {
    const full = randlesSevcikPeakCurrent(input, { form: 'irreversible', alpha: 0.5 });
    const printed = randlesSevcikPeakCurrent(input, { form: 'irreversible', alpha: 0.5, constant: '25C' });
    expect(Math.abs(full / 13.007e-6 - 1)).toBeLessThan(2e-3);
    expect(Math.abs(printed / 13.031e-6 - 1)).toBeLessThan(2e-3);
    expect(Math.abs(printed / full - 1)).toBeLessThan(3e-3);
    expect(full / randlesSevcikPeakCurrent(input)).toBeCloseTo(0.7855, 4);
  });
  // Full form: ip ∝ n^{3/2} and ∝ T^{-1/2} (Bard & Faulkner §6.2, by inspection of the formula).
  it('scales as n^{3/2} and T^{-1/2}', () => {
    const base = randlesSevcikPeakCurrent(input);
    expect(randlesSevcikPeakCurrent({ ...input, electronCount: 2 }) / base).toBeCloseTo(2 ** 1.5, 12);
    expect(randlesSevcikPeakCurrent(input, { temperatureK: 4 * 298.15 }) / base).toBeCloseTo(0.5, 12);
  });
  it('rejects non-physical input', () => {
    expect(() => randlesSevcikPeakCurrent({ ...input, areaCm2: 0 })).toThrow(AnalysisError);
    expect(() => randlesSevcikPeakCurrent({ ...input, diffusionCm2PerS: -1 })).toThrow(/diffusionCm2PerS/);
    expect(() => randlesSevcikPeakCurrent(input, { form: 'irreversible', alpha: 1.5 })).toThrow(/alpha/);
  });
});

describe('randlesSevcikDiffusion', () => {
  // Least squares of ip vs v^½ on pairs computed from Randles–Ševčík (Bard & Faulkner §6.2): D = 7.600e-6 cm²/s,
  // and 7.580e-6 with the rounded 2.69e5 constant.
  const v = [0.025, 0.05, 0.1, 0.2, 0.4];
  const ip = [8.2791, 11.7083, 16.5581, 23.4167, 33.1162].map((u) => u * 1e-6);
  it('recovers D = 7.600e-6 cm²/s from the five tabulated pairs', () => {
    const fit = fitLine(v.map(Math.sqrt), ip);
    expect(Math.abs(randlesSevcikDiffusion(fit.slope, cell) / 7.6e-6 - 1)).toBeLessThan(1e-4);
    expect(Math.abs(fit.intercept)).toBeLessThan(1e-10); // rounding of the 5-digit table
    expect(Math.abs(randlesSevcikDiffusion(fit.slope, cell, { constant: '25C' }) / 7.58e-6 - 1)).toBeLessThan(5e-4);
  });
  it('is the exact inverse of the peak current, in both forms', () => {
    const opts = { form: 'irreversible' as const, alpha: 0.4, temperatureK: 310 };
    const slope = randlesSevcikPeakCurrent({ ...input, scanRateVPerS: 1 }, opts);
    expect(randlesSevcikDiffusion(-slope, cell, opts)).toBeCloseTo(7.6e-6, 16);
  });
});
