/** Ctrl/⌘+Z undoes and Ctrl/⌘+Shift+Z or Ctrl+Y redoes a settings change, outside text fields. */
import { useEffect } from 'react';
import { halfwaveActions } from '../state/react';

export function useUndoKeys(): void {
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const target = e.target as HTMLElement | null;
      if (!(e.ctrlKey || e.metaKey) || target?.closest('input, select, textarea')) return;
      const key = e.key.toLowerCase();
      if (key === 'z' && !e.shiftKey) void halfwaveActions().undo();
      else if ((key === 'z' && e.shiftKey) || key === 'y') void halfwaveActions().redo();
      else return;
      e.preventDefault();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);
}
