/**
 * Starts the analysis client the app uses: a module Worker when the platform has one, otherwise
 * the in-thread transport. Vite bundles the worker as a same-origin file from this `new URL` form.
 */
import { createInThreadClient, createWorkerClient, type AnalysisClient, type WorkerLike } from './client';

export function spawnAnalysisClient(): AnalysisClient {
  if (typeof Worker === 'undefined') return createInThreadClient();
  try {
    const worker = new Worker(new URL('./analysis.worker.ts', import.meta.url), { type: 'module', name: 'halfwave-analysis' });
    return createWorkerClient(worker as unknown as WorkerLike);
  } catch {
    return createInThreadClient();
  }
}
