/**
 * The worker moves every buffer of an import's and a file run's answer to the page
 * (protocol.ts answerTransferables), which leaves them empty on the worker's side. That is safe
 * only when no answer holds an array the worker keeps for later (a cache of weights, wave shapes
 * or working curves): a moved cached array would be found empty by the next request, and its
 * numbers would be wrong. Checked on the demo data as the app opens it, and on the same files
 * under other settings (another baseline, windows, a blank, an internal standard): each request
 * is run, its answer's buffers are moved away exactly as the worker posts them, and the request
 * is run again. The second answer must equal the first. A property of the code, so the
 * comparison is exact; no published value is involved.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { demoBundleBytes } from '../../scripts/demoBundle';
import { startApp } from '../../src/state/app';
import { demoInputsOf } from '../../src/state/demo';
import { memoryStorageAdapter } from '../../src/state/storage';
import { createHalfwaveStore } from '../../src/state/store';
import type { HalfwaveStore } from '../../src/state/types';
import { runAheadOf, runInputOf } from '../../src/run/runInput';
import { handlers, type HandlerContext } from '../../src/worker/handlers';
import { createInThreadClient } from '../../src/worker/inThreadClient';
import { answerTransferables, type RequestType } from '../../src/worker/protocol';

const ctx: HandlerContext = { progress: () => undefined, signal: new AbortController().signal };

/** Every typed array under `value`, with its path. */
function typedArrays(value: unknown, path = '', into: Array<[string, ArrayBufferView]> = []): Array<[string, ArrayBufferView]> {
  if (value === null || typeof value !== 'object') return into;
  if (ArrayBuffer.isView(value)) into.push([path, value]);
  else for (const [k, v] of Object.entries(value)) typedArrays(v, `${path}.${k}`, into);
  return into;
}

/**
 * Runs `ask` twice, moving the first answer's buffers away in between as the worker does; returns
 * both answers (the first as it reached the page) and the number of buffers moved.
 */
async function twice(type: RequestType, ask: () => unknown): Promise<{ first: unknown; second: unknown; moved: number; left: string[] }> {
  const answer = await ask();
  const transfer = answerTransferables(type, answer);
  const first = structuredClone(answer, { transfer });
  // Every array of the answer went with it: none is left readable on the worker's side.
  const left = typedArrays(answer).filter(([, a]) => a.byteLength > 0).map(([p]) => p);
  const second = await ask();
  return { first, second, moved: transfer.length, left };
}

describe('the buffers the worker moves with an answer', () => {
  let store: HalfwaveStore;
  let demo: ReturnType<typeof demoInputsOf>;
  beforeAll(async () => {
    demo = demoInputsOf(new Uint8Array(demoBundleBytes('demo-data')));
    store = createHalfwaveStore({ client: createInThreadClient(), storage: null });
    await startApp(store, memoryStorageAdapter(), async () => ({ inputs: demo, problem: null }));
  }, 120_000);

  it('are none the worker keeps: each demo file read and analysed again gives the same answer', async () => {
    const s = store.getState();
    expect(s.fileOrder.length).toBe(demo.length);
    for (const [k, input] of demo.entries()) {
      const id = s.fileOrder[k] as string;
      const ahead = runAheadOf(s, id);
      const bytes = typeof input.data === 'string' ? new TextEncoder().encode(input.data) : input.data instanceof Uint8Array ? input.data : new Uint8Array(await input.data.arrayBuffer());
      const { first, second, moved, left } = await twice('import', () => handlers.import({ fileName: input.name, data: bytes.slice().buffer, overrides: {}, ...(ahead ? { ahead } : {}) }, ctx));
      expect(left, input.name).toEqual([]);
      expect(moved, input.name).toBeGreaterThan(2);
      expect(second, input.name).toEqual(first);
    }
  }, 120_000);

  it('are none the worker keeps: every file run at once, twice, under the demo\'s settings and under others', async () => {
    const { first, second, left } = await twice('runFiles', () => handlers.runFiles({ run: runInputOf(store.getState()) }, ctx));
    expect(left).toEqual([]);
    expect(second).toEqual(first);
    // Other baselines, a window and a blank; the kinetic readings ask for working curves and wave shapes.
    const other = createHalfwaveStore({ client: createInThreadClient(), storage: null });
    await startApp(other, memoryStorageAdapter(), async () => ({ inputs: demo, problem: null }));
    const o = other.getState();
    for (const group of o.groups()) {
      const ids = o.fileOrder.filter((id) => o.files[id]?.group === group);
      const blank = o.files[ids[0] as string]?.fileName;
      if (blank && ids.length > 2) o.seedSeriesCell(group, { blankFiles: [blank] });
    }
    await o.updateSettings((x) => ({ ...x, forwardBaseline: 'polynomial', psiMethod: 'lavagnini', smoothing: { window: 11, order: 3 } }));
    const again = await twice('runFiles', () => handlers.runFiles({ run: runInputOf(other.getState()) }, ctx));
    expect(again.left).toEqual([]);
    expect(again.second).toEqual(again.first);
  }, 120_000);
});
