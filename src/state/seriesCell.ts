/**
 * The cell of a scan-rate series: electrode, solution and the reference electrode its files were
 * recorded against. Different series are measured on different electrodes and solutions, so each
 * group has its own values, resolved in three layers (the later wins):
 *   1. the app-wide defaults (`settings.chemistry` and `settings.reference`; an older session's
 *      global cell lands here, so a session without per-series values still loads);
 *   2. what the importer read from the preambles of the group's files (area, concentration,
 *      temperature, reference electrode), the first file that states a value giving it;
 *   3. what was entered for the series (`seriesCells[group]`, saved in sessions and undo history).
 * The display scale (what potentials are shown and exported against) stays global.
 */
import { kelvinToCelsius, molPerCm3ToMillimolar } from '../core/units';
import { cellFromHeaders } from '../io/cellFromHeaders';
import type { Measurement } from '../io/types';
import type { AnalysisSettings, ChemistrySettings, ReferenceSettings } from './settings';

/**
 * The values of one series: n, area, concentration, temperature, α and Ru (as in the app-wide
 * `ChemistrySettings`), and the scale its files were recorded on with the pH and ferrocene E½
 * that scale may need. Only the display scale is left out: it is global.
 */
export interface SeriesCell extends ChemistrySettings, Omit<ReferenceSettings, 'displayReference'> {}

export type CellField = keyof SeriesCell;
/** Where a value came from: entered for the series, read from a file's preamble, or the default. */
export type CellOrigin = 'series' | 'files' | 'default';

export interface ResolvedCell {
  group: string | null;
  cell: SeriesCell;
  origin: Record<CellField, CellOrigin>;
  /** Loaded files of the group. */
  fileCount: number;
  /** Disagreements between files and preamble text that could not be used, in words. */
  notes: string[];
}

export const CELL_FIELDS: readonly CellField[] = [
  'electronCount', 'areaCm2', 'concentrationMM', 'temperatureC', 'alpha', 'resistanceOhm', 'fileReference', 'pH', 'ferroceneHalfWaveV',
];

/** Fields that change each trace's own analysis; the others (A, C, α, scales) only the series fits and display. */
export const TRACE_FIELDS: readonly CellField[] = ['electronCount', 'temperatureC', 'resistanceOhm'];

export function sameTraceCell(a: SeriesCell, b: SeriesCell): boolean {
  return TRACE_FIELDS.every((k) => a[k] === b[k]);
}

export function defaultCell(settings: AnalysisSettings): SeriesCell {
  const { fileReference, pH, ferroceneHalfWaveV } = settings.reference;
  return { ...settings.chemistry, fileReference, pH, ferroceneHalfWaveV };
}

/** Values the files' headers give (io/cellFromHeaders.ts, as the command line reads them), in the form's units. */
export function cellFromPreambles(measurements: readonly Measurement[]): { values: Partial<SeriesCell>; notes: string[] } {
  const found = cellFromHeaders(measurements);
  const h = found.values;
  const values: Partial<SeriesCell> = {};
  if (h.areaCm2 !== undefined) values.areaCm2 = h.areaCm2;
  if (h.concentrationMolPerCm3 !== undefined) values.concentrationMM = molPerCm3ToMillimolar(h.concentrationMolPerCm3);
  if (h.temperatureK !== undefined) values.temperatureC = kelvinToCelsius(h.temperatureK);
  if (h.inputReference !== undefined) values.fileReference = h.inputReference;
  return { values, notes: found.notes };
}

export interface CellSources {
  settings: AnalysisSettings;
  seriesCells: Record<string, Partial<SeriesCell>>;
  files: Record<string, { group: string; measurement: Measurement | null } | undefined>;
  fileOrder: string[];
}

export function resolveCell(state: CellSources, group: string | null): ResolvedCell {
  const measurements = group === null ? [] : state.fileOrder
    .map((id) => state.files[id])
    .filter((f) => f?.group === group && f.measurement)
    .map((f) => f?.measurement as Measurement);
  const fromFiles = cellFromPreambles(measurements);
  const own = group === null ? {} : (state.seriesCells[group] ?? {});
  const cell = { ...defaultCell(state.settings), ...fromFiles.values, ...own };
  const origin = Object.fromEntries(CELL_FIELDS.map((k) => [k, k in own ? 'series' : k in fromFiles.values ? 'files' : 'default'])) as Record<CellField, CellOrigin>;
  return { group, cell, origin, fileCount: measurements.length, notes: fromFiles.notes };
}

/** The cell of a file's series. */
export function cellOfFile(state: CellSources, fileId: string): SeriesCell {
  return resolveCell(state, state.files[fileId]?.group ?? null).cell;
}

const cache = new Map<string, { sources: CellSources; value: ResolvedCell }>();

/** resolveCell with a per-group memo, so React selectors get the same object while the result is the same. */
export function selectSeriesCell(state: CellSources, group: string | null): ResolvedCell {
  const key = group ?? '\u0000';
  const hit = cache.get(key);
  if (hit && hit.sources.settings === state.settings && hit.sources.seriesCells === state.seriesCells
    && hit.sources.files === state.files && hit.sources.fileOrder === state.fileOrder) return hit.value;
  const fresh = resolveCell(state, group);
  // Files change with every progress tick; keep the old object when nothing resolved differently,
  // so the plots that depend on the cell (through the display scale) are not redrawn for nothing.
  const value = hit && sameResolved(hit.value, fresh) ? hit.value : fresh;
  cache.set(key, { sources: { settings: state.settings, seriesCells: state.seriesCells, files: state.files, fileOrder: state.fileOrder }, value });
  return value;
}

function sameResolved(a: ResolvedCell, b: ResolvedCell): boolean {
  return a.group === b.group && a.fileCount === b.fileCount && a.notes.join('\n') === b.notes.join('\n')
    && CELL_FIELDS.every((k) => a.cell[k] === b.cell[k] && a.origin[k] === b.origin[k]);
}
