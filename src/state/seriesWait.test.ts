/**
 * A series is fitted once no file is being read: its fit can hold a worker while the files of
 * other series queue behind it. The store runs here with the in-thread client, one import held
 * at a gate so that a file is still being read while another series is complete.
 */
import { describe, expect, it } from 'vitest';
import type { AnalysisClient } from '../worker/client';
import { createInThreadClient } from '../worker/inThreadClient';
import { readingFiles } from './seriesSlice';
import { createHalfwaveStore } from './store';
import { simulatedCsv } from './testSupport';
import type { HalfwaveState, HalfwaveStore } from './types';

/** The in-thread client, with the import of `heldName` waiting for `release()`; counts series runs per key. */
function gatedClient(heldName: string) {
  const inner = createInThreadClient();
  let release = () => {};
  const gate = new Promise<void>((resolve) => {
    release = resolve;
  });
  const seriesRuns: string[] = [];
  const client: AnalysisClient = {
    transport: inner.transport,
    dispose: () => inner.dispose(),
    async request(type, input, options) {
      if (type === 'import' && (input as { fileName: string }).fileName === heldName) await gate;
      if (type === 'runSeries') seriesRuns.push((input as { key: string }).key);
      return inner.request(type, input, options);
    },
  };
  return { client, seriesRuns, release };
}

function until(store: HalfwaveStore, done: (s: HalfwaveState) => boolean): Promise<void> {
  return new Promise((resolve) => {
    if (done(store.getState())) return resolve();
    const stop = store.subscribe((s) => {
      if (!done(s)) return;
      stop();
      resolve();
    });
  });
}

/** One timer turn: zero-delay timers set before it have run. */
const timerTurn = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

async function completeSeriesWhileAnotherIsRead(heldData: string) {
  const { client, seriesRuns, release } = gatedClient('b-0.1Vs.csv');
  const store = createHalfwaveStore({ client, storage: null });
  await store.getState().addFiles([{ name: 'a-0.1Vs.csv', data: simulatedCsv(0.1) }, { name: 'a-0.2Vs.csv', data: simulatedCsv(0.2) }], 'A');
  const reading = store.getState().addFiles([{ name: 'b-0.1Vs.csv', data: heldData }], 'B');
  expect(readingFiles(store.getState())).toBe(true);
  store.getState().scheduleGroup('A', 0);
  await timerTurn();
  return { store, seriesRuns, release, reading };
}

describe('series fits wait until no file is being read', () => {
  it('a complete series is fitted only after the other series\' file has been read, then both are', async () => {
    const { store, seriesRuns, release, reading } = await completeSeriesWhileAnotherIsRead(simulatedCsv(0.1));
    expect(seriesRuns).toEqual([]);
    expect(store.getState().series.A).toBeUndefined();
    release();
    await reading;
    await until(store, (s) => s.series.A?.status === 'ready' && s.series.B?.status === 'ready');
    expect(readingFiles(store.getState())).toBe(false);
    expect(store.getState().series.A?.fileIds).toHaveLength(2);
    expect(seriesRuns.filter((k) => k === 'A')).toHaveLength(1);
  });

  it('a last file that cannot be read releases the waiting series too', async () => {
    const { store, seriesRuns, release, reading } = await completeSeriesWhileAnotherIsRead('just some words\nno numbers here\n');
    expect(seriesRuns).toEqual([]);
    release();
    await reading;
    expect(store.getState().files[store.getState().fileOrder[2] as string]?.status).toBe('error');
    await until(store, (s) => s.series.A?.status === 'ready');
    expect(store.getState().series.A?.fileIds).toHaveLength(2);
  });
});
