/** The system's light or dark preference, followed live (prefers-color-scheme). */
import { useSyncExternalStore } from 'react';
import type { ColorScheme } from './plots/theme';

const query = () => (typeof window !== 'undefined' && window.matchMedia ? window.matchMedia('(prefers-color-scheme: dark)') : null);

function subscribe(onChange: () => void): () => void {
  const q = query();
  q?.addEventListener('change', onChange);
  return () => q?.removeEventListener('change', onChange);
}

export function useColorScheme(): ColorScheme {
  return useSyncExternalStore(subscribe, () => (query()?.matches ? 'dark' : 'light'), () => 'light');
}
