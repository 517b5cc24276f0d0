/**
 * Test and benchmark support: a simulated voltammogram (this project's simulator) wrapped as a
 * Voltammogram with its sweeps, optionally with seeded Gaussian noise added to the current.
 * Noise: seeded Gaussian deviates (../random/seededGaussian).
 */
import { simulateCv, type CvSimulationInput } from '../simulation';
import { findSweepSegments } from '../sweeps/findSweepSegments';
import type { Voltammogram } from '../types';
import { seededGaussian } from '../random/seededGaussian';

export { seededGaussian };

export interface SimulatedVoltammogramOptions {
  /** Standard deviation of added white noise (A). @default 0 */
  noiseA?: number;
  /** Seed of the noise. @default 1 */
  seed?: number;
  /** Further simulations whose currents are added (independent couples in solution). */
  extra?: Partial<CvSimulationInput>[];
}

/** Simulates, adds the extra couples and the noise, and splits into sweeps. */
export function simulatedVoltammogram(input: Partial<CvSimulationInput>, options: SimulatedVoltammogramOptions = {}): Voltammogram {
  const r = simulateCv(input);
  const currentA = Float64Array.from(r.currentA);
  for (const more of options.extra ?? []) {
    const e = simulateCv({ ...input, ...more, doubleLayerFPerCm2: 0 });
    for (let k = 0; k < currentA.length; k++) currentA[k]! += e.faradaicCurrentA[k]!;
  }
  const noise = options.noiseA ?? 0;
  if (noise > 0) {
    const g = seededGaussian(options.seed ?? 1);
    for (let k = 0; k < currentA.length; k++) currentA[k]! += noise * g();
  }
  const split = findSweepSegments(r.potentialV);
  return {
    potentialV: r.potentialV,
    currentA,
    timeS: r.timeS,
    segments: split.segments,
    cycles: split.cycles,
    scanRateVPerS: input.scanRateVPerS ?? 0.1,
    scanRateSource: 'option',
  };
}
