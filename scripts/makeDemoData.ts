/**
 * `npm run demo-data`: writes the demo scenario into demo-data/ from Halfwave's own simulator,
 * with seeded white noise on top of the simulated charging background and ohmic drop. Running
 * it twice gives byte-identical files. The scenario, layouts and README text live in
 * scripts/demoData/.
 */
import { mkdirSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { simulateCv } from '../src/core/simulation';
import { formatTrace, type DemoTrace } from './demoData/layouts';
import { demoReadme } from './demoData/readme';
import { MASTER_SEED, SERIES, type DemoSeries } from './demoData/scenario';
import { seededGaussian as createGaussian } from '../src/core/random/seededGaussian';

const OUT = join(dirname(fileURLToPath(import.meta.url)), '..', 'demo-data');
const DATA_FILE = /\.(csv|txt|tsv|dat)$/i;

function simulateTrace(series: DemoSeries, scanRateVPerS: number, seed: number): DemoTrace {
  const r = simulateCv({ ...series.truth, scanRateVPerS });
  const noise = createGaussian(seed);
  const n = r.currentA.length;
  const perCycle = (n - 1) / (series.truth.cycles ?? 1);
  const currentA = new Float64Array(n);
  const cycle = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    currentA[i] = (r.currentA[i] as number) + series.noiseA * noise();
    // The point back at the start potential opens the next cycle (the last point closes the run).
    cycle[i] = Math.min(Math.floor(i / perCycle) + 1, series.truth.cycles ?? 1);
  }
  return { timeS: r.timeS, potentialV: r.potentialV, currentA, cycle };
}

/** A fixed, invented recording time per file so that reruns are identical. */
function recordedAt(seriesIndex: number, run: number): string {
  const minutes = 9 * 60 + seriesIndex * 75 + run * 6;
  return `2026-11-${String(16 + seriesIndex).padStart(2, '0')} ${String(Math.floor(minutes / 60)).padStart(2, '0')}:${String(minutes % 60).padStart(2, '0')}`;
}

function main(): void {
  mkdirSync(OUT, { recursive: true });
  for (const name of readdirSync(OUT)) if (DATA_FILE.test(name) || name === 'truth.json') rmSync(join(OUT, name));
  const written: { file: string; bytes: number }[] = [];
  SERIES.forEach((series, s) => {
    series.scanRatesVPerS.forEach((v, i) => {
      const run = i + 1;
      const trace = simulateTrace(series, v, MASTER_SEED + 100 * s + run);
      const text = formatTrace(series.layout, trace, { series, scanRateVPerS: v, run, recordedAt: recordedAt(s, run) });
      const file = series.fileName(v, run);
      writeFileSync(join(OUT, file), text, 'utf8');
      written.push({ file, bytes: Buffer.byteLength(text, 'utf8') });
    });
  });
  writeFileSync(join(OUT, 'README.md'), demoReadme(), 'utf8');
  const total = written.reduce((a, w) => a + w.bytes, 0);
  process.stdout.write(`demo-data: ${written.length} files, ${(total / 1024).toFixed(0)} KiB, seed ${MASTER_SEED}\n`);
}

main();
