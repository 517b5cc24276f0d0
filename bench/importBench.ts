/**
 * Import throughput, measured in one run: a 1,000,000-row export (time, potential, current;
 * comma-separated with a header and a short preamble), and a batch of 100 files of 2,001 rows.
 * The ratio compares the whole import (decode, detect, tokenise, read numbers, convert, split
 * sweeps, scan rate) with papaparse alone tokenising the same text in the same chunks: it shows
 * how much of the time the tokeniser itself takes.
 */
import { performance } from 'node:perf_hooks';
import { importBatch, importVoltammogram, importVoltammogramAsync } from '../src/io';
import Papa from 'papaparse';
import { CHUNK_CHARS } from '../src/io/parseTable';
import { makeSyntheticCv, writeLayout } from '../test/fixtures/layoutWriter';
import { medianMs } from './timing';
import type { BenchRow } from './types';

const BIG_ROWS = 1_000_000;

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

export async function runImportBench(): Promise<BenchRow[]> {
  const { text, rows } = bigText();
  const bytes = new TextEncoder().encode(text);
  const tableText = text.slice(text.indexOf('\n', text.indexOf('I (A)')) + 1);
  const importMs = medianMs(() => importVoltammogram('bench_100mVs.csv', bytes), 3, 1);
  const tokeniseMs = medianMs(() => tokeniseOnly(tableText, ','), 3, 1);
  const t0 = performance.now();
  let progressCalls = 0;
  await importVoltammogramAsync('bench_100mVs.csv', bytes, { onProgress: () => progressCalls++ });
  const asyncMs = performance.now() - t0;

  const small = new TextEncoder().encode(writeLayout(makeSyntheticCv({ cycles: 1, stepV: 0.0008 }), {
    delimiter: ';', decimalComma: true, header: { potential: 'E (mV)', current: 'I (µA)' }, columns: ['potential', 'current'], potentialScale: 1e3, currentScale: 1e6,
  }));
  const files = Array.from({ length: 100 }, (_, i) => ({ name: `run${i + 1}_50mVs.csv`, data: small }));
  const t1 = performance.now();
  const items = await importBatch(files);
  const batchMs = performance.now() - t1;
  const failed = items.filter((x) => !x.ok).length;

  return [
    { name: `import ${rows.toLocaleString('en')} rows (sync)`, value: importMs, unit: 'ms', note: `${(bytes.length / 1e6).toFixed(1)} MB, median of 3` },
    { name: 'import throughput', value: rows / (importMs / 1000), unit: 'rows/s' },
    { name: 'papaparse tokenising alone', value: tokeniseMs, unit: 'ms', note: 'same table text, same 2 MB chunks' },
    { name: 'import / tokenising', value: importMs / tokeniseMs, unit: '×', note: 'whole import over bare papaparse time' },
    { name: 'import 1M rows (async, yielding)', value: asyncMs, unit: 'ms', note: `${progressCalls} progress reports` },
    { name: '100 files × 2,001 rows (batch)', value: batchMs, unit: 'ms', note: failed ? `${failed} failed` : 'all imported' },
    { name: 'batch per file', value: batchMs / 100, unit: 'ms' },
  ];
}
