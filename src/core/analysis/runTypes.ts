/**
 * The run model: what an analysis run takes (files grouped into scan-rate series, each series'
 * cell values, the analysis method and the reporting choices) and what it gives back (per-file
 * results, per-series results, warnings, the reference scales and how the numbers were made).
 * The screen, the results sheet and the command line all build a RunInput and compute through
 * analyzeRun.ts or its pure pieces (analyzeRunFile.ts, analyzeRunSeries.ts), so they agree.
 * Units are in the names: V, A, s, cm², mol/cm³, cm²/s, K, Ω.
 */
import type { BaselineMethod, BaselineSpec } from '../baseline/baselineTypes';
import type { PeakWindow } from '../peaks/peakTypes';
import type { ReferenceId } from '../reference';
import type { ChargingGapWindow, DoubleLayerCapacitanceResult } from '../series';
import type { SmoothingSetting } from '../smoothing/smoothingTypes';
import type { CurrentConvention, CurrentKind, ScanRateSource, Voltammogram } from '../types';
import type { SeriesAnalysis } from './seriesTypes';
import type { VoltammogramAnalysis } from './types';

/** Where a file came from, for the results sheet. All optional. */
export interface FileProvenance {
  sizeBytes?: number | null;
  /** Hex SHA-256 of the original bytes. */
  sha256?: string | null;
  /** Detected layout in plain words (io/describeLayout.ts). */
  layout?: string | null;
  importWarnings?: string[];
  /** What the file's header says (key → text: sample, operator, electrodes...), carried into the sheet. */
  metadata?: Record<string, string>;
}

/** The user's choices for one file's trace, on the scale the file was recorded on (V). */
export interface TraceChoices {
  /** Restrict the peak search to these windows (per direction). */
  peakWindows?: PeakWindow[];
  /** Per-peak baseline choices; the method's defaults apply to peaks not covered. */
  baselines?: BaselineSpec[];
}

/** One file of a run. A Measurement fits `voltammogram` (it is a Voltammogram with more fields). */
export interface RunFile {
  fileName: string;
  /** Key of the scan-rate series the file belongs to. @default 'series 1' */
  series?: string;
  voltammogram: Voltammogram;
  /** Reference electrode named in the file's metadata, if any. */
  referenceElectrode?: string | null;
  provenance?: FileProvenance;
  /**
   * 'internal-standard': a companion file measured only for the E½ of the internal standard;
   * 'blank': supporting electrolyte only, subtracted from other files, not a member of the series.
   * @default 'series'
   */
  role?: RunFileRole;
  trace?: TraceChoices;
  /** Name of the blank (RunInput.blanks) subtracted from this file before analysis. @default null */
  blankFile?: string | null;
}

export type RunFileRole = 'series' | 'internal-standard' | 'blank';

/** A blank voltammogram (supporting electrolyte alone) that files of the run subtract. */
export interface RunBlank {
  fileName: string;
  voltammogram: Voltammogram;
  provenance?: FileProvenance;
}

/** Where the Fc⁺/Fc (or other internal-standard) E½ comes from. */
export type InternalStandardSource =
  /** A value the user measured, on the scale `reference`. */
  | { kind: 'value'; eHalfV: number; reference: string; origin?: string }
  /** The couple nearest `nearV` (recording scale) in the named file, or in the series' files when absent. */
  | { kind: 'measured'; nearV: number; fileName?: string };

/** Where a cell value came from: the tool's default, a file's header, the folder, or the user. */
export type ValueOrigin = 'default' | 'header' | 'folder' | 'entered';

/** Cell values whose origin the results report (a default that decides a number is named beside it). */
export type TrackedCellField = 'electronCount' | 'areaCm2' | 'concentrationMolPerCm3' | 'temperatureK' | 'alpha' | 'ruOhm' | 'inputReference';

