import { describe, expect, it } from 'vitest';
import { combinedDiffusionInterval } from './combinedDiffusionInterval';

// JCGM 100:2008 (GUM) §5.1.6: for D ∝ s²/(A²C²) the relative uncertainties add in quadrature
// with sensitivity 2; §G.4 Welch–Satterthwaite; coverage factor k = t₀.₉₇₅(ν_eff).
describe('combinedDiffusionInterval', () => {
  it('only A and C uncertain (slope exact): k = 1.96, u(D)/D = 2·√(0.02² + 0.02²) = 5.657 %', () => {
    const [lo, hi] = combinedDiffusionInterval({ diffusionCm2PerS: 1e-5, slopeRelativeStdError: 0, slopeDegreesOfFreedom: 4, areaRelativeUncertainty: 0.02, concentrationRelativeUncertainty: 0.02 }) as [number, number];
    const u = 2 * Math.hypot(0.02, 0.02);
    expect(hi / 1e-5 - 1).toBeCloseTo(1.959964 * u, 6);
    expect(1 - lo / 1e-5).toBeCloseTo(1.959964 * u, 6);
  });
  it('slope only (A, C exact): the regression interval, k = t(0.975, 4) = 2.7764', () => {
    const [, hi] = combinedDiffusionInterval({ diffusionCm2PerS: 1, slopeRelativeStdError: 0.01, slopeDegreesOfFreedom: 4, areaRelativeUncertainty: 0, concentrationRelativeUncertainty: 0 }) as [number, number];
    expect(hi - 1).toBeCloseTo(2.776445 * 0.02, 5);
  });
  it('both: wider than either alone; null without a slope standard error', () => {
    const both = combinedDiffusionInterval({ diffusionCm2PerS: 1, slopeRelativeStdError: 0.01, slopeDegreesOfFreedom: 4, areaRelativeUncertainty: 0.02, concentrationRelativeUncertainty: 0.02 }) as [number, number];
    expect(both[1] - 1).toBeGreaterThan(1.959964 * 2 * Math.hypot(0.02, 0.02));
    expect(combinedDiffusionInterval({ diffusionCm2PerS: 1, slopeRelativeStdError: null, slopeDegreesOfFreedom: 0, areaRelativeUncertainty: 0.02, concentrationRelativeUncertainty: 0.02 })).toBeNull();
    expect(() => combinedDiffusionInterval({ diffusionCm2PerS: Number.NaN, slopeRelativeStdError: 0.01, slopeDegreesOfFreedom: 4, areaRelativeUncertainty: 0.02, concentrationRelativeUncertainty: 0.02 })).toThrow();
  });
});
