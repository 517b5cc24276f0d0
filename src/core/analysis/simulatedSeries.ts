/**
 * Test support: a scan-rate series simulated with this project's simulator (src/core/simulation,
 * validated against published values in its own tests), with seeded noise, run through the whole
 * analysis as a user's files would be. Used only by tests.
 */
import type { CvSimulationInput } from '../simulation';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import { analyzeRun } from './analyzeRun';
import type { CellValues, MethodOptions } from './runTypes';
import type { SeriesCouple } from './seriesTypes';

export interface SimulatedSeriesOptions {
  /** Noise standard deviation (A). @default 2e-9 */
  noiseA?: number;
  /** @default 3 */
  seed?: number;
  method?: MethodOptions;
  /** Extra current added to every file (A), as a function of potential and time. */
  extraCurrentA?: (potentialV: number, timeS: number) => number;
}

/** The first series couple of the run over the simulated files, with its run warnings. */
export function analyseSimulatedSeries(sim: Partial<CvSimulationInput>, rates: number[], cell: CellValues, options: SimulatedSeriesOptions = {}): { couple: SeriesCouple; warnings: string[] } {
  const files = rates.map((v, i) => {
    const voltammogram = simulatedVoltammogram({ ...sim, scanRateVPerS: v }, { noiseA: options.noiseA ?? 2e-9, seed: (options.seed ?? 3) + i });
    const extra = options.extraCurrentA;
    if (extra) voltammogram.currentA.forEach((c, k) => { voltammogram.currentA[k] = c + extra(voltammogram.potentialV[k]!, voltammogram.timeS![k]!); });
    return { fileName: `sim_${v}Vs`, voltammogram };
  });
  const r = analyzeRun({ files, cells: { 'series 1': cell }, ...(options.method ? { method: options.method } : {}) });
  const couple = r.series[0]?.analysis.couples[0];
  if (!couple) throw new Error('the simulated series has no couple');
  return { couple, warnings: r.warnings.map((w) => w.message) };
}
