import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { thermalVoltageV } from '../constants';
import { irreversibleRateConstant } from './irreversibleRateConstant';

/** Peak potentials from Wang (2000) eq. 2-5, for both branches. */
function peaks(e0: number, k0: number, d: number, v: number, alpha: number): { epaV: number; epcV: number } {
  const rt = thermalVoltageV(298.15);
  const g = (a: number) => 0.78 + Math.log(Math.sqrt(d) / k0) + 0.5 * Math.log((a * v) / rt);
  return { epcV: e0 - (rt / alpha) * g(alpha), epaV: e0 + (rt / (1 - alpha)) * g(1 - alpha) };
}

describe('irreversibleRateConstant', () => {
  // Wang, Analytical Electrochemistry 2nd ed. (2000), eq. 2-5: the cathodic peak sits
  // (RT/αF)(0.780 + ln(D^½/k°) + ½ ln(αFv/RT)) below E°′; solving both branches returns k° and E°′.
  it('inverts eq. 2-5 for α = 0.5 and α = 0.3', () => {
    for (const alpha of [0.5, 0.3]) {
      const p = peaks(0.1, 1e-5, 1e-5, 0.1, alpha);
      const r = irreversibleRateConstant({ ...p, scanRateVPerS: 0.1, diffusionOxCm2PerS: 1e-5 }, { alpha });
      expect(r.k0CmPerS).toBeCloseTo(1e-5, 12);
      expect(r.formalPotentialV).toBeCloseTo(0.1, 10);
    }
  });
  // Same equation, by hand: for α = 0.5 the cathodic offset is 2RT/F·(0.780 + ln(D^½/k°) + ½ ln(Fv/2RT)).
  it('matches a hand evaluation of the cathodic offset', () => {
    const rt = thermalVoltageV(298.15);
    const offset = 2 * rt * (0.78 + Math.log(Math.sqrt(1e-5) / 1e-5) + 0.5 * Math.log(0.1 / (2 * rt)));
    expect(peaks(0, 1e-5, 1e-5, 0.1, 0.5).epcV).toBeCloseTo(-offset, 12);
  });
  it('refuses couples inside Nicholson\'s range', () => {
    expect(() => irreversibleRateConstant({ epaV: 0.05, epcV: -0.05, scanRateVPerS: 0.1, diffusionOxCm2PerS: 1e-5 })).toThrow(AnalysisError);
  });
});
