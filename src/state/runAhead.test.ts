/**
 * A file analysed where it is read (the import's run ahead, state/runInput.ts): its result stands
 * only when the page would have asked for the very same run, and the numbers are those of a run
 * asked for on its own. Inputs from our simulator (testSupport.ts); expected values are the
 * separate runFiles request over the same state (the one run path), so nothing here is tuned.
 */
import { describe, expect, it } from 'vitest';
import type { AnalysisClient } from '../worker/client';
import { createInThreadClient } from '../worker/inThreadClient';
import type { RequestType } from '../worker/protocol';
import { fileRunRequest, runAheadOf, runRequestKey } from '../run/runInput';
import { createHalfwaveStore } from './store';
import { simulatedCsv } from './testSupport';
import type { HalfwaveStore } from './types';

function countingClient(before?: (type: RequestType) => void | Promise<void>): AnalysisClient & { asked: RequestType[] } {
  const inner = createInThreadClient();
  const asked: RequestType[] = [];
  return {
    asked,
    transport: inner.transport,
    dispose: () => inner.dispose(),
    async request(type, input, options) {
      asked.push(type);
      const out = await inner.request(type, input, options);
      await before?.(type);
      return out;
    },
  };
}

describe('a file analysed where it is read', () => {
  it('needs no second request, and gives what a run of its own gives', async () => {
    const client = countingClient();
    const store = createHalfwaveStore({ storage: null, client });
    const [id] = await store.getState().addFiles([{ name: 'nernst_100mVs.csv', data: simulatedCsv(0.1) }], 'ahead');
    expect(client.asked.filter((t) => t === 'runFiles')).toEqual([]);
    const kept = store.getState().results[id as string]?.run;
    expect(kept?.analysis.cycles.length).toBeGreaterThan(0);
    // The same file run on its own, through the request the page builds.
    const [own] = await createInThreadClient().request('runFiles', fileRunRequest(store.getState(), id as string));
    expect(kept).toEqual(own);
  });

  it('is run again when the settings changed while the file was read', async () => {
    const held: { store?: HalfwaveStore } = {};
    // The user changes the noise threshold while the worker reads the file.
    const client = countingClient((type) => {
      if (type === 'import') held.store?.setState((s) => ({ settings: { ...s.settings, minSignalToNoise: s.settings.minSignalToNoise + 2 } }));
    });
    const store = createHalfwaveStore({ storage: null, client });
    held.store = store;
    const [id] = await store.getState().addFiles([{ name: 'nernst_50mVs.csv', data: simulatedCsv(0.05) }], 'changed');
    expect(client.asked.filter((t) => t === 'runFiles')).toHaveLength(1);
    const [own] = await createInThreadClient().request('runFiles', fileRunRequest(store.getState(), id as string));
    expect(store.getState().results[id as string]?.run).toEqual(own);
  });

  it('is not asked for when the file takes a blank: its run needs another file', async () => {
    const store = createHalfwaveStore({ storage: null, client: countingClient() });
    await store.getState().addFiles([{ name: 'blank.csv', data: simulatedCsv(0.1) }], 'with blank');
    store.getState().seedSeriesCell('with blank', { blankFiles: ['blank.csv'] });
    const [id] = await store.getState().addFiles([{ name: 'sample.csv', data: simulatedCsv(0.1) }], 'with blank');
    expect(runAheadOf(store.getState(), id as string)).toBeNull();
    expect(store.getState().results[id as string]?.run?.blank?.fileName).toBe('blank.csv');
  });

  it('keys a run request by everything but its columns, which it counts', () => {
    const a = { run: { files: [], method: { smoothing: { kind: 'none' } }, column: new Float64Array(3) }, only: ['x.csv'] };
    const b = { ...a, run: { ...a.run, column: new Float64Array([1, 2, 3]) } };
    const c = { ...a, only: ['y.csv'] };
    expect(runRequestKey(a as never)).toBe(runRequestKey(b as never));
    expect(runRequestKey(a as never)).toContain('"column":"#3"');
    expect(runRequestKey(a as never)).not.toBe(runRequestKey(c as never));
  });
});
