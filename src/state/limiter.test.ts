/** The import limiter: never more than its slots at once, first come first served (hand-worked). */
import { describe, expect, it, vi } from 'vitest';
import { createLimiter } from './filesSlice';

describe('createLimiter', () => {
  it('runs at most two tasks at a time, in arrival order', async () => {
    const limit = createLimiter(2);
    let running = 0;
    let peak = 0;
    const started: number[] = [];
    // Each task waits until the test releases it, so the order of events is set by hand, not by a clock.
    const release: Array<() => void> = [];
    const task = (k: number) => limit(async () => {
      started.push(k);
      running++;
      peak = Math.max(peak, running);
      await new Promise<void>((r) => release.push(r));
      running--;
      return k;
    });
    const all = Promise.all([1, 2, 3, 4, 5].map(task));
    for (let done = 0; done < 5; done++) {
      await vi.waitFor(() => expect(release.length).toBeGreaterThan(done));
      release[done]!();
    }
    const results = await all;
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
