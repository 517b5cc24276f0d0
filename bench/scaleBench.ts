/**
 * Scale, measured in one run through the worker's own request handlers (src/worker/handlers.ts),
 * called in-thread: 120 small exports read and analysed one after another, and one
 * 1,000,000-row export (ten cycles) read and analysed. Ratios compare the per-point analysis cost
 * of the long trace with that of a 2,001-point trace (≈ 1 means the analysis scales linearly),
 * and the wide-window Savitzky–Golay filter (sliding moments) with the plain convolution it
 * replaces for windows over 101 points. Inputs: bench/scaleData.ts (simulator, seeded noise).
 */
import { performance } from 'node:perf_hooks';
import { simulatedVoltammogram } from '../src/core/peaks/simulatedVoltammogram';
import { savitzkyGolayCoefficients, savitzkyGolaySmooth } from '../src/core/smoothing';
import type { RunInput } from '../src/core/analysis/runTypes';
import type { Voltammogram } from '../src/core/types';
import { cellValuesOf, methodOptionsOf } from '../src/run/runInput';
import { defaultCell } from '../src/run/seriesCell';
import { defaultSettings } from '../src/run/settings';
import { handlers, type HandlerContext } from '../src/worker/handlers';
import { bigCvTrace, smallCvFiles, traceCsv } from './scaleData';
import { medianMs } from './timing';
import type { BenchRow } from './types';

const SMALL_FILES = 120;
const BIG_ROWS = 1_000_000;
/** The app's run input for one file with default settings and no per-file choices. */
function runOf(fileName: string, voltammogram: Voltammogram): RunInput {
  return { files: [{ fileName, voltammogram }], cells: { 'series 1': cellValuesOf(defaultCell(defaultSettings)) }, method: methodOptionsOf(defaultSettings) };
}

const context = (): HandlerContext => ({ progress: () => undefined, signal: new AbortController().signal });

/** What the app does per file: read it (import request), then analyse it (analyze request). */
async function importAndAnalyse(name: string, text: string): Promise<{ importMs: number; analyseMs: number; points: number }> {
  const data = new TextEncoder().encode(text).buffer as ArrayBuffer;
  const t0 = performance.now();
  const read = await handlers.import({ fileName: name, data, overrides: {} }, context());
  const t1 = performance.now();
  handlers.runFiles({ run: runOf(name, read.measurement) }, context());
  return { importMs: t1 - t0, analyseMs: performance.now() - t1, points: read.measurement.potentialV.length };
}

/** Per-point analysis cost of a 2,001-point trace (µs), median of 15 after warm-up. */
function smallTracePerPointUs(): number {
  const v = simulatedVoltammogram({ startV: 0.5, switchV: -0.5, stepV: 0.001, k0CmPerS: Infinity }, { noiseA: 2e-8, seed: 3 });
  const ms = medianMs(() => handlers.runFiles({ run: runOf('small', v) }, context()));
  return (ms * 1000) / v.potentialV.length;
}

/** The wide-window filter against the plain convolution with the same weights (one run each). */
function wideWindowRows(): BenchRow[] {
  const y = bigCvTrace(100_000, 1).currentA;
  const window = 1251;
  const weights = savitzkyGolayCoefficients(window, 2);
  const t0 = performance.now();
  const m = (window - 1) / 2;
  const direct = new Float64Array(y.length);
  for (let i = m; i < y.length - m; i++) {
    let v = 0;
    for (let j = 0; j < window; j++) v += weights[j]! * y[i - m + j]!;
    direct[i] = v;
  }
  const convolutionMs = performance.now() - t0;
  const movingMs = medianMs(() => savitzkyGolaySmooth(y, { window, order: 2 }), 5, 1);
  return [
    { name: 'SG 1,251-pt window, 100k pts: convolution', value: convolutionMs, unit: 'ms', note: 'interior only, the cost before the change' },
    { name: 'SG 1,251-pt window, 100k pts: sliding moments', value: movingMs, unit: 'ms', note: 'savitzkyGolaySmooth, ends included' },
    { name: 'convolution / sliding moments', value: convolutionMs / movingMs, unit: '×' },
  ];
}

export async function runScaleBench(): Promise<BenchRow[]> {
  const files = smallCvFiles(SMALL_FILES);
  await importAndAnalyse(files[0]!.name, files[0]!.text);
  const t0 = performance.now();
  let analyseMs = 0;
  for (const f of files) analyseMs += (await importAndAnalyse(f.name, f.text)).analyseMs;
  const batchMs = performance.now() - t0;

  const perPointSmallUs = smallTracePerPointUs();
  const text = traceCsv(bigCvTrace(BIG_ROWS, 10));
  const big = await importAndAnalyse('long_run_10cycles_100mVs.csv', text);
  const oneCycle = await importAndAnalyse('long_run_1cycle_100mVs.csv', traceCsv(bigCvTrace(BIG_ROWS, 1)));
  const perPointBigUs = (big.analyseMs * 1000) / big.points;
  const perPointOneUs = (oneCycle.analyseMs * 1000) / oneCycle.points;

  return [
    { name: `${SMALL_FILES} files × 1,201 rows: import + analyse`, value: batchMs, unit: 'ms', note: 'one thread; the app runs one worker per spare core, at most two (one on a two-core machine)' },
    { name: 'per file', value: batchMs / SMALL_FILES, unit: 'ms', note: `of which analysis ${(analyseMs / SMALL_FILES).toFixed(1)} ms` },
    { name: `${(big.points).toLocaleString('en')} rows (10 cycles): import`, value: big.importMs, unit: 'ms', note: `${(text.length / 1e6).toFixed(1)} MB CSV, SHA-256 included` },
    { name: `${(big.points).toLocaleString('en')} rows (10 cycles): analyse`, value: big.analyseMs, unit: 'ms' },
    { name: `${(oneCycle.points).toLocaleString('en')} rows (1 cycle): analyse`, value: oneCycle.analyseMs, unit: 'ms', note: '500,000-point sweeps, 12,501-point locating window' },
    { name: 'analysis per point, 2,001-pt trace', value: perPointSmallUs, unit: 'µs', note: 'median of 15' },
    { name: 'per point: 1M (10 cycles) / 2,001-pt', value: perPointBigUs / perPointSmallUs, unit: '×', note: '≈ 1: linear scaling' },
    { name: 'per point: 1M (1 cycle) / 2,001-pt', value: perPointOneUs / perPointSmallUs, unit: '×', note: '≈ 1: linear scaling' },
    ...wideWindowRows(),
  ];
}
