import { describe, expect, it } from 'vitest';
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, STANDARD_TEMPERATURE_K } from '../constants';
import { irreversibleSurfaceCurrentA, nernstianSurfaceCurrentA } from './surfaceWaveCurrent';

const f = FARADAY_C_PER_MOL / (GAS_CONSTANT_J_PER_MOL_K * STANDARD_TEMPERATURE_K);
const base = { chargeC: 1e-6, scanRateVPerS: 0.1, electronCount: 1, potentialV: 0, epV: 0, direction: 'positive' as const };

/** ∫ i dE / v over a wide span (trapezoids, 0.1 mV). */
function charge(i: (e: number) => number): number {
  let q = 0;
  for (let e = -1; e < 1; e += 1e-4) q += ((i(e) + i(e + 1e-4)) / 2) * 1e-4;
  return q / base.scanRateVPerS;
}

describe('surfaceWaveCurrent', () => {
  // Laviron 1974 / Bard & Faulkner 2nd ed. §14.3: peak nFQv/4RT, FWHM 4·ln(1+√2)·RT/nF = 90.6 mV,
  // and the wave's charge is Q.
  it('Nernstian film: peak, width and charge', () => {
    const at = (e: number) => nernstianSurfaceCurrentA({ ...base, potentialV: e });
    expect(at(0) / ((f * 1e-6 * 0.1) / 4)).toBeCloseTo(1, 12);
    const half = (4 * Math.log(1 + Math.SQRT2)) / f / 2;
    expect(at(half) / at(0)).toBeCloseTo(0.5, 10);
    expect(charge(at) / 1e-6).toBeCloseTo(1, 5);
    expect(nernstianSurfaceCurrentA({ ...base, potentialV: 5 })).toBeLessThan(1e-80);
  });
  // Laviron, J. Electroanal. Chem. 101 (1979) 19: irreversible peak αnF·Q·v/(e·RT), and the charge is Q.
  it('irreversible film: peak αnFQv/(eRT), charge Q, collapse beyond the peak', () => {
    const at = (e: number, direction: 'positive' | 'negative' = 'positive') => irreversibleSurfaceCurrentA({ ...base, potentialV: e, direction, alphaN: 0.3 });
    expect(at(0) / ((0.3 * f * 1e-6 * 0.1) / Math.E)).toBeCloseTo(1, 12);
    expect(charge((e) => at(e)) / 1e-6).toBeCloseTo(1, 4);
    expect(charge((e) => at(e, 'negative')) / 1e-6).toBeCloseTo(1, 4);
    // The foot lies before the peak along the sweep: negative of Ep on the positive-going sweep.
    expect(at(-0.1)).toBeGreaterThan(at(0.1));
    expect(at(0.1, 'negative')).toBeGreaterThan(at(-0.1, 'negative'));
  });
});
