/**
 * The one mapping from what the user set on screen (in the units of the forms: mM, °C, Ω) to the
 * core's run model (core/analysis/runTypes.ts). The per-file analysis, the series, the results
 * sheet and the display scale all read their options through here, so they cannot drift apart.
 */
import { DEFAULT_SERIES_KEY } from '../core/analysis/resolveRun';
import type { CellValues, MethodOptions, ReportOptions, RunBlank, RunFile, RunInput } from '../core/analysis/runTypes';
import { nearestBlank } from '../core/background/nearestBlank';
import { subtractBlank } from '../core/background/subtractBlank';
import { celsiusToKelvin, millimolarToMolPerCm3 } from '../core/units';
import { describeLayout } from '../io/describeLayout';
import { SOFTWARE } from '../version';
import { resolveCell as resolveSeriesCell, type ResolvedCell, type SeriesCell } from './seriesCell';
import { emptyFileSettings, type AnalysisSettings, type FileAnalysisSettings } from './settings';
import { textDigest } from './textDigest';
import type { ImportWarning } from '../io/errors';
import type { Measurement } from '../io/types';

/**
 * A series' cell in the core's units, with the origin of each value (so the results can name a
 * default that decided a number). The Fc⁺/Fc standard: measured in a file when one is named or a
 * search potential is given, else the E½ entered on the recording scale.
 */
export function cellValuesOf(cell: SeriesCell, origin?: ResolvedCell['origin']): CellValues {
  const values: CellValues = {
    electronCount: cell.electronCount, areaCm2: cell.areaCm2, concentrationMolPerCm3: millimolarToMolPerCm3(cell.concentrationMM),
    temperatureK: celsiusToKelvin(cell.temperatureC), alpha: cell.alpha, transferElectronCount: cell.transferElectronCount,
    formalPotentialV: cell.formalPotentialV, formalPotentialScale: 'recording', ruOhm: cell.resistanceOhm, inputReference: cell.fileReference, pH: cell.pH,
    areaRelativeUncertainty: cell.areaUncertaintyPercent / 100, concentrationRelativeUncertainty: cell.concentrationUncertaintyPercent / 100,
  };
  if (origin) {
    values.origins = {
      electronCount: origin.electronCount, areaCm2: origin.areaCm2, concentrationMolPerCm3: origin.concentrationMM, temperatureK: origin.temperatureC,
      alpha: origin.alpha, ruOhm: origin.resistanceOhm, inputReference: origin.fileReference,
    };
  }
  if (cell.fileReference !== 'Fc' && cell.internalStandardNearV !== null) {
    values.internalStandard = { kind: 'measured', nearV: cell.internalStandardNearV, ...(cell.internalStandardFile ? { fileName: cell.internalStandardFile } : {}) };
  } else if (cell.ferroceneHalfWaveV !== null && cell.fileReference !== 'Fc') {
    values.internalStandard = { kind: 'value', eHalfV: cell.ferroceneHalfWaveV, reference: cell.fileReference, origin: 'entered by the user' };
  }
  return values;
}

/** A series' resolved cell (defaults ← headers ← entered) in the core's units, with origins. */
export function seriesCellValues(state: RunSources, group: string): CellValues {
  const r = resolveSeriesCell(state, group);
  return cellValuesOf(r.cell, r.origin);
}

export function methodOptionsOf(settings: AnalysisSettings): MethodOptions {
  return {
    smoothing: settings.smoothing, forwardBaseline: settings.forwardBaseline, returnBaseline: settings.returnBaseline,
    minSignalToNoise: settings.minSignalToNoise, seriesCycle: 1, psiMethod: settings.psiMethod, spikeFilter: settings.spikeFilter,
  };
}

/** Every series is reported on the display scale; one that cannot be converted stays on its own scale, with a warning. */
export function reportOptionsOf(state: Pick<RunSources, 'convention' | 'settings'>): ReportOptions {
  return { outputReference: state.settings.reference.displayReference, outputConvention: state.convention, unconvertible: 'keep-recording-scale' };
}

/**
 * What the run input is made from: the store's state, or the same fields rebuilt from a saved
 * session by the command line (cli/sessionSources.ts), so both map it the one same way.
 */
export interface RunSources {
  fileOrder: string[];
  fileSettings: Record<string, FileAnalysisSettings>;
  settings: AnalysisSettings;
  seriesCells: Record<string, Partial<SeriesCell>>;
  /** The sign convention of the display and the results. */
  convention: CurrentDisplay;
  files: Record<string, RunFileSource | undefined>;
}

/** The sign convention of currents on screen and in the results: IUPAC (anodic positive) or polarographic. */
export type CurrentDisplay = 'iupac' | 'polarographic';

/** What the run takes of a loaded file: its reading and where it came from. */
export interface RunFileSource {
  fileName: string;
  group: string;
  measurement: Measurement | null;
  sizeBytes: number;
  sha256: string | null;
  warnings: ImportWarning[];
}

