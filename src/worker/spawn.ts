/**
 * Starts the analysis client the app uses: a module Worker when the platform has one, otherwise
 * the in-thread transport (loaded lazily). Vite bundles the worker as a same-origin file from this `new URL` form.
 */
import { createWorkerClient, type AnalysisClient, type WorkerLike } from './client';
import { createPoolClient } from './poolClient';
import { createWorkerLane, routeRequests } from './workerLane';

/**
 * Analysis workers beside the page's own thread: one core is left to the page (it handles the
 * answers, the store and the plots), up to two workers. On a two-core machine a second worker
 * only competes with the page: measured with `npm run bench:browser`, the demo was shown later and
 * a 120-file folder read more slowly with two workers than with one.
 */
export function workerCount(hardwareConcurrency: number | undefined): number {
  return Math.max(1, Math.min(2, (hardwareConcurrency ?? 1) - 1));
}

function analysisWorker(name: string): WorkerLike {
  return new Worker(new URL('./analysis.worker.ts', import.meta.url), { type: 'module', name }) as unknown as WorkerLike;
}

/**
 * The pool serves every request but series and fits. Fits run on workers of their own, ended on
 * cancel (workerLane.ts). A series' analysis runs on one worker of its own, started with the first
 * series: it simulates working curves for up to a second of computing, and files picked
 * meanwhile are read and analysed beside it instead of waiting behind it.
 */
export function spawnAnalysisClient(): AnalysisClient {
  if (typeof Worker === 'undefined') return lazyInThreadClient();
  try {
    // Factories, so the pool can start a worker again when one stops on its own.
    const factories = Array.from({ length: workerCount(globalThis.navigator?.hardwareConcurrency) }, (_, k) => () => createWorkerClient(analysisWorker(`halfwave-analysis-${k + 1}`)));
    let fits = 0;
    const series = startedOnFirstRequest(() => createPoolClient([() => createWorkerClient(analysisWorker('halfwave-series'))]));
    return routeRequests(createPoolClient(factories), { fit: createWorkerLane(() => analysisWorker(`halfwave-fit-${++fits}`)), runSeries: series });
  } catch {
    return lazyInThreadClient();
  }
}

/** A client made at its first request (a worker started only when there is work for it). */
export function startedOnFirstRequest(make: () => AnalysisClient): AnalysisClient {
  let client: AnalysisClient | null = null;
  return {
    transport: 'worker',
    request: (type, input, options) => (client ??= make()).request(type, input, options),
    dispose() {
      client?.dispose();
    },
  };
}

/** The in-thread fallback, loaded only when needed (it carries the whole analysis code). */
function lazyInThreadClient(): AnalysisClient {
  let loading: Promise<AnalysisClient> | null = null;
  const client = () => (loading ??= import('./inThreadClient').then((m) => m.createInThreadClient()));
  return {
    transport: 'in-thread',
    request: (type, input, options) => client().then((c) => c.request(type, input, options)),
    dispose() {},
  };
}
