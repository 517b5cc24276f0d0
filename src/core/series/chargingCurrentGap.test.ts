import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { findSweepSegments } from '../sweeps/findSweepSegments';
import type { Voltammogram } from '../types';
import { chargingCurrentGap } from './chargingCurrentGap';

/** A pure capacitor swept 0 → 1 → 0 V: i = ±A·Cd·v (Bard & Faulkner 2nd ed. §1.2). */
function capacitorCv(icA: number): Voltammogram {
  const e = [0, 0.25, 0.5, 0.75, 1, 0.75, 0.5, 0.25, 0];
  const i = e.map((_, k) => (k < 4 ? icA : -icA));
  const potentialV = Float64Array.from(e);
  const split = findSweepSegments(potentialV);
  return { potentialV, currentA: Float64Array.from(i), timeS: null, ...split, scanRateVPerS: 0.1, scanRateSource: 'option' };
}

describe('chargingCurrentGap', () => {
  it('is twice the charging current of an ideal capacitor', () => {
    expect(chargingCurrentGap(capacitorCv(1.414e-7), 0.4)).toBeCloseTo(2.828e-7, 15);
  });
  it('refuses a potential outside the sweep', () => {
    expect(() => chargingCurrentGap(capacitorCv(1e-7), 1.5)).toThrow(AnalysisError);
  });
});
