/**
 * Run in a fresh process by importBench.ts (`node --expose-gc --import tsx bench/peakHeapChild.ts
 * FILE`): imports FILE once and prints, as JSON, the largest heap in use (V8 heap plus array
 * buffers, as process.memoryUsage reports them) seen at the start and at every progress report of
 * the import, the heap before it (module code and the file's bytes), and the file's size.
 */
import { readFileSync } from 'node:fs';
import { basename } from 'node:path';
import { importVoltammogram } from '../src/io';

const file = process.argv[2];
if (!file) throw new Error('usage: peakHeapChild.ts FILE');
const bytes = readFileSync(file);
const inUse = () => {
  const m = process.memoryUsage();
  return m.heapUsed + m.arrayBuffers;
};
(globalThis as { gc?: () => void }).gc?.();
const before = inUse();
let peak = before;
const result = importVoltammogram(basename(file), bytes, { onProgress: () => (peak = Math.max(peak, inUse())) });
peak = Math.max(peak, inUse());
console.log(JSON.stringify({ peakBytes: peak, beforeBytes: before, fileBytes: bytes.length, rows: result.measurement.potentialV.length }));
