/**
 * Analysis settings the user edits, in the units of the forms (mM, °C, Ω); runInput.ts maps them
 * to the core's run model (mol/cm³, K). Method settings and the display scale apply to every file;
 * the cell values here are only the defaults each series starts from (seriesCell.ts), because
 * series are measured on different electrodes and solutions; peak windows and baseline choices
 * are per file because potential ranges differ between files.
 */
import { REFERENCE_ELECTRODES, type ReferenceId } from '../core/reference';
import type { BaselineMethod, BaselineSpec } from '../core/baseline/baselineTypes';
import type { PeakWindow } from '../core/peaks/peakTypes';
import type { SmoothingSetting } from '../core/smoothing/smoothingTypes';
import type { SeriesCell } from './seriesCell';

/** App-wide cell defaults: a series without its own value, and without one in its files, uses these. */
export interface ChemistrySettings {
  /** Electrons per molecule, n. */
  electronCount: number;
  /** Electrode area (cm²). */
  areaCm2: number;
  /** Bulk concentration of the analyte (mM, that is mmol/L; 1 mM = 1e-6 mol/cm³). */
  concentrationMM: number;
  /** Cell temperature (°C). */
  temperatureC: number;
  /** Transfer coefficient α given by the user; null = measured from the data (else 0.5). */
  alpha: number | null;
  /** Electrons in the rate-determining step nₐ, for the irreversible equations (α·nₐ). */
  transferElectronCount: number;
  /** E°′ known from elsewhere (V, on the series' recording scale); null = not known. */
  formalPotentialV: number | null;
  /** Uncompensated resistance Ru (Ω) for iR correction; 0 = none. */
  resistanceOhm: number;
  /** Relative standard uncertainty of the area and of the concentration (%), for D's combined interval. */
  areaUncertaintyPercent: number;
  concentrationUncertaintyPercent: number;
  /** Blanks of the series (file names in the workspace): each file subtracts the one nearest its scan rate. */
  blankFiles: string[];
}

export interface ReferenceSettings {
  /** Default reference electrode the files were recorded against (each series may have its own). */
  fileReference: ReferenceId;
  /** Scale on which potentials are shown and exported (global, for every series). */
  displayReference: ReferenceId;
  /** Electrolyte pH, for the RHE scale. */
  pH: number;
  /** Measured E½ of ferrocene on the file's scale (V), for the internal-standard scale. */
  ferroceneHalfWaveV: number | null;
  /**
   * Ferrocene measured in a file instead: the couple nearest `internalStandardNearV` (V, file
   * scale) in that file (null: the series' own files). Beats `ferroceneHalfWaveV` when set.
   */
  internalStandardNearV: number | null;
  internalStandardFile: string | null;
}

export interface AnalysisSettings {
  smoothing: SmoothingSetting | 'off';
  forwardBaseline: Exclude<BaselineMethod, 'nicholson' | 'two-point'>;
  returnBaseline: Exclude<BaselineMethod, 'two-point'>;
  /** Peaks must stand this many noise standard deviations above their surroundings. */
  minSignalToNoise: number;
  /** ψ from ΔEp: Nicholson's table (interpolated) or the Lavagnini et al. fit. */
  psiMethod: 'table' | 'lavagnini';
  /** Isolated bad points: left out by a Hampel test, or kept. */
  spikeFilter: 'hampel' | 'off';
  chemistry: ChemistrySettings;
  reference: ReferenceSettings;
}

export interface FileAnalysisSettings {
  peakWindows: PeakWindow[];
  baselines: BaselineSpec[];
  /** The blank this file subtracts (a file name); null: none, even if its series has blanks; absent: the series' nearest. */
  blankFile?: string | null;
}

export const defaultSettings: AnalysisSettings = {
  smoothing: { window: 5, order: 2 },
  forwardBaseline: 'linear',
  returnBaseline: 'nicholson',
  minSignalToNoise: 8,
  psiMethod: 'table',
  spikeFilter: 'hampel',
  chemistry: { electronCount: 1, areaCm2: 0.0707, concentrationMM: 1, temperatureC: 25, alpha: null, transferElectronCount: 1, formalPotentialV: null, resistanceOhm: 0, areaUncertaintyPercent: 2, concentrationUncertaintyPercent: 2, blankFiles: [] },
  reference: { fileReference: 'AgCl-3M', displayReference: 'AgCl-3M', pH: 7, ferroceneHalfWaveV: null, internalStandardNearV: null, internalStandardFile: null },
};

