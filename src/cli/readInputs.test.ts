/** readInputs on a temporary folder of invented files (test/fixtures/layoutWriter). */
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { makeSyntheticCv, writeLayout } from '../../test/fixtures/layoutWriter';
import { UsageError } from './errors';
import { expandPaths, readInputs } from './readInputs';
import { ImportError } from '../io';

const text = writeLayout(makeSyntheticCv({ stepV: 0.01 }), { delimiter: ',', header: { potential: 'E/V', current: 'I/A' }, columns: ['potential', 'current'] });

function folder(files: Record<string, string>): string {
  const dir = mkdtempSync(join(tmpdir(), 'halfwave-read-'));
  for (const [name, body] of Object.entries(files)) writeFileSync(join(dir, name), body);
  return dir;
}

describe('readInputs', () => {
  it('a folder stands for its files in natural order, without hidden files and notes', () => {
    const dir = folder({ 'run10_50mVs.csv': text, 'run2_50mVs.csv': text, 'run1_50mVs.csv': text, '.hidden.csv': text, 'README.md': '# notes' });
    mkdirSync(join(dir, 'sub'));
    expect(expandPaths([dir]).map((p) => p.slice(dir.length + 1))).toEqual(['run1_50mVs.csv', 'run2_50mVs.csv', 'run10_50mVs.csv']);
    const read = readInputs([dir]);
    expect(read.measurements.map((m) => m.fileName)).toEqual(['run1_50mVs.csv', 'run2_50mVs.csv', 'run10_50mVs.csv']);
  });

  it('a folder given with a trailing slash, or as "sub/.." (as "." would be), is named by its own name', () => {
    const dir = folder({ 'run1_50mVs.csv': text });
    mkdirSync(join(dir, 'sub'));
    const name = dir.split(/[\\/]/).pop();
    expect(readInputs([`${dir}/`]).files.map((f) => f.folder)).toEqual([name]);
    expect(readInputs([`${dir}/sub/..`]).files.map((f) => f.folder)).toEqual([name]);
  });

  it('a missing path and an empty folder are UsageErrors naming them', () => {
    expect(() => readInputs(['/no/such/file.csv'])).toThrow(UsageError);
    expect(() => readInputs(['/no/such/file.csv'])).toThrow('/no/such/file.csv');
    const empty = folder({});
    expect(() => readInputs([empty])).toThrow(/holds no data files/);
    expect(() => readInputs([])).toThrow(UsageError);
  });

  it('a rejected file throws its ImportError, or is collected with keepGoing', () => {
    const dir = folder({ 'a.csv': text, 'b.csv': 'not a table' });
    expect(() => readInputs([dir])).toThrow(ImportError);
    const read = readInputs([dir], { keepGoing: true });
    expect(read.measurements.length).toBe(1);
    expect(read.failures.map((f) => f.code)).toEqual(['NO_TABLE']);
  });
});
