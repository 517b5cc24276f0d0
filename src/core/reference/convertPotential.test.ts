import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { convertPotential, referenceVsShe, resolveReferenceId } from './convertPotential';
import { REFERENCE_ELECTRODES, findReferenceElectrode } from './referenceElectrodes';

describe('convertPotential', () => {
  // Bard & Faulkner 2nd ed. (2001), inside back cover; Sawyer et al., Electrochemistry for Chemists (1995); computed:
  // +0.300 V vs Ag/AgCl (sat. KCl) → +0.497 V vs SHE → +0.256 V vs SCE (±3 mV).
  it('+0.300 V vs Ag/AgCl (sat.) is +0.497 V vs SHE and +0.256 V vs SCE', () => {
    expect(convertPotential(0.3, 'AgCl-sat', 'SHE')).toBeCloseTo(0.497, 3);
    expect(Math.abs(convertPotential(0.3, 'AgCl-sat', 'SCE') - 0.256)).toBeLessThan(0.003);
  });
  // Nernst equation, E vs RHE = E vs SHE + (ln 10)·RT/F·pH (computed): 0.000 V vs SHE at pH 7, 25 °C is +0.414 V vs RHE.
  it('0 V vs SHE at pH 7 is +0.414 V vs RHE', () => {
    expect(Math.abs(convertPotential(0, 'SHE', 'RHE', { pH: 7 }) - 0.414)).toBeLessThan(0.001);
    expect(convertPotential(0, 'SHE', 'RHE', { pH: 7 })).toBeCloseTo(7 * 0.05915935, 6);
  });
  // Same equation: the slope scales with T (RT/F), e.g. 50 °C gives 64.12 mV per pH unit.
  it('uses a temperature-dependent RHE slope', () => {
    expect(convertPotential(0, 'SHE', 'RHE', { pH: 1, temperatureK: 323.15 }) * 1000).toBeCloseTo(64.12, 1);
  });
  it('round-trips through every tabulated scale (a wire or Ag/Ag⁺ only through its own standard)', () => {
    for (const id of ['pseudo', 'AgAg+'] as const) {
      const ctx = { internalStandard: { eHalfV: 0.2, scale: id, origin: 'test' } };
      expect(convertPotential(convertPotential(0.123, 'SCE', id, ctx), id, 'SCE', ctx)).toBeCloseTo(0.123, 12);
    }
    for (const r of REFERENCE_ELECTRODES.filter((x) => x.eVsSheV !== null || x.id === 'RHE' || x.id === 'Fc')) {
      const ctx = { pH: 3, internalStandard: { eHalfV: 0.45, scale: 'SCE' as const, origin: 'test' } };
      expect(convertPotential(convertPotential(0.123, 'SCE', r.id, ctx), r.id, 'SCE', ctx)).toBeCloseTo(0.123, 12);
    }
  });
  // Fc⁺/Fc from a measured E½: a peak at the ferrocene E½ is 0 V vs Fc⁺/Fc (definition of the scale).
  it('puts the measured ferrocene E½ at 0 V on the Fc scale', () => {
    const ctx = { internalStandard: { eHalfV: 0.41, scale: 'AgCl-sat' as const, origin: 'fc.csv' } };
    expect(convertPotential(0.41, 'AgCl-sat', 'Fc', ctx)).toBeCloseTo(0, 12);
    expect(convertPotential(0.91, 'AgCl-sat', 'Fc', ctx)).toBeCloseTo(0.5, 12);
  });
  // Connelly & Geiger, Chem. Rev. 96, 877 (1996) (from memory): typical +0.40 V vs SCE in MeCN, labelled typical.
  it('falls back to the typical ferrocene value and says so', () => {
    const pos = referenceVsShe('Fc');
    expect(pos.typical).toBe(true);
    expect(pos.basis).toMatch(/typical/);
    expect(convertPotential(0.4, 'SCE', 'Fc')).toBeCloseTo(0, 12);
  });
  it('applies user overrides', () => {
    expect(convertPotential(0, 'HgO-1M', 'SHE', { overridesVsSheV: { 'HgO-1M': 0.14 } })).toBeCloseTo(0.14, 12);
  });
  it('refuses RHE without pH, unknown names and non-finite values', () => {
    expect(() => convertPotential(0, 'SHE', 'RHE')).toThrow(/pH/);
    expect(() => resolveReferenceId('glass')).toThrow(AnalysisError);
    expect(() => convertPotential(Number.NaN, 'SHE', 'SCE')).toThrow(AnalysisError);
  });
});

describe('findReferenceElectrode', () => {
  it('accepts common spellings', () => {
    expect(findReferenceElectrode('Ag/AgCl')?.id).toBe('AgCl-sat');
    expect(findReferenceElectrode('vs SCE')?.id).toBe('SCE');
    expect(findReferenceElectrode('NHE')?.id).toBe('SHE');
    expect(findReferenceElectrode('Fc+/Fc')?.id).toBe('Fc');
    expect(findReferenceElectrode('agcl-3m')?.id).toBe('AgCl-3M');
  });
  it('reads names as instruments and people write them, with brackets, commas and units', () => {
    expect(findReferenceElectrode('Ag/AgCl (3 M KCl)')?.id).toBe('AgCl-3M');
    expect(findReferenceElectrode('vs. Ag/AgCl, 3.0 M KCl')?.id).toBe('AgCl-3M');
    expect(findReferenceElectrode('Ag/AgCl (saturated KCl)')?.id).toBe('AgCl-sat');
    expect(findReferenceElectrode('Ag/AgCl (1 M KCl)')?.id).toBe('AgCl-1M');
    expect(findReferenceElectrode('Hg/HgO (1 M NaOH)')?.id).toBe('HgO-1M');
    expect(findReferenceElectrode('Ag/AgCl (0.1 M KCl)')?.id).toBe('AgCl-0.1M');
    expect(findReferenceElectrode('platinum wire')?.id).toBe('pseudo');
    expect(findReferenceElectrode('home-made electrode')).toBeNull();
  });
  // Never use 0.926 V for Hg/HgO vs SHE: that is E° of HgO + 2H⁺ + 2e⁻ → Hg + H₂O (Bard & Faulkner 2001 App. C, from
  // memory). Hg/HgO in 1 M NaOH: 0.0977 − 0.05916·log10(0.679) = 0.1076 V (hgOxideElectrode.ts, Robinson & Stokes γ±).
  it('never carries 0.926 V for Hg/HgO', () => {
    expect(findReferenceElectrode('Hg/HgO')?.eVsSheV).toBeCloseTo(0.1076, 4);
  });
});
