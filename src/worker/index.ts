/** Public surface of the worker boundary. */
export { createInThreadClient, createWorkerClient, type AnalysisClient, type RequestOptions, type WorkerLike } from './client';
export { CancelledError } from './errors';
export { spawnAnalysisClient } from './spawn';
export type { RequestInput, RequestOutput, RequestType } from './protocol';
