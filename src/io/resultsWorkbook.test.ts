/**
 * The workbook holds the results sheet's own cells: run the analysis on two simulated series
 * (our simulator; Nernstian couple, see test/fixtures/README.md for the scenario), write the CSV,
 * turn it into sheets, and find every CSV row again in its series' sheet.
 */
import { describe, expect, it } from 'vitest';
import { analyzeRun } from '../core/analysis/analyzeRun';
import { simulatedVoltammogram } from '../core/peaks/simulatedVoltammogram';
import { resultsSheetCsv } from './exportResults';
import { resultsWorkbook, sheetName } from './resultsWorkbook';
import { splitFields } from './textLines';

function file(name: string, series: string, v: number) {
  return { fileName: name, series, voltammogram: simulatedVoltammogram({ k0CmPerS: Infinity, scanRateVPerS: v }, { noiseA: 2e-8, seed: 7 }),
    provenance: { sizeBytes: 100, sha256: 'ab'.repeat(32), layout: 'comma-separated, header on line 1' } };
}

describe('resultsWorkbook', () => {
  const run = analyzeRun({
    files: [file('a_050.csv', 'alpha', 0.05), file('a_200.csv', 'alpha', 0.2), file('b_100.csv', 'beta, [2]', 0.1)],
    cells: { alpha: { areaCm2: 0.0707, concentrationMolPerCm3: 1e-6 }, 'beta, [2]': { areaCm2: 0.0707, concentrationMolPerCm3: 1e-6 } },
  });
  const csv = resultsSheetCsv(run, { command: 'test' });
  const book = resultsWorkbook(csv);

  it('has one sheet per series, a files sheet and a method sheet', () => {
    expect(book.map((s) => s.name)).toEqual(['alpha', 'beta, _2_', 'files', 'method and parameters']);
  });

  it('the files sheet carries each file with its series, size, SHA-256 and layout', () => {
    const files = book.find((s) => s.name === 'files')!;
    const head = files.rows[0] as string[];
    const row = files.rows.find((r) => r[0] === 'b_100.csv')!;
    expect(row[head.indexOf('series')]).toBe('beta, [2]');
    expect(row[head.indexOf('sha256')]).toBe('ab'.repeat(32));
    expect(row[head.indexOf('size_bytes')]).toBe(100);
    expect(row[head.indexOf('layout')]).toBe('comma-separated, header on line 1');
  });

  it('every couples row of the CSV is in its own series sheet, numbers as numbers', () => {
    const lines = csv.split('\n');
    const start = lines.indexOf('# table: couples');
    const couples = lines.slice(start + 2, lines.indexOf('', start)).map((l) => splitFields(l, ','));
    expect(couples.length).toBeGreaterThan(2);
    for (const c of couples) {
      const sheet = book.find((s) => s.name === (c[0]?.startsWith('a_') ? 'alpha' : 'beta, _2_'))!;
      const found = sheet.rows.find((r) => r[0] === c[0] && r[2] === Number(c[2]) && r[3] === Number(c[3]));
      expect(found?.[6]).toBe(Number(c[6]));
    }
    expect(book.find((s) => s.name === 'alpha')!.rows.some((r) => r[0] === 'b_100.csv')).toBe(false);
  });

  it('the method sheet keeps the parameters and the software version', () => {
    const meta = book.find((s) => s.name === 'method and parameters')!.rows;
    expect(meta[0]?.[0]).toBe('results sheet');
    expect(meta.some((r) => r[0] === 'parameter' && r[1] === 'minSignalToNoise')).toBe(true);
  });

  it('sheet names follow the workbook rules', () => {
    const taken = new Set<string>();
    expect(sheetName('a/b:c', taken)).toBe('a_b_c');
    expect(sheetName('A/B:C', taken)).toBe('A_B_C~2');
    expect(sheetName('x'.repeat(40), taken)).toHaveLength(31);
  });
});
