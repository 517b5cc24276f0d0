// The real analysis worker entry (src/worker/analysis.worker.ts) on a Node worker thread: a
// thread of its own, as in the browser, so a long computation there leaves this side free and
// terminate() ends it. `self` gets the two members the entry uses; tsx compiles the TypeScript.
// Messages that arrive while the entry is still loading wait for it, as a browser worker's do.
import { parentPort } from 'node:worker_threads';
import { register } from 'tsx/esm/api';

register();
const early = [];
const scope = {
  onmessage: null,
  postMessage: (message, transfer) => parentPort.postMessage(message, transfer),
};
globalThis.self = scope;
parentPort.on('message', (data) => (scope.onmessage ? scope.onmessage({ data }) : early.push(data)));
await import('../../../src/worker/analysis.worker.ts');
for (const data of early.splice(0)) scope.onmessage?.({ data });
