/**
 * The cell of a scan-rate series: electrode, solution and the reference electrode its files were
 * recorded against. Different series are measured on different electrodes and solutions, so each
 * group has its own values, resolved in three layers (the later wins), each value keeping its
 * origin and the evidence for it:
 *   1. 'default': the app-wide defaults (`settings.chemistry` and `settings.reference`; an older
 *      session's global cell lands here, so a session without per-series values still loads);
 *   2. 'header': what the files' headers state (io/cellFromHeaders.ts: area or disk diameter,
 *      concentration, temperature, reference electrode), the first file that states a value giving it;
 *   3. 'entered': what was entered for the series (`seriesCells[group]`, saved in sessions and undo).
 * The display scale (what potentials are shown and exported against) stays global.
 */
import { kelvinToCelsius, molPerCm3ToMillimolar } from '../core/units';
import { cellFromHeaders } from '../io/cellFromHeaders';
import type { ValueOrigin } from '../core/analysis/runTypes';
import type { Measurement } from '../io/types';
import type { AnalysisSettings, ChemistrySettings, ReferenceSettings } from './settings';

/**
 * The values of one series: n, area, concentration, temperature, α and Ru (as in the app-wide
 * `ChemistrySettings`), and the scale its files were recorded on with the pH and ferrocene E½
 * that scale may need. Only the display scale is left out: it is global.
 */
export interface SeriesCell extends ChemistrySettings, Omit<ReferenceSettings, 'displayReference'> {}

export type CellField = keyof SeriesCell;
/** Where a value came from: the default, a file's header, the folder, or entered for the series. */
export type CellOrigin = ValueOrigin;

export interface ResolvedCell {
  group: string | null;
  cell: SeriesCell;
  origin: Record<CellField, CellOrigin>;
  /** The evidence for each value in words: file and line for a header value. */
  evidence: Record<CellField, string>;
  /** Loaded files of the group. */
  fileCount: number;
  /** Disagreements between files and preamble text that could not be used, in words. */
  notes: string[];
}

export const CELL_FIELDS: readonly CellField[] = [
  'electronCount', 'areaCm2', 'concentrationMM', 'temperatureC', 'alpha', 'transferElectronCount', 'formalPotentialV', 'resistanceOhm', 'areaUncertaintyPercent', 'concentrationUncertaintyPercent',
  'fileReference', 'pH', 'ferroceneHalfWaveV', 'internalStandardNearV', 'internalStandardFile', 'blankFiles',
];

/**
 * Fields that only the series fits read (A, C, α, nₐ, a known E°′, and the uncertainties of A and C); every other field
 * (n, T, Ru, the recording scale and its standard, the blanks) changes each file's own analysis,
 * whose potentials are on the display scale.
 */
export const SERIES_ONLY_FIELDS: readonly CellField[] = ['areaCm2', 'concentrationMM', 'alpha', 'transferElectronCount', 'formalPotentialV', 'areaUncertaintyPercent', 'concentrationUncertaintyPercent'];

export function sameTraceCell(a: SeriesCell, b: SeriesCell): boolean {
  return CELL_FIELDS.every((k) => SERIES_ONLY_FIELDS.includes(k) || a[k] === b[k]);
}

export function defaultCell(settings: AnalysisSettings): SeriesCell {
  const { displayReference: _shownOn, ...recording } = settings.reference;
  return { ...settings.chemistry, ...recording };
}

/** Values the files' headers give (io/cellFromHeaders.ts, as the command line reads them), in the form's units, with evidence. */
export function cellFromPreambles(measurements: readonly Measurement[]): { values: Partial<SeriesCell>; evidence: Partial<Record<CellField, string>>; notes: string[] } {
  const found = cellFromHeaders(measurements);
  const h = found.values;
  const values: Partial<SeriesCell> = {};
  const evidence: Partial<Record<CellField, string>> = {};
  const say = (field: CellField, from: keyof typeof found.evidence) => {
    const e = found.evidence[from];
    if (e) evidence[field] = `${e.fileName}${e.line ? `, line ${e.line}` : ''}: “${e.text}”`;
  };
  if (h.areaCm2 !== undefined) {
    values.areaCm2 = h.areaCm2;
    say('areaCm2', 'areaCm2');
  }
  if (h.concentrationMolPerCm3 !== undefined) {
    values.concentrationMM = molPerCm3ToMillimolar(h.concentrationMolPerCm3);
    say('concentrationMM', 'concentrationMolPerCm3');
  }
  if (h.temperatureK !== undefined) {
    values.temperatureC = kelvinToCelsius(h.temperatureK);
    say('temperatureC', 'temperatureK');
  }
  if (h.inputReference !== undefined) {
    values.fileReference = h.inputReference;
    say('fileReference', 'inputReference');
  }
  return { values, evidence, notes: found.notes };
}

