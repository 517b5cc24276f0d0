/**
 * Session save/restore and autosave. A session names every file with its SHA-256, so when the
 * same bytes are loaded again (dropped by the user, or from raw data inside the session) they get
 * back their group, import overrides and per-file analysis settings. Per-series cell values are
 * saved inside `settings.seriesCells`; a session written before cells belonged to series has none,
 * and its global cell values become the defaults every series falls back to.
 */
import { decodeBase64, encodeBase64, parseSession, serializeSession, type SessionDocument, type SessionFileRecord } from '../io/session';
import { mergeSeriesCells, mergeSettings } from './settings';
import type { StorageAdapter } from './storage';
import type { HalfwaveState, HalfwaveStore } from './types';

export const AUTOSAVE_KEY = 'halfwave.autosave.v1';

export async function buildSessionDocument(state: HalfwaveState, includeRawData: boolean, now = new Date()): Promise<SessionDocument> {
  const files: SessionFileRecord[] = [];
  for (const id of state.fileOrder) {
    const f = state.files[id];
    if (!f || !f.measurement) continue;
    const record: SessionFileRecord = {
      fileName: f.fileName, sha256: f.sha256, sizeBytes: f.sizeBytes, group: f.group,
      overrides: f.overrides, analysis: { ...(state.fileSettings[id] ?? {}) },
    };
    if (includeRawData) record.dataBase64 = encodeBase64(new Uint8Array(await f.source.arrayBuffer()));
    files.push(record);
  }
  return {
    format: 'halfwave-session', version: 1, savedAt: now.toISOString(),
    settings: { ...state.settings, seriesCells: state.seriesCells },
    view: { convention: state.convention, showSmoothed: state.showSmoothed, showBaselines: state.showBaselines },
    files,
  };
}

export async function saveSessionText(store: HalfwaveStore, includeRawData: boolean): Promise<string> {
  return serializeSession(await buildSessionDocument(store.getState(), includeRawData));
}

/**
 * Applies a session: settings and view at once; files carrying raw data are loaded; the others
 * wait (by SHA-256) until the user loads them. Returns the names of files still waiting.
 * Throws SessionError before changing anything when the text is not a session.
 */
export async function loadSessionText(store: HalfwaveStore, text: string): Promise<string[]> {
  const doc = parseSession(text);
  const s = store.getState();
  const view = doc.view;
  store.setState({
    settings: mergeSettings(s.settings, doc.settings),
    seriesCells: { ...s.seriesCells, ...mergeSeriesCells(doc.settings.seriesCells) },
    convention: view.convention === 'polarographic' ? 'polarographic' : 'iupac',
    showSmoothed: view.showSmoothed === true,
    showBaselines: view.showBaselines !== false,
    remembered: [...doc.files, ...s.remembered.filter((r) => !doc.files.some((d) => d.sha256 === r.sha256))],
  });
  const withData = doc.files.filter((f) => f.dataBase64 !== undefined);
  const loaded = new Set(Object.values(s.files).map((f) => f.sha256));
  const waiting = doc.files.filter((f) => f.dataBase64 === undefined && !loaded.has(f.sha256)).map((f) => f.fileName);
  for (const f of withData) {
    const bytes = decodeBase64(f.dataBase64 as string);
    await store.getState().addFiles([{ name: f.fileName, data: new Blob([bytes as Uint8Array<ArrayBuffer>]) }], f.group);
  }
  await store.getState().analyzeAll();
  return waiting;
}

/** Restores the last autosaved settings, if any. Unreadable autosave is ignored (and replaced). */
export async function restoreAutosave(store: HalfwaveStore, storage: StorageAdapter): Promise<boolean> {
  const text = await storage.read(AUTOSAVE_KEY).catch(() => null);
  if (!text) return false;
  try {
    await loadSessionText(store, text);
    return true;
  } catch {
    return false;
  }
}

/** Writes the session (without raw data) shortly after each change of what it records. */
export function attachAutosave(store: HalfwaveStore, storage: StorageAdapter, delayMs = 800): () => void {
  let timer: ReturnType<typeof setTimeout> | null = null;
  const unsubscribe = store.subscribe((now, before) => {
    const changed = now.settings !== before.settings || now.fileSettings !== before.fileSettings || now.seriesCells !== before.seriesCells
      || now.files !== before.files || now.convention !== before.convention
      || now.showSmoothed !== before.showSmoothed || now.showBaselines !== before.showBaselines;
    if (!changed) return;
    if (timer) clearTimeout(timer);
    timer = setTimeout(() => {
      timer = null;
      void saveSessionText(store, false)
        .then((text) => storage.write(AUTOSAVE_KEY, text))
        .catch((err: unknown) => store.setState({ notice: `Autosave failed: ${(err as Error).message}` }));
    }, delayMs);
  });
  return () => {
    if (timer) clearTimeout(timer);
    unsubscribe();
  };
}
