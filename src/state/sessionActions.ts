/**
 * Sessions and autosave. A session names every file with its SHA-256 and keeps, in workspace
 * order, its series, import overrides and own peak windows and baselines, beside the settings,
 * every series' cell values and the display choices. Opening a session replaces the workspace
 * (undoable, never a silent merge); files that came with their bytes are read again, the others
 * wait (by SHA-256) until the user loads them. Autosave writes the same session text and every
 * file's bytes to the browser's storage, so a reload brings the whole workspace back.
 */
import { decodeBase64, encodeBase64, parseSession, serializeSession, SESSION_FORMAT, SESSION_VERSION, type SessionDocument, type SessionFileRecord } from '../io/session';
import { defaultSettings, mergeFileSettings, mergeSeriesCells, mergeSettings } from '../run/settings';
import type { StorageAdapter } from './storage';
import { bytesOf as bytesOfSource, type FileSource } from './fileSource';
import type { FileEntry, HalfwaveState, HalfwaveStore, OverlayNormalisation, ReadoutTab, ViewSlice } from './types';
import { mergeFitSetups } from './fitRequest';
import { mergeWorkingWindows } from './workingWindowSlice';

export const AUTOSAVE_KEY = 'halfwave.autosave.v2';

function recordOf(state: HalfwaveState, id: string): SessionFileRecord | null {
  const f = state.files[id];
  if (!f || !f.measurement) return null;
  return { fileName: f.fileName, sha256: f.sha256, sizeBytes: f.sizeBytes, group: f.group, overrides: f.overrides, analysis: { ...(state.fileSettings[id] ?? {}) } };
}

const READOUT_TABS: readonly ReadoutTab[] = ['couples', 'files', 'peaks', 'import', 'notes'];
const NORMALISATIONS: readonly OverlayNormalisation[] = ['current', 'density', 'diffusion', 'capacitive'];

/** The series overlay's scaling and cycle from a session, or the defaults. */
function overlayOf(v: unknown): ViewSlice['seriesOverlay'] {
  const o = typeof v === 'object' && v !== null ? (v as Record<string, unknown>) : {};
  return {
    normalisation: NORMALISATIONS.includes(o.normalisation as OverlayNormalisation) ? (o.normalisation as OverlayNormalisation) : 'current',
    cycle: Number.isInteger(o.cycle) && (o.cycle as number) >= 1 && (o.cycle as number) <= 10_000 ? (o.cycle as number) : 1,
  };
}

export async function buildSessionDocument(state: HalfwaveState, includeRawData: boolean, now = new Date()): Promise<SessionDocument> {
  const files: SessionFileRecord[] = [];
  for (const id of state.fileOrder) {
    const record = recordOf(state, id);
    if (!record) continue;
    if (includeRawData) record.dataBase64 = encodeBase64(new Uint8Array(await bytesOfSource((state.files[id] as FileEntry).source)));
    files.push(record);
  }
  // Files still waiting for their bytes stay in the session, so saving again loses nothing.
  files.push(...state.remembered);
  const loaded = state.fileOrder.filter((id) => state.files[id]?.measurement);
  return {
    format: SESSION_FORMAT, version: SESSION_VERSION, savedAt: now.toISOString(),
    settings: { ...state.settings, seriesCells: state.seriesCells },
    view: {
      convention: state.convention, showSmoothed: state.showSmoothed, showBaselines: state.showBaselines, showCompanions: state.showCompanions,
      selectedCycle: state.selectedCycle, mainView: state.mainView, selectedFile: state.selectedFileId ? loaded.indexOf(state.selectedFileId) : -1,
      selectedGroup: state.selectedGroup, readoutTab: state.readoutTab, resultsScope: state.resultsScope,
      seriesOverlay: { ...state.seriesOverlay },
    },
    workbench: { workingWindows: structuredClone(state.workingWindows), fitSetups: structuredClone(state.fitSetups) },
    files,
  };
}

export async function saveSessionText(store: HalfwaveStore, includeRawData: boolean): Promise<string> {
  return serializeSession(await buildSessionDocument(store.getState(), includeRawData));
}

/**
 * Replaces the workspace with a parsed session (undoable). `bytesOf` gives a record's original
 * bytes when they are at hand (in the session, or in the browser's storage). Returns the names of
 * files that still wait for their bytes.
 */
