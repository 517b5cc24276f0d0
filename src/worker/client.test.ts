/**
 * Round trip through the worker boundary: page → message → worker entry → core → message → page,
 * with the real `analysis.worker.ts` running on a fake worker scope, and the in-thread transport.
 * Expected values are worked by hand from the triangle waves below (no published source needed:
 * vertex positions of a triangle wave are arithmetic).
 */
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { AnalysisError } from '../core/errors';
import { ImportError } from '../io/errors';
import { createWorkerClient, type AnalysisClient, type WorkerLike } from './client';
import { createInThreadClient } from './inThreadClient';
import { CancelledError } from './errors';
import type { PageToWorker, WorkerToPage } from './protocol';

/** Two cycles 0 → 1 → 0 V in steps of 0.01 V: 401 points, vertices at 100, 200, 300. */
function triangle(cycles: number): Float64Array {
  const out: number[] = [];
  for (let c = 0; c < cycles; c++) {
    for (let i = c === 0 ? 0 : 1; i <= 100; i++) out.push(i / 100);
    for (let i = 99; i >= 0; i--) out.push(i / 100);
  }
  return Float64Array.from(out);
}

/** Every message the fake worker scope posted, for checking what the worker did. */
const posted: WorkerToPage[] = [];

let entry: Promise<WorkerLike> | null = null;

/** The real worker entry on a fake global scope (a module runs once, so it is made once). */
function loadWorkerEntry(): Promise<WorkerLike> {
  entry ??= makeWorkerEntry();
  return entry;
}

async function makeWorkerEntry(): Promise<WorkerLike> {
  const pageListeners: ((e: MessageEvent<WorkerToPage>) => void)[] = [];
  const scope = {
    onmessage: null as null | ((e: MessageEvent<PageToWorker>) => void),
    postMessage(msg: WorkerToPage, transfer: Transferable[] = []) {
      const copy = structuredClone(msg, { transfer }) as WorkerToPage;
      posted.push(copy);
      setTimeout(() => pageListeners.forEach((l) => l({ data: copy } as MessageEvent<WorkerToPage>)), 0);
    },
  };
  (globalThis as unknown as { self: unknown }).self = scope;
  await import('./analysis.worker');
  return {
    postMessage(msg, transfer) {
      const copy = structuredClone(msg, { transfer }) as PageToWorker;
      setTimeout(() => scope.onmessage?.({ data: copy } as MessageEvent<PageToWorker>), 0);
    },
    addEventListener(type: string, listener: (e: never) => void) {
      if (type === 'message') pageListeners.push(listener as (e: MessageEvent<WorkerToPage>) => void);
    },
    terminate() {},
  };
}

const transports: [string, () => Promise<AnalysisClient>][] = [
  ['worker entry', async () => createWorkerClient(await loadWorkerEntry())],
  ['in-thread', () => Promise.resolve(createInThreadClient())],
];

describe.each(transports)('analysis client over %s', (_name, make) => {
  let client: AnalysisClient;
  beforeAll(async () => {
    client = await make();
  });

  it('splits a two-cycle triangle wave into four sweeps and two cycles', async () => {
    const potentialV = triangle(2);
    expect(potentialV.length).toBe(401);
    const split = await client.request('segments', { potentialV, options: {} });
    expect(split.segments.map((s) => [s.start, s.end, s.direction, s.cycle])).toEqual([
      [0, 101, 'positive', 1],
      [100, 201, 'negative', 1],
      [200, 301, 'positive', 2],
      [300, 401, 'negative', 2],
    ]);
    expect(split.cycles.map((c) => [c.index, c.start, c.end])).toEqual([
      [1, 0, 200],
      [2, 200, 401],
    ]);
  });

  it('rethrows a core failure as AnalysisError with its code', async () => {
    const flat = new Float64Array(10).fill(0.2);
    const err = await client.request('segments', { potentialV: flat, options: {} }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(AnalysisError);
    expect((err as AnalysisError).code).toBe('OUT_OF_RANGE');
    expect((err as AnalysisError).message).toMatch(/never changes/);
  });

  it('rethrows an unreadable file as ImportError with its code, file and message intact', async () => {
    const data = new TextEncoder().encode('only words here\nand no table at all\n').buffer;
    const err = await client.request('import', { fileName: 'words.txt', data, overrides: {} }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ImportError);
    const e = err as ImportError;
    expect(e.fileName).toBe('words.txt');
    expect(e.code).toMatch(/^[A-Z_]+$/);
    expect(e.message.startsWith('words.txt')).toBe(true);
    expect(e.message.indexOf('words.txt', 1)).toBe(-1);
  });

  it('reads a picked file given as its Blob, as it reads the same bytes given as a buffer', async () => {
    const text = 'E/V,I/A\n' + Array.from(triangle(1), (e, k) => `${e},${Math.sin(k / 7) * 1e-6}`).join('\n');
    const fromBlob = await client.request('import', { fileName: 'picked.csv', data: new Blob([text]), overrides: {} });
    const fromBytes = await client.request('import', { fileName: 'picked.csv', data: new TextEncoder().encode(text).buffer, overrides: {} });
    expect(fromBlob.measurement.potentialV.length).toBe(201);
    expect(Array.from(fromBlob.measurement.currentA)).toEqual(Array.from(fromBytes.measurement.currentA));
    expect(fromBlob.sha256).toBe(fromBytes.sha256);
  });

  it('rejects with CancelledError when the signal is already aborted', async () => {
    const ctrl = new AbortController();
    ctrl.abort();
    const err = await client.request('segments', { potentialV: triangle(1), options: {} }, { signal: ctrl.signal }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(CancelledError);
  });
});

describe('cancelling an import in the worker', () => {
  it('stops between chunks and answers with CancelledError, never a result', async () => {
    const client = createWorkerClient(await loadWorkerEntry());
    const rows = ['E/V,I/A'];
    for (let i = 0; i < 400_000; i++) rows.push(`${((i % 2000) < 1000 ? i % 1000 : 1000 - (i % 1000)) / 1000},${Math.sin(i / 50) * 1e-6}`);
    const data = new TextEncoder().encode(rows.join('\n')).buffer;
    const ctrl = new AbortController();
    const before = posted.length;
    const done = client.request('import', { fileName: 'long.csv', data, overrides: {} }, {
      signal: ctrl.signal,
      onProgress: (fraction) => fraction > 0 && ctrl.abort(),
    }).catch((e: unknown) => e);
    expect(await done).toBeInstanceOf(CancelledError);
    // Wait (on a busy machine, possibly a while) for the worker to reach its next chunk, see the
    // cancel and answer this request; only messages posted since the request count.
    const answer = () => posted.slice(before).filter((m) => m.type !== 'progress' && 'requestId' in m);
    await vi.waitFor(() => expect(answer().length).toBeGreaterThan(0), { timeout: 20_000, interval: 20 });
    const mine = answer();
    expect(mine.length).toBe(1);
    const last = mine[0];
    expect(last?.type).toBe('error');
    expect(last && last.type === 'error' ? last.errorName : '').toBe('CancelledError');
  });
});
