/**
 * Scan-rate series: the files of one group, each with its own analysis (its own windows and
 * baselines), combined in the worker into ip–v½ fits, log–log slope, Ep–log v, D, k° and Γ.
 * A series is re-run shortly after any of its files is re-analysed, once no file is being read.
 */
import type { RunFileResult } from '../core/analysis/runTypes';
import { CancelledError } from '../worker/errors';
import { seriesFitOf } from './fitRequest';
import { runInputOf, seriesOptionsOf } from '../run/runInput';
import { toUserError, type HalfwaveState, type SeriesSlice, type SliceCreator } from './types';

/** True when no file of the group waits to be read or has its analysis running. */
export function groupSettled(s: Pick<HalfwaveState, 'fileOrder' | 'files' | 'results'>, group: string): boolean {
  return s.fileOrder.every((id) => {
    const f = s.files[id];
    if (f?.group !== group) return true;
    return f.status !== 'queued' && f.status !== 'importing' && s.results[id]?.status !== 'running';
  });
}

/** True while a file of any series waits to be read or is being read. */
export function readingFiles(s: Pick<HalfwaveState, 'fileOrder' | 'files'>): boolean {
  return s.fileOrder.some((id) => s.files[id]?.status === 'queued' || s.files[id]?.status === 'importing');
}

/** The finished fits of the exported series (null: all) whose files and cell have not changed since. */
function currentFits(s: HalfwaveState, group: string | null) {
  return Object.entries(s.fits).flatMap(([g, f]) => (f.result && f.status === 'ready' && (group === null || g === group) && s.fitIsCurrent(g)
    ? [seriesFitOf(g, { names: f.fileNames, scale: f.scale, setup: f.setup, cell: f.cell, result: f.result, comparison: f.comparison })] : []));
}

export const createSeriesSlice: SliceCreator<SeriesSlice> = (set, get, deps) => {
  const running = new Map<string, AbortController>();
  const timers = new Map<string, ReturnType<typeof setTimeout>>();
  /** Settled series whose fit waits until no file is being read. */
  const deferred = new Set<string>();

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
      const inputs: RunFileResult[] = [];
      const used: string[] = [];
      for (const id of fileOrder) {
        const run = results[id]?.run;
        if (files[id]?.group !== group || !run) continue;
        // The series needs no point arrays: leave the smoothed curve and the analysed potential behind rather than copy them.
        inputs.push({ ...run, analysedPotentialV: null, analysis: { ...run.analysis, smoothed: null } });
        used.push(id);
      }
      running.get(group)?.abort();
      const ctrl = new AbortController();
      running.set(group, ctrl);
      set((s) => ({ series: { ...s.series, [group]: { status: 'running', result: s.series[group]?.result ?? null, error: null, fileIds: used } } }));
      try {
        const result = await deps.client.request('runSeries', { key: group, ...seriesOptionsOf(get(), group), files: inputs }, { signal: ctrl.signal });
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
      if (s.mainView !== 'trace') return s.selectedGroup && groups.includes(s.selectedGroup) ? s.selectedGroup : (groups[0] ?? null);
      const file = s.selectedFileId ? s.files[s.selectedFileId] : undefined;
      return file?.measurement ? file.group : (groups[0] ?? null);
    },

    async exportGroup(group, format) {
      const s = get();
      const ids = group === null ? s.fileOrder : s.fileOrder.filter((id) => s.files[id]?.group === group);
      const meta = { createdAt: new Date().toISOString(), command: group === null ? 'Halfwave workbench export of every series' : `Halfwave workbench export of series "${group}"` };
      const out = await deps.client.request('export', { run: runInputOf(s, ids), format, meta, fits: currentFits(s, group) });
      return out.text;
    },

    scheduleGroup(group, delayMs = 150) {
      clearTimeout(timers.get(group));
      timers.set(group, setTimeout(() => {
        timers.delete(group);
        // While files of the group are still being read or analysed, the series would be fitted
        // again for each of them (and its results copied to a worker each time): wait for the
        // last one, whose analysis schedules the group again.
        if (!groupSettled(get(), group)) return;
        // A series fit can hold a worker for a second (its working curves are simulated) while
        // other series' files queue behind it: fit once the reading is done. The last file read
        // schedules its own series, which brings the waiting ones along.
        deferred.add(group);
        if (readingFiles(get())) return;
        const waiting = [...deferred];
        deferred.clear();
        for (const g of waiting) if (groupSettled(get(), g)) void get().analyzeGroup(g);
      }, delayMs));
    },
  };
};
