/**
 * The one Halfwave store, built from slices. `createHalfwaveStore` takes its dependencies (the
 * analysis client and the autosave storage) so tests run it without React, in-thread.
 */
import { createStore } from 'zustand/vanilla';
import { createAnalysisSlice } from './analysisSlice';
import { createFilesSlice } from './filesSlice';
import { createFitSlice } from './fitSlice';
import { createHistorySlice } from './historySlice';
import type { HalfwaveState, HalfwaveStore, StoreDeps } from './types';
import { createSeriesSlice } from './seriesSlice';
import { createTheorySlice } from './theorySlice';
import { createViewSlice } from './viewSlice';
import { createWorkingWindowSlice } from './workingWindowSlice';

export function createHalfwaveStore(deps: StoreDeps): HalfwaveStore {
  return createStore<HalfwaveState>()((set, get) => ({
    ...createFilesSlice(set, get, deps),
    ...createAnalysisSlice(set, get, deps),
    ...createViewSlice(set, get, deps),
    ...createHistorySlice(set, get, deps),
    ...createSeriesSlice(set, get, deps),
    ...createTheorySlice(set, get, deps),
    ...createWorkingWindowSlice(set, get, deps),
    ...createFitSlice(set, get, deps),
  }));
}
