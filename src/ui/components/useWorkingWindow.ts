/** The working window chosen for a series, on the scale its trace is shown on (null: none chosen). */
import { useMemo } from 'react';
import { useHalfwave } from '../../state/react';
import { workingWindowOnDisplay, type DisplayedWindow } from '../../state/workingWindowSlice';
import { useSeriesCell, useSeriesScale } from './useSeriesCell';

export function useWorkingWindow(group: string | null): DisplayedWindow | null {
  const choice = useHalfwave((s) => (group ? s.workingWindows[group] : undefined));
  const settings = useHalfwave((s) => s.settings);
  const { cell } = useSeriesCell(group);
  const scale = useSeriesScale(group);
  return useMemo(() => {
    if (!choice) return null;
    // A series that stays on its recording scale shows the band on that scale too.
    const shown = scale.ok ? settings : { ...settings, reference: { ...settings.reference, displayReference: cell.fileReference } };
    return workingWindowOnDisplay(choice, shown, cell);
  }, [choice, settings, cell, scale.ok]);
}
