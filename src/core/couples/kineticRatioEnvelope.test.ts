import { describe, expect, it } from 'vitest';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import { analyzeVoltammogram } from '../analysis/analyzeVoltammogram';
import { kineticRatioEnvelope } from './kineticRatioEnvelope';

const coupleOf = (input: Parameters<typeof simulatedVoltammogram>[0]) => {
  const c = analyzeVoltammogram(simulatedVoltammogram(input, { noiseA: 5e-9, seed: 3 })).cycles[0]!.couples.find((x) => x.deltaEpV !== null);
  expect(c).toBeDefined();
  return c!;
};

describe('kineticRatioEnvelope', () => {
  // Hand check of the interpolation (rows of the simulated table in the header).
  it('returns 1…1 at the reversible limit, the rows exactly, and interpolates between them', () => {
    expect(kineticRatioEnvelope(0.05)).toEqual({ low: 1, high: 1 });
    expect(kineticRatioEnvelope(0.1184)).toEqual({ low: 0.82, high: 1.222 });
    const mid = kineticRatioEnvelope((0.0834 + 0.0994) / 2);
    expect(mid.low).toBeCloseTo((0.909 + 0.864) / 2, 10);
    expect(kineticRatioEnvelope(0.5)).toEqual({ low: 0.664, high: 1.339 });
  });
});

describe('classifyCouple with kinetic asymmetry against follow-up chemistry (simulator)', () => {
  // Nicholson, Anal. Chem. 37 (1965) 1351 (Table I, from memory): n·ΔEp 90–150 mV is the
  // quasi-reversible range; with α = 0.3 or 0.7 and no chemistry the verdict must stay kinetic.
  it.each([
    [0.3, 0.006],
    [0.7, 0.006],
    [0.3, 0.0025],
    [0.7, 0.0025],
  ])('E mechanism α = %f, k° = %f cm/s (ΔEp 90–160 mV): quasi-reversible, not chemically-coupled', (alpha, k0) => {
    const c = coupleOf({ k0CmPerS: k0, alpha, startV: 0.5, switchV: -0.5 });
    expect(c.deltaEpV!).toBeGreaterThan(0.09);
    expect(c.deltaEpV!).toBeLessThan(0.16);
    expect(Math.abs(c.ratio! - 1)).toBeGreaterThan(0.1);
    expect(c.verdict.category).toBe('quasi-reversible');
    if (Math.abs(c.ratio! - 1) > 0.2) expect(c.verdict.reasons.join(' ')).toMatch(/slow electron transfer alone/);
  });

  // Nicholson & Shain, Anal. Chem. 36 (1964) 706 (from memory): an EC reaction with kf·RT/(nFv)
  // of a few tenths removes much of the return peak; ratio < 0.7 is beyond any kinetic asymmetry.
  it.each([
    [1, 0.1, 1],
    [0.01, 0.1, 1.5],
  ])('EC with k° = %f cm/s, v = %f V/s, kf = %f s⁻¹: ratio < 0.7 → chemically-coupled', (k0, v, kf) => {
    const c = coupleOf({ mechanism: 'EC', k0CmPerS: k0, scanRateVPerS: v, followUpRatePerS: kf, startV: 0.5, switchV: -0.5 });
    expect(c.ratio!).toBeLessThan(0.7);
    expect(c.verdict.category).toBe('chemically-coupled');
    expect(c.verdict.reasons[0]).toMatch(/outside/);
  });
});
