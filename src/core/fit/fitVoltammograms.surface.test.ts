/**
 * A slow surface film (k_s = 10 s⁻¹, α = 0.4, Γ = 2e-10 mol/cm²) over four scan rates, with
 * seeded noise, charging and R_u. Oracle: the simulator's Laviron model, validated in
 * src/core/simulation/simulateCv.surface.test.ts against E. Laviron, J. Electroanal. Chem. 101
 * (1979) 19 (peak current n²F²AΓv/4RT, FWHM 90.6/n mV, large-ΔEp lines). Statistics: Bates &
 * Watts, Nonlinear Regression Analysis (1988); Marquardt, J. SIAM 11 (1963) 431.
 */
import { describe, expect, it } from 'vitest';
import { estimateOf, noisyVoltammograms, relativeError, TEST_CELL } from './fitTestSupport';
import { fitVoltammograms } from './fitVoltammograms';

describe('fitVoltammograms: slow surface film', () => {
  it('Γ within 5 %, k_s within 20 %, α within 0.05 (issue tolerances), E°′ within 2 mV', () => {
    const records = noisyVoltammograms({ startV: 0.35, switchV: -0.35, stepV: 0.002, uncompensatedOhm: 50, doubleLayerFPerCm2: 20e-6 },
      [{ mechanism: 'surface', formalPotentialV: 0, coverageMolPerCm2: 2e-10, surfaceRatePerS: 10, alpha: 0.4 }], [0.05, 0.2, 1, 5]);
    const r = fitVoltammograms({ records, cell: TEST_CELL }, { mechanism: 'surface', start: { shared: { uncompensatedOhm: 50 } } });
    expect(r.converged).toBe(true);
    expect(relativeError(estimateOf(r, 'coverageMolPerCm2').value, 2e-10)).toBeLessThan(0.05);
    expect(relativeError(estimateOf(r, 'surfaceRatePerS').value, 10)).toBeLessThan(0.2);
    expect(Math.abs(estimateOf(r, 'alpha').value - 0.4)).toBeLessThan(0.05);
    expect(Math.abs(estimateOf(r, 'formalPotentialV').value)).toBeLessThan(0.002);
    expect(estimateOf(r, 'surfaceRatePerS').status).toBe('estimate');
  });
});
