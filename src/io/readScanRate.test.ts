import { describe, expect, it } from 'vitest';
import { readScanRateLine, scanRateIn } from './readScanRate';

// Ways labs write a scan rate and its unit, in seven languages: common practice, no source.
// Expected values are unit arithmetic with m = 1e-3 (BIPM SI Brochure, 9th ed. 2019, Table 7).
describe('readScanRateLine', () => {
  const lines: [string, number][] = [
    ['Scan rate: 50 mV s-1', 0.05],
    ['Scan rate: 50 mVs-1', 0.05],
    ['Scan rate = 0.1 V·s⁻¹', 0.1],
    ['Scan rate: 50 mV.s-1', 0.05],
    ['Scan rate (mV s-1): 50', 0.05],
    ['Scan rate [V·s⁻¹] = 0.05', 0.05],
    ['Scan rate (mVs-1)\t50', 0.05],
    ['v = 20 mV/s', 0.02],
    ['Vorschubgeschwindigkeit: 50 mV/s', 0.05],
    ['Velocidad de barrido: 0,1 V·s⁻¹', 0.1],
    ['Vitesse de balayage : 20 mV s-1', 0.02],
    ['Velocità di scansione: 5 mV/s', 0.005],
    ['Velocidade de varredura: 100 mV/s', 0.1],
    ['Szybkość skanowania: 50 mV/s', 0.05],
    ['scan_rate = 0.1 V/s', 0.1],
    ['Sweep.Rate: 250 mV/s', 0.25],
  ];
  for (const [line, v] of lines) {
    it(`"${line}" → ${v} V/s`, () => {
      const r = readScanRateLine(line, 7);
      expect(r?.value).toBeCloseTo(v, 12);
      expect(r?.line).toBe(7);
    });
  }

  it('no rate without a rate word, without a unit, or with a potential unit alone', () => {
    expect(readScanRateLine('Step: 50 mV/s', 1)).toBeNull();
    expect(readScanRateLine('Scan rate: 50', 1)).toBeNull();
    expect(readScanRateLine('Scan rate: 50 mV', 1)).toBeNull();
    expect(readScanRateLine('Scan rate: 50 mV scan', 1)).toBeNull();
  });

  it('a column name that carries the rate: "j @ 50 mV s-1 (mA cm-2)" → 0.05 V/s', () => {
    expect(scanRateIn('j @ 50 mV s-1 (mA cm-2)', 2)?.value).toBeCloseTo(0.05, 12);
    expect(scanRateIn('E (mV)', 2)).toBeNull();
  });

  it('a 1,000-digit number after the key is read in linear time (no hang) and is not a rate without a unit', () => {
    expect(readScanRateLine(`Scan rate: ${'1'.repeat(1000)}`, 1)).toBeNull();
  });
});
