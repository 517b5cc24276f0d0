/** React binding of the app store: `useHalfwave(selector)` re-renders when the selection changes. */
import { useStore } from 'zustand';
import { useShallow } from 'zustand/react/shallow';
import { getAppStore } from './app';
import type { HalfwaveState } from './types';

export function useHalfwave<T>(selector: (s: HalfwaveState) => T): T {
  return useStore(getAppStore(), selector);
}

/** For selectors that build a new object or array each time (compared field by field). */
export function useHalfwaveShallow<T>(selector: (s: HalfwaveState) => T): T {
  return useStore(getAppStore(), useShallow(selector));
}

/** Actions without subscribing (they never change identity). */
export function halfwaveActions(): HalfwaveState {
  return getAppStore().getState();
}
