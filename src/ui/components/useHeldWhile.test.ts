/** The refresh rule of a view held while files are read (useHeldWhile.ts); our own rule, no external source. */
import { describe, expect, it } from 'vitest';
import { heldValue } from './useHeldWhile';

describe('heldValue', () => {
  it('takes the first value at once, then keeps it while held until it is everyMs old', () => {
    const first = heldValue(null, true, 'a', 1000, 0);
    expect(first.value).toBe('a');
    expect(heldValue(first, true, 'b', 1000, 999)).toBe(first);
    expect(heldValue(first, true, 'c', 1000, 1000)).toEqual({ value: 'c', at: 1000 });
  });

  it('follows the value at once when nothing is held', () => {
    const first = heldValue(null, true, 'a', 1000, 0);
    expect(heldValue(first, false, 'b', 1000, 10)).toEqual({ value: 'b', at: 10 });
  });
});
