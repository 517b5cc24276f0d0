/** blankNames keeps its answer per state (our own bookkeeping; no external source). */
import { describe, expect, it } from 'vitest';
import { blankNames, type RunSources } from './runInput';
import { defaultSettings } from './settings';

function sources(blanks: string[]): RunSources {
  const file = (fileName: string) => ({ fileName, group: 'g', measurement: null, sizeBytes: 1, sha256: null, warnings: [] });
  return {
    fileOrder: ['a', 'b'], fileSettings: {}, settings: defaultSettings, convention: 'iupac',
    seriesCells: { g: { blankFiles: blanks } }, files: { a: file('blank.csv'), b: file('sample.csv') },
  };
}

describe('blankNames', () => {
  it('gives the series blanks, the same set again for the same state, a new one when the cell changes', () => {
    const state = sources(['blank.csv']);
    const first = blankNames(state);
    expect([...first]).toEqual(['blank.csv']);
    expect(blankNames(state)).toBe(first);
    const changed = { ...state, seriesCells: { g: { blankFiles: [] } } };
    expect([...blankNames(changed)]).toEqual([]);
    const ownChoice: RunSources = { ...state, seriesCells: {}, fileSettings: { b: { peakWindows: [], baselines: [], blankFile: 'blank.csv' } } };
    expect([...blankNames(ownChoice)]).toEqual(['blank.csv']);
  });
});
