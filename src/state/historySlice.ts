/** Undo/redo of analysis settings (global, per series and per file); each step re-runs the analysis. */
import type { HistorySlice, SliceCreator } from './types';

export const createHistorySlice: SliceCreator<HistorySlice> = (set, get) => ({
  past: [],
  future: [],
  undo() {
    const { past, settings, fileSettings, seriesCells } = get();
    const previous = past[past.length - 1];
    if (!previous) return Promise.resolve();
    set((s) => ({ past: s.past.slice(0, -1), future: [{ settings, fileSettings, seriesCells }, ...s.future], ...previous }));
    return get().analyzeAll();
  },
  redo() {
    const { future, settings, fileSettings, seriesCells } = get();
    const next = future[0];
    if (!next) return Promise.resolve();
    set((s) => ({ future: s.future.slice(1), past: [...s.past, { settings, fileSettings, seriesCells }], ...next }));
    return get().analyzeAll();
  },
});
