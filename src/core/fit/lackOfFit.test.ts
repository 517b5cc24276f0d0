/**
 * The lack-of-fit note. Inputs: the project's simulator (validated against Nicholson & Shain
 * 1964 in src/core/simulation/*.test.ts), seeded noise.
 */
import { describe, expect, it } from 'vitest';
import { noisyVoltammograms, TEST_CELL } from './fitTestSupport';
import { fitVoltammograms } from './fitVoltammograms';
import { durbinWatson } from './lackOfFit';

const WAVE = { startV: 0.4, switchV: -0.4, stepV: 0.001, doubleLayerFPerCm2: 20e-6 };
const COUPLE = { formalPotentialV: 0, k0CmPerS: 0.02, alpha: 0.5, diffusionOCm2PerS: 1e-5, diffusionRCm2PerS: 1e-5 };

describe('lackOfFit', () => {
  // J. Durbin, G. S. Watson, Biometrika 37 (1950) 409: d = Σ(e_k − e_{k−1})²/Σe_k². By hand:
  // alternating signs (1, −1, 1, −1) give 12/4 = 3; a constant residual gives 0.
  it('Durbin–Watson d by hand: 3 for alternating residuals, 0 for constant ones', () => {
    expect(durbinWatson([1, -1, 1, -1])).toBeCloseTo(3, 12);
    expect(durbinWatson([2, 2, 2, 2])).toBe(0);
  });

  // Common practice, no source: residuals of the right model are noise (d near 2, rms near the
  // noise), so no note; R_u = 300 Ω left out of the model (ΔEp widened by about 2·ip·R_u, Bard &
  // Faulkner 2nd ed. §1.3.4, from memory) leaves a smooth misfit that must be named.
  it('the right model gives no note; a model without the 300 Ω of R_u gets the systematic-misfit note', () => {
    const right = noisyVoltammograms(WAVE, [COUPLE], [0.1, 1], 0.002);
    const fitRight = fitVoltammograms({ records: right, cell: TEST_CELL }, { profile: false });
    expect(fitRight.notes.some((n) => n.startsWith('systematic misfit'))).toBe(false);
    const ohmic = noisyVoltammograms({ ...WAVE, uncompensatedOhm: 300 }, [COUPLE], [0.1, 1], 0.002);
    const fitOhmic = fitVoltammograms({ records: ohmic, cell: TEST_CELL }, { profile: false });
    const note = fitOhmic.notes.find((n) => n.startsWith('systematic misfit'));
    expect(note).toBeDefined();
    expect(note).toMatch(/uncompensated resistance/);
    expect(note).toMatch(/intervals and bounds do not hold/);
  });
});