/** The cell of one scan-rate series: electrode, solution, reference and resistance. */
export interface CellValues {
  /** Electrons per molecule n. @default 1 */
  electronCount?: number;
  /** Electrode area (cm²); D and Γ need it. @default null */
  areaCm2?: number | null;
  /** Bulk concentration of the species present (mol/cm³); D needs it. @default null */
  concentrationMolPerCm3?: number | null;
  /** Temperature (K). @default 298.15 */
  temperatureK?: number;
  /**
   * αc, the cathodic transfer coefficient (of the reduction O + ne⁻ → R, as the simulator reads
   * it); an oxidation wave runs with 1 − αc. Measured for a totally irreversible series, else
   * assumed 0.5 with 0.3–0.7 carried into D and k°. @default null
   */
  alpha?: number | null;
  /** Electrons in the rate-determining step nₐ: the irreversible equations use α·nₐ. @default 1 */
  transferElectronCount?: number;
  /**
   * E°′ of the couple (V, on the reported scale) when known from elsewhere: k° of a totally
   * irreversible couple then comes from the forward peak alone. @default null
   */
  formalPotentialV?: number | null;
  /**
   * Scale formalPotentialV is stated on: the reported scale, or the scale the series' files were
   * recorded on (the run then moves it by the files' own offset, so it follows a change of the
   * reported scale). @default 'reported'
   */
  formalPotentialScale?: 'reported' | 'recording';
  /** D_O/D_R for Nicholson's k°. @default 1 */
  diffusionRatio?: number;
  /** Known D of the bulk species (cm²/s), used for k° and the electroactive area. @default null */
  diffusionCm2PerS?: number | null;
  /** Uncompensated resistance (Ω) for E − i·Ru. @default 0 */
  ruOhm?: number;
  /** Scale the files were recorded on; each file's own metadata when null. @default null */
  inputReference?: string | null;
  /** pH of the solution, for RHE. @default null */
  pH?: number | null;
  internalStandard?: InternalStandardSource | null;
  /** Potential (output scale, V) of a featureless region, for the double-layer capacitance. @default null */
  capacitancePotentialV?: number | null;
  /** Relative standard uncertainty of the area and of the concentration, for D's combined interval. @default 0.02 each */
  areaRelativeUncertainty?: number;
  concentrationRelativeUncertainty?: number;
  /** Where each value came from; a value without an origin counts as entered. */
  origins?: Partial<Record<TrackedCellField, ValueOrigin>>;
}

/** How every trace is analysed. */
export interface MethodOptions {
  /**
   * Savitzky–Golay smoothing of the shown curve, or 'off'. Ep/2, FWHM and the two-point anchor
   * currents are read from this curve; Ep and ip come from the raw points. @default { window: 5, order: 2 }
   */
  smoothing?: SmoothingSetting | 'off';
  /** Baseline for forward (first-sweep) peaks. @default 'linear' */
  forwardBaseline?: Exclude<BaselineMethod, 'nicholson' | 'two-point'>;
  /** Baseline for return peaks. @default 'nicholson' */
  returnBaseline?: Exclude<BaselineMethod, 'two-point'>;
  /** Minimum prominence over the noise standard deviation. @default 8 */
  minSignalToNoise?: number;
  /** Minimum absolute prominence (A). @default 0 */
  minProminenceA?: number;
  /** Minimum prominence as a fraction of the current range. @default 0.01 */
  minRelativeProminence?: number;
  /**
   * Largest Epa − Epc allowed within a couple (V); when each direction has a single dominant peak
   * (a totally irreversible couple) that pair may lie up to twice this apart. @default 0.6
   */
  maxDeltaEpV?: number;
  /** 1-based cycle the series uses from each file. @default 1 */
  seriesCycle?: number;
  /** Largest E½ move between neighbouring scan rates for one couple (V). @default 0.12 */
  matchToleranceV?: number;
  /** ψ from ΔEp (α = 0.5): Nicholson's 1965 table, interpolated, or the Lavagnini et al. 2004 fit. @default 'table' */
  psiMethod?: 'table' | 'lavagnini';
  /** Isolated bad points: found by a Hampel test against a running median and left out ('hampel'), or kept ('off'). @default 'hampel' */
  spikeFilter?: 'hampel' | 'off';
}

/** How results are reported. */
export interface ReportOptions {
  /** Scale to report potentials on; each file's recording scale when null. @default null */
  outputReference?: string | null;
  /** Sign convention of signed currents in reports. @default 'iupac' */
  outputConvention?: CurrentConvention;
  /** User values of reference electrodes vs SHE (V). */
  referenceOverridesVsSheV?: Partial<Record<ReferenceId, number>>;
  /**
   * A file whose recording scale cannot be converted to `outputReference`: refuse the run, or keep
   * the file on its recording scale with a warning. @default 'error'
   */
  unconvertible?: 'error' | 'keep-recording-scale';
}

export interface RunInput {
  files: RunFile[];
  /** Blanks the files name in `blankFile`. */
  blanks?: RunBlank[];
  /** Cell values per series key; a series without an entry takes the defaults. */
  cells?: Record<string, CellValues>;
  method?: MethodOptions;
  report?: ReportOptions;
  /** Software name and version for provenance. */
  software?: { name: string; version: string };
}

