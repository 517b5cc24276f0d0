/**
 * The page's work on a batch of files, in Node on one thread: each file read, then analysed,
 * through the worker's own handlers (as the page's worker does it). The browser bench times it
 * warm, in its own process, as the yardstick of its ratios; run as a script, this file times the
 * first pass in a fresh process, where the engine compiles the code as it goes, as a page's
 * worker must:
 *   tsx bench/nodeBatch.ts 120   → prints {"coldMs": …} for bench/scaleData.ts smallCvFiles(120)
 */
import { performance } from 'node:perf_hooks';
import { handlers, type HandlerContext } from '../src/worker/handlers';
import { cellValuesOf, methodOptionsOf } from '../src/run/runInput';
import { defaultCell } from '../src/run/seriesCell';
import { defaultSettings } from '../src/run/settings';
import { smallCvFiles } from './scaleData';

export interface TextFile {
  name: string;
  text: string;
}

const ctx: HandlerContext = { progress: () => undefined, signal: new AbortController().signal };

async function readAndAnalyse(f: TextFile): Promise<void> {
  const read = await handlers.import({ fileName: f.name, data: new TextEncoder().encode(f.text).buffer as ArrayBuffer, overrides: {} }, ctx);
  handlers.runFiles({ run: { files: [{ fileName: f.name, voltammogram: read.measurement }], cells: { 'series 1': cellValuesOf(defaultCell(defaultSettings)) }, method: methodOptionsOf(defaultSettings) } }, ctx);
}

/** Milliseconds for the batch; `warmUp` first runs one file untimed. */
export async function nodeBatchMs(files: TextFile[], warmUp = true): Promise<number> {
  if (warmUp && files[0]) await readAndAnalyse(files[0]);
  const t0 = performance.now();
  for (const f of files) await readAndAnalyse(f);
  return performance.now() - t0;
}

if (process.argv[1]?.endsWith('nodeBatch.ts')) {
  const n = Number(process.argv[2] ?? 120);
  nodeBatchMs(smallCvFiles(n), false).then((ms) => console.log(JSON.stringify({ coldMs: ms })), (err: unknown) => {
    console.error(err instanceof Error ? err.message : String(err));
    process.exitCode = 1;
  });
}
