/**
 * Whole-curve fits of series: each series' fit setup (mechanism, free parameters, window, couples,
 * comparison), the fit itself in the worker (fitRequest.ts builds it from the series' files and
 * resolved cell) with its progress and cancel, the result kept per series on the display scale,
 * and "use these values": α and R_u carried into the series' cell as one undoable step.
 */
import { CancelledError } from '../worker/errors';
import { carryableValues, defaultFitSetup, fitInputKey, fitRequestOf, shiftFitResult, withMechanism, type CarriedValue, type FitSetup } from './fitRequest';
import { toUserError, type FitEntry, type FitSlice, type SliceCreator } from './types';

export const createFitSlice: SliceCreator<FitSlice> = (set, get, deps) => {
  const running = new Map<string, AbortController>();
  const currentMemo = new Map<string, { sources: readonly unknown[]; current: boolean }>();
  const patchFit = (group: string, patch: Partial<FitEntry>) => set((s) => {
    const entry = s.fits[group];
    return entry ? { fits: { ...s.fits, [group]: { ...entry, ...patch } } } : {};
  });

  return {
    fitSetups: {},
    fits: {},

    fitSetupOf(group) {
      return get().fitSetups[group] ?? defaultFitSetup(get(), group);
    },

    setFitSetup(group, patch) {
      const now = get().fitSetupOf(group);
      const next: FitSetup = patch.mechanism && patch.mechanism !== now.mechanism ? { ...withMechanism(now, patch.mechanism), ...patch, free: patch.free ?? withMechanism(now, patch.mechanism).free } : { ...now, ...patch };
      set((s) => ({ fitSetups: { ...s.fitSetups, [group]: next } }));
    },

    async runFit(group) {
      const setup = get().fitSetupOf(group);
      running.get(group)?.abort();
      const ctrl = new AbortController();
      running.set(group, ctrl);
      let built;
      try {
        built = fitRequestOf(get(), group, setup);
      } catch (err) {
        set((s) => ({ fits: { ...s.fits, [group]: failed(setup, toUserError(err)) } }));
        return;
      }
      const { request, ids, names, cell, scale, key, notes, perArea } = built;
      const entry: FitEntry = { status: 'running', setup, fileIds: ids, fileNames: names, cell, perArea, scale, key, progress: null, progressText: 'starting', result: null, comparison: null, error: null, carried: null };
      set((s) => ({ fits: { ...s.fits, [group]: entry } }));
      if (ids.length === 0) {
        patchFit(group, { status: 'error', error: { code: 'EMPTY_INPUT', message: `series "${group}" has no voltammogram to fit` } });
        return;
      }
      try {
        const out = await deps.client.request('fit', request, {
          signal: ctrl.signal,
          onProgress: (_fraction, stage, detail) => {
            if (running.get(group) === ctrl) patchFit(group, { progress: detail ?? null, progressText: stage });
          },
        });
        if (running.get(group) !== ctrl) return;
        const result = shiftFitResult(out.result, scale.offsetV);
        patchFit(group, { status: 'ready', result: notes.length ? { ...result, notes: [...notes, ...result.notes] } : result, comparison: out.comparison, progress: null, progressText: '' });
      } catch (err) {
        if (running.get(group) !== ctrl) return;
        if (err instanceof CancelledError) patchFit(group, { status: 'cancelled', progressText: '' });
        else patchFit(group, { status: 'error', error: toUserError(err), progressText: '' });
      } finally {
        if (running.get(group) === ctrl) running.delete(group);
      }
    },

    cancelFit(group) {
      running.get(group)?.abort();
    },

    fitIsCurrent(group) {
      const s = get();
      const entry = s.fits[group];
      if (!entry) return false;
      // Screens ask on every store change (progress ticks); the key is rebuilt only when what it reads changed.
      const sources = [s.files, s.fileOrder, s.fileSettings, s.settings, s.seriesCells, s.results, entry] as const;
      const memo = currentMemo.get(group);
      if (memo && memo.sources.every((x, k) => x === sources[k])) return memo.current;
      const current = entry.key === fitInputKey(s, group, entry.setup);
      currentMemo.set(group, { sources, current });
      return current;
    },

    carryableFitValues(group) {
      const entry = get().fits[group];
      const r = entry?.result;
      // A fit per cm² has R_u·A (Ω·cm²), not the cell's R_u (Ω): it is not carried.
      return r ? carryableValues(r).filter((v) => !(entry?.perArea && v.field === 'resistanceOhm')) : [];
    },

    async useFitValues(group) {
      const values = get().carryableFitValues(group);
      if (values.length === 0 || !get().fitIsCurrent(group)) return [];
      const patch = Object.fromEntries(values.map((v) => [v.field, v.value])) as Partial<Record<CarriedValue['field'], number>>;
      // updateSeriesCell records the step for undo before it re-runs the analysis.
      const done = get().updateSeriesCell(group, (own) => ({ ...own, ...patch }));
      patchFit(group, { carried: { values, historyDepth: get().past.length } });
      await done;
      return values;
    },

    async undoFitValues(group) {
      const carried = get().fits[group]?.carried;
      if (!carried || get().past.length !== carried.historyDepth) return false;
      patchFit(group, { carried: null });
      await get().undo();
      return true;
    },
  };
};

function failed(setup: FitSetup, error: FitEntry['error']): FitEntry {
  return { status: 'error', setup, fileIds: [], fileNames: [], cell: { areaCm2: 0, concentrationMolPerCm3: 0, electronCount: 1, temperatureK: 298.15 }, scale: { name: '', offsetV: 0 }, key: '', progress: null, progressText: '', result: null, comparison: null, error, carried: null };
}
