/**
 * The `fit` request through the real worker entry on a thread of its own (Node worker_threads,
 * as a browser Worker): progress reports (iteration, cost) reach the page while the fit runs, and
 * a cancel ends the fit: the request rejects with CancelledError, the worker that ran it exits
 * without ever answering with a result, and the next fit runs on a fresh worker. The input is a
 * seeded noisy series from the project's simulator (validated against Nicholson & Shain, Anal.
 * Chem. 36 (1964) 706, in src/core/simulation); the check on the fitted E°′ uses the tolerance of
 * the fit issue (2 mV), the simulator's input being the truth.
 */
import { Worker } from 'node:worker_threads';
import { afterAll, describe, expect, it } from 'vitest';
import { noisyVoltammograms, TEST_CELL } from '../../src/core/fit/fitTestSupport';
import type { Voltammogram } from '../../src/core/types';
import type { WorkerLike } from '../../src/worker/client';
import { CancelledError } from '../../src/worker/errors';
import type { FitProgressDetail, FitRequest } from '../../src/worker/fitRun';
import type { PageToWorker, ProgressDetail, WorkerToPage } from '../../src/worker/protocol';
import { createWorkerLane } from '../../src/worker/workerLane';

interface Thread extends WorkerLike {
  /** Every message the worker posted. */
  messages: WorkerToPage[];
  /** Resolves with the exit code when the thread ends. */
  exited: Promise<number>;
  ended: boolean;
}

const threads: Thread[] = [];

function analysisThread(): Thread {
  const worker = new Worker(new URL('./support/analysisWorkerThread.mjs', import.meta.url));
  const thread: Thread = {
    messages: [],
    ended: false,
    exited: new Promise((resolve) => worker.once('exit', (code) => {
      thread.ended = true;
      resolve(code);
    })),
    postMessage(message: PageToWorker, transfer: Transferable[]) {
      worker.postMessage(message, transfer as never);
    },
    addEventListener(type, listener) {
      if (type === 'error') worker.on('error', () => (listener as (e: Event) => void)(new Event('error')));
      else worker.on('message', (data: WorkerToPage) => (listener as (e: MessageEvent<WorkerToPage>) => void)({ data } as MessageEvent<WorkerToPage>));
    },
    terminate() {
      void worker.terminate();
    },
  };
  worker.on('message', (data: WorkerToPage) => thread.messages.push(data));
  threads.push(thread);
  return thread;
}

afterAll(async () => {
  await Promise.all(threads.filter((t) => !t.ended).map((t) => (t.terminate(), t.exited)));
});

/** Three scan rates of a quasi-reversible couple, 2 mV steps, 0.5 % noise (seeded). */
function series(): Voltammogram[] {
  return noisyVoltammograms({ startV: 0.45, switchV: -0.35, stepV: 0.002, uncompensatedOhm: 0, doubleLayerFPerCm2: 20e-6 },
    [{ formalPotentialV: 0.05, k0CmPerS: 0.01, alpha: 0.5, diffusionOCm2PerS: 8e-6, diffusionRCm2PerS: 8e-6 }], [0.1, 0.5, 2]);
}

function request(records: Voltammogram[], options: FitRequest['options'] = {}): FitRequest {
  return { records, fileNames: records.map((_, k) => `v${k + 1}.csv`), cell: TEST_CELL, options: { mechanism: 'E', ...options }, compare: 'none' };
}

const isFit = (d: ProgressDetail | undefined): d is FitProgressDetail => d?.kind === 'fit';

describe('fit in a worker thread', () => {
  const lane = createWorkerLane(analysisThread);

  it('a cancel ends the running fit: CancelledError, the worker exits, no result is ever posted', async () => {
    const ctrl = new AbortController();
    const seen: FitProgressDetail[] = [];
    const outcome = await lane.request('fit', request(series()), {
      signal: ctrl.signal,
      onProgress: (_f, _s, detail) => {
        if (!isFit(detail)) return;
        seen.push(detail);
        if (detail.stage === 'iterate') ctrl.abort();
      },
    }).catch((e: unknown) => e);
    expect(outcome).toBeInstanceOf(CancelledError);
    expect(seen.at(-1)?.stage).toBe('iterate');
    const thread = threads[0] as Thread;
    // The worker that ran the fit ends (terminate); wait for it rather than for a time.
    await thread.exited;
    expect(thread.messages.some((m) => m.type === 'result')).toBe(false);
    expect(thread.messages.filter((m) => m.type === 'progress').length).toBeGreaterThan(0);
  });

  it('the next fit starts a fresh worker, reports iteration and cost as it goes, and answers', async () => {
    const before = threads.length;
    const seen: FitProgressDetail[] = [];
    const records = series().slice(0, 1);
    const out = await lane.request('fit', request(records, { free: ['formalPotentialV', 'k0CmPerS', 'diffusionOCm2PerS'], profile: false, start: { shared: { doubleLayerFPerCm2: 20e-6 } } }), {
      onProgress: (_f, _s, detail) => {
        if (isFit(detail)) seen.push(detail);
      },
    });
    expect(threads.length).toBe(before + 1);
    expect(seen.length).toBeGreaterThan(0);
    expect(seen[0]?.stage).toBe('start');
    const iterations = seen.filter((d) => d.stage === 'iterate');
    expect(iterations.length).toBeGreaterThan(0);
    expect(iterations.every((d) => d.model === 'E' && (d.costA2 ?? 0) > 0 && Number.isInteger(d.iteration))).toBe(true);
    // Every progress message was delivered before the result (message order is kept).
    const fresh = threads[before] as Thread;
    const kinds = fresh.messages.map((m) => m.type);
    expect(kinds.indexOf('result')).toBe(kinds.length - 1);
    expect(kinds.filter((k) => k === 'progress').length).toBe(seen.length);
    // Fit issue: E°′ within 2 mV of the simulator's 0.05 V.
    expect(Math.abs((out.result.values.couples[0]?.formalPotentialV ?? Number.NaN) - 0.05)).toBeLessThan(0.002);
    expect(out.result.records[0]?.modelA.length).toBe(out.result.records[0]?.indices.length);
    expect(out.comparison).toBeNull();
    // The finished worker serves the next fit: no new thread.
    await lane.request('fit', request(records, { free: ['formalPotentialV'], profile: false, maxIterations: 1 }));
    expect(threads.length).toBe(before + 1);
    expect(fresh.ended).toBe(false);
  });
});
