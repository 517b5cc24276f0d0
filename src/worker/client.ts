/**
 * Promise API over the analysis worker. `request(type, input, { onProgress, signal })` resolves
 * with the handler's output or rejects with the same error class the handler threw
 * (ImportError, AnalysisError) carrying its `code`; aborting the signal rejects with
 * CancelledError at once and tells the worker to drop the work.
 *
 * Two transports share this API: a real Worker (the browser, here) and in-thread (Vitest, and the
 * fallback where workers are unavailable; inThreadClient.ts). Both run the same handler table.
 * This file does not import the handlers, so the page bundle stays free of the analysis code.
 */
import { CancelledError, reviveError, WorkerLostError } from './errors';
import { inputTransferables, type PageToWorker, type ProgressDetail, type RequestInput, type RequestOutput, type RequestType, type WorkerRequest, type WorkerToPage } from './protocol';

export interface RequestOptions {
  /** Called with fraction done (0…1), a short stage text and, for some requests, the numbers behind it. */
  onProgress?: (fraction: number, stage: string, detail?: ProgressDetail) => void;
  /** Abort to cancel; the promise then rejects with CancelledError. */
  signal?: AbortSignal;
}

export interface AnalysisClient {
  request<K extends RequestType>(type: K, input: RequestInput<K>, options?: RequestOptions): Promise<RequestOutput<K>>;
  /** 'worker' or 'in-thread', for the status line. */
  readonly transport: 'worker' | 'in-thread';
  dispose(): void;
  /** Called when the worker stops on its own (crash, out of memory); pending requests then reject with WorkerLostError. */
  onLost?: (listener: () => void) => void;
  /** Stops the worker as a crash would (pending requests reject with WorkerLostError); for recovery tests. */
  crash?: () => void;
}

/** The parts of a Worker the client uses, so tests can pass a fake. */
export interface WorkerLike {
  postMessage(message: PageToWorker, transfer: Transferable[]): void;
  addEventListener(type: 'message', listener: (event: MessageEvent<WorkerToPage>) => void): void;
  /** 'error' fires when the worker dies of an uncaught error (the browser then drops it). */
  addEventListener(type: 'error', listener: (event: Event) => void): void;
  terminate(): void;
}

interface Pending {
  resolve(value: unknown): void;
  reject(reason: unknown): void;
  onProgress?: RequestOptions['onProgress'];
}

export function createWorkerClient(worker: WorkerLike): AnalysisClient {
  const pending = new Map<number, Pending>();
  const lostListeners: Array<() => void> = [];
  let lost = false;
  let nextId = 1;
  const lose = () => {
    if (lost) return;
    lost = true;
    worker.terminate();
    for (const entry of pending.values()) entry.reject(new WorkerLostError());
    pending.clear();
    for (const l of lostListeners) l();
  };
  worker.addEventListener('error', (event) => {
    // An error event with no request to blame means the worker itself is gone.
    event.preventDefault?.();
    lose();
  });
  worker.addEventListener('message', (event) => {
    const msg = event.data;
    const entry = pending.get(msg.requestId);
    if (!entry) return;
    if (msg.type === 'progress') {
      entry.onProgress?.(msg.fraction, msg.stage, msg.detail);
      return;
    }
    pending.delete(msg.requestId);
    if (msg.type === 'result') entry.resolve(msg.output);
    else entry.reject(reviveError(msg));
  });
  return {
    transport: 'worker',
    request(type, input, options = {}) {
      const requestId = nextId++;
      return new Promise((resolve, reject) => {
        if (options.signal?.aborted) return reject(new CancelledError());
        if (lost) return reject(new WorkerLostError());
        const entry: Pending = { resolve: resolve as (v: unknown) => void, reject };
        if (options.onProgress) entry.onProgress = options.onProgress;
        pending.set(requestId, entry);
        options.signal?.addEventListener('abort', () => {
          if (!pending.delete(requestId)) return;
          worker.postMessage({ type: 'cancel', requestId }, []);
          reject(new CancelledError());
        }, { once: true });
        const msg = { type, requestId, input } as WorkerRequest;
        worker.postMessage(msg, inputTransferables(msg));
      });
    },
    dispose() {
      for (const entry of pending.values()) entry.reject(new CancelledError('the analysis worker was closed'));
      pending.clear();
      worker.terminate();
    },
    onLost: (listener) => {
      lostListeners.push(listener);
    },
    crash: lose,
  };
}
