/**
 * Test input shared by the store tests and the browser flows: a Nernstian one-electron couple
 * from our own simulator (1 mM, 0.0707 cm², D = 1e-5 cm²/s, E°′ = 0 V, +0.3 → −0.3 → +0.3 V),
 * written as a CSV export with time, potential and current columns.
 */
import { simulateCv } from '../core/simulation';
import { analyzeSeries } from '../core/analysis/analyzeSeries';
import { fakeAnalysis } from '../core/analysis/seriesTestSupport';
import type { SeriesCouple } from '../core/analysis/seriesTypes';

export function simulatedCsv(scanRateVPerS = 0.1, header = 'Time (s),Potential (V),Current (A)', potentialFactor = 1): string {
  const sim = simulateCv({ k0CmPerS: Infinity, scanRateVPerS });
  const rows = [header];
  for (let i = 0; i < sim.potentialV.length; i++) rows.push(`${sim.timeS[i]},${(sim.potentialV[i] as number) * potentialFactor},${sim.currentA[i]}`);
  return `${rows.join('\n')}\n`;
}

/** The simulator's trace of the same couple at `scanRateVPerS` (for the UI's plot-builder tests). */
export function simulatedTrace(scanRateVPerS: number): { potentialV: Float64Array; currentA: Float64Array } {
  const sim = simulateCv({ k0CmPerS: Infinity, scanRateVPerS });
  return { potentialV: sim.potentialV, currentA: sim.currentA };
}

/** The core's least-squares line, for the UI's plot-builder tests. */
export { fitLine } from '../core/regression/fitLine';

/** A series couple of replicate files at one scan rate (forward ip at 0.1 V/s, A), for the UI's plot-builder tests. */
export function oneRateSeriesCouple(ipsA: number[]): SeriesCouple {
  const files = ipsA.map((ip, i) => ({ fileName: `rep${i}`, scanRateVPerS: 0.1, analysis: fakeAnalysis([{ epaV: 0.0295, epcV: -0.0295, ipaA: ip, ipcA: ip }]) }));
  return analyzeSeries(files, { areaCm2: 0.0707, concentrationMolPerCm3: 1e-6 }).couples[0]!;
}
