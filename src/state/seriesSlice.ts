/**
 * Scan-rate series: the files of one group, each with its own analysis (its own windows and
 * baselines), combined in the worker into ip–v½ fits, log–log slope, Ep–log v, D, k° and Γ.
 * A series is re-run shortly after any of its files is re-analysed.
 */
import type { SeriesFileInput } from '../core/analysis/seriesTypes';
import { CancelledError } from '../worker/errors';
import { exportRequest } from './exportRequest';
import { resolveCell } from './seriesCell';
import { celsiusToKelvin, millimolarToMolPerCm3 } from './settings';
import { toUserError, type SeriesSlice, type SliceCreator } from './types';

export const createSeriesSlice: SliceCreator<SeriesSlice> = (set, get, deps) => {
  const running = new Map<string, AbortController>();
  const timers = new Map<string, ReturnType<typeof setTimeout>>();

  return {
    series: {},
    selectedGroup: null,

    selectGroup(group) {
      set({ selectedGroup: group });
    },

    groups() {
      const { fileOrder, files } = get();
      return [...new Set(fileOrder.map((id) => files[id]).filter((f) => f?.measurement).map((f) => f?.group as string))];
    },

    async analyzeGroup(group) {
      const { fileOrder, files, results } = get();
      const ids = fileOrder.filter((id) => files[id]?.group === group && results[id]?.analysis);
      const inputs: SeriesFileInput[] = [];
      const used: string[] = [];
      for (const id of ids) {
        const rate = files[id]?.measurement?.scanRateVPerS;
        const analysis = results[id]?.analysis;
        if (!rate || !analysis) continue;
        // The smoothed curve is not needed for the series; leave it behind rather than copy it.
        inputs.push({ fileName: files[id]?.fileName as string, scanRateVPerS: rate, analysis: { ...analysis, smoothed: null } });
        used.push(id);
      }
      running.get(group)?.abort();
      const ctrl = new AbortController();
      running.set(group, ctrl);
      set((s) => ({ series: { ...s.series, [group]: { status: 'running', result: s.series[group]?.result ?? null, error: null, fileIds: used } } }));
      const c = resolveCell(get(), group).cell;
      try {
        const result = await deps.client.request('series', {
          files: inputs,
          options: {
            electronCount: c.electronCount, areaCm2: c.areaCm2, concentrationMolPerCm3: millimolarToMolPerCm3(c.concentrationMM),
            temperatureK: celsiusToKelvin(c.temperatureC), alpha: c.alpha, cycle: 1,
          },
        }, { signal: ctrl.signal });
        set((s) => ({ series: { ...s.series, [group]: { status: 'ready', result, error: null, fileIds: used } } }));
      } catch (err) {
        if (err instanceof CancelledError) return;
        set((s) => ({ series: { ...s.series, [group]: { status: 'error', result: null, error: toUserError(err), fileIds: used } } }));
      } finally {
        if (running.get(group) === ctrl) running.delete(group);
      }
    },

    currentGroup() {
      const s = get();
      const groups = s.groups();
      if (s.mainView === 'series') return s.selectedGroup && groups.includes(s.selectedGroup) ? s.selectedGroup : (groups[0] ?? null);
      const file = s.selectedFileId ? s.files[s.selectedFileId] : undefined;
      return file?.measurement ? file.group : (groups[0] ?? null);
    },

    async exportGroup(group, format) {
      const out = await deps.client.request('export', exportRequest(get(), group, format, new Date().toISOString()));
      return out.text;
    },

    scheduleGroup(group, delayMs = 150) {
      clearTimeout(timers.get(group));
      timers.set(group, setTimeout(() => {
        timers.delete(group);
        void get().analyzeGroup(group);
      }, delayMs));
    },
  };
};
