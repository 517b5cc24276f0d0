/**
 * The app's store instance: worker client, autosave to the browser's storage, and the demo data
 * loaded at start. The UI imports only this module and `react.ts`.
 */
import { spawnAnalysisClient } from '../worker/spawn';
import { loadDemoInputs } from './demo';
import { attachAutosave, restoreAutosave } from './sessionActions';
import { defaultStorageAdapter } from './storage';
import { createHalfwaveStore } from './store';
import type { HalfwaveStore } from './types';

let appStore: HalfwaveStore | null = null;

export function getAppStore(): HalfwaveStore {
  if (!appStore) appStore = createHalfwaveStore({ client: spawnAnalysisClient(), storage: defaultStorageAdapter() });
  return appStore;
}

/** Restores autosaved settings, then loads the demo files. Called once at start. */
export async function startApp(store: HalfwaveStore = getAppStore(), storage = defaultStorageAdapter()): Promise<void> {
  await restoreAutosave(store, storage);
  attachAutosave(store, storage);
  const demo = await loadDemoInputs();
  if (demo.length > 0) {
    store.setState({ notice: `Loaded ${demo.length} demo voltammograms (simulated, not measured).` });
    await store.getState().addFiles(demo, 'demo series');
  }
}
