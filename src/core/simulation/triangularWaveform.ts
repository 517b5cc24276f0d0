/**
 * Applied potential of a cyclic voltammogram: start → switch → start, repeated for each cycle,
 * at a constant scan rate, sampled at equal potential increments.
 * In: startV, switchV (V), scanRateVPerS, requested stepV (V), cycles.
 * Out: output points with timeS and potentialV; the step is adjusted to the nearest value that
 *   divides |switchV − startV| exactly, so both vertices are output points and the potential is
 *   exactly linear between neighbouring points.
 */
import { AnalysisError } from '../errors';

export interface TriangularWaveform {
  timeS: Float64Array;
  potentialV: Float64Array;
  /** Output intervals per sweep (half cycle). */
  pointsPerSweep: number;
  /** Time between output points, s. */
  intervalS: number;
}

/** Largest number of output points a single simulation may produce. */
export const MAX_OUTPUT_POINTS = 2_000_000;

export function triangularWaveform(startV: number, switchV: number, scanRateVPerS: number, stepV: number, cycles: number): TriangularWaveform {
  const span = Math.abs(switchV - startV);
  const pointsPerSweep = Math.max(1, Math.round(span / stepV));
  const total = 2 * cycles * pointsPerSweep + 1;
  if (total > MAX_OUTPUT_POINTS) {
    throw new AnalysisError('BAD_OPTION', `stepV = ${stepV} V over ${cycles} cycle(s) of ${span} V gives ${total} points (limit ${MAX_OUTPUT_POINTS})`);
  }
  const increment = (switchV - startV) / pointsPerSweep;
  const intervalS = Math.abs(increment) / scanRateVPerS;
  const timeS = new Float64Array(total);
  const potentialV = new Float64Array(total);
  for (let k = 0; k < total; k++) {
    const inSweep = k % (2 * pointsPerSweep);
    const along = inSweep <= pointsPerSweep ? inSweep : 2 * pointsPerSweep - inSweep;
    timeS[k] = k * intervalS;
    potentialV[k] = startV + along * increment;
  }
  return { timeS, potentialV, pointsPerSweep, intervalS };
}
