/** The selected file with its analysis and its series' display scale, shared by the readout tables. */
import type { DisplayScale } from '../../state/display';
import { useHalfwave } from '../../state/react';
import type { AnalysisEntry, FileEntry } from '../../state/types';
import { useSeriesScale } from './useSeriesCell';

export interface Selection {
  file: FileEntry | undefined;
  result: AnalysisEntry | undefined;
  cycle: number;
  scale: DisplayScale;
}

export function useSelection(): Selection {
  const file = useHalfwave((s) => (s.selectedFileId ? s.files[s.selectedFileId] : undefined));
  const result = useHalfwave((s) => (s.selectedFileId ? s.results[s.selectedFileId] : undefined));
  const cycle = useHalfwave((s) => s.selectedCycle);
  const scale = useSeriesScale(file?.group ?? null);
  return { file, result, cycle, scale };
}
