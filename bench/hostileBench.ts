/**
 * Hostile input at 10 MB (issue item 6: every import and analysis step near-linear, any 10 MB
 * input answered within seconds): one line of numbers, a vertex at every point, a line of quotes,
 * a table whose rows turn far narrower, ten million blank lines. Each is read and, when it reads,
 * analysed once; the row gives the time to the answer (result or typed error) and what it was.
 */
import { performance } from 'node:perf_hooks';
import { analyzeVoltammogram } from '../src/core/analysis/analyzeVoltammogram';
import { importVoltammogram } from '../src/io';
import type { BenchRow } from './types';

const SIZE = 10_000_000;
const fill = (unit: string, n: number) => unit.repeat(Math.ceil(n / unit.length)).slice(0, n);

const SHAPES: [string, () => string][] = [
  ['one line of "1.0,"', () => fill('1.0,', SIZE)],
  ['zigzag, a vertex at every point', () => {
    const rows: string[] = [];
    for (let i = 0, len = 0; len < SIZE; i++, len += 4) rows.push(`${i % 2},${i % 3}`);
    return rows.join('\n');
  }],
  ['one line of double quotes', () => fill('"', SIZE)],
  ['500-column rows, then 2-column rows', () => `${Array.from({ length: 600 }, () => fill('1,', 1000)).join('\n')}\n${fill('1,2\n', SIZE - 600_000)}`],
  ['two rows, then blank lines', () => `1,2\n2,3\n${fill('\n', SIZE)}`],
];

function answer(text: string): string {
  try {
    const m = importVoltammogram('hostile.csv', text).measurement;
    const a = analyzeVoltammogram(m);
    return `read ${m.potentialV.length.toLocaleString('en')} points, ${a.cycles.length.toLocaleString('en')} cycles analysed`;
  } catch (err) {
    return `${(err as { code?: string }).code ?? 'untyped'}: ${(err as Error).message.slice(0, 60)}…`;
  }
}

export async function runHostileBench(): Promise<BenchRow[]> {
  const rows: BenchRow[] = [];
  for (const [name, make] of SHAPES) {
    const text = make();
    const t0 = performance.now();
    const what = answer(text);
    rows.push({ name: `10 MB: ${name}`, value: performance.now() - t0, unit: 'ms', note: what });
  }
  rows.push({ name: '10 MB hostile input: slowest answer', value: Math.max(...rows.map((r) => r.value)), unit: 'ms', key: 'hostile10MBWorstMs' });
  return rows;
}
