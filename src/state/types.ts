/**
 * Shape of the one store: files, analysis, series, view and history slices. Actions sit beside
 * the state they change; each slice file builds its part.
 */
import type { StoreApi } from 'zustand/vanilla';
import type { RunFileResult, RunSeriesResult } from '../core/analysis/runTypes';
import type { ImportWarning } from '../io/errors';
import type { SessionFileRecord } from '../io/session';
import type { ImportOverrides, Measurement } from '../io/types';
import type { AnalysisClient } from '../worker/client';
import type { RunAheadResult } from '../worker/protocol';
import type { FileSource } from './fileSource';
import type { CurrentDisplay } from '../run/runInput';
import type { FitCell, FitResult } from '../core/fit';
import type { ComparisonSummary } from '../io/fitContract';
import type { FitProgressDetail } from '../worker/fitRun';
import type { CarriedValue, FitSetup } from './fitRequest';
import type { SeriesCell } from '../run/seriesCell';
import type { AnalysisSettings, FileAnalysisSettings } from '../run/settings';
import type { ResultsSort } from './resultsTable';
import type { StorageAdapter } from './storage';
import type { WorkingWindowChoice, WorkingWindowSlice } from './workingWindowSlice';

/** An error as the UI shows it: what, where, and its stable code. */
export interface UserError {
  code: string;
  message: string;
  line?: number;
  column?: number;
}

export type FileStatus = 'queued' | 'importing' | 'ready' | 'error';

export interface FileEntry {
  id: string;
  fileName: string;
  sizeBytes: number;
  /** The original bytes, kept so the file can be re-imported with overrides and saved (fileSource.ts). */
  source: FileSource;
  sha256: string | null;
  group: string;
  status: FileStatus;
  /** Import progress, 0…1. */
  progress: number;
  /** Last import failure; with status 'ready' it means a re-import failed and the previous result is kept. */
  error: UserError | null;
  measurement: Measurement | null;
  warnings: ImportWarning[];
  overrides: ImportOverrides;
}

export interface FileInput {
  name: string;
  data: FileSource | string;
}

/** A file put back with what it had: its series, import overrides and own windows and baselines. */
export interface RestoredFile extends FileInput {
  group: string;
  overrides: ImportOverrides;
  /** Null: the file has no choices of its own yet (a session record may still give them by SHA-256). */
  fileSettings: FileAnalysisSettings | null;
}

/** Files of one upload that came from one folder (null: picked or dropped loose). */
export interface UploadBatch {
  folder: string | null;
  inputs: FileInput[];
}

export interface FilesSlice {
  files: Record<string, FileEntry>;
  fileOrder: string[];
  /** Files of the running import batch: how many are done out of how many. */
  importBatch: { done: number; total: number } | null;
  /** Session records waiting for their file (matched by SHA-256 when it is loaded). */
  remembered: SessionFileRecord[];
  addFiles(inputs: FileInput[], group?: string): Promise<string[]>;
  /** Adds files as a session had them, in order; returns their ids. */
  restoreFiles(records: RestoredFile[]): Promise<string[]>;
  /**
   * An upload (a drop, a file pick, a folder pick): each folder, and inside it each set of files
   * with a common name stem, becomes a new series with a unique name that starts from the defaults
   * and its own files' headers. Returns the new files' ids and the new series' names.
   * `onFirstRead` is called once, with the first new series, as soon as one of its files is read
   * (so the series can be shown while the rest are read).
   */
  addUpload(batches: UploadBatch[], onFirstRead?: (group: string) => void): Promise<{ ids: string[]; groups: string[] }>;
  reimportFile(id: string, overrides: ImportOverrides): Promise<void>;
  removeFile(id: string): void;
  setFileGroup(id: string, group: string): void;
  /** Clears every file, series, cell value and per-file choice; the method settings stay (undoable). */
  newWorkspace(): void;
}

export interface AnalysisEntry {
  status: 'running' | 'ready' | 'error';
  /** The file's part of the analysis run: its analysis on the display scale, the analysed potential, its reference offset. */
  run: RunFileResult | null;
  error: UserError | null;
}

export interface AnalysisSlice {
  settings: AnalysisSettings;
  fileSettings: Record<string, FileAnalysisSettings>;
  results: Record<string, AnalysisEntry>;
  /** Cell values entered for each series (group); the rest come from its files or the defaults (seriesCell.ts). */
  seriesCells: Record<string, Partial<SeriesCell>>;
  /** `ahead`: the run the worker made when it read the file; used when its key matches the run the page would ask for. */
  analyzeFile(id: string, ahead?: RunAheadResult): Promise<void>;
  analyzeAll(): Promise<void>;
  updateSettings(change: (s: AnalysisSettings) => AnalysisSettings): Promise<void>;
  updateFileSettings(id: string, change: (s: FileAnalysisSettings) => FileAnalysisSettings): Promise<void>;
  /** Edits the values entered for one series (undoable) and re-analyses that series' files. */
  updateSeriesCell(group: string, change: (own: Partial<SeriesCell>) => Partial<SeriesCell>): Promise<void>;
  /** Fills values a series has not been given yet (demo set-up; not recorded for undo). */
  seedSeriesCell(group: string, values: Partial<SeriesCell>): void;
}