type GroupPreambles = { measurements: Measurement[]; fromFiles: ReturnType<typeof cellFromPreambles> };

/**
 * What a group's file headers state, kept while the group holds the same measurements in the same
 * order: one state is asked many times (each file read and analysed asks for its series' cell,
 * and every progress tick replaces the store's `files`), and reading every header of the group
 * each time made a batch quadratic. Kept per file order (a new order is a new list of files, and
 * the old entries go with it); the store replaces these objects on every change, never edits
 * them in place.
 */
const preambleMemo = new WeakMap<readonly string[], Map<string | null, GroupPreambles>>();

/**
 * Each group's measurements in file order, found in one pass over the files per state (per files
 * object and file order) for every group asked of it: a reading asks its series' cell several
 * times per file, and one pass per question walked every loaded file each time.
 */
const measurementsMemo = new WeakMap<object, { fileOrder: readonly string[]; byGroup: Map<string, Measurement[]> }>();
const NONE: Measurement[] = [];

function groupMeasurements(state: CellSources, group: string): Measurement[] {
  let hit = measurementsMemo.get(state.files);
  if (!hit || hit.fileOrder !== state.fileOrder) {
    hit = { fileOrder: state.fileOrder, byGroup: measurementsByGroup(state) };
    measurementsMemo.set(state.files, hit);
  }
  return hit.byGroup.get(group) ?? NONE;
}

function measurementsByGroup(state: CellSources): Map<string, Measurement[]> {
  const byGroup = new Map<string, Measurement[]>();
  for (let i = 0; i < state.fileOrder.length; i++) {
    const f = state.files[state.fileOrder[i] as string];
    if (!f?.measurement) continue;
    const list = byGroup.get(f.group);
    if (list) list.push(f.measurement);
    else byGroup.set(f.group, [f.measurement]);
  }
  return byGroup;
}

function groupPreambles(state: CellSources, group: string | null): GroupPreambles {
  const measurements = group === null ? NONE : groupMeasurements(state, group);
  let byGroup = preambleMemo.get(state.fileOrder);
  if (!byGroup) {
    byGroup = new Map();
    preambleMemo.set(state.fileOrder, byGroup);
  }
  const hit = byGroup.get(group);
  if (hit && sameItems(hit.measurements, measurements)) return hit;
  const value = { measurements, fromFiles: cellFromPreambles(measurements) };
  byGroup.set(group, value);
  return value;
}

function sameItems<T>(a: readonly T[], b: readonly T[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

/** The resolved cell of each group's headers, for the settings and entered values it was made from. */
const resolvedMemo = new WeakMap<GroupPreambles, { settings: AnalysisSettings; own: Partial<SeriesCell> | undefined; value: ResolvedCell }>();

export interface CellSources {
  settings: AnalysisSettings;
  seriesCells: Record<string, Partial<SeriesCell>>;
  files: Record<string, { group: string; measurement: Measurement | null } | undefined>;
  fileOrder: string[];
}

/** The cell of a group, its three layers merged. The same state gives the same (shared, not to be edited) object. */
export function resolveCell(state: CellSources, group: string | null): ResolvedCell {
  const preambles = groupPreambles(state, group);
  const entered = group === null ? undefined : state.seriesCells[group];
  const hit = resolvedMemo.get(preambles);
  if (hit && hit.settings === state.settings && hit.own === entered && hit.value.group === group) return hit.value;
  const value = mergeCell(preambles, entered ?? {}, state.settings, group);
  resolvedMemo.set(preambles, { settings: state.settings, own: entered, value });
  return value;
}

function mergeCell({ measurements, fromFiles }: GroupPreambles, own: Partial<SeriesCell>, settings: AnalysisSettings, group: string | null): ResolvedCell {
  const cell = { ...defaultCell(settings), ...fromFiles.values, ...own };
  const origin = Object.fromEntries(CELL_FIELDS.map((k) => [k, k in own ? 'entered' : k in fromFiles.values ? 'header' : 'default'])) as Record<CellField, CellOrigin>;
  const evidence = Object.fromEntries(CELL_FIELDS.map((k) => [k, origin[k] === 'entered' ? 'entered for this series'
    : origin[k] === 'header' ? (fromFiles.evidence[k] ?? 'stated in a file header') : 'the default (no file states it, nobody entered it)'])) as Record<CellField, string>;
  return { group, cell, origin, evidence, fileCount: measurements.length, notes: fromFiles.notes };
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
