import { describe, expect, it } from 'vitest';
import { naturalCompare } from './naturalOrder';

// Natural order of file names (common practice, no source): numbers by value, case ignored.
describe('naturalCompare', () => {
  const sorted = (names: string[]) => [...names].sort(naturalCompare);

  it('puts whole numbers in order of value', () => {
    expect(sorted(['run10.csv', 'run2.csv', 'run1.csv'])).toEqual(['run1.csv', 'run2.csv', 'run10.csv']);
    expect(sorted(['cv_100mVs.txt', 'cv_20mVs.txt', 'cv_1000mVs.txt', 'cv_50mVs.txt'])).toEqual(['cv_20mVs.txt', 'cv_50mVs.txt', 'cv_100mVs.txt', 'cv_1000mVs.txt']);
  });

  it('reads decimal scan rates as numbers, with a point or a comma', () => {
    expect(sorted(['irr_0.1Vs.csv', 'irr_0.2Vs.csv', 'irr_0.05Vs.csv', 'irr_2Vs.csv', 'irr_0.5Vs.csv'])).toEqual(['irr_0.05Vs.csv', 'irr_0.1Vs.csv', 'irr_0.2Vs.csv', 'irr_0.5Vs.csv', 'irr_2Vs.csv']);
    expect(sorted(['cv 2 Vs.txt', 'cv 0,5 Vs.txt', 'cv 0,05 Vs.txt'])).toEqual(['cv 0,05 Vs.txt', 'cv 0,5 Vs.txt', 'cv 2 Vs.txt']);
  });

  it('ignores case, and orders equal values written differently one way round', () => {
    expect(naturalCompare('Scan1.CSV', 'scan1.csv')).toBe(0);
    expect(Math.sign(naturalCompare('a01.csv', 'a1.csv')) + Math.sign(naturalCompare('a1.csv', 'a01.csv'))).toBe(0);
    expect(sorted(['b.csv', 'a.csv', 'a1.csv'])).toEqual(['a.csv', 'a1.csv', 'b.csv']);
  });
});
