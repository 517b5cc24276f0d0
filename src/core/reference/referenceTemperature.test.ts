import { describe, expect, it } from 'vitest';
import { referenceOffset } from './referenceOffset';
import { referenceVsShe } from './convertPotential';
import { referenceTemperatureShift, silverChlorideStandardPotentialV } from './referenceTemperature';

describe('reference electrodes away from 25 °C', () => {
  // Ives & Janz, Reference Electrodes (1961), calomel (from memory): sat. KCl at 35 °C
  // 0.2412 − 6.61e-3 − 1.75e-4 − 9.0e-7 = 0.2344141 V; about −0.66 mV/K near 25 °C.
  it('SCE at 35 °C: 0.234414 V vs SHE', () => {
    expect(referenceVsShe('SCE', { temperatureK: 308.15 }).eVsSheV).toBeCloseTo(0.2344141, 7);
    expect(referenceTemperatureShift('SCE', 0.2412, 299.15)!.shiftV * 1000).toBeCloseTo(-0.6628, 3);
  });
  // Bates & Bower, J. Res. NBS 53, 283 (1954) (from memory): E°(AgCl/Ag) = 0.22240 V at 25 °C by their
  // polynomial (they print 0.22234; Bates & MacAskill 1978 give 0.22249), dE°/dT = −0.6457 mV/K there.
  it('E°(AgCl/Ag) of Bates & Bower: 0.2224 V and −0.646 mV/K at 25 °C', () => {
    expect(Math.abs(silverChlorideStandardPotentialV(25) - 0.2224)).toBeLessThan(2e-4);
    const slope = (silverChlorideStandardPotentialV(25.5) - silverChlorideStandardPotentialV(24.5)) * 1000;
    expect(slope).toBeCloseTo(-0.6457, 3);
  });
  // Worked by hand (Nernst at fixed chloride activity, referenceTemperature.ts): Ag/AgCl 3 M KCl at 45 °C
  // moves by E°(45) − E°(25) + (318.15/298.15 − 1)(0.210 − E°(25)).
  it('Ag/AgCl 3 M at 45 °C, and the offset to SCE at 40 °C', () => {
    const e25 = silverChlorideStandardPotentialV(25);
    const expected = silverChlorideStandardPotentialV(45) - e25 + (318.15 / 298.15 - 1) * (0.21 - e25);
    expect(referenceTemperatureShift('AgCl-3M', 0.21, 318.15)!.shiftV).toBeCloseTo(expected, 12);
    const at40 = referenceOffset('AgCl-3M', 'SCE', { temperatureK: 313.15 });
    const at25 = referenceOffset('AgCl-3M', 'SCE', {});
    expect(at40.offsetV).not.toBeCloseTo(at25.offsetV, 4);
    expect(at40.basis.join(' ')).toMatch(/at 40\.0 °C/);
  });
  it('keeps the 25 °C value and says so where no coefficient is published', () => {
    const mse = referenceVsShe('MSE-sat', { temperatureK: 313.15 });
    expect(mse.eVsSheV).toBe(0.64);
    expect(mse.at25Only).toBe(true);
    expect(referenceTemperatureShift('AgCl-sat', 0.197, 313.15)).toBeNull();
    expect(referenceTemperatureShift('SCE', 0.2412, 353.15)).toBeNull();
    expect(referenceVsShe('SCE', { temperatureK: 298.15 }).eVsSheV).toBe(0.2412);
    // Half a correction would be worse than none: with saturated Ag/AgCl at one end, both stay at 25 °C.
    expect(referenceOffset('AgCl-sat', 'AgCl-3M', { temperatureK: 303.15 }).offsetV).toBeCloseTo(0.197 - 0.21, 12);
  });
});
