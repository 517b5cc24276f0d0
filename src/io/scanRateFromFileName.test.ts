import { describe, expect, it } from 'vitest';
import { scanRateFromFileName } from './scanRateFromFileName';

// File-name habits of labs: common practice, no source. Expected values are unit arithmetic
// with the SI prefix m = 1e-3 (BIPM SI Brochure, 9th ed. 2019, Table 7).
describe('scanRateFromFileName', () => {
  const cases: [string, number | null][] = [
    ['series2_50mVs.csv', 0.05],
    ['scan-0.1Vps.txt', 0.1],
    ['ferro_100mV-s_cycle3.dat', 0.1],
    ['run 0p05 V s-1.txt', 0.05],
    ['fc_250mVpers.csv', 0.25],
    ['data/2024/cv_20 mV_s.txt', 0.02],
    ['sample_5mV_s^-1.txt', 0.005],
    ['a_1,5Vs.csv', 1.5],
    ['cv_300uVs.txt', 0.0003],
    ['oer_film_50mVs-1.txt', 0.05],
    ['film_v=0.1Vs_run2.csv', 0.1],
    ['cv_0.05V·s⁻¹.txt', 0.05],
    ['probe_100mV s-1.txt', 0.1],
    ['cv_200μVs.txt', 0.0002],
    ['cv_10mV.csv', null],
    ['cycle3.csv', null],
    ['electrode5_scan.txt', null],
    ['measurement_1Vsample.txt', null],
    ['run_0.1Vs_2.csv', 0.1],
    // "vs" for versus: a number before it is no scan rate, but a rate elsewhere in the name is read.
    ['Fc_5_vs_AgCl.csv', null],
    ['sample_2_vs_SCE.csv', null],
    ['run3_vs_Ag.csv', null],
    ['ferrocene_0.1_vs_AgAgCl.csv', null],
    ['couple_28 vs Fc.txt', null],
    ['film_2vs_Ag.csv', null],
    ['Fc_5_vs_AgCl_100mVs.csv', 0.1],
    ['x_0.2_vs_SCE_v=0.05Vs.csv', 0.05],
  ];
  for (const [name, expected] of cases) {
    it(`${name} → ${expected ?? 'none'}`, () => {
      const r = scanRateFromFileName(name);
      if (expected === null) expect(r).toBeNull();
      else expect(r?.scanRateVPerS).toBeCloseTo(expected, 12);
    });
  }
});
