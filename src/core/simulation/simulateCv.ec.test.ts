/**
 * EC mechanism: reversible electron transfer followed by a first-order decay of the product.
 */
import { describe, expect, it } from 'vitest';
import { inverseThermalVoltagePerV } from '../constants';
import { simulateCv } from './simulateCv';
import { cathodicFirstPeaks, extremeInRange } from './simulationTestSupport';

const f = inverseThermalVoltagePerV(298.15);
const v = 0.1;
const base = { k0CmPerS: Infinity, startV: 0.4, switchV: -0.4, scanRateVPerS: v };

/** |ipa/ipc| with the anodic peak measured from zero (common practice, no source). */
function ratioFromZero(kf: number): number {
  const r = simulateCv({ ...base, mechanism: 'EC', followUpRatePerS: kf });
  const half = (r.currentA.length - 1) / 2;
  const c = extremeInRange(r.potentialV, r.currentA, 0, half + 1, -1);
  const a = extremeInRange(r.potentialV, r.currentA, half, r.currentA.length, 1);
  return a.currentA / -c.currentA;
}

describe('simulateCv, EC mechanism', () => {
  it('kf → 0 reproduces the E mechanism point by point (relative 1e-9)', () => {
    const e = simulateCv({ ...base, mechanism: 'E' });
    const ec = simulateCv({ ...base, mechanism: 'EC', followUpRatePerS: 0 });
    let worst = 0;
    let scale = 0;
    for (let i = 0; i < e.currentA.length; i++) {
      worst = Math.max(worst, Math.abs((e.currentA[i] as number) - (ec.currentA[i] as number)));
      scale = Math.max(scale, Math.abs(e.currentA[i] as number));
    }
    expect(worst / scale).toBeLessThan(1e-9);
  });

  // Nicholson & Shain, Anal. Chem. 36, 706 (1964), EC case (from memory): the reverse peak
  // shrinks as kf/v grows and vanishes when the product decays before the return sweep.
  it('the return/forward peak ratio falls monotonically as kf grows and vanishes at large kf', () => {
    const ratios = [0.01, 0.1, 1, 10].map(ratioFromZero);
    for (let i = 1; i < ratios.length; i++) expect(ratios[i]).toBeLessThan(ratios[i - 1] as number);
    const r = simulateCv({ ...base, mechanism: 'EC', followUpRatePerS: 100 });
    const half = (r.currentA.length - 1) / 2;
    const { cathodic } = cathodicFirstPeaks(r);
    for (let i = half; i < r.currentA.length; i++) expect(r.currentA[i]).toBeLessThan(0.01 * -cathodic.currentA);
  });

  // Nicholson & Shain (1964) / Bard & Faulkner 2nd ed. §12.3 (from memory), pure kinetic zone of
  // the EC reaction: E_p = E_1/2 − 0.780 RT/nF + (RT/2nF)·ln λ, λ = k_f RT/(nFv); the peak then
  // has the irreversible current function 0.4958 (ratio 0.4958/0.4463 to the E peak).
  it.each([100, 1000, 10000])('kinetic zone, kf = %i /s: Ep within 1 mV of E½ − 0.780RT/F + (RT/2F) ln λ', (kf) => {
    const { cathodic } = cathodicFirstPeaks(simulateCv({ ...base, mechanism: 'EC', followUpRatePerS: kf }));
    const expected = (-0.78 + 0.5 * Math.log(kf / (f * v))) / f;
    expect(Math.abs(cathodic.potentialV - expected)).toBeLessThan(1e-3);
  });

  it('kinetic zone peak current is 0.4958/0.4463 of the E peak within 0.5 %', () => {
    const e = cathodicFirstPeaks(simulateCv({ ...base, mechanism: 'E' })).cathodic.currentA;
    const ec = cathodicFirstPeaks(simulateCv({ ...base, mechanism: 'EC', followUpRatePerS: 1e4 })).cathodic.currentA;
    expect(Math.abs(ec / e / (0.4958 / 0.4463) - 1)).toBeLessThan(0.005);
  });

  it('an oxidation-first EC run decays O and refuses a decaying species present in the bulk', () => {
    const ox = simulateCv({ ...base, mechanism: 'EC', followUpRatePerS: 10, concentrationOMolPerCm3: 0, concentrationRMolPerCm3: 1e-6, startV: -0.4, switchV: 0.4 });
    const half = (ox.currentA.length - 1) / 2;
    const forward = extremeInRange(ox.potentialV, ox.currentA, 0, half + 1, 1);
    for (let i = half; i < ox.currentA.length; i++) expect(ox.currentA[i]).toBeGreaterThan(-0.01 * forward.currentA);
    expect(() => simulateCv({ ...base, mechanism: 'EC', concentrationRMolPerCm3: 1e-6 }, { decayingSpecies: 'R' })).toThrow(/decaying species R/);
  });
});
