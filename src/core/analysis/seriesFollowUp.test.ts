/**
 * Follow-up chemistry (EC) recognised on the series, on series simulated with this project's
 * simulator (EC mechanism, validated against Nicholson & Shain's kinetic-zone peak in
 * simulateCv.ec.test.ts) with known k_f and D = 1e-5 cm²/s, charging 20 µF/cm² and noise.
 * Source: R. S. Nicholson, I. Shain, Anal. Chem. 36 (1964) 706 (from memory): the return/forward
 * ratio depends on λ = k_f·RT/(nFv) and rises towards 1 as v rises; in the pure kinetic zone the
 * forward peak moves 29.6/n mV per decade, |Ep − Ep/2| = 1.857RT/nF and the current function is
 * 0.4958 instead of 0.4463.
 */
import { describe, expect, it } from 'vitest';
import { analyseSimulatedSeries } from './simulatedSeries';

const cell = { areaCm2: 0.0707, concentrationMolPerCm3: 1e-6 };
const ec = (kf: number) => ({ mechanism: 'EC' as const, k0CmPerS: 1, followUpRatePerS: kf, startV: 0.4, switchV: -0.35, stepV: 0.001, doubleLayerFPerCm2: 2e-5 });
const inRange = (r: [number, number] | null | undefined, truth: number) => !!r && r[0] <= truth && truth <= r[1];

describe('a follow-up reaction that shows only at the slow rates', () => {
  // Issue case: ratio from ~0.3 at the slowest rate to ~0.95 at the fastest; half the files look
  // reversible, so a majority vote missed it. One k_f must explain all ratios.
  it('k_f = 0.15 1/s over 0.02–1 V/s: chemically coupled, k_f within 10 %, D within 3 %', () => {
    const { couple } = analyseSimulatedSeries(ec(0.15), [0.02, 0.05, 0.2, 0.5, 1], cell, { noiseA: 5e-9 });
    const ratios = couple.points.map((p) => p.nicholsonRatio!);
    expect(Math.min(...ratios)).toBeLessThan(0.4);
    expect(Math.max(...ratios)).toBeGreaterThan(0.9);
    expect(couple.verdict.category).toBe('chemically-coupled');
    expect(couple.followUp?.evidence.join(' ')).toMatch(/rises with scan rate/);
    expect(Math.abs(couple.followUp!.rateConstantPerS! / 0.15 - 1)).toBeLessThan(0.1);
    expect(inRange(couple.followUp?.rangePerS, 0.15)).toBe(true);
    expect(Math.abs(couple.diffusion!.diffusionCm2PerS / 1e-5 - 1)).toBeLessThan(0.03);
    expect(couple.rateConstant?.status).toBe('cannot-tell');
  });
});

describe('a fast follow-up reaction in or near the kinetic zone', () => {
  // Issue case: k_f = 50 1/s, return peak gone; it was read as reversible with D +10 % and an interval
  // that excluded the truth. Now: chemically coupled, D's range holds the truth, k_f only bounded.
  it('k_f = 50 1/s over 0.05–1 V/s: kinetic-zone signature, D range holds 1e-5, k_f lower bound below 50', () => {
    const { couple, warnings } = analyseSimulatedSeries(ec(50), [0.05, 0.1, 0.3, 1], cell, { noiseA: 5e-9 });
    expect(couple.verdict.category).toBe('chemically-coupled');
    expect(couple.followUp?.evidence.join(' ')).toMatch(/kinetic zone/);
    expect(inRange(couple.diffusion?.rangeCm2PerS, 1e-5)).toBe(true);
    expect(couple.diffusion?.status).toBe('range-only');
    expect(warnings.join(' ')).toMatch(/D cannot be separated from k_f/);
    expect(couple.followUp!.lowerBoundPerS!).toBeLessThan(50);
  });

  // Deep in the kinetic zone (λ 26–257) D sits near the 0.4958 form; the range must hold it.
  it('k_f = 500 1/s over 0.05–0.5 V/s: D range holds 1e-5 and reaches the 0.4958 form', () => {
    const { couple } = analyseSimulatedSeries(ec(500), [0.05, 0.15, 0.5], cell, { noiseA: 5e-9 });
    expect(inRange(couple.diffusion?.rangeCm2PerS, 1e-5)).toBe(true);
    expect(couple.diffusion!.rangeCm2PerS![0] / 1e-5).toBeGreaterThan(0.9);
  });
});

describe('a slow follow-up reaction and the pure kinetic zone (audit cases, our own scenarios)', () => {
  // Nicholson & Shain 1964: at λ ≈ 0.01 the ratio is about 0.9 and rises towards 1 with v. The ratio
  // lies 3 uncertainties below 1 at the slowest rate: named, with k_f from the working curve.
  it('k_f = 0.02 1/s over 0.05–5 V/s: chemically coupled, k_f within its interval, not "reversible"', () => {
    const { couple } = analyseSimulatedSeries({ ...ec(0.02), switchV: -0.25, startV: 0.3 }, [0.05, 0.2, 1, 5], cell, { noiseA: 5e-9 });
    const ratios = couple.points.map((p) => p.nicholsonRatio!);
    expect(Math.min(...ratios)).toBeGreaterThan(0.85);
    expect(Math.min(...ratios)).toBeLessThan(0.94);
    expect(couple.verdict.category).toBe('chemically-coupled');
    expect(couple.followUp?.evidence.join(' ')).toMatch(/measurably below 1/);
    expect(inRange(couple.followUp?.rangePerS, 0.02)).toBe(true);
  });
  // No reaction (k_f → 0): the ratios stay near 1 and nothing is named.
  it('a reversible couple without chemistry stays reversible', () => {
    const { couple } = analyseSimulatedSeries({ mechanism: 'E' as const, k0CmPerS: 1, startV: 0.3, switchV: -0.25, stepV: 0.001, doubleLayerFPerCm2: 2e-5 }, [0.05, 0.2, 1, 5], cell, { noiseA: 5e-9 });
    expect(couple.followUp).toBeNull();
    expect(couple.verdict.category).toBe('reversible');
  });
  // Pure kinetic zone (λ 10–1000): the zone agrees with the evidence, and the bound from the fastest
  // file's width (followUpPeakWidth.ts) is far tighter than λ > 0.2 and still below the truth.
  it('k_f = 2000 1/s over 0.05–5 V/s: zone "kinetic", k_f > several hundred 1/s, below 2000', () => {
    const { couple } = analyseSimulatedSeries(ec(2000), [0.05, 0.2, 1, 5], cell, { noiseA: 5e-9 });
    expect(couple.followUp?.zone).toBe('kinetic');
    expect(couple.followUp!.lowerBoundPerS!).toBeGreaterThan(300);
    expect(couple.followUp!.lowerBoundPerS!).toBeLessThan(2000);
    expect(couple.followUp?.evidence.join(' ')).toMatch(/working curve of width/);
  });
});
