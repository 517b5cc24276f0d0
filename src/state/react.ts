/**
 * React binding of the app store: `useHalfwave(selector)` re-renders when the selection changes.
 * Components hear of store changes at most once per animation frame, all in one callback, so a
 * burst of worker answers (a 120-file batch sends several hundred) gives one render and one
 * layout per frame instead of one per message. Actions still change the store at once.
 */
import { useStore, type StoreApi } from 'zustand';
import { useShallow } from 'zustand/react/shallow';
import { getAppStore } from './app';
import type { HalfwaveState } from './types';

type Listener = () => void;

/**
 * While files are being read, components hear of changes at most this often (ms): each render
 * lays out and paints the growing file list again, on the same thread that passes every worker
 * answer on and sends the next file, so drawing every frame slowed the reading itself.
 */
export const READING_FRAME_MS = 200;

/**
 * True while the page handles a user's action on a control: a click, a key, an edited field.
 * React must hear of that change within the event, or it puts a controlled input (a checkbox, a
 * field) back to its old value until the next notice, up to READING_FRAME_MS later while files are
 * read. A worker's answer (a message) and a file pick or drop (which starts a reading) are left
 * to the frames. `window.event` is the event being handled (WHATWG DOM, "current event").
 */
export function insideControlEvent(): boolean {
  const ev = (globalThis as { event?: unknown }).event;
  if (typeof Event === 'undefined' || !(ev instanceof Event) || !ev.isTrusted) return false;
  if (ev.type === 'message' || ev.type === 'drop') return false;
  return !(typeof HTMLInputElement !== 'undefined' && ev.target instanceof HTMLInputElement && ev.target.type === 'file');
}

/**
 * The store as React sees it: the same state, with change notices coalesced per frame, except a
 * change made by a user's action on a control, heard at once (`insideControlEvent`).
 */
export function framedStore(store: StoreApi<HalfwaveState>, now = insideControlEvent): StoreApi<HalfwaveState> {
  const listeners = new Set<Listener>();
  let scheduled = false;
  let waiting: ReturnType<typeof setTimeout> | null = null;
  let lastFlushMs = -Infinity;
  let cancelFrame: (() => void) | null = null;
  const flush = () => {
    scheduled = false;
    cancelFrame = null;
    lastFlushMs = performance.now();
    for (const l of [...listeners]) l();
  };
  // A hidden page gets no animation frames: fall back to a timer so it still catches up.
  const nextFrame = () => {
    waiting = null;
    if (typeof requestAnimationFrame === 'function' && globalThis.document?.visibilityState !== 'hidden') {
      const id = requestAnimationFrame(flush);
      cancelFrame = () => cancelAnimationFrame(id);
    } else {
      const id = setTimeout(flush, 16);
      cancelFrame = () => clearTimeout(id);
    }
  };
  store.subscribe((state) => {
    if (now()) {
      // Whatever waited goes with it.
      if (waiting) clearTimeout(waiting);
      cancelFrame?.();
      waiting = null;
      flush();
      return;
    }
    const reading = state.importBatch !== null;
    // The last file read: draw at the next frame, not at the end of the wait.
    if (waiting && !reading) {
      clearTimeout(waiting);
      nextFrame();
    }
    if (scheduled) return;
    scheduled = true;
    const waitMs = reading ? lastFlushMs + READING_FRAME_MS - performance.now() : 0;
    if (waitMs > 0) waiting = setTimeout(nextFrame, waitMs);
    else nextFrame();
  });
  return {
    ...store,
    subscribe(listener) {
      listeners.add(listener as Listener);
      return () => listeners.delete(listener as Listener);
    },
  };
}

let framed: StoreApi<HalfwaveState> | null = null;
const reactStore = () => (framed ??= framedStore(getAppStore()));

export function useHalfwave<T>(selector: (s: HalfwaveState) => T): T {
  return useStore(reactStore(), selector);
}

/** For selectors that build a new object or array each time (compared field by field). */
export function useHalfwaveShallow<T>(selector: (s: HalfwaveState) => T): T {
  return useStore(reactStore(), useShallow(selector));
}

/** Actions without subscribing (they never change identity). */
export function halfwaveActions(): HalfwaveState {
  return getAppStore().getState();
}