export type { CurrentDisplay };

export interface ViewSlice {
  selectedFileId: string | null;
  /** 1-based cycle shown, or 0 for all cycles. */
  selectedCycle: number;
  convention: CurrentDisplay;
  showSmoothed: boolean;
  showBaselines: boolean;
  /** Overlay a simulated voltammogram with the fitted parameters. */
  showTheory: boolean;
  /** Draw the other files of the selected file's series behind it. */
  showCompanions: boolean;
  /** Drag on the plot zooms, or marks a peak window of `windowDirection`. */
  dragMode: 'zoom' | 'window';
  windowDirection: 'anodic' | 'cathodic';
  mainView: 'trace' | 'series' | 'report' | 'fit';
  safetyOpen: boolean;
  notice: string | null;
  /** SHA-256 of the files whose bytes the browser's storage could not keep for the next visit. */
  notKept: string[];
  /** Table shown under the trace. */
  readoutTab: ReadoutTab;
  /** The results table across files shows the current series, or every file. */
  resultsScope: 'series' | 'all';
  resultsSort: ResultsSort | null;
  /** Series plots: how the overlaid voltammograms are scaled, and which cycle of each file is drawn. */
  seriesOverlay: { normalisation: OverlayNormalisation; cycle: number };
  setView(patch: Partial<Omit<ViewSlice, 'setView' | 'selectFile' | 'openSeries' | 'setConvention' | 'convention'>>): void;
  /** The sign convention of the display and the results (undoable). */
  setConvention(convention: CurrentDisplay): Promise<void>;
  /** Selects the file (and cycle; default 1) and its series. */
  selectFile(id: string | null, cycle?: number): void;
  /** Shows a series: its first file on the trace and its results table below (after an upload). */
  openSeries(group: string): void;
}

export type ReadoutTab = 'couples' | 'files' | 'peaks' | 'import' | 'notes';
/** i as measured, i/A (density), i/v½ (diffusion-controlled waves coincide), i/v (capacitive and surface waves coincide). */
export type OverlayNormalisation = 'current' | 'density' | 'diffusion' | 'capacitive';

/** The files of a workspace and what was computed from them, kept by a step that replaced them. */
export interface WorkspaceSnapshot {
  files: Record<string, FileEntry>;
  fileOrder: string[];
  results: Record<string, AnalysisEntry>;
  series: Record<string, SeriesEntry>;
  remembered: SessionFileRecord[];
  selectedFileId: string | null;
  selectedGroup: string | null;
  /** The fit setups and fits of the replaced workspace. */
  fitSetups: Record<string, FitSetup>;
  fits: Record<string, FitEntry>;
}

export interface HistorySnapshot {
  settings: AnalysisSettings;
  fileSettings: Record<string, FileAnalysisSettings>;
  seriesCells: Record<string, Partial<SeriesCell>>;
  convention: CurrentDisplay;
  workingWindows: Record<string, WorkingWindowChoice>;
  /** Present when the step replaced the workspace (new workspace, opened session). */
  workspace?: WorkspaceSnapshot;
}

export interface HistorySlice {
  past: HistorySnapshot[];
  future: HistorySnapshot[];
  /** Keeps the state before a change for undo; `workspace` also keeps the files and results. */
  record(workspace?: boolean): void;
  undo(): Promise<void>;
  redo(): Promise<void>;
}

export interface SeriesEntry {
  status: 'running' | 'ready' | 'error';
  result: RunSeriesResult | null;
  error: UserError | null;
  /** Files that went into the series, in order. */
  fileIds: string[];
}

export interface SeriesSlice {
  series: Record<string, SeriesEntry>;
  selectedGroup: string | null;
  selectGroup(group: string): void;
  /** Groups of the loaded files, in load order. */
  groups(): string[];
  analyzeGroup(group: string): Promise<void>;
  /** The group the screen is about: the series view's choice, else the selected file's group. */
  currentGroup(): string | null;
  /** Results sheet of a group (null: every series) as CSV or JSON text, made in the worker. */
  exportGroup(group: string | null, format: 'csv' | 'json'): Promise<string>;
  /** Re-runs the group's series after a short quiet time (edits come in bursts). */
  scheduleGroup(group: string, delayMs?: number): void;
}

