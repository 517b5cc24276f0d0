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

// IUPAC recommendation of ferrocene as an internal reference (Gritzner & Kůta, Pure Appl. Chem. 56
// (1984) 461, from memory): a potential is reported against the E½ of Fc⁺/Fc measured in the same
// solution, which is the only way to place a pseudo-reference wire.
describe('scales without a fixed potential', () => {
  it('reads a bare wire and Ag/Ag⁺ written in words', async () => {
    const { findReferenceElectrode } = await import('./referenceElectrodes');
    expect(findReferenceElectrode('Ag wire pseudo-reference')?.id).toBe('pseudo');
    expect(findReferenceElectrode('Pt quasi-reference electrode')?.id).toBe('pseudo');
    expect(findReferenceElectrode('Ag/Ag+ (0.01 M AgNO3 in MeCN)')?.id).toBe('AgAg+');
  });
  it('converts a pseudo-reference to Fc⁺/Fc only through a measured standard, exactly', () => {
    const std = { eHalfV: 0.123, scale: 'pseudo' as const, origin: 'fc.csv' };
    expect(referenceOffset('pseudo', 'Fc', { internalStandard: std })).toMatchObject({ offsetV: -0.123, typical: false });
    expect(() => referenceOffset('pseudo', 'Fc')).toThrow(/internal standard/);
    expect(() => referenceOffset('AgAg+', 'SCE')).toThrow(/internal standard/);
  });
  it('to a tabulated scale it goes through the typical Fc⁺/Fc value and says so', () => {
    const r = referenceOffset('pseudo', 'SCE', { internalStandard: { eHalfV: 0.1, scale: 'pseudo', origin: 'fc.csv' } });
    // Connelly & Geiger, Chem. Rev. 96 (1996) 877 (from memory): Fc⁺/Fc ≈ +0.40 V vs SCE in MeCN.
    expect(r.offsetV).toBeCloseTo(0.4 - 0.1, 12);
    expect(r.typical).toBe(true);
  });
});
