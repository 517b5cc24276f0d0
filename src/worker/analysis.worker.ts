/// <reference lib="webworker" />
/**
 * Analysis worker entry: decodes page messages, runs the handler table and posts progress, result
 * or error back with the same requestId. Result buffers are transferred, not copied.
 */
import { describeError, CancelledError } from './errors';
import { runHandler } from './handlers';
import { startReading } from './importBytes';
import { answerTransferables, type PageToWorker, type WorkerRequest, type WorkerToPage } from './protocol';

const scope = self as unknown as DedicatedWorkerGlobalScope;
const running = new Map<number, AbortController>();

function post(msg: WorkerToPage, transfer: Transferable[] = []): void {
  scope.postMessage(msg, transfer);
}

/**
 * File imports run one after another, in the order sent; every other request runs at once (an
 * import yields between chunks, so a re-analysis is not held up by a long file). Interleaved, the
 * files of a batch would all finish near the end of it; in turn, each answer goes back as soon as
 * its file is read, and the page can show the first while the worker reads the rest.
 */
let imports: Promise<void> = Promise.resolve();

/** Least time between two plain progress reports of one request (ms). */
const PROGRESS_MS = 100;

async function serve(req: WorkerRequest, ctrl: AbortController): Promise<void> {
  const { requestId } = req;
  let lastProgress = performance.now();
  try {
    const output = await runHandler(req.type, req.input as never, {
      signal: ctrl.signal,
      progress(fraction, stage, detail) {
        if (ctrl.signal.aborted) throw new CancelledError();
        // A plain fraction goes out at most every PROGRESS_MS, none in a request's first PROGRESS_MS
        // (a small file is read before anyone could see its bar, and each message costs the page a
        // store update); reports with numbers (a fit's iterations) all go.
        const now = performance.now();
        if (!detail && now - lastProgress < PROGRESS_MS) return;
        lastProgress = now;
        post({ type: 'progress', requestId, fraction, stage, ...(detail ? { detail } : {}) });
      },
    });
    if (ctrl.signal.aborted) throw new CancelledError();
    post({ type: 'result', requestId, request: req.type, output } as WorkerToPage, answerTransferables(req.type, output));
  } catch (err) {
    post(describeError(requestId, err));
  } finally {
    running.delete(requestId);
  }
}

scope.onmessage = (event: MessageEvent<PageToWorker>) => {
  const msg = event.data;
  if (msg.type === 'cancel') {
    running.get(msg.requestId)?.abort();
    return;
  }
  // Registered now, so a cancel reaches a request still waiting for its turn (it then ends at once).
  const ctrl = new AbortController();
  running.set(msg.requestId, ctrl);
  if (msg.type === 'import') {
    startReading(msg.input.data);
    imports = imports.then(() => serve(msg, ctrl));
  }
  else void serve(msg, ctrl);
};
