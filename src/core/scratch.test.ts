/** Kept working arrays (scratch.ts): a property of the code, no published value involved. */
import { describe, expect, it } from 'vitest';
import { keptScratch } from './scratch';

describe('keptScratch', () => {
  it('lends the same memory again, at the length asked for, growing as needed', () => {
    const take = keptScratch(1000);
    const a = take(100);
    expect(a.length).toBe(100);
    expect(take(50).buffer).toBe(a.buffer);
    const b = take(300);
    expect(b.length).toBe(300);
    expect(take(120).buffer).toBe(b.buffer);
  });

  it('makes an array of its own past the largest kept length, and keeps nothing of it', () => {
    const take = keptScratch(1000);
    const kept = take(10).buffer;
    const big = take(5000);
    expect(big.length).toBe(5000);
    expect(big.buffer).not.toBe(kept);
    expect(take(10).buffer).toBe(kept);
  });
});
