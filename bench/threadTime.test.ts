/** Thread CPU sums of the browser bench (bench/threadTime.ts): our own bookkeeping, checked by hand. */
import { describe, expect, it } from 'vitest';
import { threadTimeBetween, type ThreadSnapshot } from './threadTime';

describe('threadTimeBetween', () => {
  it('sums each role\'s CPU between two snapshots and the workers\' wait, in ms', () => {
    const before: ThreadSnapshot = new Map([
      ['1/1', { role: 'page', runNs: 1e9, waitNs: 0 }],
      ['1/2', { role: 'workers', runNs: 2e9, waitNs: 1e8 }],
    ]);
    const after: ThreadSnapshot = new Map([
      ['1/1', { role: 'page', runNs: 1.3e9, waitNs: 5e7 }],
      ['1/2', { role: 'workers', runNs: 2.5e9, waitNs: 3e8 }],
      // A thread started during the batch counts from zero.
      ['1/3', { role: 'pool', runNs: 4e8, waitNs: 0 }],
      ['2/1', { role: null, runNs: 9e9, waitNs: 0 }],
    ]);
    expect(threadTimeBetween(before, after)).toEqual({ workers: 500, page: 300, pool: 400, workersWaited: 200 });
  });

  it('reads nothing where there is no /proc', () => {
    expect(threadTimeBetween(new Map(), new Map())).toBeNull();
  });
});
