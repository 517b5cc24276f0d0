/**
 * Import throughput, measured in one run: a 1,000,000-row export (time, potential, current;
 * comma-separated with a header and a short preamble), and a batch of 100 files of 2,001 rows.
 * The ratio compares the whole import (decode, detect, tokenise, read numbers, convert, split
 * sweeps, scan rate) with papaparse alone tokenising the same text in the same chunks, the two
 * timed in turn so that a busy machine slows both alike. Peak heap of the 1M-row import comes
 * from a fresh process (peakHeapChild.ts).
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { fileURLToPath } from 'node:url';
import Papa from 'papaparse';
import { analyzeVoltammogram } from '../src/core/analysis/analyzeVoltammogram';
import { importBatch, importVoltammogram, importVoltammogramAsync } from '../src/io';
import { CHUNK_CHARS } from '../src/io/parseTable';
import { makeSyntheticCv, writeLayout } from '../test/fixtures/layoutWriter';
import type { BenchRow } from './types';

const BIG_ROWS = 1_000_000;
const here = dirname(fileURLToPath(import.meta.url));

function bigText(): { text: string; rows: number } {
  // 10 cycles of two 0.8 V sweeps: BIG_ROWS / 20 points per sweep, plus the final point.
  const cv = makeSyntheticCv({ cycles: 10, stepV: 0.8 / (BIG_ROWS / 20), scanRateVPerS: 0.1 });
  const text = writeLayout(cv, {
    delimiter: ',', digits: 9, preamble: ['Operator: bench', 'scan rate = 100 mV/s'],
    header: { time: 'Time (s)', potential: 'E (V)', current: 'I (A)' }, columns: ['time', 'potential', 'current'],
  });
  return { text, rows: cv.potentialV.length };
}

/** Bare papaparse tokenising of the same text in the same chunks (no number parsing): the ratio's base. */
export function tokeniseOnly(text: string, delimiter: string): number {
  let rows = 0;
  for (let pos = 0; pos < text.length; ) {
    let end = text.indexOf('\n', Math.min(text.length, pos + CHUNK_CHARS));
    if (end === -1) end = text.length;
    rows += Papa.parse<string[]>(text.slice(pos, end), { delimiter, newline: '\n', header: false, skipEmptyLines: false }).data.length;
    pos = end + 1;
  }
  return rows;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] as number;

/** Medians of `a` and `b` timed in turn, `repeats` times each after one unmeasured run of each. */
function medianPair(a: () => unknown, b: () => unknown, repeats: number): [number, number] {
  a();
  b();
  const ta: number[] = [];
  const tb: number[] = [];
  for (let i = 0; i < repeats; i++) {
    for (const [f, t] of [[a, ta], [b, tb]] as const) {
      const t0 = performance.now();
      f();
      t.push(performance.now() - t0);
    }
  }
  return [median(ta), median(tb)];
}

/** Peak heap of one import of `bytes` in a fresh process (MB), or NaN when it could not run. */
function peakHeap(bytes: Uint8Array): { peakMB: number; fileMB: number } {
  const dir = mkdtempSync(join(tmpdir(), 'halfwave-bench-'));
  try {
    const file = join(dir, 'bench_1M_rows_100mVs.csv');
    writeFileSync(file, bytes);
    const r = spawnSync(process.execPath, ['--expose-gc', '--import', 'tsx', join(here, 'peakHeapChild.ts'), file], { encoding: 'utf8', maxBuffer: 1 << 20 });
    const out = JSON.parse(r.stdout.trim().split('\n').pop() ?? '{}') as { peakBytes?: number; fileBytes?: number };
    return { peakMB: (out.peakBytes ?? NaN) / 1e6, fileMB: (out.fileBytes ?? NaN) / 1e6 };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

async function batchRows(): Promise<BenchRow[]> {
  const small = new TextEncoder().encode(writeLayout(makeSyntheticCv({ cycles: 1, stepV: 0.0008 }), {
    delimiter: ';', decimalComma: true, header: { potential: 'E (mV)', current: 'I (µA)' }, columns: ['potential', 'current'], potentialScale: 1e3, currentScale: 1e6,
  }));
  const files = Array.from({ length: 100 }, (_, i) => ({ name: `run${i + 1}_50mVs.csv`, data: small }));
  const t1 = performance.now();
  const items = await importBatch(files);
  const importMs = performance.now() - t1;
  for (const item of items) if (item.ok) analyzeVoltammogram(item.result.measurement);
  const totalMs = performance.now() - t1;
  const failed = items.filter((x) => !x.ok).length;
  return [
    { name: '100 files × 2,001 rows: import (batch)', value: importMs, unit: 'ms', note: failed ? `${failed} failed` : 'all imported' },
    { name: '100 files × 2,001 rows: import + analyse', value: totalMs, unit: 'ms', note: 'importBatch, then analyzeVoltammogram per file', key: 'batch100Ms' },
  ];
}

export async function runImportBench(): Promise<BenchRow[]> {
  const { text, rows } = bigText();
  const bytes = new TextEncoder().encode(text);
  const tableText = text.slice(text.indexOf('\n', text.indexOf('I (A)')) + 1);
  const [importMs, tokeniseMs] = medianPair(() => importVoltammogram('bench_100mVs.csv', bytes), () => tokeniseOnly(tableText, ','), 5);
  const t0 = performance.now();
  let progressCalls = 0;
  await importVoltammogramAsync('bench_100mVs.csv', bytes, { onProgress: () => progressCalls++ });
  const asyncMs = performance.now() - t0;
  const heap = peakHeap(bytes);
  return [
    { name: `import ${rows.toLocaleString('en')} rows (sync)`, value: importMs, unit: 'ms', note: `${(bytes.length / 1e6).toFixed(1)} MB, median of 5`, key: 'rowsMillionImportMs' },
    { name: 'import throughput', value: bytes.length / 1e6 / (importMs / 1000), unit: 'MB/s', key: 'importMBps' },
    { name: 'papaparse tokenising alone', value: tokeniseMs, unit: 'ms', note: 'same table text, same 2 MB chunks, timed in turn with the import' },
    { name: 'import / tokenising', value: importMs / tokeniseMs, unit: '×', note: 'whole import over bare papaparse time (goal ≤ 1, stretch 0.5)', key: 'importVsPapaparse' },
    { name: 'import 1M rows (async, yielding)', value: asyncMs, unit: 'ms', note: `${progressCalls} progress reports` },
    { name: 'peak heap, import of the 1M-row file', value: heap.peakMB, unit: 'MB', note: `fresh process, V8 heap + array buffers, file's bytes included`, key: 'rowsMillionPeakHeapMB' },
    { name: 'peak heap / file size', value: heap.peakMB / heap.fileMB, unit: '×', note: `file ${heap.fileMB.toFixed(1)} MB (goal < 10)` },
    ...(await batchRows()),
  ];
}
