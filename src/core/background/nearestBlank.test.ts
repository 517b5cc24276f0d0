import { describe, expect, it } from 'vitest';
import { nearestBlank } from './nearestBlank';

// Our rule, worked by hand: nearest scan rate on a log scale.
describe('nearestBlank', () => {
  const blanks = [{ fileName: 'b10', scanRateVPerS: 0.01 }, { fileName: 'b100', scanRateVPerS: 0.1 }, { fileName: 'b1000', scanRateVPerS: 1 }];
  it('takes the blank at the same rate, else the nearest in ln v', () => {
    expect(nearestBlank(0.1, blanks)).toBe('b100');
    expect(nearestBlank(0.3, blanks)).toBe('b100');
    expect(nearestBlank(0.4, blanks)).toBe('b1000');
  });
  it('edges: no blanks, unknown scan rates', () => {
    expect(nearestBlank(0.1, [])).toBeNull();
    expect(nearestBlank(null, blanks)).toBe('b10');
  });
});
