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

/** The store as React sees it: the same state, with change notices coalesced per frame. */
function framedStore(store: StoreApi<HalfwaveState>): StoreApi<HalfwaveState> {
  const listeners = new Set<Listener>();
  let scheduled = false;
  const flush = () => {
    scheduled = false;
    for (const l of [...listeners]) l();
  };
  store.subscribe(() => {
    if (scheduled) return;
    scheduled = true;
    // A hidden page gets no animation frames: fall back to a timer so it still catches up.
    if (typeof requestAnimationFrame === 'function' && globalThis.document?.visibilityState !== 'hidden') requestAnimationFrame(flush);
    else setTimeout(flush, 16);
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
