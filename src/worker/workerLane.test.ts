/**
 * The worker lane with fake workers that answer only when told: each request gets a worker of its
 * own, a cancel ends that worker and no other, a finished worker serves the next request, and the
 * router sends only the lane's request types to the lane. (Pure bookkeeping: no published values.)
 */
import { describe, expect, it } from 'vitest';
import type { WorkerLike } from './client';
import { CancelledError } from './errors';
import type { PageToWorker, WorkerRequest, WorkerToPage } from './protocol';
import { createWorkerLane, routeRequests } from './workerLane';

interface FakeWorker extends WorkerLike {
  requests: WorkerRequest[];
  terminated: boolean;
  answer(output: unknown): void;
  /** Stops as a crashed worker does: an 'error' event with no request to blame. */
  die(): void;
}

function fakeWorker(): FakeWorker {
  const listeners: ((e: MessageEvent<WorkerToPage>) => void)[] = [];
  const errorListeners: ((e: Event) => void)[] = [];
  const w: FakeWorker = {
    requests: [],
    terminated: false,
    postMessage(msg: PageToWorker) {
      if (msg.type !== 'cancel') w.requests.push(msg);
    },
    addEventListener(type, l) {
      if (type === 'message') listeners.push(l as (typeof listeners)[number]);
      else errorListeners.push(l as (typeof errorListeners)[number]);
    },
    terminate() {
      w.terminated = true;
    },
    answer(output) {
      const req = w.requests.at(-1) as WorkerRequest;
      const data = { type: 'result', requestId: req.requestId, request: req.type, output } as WorkerToPage;
      listeners.forEach((l) => l({ data } as MessageEvent<WorkerToPage>));
    },
    die() {
      errorListeners.forEach((l) => l(new Event('error')));
    },
  };
  return w;
}

const input = { potentialV: new Float64Array(3), options: {} };

/** A lane over fake workers, with every worker it started. */
function fakeLane() {
  const made: FakeWorker[] = [];
  const lane = createWorkerLane(() => {
    const w = fakeWorker();
    made.push(w);
    return w;
  });
  return { lane, made };
}

describe('createWorkerLane', () => {
  it('runs two requests on two workers; cancelling one ends only its worker', async () => {
    const { lane, made } = fakeLane();
    const ctrl = new AbortController();
    const first = lane.request('segments', input, { signal: ctrl.signal }).catch((e: unknown) => e);
    const second = lane.request('segments', input);
    expect(made).toHaveLength(2);
    ctrl.abort();
    expect(await first).toBeInstanceOf(CancelledError);
    expect(made[0]?.terminated).toBe(true);
    expect(made[1]?.terminated).toBe(false);
    made[1]?.answer({ segments: [], cycles: [] });
    expect(await second).toEqual({ segments: [], cycles: [] });
  });

  it('keeps a finished worker for the next request and ends it on dispose', async () => {
    const { lane, made } = fakeLane();
    const a = lane.request('segments', input);
    made[0]?.answer({ segments: [], cycles: [] });
    await a;
    const b = lane.request('segments', input);
    expect(made).toHaveLength(1);
    expect(made[0]?.requests).toHaveLength(2);
    made[0]?.answer({ segments: [], cycles: [] });
    await b;
    lane.dispose();
    expect(made[0]?.terminated).toBe(true);
  });

  it('does not keep a worker that stopped on its own: the request fails, the next one starts a new worker', async () => {
    const { lane, made } = fakeLane();
    const first = lane.request('segments', input).catch((e: unknown) => e);
    made[0]?.die();
    expect((await first as Error).name).toBe('WorkerLostError');
    const second = lane.request('segments', input);
    expect(made).toHaveLength(2);
    made[1]?.answer({ ok: 1 });
    expect(await second).toEqual({ ok: 1 });
  });

  it('refuses a request whose signal is already aborted without starting a worker', async () => {
    const { lane, made } = fakeLane();
    const ctrl = new AbortController();
    ctrl.abort();
    expect(await lane.request('segments', input, { signal: ctrl.signal }).catch((e: unknown) => e)).toBeInstanceOf(CancelledError);
    expect(made).toHaveLength(0);
  });
});

describe('routeRequests', () => {
  it('sends the lane types to the lane and the rest to the general client', async () => {
    const calls: string[] = [];
    const client = (name: string) => ({
      transport: 'worker' as const,
      request: (type: string) => {
        calls.push(`${name}:${type}`);
        return Promise.resolve(null as never);
      },
      dispose: () => calls.push(`${name}:dispose`),
    });
    const routed = routeRequests(client('pool'), { fit: client('lane') });
    await routed.request('segments', input);
    await routed.request('fit', {} as never);
    routed.dispose();
    expect(calls).toEqual(['pool:segments', 'lane:fit', 'pool:dispose', 'lane:dispose']);
  });
});
