/** How many analysis workers the page starts for the cores the browser reports (the rule in spawn.ts; common practice, no source). */
import { describe, expect, it } from 'vitest';
import type { AnalysisClient } from './client';
import { startedOnFirstRequest, workerCount } from './spawn';

describe('workerCount', () => {
  it('leaves one core to the page and starts one to two workers', () => {
    expect(workerCount(undefined)).toBe(1);
    expect(workerCount(1)).toBe(1);
    expect(workerCount(2)).toBe(1);
    expect(workerCount(3)).toBe(2);
    expect(workerCount(16)).toBe(2);
  });
});

describe('startedOnFirstRequest', () => {
  it('makes its client at the first request only, once, and passes requests through', async () => {
    let made = 0;
    const seen: string[] = [];
    const inner: AnalysisClient = {
      transport: 'worker',
      request: (type) => {
        seen.push(type);
        return Promise.resolve({ text: 'ok' }) as never;
      },
      dispose: () => seen.push('dispose'),
    };
    const client = startedOnFirstRequest(() => {
      made++;
      return inner;
    });
    expect(made).toBe(0);
    await client.request('export', {} as never);
    await client.request('runSeries', {} as never);
    expect(made).toBe(1);
    client.dispose();
    expect(seen).toEqual(['export', 'runSeries', 'dispose']);
  });

  it('disposes nothing when no request came', () => {
    let made = 0;
    startedOnFirstRequest(() => {
      made++;
      return { transport: 'worker', request: () => Promise.reject(new Error('unused')), dispose: () => undefined };
    }).dispose();
    expect(made).toBe(0);
  });
});
