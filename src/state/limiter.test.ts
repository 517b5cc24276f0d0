/** The import limiter: never more than its slots or its weight budget at once, first come first served (hand-worked). */
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

  it('keeps the weights of the tasks running within the budget, lets one heavier task run alone, and never lets a light task overtake', async () => {
    const limit = createLimiter(10, 100);
    const running = new Set<string>();
    const seen: string[][] = [];
    const release = new Map<string, () => void>();
    const task = (name: string, weight: number) => limit(async () => {
      running.add(name);
      seen.push([...running].sort());
      await new Promise<void>((r) => release.set(name, r));
      running.delete(name);
    }, weight);
    const all = Promise.all([task('a', 60), task('b', 30), task('huge', 500), task('c', 5), task('d', 5)]);
    await vi.waitFor(() => expect(release.has('b')).toBe(true));
    // a + b = 90 fit; 'huge' waits for the budget to be free, and 'c' (5) waits behind it.
    expect([...running].sort()).toEqual(['a', 'b']);
    release.get('a')!();
    release.get('b')!();
    await vi.waitFor(() => expect(release.has('huge')).toBe(true));
    expect([...running]).toEqual(['huge']);
    release.get('huge')!();
    await vi.waitFor(() => expect(release.has('d')).toBe(true));
    expect([...running].sort()).toEqual(['c', 'd']);
    release.get('c')!();
    release.get('d')!();
    await all;
    expect(seen.every((names) => names.length === 1 || names.every((n) => n !== 'huge'))).toBe(true);
  });

  it('with places given in groups, starts waiting tasks only once a group of places is free, then all that fit', async () => {
    const limit = createLimiter(4, Infinity, 2);
    const running = new Set<number>();
    const release = new Map<number, () => void>();
    const task = (k: number) => limit(async () => {
      running.add(k);
      await new Promise<void>((r) => release.set(k, r));
      running.delete(k);
      return k;
    });
    const all = Promise.all([1, 2, 3, 4, 5, 6, 7].map(task));
    await vi.waitFor(() => expect(running.size).toBe(4));
    release.get(1)!();
    // One place free: 5 waits for a second one.
    await vi.waitFor(() => expect(running.has(1)).toBe(false));
    await new Promise((r) => setTimeout(r, 10));
    expect([...running].sort()).toEqual([2, 3, 4]);
    release.get(2)!();
    // Two free: 5 and 6 start together.
    await vi.waitFor(() => expect([...running].sort()).toEqual([3, 4, 5, 6]));
    for (const k of [3, 4, 5, 6]) release.get(k)!();
    // Nothing else runs: the last task starts alone.
    await vi.waitFor(() => expect(release.has(7)).toBe(true));
    release.get(7)!();
    expect(await all).toEqual([1, 2, 3, 4, 5, 6, 7]);
  });
});
