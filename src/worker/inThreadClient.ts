/**
 * In-thread transport of the analysis client: the same handler table and error path as the
 * worker, run on the calling thread (Vitest, and the fallback where workers are unavailable).
 */
import type { AnalysisClient } from './client';
import { CancelledError, describeError, reviveError } from './errors';
import { runHandler } from './handlers';

/** Runs requests on the calling thread through the same handlers and error path as the worker. */
export function createInThreadClient(): AnalysisClient {
  let nextId = 1;
  return {
    transport: 'in-thread',
    async request(type, input, options = {}) {
      const requestId = nextId++;
      const signal = options.signal ?? new AbortController().signal;
      const check = () => {
        if (signal.aborted) throw new CancelledError();
      };
      try {
        check();
        const output = await runHandler(type, input, {
          signal,
          progress(fraction, stage, detail) {
            check();
            options.onProgress?.(fraction, stage, detail);
          },
        });
        check();
        return output;
      } catch (err) {
        throw reviveError(describeError(requestId, err));
      }
    },
    dispose() {},
  };
}