/** Cell values after defaults and checks. */
export interface ResolvedCell {
  electronCount: number;
  areaCm2: number | null;
  concentrationMolPerCm3: number | null;
  temperatureK: number;
  alpha: number | null;
  transferElectronCount: number;
  /** nₐ came from the user; when not, and n > 1, k° and E°′ from the return peak are given over 1 ≤ nₐ ≤ n. */
  transferElectronCountGiven: boolean;
  formalPotentialV: number | null;
  formalPotentialScale: 'reported' | 'recording';
  diffusionRatio: number;
  diffusionCm2PerS: number | null;
  ruOhm: number;
  inputReference: ReferenceId | null;
  pH: number | null;
  internalStandard: InternalStandardSource | null;
  capacitancePotentialV: number | null;
  areaRelativeUncertainty: number;
  concentrationRelativeUncertainty: number;
  origins: Partial<Record<TrackedCellField, ValueOrigin>>;
}

export type ResolvedMethod = Required<MethodOptions>;

export interface ResolvedReport {
  outputReference: ReferenceId | null;
  outputConvention: CurrentConvention;
  referenceOverridesVsSheV: Partial<Record<ReferenceId, number>>;
  unconvertible: 'error' | 'keep-recording-scale';
}

/** One file's place on the scales: recorded on `input`, reported on `output`, `offsetV` apart. */
export interface FileReference {
  input: ReferenceId | null;
  output: ReferenceId | null;
  offsetV: number;
  /** How each scale's position against SHE was obtained. */
  basis: string[];
  /** A typical, not measured, value entered the offset. */
  typical: boolean;
  /** Why the file stayed on its recording scale although another was asked for; null otherwise. */
  note: string | null;
  /**
   * Cautions about this file's scales: a filling assumed from an unqualified name, mercury, the
   * liquid junction, an aqueous reference with non-aqueous work, where the internal standard was
   * found (runReference.ts). Absent when there is none.
   */
  cautions?: string[];
}

export interface RunFileResult {
  fileName: string;
  series: string;
  role: RunFileRole;
  scanRateVPerS: number;
  scanRateSource: ScanRateSource | null;
  /** Potentials in `analysis` are on the output scale: recorded − i·Ru + reference.offsetV. */
  reference: FileReference;
  analysis: VoltammogramAnalysis;
  /** The potential column that was analysed (V, output scale), when it differs from the recorded one. */
  analysedPotentialV: Float64Array | null;
  /** Forward − reverse current at the cell's capacitance potential (A), when asked for. */
  chargingGapA: number | null;
  /** The gaps over ± 10 mV of that potential (chargingGapWindow), when asked for. */
  chargingGapWindow: ChargingGapWindow | null;
  provenance: FileProvenance;
  pointCount: number;
  /** 'density' when the file's currents are A/cm² (no area known): its currents, D and Γ are per cm². */
  currentKind: CurrentKind;
  /** The blank subtracted before the analysis, with how well it matched; null when none. */
  blank: { fileName: string; sha256: string | null; pointsOutside: number; scanRateRatio: number } | null;
  /** Warnings of this file's trace analysis and iR correction. */
  warnings: RunWarning[];
}

export interface RunSeriesResult {
  key: string;
  /** Files of the series (role 'series') in the run's order. */
  fileNames: string[];
  cell: ResolvedCell;
  /**
   * 'density' when the files hold current densities (A/cm²): the series' D, Γ and Cd are then per
   * cm² of electrode and the cell's area is not used.
   */
  currentKind: CurrentKind;
  analysis: SeriesAnalysis;
  capacitance: DoubleLayerCapacitanceResult | null;
  /** Plain-words basis of every scale the series used. */
  referenceBasis: string[];
  /** Default values that decided a reported number, with the numbers they decided. */
  defaultsUsed: DefaultUsed[];
  warnings: RunWarning[];
}

/** A default the user never gave that a reported number depends on. */
export interface DefaultUsed {
  field: TrackedCellField;
  /** The value used, in plain words with its unit. */
  value: string;
  /** What it decides, e.g. ['D', 'Γ']. */
  affects: string[];
}

export type RunWarningCode = 'REFERENCE' | 'TEMPERATURE' | 'OHMIC' | 'TRACE' | 'SERIES' | 'CAPACITANCE' | 'INTERNAL_STANDARD' | 'DEFAULT' | 'BLANK';

export interface RunWarning {
  code: RunWarningCode;
  message: string;
  fileName?: string;
  series?: string;
}

export interface AnalyzeRunResult {
  files: RunFileResult[];
  series: RunSeriesResult[];
  reference: { output: ReferenceId | null; basis: string[] };
  convention: CurrentConvention;
  /** Every warning of the files and the series, in that order. */
  warnings: RunWarning[];
  provenance: {
    software: { name: string; version: string };
    /** Published methods used, one line each. */
    methods: string[];
    method: ResolvedMethod;
    report: ResolvedReport;
  };
}
