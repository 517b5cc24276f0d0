import { describe, expect, it } from 'vitest';
import { readPreamble } from './readPreamble';

// Unit arithmetic: BIPM SI Brochure 9th ed. (2019), Table 7 (prefixes) and sect. 2.3.1
// (T/K = t/°C + 273.15); 1 L = 1000 cm³ (SI Brochure Table 8), so 1 mM = 1e-6 mol/cm³.
describe('readPreamble', () => {
  it('reads key/value pairs with :, =, tab and ; and keeps repeated keys', () => {
    const r = readPreamble(['Operator: A. Tester', 'Sample = invented couple', 'Electrode\tPt disc', '# Note; first run', 'Note: second']);
    expect(r.metadata).toEqual({ Operator: 'A. Tester', Sample: 'invented couple', Electrode: 'Pt disc', Note: 'first run', 'Note (2)': 'second' });
  });

  it('keeps commas inside values and does not split prose at a comma', () => {
    const r = readPreamble(['Demo export (simulated data, see README.md)', 'Working electrode: carbon paste, 3 mm disk (0.0707 cm2)', 'Area;0,0707;cm2']);
    expect(r.metadata).toEqual({ 'Working electrode': 'carbon paste, 3 mm disk (0.0707 cm2)', Area: '0,0707 cm2' });
    expect(r.areaCm2?.value).toBeCloseTo(0.0707, 12);
    expect(r.areaCm2?.line).toBe(2);
  });

  const rates: [string, number][] = [
    ['scan rate = 100 mV/s', 0.1],
    ['Scan rate: 0,05 V/s', 0.05],
    ['Scan rate (mV/s): 250', 0.25],
    ['Sweep rate; 20 mV s-1', 0.02],
    ['v = 1.5 V/s', 1.5],
    ['ScanRate=5E-2 V/s', 0.05],
  ];
  for (const [line, v] of rates) {
    it(`scan rate from "${line}" = ${v} V/s`, () => {
      const r = readPreamble(['Operator: X', line], 3);
      expect(r.scanRateVPerS?.value).toBeCloseTo(v, 12);
      expect(r.scanRateVPerS?.line).toBe(4);
    });
  }

  it('a scan-rate line without any unit is not guessed, but kept as seen', () => {
    const r = readPreamble(['Operator: X', 'Scan rate: 100']);
    expect(r.scanRateVPerS).toBeNull();
    expect(r.scanRateWithoutUnit).toMatchObject({ value: 100, line: 2, text: 'Scan rate: 100' });
    expect(readPreamble(['Scan rate (mV/s): 100']).scanRateWithoutUnit).toBeNull();
  });

  it('temperature, area, concentration and reference electrode in core units', () => {
    const r = readPreamble(['Temperature: 25 °C', 'Electrode area = 7.07 mm2', 'Concentration: 2.5 mM', 'Reference electrode: SCE']);
    expect(r.temperatureK?.value).toBeCloseTo(298.15, 10);
    expect(r.areaCm2?.value).toBeCloseTo(0.0707, 12);
    expect(r.concentrationMolPerCm3?.value).toBeCloseTo(2.5e-6, 18);
    expect(r.referenceElectrode?.value).toBe('SCE');
    expect(readPreamble(['T = 300 K']).temperatureK).toBeNull();
    expect(readPreamble(['Temp: 300 K']).temperatureK?.value).toBeCloseTo(300, 10);
  });

  it('a temperature without a unit: °C up to 150, K from 200 to 400, otherwise not used', () => {
    // T/K = t/°C + 273.15 (SI Brochure sect. 2.3.1). 298 read as °C would be 571 K, a cell no
    // liquid-electrolyte export describes: common practice, no source, for where the line falls.
    const c = readPreamble(['Temperature: 25']).temperatureK;
    expect(c?.value).toBeCloseTo(298.15, 10);
    expect(c?.text).toContain('read as °C');
    const k = readPreamble(['Temperature: 298.15']).temperatureK;
    expect(k?.value).toBeCloseTo(298.15, 10);
    expect(k?.text).toContain('read as K');
    expect(readPreamble(['Temperature: 175']).temperatureK).toBeNull();
    expect(readPreamble(['Temperature: 1000']).temperatureK).toBeNull();
    expect(readPreamble(['Temperature: 298 K']).temperatureK?.value).toBeCloseTo(298, 10);
  });

  it('the analyte concentration from a sample line, unless a concentration line says it', () => {
    const fromSample = readPreamble(['Sample: 0.5 mM invented compound in 0.1 M KCl']);
    expect(fromSample.concentrationMolPerCm3?.value).toBeCloseTo(0.5e-6, 18);
    const explicit = readPreamble(['Sample: 0.5 mM invented compound', 'Concentration: 2 mM']);
    expect(explicit.concentrationMolPerCm3?.value).toBeCloseTo(2e-6, 18);
  });

  it('the sign convention named in words', () => {
    expect(readPreamble(['Convention: cathodic current positive']).convention?.value).toBe('polarographic');
    expect(readPreamble(['Currents follow IUPAC']).convention?.value).toBe('iupac');
    expect(readPreamble(['Operator: X']).convention).toBeNull();
  });
});
