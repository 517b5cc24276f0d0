/** The import limiter: never more than its slots at once, first come first served (hand-worked). */
import { describe, expect, it } from 'vitest';
import { createLimiter } from './filesSlice';

describe('createLimiter', () => {
  it('runs at most two tasks at a time, in arrival order', async () => {
    const limit = createLimiter(2);
    let running = 0;
    let peak = 0;
    const started: number[] = [];
    const task = (k: number) => limit(async () => {
      started.push(k);
      running++;
      peak = Math.max(peak, running);
      await new Promise((r) => setTimeout(r, 5));
      running--;
      return k;
    });
    const results = await Promise.all([1, 2, 3, 4, 5].map(task));
    expect(results).toEqual([1, 2, 3, 4, 5]);
    expect(peak).toBe(2);
    expect(started).toEqual([1, 2, 3, 4, 5]);
  });

  it('frees the slot when a task fails', async () => {
    const limit = createLimiter(1);
    await expect(limit(() => Promise.reject(new Error('bad file')))).rejects.toThrow('bad file');
    expect(await limit(() => Promise.resolve('next'))).toBe('next');
  });
});
