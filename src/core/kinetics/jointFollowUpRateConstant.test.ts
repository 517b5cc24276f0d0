import { describe, expect, it } from 'vitest';
import { inverseThermalVoltagePerV } from '../constants';
import { followUpRatioCurve } from './followUpRateConstant';
import { jointFollowUpRateConstant } from './jointFollowUpRateConstant';

const nf = inverseThermalVoltagePerV(298.15);

describe('jointFollowUpRateConstant', () => {
  // Nicholson & Shain (1964, from memory): the ratio depends on λ = k_f·RT/(nFv) only. Ratios read off
  // the working curve at grid points λ = 0.1, 0.03, 0.01 for k_f = 0.1·nF(0.1 V/s)/RT must give that k_f
  // back (to the golden-section precision), with a closed interval.
  it('returns the k_f behind three ratios of the working curve', () => {
    const curve = followUpRatioCurve(0.3);
    const at = (l: number) => curve.ratios[curve.lambdas.indexOf(l)]!;
    const kf = 0.1 * nf * 0.1;
    const files = [[0.1, 0.1], [0.03, 0.1 / 0.03 * 0.1], [0.01, 1]].map(([l, v]) => ({ ratio: at(l!), switchPastHalfWaveV: 0.3, scanRateVPerS: v! }));
    const r = jointFollowUpRateConstant(files);
    expect(Math.abs(r.rateConstantPerS! / kf - 1)).toBeLessThan(1e-3);
    expect(r.intervalPerS![0]).toBeLessThan(kf);
    expect(r.intervalPerS![1]).toBeGreaterThan(kf);
  });
  // Ratios on the flat end (λ ≥ 5) only bound k_f from below.
  it('gives a lower bound when every ratio sits on the flat end', () => {
    const curve = followUpRatioCurve(0.3);
    const flat = curve.ratios[curve.ratios.length - 1]!;
    const r = jointFollowUpRateConstant([0.1, 1].map((v) => ({ ratio: flat, switchPastHalfWaveV: 0.3, scanRateVPerS: v })));
    expect(r.rateConstantPerS).toBeNull();
    expect(r.lowerBoundPerS).toBeGreaterThan(0);
  });
  it('refuses an empty series', () => {
    expect(() => jointFollowUpRateConstant([])).toThrow(/at least one file/);
  });
});
