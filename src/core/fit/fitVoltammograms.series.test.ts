/**
 * Joint fit of a quasi-reversible six-rate series, simulated with seeded noise (0.5 % of each
 * peak), double-layer charging and a known R_u. The simulator is the oracle: its own tests tie it
 * to Nicholson & Shain, Anal. Chem. 36 (1964) 706 (0.4463), Nicholson, Anal. Chem. 37 (1965)
 * 1351 (ψ table) and Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001) §1.2 (charging).
 * Statistics: D. M. Bates, D. G. Watts, Nonlinear Regression Analysis and Its Applications,
 * Wiley (1988); D. W. Marquardt, J. SIAM 11 (1963) 431.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { thermalVoltageV } from '../constants';
import { simulateCv } from '../simulation';
import { estimateOf, noisyVoltammograms, relativeError, TEST_CELL } from './fitTestSupport';
import type { FitResult } from './fitTypes';
import { fitVoltammograms } from './fitVoltammograms';

const RATES = [0.05, 0.1, 0.2, 0.5, 1, 2];
const WAVEFORM = { startV: 0.45, switchV: -0.35, stepV: 0.002, doubleLayerFPerCm2: 20e-6, uncompensatedOhm: 50 };
const TRUTH = { formalPotentialV: 0.05, k0CmPerS: 0.01, alpha: 0.45, diffusionOCm2PerS: 8e-6 };

describe('fitVoltammograms: quasi-reversible six-rate series (Λ = k°/√(DfV) from 2.3 to 0.36)', () => {
  let r: FitResult;
  beforeAll(() => {
    const records = noisyVoltammograms(WAVEFORM, [{ ...TRUTH, diffusionRCm2PerS: 8e-6 }], RATES);
    r = fitVoltammograms({ records, cell: TEST_CELL }, { start: { shared: { uncompensatedOhm: 50 } } });
  });

  // Tolerances of the issue; oracle: the validated simulator (Nicholson & Shain 1964; Nicholson 1965).
  it('E°′ within 2 mV, k° within 25 %, D within 5 %, α within 0.05, from starting values of the peak analysis', () => {
    expect(r.converged).toBe(true);
    expect(Math.abs(estimateOf(r, 'formalPotentialV').value - 0.05)).toBeLessThan(0.002);
    expect(relativeError(estimateOf(r, 'k0CmPerS').value, 0.01)).toBeLessThan(0.25);
    expect(relativeError(estimateOf(r, 'diffusionOCm2PerS').value, 8e-6)).toBeLessThan(0.05);
    expect(Math.abs(estimateOf(r, 'alpha').value - 0.45)).toBeLessThan(0.05);
    expect(relativeError(estimateOf(r, 'doubleLayerFPerCm2').value, 20e-6)).toBeLessThan(0.1);
    // Nothing was guessed by hand: the start is the peak analysis' (E½, Nicholson ψ, Randles–Ševčík).
    expect(Math.abs((r.start.couples[0]?.formalPotentialV ?? 0) - 0.05)).toBeLessThan(0.01);
  });

  // Bates & Watts (1988) §2.3: linearised standard errors; every free parameter is determined here.
  it('reports finite standard errors, 95 % intervals around each estimate and a symmetric correlation matrix', () => {
    const free = r.parameters.filter((p) => p.free);
    expect(free.map((p) => p.status)).toEqual(free.map(() => 'estimate'));
    for (const p of free) {
      expect(Number.isFinite(p.standardError)).toBe(true);
      expect(p.interval?.[0]).toBeLessThan(p.value);
      expect(p.interval?.[1]).toBeGreaterThan(p.value);
    }
    const m = r.correlation.matrix;
    expect(m.length).toBe(free.length);
    m.forEach((row, i) => row.forEach((x, j) => expect(x).toBeCloseTo(m[j]?.[i] as number, 6)));
    expect(r.notes).toEqual([]);
  });

  // Bates & Watts (1988) §1.3: with the right model the residual standard deviation estimates the noise.
  it('the residual standard deviation matches the added noise within 10 %, and model currents come back per voltammogram', () => {
    const sigmas = r.records.map((rec) => rec.rmsA);
    expect(r.records).toHaveLength(6);
    for (const rec of r.records) expect(rec.modelA).toHaveLength(rec.indices.length);
    const expected = Math.sqrt(r.records.reduce((s, rec, k) => s + rec.pointCount * (0.005 * peakOf(k)) ** 2, 0) / r.pointCount);
    expect(relativeError(r.residualStdA, expected)).toBeLessThan(0.1);
    expect(sigmas.every((s) => s > 0)).toBe(true);
  });
});

function peakOf(k: number): number {
  const sim = simulateCv({ ...WAVEFORM, ...TRUTH, diffusionRCm2PerS: 8e-6, scanRateVPerS: RATES[k] as number });
  return Math.max(...Array.from(sim.currentA, Math.abs));
}

describe('fitVoltammograms: D_O/D_R = 1.5 with the ratio asked free', () => {
  const truth = { ...TRUTH, diffusionOCm2PerS: 1e-5, diffusionRCm2PerS: 1e-5 / 1.5 };
  const f = 1 / thermalVoltageV(298.15);

  // Nicholson (1965): ψ = γ^α·k°/√(πD_O·a), γ = (D_O/D_R)^½; Bard & Faulkner 2nd ed. §6.2.1:
  // E½ = E°′ + (RT/2nF)·ln(D_R/D_O) (from memory). With one species in the bulk and planar diffusion
  // both follow from one exact invariance, checked here on the simulator itself.
  it('(E°′, k°, D_O/D_R) and (E°′ − (RT/2F)ln γ², k°γ^α, 1) give the same voltammogram (to 1e-4 of ip)', () => {
    const grid = { fixedGrids: [{ firstSpacingCm: 1e-5, outerEdgeCm: 0.05 }] };
    const a = simulateCv({ ...WAVEFORM, ...truth }, grid);
    const b = simulateCv({ ...WAVEFORM, ...truth, diffusionRCm2PerS: 1e-5, formalPotentialV: 0.05 - Math.log(1.5) / (2 * f), k0CmPerS: 0.01 * 1.5 ** (0.45 / 2) }, grid);
    const ip = Math.max(...Array.from(a.currentA, Math.abs));
    a.currentA.forEach((x, i) => expect(Math.abs(x - (b.currentA[i] as number))).toBeLessThan(1e-4 * ip));
  });

  it('D_O within 5 % and k° within 30 %; the ratio is reported undetermined with the reason; E°′ and k° are the equal-D equivalents', () => {
    const records = noisyVoltammograms(WAVEFORM, [truth], RATES);
    const free = ['formalPotentialV', 'k0CmPerS', 'alpha', 'diffusionOCm2PerS', 'diffusionRatio', 'doubleLayerFPerCm2'] as const;
    const r = fitVoltammograms({ records, cell: TEST_CELL }, { free: [...free], start: { shared: { uncompensatedOhm: 50 } } });
    expect(relativeError(estimateOf(r, 'diffusionOCm2PerS').value, 1e-5)).toBeLessThan(0.05);
    expect(relativeError(estimateOf(r, 'k0CmPerS').value, 0.01)).toBeLessThan(0.3);
    expect(estimateOf(r, 'diffusionRatio')).toMatchObject({ status: 'undetermined', free: true, interval: [null, null] });
    expect(r.notes.some((n) => n.startsWith('D_O/D_R cannot be told apart from E°′ and k°'))).toBe(true);
    expect(Math.abs(estimateOf(r, 'formalPotentialV').value - (0.05 - Math.log(1.5) / (2 * f)))).toBeLessThan(0.002);
    expect(relativeError(estimateOf(r, 'k0CmPerS').value, 0.01 * 1.5 ** (0.45 / 2))).toBeLessThan(0.25);
  });
});
