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

  // The scale written with the unit or the name (the issue's spellings); common practice, no source.
  const references: [string, string, string][] = [
    ['E', 'V RHE', 'RHE'],
    ['E / V vs. SCE', '', 'SCE'],
    ['Potential (V vs Ag/AgCl)', '', 'Ag/AgCl'],
    ['E_we vs Fc/Fc+', '', 'Fc/Fc+'],
    ['E', 'V vs. Ag/AgCl (3 M KCl)', 'Ag/AgCl (3 M KCl)'],
    ['E [V_RHE]', '', 'RHE'],
    ['Spannung', 'V gegen SCE', 'SCE'],
  ];
  for (const [name, unitCell, ref] of references) {
    it(`"${name}"${unitCell ? ` over "${unitCell}"` : ''} → potential in V against ${ref}`, () => {
      expect(readHeader(name, unitCell)).toMatchObject({ role: 'potential', reference: ref });
      if (unitCell || name !== 'E_we vs Fc/Fc+') expect(readHeader(name, unitCell).unit?.symbol).toBe('V');
    });
  }

  it('"V max" is not a scale: a bare word after the unit must be a known reference electrode', () => {
    expect(readHeader('E', 'V max').reference).toBeNull();
  });

  // Current densities: factors to A/cm² (BIPM SI Brochure 9th ed. 2019, Tables 7 and 8: 1 m² = 1e4 cm²).
  const densities: [string, string, string | null, number | null][] = [
    ['j', '', null, null], ['J', 'mA cm-2', 'mA/cm²', 1e-3], ['j (mA/cm²)', '', 'mA/cm²', 1e-3], ['current density (µA cm^-2)', '', 'µA/cm²', 1e-6],
    ['Stromdichte / mA cm⁻²', '', 'mA/cm²', 1e-3], ['i', 'A m-2', 'A/m²', 1e-4], ['j', 'mA·cm−2', 'mA/cm²', 1e-3],
  ];
  for (const [name, unitCell, symbol, factor] of densities) {
    it(`"${name}"${unitCell ? ` over "${unitCell}"` : ''} is a current density${symbol ? ` in ${symbol}` : ''}`, () => {
      const h = readHeader(name, unitCell);
      expect([h.role, h.density, h.unit?.symbol ?? null]).toEqual(['current', true, symbol]);
      if (factor !== null) expect(h.unit?.factor).toBeCloseTo(factor, 18);
    });
  }

  // Column names labs use in six languages (common practice, no source).
  const words: [string, string][] = [
    ['Spannung', 'potential'], ['Strom', 'current'], ['Zeit', 'time'], ['Zyklus', 'cycle'],
    ['Potencial', 'potential'], ['Intensidad', 'current'], ['Corriente', 'current'], ['Tiempo', 'time'], ['Ciclo', 'cycle'],
    ['Potentiel', 'potential'], ['Tension', 'potential'], ['Intensité', 'current'], ['Courant', 'current'], ['Temps', 'time'],
    ['Potenziale', 'potential'], ['Tensione', 'potential'], ['Corrente', 'current'], ['Intensità', 'current'], ['Tempo', 'time'],
    ['Tensão', 'potential'], ['Intensidade', 'current'],
    ['Potencjał', 'potential'], ['Napięcie', 'potential'], ['Prąd', 'current'], ['Natężenie prądu', 'current'], ['Czas', 'time'], ['Cykl', 'cycle'],
  ];
  it('reads potential, current, time and cycle names in German, Spanish, French, Italian, Portuguese and Polish', () => {
    expect(words.map(([w]) => readHeader(w).role)).toEqual(words.map(([, r]) => r));
  });

  // µ as U+00B5, U+03BC, and as the Latin-1 reading of their UTF-8 bytes ("Âµ", "Î¼").
  it('reads the micro sign in every spelling: µA, μA, ÂµA, Î¼A, uA', () => {
    for (const mu of ['µ', '\u03bc', 'Âµ', 'Î¼', 'u']) expect(readHeader(`I (${mu}A)`).unit?.symbol).toBe('µA');
  });
});
