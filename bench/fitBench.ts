/**
 * Speed of the whole-curve fit (src/core/fit), measured in one run so that the ratios compare
 * like with like. Targets from the issue: a four-parameter fit of one 2,001-point voltammogram
 * in under 1 s, a joint fit of a six-rate series in under 5 s, and fit time / (evaluations × one
 * evaluation) close to 1. One evaluation is one simulation of every voltammogram of the fit on
 * the fit's frozen grids. The fit times include the error analysis (Jacobian at the optimum and
 * the check of k° at the reversible limit) and the starting values from the peak analysis, which
 * is why the ratio exceeds 1 most for the single voltammogram. Rows with a `key` carry the
 * figures other tools read (fitMs, jointFitMs).
 */
import { performance } from 'node:perf_hooks';
import { FitModel } from '../src/core/fit/fitModel';
import { prepareRecords } from '../src/core/fit/fitRecords';
import { fitStartingValues } from '../src/core/fit/fitStartingValues';
import { noisyVoltammograms, TEST_CELL } from '../src/core/fit/fitTestSupport';
import type { FitModelValues, FitResult, FitVoltammogramsOptions } from '../src/core/fit';
import { fitVoltammograms } from '../src/core/fit';
import type { Voltammogram } from '../src/core/types';
import { medianMs } from './timing';
import type { BenchRow } from './types';

/** ±0.5 V around E°′ in 1 mV steps (2,001 points), quasi-reversible, with charging and a known R_u. */
const WAVEFORM = { startV: 0.55, switchV: -0.45, stepV: 0.001, uncompensatedOhm: 50, doubleLayerFPerCm2: 20e-6 };
const TRUTH = { formalPotentialV: 0.05, k0CmPerS: 0.01, alpha: 0.45, diffusionOCm2PerS: 8e-6, diffusionRCm2PerS: 8e-6 };
const SERIES_RATES = [0.05, 0.1, 0.2, 0.5, 1, 2];

interface Case {
  label: string;
  key: string;
  targetMs: number;
  records: Voltammogram[];
  options: FitVoltammogramsOptions;
}

/** Time of one evaluation: every record simulated once on frozen grids, at the fitted values. */
function evaluationMs(records: Voltammogram[], values: FitModelValues): number {
  const prepared = prepareRecords(records, { cycle: 1, electronCount: 1 }).records;
  const model = new FitModel(prepared, { mechanism: 'E', cell: TEST_CELL, electronCounts: [1], initialSpecies: 'O' }, {});
  model.freezeGrids(values);
  const out = new Float64Array(model.pointCount);
  return medianMs(() => model.evaluate(values, out), 9, 2);
}

function caseRows(c: Case): BenchRow[] {
  let result: FitResult | null = null;
  const ms = medianMs(() => { result = fitVoltammograms({ records: c.records, cell: TEST_CELL }, c.options); }, 3, 1);
  const r = result as unknown as FitResult;
  const oneMs = evaluationMs(c.records, r.values);
  const evalsPerS = r.evaluations / (ms / 1000);
  return [
    { name: `${c.label}: fit time`, value: ms, unit: 'ms', key: c.key, note: `median of 3 after 1 warm-up; target < ${c.targetMs} ms; ${r.iterations} iterations, converged ${r.converged}` },
    { name: '  ratio to the target', value: ms / c.targetMs, unit: '×', note: '< 1 meets the target' },
    { name: '  evaluations', value: r.evaluations, unit: 'count', note: `${r.records.length} simulation(s) each` },
    { name: '  evaluations per second', value: evalsPerS, unit: '1/s' },
    { name: '  one evaluation', value: oneMs, unit: 'ms', note: 'all records simulated once on the fit\'s frozen grids' },
    { name: '  fit time / (evaluations × one evaluation)', value: ms / (r.evaluations * oneMs), unit: '×', note: 'close to 1: the iteration costs little beyond its simulations' },
  ];
}

export async function runFitBench(): Promise<BenchRow[]> {
  const t0 = performance.now();
  const single = noisyVoltammograms(WAVEFORM, [TRUTH], [0.2]);
  const series = noisyVoltammograms(WAVEFORM, [TRUTH], SERIES_RATES);
  const start = { shared: { uncompensatedOhm: 50, doubleLayerFPerCm2: 20e-6 } };
  const cases: Case[] = [
    { label: 'four-parameter fit (E°′, k°, α, D) of one 2,001-point voltammogram', key: 'fitMs', targetMs: 1000, records: single, options: { free: ['formalPotentialV', 'k0CmPerS', 'alpha', 'diffusionOCm2PerS'], start } },
    { label: 'joint fit of six 2,001-point voltammograms (E°′, k°, α, D, C_dl)', key: 'jointFitMs', targetMs: 5000, records: series, options: { start: { shared: { uncompensatedOhm: 50 } } } },
  ];
  const rows = cases.flatMap(caseRows);
  const startMs = medianMs(() => fitStartingValues({ records: series, cell: TEST_CELL, mechanism: 'E', coupleCount: 1, cycle: 1, electronCounts: [1], ruOhm: 50 }), 5, 1);
  rows.push({ name: 'starting values from the peak analysis, six voltammograms', value: startMs, unit: 'ms', note: 'part of the joint fit time, not an evaluation' });
  rows.push({ name: 'fit bench total', value: performance.now() - t0, unit: 'ms' });
  return rows;
}
