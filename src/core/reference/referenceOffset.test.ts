import { describe, expect, it } from 'vitest';
import { referenceOffset } from './referenceOffset';

describe('referenceOffset', () => {
  // Bard & Faulkner, Electrochemical Methods 2nd ed. (2001), inside cover: SCE +0.2412 V vs SHE.
  it('SCE → SHE adds +0.2412 V; SHE → SCE subtracts it; the same scale adds nothing', () => {
    expect(referenceOffset('SCE', 'SHE').offsetV).toBeCloseTo(0.2412, 12);
    expect(referenceOffset('SHE', 'SCE').offsetV).toBeCloseTo(-0.2412, 12);
    expect(referenceOffset('AgCl-sat', 'AgCl-sat')).toEqual({ offsetV: 0, from: 'AgCl-sat', to: 'AgCl-sat', basis: [], typical: false });
  });
  // Nernst equation for 2H⁺ + 2e⁻ ⇌ H₂ at 1 bar: E(RHE vs SHE) = −(ln 10)(RT/F)·pH = −59.16 mV·pH at 25 °C.
  it('SHE → RHE at pH 7 and 25 °C adds 7 × 59.16 mV', () => {
    expect(referenceOffset('SHE', 'RHE', { pH: 7, temperatureK: 298.15 }).offsetV).toBeCloseTo(7 * 0.0591593, 5);
  });
  it('flags a typical (not measured) ferrocene position', () => {
    expect(referenceOffset('SCE', 'Fc').typical).toBe(true);
    expect(referenceOffset('SCE', 'Fc', { internalStandard: { eHalfV: 0.39, scale: 'SCE', origin: 'test' } })).toMatchObject({ offsetV: -0.39, typical: false });
  });
  it('edge: RHE without a pH is refused', () => {
    expect(() => referenceOffset('SHE', 'RHE')).toThrow(/pH/);
  });
});
