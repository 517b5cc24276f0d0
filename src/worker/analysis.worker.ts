/// <reference lib="webworker" />
/**
 * Analysis worker entry: decodes page messages, runs the handler table and posts progress, result
 * or error back with the same requestId. Result buffers are transferred, not copied.
 */
import { describeError, CancelledError } from './errors';
import { runHandler } from './handlers';
import { collectTransferables, type PageToWorker, type WorkerRequest, type WorkerToPage } from './protocol';

const scope = self as unknown as DedicatedWorkerGlobalScope;
const running = new Map<number, AbortController>();

function post(msg: WorkerToPage, transfer: Transferable[] = []): void {
  scope.postMessage(msg, transfer);
}

async function serve(req: WorkerRequest): Promise<void> {
  const { requestId } = req;
  const ctrl = new AbortController();
  running.set(requestId, ctrl);
  try {
    const output = await runHandler(req.type, req.input as never, {
      signal: ctrl.signal,
      progress(fraction, stage, detail) {
        if (ctrl.signal.aborted) throw new CancelledError();
        post({ type: 'progress', requestId, fraction, stage, ...(detail ? { detail } : {}) });
      },
    });
    if (ctrl.signal.aborted) throw new CancelledError();
    post({ type: 'result', requestId, request: req.type, output } as WorkerToPage, collectTransferables(output));
  } catch (err) {
    post(describeError(requestId, err));
  } finally {
    running.delete(requestId);
  }
}

scope.onmessage = (event: MessageEvent<PageToWorker>) => {
  const msg = event.data;
  if (msg.type === 'cancel') running.get(msg.requestId)?.abort();
  else void serve(msg);
};
