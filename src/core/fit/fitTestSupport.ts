/**
 * Helpers for the fit's own tests and benchmarks (not part of the public surface): seeded noisy
 * voltammograms from the project's simulator (validated against Nicholson & Shain 1964,
 * Nicholson 1965, Laviron 1979 and Bard & Faulkner in src/core/simulation/*.test.ts), a standard
 * cell, and a lookup of one estimate.
 */
import { seededGaussian } from '../random/seededGaussian';
import { simulateCvCouples, type CoupleInput, type CvSimulationInput } from '../simulation';
import { findSweepSegments } from '../sweeps/findSweepSegments';
import type { Voltammogram } from '../types';
import type { FitCell, FitResult, ParameterEstimate } from './fitTypes';

/** A 3 mm disk, 1 mM, n = 1, 25 °C. */
export const TEST_CELL: FitCell = { areaCm2: 0.0707, concentrationMolPerCm3: 1e-6, electronCount: 1, temperatureK: 298.15 };

/**
 * One simulated voltammogram per scan rate, with Gaussian noise of standard deviation
 * `noiseFraction` × its largest |current| (seeded).
 */
export function noisyVoltammograms(cell: Partial<CvSimulationInput>, couples: Partial<CoupleInput>[], scanRatesVPerS: number[], noiseFraction = 0.005, seed = 7): Voltammogram[] {
  const g = seededGaussian(seed);
  return scanRatesVPerS.map((v) => {
    const r = simulateCvCouples({ ...cell, scanRateVPerS: v }, couples);
    let peak = 0;
    for (const x of r.currentA) peak = Math.max(peak, Math.abs(x));
    const currentA = r.currentA.map((x) => x + noiseFraction * peak * g());
    const { segments, cycles } = findSweepSegments(r.potentialV);
    return { potentialV: r.potentialV, currentA, timeS: r.timeS, segments, cycles, scanRateVPerS: v, scanRateSource: 'time' };
  });
}

/** The estimate of `parameter` for couple `couple` (null for a shared parameter). */
export function estimateOf(r: FitResult, parameter: ParameterEstimate['parameter'], couple: number | null = 0): ParameterEstimate {
  const shared = parameter === 'uncompensatedOhm' || parameter === 'doubleLayerFPerCm2';
  const e = r.parameters.find((p) => p.parameter === parameter && p.couple === (shared ? null : couple));
  if (!e) throw new Error(`no estimate of ${parameter} for couple ${couple}`);
  return e;
}

/** |a/b − 1|. */
export const relativeError = (a: number, b: number): number => Math.abs(a / b - 1);
