/**
 * When a fitted rate constant is a lower bound. Inputs: voltammograms of the project's simulator
 * (validated against Nicholson & Shain 1964 and Laviron 1979 in src/core/simulation/*.test.ts).
 */
import { describe, expect, it } from 'vitest';
import { inverseThermalVoltagePerV } from '../constants';
import { FitModel } from './fitModel';
import { ParameterLayout } from './fitParameters';
import { measuredCurrents, type FitContext } from './fitProblem';
import { prepareRecords } from './fitRecords';
import { estimateOf, noisyVoltammograms, TEST_CELL } from './fitTestSupport';
import type { FitModelValues } from './fitTypes';
import { fitVoltammograms } from './fitVoltammograms';
import { REVERSIBLE_LAMBDA, reversibleLimitCheck } from './reversibleLimitCheck';

const WAVE = { startV: 0.4, switchV: -0.4, stepV: 0.001 };
const RATES = [0.1, 1];
const couple = (k0: number) => ({ formalPotentialV: 0, k0CmPerS: k0, alpha: 0.5, diffusionOCm2PerS: 1e-5, diffusionRatio: 1, followUpRatePerS: 0, coverageMolPerCm2: 0, surfaceRatePerS: 1 });

function context(): FitContext {
  const records = noisyVoltammograms(WAVE, [{ k0CmPerS: Infinity, diffusionOCm2PerS: 1e-5, diffusionRCm2PerS: 1e-5 }], RATES, 0);
  const prepared = prepareRecords(records, { cycle: 1, electronCount: 1 }).records;
  const model = new FitModel(prepared, { mechanism: 'E', cell: TEST_CELL, electronCounts: [1], initialSpecies: 'O' }, {});
  const base: FitModelValues = { couples: [couple(1)], shared: { uncompensatedOhm: 0, doubleLayerFPerCm2: 0 } };
  return { layout: ParameterLayout.build('E', 1, ['k0CmPerS'], 298.15), model, base, background: false, measuredA: measuredCurrents(model) };
}

describe('reversibleLimitCheck', () => {
  // H. Matsuda, Y. Ayabe, Z. Elektrochem. 59 (1955) 494 (from memory): Λ = k°/(D·nFv/RT)^½,
  // reversible for Λ ≥ 15. By hand: k° = 5 cm/s, D = 1e-5 cm²/s, 1 V/s at 25 °C gives
  // Λ = 5/√(1e-5 × 38.92) = 253.
  it('k° = 5 cm/s up to 1 V/s is in the reversible zone (Λ = 253) and its peak shifts are below 1 mV', () => {
    const ctx = context();
    const check = reversibleLimitCheck(ctx, { ...ctx.base, couples: [couple(5)] }, 0, 'k0CmPerS');
    expect(check).not.toBeNull();
    expect(check!.regimeValue).toBeCloseTo(5 / Math.sqrt(1e-5 * inverseThermalVoltagePerV(298.15)), 6);
    expect(check!.regimeValue).toBeGreaterThan(REVERSIBLE_LAMBDA);
    expect(check!.largestShiftV).toBeLessThan(check!.spacingV);
    expect(check!.reason).toMatch(/Matsuda & Ayabe/);
  });

  // Same source: Λ = 0.5 at 1 V/s for k° = 0.01 cm/s is quasi-reversible; Nicholson, Anal. Chem. 37
  // (1965) 1351: ψ = Λ/√π ≈ 0.28 puts ΔEp near 140 mV, far beyond the 1 mV point spacing.
  it('k° = 0.01 cm/s (Λ = 0.5 at 1 V/s) is a measurement', () => {
    const ctx = context();
    expect(reversibleLimitCheck(ctx, { ...ctx.base, couples: [couple(0.01)] }, 0, 'k0CmPerS')).toBeNull();
  });

  // Fit of a Nernstian couple (k° = ∞, simulated with 0.2 % noise): whatever value k° takes, it is
  // only a lower bound, α is undetermined (α does not enter a Nernstian wave: Nicholson & Shain
  // 1964), and no α interval reaches outside 0–1.
  it('a fit of a Nernstian series gives k° as a lower bound and α undetermined', () => {
    const records = noisyVoltammograms(WAVE, [{ k0CmPerS: Infinity, diffusionOCm2PerS: 1e-5, diffusionRCm2PerS: 1e-5 }], RATES, 0.002);
    const r = fitVoltammograms({ records, cell: TEST_CELL }, { free: ['formalPotentialV', 'k0CmPerS', 'alpha', 'diffusionOCm2PerS'] });
    const k0 = estimateOf(r, 'k0CmPerS');
    expect(k0.status).toBe('lower-bound');
    expect(k0.interval?.[1]).toBeNull();
    const alpha = estimateOf(r, 'alpha');
    expect(alpha.status).toBe('undetermined');
    for (const end of alpha.interval ?? []) if (end !== null) expect(end >= 0 && end <= 1).toBe(true);
    expect(r.notes.some((n) => /only a lower bound|lower limit/.test(n))).toBe(true);
  });

  // A Nernstian couple (Nicholson & Shain 1964): with k° only a lower bound, E°′ and D are those of
  // the fit with k° and α held in the reversible zone (two free parameters left), within 0.2 mV and
  // 0.2 % of the simulated values (the simulator's inputs).
  it('with k° a lower bound, E°′ and D come from the fit at the reversible limit, k° and α out of the correlation', () => {
    const records = noisyVoltammograms(WAVE, [{ k0CmPerS: Infinity, diffusionOCm2PerS: 1e-5, diffusionRCm2PerS: 1e-5, formalPotentialV: 0 }], RATES, 0.002);
    const r = fitVoltammograms({ records, cell: TEST_CELL }, { free: ['formalPotentialV', 'k0CmPerS', 'alpha', 'diffusionOCm2PerS'] });
    expect(estimateOf(r, 'k0CmPerS').status).toBe('lower-bound');
    expect(r.notes.some((n) => n.startsWith('the other values are those of the fit at the reversible limit'))).toBe(true);
    expect(r.criteria.parameterCount).toBe(2);
    expect(r.correlation.labels).toEqual(['formalPotentialV[1]', 'diffusionOCm2PerS[1]']);
    expect(Math.abs(estimateOf(r, 'formalPotentialV').value)).toBeLessThan(2e-4);
    expect(Math.abs(estimateOf(r, 'diffusionOCm2PerS').value / 1e-5 - 1)).toBeLessThan(0.002);
  });
});
