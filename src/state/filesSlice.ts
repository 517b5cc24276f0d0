/**
 * Loaded files: queue many imports through the workers, a bounded number at a time (so 100+
 * files and million-row files never block the page), track per-file progress and errors, re-import with
 * overrides, and group files into scan-rate series. A failed import never removes anything that
 * was already loaded: a failed re-import keeps the previous measurement beside its error.
 */
import { groupIntoSeries } from '../io/groupIntoSeries';
import { naturalCompare } from '../io/naturalOrder';
import { WorkerLostError } from '../worker/errors';
import type { ImportOverrides } from '../io/types';
import { runAheadOf } from '../run/runInput';
import { bytesOf, sourceOf, sourceSize } from './fileSource';
import { resolveCell, sameTraceCell, type SeriesCell } from '../run/seriesCell';
import { mergeFileSettings } from '../run/settings';
import { toUserError, type FileEntry, type FileInput, type FilesSlice, type RestoredFile, type SliceCreator } from './types';

export const DEFAULT_GROUP = 'series 1';

/**
 * Files read at the same time: up to 256, as long as they hold no more than 16 MB together
 * (always one, however large). The whole demo or a folder of small exports is handed to the
 * workers at once, so they never wait for the page to send the next file while it draws the last
 * answer (with 32, a 120-file batch took about 85 ms longer: the worker ran dry during the page's
 * longer frames), and a few large files still go two or three at a time.
 */
const IMPORT_SLOTS = 256;
const IMPORT_BYTES = 16 * 1024 * 1024;
/** Files started together once that many places are free: read from the disk in one go. */
const IMPORT_TOGETHER = 8;

/**
 * At most `slots` tasks at once whose weights add up to no more than `budget` (a task heavier
 * than the budget runs alone), first come first served; a finished task hands its place on.
 * With `together` > 1, waiting tasks start only once that many places are free (or nothing
 * runs), so they start in groups: the requests of a group reach the worker together, and it
 * reads their files from the disk in one go (worker/importBytes.ts).
 */
export function createLimiter(slots: number, budget = Infinity, together = 1): <T>(task: () => Promise<T>, weight?: number) => Promise<T> {
  let active = 0;
  let used = 0;
  const waiting: Array<{ weight: number; go: () => void }> = [];
  const fits = (weight: number) => active === 0 || (active < slots && used + weight <= budget);
  const groupFree = () => active === 0 || active <= slots - together;
  const take = (weight: number) => {
    active++;
    used += weight;
  };
  return async (task, weight = 0) => {
    if (waiting.length === 0 && fits(weight)) take(weight);
    else await new Promise<void>((go) => waiting.push({ weight, go }));
    try {
      return await task();
    } finally {
      active--;
      used -= weight;
      // Checked once: the group then fills every place that fits.
      const start = groupFree();
      while (start && waiting.length > 0 && fits(waiting[0]!.weight)) {
        const next = waiting.shift()!;
        take(next.weight);
        next.go();
      }
    }
  };
}

