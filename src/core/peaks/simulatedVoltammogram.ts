/**
 * Test and benchmark support: a simulated voltammogram (this project's simulator) wrapped as a
 * Voltammogram with its sweeps, optionally with seeded Gaussian noise added to the current.
 * Noise: mulberry32 uniform generator (public-domain snippet by T. Ettinger, from memory) and the
 * Box–Muller transform (G. E. P. Box, M. E. Muller, Ann. Math. Statist. 29 (1958) 610).
 */
import { simulateCv, type CvSimulationInput } from '../simulation';
import { findSweepSegments } from '../sweeps/findSweepSegments';
import type { Voltammogram } from '../types';

/** Seeded standard normal deviates. */
export function seededGaussian(seed: number): () => number {
  let state = seed >>> 0;
  const uniform = () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return () => Math.sqrt(-2 * Math.log(Math.max(uniform(), 1e-300))) * Math.cos(2 * Math.PI * uniform());
}

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
