/**
 * `analyze --inspect` end to end through runCli on the invented fixtures in
 * test/fixtures/import (see test/fixtures/README.md). Expected scan rates are those the fixture
 * generator wrote (100 mV/s and 50 mV/s by construction).
 */
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../main';
import { parseColumns } from './analyze';

const FIX = join(import.meta.dirname, '..', '..', '..', 'test', 'fixtures', 'import');

async function run(...argv: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await runCli(argv, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t) });
  return { code, stdout, stderr };
}

describe('halfwave analyze --inspect', () => {
  it('reports delimiter, decimal mark, header, roles, units, rows, cycles and scan rate per file', async () => {
    const r = await run('analyze', join(FIX, 'cv_semicolon_comma_latin1.txt'), '--inspect');
    expect(r.code).toBe(0);
    for (const s of ['delimiter    semicolon', "decimal mark ','", 'header       on line 9', '"E (mV)" → potential [mV]', '"I (µA)" → current [µA]', '801 read, 0 skipped', 'cycles       2', '100 mV/s', '[source: metadata]', 'Ag/AgCl (3 M KCl)']) {
      expect(r.stdout).toContain(s);
    }
  });

  it('a folder is read in natural order; a bad file is reported and the exit code is 2', async () => {
    const r = await run('analyze', FIX, '--inspect', '--json');
    expect(r.code).toBe(2);
    const report = JSON.parse(r.stdout) as { file: string; error?: { code: string }; scanRateVPerS?: number; scanRateSource?: string }[];
    expect(report.map((x) => x.file.replace(/^.*[\\/]/, ''))).toEqual([
      'bad_constant_potential.csv', 'bad_one_column.txt', 'bad_spreadsheet.xlsx', 'cv_polarographic_cr.txt', 'cv_semicolon_comma_latin1.txt',
      'cv_shuffled_ms_nA.csv', 'cv_spaces_noheader_100mVs.dat', 'cv_tab_utf16le.txt', 'series2_50mVs_joined.csv',
    ]);
    expect(report.slice(0, 3).map((x) => x.error?.code)).toEqual(['CONSTANT_POTENTIAL', 'ONE_COLUMN', 'SPREADSHEET_BINARY']);
    const joined = report.find((x) => x.file.endsWith('series2_50mVs_joined.csv'));
    expect(joined?.scanRateSource).toBe('filename');
    expect(joined?.scanRateVPerS).toBeCloseTo(0.05, 12);
    const timed = report.find((x) => x.file.endsWith('cv_tab_utf16le.txt'));
    expect(timed?.scanRateSource).toBe('time');
    expect(Math.abs((timed?.scanRateVPerS ?? 0) - 0.1)).toBeLessThan(1e-6);
  });

  it('overrides reach the importer: --scan-rate, --columns, --current-unit', async () => {
    const r = await run('analyze', join(FIX, 'cv_spaces_noheader_100mVs.dat'), '--inspect', '--json', '--scan-rate', '0.25', '--current-unit', 'uA', '--columns', 'E=1,I=2');
    expect(r.code).toBe(0);
    const [m] = JSON.parse(r.stdout) as { scanRateVPerS: number; scanRateSource: string; detection: { currentUnit: { value: string; overridden: boolean } } }[];
    expect(m?.scanRateSource).toBe('option');
    expect(m?.scanRateVPerS).toBe(0.25);
    expect(m?.detection.currentUnit).toMatchObject({ value: 'µA', overridden: true });
  });

  it('bad arguments and unreadable paths exit with 2 and one line on stderr', async () => {
    for (const argv of [['--delimiter', 'pipe'], ['--current-unit', 'volt'], ['--columns', 'E=0'], ['--header-line', '1.5']]) {
      const r = await run('analyze', join(FIX, 'cv_tab_utf16le.txt'), '--inspect', ...argv);
      expect(r.code).toBe(2);
      expect(r.stderr.trim().split('\n').length).toBe(1);
    }
    const missing = await run('analyze', join(FIX, 'no_such_file.csv'), '--inspect');
    expect(missing.code).toBe(2);
    expect(missing.stderr).toContain('no_such_file.csv');
  });

  it('without --inspect, a file the importer rejects ends in one stderr line naming it, exit 2', async () => {
    const r = await run('analyze', join(FIX, 'bad_constant_potential.csv'));
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr.trim().split('\n')).toEqual([expect.stringContaining('bad_constant_potential.csv (line 2, column 1): the potential column never changes')]);
  });

  it('parseColumns turns 1-based pairs into 0-based overrides', () => {
    expect(parseColumns('E=2, I=3,t=1,cycle=0')).toEqual({ potentialColumn: 1, currentColumn: 2, timeColumn: 0, cycleColumn: -1 });
  });
});
