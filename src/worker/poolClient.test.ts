/** Pool dispatch: least busy first, errors pass through unchanged (hand-worked cases). */
import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../core/errors';
import type { AnalysisClient } from './client';
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
