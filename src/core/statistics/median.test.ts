import { describe, expect, it } from 'vitest';
import { median, medianOfSorted } from './median';

// Definition of the sample median (Hogg, McKean & Craig, Introduction to Mathematical Statistics,
// 7th ed. 2013, §1.7): middle order statistic, or the mean of the two middle ones.
describe('median', () => {
  it('odd count: the middle value, worked by hand', () => {
    expect(median([3, 1, 2])).toBe(2);
  });
  it('even count: mean of the two middle values', () => {
    expect(median([4, 1, 3, 2])).toBe(2.5);
  });
  it('does not reorder its input', () => {
    const v = [3, 1, 2];
    median(v);
    expect(v).toEqual([3, 1, 2]);
  });
  it('edges: empty gives NaN, one value is itself, negative numbers sort numerically', () => {
    expect(median([])).toBeNaN();
    expect(median([7])).toBe(7);
    expect(median([-10, -2, -1])).toBe(-2);
    expect(medianOfSorted(new Float64Array([1, 2, 10]))).toBe(2);
  });
});
