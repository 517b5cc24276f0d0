/**
 * Undo and redo of everything a user changes: analysis settings (global, per series, per file),
 * the sign convention, the working windows, and the workspace itself (a new workspace, an opened session). A step that
 * replaced the workspace keeps the files, their results and series, so undo brings the numbers
 * back as they were; every step re-runs the analysis of what it restored.
 */
import type { HalfwaveState, HistorySlice, HistorySnapshot, SliceCreator, WorkspaceSnapshot } from './types';

export const HISTORY_LIMIT = 100;

/** The undoable state as it is now; with `workspace`, the files and their results too. */
export function snapshotOf(s: HalfwaveState, workspace: boolean): HistorySnapshot {
  const snap: HistorySnapshot = { settings: s.settings, fileSettings: s.fileSettings, seriesCells: s.seriesCells, convention: s.convention, workingWindows: s.workingWindows };
  if (workspace) snap.workspace = workspaceOf(s);
  return snap;
}

function workspaceOf(s: HalfwaveState): WorkspaceSnapshot {
  return {
    files: s.files, fileOrder: s.fileOrder, results: s.results, series: s.series, remembered: s.remembered,
    selectedFileId: s.selectedFileId, selectedGroup: s.selectedGroup, fitSetups: s.fitSetups, fits: s.fits,
  };
}

export const createHistorySlice: SliceCreator<HistorySlice> = (set, get) => {
  function step(from: 'past' | 'future'): Promise<void> {
    const s = get();
    const list = s[from];
    const target = from === 'past' ? list[list.length - 1] : list[0];
    if (!target) return Promise.resolve();
    // What is undone must be redoable as it was: keep the workspace when the target replaced it.
    const current = snapshotOf(s, target.workspace !== undefined);
    set((x) => ({
      past: from === 'past' ? x.past.slice(0, -1) : [...x.past, current],
      future: from === 'past' ? [current, ...x.future] : x.future.slice(1),
      settings: target.settings, fileSettings: target.fileSettings, seriesCells: target.seriesCells, convention: target.convention, workingWindows: target.workingWindows,
      ...(target.workspace ?? {}),
    }));
    return get().analyzeAll();
  }
  return {
    past: [],
    future: [],
    record(workspace = false) {
      set((s) => ({ past: [...s.past, snapshotOf(s, workspace)].slice(-HISTORY_LIMIT), future: [] }));
    },
    undo: () => step('past'),
    redo: () => step('future'),
  };
};
