/**
 * What the worker does for each request type: a thin table over io/ and core/. The same table runs
 * inside the worker (analysis.worker.ts) and in-thread (client.ts), so Vitest exercises exactly the
 * code the browser runs.
 */
import { findSweepSegments } from '../core/sweeps/findSweepSegments';
import type { RequestInput, RequestOutput, RequestType } from './protocol';

export interface HandlerContext {
  /** Report progress, 0…1, with a short stage text. Throws CancelledError once cancelled. */
  progress(fraction: number, stage: string): void;
}

type Handler<K extends RequestType> = (input: RequestInput<K>, ctx: HandlerContext) => RequestOutput<K> | Promise<RequestOutput<K>>;

export const handlers: { [K in RequestType]: Handler<K> } = {
  segments: (input) => findSweepSegments(input.potentialV, input.options),
};

export function runHandler<K extends RequestType>(type: K, input: RequestInput<K>, ctx: HandlerContext): Promise<RequestOutput<K>> {
  const handler = handlers[type] as Handler<K>;
  return Promise.resolve().then(() => handler(input, ctx));
}