export async function openSessionDocument(store: HalfwaveStore, doc: SessionDocument, bytesOf: (r: SessionFileRecord) => FileSource | null): Promise<string[]> {
  const s = store.getState();
  // Bytes of files already in the workspace serve a session saved without data (same SHA-256).
  const loaded = new Map(Object.values(s.files).flatMap((f) => (f.sha256 && f.measurement ? [[f.sha256, f.source] as const] : [])));
  const found = (r: SessionFileRecord) => bytesOf(r) ?? (r.sha256 ? (loaded.get(r.sha256) ?? null) : null);
  s.record(true);
  const view = doc.view;
  const withData = doc.files.map((r) => ({ r, bytes: found(r) }));
  const waiting = withData.filter((x) => x.bytes === null).map((x) => x.r);
  store.setState({
    files: {}, fileOrder: [], results: {}, series: {}, fileSettings: {}, importBatch: null, selectedFileId: null,
    settings: mergeSettings(defaultSettings, doc.settings),
    seriesCells: mergeSeriesCells(doc.settings.seriesCells),
    convention: view.convention === 'polarographic' ? 'polarographic' : 'iupac',
    showSmoothed: view.showSmoothed === true,
    showBaselines: view.showBaselines !== false,
    showCompanions: view.showCompanions === true,
    selectedCycle: Number.isInteger(view.selectedCycle) && (view.selectedCycle as number) >= 0 ? (view.selectedCycle as number) : 1,
    mainView: view.mainView === 'series' || view.mainView === 'report' || view.mainView === 'fit' ? view.mainView : 'trace',
    readoutTab: READOUT_TABS.includes(view.readoutTab as ReadoutTab) ? (view.readoutTab as ReadoutTab) : 'couples',
    resultsScope: view.resultsScope === 'all' ? 'all' : 'series',
    seriesOverlay: overlayOf(view.seriesOverlay),
    workingWindows: mergeWorkingWindows(doc.workbench.workingWindows),
    // The fit setups come back; the fits themselves are run again (they are deterministic: same data, same setup, same numbers).
    fitSetups: mergeFitSetups(doc.workbench.fitSetups), fits: {},
    selectedGroup: typeof view.selectedGroup === 'string' ? view.selectedGroup : null,
    remembered: waiting,
  });
  const ids = await store.getState().restoreFiles(withData.flatMap(({ r, bytes }) => (bytes ? [{
    name: r.fileName, data: bytes, group: r.group, overrides: r.overrides,
    fileSettings: Object.keys(r.analysis).length ? mergeFileSettings(r.analysis) : null,
  }] : [])));
  const chosen = typeof view.selectedFile === 'number' ? ids[view.selectedFile] : undefined;
  const selectedCycle = store.getState().selectedCycle;
  if (chosen || ids[0]) store.getState().selectFile((chosen ?? ids[0]) as string);
  store.setState({ selectedCycle });
  return waiting.map((r) => r.fileName);
}

/** Opens session text (throws SessionError before changing anything when it is not a usable session). */
export async function openSessionText(store: HalfwaveStore, text: string): Promise<string[]> {
  const doc = parseSession(text);
  return openSessionDocument(store, doc, (r) => (r.dataBase64 === undefined ? null : decodeBase64(r.dataBase64)));
}

/** Restores the last autosaved workspace, files included (an empty one too). False when there is none (or it cannot be read). */
export async function restoreAutosave(store: HalfwaveStore, storage: StorageAdapter): Promise<boolean> {
  const text = await storage.read(AUTOSAVE_KEY).catch(() => null);
  if (!text) return false;
  let doc: SessionDocument;
  try {
    doc = parseSession(text);
  } catch {
    return false;
  }
  const bytes = new Map<string, Uint8Array<ArrayBuffer>>();
  for (const r of doc.files) {
    const b = r.sha256 ? await storage.readBytes(r.sha256).catch(() => null) : null;
    if (b && r.sha256) bytes.set(r.sha256, b);
  }
  const waiting = await openSessionDocument(store, doc, (r) => (r.sha256 ? (bytes.get(r.sha256) ?? null) : null));
  // Restoring is not an edit: there is nothing to undo before it.
  store.setState({ past: [], future: [] });
  if (waiting.length) store.setState({ notice: `Restored the last workspace; ${waiting.length} file${waiting.length === 1 ? ' was' : 's were'} not in the browser's storage (${waiting.slice(0, 3).join(', ')}${waiting.length > 3 ? ', …' : ''}): load ${waiting.length === 1 ? 'it' : 'them'} again to continue.` });
  return true;
}