const REFERENCE_IDS: readonly ReferenceId[] = REFERENCE_ELECTRODES.map((r) => r.id);

export const emptyFileSettings: FileAnalysisSettings = { peakWindows: [], baselines: [] };

/**
 * Lays stored JSON over the defaults, keeping only fields of the right type, so an old or
 * hand-edited session cannot put a text where a number belongs.
 */
export function mergeSettings(base: AnalysisSettings, stored: unknown): AnalysisSettings {
  const s = asRecord(stored);
  const chem = asRecord(s.chemistry);
  const ref = asRecord(s.reference);
  return {
    smoothing: mergeSmoothing(base.smoothing, s.smoothing),
    forwardBaseline: pick(s.forwardBaseline, ['linear', 'polynomial'] as const, base.forwardBaseline),
    returnBaseline: pick(s.returnBaseline, ['linear', 'polynomial', 'nicholson'] as const, base.returnBaseline),
    minSignalToNoise: num(s.minSignalToNoise, base.minSignalToNoise),
    psiMethod: pick(s.psiMethod, ['table', 'lavagnini'] as const, base.psiMethod),
    spikeFilter: pick(s.spikeFilter, ['hampel', 'off'] as const, base.spikeFilter),
    chemistry: {
      electronCount: num(chem.electronCount, base.chemistry.electronCount),
      areaCm2: num(chem.areaCm2, base.chemistry.areaCm2),
      concentrationMM: num(chem.concentrationMM, base.chemistry.concentrationMM),
      temperatureC: num(chem.temperatureC, base.chemistry.temperatureC),
      alpha: chem.alpha === null ? null : num(chem.alpha, base.chemistry.alpha),
      transferElectronCount: num(chem.transferElectronCount, base.chemistry.transferElectronCount),
      formalPotentialV: chem.formalPotentialV === null ? null : num(chem.formalPotentialV, base.chemistry.formalPotentialV),
      resistanceOhm: num(chem.resistanceOhm, base.chemistry.resistanceOhm),
      areaUncertaintyPercent: num(chem.areaUncertaintyPercent, base.chemistry.areaUncertaintyPercent),
      concentrationUncertaintyPercent: num(chem.concentrationUncertaintyPercent, base.chemistry.concentrationUncertaintyPercent),
      blankFiles: names(chem.blankFiles) ?? base.chemistry.blankFiles,
    },
    reference: {
      fileReference: pick(ref.fileReference, REFERENCE_IDS, base.reference.fileReference),
      displayReference: pick(ref.displayReference, REFERENCE_IDS, base.reference.displayReference),
      pH: num(ref.pH, base.reference.pH),
      ferroceneHalfWaveV: ref.ferroceneHalfWaveV === null ? null : num(ref.ferroceneHalfWaveV, base.reference.ferroceneHalfWaveV),
      internalStandardNearV: ref.internalStandardNearV === null ? null : num(ref.internalStandardNearV, base.reference.internalStandardNearV),
      internalStandardFile: typeof ref.internalStandardFile === 'string' ? ref.internalStandardFile : base.reference.internalStandardFile,
    },
  };
}

/**
 * Per-series cell values from a session, keeping only fields of the right type; a session
 * without them (written before cells belonged to series) gives none, so the globals apply.
 */
