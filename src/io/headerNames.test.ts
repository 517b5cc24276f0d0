import { describe, expect, it } from 'vitest';
import { readHeader } from './headerNames';

// Header spellings listed in the issue; unit factors from BIPM SI Brochure 9th ed. (2019),
// Table 7 (m = 1e-3, µ = 1e-6, n = 1e-9). Naming habits: common practice, no source.
describe('readHeader', () => {
  const cases: [string, string | null, string | null, number | null][] = [
    ['Potential/V', 'potential', 'V', 1],
    ['E (mV)', 'potential', 'mV', 1e-3],
    ['WE potential [V]', 'potential', 'V', 1],
    ['U (V)', 'potential', 'V', 1],
    ['Voltage [mV]', 'potential', 'mV', 1e-3],
    ['Current/A', 'current', 'A', 1],
    ['I (uA)', 'current', 'µA', 1e-6],
    ['i / µA', 'current', 'µA', 1e-6],
    ['i / μA', 'current', 'µA', 1e-6],
    ['I (ÂµA)', 'current', 'µA', 1e-6],
    ['current (nA)', 'current', 'nA', 1e-9],
    ['j (mA/cm2)', 'current', 'mA/cm²', 1e-3],
    ['Time (s)', 'time', 's', 1],
    ['t/ms', 'time', 'ms', 1e-3],
    ['Cycle', 'cycle', null, null],
    ['Scan', 'cycle', null, null],
    ['Charge/C', 'other', 'C', 1],
    ['Step', 'other', null, null],
    ['I2/A', 'other', 'A', 1],
    ['Point', 'index', null, null],
    ['Comment', 'other', null, null],
  ];
  for (const [text, role, unit, factor] of cases) {
    it(`"${text}" → ${role}${unit ? ` in ${unit}` : ''}`, () => {
      const h = readHeader(text);
      expect(h.role).toBe(role);
      expect(h.unit?.symbol ?? null).toBe(unit);
      if (factor !== null) expect(h.unit?.factor).toBeCloseTo(factor, 15);
    });
  }

  it('takes the reference electrode out of "E vs Ag/AgCl (V)" and "Potential/V vs. SCE"', () => {
    expect(readHeader('E vs Ag/AgCl (V)')).toMatchObject({ role: 'potential', reference: 'Ag/AgCl' });
    expect(readHeader('Potential/V vs. SCE')).toMatchObject({ role: 'potential', reference: 'SCE' });
  });

  it('an unknown name without a unit has no role', () => {
    expect(readHeader('Sample 12').role).toBeNull();
  });
});
