/**
 * Speed of the per-voltammogram analysis (src/core/analysis/analyzeVoltammogram.ts), measured in
 * one run so that the ratios compare like with like: one 2,001-point voltammogram (clean, and
 * with noise plus charging), a batch of 100 such files, and the analysis time against the time to
 * simulate the same trace, and a six-file scan-rate series through analyzeRun (per-file analysis,
 * couple matching, Randles–Ševčík and log–log fits). Accuracy rows repeat two of the unit-test
 * checks for the record.
 */
import { FARADAY_C_PER_MOL as F, inverseThermalVoltagePerV } from '../src/core/constants';
import { analyzeRun } from '../src/core/analysis/analyzeRun';
import { analyzeSeries } from '../src/core/analysis/analyzeSeries';
import { analyzeVoltammogram } from '../src/core/analysis/analyzeVoltammogram';
import { simulatedVoltammogram } from '../src/core/peaks/simulatedVoltammogram';
import { simulateCv } from '../src/core/simulation';
import type { Voltammogram } from '../src/core/types';
import { medianMs } from './timing';
import type { BenchRow } from './types';

/** ±0.5 V around E°′ in 1 mV steps: 2,001 points, D = 7.6e-6 cm²/s, 1 mM, 0.0707 cm². */
const TRACE = { startV: 0.5, switchV: -0.5, stepV: 0.001, k0CmPerS: Infinity, diffusionOCm2PerS: 7.6e-6, diffusionRCm2PerS: 7.6e-6 };

function batch(count: number): Voltammogram[] {
  return Array.from({ length: count }, (_, k) =>
    simulatedVoltammogram({ ...TRACE, k0CmPerS: k % 2 ? Infinity : 0.01, scanRateVPerS: 0.05 + 0.01 * (k % 10), doubleLayerFPerCm2: 20e-6 }, { noiseA: 1e-7, seed: k + 1 }),
  );
}

function accuracyRows(clean: Voltammogram): BenchRow[] {
  const couple = analyzeVoltammogram(clean).cycles[0]!.couples[0]!;
  const ip = 0.4463 * F * 0.0707 * 1e-6 * Math.sqrt(inverseThermalVoltagePerV(298.15) * 0.1 * 7.6e-6);
  return [
    { name: 'accuracy: E½ − E°′ (reversible, noise-free)', value: couple.eHalfV! * 1000, unit: 'mV', note: 'test tolerance ±2 mV' },
    { name: 'accuracy: ipc vs Randles–Ševčík 0.4463', value: 100 * (couple.ipcA! / ip - 1), unit: '%', note: 'test tolerance ±2 %' },
    { name: 'accuracy: return/forward ratio − 1', value: 100 * (couple.ratio! - 1), unit: '%', note: 'test tolerance ±3 %' },
  ];
}

/** Six files of one reversible couple at 0.02–1 V/s, analysed as a series (as `halfwave analyze` does). */
function seriesRow(): BenchRow {
  const rates = [0.02, 0.05, 0.1, 0.2, 0.5, 1];
  const inputs = rates.map((v, k) => ({
    fileName: `series_${Math.round(v * 1000)}mVs.csv`,
    voltammogram: simulatedVoltammogram({ ...TRACE, scanRateVPerS: v, doubleLayerFPerCm2: 20e-6 }, { noiseA: 1e-7, seed: 100 + k }),
  }));
  const cells = { 'series 1': { electronCount: 1, areaCm2: 0.0707, concentrationMolPerCm3: 1e-6 } };
  const ms = medianMs(() => analyzeRun({ files: inputs, cells }), 5, 1);
  return { name: `analyse a ${rates.length}-file scan-rate series (analyzeRun)`, value: ms, unit: 'ms', note: '2,001 points per file, median of 5', key: 'seriesAnalysisMs' };
}

/**
 * The series step of a quasi-reversible series (k° 0.01 cm/s, five scan rates): the first run
 * computes the simulated working curves (ψ at αc 0.3 and 0.7, K(ψ)), later runs reuse them.
 */
function seriesRows(traceMs: number): BenchRow[] {
  const files = [0.1, 0.2, 0.5, 1, 2].map((v) => ({
    fileName: `q${v}`, scanRateVPerS: v,
    analysis: analyzeVoltammogram(simulatedVoltammogram({ ...TRACE, k0CmPerS: 0.01, scanRateVPerS: v }, { noiseA: 1e-8, seed: 3 })),
  }));
  const cell = { areaCm2: 0.0707, concentrationMolPerCm3: 1e-6 };
  const t0 = performance.now();
  analyzeSeries(files, cell);
  const firstMs = performance.now() - t0;
  const cachedMs = medianMs(() => analyzeSeries(files, cell), 5, 1);
  return [
    { name: 'series step, quasi-reversible, 5 files: first run', value: firstMs, unit: 'ms', note: 'simulated working curves computed' },
    { name: '  later runs (curves kept)', value: cachedMs, unit: 'ms' },
    { name: '  ratio later run / one CV analysed', value: cachedMs / traceMs, unit: '×' },
  ];
}

export async function runAnalysisBench(): Promise<BenchRow[]> {
  const clean = simulatedVoltammogram(TRACE);
  const noisy = simulatedVoltammogram({ ...TRACE, doubleLayerFPerCm2: 20e-6 }, { noiseA: 1e-7, seed: 5 });
  const points = clean.potentialV.length;
  const cleanMs = medianMs(() => analyzeVoltammogram(clean));
  const noisyMs = medianMs(() => analyzeVoltammogram(noisy));
  const simulateMs = medianMs(() => simulateCv(TRACE), 9, 2);
  const files = batch(100);
  const batchMs = medianMs(() => files.forEach((v) => analyzeVoltammogram(v)), 3, 1);
  return [
    { name: `analyse one clean CV: ${points} points`, value: cleanMs, unit: 'ms', note: 'median of 15 after 3 warm-up runs' },
    { name: `analyse one CV with noise + charging`, value: noisyMs, unit: 'ms' },
    { name: '  ratio noisy / clean', value: noisyMs / cleanMs, unit: '×' },
    { name: '  ratio analysis / simulation of the same trace', value: cleanMs / simulateMs, unit: '×', note: `simulation ${simulateMs.toFixed(1)} ms` },
    { name: 'analyse a batch of 100 noisy CVs', value: batchMs, unit: 'ms', note: 'median of 3 after 1 warm-up run' },
    { name: '  ratio batch / (100 × one noisy CV)', value: batchMs / (100 * noisyMs), unit: '×', note: '≈ 1: no per-batch overhead' },
    { name: '  throughput', value: (100 * points) / batchMs, unit: 'points/ms' },
    seriesRow(),
    ...accuracyRows(simulatedVoltammogram({ ...TRACE, switchV: -0.4, startV: 0.4 })),
    ...seriesRows(noisyMs),
  ];
}
