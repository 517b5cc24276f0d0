/**
 * A lane for requests that a worker cannot interrupt: a fit computes for seconds without turning
 * to its message queue, so a cancel message would wait until the fit is over. Each request of the
 * lane runs on a worker of its own; cancelling ends that worker at once (the fit stops, the core
 * no longer uses the CPU) and leaves every other request alone. A worker that finished is kept for
 * the next request, so only the first fit and the one after a cancel (or a worker that stopped on
 * its own) start a worker.
 */
import { createWorkerClient, type AnalysisClient, type WorkerLike } from './client';
import { CancelledError } from './errors';
import type { RequestType } from './protocol';

export interface WorkerLaneOptions {
  /** Finished workers kept for the next request. @default 1 */
  keepIdle?: number;
}

export function createWorkerLane(spawn: () => WorkerLike, options: WorkerLaneOptions = {}): AnalysisClient {
  const keepIdle = options.keepIdle ?? 1;
  const idle: AnalysisClient[] = [];
  const busy = new Set<AnalysisClient>();
  return {
    transport: 'worker',
    async request(type, input, requestOptions = {}) {
      const { signal } = requestOptions;
      if (signal?.aborted) throw new CancelledError();
      const client = idle.pop() ?? createWorkerClient(spawn());
      busy.add(client);
      let ended = false;
      // A worker that stopped on its own (out of memory) is not kept for the next request.
      client.onLost?.(() => {
        ended = true;
      });
      // Added after the client's own listener, which rejects the request with CancelledError first.
      const end = () => {
        ended = true;
        client.dispose();
      };
      const answer = client.request(type, input, requestOptions);
      signal?.addEventListener('abort', end, { once: true });
      try {
        return await answer;
      } finally {
        signal?.removeEventListener('abort', end);
        busy.delete(client);
        if (!ended) {
          if (idle.length < keepIdle) idle.push(client);
          else client.dispose();
        }
      }
    },
    dispose() {
      for (const c of [...idle.splice(0), ...busy]) c.dispose();
      busy.clear();
    },
  };
}

/** One client over several: requests of the types in `lanes` go to their lane, the rest to `general`. */
export function routeRequests(general: AnalysisClient, lanes: Partial<Record<RequestType, AnalysisClient>>): AnalysisClient {
  return {
    transport: general.transport,
    request(type, input, options) {
      return (lanes[type] ?? general).request(type, input, options);
    },
    dispose() {
      general.dispose();
      for (const lane of new Set(Object.values(lanes))) lane?.dispose();
    },
  };
}
