/**
 * Every data file that `npm run demo-data` writes into demo-data/ must import cleanly: at least
 * one cycle, a scan rate with its source, and no error. Non-data files (README, notes, JSON
 * manifests) are left out. Skipped while demo-data/ holds no data files yet.
 */
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { importVoltammogram } from '../../src/io';

const DIR = join(import.meta.dirname, '..', '..', 'demo-data');
const NOT_DATA = /^(\.|readme)|\.(md|json|ya?ml|png|svg|jpe?g|html?|pdf|ts|js)$/i;

function listDataFiles(dir: string): string[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) return listDataFiles(p);
    return NOT_DATA.test(name) ? [] : [p];
  });
}

const files = listDataFiles(DIR);

describe('demo-data imports (files written by npm run demo-data)', () => {
  it.skipIf(files.length === 0)(`all ${files.length} demo data files import with ≥1 cycle and a scan rate with its source`, () => {
    const problems: string[] = [];
    for (const path of files) {
      try {
        const { measurement: m } = importVoltammogram(path.slice(DIR.length + 1), readFileSync(path));
        if (m.cycles.length < 1) problems.push(`${path}: no cycle`);
        if (!(m.scanRateVPerS !== null && m.scanRateVPerS > 0) || m.scanRateSource === null) problems.push(`${path}: no scan rate (source ${m.scanRateSource})`);
      } catch (err) {
        problems.push(`${path}: ${err instanceof Error ? `${err.name}: ${err.message}` : String(err)}`);
      }
    }
    expect(problems).toEqual([]);
  });
});
