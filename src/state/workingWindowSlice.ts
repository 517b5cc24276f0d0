/**
 * The usable potential window of each series' working electrode in its medium, shown as a band
 * behind the trace: the user's choice of material and medium per series, and any limit the user
 * replaced (V, on the table entry's own scale, so it survives a change of display scale). The
 * limits themselves come from core/potentialWindow; `workingWindowOnDisplay` puts them on the
 * series' display scale through the run's own offset function.
 * Saved in sessions under `workbench.workingWindows` (one record per series name) and undoable
 * like the cell values.
 */
import { resolveCell, resolveReport } from '../core/analysis/resolveRun';
import { conversionContextOf, scaleOffset } from '../core/analysis/runReference';
import { ELECTRODE_MATERIALS, WINDOW_MEDIA, workingWindow, type ElectrodeMaterial, type WindowMedium, type WorkingWindowEntry } from '../core/potentialWindow';
import { cellValuesOf, reportOptionsOf } from '../run/runInput';
import type { SeriesCell } from '../run/seriesCell';
import type { AnalysisSettings } from '../run/settings';
import type { SliceCreator } from './types';

export interface WorkingWindowChoice {
  material: ElectrodeMaterial;
  medium: WindowMedium;
  /** Limits the user entered (V vs the table entry's reference); absent: the table's. */
  lowerV?: number;
  upperV?: number;
}

export interface WorkingWindowSlice {
  /** Per series name; a series without an entry shows no band. */
  workingWindows: Record<string, WorkingWindowChoice>;
  setWorkingWindow(group: string, choice: WorkingWindowChoice | null): void;
}

export const createWorkingWindowSlice: SliceCreator<WorkingWindowSlice> = (set, get) => ({
  workingWindows: {},
  setWorkingWindow(group, choice) {
    get().record();
    set((s) => {
      const { [group]: _old, ...rest } = s.workingWindows;
      return { workingWindows: choice ? { ...rest, [group]: choice } : rest };
    });
  },
});

/**
 * Working-window choices from a session, keeping only known materials and media and finite
 * limits (a hand-edited session cannot put a text where a potential belongs).
 */
export function mergeWorkingWindows(stored: unknown): Record<string, WorkingWindowChoice> {
  const out: Record<string, WorkingWindowChoice> = {};
  if (typeof stored !== 'object' || stored === null || Array.isArray(stored)) return out;
  const finite = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v) && Math.abs(v) <= 10;
  for (const [group, value] of Object.entries(stored as Record<string, unknown>)) {
    if (typeof value !== 'object' || value === null) continue;
    const v = value as Record<string, unknown>;
    const material = ELECTRODE_MATERIALS.find((m) => m.id === v.material)?.id;
    const medium = WINDOW_MEDIA.find((m) => m.id === v.medium)?.id;
    if (!material || !medium) continue;
    out[group] = { material, medium, ...(finite(v.lowerV) ? { lowerV: v.lowerV } : {}), ...(finite(v.upperV) ? { upperV: v.upperV } : {}) };
  }
  return out;
}

export interface DisplayedWindow {
  entry: WorkingWindowEntry;
  /** Limits on the display scale (V); null where the table has none. */
  lowerV: number | null;
  upperV: number | null;
  /** Each limit's origin: the table's source, or "entered". */
  lowerSource: string;
  upperSource: string;
  /** Add to a limit on the entry's scale to put it on the display scale (V). */
  offsetV: number;
  /** Why no band can be drawn, else null. */
  problem: string | null;
}

/** The chosen window on the series' display scale (the same offset function the analysis uses). */
export function workingWindowOnDisplay(choice: WorkingWindowChoice, settings: AnalysisSettings, cell: SeriesCell): DisplayedWindow {
  const entry = workingWindow(choice.material, choice.medium);
  const lower = choice.lowerV ?? entry.lower?.potentialV ?? null;
  const upper = choice.upperV ?? entry.upper?.potentialV ?? null;
  const sources = {
    lowerSource: choice.lowerV !== undefined ? 'entered by the user' : (entry.lower?.source ?? '—'),
    upperSource: choice.upperV !== undefined ? 'entered by the user' : (entry.upper?.source ?? '—'),
  };
  try {
    const report = resolveReport(reportOptionsOf({ settings, convention: 'iupac' }));
    const target = report.outputReference === null ? { ...report, outputReference: cell.fileReference } : report;
    const ref = scaleOffset(entry.reference, target, conversionContextOf(resolveCell(cellValuesOf(cell)), target), 'the working-window table');
    if (ref.note !== null) return { entry, lowerV: null, upperV: null, ...sources, offsetV: 0, problem: ref.note };
    const shift = (v: number | null) => (v === null ? null : v + ref.offsetV);
    return { entry, lowerV: shift(lower), upperV: shift(upper), ...sources, offsetV: ref.offsetV, problem: entry.lower === null && entry.upper === null ? entry.note : null };
  } catch (err) {
    return { entry, lowerV: null, upperV: null, ...sources, offsetV: 0, problem: (err as Error).message };
  }
}

/** The table's materials and media, for the pickers (the UI reaches the core only through state). */
export { ELECTRODE_MATERIALS, WINDOW_MEDIA } from '../core/potentialWindow';
export type { ElectrodeMaterial, WindowMedium } from '../core/potentialWindow';
