/**
 * A simulated cyclic voltammogram in the core's Voltammogram shape, ready for the analysis code
 * (used as a test oracle and for overlaying theory on a measurement). Sweeps and cycles are split
 * by findSweepSegments exactly as for an imported file; the scan rate is the simulated one.
 */
import { findSweepSegments } from '../sweeps/findSweepSegments';
import type { Voltammogram } from '../types';
import { simulateCv } from './simulateCv';
import { DEFAULT_SIMULATION, type CvSimulationInput, type SimulateCvOptions } from './simulationTypes';

export function simulatedVoltammogram(input: Partial<CvSimulationInput>, options: SimulateCvOptions = {}): Voltammogram {
  const r = simulateCv(input, options);
  const { segments, cycles } = findSweepSegments(r.potentialV);
  return {
    potentialV: r.potentialV,
    currentA: r.currentA,
    timeS: r.timeS,
    segments,
    cycles,
    scanRateVPerS: input.scanRateVPerS ?? DEFAULT_SIMULATION.scanRateVPerS,
    scanRateSource: 'time',
  };
}
