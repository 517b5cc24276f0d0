/**
 * Input, option and result types of analyzeRun (one analysis run over the files of a scan-rate
 * series, with reference-scale conversion, iR correction and provenance).
 */
import type { DoubleLayerCapacitanceResult } from '../series';
import type { ReferenceId } from '../reference';
import type { ScanRateSource, Voltammogram } from '../types';
import type { AnalyzeSeriesOptions, SeriesAnalysis } from './seriesTypes';
import type { AnalyzeVoltammogramOptions, VoltammogramAnalysis } from './types';
import type { CurrentConvention } from '../types';

/** Where a file came from, for the results sheet. All optional. */
export interface FileProvenance {
  sizeBytes?: number | null;
  /** Hex SHA-256 of the original bytes. */
  sha256?: string | null;
  /** Detected layout in plain words (delimiter, columns, units). */
  layout?: string | null;
  importWarnings?: string[];
}

/** One file of a run; a Measurement fits (it is a Voltammogram with a fileName). */
export interface RunInput {
  fileName: string;
  voltammogram: Voltammogram;
  /** Reference electrode named in the file's metadata, if any. */
  referenceElectrode?: string | null;
  provenance?: FileProvenance;
  /** 'internal-standard': a companion file measured only for the E½ of the internal standard. @default 'series' */
  role?: 'series' | 'internal-standard';
}

/** Where the Fc⁺/Fc (or other internal-standard) E½ comes from. */
export type InternalStandardSource =
  /** A value the user measured, on the scale `reference`. */
  | { kind: 'value'; eHalfV: number; reference: string; origin?: string }
  /** The couple nearest `nearV` (input scale) in the named file, or in the series files when absent. */
  | { kind: 'measured'; nearV: number; fileName?: string };

export interface AnalyzeRunOptions extends Omit<AnalyzeSeriesOptions, 'cycle'> {
  /** Per-trace options (smoothing, windows, baselines, minimum S/N...). */
  perTrace?: Omit<AnalyzeVoltammogramOptions, 'electronCount' | 'temperatureK' | 'scanRateVPerS'>;
  /** Scan rate for every file (V/s); beats what the files carry. @default null */
  scanRateVPerS?: number | null;
  /** Scale the files were measured on; each file's own metadata when absent. @default null */
  inputReference?: string | null;
  /** Scale to report potentials on; the input scale when absent. @default null */
  outputReference?: string | null;
  /** pH for RHE. */
  pH?: number;
  /** User values of reference electrodes vs SHE (V). */
  referenceOverridesVsSheV?: Partial<Record<ReferenceId, number>>;
  internalStandard?: InternalStandardSource | null;
  /** Uncompensated resistance (Ω) for E − i·Ru. @default 0 */
  ruOhm?: number;
  /** Sign convention of signed currents in reports. @default 'iupac' */
  outputConvention?: CurrentConvention;
  /** Potential (output scale, V) of a featureless region for double-layer capacitance. @default null */
  capacitancePotentialV?: number | null;
  /** 1-based cycle used for the series. @default 1 */
  cycle?: number;
  /** Software name and version for provenance. */
  software?: { name: string; version: string };
}

export interface RunFileResult {
  fileName: string;
  role: 'series' | 'internal-standard';
  scanRateVPerS: number;
  scanRateSource: ScanRateSource | null;
  /** Potentials in `analysis` are on the output scale: measured + offsetV (after iR correction). */
  inputReference: ReferenceId | null;
  offsetV: number;
  analysis: VoltammogramAnalysis;
  /** Forward − reverse current at capacitancePotentialV (A), when asked for. */
  chargingGapA: number | null;
  provenance: FileProvenance;
  pointCount: number;
}

export type RunWarningCode = 'REFERENCE' | 'TEMPERATURE' | 'OHMIC' | 'TRACE' | 'SERIES' | 'CAPACITANCE' | 'INTERNAL_STANDARD';

export interface RunWarning {
  code: RunWarningCode;
  message: string;
  fileName?: string;
}

export interface AnalyzeRunResult {
  files: RunFileResult[];
  series: SeriesAnalysis;
  capacitance: DoubleLayerCapacitanceResult | null;
  reference: { output: ReferenceId | null; basis: string[] };
  convention: CurrentConvention;
  warnings: RunWarning[];
  provenance: {
    software: { name: string; version: string };
    /** Published methods used, one line each. */
    methods: string[];
    /** Option values used (after defaults). */
    options: Record<string, unknown>;
  };
}
