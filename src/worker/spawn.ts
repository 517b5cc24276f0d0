/**
 * Starts the analysis client the app uses: a module Worker when the platform has one, otherwise
 * the in-thread transport (loaded lazily). Vite bundles the worker as a same-origin file from this `new URL` form.
 */
import { createWorkerClient, type AnalysisClient, type WorkerLike } from './client';

export function spawnAnalysisClient(): AnalysisClient {
  if (typeof Worker === 'undefined') return lazyInThreadClient();
  try {
    const worker = new Worker(new URL('./analysis.worker.ts', import.meta.url), { type: 'module', name: 'halfwave-analysis' });
    return createWorkerClient(worker as unknown as WorkerLike);
  } catch {
    return lazyInThreadClient();
  }
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