export interface TheoryEntry {
  status: 'running' | 'ready' | 'error';
  /** Simulated applied potential (V, files' scale) and current (A, IUPAC). */
  curve: { potentialV: Float64Array; currentA: Float64Array } | null;
  /** The parameters used, in words, shown beside the plot. */
  description: string;
  error: UserError | null;
}

export interface TheorySlice {
  theory: Record<string, TheoryEntry>;
  simulateTheory(id: string): Promise<void>;
}

export interface FitEntry {
  status: 'running' | 'ready' | 'error' | 'cancelled';
  /** What was fitted (the setup at the time). */
  setup: FitSetup;
  fileIds: string[];
  fileNames: string[];
  /** The cell of the fit in core units (cm², mol/cm³, n, K). */
  cell: FitCell;
  /** The files gave current densities: the fit is per cm² (area 1), its R_u in Ω·cm². */
  perArea?: boolean;
  /** The scale E°′ and the window are shown on, and its offset from the files' recording scale (V). */
  scale: { name: string; offsetV: number };
  /** What the fit depended on (fitRequest.ts: fitInputKey); the fit is current while it is unchanged. */
  key: string;
  /** The latest progress report while running. */
  progress: FitProgressDetail | null;
  progressText: string;
  /** The chosen model's fit, potentials on `scale`. */
  result: FitResult | null;
  comparison: ComparisonSummary | null;
  error: UserError | null;
  /** After "use these values": what went into the cell, and the undo depth right after (undo only while nothing came since). */
  carried: { values: CarriedValue[]; historyDepth: number } | null;
}

export interface FitSlice {
  /** The setup chosen for each series (fitSetupOf gives the default of a series without one). */
  fitSetups: Record<string, FitSetup>;
  /** The latest fit of each series. */
  fits: Record<string, FitEntry>;
  fitSetupOf(group: string): FitSetup;
  /** Changes the setup; a new mechanism brings its default free parameters unless `free` is given too. */
  setFitSetup(group: string, patch: Partial<FitSetup>): void;
  /** Fits the series' files with its setup in the worker (a running fit of the series is cancelled). */
  runFit(group: string): Promise<void>;
  cancelFit(group: string): void;
  /** True while the series' files, cell and scale are those the fit used. */
  fitIsCurrent(group: string): boolean;
  /** The fitted values the series' cell has a field for (α of a single couple, R_u), where the data determined them. */
  carryableFitValues(group: string): CarriedValue[];
  /** Carries them into the series' cell as one undoable step; returns what was carried (nothing for an outdated fit). */
  useFitValues(group: string): Promise<CarriedValue[]>;
  /** Takes them back (the store's undo) when that step is still the last one; false otherwise. */
  undoFitValues(group: string): Promise<boolean>;
}

export type HalfwaveState = FilesSlice & AnalysisSlice & ViewSlice & HistorySlice & SeriesSlice & TheorySlice & WorkingWindowSlice & FitSlice;
export type HalfwaveStore = StoreApi<HalfwaveState>;

export interface StoreDeps {
  client: AnalysisClient;
  /** Where autosave writes; null disables autosave. */
  storage: StorageAdapter | null;
}

export type SliceCreator<T> = (set: HalfwaveStore['setState'], get: () => HalfwaveState, deps: StoreDeps) => T;

export function toUserError(err: unknown): UserError {
  const e = (typeof err === 'object' && err !== null ? err : {}) as Partial<UserError> & { message?: unknown };
  const out: UserError = {
    code: typeof e.code === 'string' ? e.code : 'INTERNAL',
    message: typeof e.message === 'string' ? e.message : String(err),
  };
  if (typeof e.line === 'number') out.line = e.line;
  if (typeof e.column === 'number') out.column = e.column;
  return out;
}

/** Importer types the UI shows (re-exported: the UI reaches io only through state). */
export type { CurrentUnit, Guess, ImportDetection, ImportOverrides, Measurement, PotentialUnit } from '../io/types';
export type { AnalysisSettings, FileAnalysisSettings } from '../run/settings';
export type { CellField, CellOrigin, ResolvedCell, SeriesCell } from '../run/seriesCell';
export type { SeriesAnalysis, SeriesCouple } from '../core/analysis/seriesTypes';
export type { SeriesPoint } from '../core/series/seriesPoint';
export type { VoltammogramAnalysis } from '../core/analysis/types';
export type { CarriedValue, FitSetup } from './fitRequest';
export type { FitProgressDetail } from '../worker/fitRun';
export type { RunFileResult, RunSeriesResult } from '../core/analysis/runTypes';
export type { WorkbookCell, WorkbookSheet } from '../io/resultsWorkbook';
export type { BaselineMethod, BaselineSpec } from '../core/baseline/baselineTypes';
export type { CoupleResult } from '../core/couples/coupleTypes';
export type { PeakResult, PeakWindow } from '../core/peaks/peakTypes';
