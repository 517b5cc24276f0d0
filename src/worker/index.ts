/** Public surface of the worker boundary. */
export { createWorkerClient, type AnalysisClient, type RequestOptions, type WorkerLike } from './client';
export { createInThreadClient } from './inThreadClient';
export { CancelledError } from './errors';
export { spawnAnalysisClient } from './spawn';
export type { RequestInput, RequestOutput, RequestType } from './protocol';
