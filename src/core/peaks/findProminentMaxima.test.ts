import { describe, expect, it } from 'vitest';
import { findProminentMaxima } from './findProminentMaxima';

describe('findProminentMaxima', () => {
  // Worked by hand: maxima at 2 (height 5) and 6 (height 3); the lower one's left base is the
  // dip of 1 at index 4, its right base the end value 0, so its prominence is 3 − 1 = 2.
  it('hand example: prominences 5 − 1 = 4 and 3 − 1 = 2', () => {
    const y = [0, 2, 5, 2, 1, 2, 3, 2, 0];
    const m = findProminentMaxima(y);
    expect(m.map((p) => [p.index, p.prominence, p.leftBase, p.rightBase])).toEqual([
      [2, 5, 0, 8],
      [6, 2, 4, 8],
    ]);
  });

  it('a flat top is one maximum; end points are never maxima', () => {
    expect(findProminentMaxima([0, 1, 3, 3, 3, 1, 0]).map((p) => p.index)).toEqual([2]);
    expect(findProminentMaxima([5, 4, 3, 2, 1])).toEqual([]);
    expect(findProminentMaxima([1, 2, 3, 4, 5])).toEqual([]);
  });

  it('drops maxima below minProminence and respects the range', () => {
    const y = [0, 2, 5, 2, 1, 2, 3, 2, 0];
    expect(findProminentMaxima(y, { minProminence: 3 }).map((p) => p.index)).toEqual([2]);
    expect(findProminentMaxima(y, { start: 4 }).map((p) => p.index)).toEqual([6]);
  });

  it('empty and NaN input give no maxima', () => {
    expect(findProminentMaxima([])).toEqual([]);
    expect(findProminentMaxima([0, NaN, 0])).toEqual([]);
  });
});
