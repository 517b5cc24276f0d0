/**
 * Analysis settings and results. Every settings change is recorded for undo and re-runs the
 * analysis in the worker; a newer run for a file cancels the older one, so results always match
 * the settings on screen.
 */
import { CancelledError } from '../worker/errors';
import { fileRunRequest, runRequestDigest } from '../run/runInput';
import { resolveCell, sameTraceCell } from '../run/seriesCell';
import { defaultSettings, emptyFileSettings } from '../run/settings';
import type { RunFileResult } from '../core/analysis/runTypes';
import { toUserError, type AnalysisSlice, type SliceCreator } from './types';

export const createAnalysisSlice: SliceCreator<AnalysisSlice> = (set, get, deps) => {
  const running = new Map<string, AbortController>();

  const record = () => get().record();

  return {
    settings: defaultSettings,
    fileSettings: {},
    results: {},
    seriesCells: {},

    async analyzeFile(id, ahead) {
      const m = get().files[id]?.measurement;
      if (!m) return;
      running.get(id)?.abort();
      /** Keeps the file's result and lets its series be analysed again. */
      const done = (run: RunFileResult | null) => {
        set((s) => ({ results: { ...s.results, [id]: { status: 'ready', run, error: null } } }));
        const group = get().files[id]?.group;
        if (group) get().scheduleGroup(group);
      };
      const request = fileRunRequest(get(), id);
      // The worker that read the file analysed it already; its result stands when it ran the very request the page would send.
      if (ahead && ahead.key === runRequestDigest(request)) {
        running.delete(id);
        done(ahead.result);
        return;
      }
      const ctrl = new AbortController();
      running.set(id, ctrl);
      const prev = get().results[id];
      set((s) => ({ results: { ...s.results, [id]: { status: 'running', run: prev?.run ?? null, error: null } } }));
      try {
        const [run] = await deps.client.request('runFiles', request, { signal: ctrl.signal });
        done(run ?? null);
      } catch (err) {
        if (err instanceof CancelledError) return;
        set((s) => ({ results: { ...s.results, [id]: { status: 'error', run: null, error: toUserError(err) } } }));
      } finally {
        if (running.get(id) === ctrl) running.delete(id);
      }
    },

    async analyzeAll() {
      const { selectedFileId, fileOrder } = get();
      // The file on screen first, so the numbers the user is looking at update soonest.
      const order = selectedFileId ? [selectedFileId, ...fileOrder.filter((f) => f !== selectedFileId)] : fileOrder;
      await Promise.all(order.map((id) => get().analyzeFile(id)));
    },

    updateSettings(change) {
      record();
      set((s) => ({ settings: change(s.settings) }));
      return get().analyzeAll();
    },

    async updateFileSettings(id, change) {
      record();
      const before = JSON.stringify(get().fileSettings[id]?.peakWindows ?? []);
      set((s) => ({ fileSettings: { ...s.fileSettings, [id]: change(s.fileSettings[id] ?? emptyFileSettings) } }));
      await get().analyzeFile(id);
      // A window that was added or moved and holds no peak is kept as empty (the analysis says so); tell the user now.
      const empty = (get().results[id]?.run?.warnings ?? []).find((w) => /peak window.*no peak above the noise threshold/.test(w.message));
      if (empty && JSON.stringify(get().fileSettings[id]?.peakWindows ?? []) !== before) {
        set({ notice: `That window holds no peak above the noise threshold, so it is kept as empty and the peaks found automatically stay (${empty.message}).` });
      }
    },

    async updateSeriesCell(group, change) {
      record();
      const before = resolveCell(get(), group).cell;
      set((s) => ({ seriesCells: { ...s.seriesCells, [group]: change(s.seriesCells[group] ?? {}) } }));
      // n, T and Ru change each trace's analysis; area, concentration and α only the series fits.
      if (sameTraceCell(before, resolveCell(get(), group).cell)) return get().analyzeGroup(group);
      const { fileOrder, files } = get();
      await Promise.all(fileOrder.filter((id) => files[id]?.group === group).map((id) => get().analyzeFile(id)));
    },

    seedSeriesCell(group, values) {
      set((s) => ({ seriesCells: { ...s.seriesCells, [group]: { ...values, ...s.seriesCells[group] } } }));
    },
  };
};
