/**
 * The app's store instance: worker client, autosave to the browser's storage, and the demo data
 * loaded at start. The UI imports only this module and `react.ts`.
 */
import type { AnalysisClient } from '../worker/client';
import { spawnAnalysisClient } from '../worker/spawn';
import { DEMO_SERIES_CELLS, fetchDemoInputs, type DemoInputs } from './demo';
import { attachAutosave } from './autosave';
import { restoreAutosave } from './sessionActions';
import { defaultStorageAdapter } from './storage';
import { createHalfwaveStore } from './store';
import type { HalfwaveStore } from './types';

let appStore: HalfwaveStore | null = null;
let appClient: AnalysisClient | null = null;

export function getAppStore(): HalfwaveStore {
  if (!appStore) {
    appClient = spawnAnalysisClient();
    appStore = createHalfwaveStore({ client: appClient, storage: defaultStorageAdapter() });
  }
  return appStore;
}

/** Stops the analysis workers as a crash would (they are started again); for the recovery test only. */
export function crashAnalysisWorkers(): void {
  appClient?.crash?.();
}

/**
 * Called once at start: brings back the last workspace (files included) when the browser kept
 * one; on a first visit it loads the demo scenario instead (`loadDemo`: by default the document
 * the page names, state/demo.ts).
 */
export async function startApp(store: HalfwaveStore = getAppStore(), storage = defaultStorageAdapter(), loadDemo: () => Promise<DemoInputs> = fetchDemoInputs): Promise<void> {
  // The demo is fetched while the browser's storage is read, not after (on a first visit the two
  // waits would otherwise add up); a restored workspace leaves it unused.
  const demoLoading = loadDemo();
  demoLoading.catch(() => undefined);
  const restored = await restoreAutosave(store, storage);
  attachAutosave(store, storage);
  if (restored) return;
  const { inputs: demo, problem } = await demoLoading;
  if (demo.length === 0) {
    if (problem) store.setState({ notice: problem });
    return;
  }
  store.setState({ notice: `Loading ${demo.length} demo voltammograms, simulated by Halfwave (not measurements).` });
  // One scan-rate series per demo scenario: the file name up to its scan-rate part.
  const groups = new Map<string, typeof demo>();
  for (const input of demo) {
    const group = demoGroup(input.name);
    groups.set(group, [...(groups.get(group) ?? []), input]);
  }
  // The well-behaved probe couple first, so the first trace on screen is the easiest to read.
  const ordered = [...groups].sort(([a], [b]) => Number(b.startsWith('probe')) - Number(a.startsWith('probe')));
  // Each series' electrode and solution, unless a restored session already gave them.
  for (const [group] of ordered) {
    const cell = DEMO_SERIES_CELLS[group];
    if (cell) store.getState().seedSeriesCell(group, cell);
  }
  await Promise.all(ordered.map(([group, inputs]) => store.getState().addFiles(inputs, group)));
  store.setState({ notice: `${demo.length} demo voltammograms loaded: simulated by Halfwave in ${groups.size} scan-rate series, not measurements.` });
}

/** "probe_RuHex_100mVs.csv" → "probe RuHex". */
export function demoGroup(fileName: string): string {
  return fileName.replace(/\.[^.]+$/, '').split('_').slice(0, 2).join(' ');
}
