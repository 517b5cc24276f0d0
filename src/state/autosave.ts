/**
 * Autosave: shortly after each change of what a session records, the session text and every
 * file's bytes (under its SHA-256) are written to the browser's storage, so a reload brings the
 * whole workspace back (restoreAutosave, sessionActions.ts). Files whose bytes could not be
 * written are named on screen and kept in `notKept`.
 */
import { AUTOSAVE_KEY, saveSessionText } from './sessionActions';
import { isQuotaError, type StorageAdapter } from './storage';
import { bytesOf, type FileSource } from './fileSource';
import type { HalfwaveState, HalfwaveStore } from './types';

interface NotSaved {
  name: string;
  sha256: string;
  /** Why, when it was not the storage being full. */
  reason: string | null;
}

/** Saves the files' bytes that are not stored yet and forgets those no file uses; returns the files whose bytes could not be written. */
async function saveBytes(state: HalfwaveState, storage: StorageAdapter, stored: Set<string>): Promise<NotSaved[]> {
  const wanted = new Map<string, { name: string; source: FileSource }>();
  for (const id of state.fileOrder) {
    const f = state.files[id];
    if (f?.sha256 && f.measurement) wanted.set(f.sha256, { name: f.fileName, source: f.source });
  }
  const notSaved: NotSaved[] = [];
  for (const [sha, f] of wanted) {
    if (stored.has(sha)) continue;
    try {
      await storage.writeBytes(sha, new Uint8Array(await bytesOf(f.source)));
      stored.add(sha);
    } catch (err) {
      notSaved.push({ name: f.name, sha256: sha, reason: isQuotaError(err) ? null : ((err as Error | null)?.message ?? String(err)) });
    }
  }
  const keep = new Set([...wanted.keys(), ...state.remembered.flatMap((r) => (r.sha256 ? [r.sha256] : []))]);
  for (const sha of [...stored]) {
    if (keep.has(sha)) continue;
    await storage.removeBytes(sha);
    stored.delete(sha);
  }
  return notSaved;
}

/** Writes the session and the files' bytes shortly after each change of what a session records. */
export function attachAutosave(store: HalfwaveStore, storage: StorageAdapter, delayMs = 800): () => void {
  let timer: ReturnType<typeof setTimeout> | null = null;
  let dueMs = 0;
  let stored: Set<string> | null = null;
  const save = async () => {
    stored ??= new Set(await storage.byteKeys().catch(() => []));
    const state = store.getState();
    const notSaved = await saveBytes(state, storage, stored);
    const shas = notSaved.map((n) => n.sha256);
    if (shas.join() !== store.getState().notKept.join()) store.setState({ notKept: shas });
    await storage.write(AUTOSAVE_KEY, await saveSessionText(store, false));
    if (notSaved.length) {
      const names = notSaved.map((n) => n.name);
      const list = `${names.slice(0, 3).join(', ')}${names.length > 3 ? ', …' : ''}`;
      const other = notSaved.find((n) => n.reason !== null)?.reason;
      store.setState({
        notice: other === undefined
          ? `The browser's storage is full: ${names.length} file${names.length === 1 ? ' was' : 's were'} not kept for the next visit (${list}). Everything saved before is still there; save a session with data to keep the rest.`
          : `The browser's storage refused ${names.length} file${names.length === 1 ? '' : 's'} (${list}): ${other}. They were not kept for the next visit; save a session with data to keep them.`,
      });
    }
  };
  const fire = () => {
    const leftMs = dueMs - performance.now();
    if (leftMs > 0) {
      timer = setTimeout(fire, leftMs);
      return;
    }
    timer = null;
    run();
  };
  // One save at a time: a save that started earlier, from an older state, must not finish after a
  // newer one and put back its view of what was kept. A change during a save saves once more after it.
  let running = false;
  let again = false;
  const run = () => {
    if (running) {
      again = true;
      return;
    }
    running = true;
    void save().catch((err: unknown) => store.setState({
      notice: isQuotaError(err) ? "The browser's storage is full: the latest changes were not kept for the next visit; what was saved before is still there." : `Autosave failed: ${(err as Error).message}`,
    })).finally(() => {
      running = false;
      if (again) {
        again = false;
        run();
      }
    });
  };
  const unsubscribe = store.subscribe((now, before) => {
    const changed = now.settings !== before.settings || now.fileSettings !== before.fileSettings || now.seriesCells !== before.seriesCells
      || now.files !== before.files || now.fileOrder !== before.fileOrder || now.convention !== before.convention || now.remembered !== before.remembered
      || now.showSmoothed !== before.showSmoothed || now.showBaselines !== before.showBaselines || now.workingWindows !== before.workingWindows
      || now.fitSetups !== before.fitSetups;
    if (!changed) return;
    // Saved delayMs after the last change. A batch of files changes the store thousands of
    // times: the waiting timer is moved on when it fires, not cleared and set again each time.
    dueMs = performance.now() + delayMs;
    timer ??= setTimeout(fire, delayMs);
  });
  return () => {
    if (timer) clearTimeout(timer);
    unsubscribe();
  };
}
