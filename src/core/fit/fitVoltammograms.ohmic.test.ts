/**
 * A reversible couple with R_u = 120 Ω and R_u free, over three scan rates (5 mM, so the ohmic
 * drop reaches ~50 mV at 2 V/s). Oracle: the validated simulator (Nicholson & Shain, Anal. Chem.
 * 36 (1964) 706 for the Nernstian wave; Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001)
 * §1.3 for the series R_u). Statistics: profile t of D. M. Bates, D. G. Watts, Nonlinear
 * Regression Analysis and Its Applications, Wiley (1988), §6.1.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { estimateOf, noisyVoltammograms, relativeError, TEST_CELL } from './fitTestSupport';
import type { FitResult } from './fitTypes';
import { fitVoltammograms } from './fitVoltammograms';

describe('fitVoltammograms: reversible couple, R_u = 120 Ω fitted', () => {
  let r: FitResult;
  beforeAll(() => {
    const records = noisyVoltammograms({ startV: 0.4, switchV: -0.4, stepV: 0.002, doubleLayerFPerCm2: 20e-6, uncompensatedOhm: 120 },
      [{ k0CmPerS: Infinity, concentrationOMolPerCm3: 5e-6, formalPotentialV: 0 }], [0.1, 0.5, 2]);
    const free = ['formalPotentialV', 'k0CmPerS', 'alpha', 'diffusionOCm2PerS', 'uncompensatedOhm', 'doubleLayerFPerCm2'] as const;
    r = fitVoltammograms({ records, cell: { ...TEST_CELL, concentrationMolPerCm3: 5e-6 } }, { free: [...free] });
  });

  it('R_u within 30 % of 120 Ω (issue tolerance) and D within 5 % of 1e-5 cm²/s', () => {
    expect(r.converged).toBe(true);
    expect(relativeError(estimateOf(r, 'uncompensatedOhm').value, 120)).toBeLessThan(0.3);
    expect(relativeError(estimateOf(r, 'diffusionOCm2PerS').value, 1e-5)).toBeLessThan(0.05);
  });

  // Bates & Watts (1988) §6.1: where the sum of squares flattens on one side, the profile-t
  // interval is open on that side; k° is then a lower bound, never a number.
  it('k° is a lower bound from the profile (open upper end), and the note says so in words', () => {
    const k0 = estimateOf(r, 'k0CmPerS');
    expect(k0.status).toBe('lower-bound');
    expect(k0.intervalMethod).toBe('profile');
    expect(k0.interval?.[1]).toBeNull();
    // Matsuda & Ayabe (1955), as in Bard & Faulkner 2nd ed. §6.5 (from memory): reversible for
    // Λ = k°/√(D·Fv/RT) ≥ 15, i.e. k° ≳ 0.4 cm/s at 2 V/s; the bound must not claim less than ~0.1 cm/s.
    expect(k0.interval?.[0]).toBeGreaterThan(0.1);
    expect(r.notes.some((n) => /^k° > [\d.]+ cm\/s at 95 %/.test(n))).toBe(true);
  });

  // The other values come from the fit at the reversible limit (k° held, so it leaves the
  // correlation matrix); the trade-off the fit with k° free showed is still stated, with its number.
  it('states the R_u–k° trade-off with its correlation, and that α is not determined', () => {
    const note = r.notes.find((n) => n.includes('R_u and k° trade off'));
    const rho = Number(/correlation ([-\d.]+)/.exec(note ?? '')?.[1]);
    expect(Math.abs(rho)).toBeGreaterThan(0.8);
    expect(r.notes.some((n) => n.startsWith('the other values are those of the fit at the reversible limit'))).toBe(true);
    expect(r.correlation.labels).not.toContain('k0CmPerS[1]');
    expect(r.correlation.labels).toContain('uncompensatedOhm');
    expect(estimateOf(r, 'alpha').status).toBe('undetermined');
  });
});
