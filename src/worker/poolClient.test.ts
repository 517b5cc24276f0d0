/** Pool dispatch: least busy first, errors pass through unchanged (hand-worked cases). */
import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../core/errors';
import type { AnalysisClient } from './client';
import { WorkerLostError } from './errors';
import { createPoolClient } from './poolClient';

function recorder(name: string, log: string[], release: Promise<void>): AnalysisClient {
  return {
    transport: 'worker',
    async request(type) {
      log.push(`${name}:${type}`);
      await release;
      if (type === 'runFiles') throw new AnalysisError('NO_PEAK', `${name} found no peak`);
      return { segments: [], cycles: [] } as never;
    },
    dispose() {
      log.push(`${name}:dispose`);
    },
  };
}

describe('createPoolClient', () => {
  it('sends each request to the client with the fewest in flight', async () => {
    const log: string[] = [];
    let open!: () => void;
    const release = new Promise<void>((r) => (open = r));
    const pool = createPoolClient([recorder('a', log, release), recorder('b', log, release)]);
    const input = { potentialV: new Float64Array(2), options: {} };
    const runs = [pool.request('segments', input), pool.request('segments', input), pool.request('segments', input)];
    expect(log).toEqual(['a:segments', 'b:segments', 'a:segments']);
    open();
    await Promise.all(runs);
    await pool.request('segments', input);
    expect(log[3]).toBe('a:segments');
    pool.dispose();
    expect(log.slice(-2)).toEqual(['a:dispose', 'b:dispose']);
  });

  it('passes a client error through as the same class', async () => {
    const pool = createPoolClient([recorder('a', [], Promise.resolve())]);
    const err = await pool.request('runFiles', {} as never).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(AnalysisError);
    expect((err as AnalysisError).code).toBe('NO_PEAK');
  });
});

/** A worker whose requests hang until it is crashed; counts how many were started. */
function fragile(name: string, log: string[]): AnalysisClient {
  const lost: Array<() => void> = [];
  const pending: Array<(e: Error) => void> = [];
  return {
    transport: 'worker',
    request(type) {
      log.push(`${name}:${type}`);
      return new Promise((resolve, reject) => {
        pending.push(reject);
        if (name.startsWith('fresh')) resolve({ segments: [], cycles: [] } as never);
      });
    },
    dispose() {},
    onLost: (l) => lost.push(l),
    crash() {
      for (const r of pending) r(new WorkerLostError());
      for (const l of lost) l();
    },
  };
}

// Recovery rules of our own (no source): a worker that stops on its own is started again, and a
// request it was doing goes once more to a live worker — except an import, whose bytes are gone.
describe('a worker that stops on its own', () => {
  it('is started again, and its analysis request is answered by the new one', async () => {
    const log: string[] = [];
    let made = 0;
    const pool = createPoolClient([() => (made++ === 0 ? fragile('first', log) : fragile(`fresh${made}`, log))]);
    const asked = pool.request('segments', { potentialV: new Float64Array(2), options: {} });
    pool.crash?.();
    await expect(asked).resolves.toEqual({ segments: [], cycles: [] });
    expect(made).toBe(2);
    expect(log).toEqual(['first:segments', 'fresh2:segments']);
  });
  it('an import in flight fails with WorkerLostError for the caller to read the file again', async () => {
    const pool = createPoolClient([() => fragile('first', [])]);
    const asked = pool.request('import', { fileName: 'a.csv', data: new ArrayBuffer(1), overrides: {} });
    pool.crash?.();
    await expect(asked).rejects.toBeInstanceOf(WorkerLostError);
  });
});
