import { describe, expect, it } from 'vitest';
import { fileStem, groupIntoSeries } from './groupIntoSeries';

const inFolder = (folder: string | null, names: string[]) => names.map((name) => ({ name, folder }));

// Grouping rules are our own design (common practice, no source): one folder per experiment,
// file names that differ only in the scan rate or a run number.
describe('fileStem', () => {
  it.each([
    ['probe_RuHex_050mVs.csv', 'probe_RuHex'],
    ['quasi_FcAmide_run03.txt', 'quasi_FcAmide'],
    ['sample A v=0.1Vs.txt', 'sample_A'],
    ['CV_50mVs-1.txt', 'CV'],
    ['cv 100 mV s-1.csv', 'cv'],
    ['Fc_0.5V-s.dat', 'Fc'],
    ['20mVs.csv', ''],
  ])('%s → "%s"', (name, stem) => {
    expect(fileStem(name)).toBe(stem);
  });
});

describe('groupIntoSeries', () => {
  it('one folder of one experiment is one series named after the folder', () => {
    expect(groupIntoSeries(inFolder('ferrocene', ['a_10mVs.csv', 'a_20mVs.csv', 'a_50mVs.csv']))).toEqual([{ key: 'ferrocene', members: [0, 1, 2] }]);
  });
  it('a folder of several experiments splits by stem', () => {
    const files = inFolder('demo', ['ec_x_0020mVs.tsv', 'ec_x_0050mVs.tsv', 'film_y_001mVs.dat', 'film_y_002mVs.dat', 'probe_z_1mVs.csv', 'probe_z_2mVs.csv']);
    expect(groupIntoSeries(files).map((g) => [g.key, g.members])).toEqual([['ec_x', [0, 1]], ['film_y', [2, 3]], ['probe_z', [4, 5]]]);
  });
  it('names that share no stem but hold one file each stay one series', () => {
    expect(groupIntoSeries(inFolder(null, ['alpha.csv', 'beta.csv', 'gamma.csv']))).toEqual([{ key: 'series 1', members: [0, 1, 2] }]);
  });
  it('loose files with a common stem are named after it; two folders give two series', () => {
    expect(groupIntoSeries(inFolder(null, ['sample_01.csv', 'sample_02.csv']))[0]?.key).toBe('sample');
    expect(groupIntoSeries([...inFolder('A', ['x1.csv', 'x2.csv']), ...inFolder('B', ['x1.csv'])]).map((g) => g.key)).toEqual(['A', 'B']);
  });
  it("'one' keeps every file together; 'folder' never splits by stem; names are made unique", () => {
    const files = inFolder('demo', ['p_1mVs.csv', 'p_2mVs.csv', 'q_1mVs.csv', 'q_2mVs.csv']);
    expect(groupIntoSeries(files, 'one')).toEqual([{ key: 'demo', members: [0, 1, 2, 3] }]);
    expect(groupIntoSeries(files, 'folder')).toHaveLength(1);
    expect(groupIntoSeries([...inFolder('a/x', ['f.csv']), ...inFolder('b/x', ['g.csv'])].map((f, i) => ({ ...f, folder: i ? 'x' : 'x' })), 'stem').map((g) => g.key)).toEqual(['f', 'g']);
    expect(groupIntoSeries([])).toEqual([]);
  });
});