/** blankNames per state: asked for each file of a reading and at each redraw, it walked every file each time. */
const blankMemo = new WeakMap<object, { fileOrder: string[]; fileSettings: object; settings: object; seriesCells: object; names: ReadonlySet<string> }>();

/** Names of every file some series or file uses as a blank. The same state gives the same (shared, not to be edited) set. */
export function blankNames(state: RunSources): ReadonlySet<string> {
  const hit = blankMemo.get(state.files);
  if (hit && hit.fileOrder === state.fileOrder && hit.fileSettings === state.fileSettings && hit.settings === state.settings && hit.seriesCells === state.seriesCells) return hit.names;
  const out = new Set<string>();
  for (const g of new Set(Object.values(state.files).map((f) => f?.group))) {
    if (g !== undefined) for (const n of resolveSeriesCell(state, g).cell.blankFiles) out.add(n);
  }
  for (const fs of Object.values(state.fileSettings)) if (fs.blankFile) out.add(fs.blankFile);
  blankMemo.set(state.files, { fileOrder: state.fileOrder, fileSettings: state.fileSettings, settings: state.settings, seriesCells: state.seriesCells, names: out });
  return out;
}

/** The blank a file subtracts: its own choice, else the one of its series' blanks nearest its scan rate. */
export function blankOf(state: RunSources, id: string): string | null {
  const own = state.fileSettings[id]?.blankFile;
  if (own !== undefined) return own;
  const f = state.files[id];
  if (!f?.measurement) return null;
  const names = resolveSeriesCell(state, f.group).cell.blankFiles.filter((n) => n !== f.fileName);
  const blanks = names.map((n) => ({ fileName: n, scanRateVPerS: measurementNamed(state, n)?.scanRateVPerS ?? null }));
  return nearestBlank(f.measurement.scanRateVPerS, blanks);
}

/** The measurement of the first loaded file of that name (blanks are named by file name). */
export function measurementNamed(state: RunSources, name: string) {
  for (const id of state.fileOrder) if (state.files[id]?.fileName === name && state.files[id]?.measurement) return state.files[id]?.measurement ?? null;
  return null;
}

/** One loaded file as a run file: its measurement, provenance, own windows and baselines, and blank. */
export function runFileOf(state: RunSources, id: string, blanks: ReadonlySet<string> = blankNames(state)): RunFile | null {
  const f = state.files[id];
  const m = f?.measurement;
  if (!f || !m) return null;
  const own = state.fileSettings[id] ?? emptyFileSettings;
  const blank = blanks.has(f.fileName) ? null : blankOf(state, id);
  return {
    fileName: f.fileName, series: f.group, voltammogram: m, referenceElectrode: m.referenceElectrode,
    provenance: { sizeBytes: f.sizeBytes, sha256: f.sha256, layout: describeLayout(m), importWarnings: f.warnings.map((w) => w.message), metadata: m.metadata },
    trace: { peakWindows: own.peakWindows, baselines: own.baselines },
    ...(blanks.has(f.fileName) ? { role: 'blank' as const } : {}),
    ...(blank && measurementNamed(state, blank) ? { blankFile: blank } : {}),
  };
}

/** The blanks the given run files name, with their measurements. */
function blanksFor(state: RunSources, files: RunFile[]): RunBlank[] {
  const wanted = new Set(files.flatMap((f) => (f.blankFile ? [f.blankFile] : [])));
  return [...wanted].flatMap((name) => {
    const id = state.fileOrder.find((x) => state.files[x]?.fileName === name && state.files[x]?.measurement);
    const f = id ? state.files[id] : undefined;
    return f?.measurement ? [{ fileName: name, voltammogram: f.measurement, provenance: { sizeBytes: f.sizeBytes, sha256: f.sha256, layout: describeLayout(f.measurement) } }] : [];
  });
}

/** Everything a series needs from the store: its cell, the method, the report. */
export function seriesOptionsOf(state: RunSources, group: string): { cell: CellValues; method: MethodOptions; report: ReportOptions } {
  return { cell: seriesCellValues(state, group), method: methodOptionsOf(state.settings), report: reportOptionsOf(state) };
}

/**
 * What the worker needs to analyse one file as the whole run would: the file, and when its
 * series' internal standard is measured, the files the standard is searched in (named file, or
 * the series' own files); only the one file's result is asked back.
 */
export function fileRunRequest(state: RunSources, id: string): { run: RunInput; only: string[] } {
  const file = state.files[id];
  if (!file) return { run: runInputOf(state, []), only: [] };
  const std = resolveSeriesCell(state, file.group).cell;
  let ids = [id];
  if (std.internalStandardNearV !== null && std.fileReference !== 'Fc') {
    const named = std.internalStandardFile;
    const helpers = state.fileOrder.filter((f) => f !== id && (named ? state.files[f]?.fileName === named : state.files[f]?.group === file.group));
    ids = [id, ...helpers];
  }
  return { run: runInputOf(state, ids), only: [file.fileName] };
}

