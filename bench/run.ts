/**
 * `npm run bench`: runs every registered bench that exists in this folder and prints one table.
 * Figures and ratios come from the same run on the same machine; there are no pass/fail timings
 * here or in the unit tests. To add a bench, put `bench/<name>Bench.ts` exporting
 * `async function run<Name>Bench(): Promise<BenchRow[]>` and append it to REGISTRY.
 * `npm run bench -- --json` also prints, as its last line, one JSON object of every row that has
 * a `key` (importVsPapaparse, importMBps, …): to publish a new figure, give its row a key.
 */
import { existsSync } from 'node:fs';
import { cpus } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { BenchEntry, BenchRow } from './types';

export const REGISTRY: BenchEntry[] = [
  { title: 'simulation', file: './simulationBench.ts', exportName: 'runSimulationBench' },
  { title: 'import', file: './importBench.ts', exportName: 'runImportBench' },
  { title: 'analysis', file: './analysisBench.ts', exportName: 'runAnalysisBench' },
  { title: 'scale', file: './scaleBench.ts', exportName: 'runScaleBench' },
  { title: 'hostile input', file: './hostileBench.ts', exportName: 'runHostileBench' },
  { title: 'fit', file: './fitBench.ts', exportName: 'runFitBench' },
];

const here = dirname(fileURLToPath(import.meta.url));

function formatValue(v: number): string {
  if (!Number.isFinite(v)) return String(v);
  const a = Math.abs(v);
  return a !== 0 && (a < 0.01 || a >= 1e5) ? v.toExponential(3) : v.toFixed(a < 10 ? 3 : 1);
}

function printTable(title: string, rows: BenchRow[]): void {
  const width = Math.max(20, ...rows.map((r) => r.name.length));
  console.log(`\n## ${title}`);
  for (const r of rows) {
    console.log(`${r.name.padEnd(width)}  ${formatValue(r.value).padStart(10)} ${r.unit.padEnd(10)}${r.note ? `  ${r.note}` : ''}`);
  }
}

async function runEntry(entry: BenchEntry): Promise<BenchRow[] | string> {
  if (!existsSync(join(here, entry.file))) return `${entry.file} not present, skipped`;
  const mod = (await import(entry.file)) as Record<string, unknown>;
  const fn = mod[entry.exportName];
  if (typeof fn !== 'function') return `${entry.file} does not export ${entry.exportName}, skipped`;
  return (await (fn as () => Promise<BenchRow[]>)()) ?? [];
}

/** The keyed figures of all rows, in registry order; a key used twice is an error. */
export function keyedFigures(rows: BenchRow[]): Record<string, number> {
  const out: Record<string, number> = {};
  for (const r of rows) {
    if (r.key === undefined) continue;
    if (r.key in out) throw new Error(`bench key ${r.key} is used by two rows`);
    out[r.key] = Number(r.value.toPrecision(6));
  }
  return out;
}

async function main(): Promise<void> {
  const json = process.argv.includes('--json');
  console.log(`Halfwave bench — node ${process.version}, ${cpus().length} CPU(s) (${cpus()[0]?.model ?? 'unknown'})`);
  const failed: string[] = [];
  const all: BenchRow[] = [];
  for (const entry of REGISTRY) {
    try {
      const result = await runEntry(entry);
      if (typeof result === 'string') console.log(`\n## ${entry.title}: ${result}`);
      else {
        printTable(entry.title, result);
        all.push(...result);
      }
    } catch (err) {
      failed.push(entry.title);
      console.log(`\n## ${entry.title}: failed: ${err instanceof Error ? err.message : String(err)}`);
    }
  }
  if (json) console.log(JSON.stringify({ ...keyedFigures(all), ...(failed.length ? { failed } : {}) }));
  process.exitCode = failed.length ? 1 : 0;
}

const isMain = process.argv[1] !== undefined && fileURLToPath(import.meta.url) === process.argv[1];
if (isMain) void main();
