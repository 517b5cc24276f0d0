/**
 * Derived display values the UI needs but must not compute itself: the offset between a
 * series' reference scale and the (global) display scale, the potential axis title, and the list of
 * reference electrodes for the pickers.
 */
import { resolveCell, resolveReport } from '../core/analysis/resolveRun';
import { conversionContextOf, scaleOffset } from '../core/analysis/runReference';
import { REFERENCE_ELECTRODES, type ReferenceId } from '../core/reference';
import { cellValuesOf, reportOptionsOf } from '../run/runInput';
import type { SeriesCell } from '../run/seriesCell';
import type { AnalysisSettings } from '../run/settings';
import type { HalfwaveState } from './types';

/** Fixed decimals without a negative zero, the one rule for the screen, the command line and the core's texts. */
export { formatFixed } from '../core/units';

export interface ReferenceChoice {
  id: ReferenceId;
  label: string;
  note: string | null;
}

export const referenceChoices: ReferenceChoice[] = REFERENCE_ELECTRODES.map((r) => ({ id: r.id, label: r.label, note: r.note }));

export interface DisplayScale {
  /** Add to a potential on the series' recording scale to get it on the display scale (V). */
  offsetV: number;
  /** Short name of the scale shown, e.g. "SCE". */
  name: string;
  /** Why the offset is what it is, or the reason it could not be applied. */
  basis: string;
  ok: boolean;
}

/**
 * From a series' recording scale (its cell) to the global display scale, through the very
 * function and conversion context the analysis run uses (core/analysis/runReference.ts), so the
 * screen's offset and the run's offset are the same number.
 */
export function displayScale(settings: AnalysisSettings, cell: SeriesCell): DisplayScale {
  const { fileReference } = cell;
  try {
    const resolved = resolveCell(cellValuesOf(cell));
    const report = resolveReport(reportOptionsOf({ settings, convention: 'iupac' }));
    const ref = scaleOffset(fileReference, report, conversionContextOf(resolved, report), 'the series');
    if (ref.note !== null || ref.output === null) return { offsetV: 0, name: shortName(fileReference), basis: `${ref.note ?? 'no conversion'}; showing the files' own scale`, ok: false };
    const name = ref.output === 'Fc' ? 'Fc⁺/Fc' : shortName(ref.output);
    return { offsetV: ref.offsetV, name, basis: basisText(shortName(fileReference), name, ref.offsetV, ref.typical), ok: true };
  } catch (err) {
    return { offsetV: 0, name: shortName(fileReference), basis: `cannot convert: ${(err as Error).message}; showing the files' own scale`, ok: false };
  }
}

/**
 * The display scale a series' analysed files actually carry (the run's own offset, which knows a
 * ferrocene E½ measured in a file), or null while none is analysed. As one text, so a selector
 * can compare it cheaply: "offset|output|note".
 */
export function runScaleKey(state: Pick<HalfwaveState, 'fileOrder' | 'files' | 'results'>, group: string | null): string | null {
  if (group === null) return null;
  for (const id of state.fileOrder) {
    const run = state.results[id]?.run;
    if (state.files[id]?.group === group && run && run.role === 'series') return `${run.reference.offsetV}|${run.reference.output ?? ''}|${run.reference.note ?? ''}|${run.reference.typical ? 'typical' : ''}`;
  }
  return null;
}

/** A DisplayScale from runScaleKey's text, named like displayScale names scales. */
export function scaleFromRunKey(key: string, cell: SeriesCell): DisplayScale {
  const [offset, output, note, typical] = key.split('|');
  if (!output) return { offsetV: 0, name: shortName(cell.fileReference), basis: `${note || 'no conversion'}; showing the files' own scale`, ok: false };
  const name = output === 'Fc' ? 'Fc⁺/Fc' : shortName(output as ReferenceId);
  const offsetV = Number(offset);
  return { offsetV, name, basis: basisText(shortName(cell.fileReference), name, offsetV, typical === 'typical'), ok: true };
}

/** "Ag/AgCl → SCE: −0.0312 V", with a warning when a typical, not measured, value entered. */
function basisText(from: string, to: string, offsetV: number, typical: boolean): string {
  const text = `${from} → ${to}: ${offsetV >= 0 ? '+' : ''}${offsetV.toFixed(4)} V`;
  return typical ? `${text} — through a typical Fc⁺/Fc value, not one measured here: measure ferrocene in the same solution, or read these potentials as approximate` : text;
}

function shortName(id: ReferenceId): string {
  return (REFERENCE_ELECTRODES.find((r) => r.id === id)?.label ?? id).replace(/\s*\(.*\)$/, '');
}