/**
 * The run input of the given files (default: every loaded file), each series with its own cell.
 * A series that cannot be put on the display scale stays on its recording scale, with a warning,
 * exactly as the screen shows it.
 */
export function runInputOf(state: RunSources, ids: string[] = state.fileOrder): RunInput {
  const blanks = blankNames(state);
  const files = ids.flatMap((id) => runFileOf(state, id, blanks) ?? []);
  const groups = [...new Set(files.map((f) => f.series ?? DEFAULT_SERIES_KEY))];
  return {
    files,
    blanks: blanksFor(state, files),
    cells: Object.fromEntries(groups.map((g) => [g, seriesCellValues(state, g)])),
    method: methodOptionsOf(state.settings),
    report: reportOptionsOf(state),
    software: { ...SOFTWARE },
  };
}

/**
 * Everything a file's run takes from the workbench except the file's own reading: the worker that
 * reads the file analyses it at once from this (`runAheadSources`), with no round trip through
 * the page. Only the file's series and its own settings are sent; whatever the other files add
 * (their headers, blanks, an internal standard) shows as a different run key, and the page then
 * runs the file again as usual (analysisSlice.ts).
 */
export interface RunAhead {
  fileId: string;
  group: string;
  sizeBytes: number;
  settings: AnalysisSettings;
  convention: RunSources['convention'];
  seriesCells: RunSources['seriesCells'];
  fileSettings: RunSources['fileSettings'];
}

/** The snapshot for a file about to be read; null when its run needs other files (blanks, a measured internal standard). */
export function runAheadOf(state: RunSources, id: string): RunAhead | null {
  const f = state.files[id];
  if (!f) return null;
  const cell = resolveSeriesCell(state, f.group).cell;
  if (cell.blankFiles.length > 0 || state.fileSettings[id]?.blankFile || (cell.internalStandardNearV !== null && cell.fileReference !== 'Fc')) return null;
  const own = state.fileSettings[id];
  const entered = state.seriesCells[f.group];
  return {
    fileId: id, group: f.group, sizeBytes: f.sizeBytes, settings: state.settings, convention: state.convention,
    seriesCells: entered ? { [f.group]: entered } : {}, fileSettings: own ? { [id]: own } : {},
  };
}

/** The run sources of a snapshot with the file as read: the one file, nothing else loaded. */
export function runAheadSources(ahead: RunAhead, file: Pick<RunFileSource, 'fileName' | 'measurement' | 'sha256' | 'warnings'>): RunSources {
  return {
    settings: ahead.settings, convention: ahead.convention, seriesCells: ahead.seriesCells, fileSettings: ahead.fileSettings,
    fileOrder: [ahead.fileId],
    files: { [ahead.fileId]: { ...file, group: ahead.group, sizeBytes: ahead.sizeBytes } },
  };
}

/**
 * A file run request as text, with every column replaced by its length (the columns of a run
 * made ahead are the very file the page then holds): two requests with the same key give the
 * same result.
 */
export function runRequestKey(request: { run: RunInput; only: string[] }): string {
  return JSON.stringify(request, (_key, value: unknown) => (ArrayBuffer.isView(value) ? `#${(value as Float64Array).length}` : value));
}

/**
 * The run request's key as a short digest (textDigest.ts): what the worker sends back with a run
 * made ahead, in place of the key's text (about 5,000 characters, which every one of a batch's
 * answers carried across to the page).
 */
export function runRequestDigest(request: { run: RunInput; only: string[] }): string {
  return textDigest(runRequestKey(request));
}

const subtracted = new WeakMap<object, { blank: object; currentA: Float64Array }>();

/**
 * The current a file is analysed on: as recorded, or less its blank (the same subtraction the run
 * makes, core/background), with the blank's name; kept per measurement and blank, so a redraw does
 * not subtract again. A blank of another kind of current is left to the run to refuse.
 */
export function analysedCurrentOf(state: RunSources, id: string): { currentA: Float64Array; blank: string | null } | null {
  const m = state.files[id]?.measurement;
  if (!m) return null;
  const name = blankNames(state).has(m.fileName) ? null : blankOf(state, id);
  const blank = name ? measurementNamed(state, name) : null;
  if (!name || !blank || (blank.currentKind ?? 'current') !== (m.currentKind ?? 'current')) return { currentA: m.currentA, blank: null };
  const hit = subtracted.get(m);
  if (hit && hit.blank === blank) return { currentA: hit.currentA, blank: name };
  try {
    const currentA = subtractBlank(m, blank).currentA;
    subtracted.set(m, { blank, currentA });
    return { currentA, blank: name };
  } catch {
    return { currentA: m.currentA, blank: null };
  }
}
