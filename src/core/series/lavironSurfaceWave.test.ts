import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import {
  surfaceCharge, surfaceCoverageFromCharge, surfaceCoverageFromSlope, surfacePeakCurrent, surfacePeakWidthV,
} from './lavironSurfaceWave';

const cell = { electronCount: 1, areaCm2: 0.0707 };
const input = { ...cell, coverageMolPerCm2: 1e-10, scanRateVPerS: 0.1 };

describe('surface-confined Nernstian wave', () => {
  // Bard & Faulkner 2nd ed. §14.3; Laviron, J. Electroanal. Chem. 52, 355 (1974) — worked example
  // (formulas from memory), computed with CODATA 2018: ip = 0.6638 µA, Q = 0.6822 µC, ip/Q = 0.97304 s⁻¹.
  it('peak current, charge and their ratio match the worked example', () => {
    const ip = surfacePeakCurrent(input);
    const q = surfaceCharge(input);
    expect(Math.abs(ip / 6.6376e-7 - 1)).toBeLessThan(1e-3);
    expect(Math.abs(q / 6.8215e-7 - 1)).toBeLessThan(1e-3);
    expect(ip / q).toBeCloseTo(0.97304, 4);
  });
  // Bard & Faulkner §14.3 (3.53 RT/nF, from memory); exact 4 ln(1+√2) RT/nF = 90.58/n mV at 25 °C.
  it('FWHM is 90.58 mV for n = 1 and 45.29 mV for n = 2', () => {
    expect(surfacePeakWidthV(1) * 1000).toBeCloseTo(90.58, 1);
    expect(surfacePeakWidthV(2) * 1000).toBeCloseTo(45.29, 1);
  });
  // Inverses of the two formulas above (Faraday's law and the ip–v slope).
  it('recovers Γ from the charge and from the ip–v slope', () => {
    expect(surfaceCoverageFromCharge(6.8215e-7, cell)).toBeCloseTo(1e-10, 14);
    expect(surfaceCoverageFromCharge(-6.8215e-7, cell)).toBeCloseTo(1e-10, 14);
    const slope = surfacePeakCurrent({ ...input, scanRateVPerS: 1 }, { temperatureK: 310 });
    expect(surfaceCoverageFromSlope(slope, cell, { temperatureK: 310 })).toBeCloseTo(1e-10, 18);
  });
  // ip ∝ n² at fixed Γ (Laviron 1974): doubling n quadruples ip.
  it('scales as n²', () => {
    expect(surfacePeakCurrent({ ...input, electronCount: 2 }) / surfacePeakCurrent(input)).toBeCloseTo(4, 12);
  });
  it('rejects bad input', () => {
    expect(() => surfacePeakCurrent({ ...input, areaCm2: -1 })).toThrow(AnalysisError);
    expect(() => surfaceCoverageFromCharge(Number.NaN, cell)).toThrow(/chargeC/);
    expect(() => surfacePeakWidthV(0)).toThrow(/electronCount/);
  });
});
