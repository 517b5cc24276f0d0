/** The resolved cell of a series and its display scale (recording scale → global display scale). */
import { useMemo } from 'react';
import { displayScale, type DisplayScale } from '../../state/display';
import { useHalfwave } from '../../state/react';
import { selectSeriesCell } from '../../state/seriesCell';
import type { ResolvedCell } from '../../state/types';

export function useSeriesCell(group: string | null): ResolvedCell {
  return useHalfwave((s) => selectSeriesCell(s, group));
}

export function useSeriesScale(group: string | null): DisplayScale {
  const settings = useHalfwave((s) => s.settings);
  const cell = useSeriesCell(group);
  return useMemo(() => displayScale(settings, cell.cell), [settings, cell]);
}