export function mergeSeriesCells(stored: unknown): Record<string, Partial<SeriesCell>> {
  const out: Record<string, Partial<SeriesCell>> = {};
  for (const [group, value] of Object.entries(asRecord(stored))) {
    const v = asRecord(value);
    const cell: Partial<SeriesCell> = {};
    for (const key of ['electronCount', 'areaCm2', 'concentrationMM', 'temperatureC', 'resistanceOhm', 'pH', 'areaUncertaintyPercent', 'concentrationUncertaintyPercent', 'transferElectronCount'] as const) {
      if (typeof v[key] === 'number' && Number.isFinite(v[key])) cell[key] = v[key];
    }
    for (const key of ['alpha', 'formalPotentialV', 'ferroceneHalfWaveV', 'internalStandardNearV'] as const) {
      if (v[key] === null || (typeof v[key] === 'number' && Number.isFinite(v[key]))) cell[key] = v[key];
    }
    if (v.internalStandardFile === null || typeof v.internalStandardFile === 'string') cell.internalStandardFile = v.internalStandardFile;
    const blanks = names(v.blankFiles);
    if (blanks) cell.blankFiles = blanks;
    if (REFERENCE_IDS.includes(v.fileReference as ReferenceId)) cell.fileReference = v.fileReference as ReferenceId;
    out[group] = cell;
  }
  return out;
}

/**
 * A file's own peak windows and baseline choices from a session record, keeping only well-typed
 * entries (a hand-edited session cannot put a text where a potential belongs).
 */
export function mergeFileSettings(stored: unknown): FileAnalysisSettings {
  const r = asRecord(stored);
  const finite = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);
  const direction = (v: unknown): v is 'anodic' | 'cathodic' => v === 'anodic' || v === 'cathodic';
  const cycle = (v: unknown) => (Number.isInteger(v) && (v as number) >= 1 ? { cycle: v as number } : {});
  const peakWindows: PeakWindow[] = (Array.isArray(r.peakWindows) ? r.peakWindows : []).map(asRecord)
    .filter((w) => direction(w.direction) && finite(w.fromV) && finite(w.toV) && w.fromV !== w.toV)
    .map((w) => ({ direction: w.direction as PeakWindow['direction'], fromV: w.fromV as number, toV: w.toV as number, ...cycle(w.cycle) }));
  const methods: BaselineMethod[] = ['linear', 'polynomial', 'two-point', 'nicholson'];
  const baselines: BaselineSpec[] = (Array.isArray(r.baselines) ? r.baselines : []).map(asRecord)
    .filter((b) => direction(b.direction) && finite(b.fromV) && finite(b.toV) && methods.includes(b.method as BaselineMethod))
    .map((b) => {
      const spec: BaselineSpec = { direction: b.direction as BaselineSpec['direction'], fromV: b.fromV as number, toV: b.toV as number, method: b.method as BaselineMethod, ...cycle(b.cycle) };
      if (Array.isArray(b.anchorsV) && b.anchorsV.length === 2 && b.anchorsV.every(finite)) spec.anchorsV = [b.anchorsV[0] as number, b.anchorsV[1] as number];
      if (Array.isArray(b.anchorCurrentsA) && b.anchorCurrentsA.length === 2 && b.anchorCurrentsA.every(finite)) spec.anchorCurrentsA = [b.anchorCurrentsA[0] as number, b.anchorCurrentsA[1] as number];
      if (Number.isInteger(b.degree) && (b.degree as number) >= 1 && (b.degree as number) <= 6) spec.degree = b.degree as number;
      return spec;
    });
  const out: FileAnalysisSettings = { peakWindows, baselines };
  if (r.blankFile === null || (typeof r.blankFile === 'string' && r.blankFile.length <= 1000)) out.blankFile = r.blankFile;
  return out;
}

/** A list of file names, or undefined when the value is not one. */
function names(v: unknown): string[] | undefined {
  return Array.isArray(v) && v.every((x) => typeof x === 'string' && x.length <= 1000) ? [...(v as string[])] : undefined;
}

function asRecord(v: unknown): Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v) ? (v as Record<string, unknown>) : {};
}

function num<T extends number | null>(v: unknown, fallback: T): number | T {
  return typeof v === 'number' && Number.isFinite(v) ? v : fallback;
}

function pick<T extends string>(v: unknown, allowed: readonly T[], fallback: T): T {
  return allowed.includes(v as T) ? (v as T) : fallback;
}

function mergeSmoothing(base: SmoothingSetting | 'off', v: unknown): SmoothingSetting | 'off' {
  if (v === 'off') return 'off';
  const r = asRecord(v);
  if (typeof r.window === 'number' && typeof r.order === 'number') return { window: r.window, order: r.order };
  return base;
}
