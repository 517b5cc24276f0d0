/**
 * Two couples 150 mV apart in one voltammogram (a mixture of two species, each 1 mM), with
 * seeded noise, charging and R_u. Oracle: the validated simulator (Nicholson & Shain, Anal.
 * Chem. 36 (1964) 706; Nicholson, Anal. Chem. 37 (1965) 1351) through simulateCvCouples, whose
 * superposition and single ohmic drop are tested in src/core/simulation/simulateCvCouples.test.ts
 * (Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001), §1.3 and §6.6).
 * Statistics: Bates & Watts, Nonlinear Regression Analysis (1988); Marquardt, J. SIAM 11 (1963) 431.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { estimateOf, noisyVoltammograms, relativeError, TEST_CELL } from './fitTestSupport';
import type { FitResult } from './fitTypes';
import { fitVoltammograms } from './fitVoltammograms';

const WAVEFORM = { startV: 0.4, switchV: -0.4, stepV: 0.001, uncompensatedOhm: 30, doubleLayerFPerCm2: 20e-6 };
const UPPER = { formalPotentialV: 0.075, k0CmPerS: 0.05, diffusionOCm2PerS: 1e-5, diffusionRCm2PerS: 1e-5 };
const LOWER = { formalPotentialV: -0.075, k0CmPerS: 0.02, diffusionOCm2PerS: 6e-6, diffusionRCm2PerS: 6e-6 };

describe('fitVoltammograms: two couples 150 mV apart in one record', () => {
  let r: FitResult;
  beforeAll(() => {
    const records = noisyVoltammograms(WAVEFORM, [UPPER, LOWER], [0.1]);
    r = fitVoltammograms({ records, cell: TEST_CELL }, { coupleCount: 2, start: { shared: { uncompensatedOhm: 30 } } });
  });

  it('each E°′ within 3 mV and each D within 10 %; couples come back in order of E°′', () => {
    expect(r.converged).toBe(true);
    expect(r.values.couples.map((c) => c.formalPotentialV)).toEqual([...r.values.couples.map((c) => c.formalPotentialV)].sort((a, b) => a - b));
    expect(Math.abs(estimateOf(r, 'formalPotentialV', 0).value + 0.075)).toBeLessThan(0.003);
    expect(Math.abs(estimateOf(r, 'formalPotentialV', 1).value - 0.075)).toBeLessThan(0.003);
    expect(relativeError(estimateOf(r, 'diffusionOCm2PerS', 0).value, 6e-6)).toBeLessThan(0.1);
    expect(relativeError(estimateOf(r, 'diffusionOCm2PerS', 1).value, 1e-5)).toBeLessThan(0.1);
  });

  it('the second couple starts from the peak analysis even though it sits on the first one\'s diffusion tail', () => {
    expect(r.start.couples).toHaveLength(2);
    expect(Math.abs((r.start.couples[0]?.formalPotentialV ?? 0) + 0.075)).toBeLessThan(0.01);
    expect(Math.abs((r.start.couples[1]?.formalPotentialV ?? 0) - 0.075)).toBeLessThan(0.01);
  });

  it('labels the correlation matrix per couple (1-based) and shared parameters without an index', () => {
    expect(r.correlation.labels).toContain('formalPotentialV[1]');
    expect(r.correlation.labels).toContain('formalPotentialV[2]');
    expect(r.correlation.labels).toContain('doubleLayerFPerCm2');
  });
});
