import { describe, expect, it } from 'vitest';
import { FARADAY_C_PER_MOL } from '../constants';
import { HG_OXIDE_STANDARD_POTENTIAL_V, hgOxideElectrodeVsSheV } from './hgOxideElectrode';
import { referenceOffset } from './referenceOffset';

const NERNST_25 = 0.0591597; // (ln 10)·RT/F at 298.15 K, CODATA 2018 constants (computed)

describe('Hg/HgO electrodes on one basis', () => {
  // Wagman et al., NBS tables, J. Phys. Chem. Ref. Data 11 Suppl. 2 (1982) (from memory): ΔfG°(HgO, red) = −58.539,
  // ΔfG°(H₂O, l) = −237.129 kJ/mol → HgO + 2H⁺ + 2e⁻ → Hg + H₂O has E° = 178.59 kJ/(2F) = 0.9255 V; with pKw = 13.995
  // (Marshall & Franck 1981, from memory) the OH⁻ form is 0.9255 − 0.05916·13.995 = 0.0976 V (table: 0.0977 V).
  it('E°(HgO/Hg, OH⁻) agrees with the acid form and pKw within 0.5 mV', () => {
    const acid = (237.129 - 58.539) * 1000 / (2 * FARADAY_C_PER_MOL);
    expect(acid).toBeCloseTo(0.9255, 3);
    expect(Math.abs(acid - NERNST_25 * 13.995 - HG_OXIDE_STANDARD_POTENTIAL_V)).toBeLessThan(0.0005);
  });
  // Robinson & Stokes, Electrolyte Solutions (1959) App. 8.10 (from memory): γ±(NaOH) 0.679 at 1 m, 0.766 at 0.1 m.
  // Hand-worked: 0.0977 − 0.05916·log10(0.679) = 0.1076 V; 0.0977 − 0.05916·log10(0.0766) = 0.1637 V.
  it('1 M and 0.1 M NaOH give 0.1076 and 0.1637 V vs SHE', () => {
    expect(hgOxideElectrodeVsSheV('NaOH', 1)).toBeCloseTo(0.1076, 4);
    expect(hgOxideElectrodeVsSheV('NaOH', 0.1)).toBeCloseTo(0.1637, 4);
    // Same basis: 1 M → 0.1 M moves by the activity ratio, −0.05916·log10(0.679/0.0766) = −56.1 mV.
    expect(referenceOffset('HgO-1M', 'HgO-0.1M').offsetV).toBeCloseTo(-NERNST_25 * Math.log10(0.679 / 0.0766), 3);
  });
  // Same-solution identity: Hg/HgO and RHE both follow pH with the same slope, so Hg/HgO vs RHE is E° of the acid form,
  // 0.926 V (Bard & Faulkner 2001 App. C, from memory; 0.9255 V from the NBS tables above), whatever the pH, with the
  // pH stated as it usually is for a hydroxide solution (14 + log10 c, common practice, no source): the same number
  // as the common E_RHE = E + 0.098 V + 0.0592·pH at pH 14 (1 M).
  it('Hg/HgO → RHE in the filling\'s own solution is 0.926 V for every filling', () => {
    for (const [id, molar] of [['HgO-1M', 1], ['HgO-0.1M', 0.1], ['HgO-1M-KOH', 1], ['HgO-0.1M-KOH', 0.1]] as const) {
      const pH = 14 + Math.log10(molar);
      expect(Math.abs(referenceOffset(id, 'RHE', { pH }).offsetV - 0.926), id).toBeLessThan(0.0006);
      expect(referenceOffset('RHE', id, { pH }).offsetV).toBeCloseTo(-referenceOffset(id, 'RHE', { pH }).offsetV, 12);
    }
  });
  // In another solution the two differ by the pH difference at the Nernst slope (ln 10)·RT/F (computed, no junction).
  it('Hg/HgO (1 M KOH) → RHE in a pH 13 solution is 0.926 V − 59.2 mV', () => {
    expect(referenceOffset('HgO-1M-KOH', 'RHE', { pH: 13 }).offsetV).toBeCloseTo(0.9256 - NERNST_25, 3);
    expect(referenceOffset('HgO-1M-KOH', 'RHE', { pH: 13 }).basis[0]).toMatch(/0\.926 V/);
  });
  // A value the user gives the electrode goes through SHE as every other scale does.
  it('a user value for Hg/HgO is used through SHE', () => {
    expect(referenceOffset('HgO-1M', 'RHE', { pH: 14, overridesVsSheV: { 'HgO-1M': 0.14 } }).offsetV).toBeCloseTo(0.14 + 14 * NERNST_25, 4);
  });
});