export const createFilesSlice: SliceCreator<FilesSlice> = (set, get, deps) => {
  let nextId = 1;
  const limit = createLimiter(IMPORT_SLOTS, IMPORT_BYTES, IMPORT_TOGETHER);
  // Work on one file stays in order (a re-import never overtakes the first reading).
  const chains = new Map<string, Promise<void>>();
  /** Told of each file as soon as it is read (before its analysis), while an upload waits for its first one. */
  const readWatchers = new Set<(id: string) => void>();

  const patch = (id: string, change: Partial<FileEntry>) =>
    set((s) => {
      const entry = s.files[id];
      return entry ? { files: { ...s.files, [id]: { ...entry, ...change } } } : {};
    });

  const aheadOf = (id: string) => {
    const ahead = runAheadOf(get(), id);
    return ahead ? { ahead } : {};
  };

  /** Reads a file in a worker; when the worker stops mid-file, reads it once more from the kept bytes. */
  async function readFile(entry: FileEntry, overrides: ImportOverrides, id: string) {
    // The snapshot of the file's run is taken as each attempt is sent, after the bytes are read.
    const ask = async () => {
      // A picked file goes as its Blob: the worker reads it, off this thread (worker/importBytes.ts).
      const data = entry.source instanceof Uint8Array ? await bytesOf(entry.source) : entry.source;
      return deps.client.request('import', { fileName: entry.fileName, data, overrides, ...aheadOf(id) }, {
        onProgress: (fraction) => patch(id, { progress: fraction }),
      });
    };
    try {
      return await ask();
    } catch (err) {
      if (!(err instanceof WorkerLostError)) throw err;
      set({ notice: `The analysis worker stopped while reading ${entry.fileName}; it was started again and the file is read once more.` });
      return ask();
    }
  }

  async function importOne(id: string, overrides: ImportOverrides): Promise<void> {
    const entry = get().files[id];
    if (!entry) return;
    patch(id, { status: 'importing', progress: 0 });
    try {
      const cellBefore = resolveCell(get(), entry.group).cell;
      const out = await readFile(entry, overrides, id);
      patch(id, { status: 'ready', progress: 1, error: null, measurement: out.measurement, warnings: out.warnings, sha256: out.sha256, overrides });
      applyRemembered(id);
      if (get().selectedFileId === null) get().selectFile(id);
      refreshGroup(entry.group, cellBefore, id);
      const analysed = get().analyzeFile(id, out.ahead);
      for (const watch of [...readWatchers]) watch(id);
      await analysed;
    } catch (err) {
      const kept = get().files[id]?.measurement ?? null;
      patch(id, { status: kept ? 'ready' : 'error', progress: 0, error: toUserError(err) });
      // Series fits wait while files are read (seriesSlice.ts); a failed last file must release them too.
      get().scheduleGroup(entry.group);
    }
  }

  /**
   * A file's preamble can give its series a value it did not have (the temperature, say); when
   * that changes what each trace's analysis uses, the series' other files are analysed again.
   */
  function refreshGroup(group: string, before: SeriesCell, except: string | null): void {
    if (sameTraceCell(before, resolveCell(get(), group).cell)) return;
    for (const other of get().fileOrder) {
      if (other !== except && get().files[other]?.group === group && get().files[other]?.measurement) void get().analyzeFile(other);
    }
  }

  /** A file whose SHA-256 matches a remembered session record gets its group and settings back. */
  function applyRemembered(id: string): void {
    const entry = get().files[id];
    const record = entry?.sha256 ? get().remembered.find((r) => r.sha256 === entry.sha256) : undefined;
    if (!entry || !record) return;
    set((s) => ({
      remembered: s.remembered.filter((r) => r !== record),
      files: { ...s.files, [id]: { ...entry, group: record.group } },
      fileSettings: { ...s.fileSettings, [id]: mergeFileSettings(record.analysis) },
    }));
    if (Object.keys(record.overrides).length > 0 && Object.keys(entry.overrides).length === 0) {
      void enqueue(id, record.overrides);
    }
  }

  function enqueue(id: string, overrides: ImportOverrides): Promise<void> {
    const run = (chains.get(id) ?? Promise.resolve()).then(() => limit(() => importOne(id, overrides), get().files[id]?.sizeBytes ?? 0));
    chains.set(id, run);
    return run;
  }

  /** Adds files, each with its series, import overrides and (when restoring) its own windows and baselines; reads them. */
  async function restoreFiles(records: RestoredFile[]): Promise<string[]> {
    const entries: FileEntry[] = records.map((input) => {
      const source = sourceOf(input.data);
      return {
        id: `file-${nextId++}`, fileName: input.name, sizeBytes: sourceSize(source), source, sha256: null, group: input.group,
        status: 'queued', progress: 0, error: null, measurement: null, warnings: [], overrides: input.overrides,
      };
    });
    const preset = Object.fromEntries(entries.flatMap((e, k) => (records[k]?.fileSettings ? [[e.id, records[k].fileSettings]] : [])));
    set((s) => ({
      files: { ...s.files, ...Object.fromEntries(entries.map((e) => [e.id, e])) },
      fileOrder: [...s.fileOrder, ...entries.map((e) => e.id)],
      fileSettings: { ...s.fileSettings, ...preset },
      importBatch: { done: s.importBatch?.done ?? 0, total: (s.importBatch?.total ?? 0) + entries.length },
    }));
    await Promise.all(entries.map((e) => enqueue(e.id, e.overrides).then(() => set((s) => ({
      importBatch: s.importBatch ? { ...s.importBatch, done: s.importBatch.done + 1 } : null,
    })))));
    set((s) => (s.importBatch && s.importBatch.done >= s.importBatch.total ? { importBatch: null } : {}));
    const failed = entries.filter((e) => get().files[e.id]?.status === 'error').map((e) => e.fileName);
    if (failed.length > 0) {
      const names = failed.length > 3 ? `${failed.slice(0, 3).join(', ')} and ${failed.length - 3} more` : failed.join(', ');
      set({ notice: `${failed.length} of ${entries.length} file${entries.length === 1 ? '' : 's'} could not be read (${names}); the reason is shown beside each file. Everything else stays loaded.` });
    }
    return entries.map((e) => e.id);
  }

  return {
    files: {},
    fileOrder: [],
    importBatch: null,
    remembered: [],

    addFiles(inputs: FileInput[], group = DEFAULT_GROUP) {
      return restoreFiles(inputs.map((input) => ({ ...input, group, overrides: {}, fileSettings: null })));
    },

    restoreFiles(records) {
      return restoreFiles(records);
    },


    async addUpload(batches, onFirstRead) {
      const taken = new Set(Object.values(get().files).map((f) => f?.group));
      const plan: Array<{ group: string; inputs: FileInput[] }> = [];
      for (const batch of batches) {
        // Natural order, as the command line lists a folder: 20 mV/s before 100 mV/s.
        const b = { ...batch, inputs: [...batch.inputs].sort((x, y) => naturalCompare(x.name, y.name)) };
        for (const g of groupIntoSeries(b.inputs.map((i) => ({ name: i.name, folder: b.folder })))) {
          let group = g.key;
          for (let k = 2; taken.has(group); k++) group = `${g.key} (${k})`;
          taken.add(group);
          plan.push({ group, inputs: g.members.map((i) => b.inputs[i]!) });
        }
      }
      // A new series starts from the defaults and its own files: values saved under the same
      // name for an earlier, unloaded experiment must not leak into it.
      set((s) => {
        const seriesCells = { ...s.seriesCells };
        const workingWindows = { ...s.workingWindows };
        for (const p of plan) {
          delete seriesCells[p.group];
          delete workingWindows[p.group];
        }
        return { seriesCells, workingWindows };
      });
      const first = plan[0]?.group;
      const watch = (id: string) => {
        if (first === undefined || get().files[id]?.group !== first) return;
        readWatchers.delete(watch);
        onFirstRead?.(first);
      };
      if (onFirstRead && first !== undefined) readWatchers.add(watch);
      try {
        const ids = (await Promise.all(plan.map((p) => get().addFiles(p.inputs, p.group)))).flat();
        return { ids, groups: plan.map((p) => p.group) };
      } finally {
        readWatchers.delete(watch);
      }
    },

    newWorkspace() {
      get().record(true);
      set({
        files: {}, fileOrder: [], results: {}, series: {}, remembered: [], fileSettings: {}, seriesCells: {}, workingWindows: {}, fitSetups: {}, fits: {},
        selectedFileId: null, selectedGroup: null, importBatch: null,
        notice: 'New workspace: every file and series was cleared (Undo brings them back).',
      });
    },

    reimportFile(id, overrides) {
      return enqueue(id, overrides);
    },

    removeFile(id) {
      if (!get().files[id]) return;
      get().record(true);
      const group = get().files[id]?.group;
      const cellBefore = group ? resolveCell(get(), group).cell : null;
      set((s) => {
        const { [id]: _gone, ...files } = s.files;
        const { [id]: _r, ...results } = s.results;
        const order = s.fileOrder.filter((f) => f !== id);
        return { files, results, fileOrder: order, selectedFileId: s.selectedFileId === id ? (order[0] ?? null) : s.selectedFileId };
      });
      if (group && cellBefore) refreshGroup(group, cellBefore, null);
      if (group) get().scheduleGroup(group);
    },

    setFileGroup(id, group) {
      const before = get().files[id]?.group;
      const after = group.trim() || DEFAULT_GROUP;
      if (before === after) return;
      get().record(true);
      patch(id, { group: after });
      if (before) get().scheduleGroup(before);
      get().scheduleGroup(after);
      // The file now takes its new series' cell (n, T, Ru), so its own analysis runs again too.
      void get().analyzeFile(id);
    },
  };
};
