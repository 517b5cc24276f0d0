/**
 * Result and option types of the scan-rate series analysis (analyzeSeries): per couple followed
 * across the files, its fits, D, k°, Γ, k_s, k_f and the series verdict. The per-file point and the
 * regime words live in series/seriesPoint.ts. Units in every name; currents are positive
 * magnitudes unless named signed; potentials in V on the scale the run reports.
 */
import type { FitLineResult } from '../regression';
import type { LogLogReading, PeakPotentialVsLogScanRateResult, RandlesSevcikForm } from '../series';
import type { NicholsonPsiResult } from '../kinetics';
import type { CellValues } from './runTypes';
import type { VoltammogramAnalysis } from './types';
import type { Verdict } from '../couples/coupleTypes';
import type { SeriesKineticClass, SeriesPoint, SeriesRegime } from '../series/seriesPoint';
import type { PeakDirection } from '../peaks/peakTypes';

/** One voltammogram of a series, already analysed. */
export interface SeriesFileInput {
  fileName: string;
  scanRateVPerS: number;
  analysis: VoltammogramAnalysis;
}

/** Options of a standalone series analysis: the series' cell values, the cycle and the matching tolerance. */
export type AnalyzeSeriesOptions = Pick<CellValues, 'electronCount' | 'areaCm2' | 'concentrationMolPerCm3' | 'temperatureK' | 'alpha'
  | 'transferElectronCount' | 'diffusionRatio' | 'diffusionCm2PerS'> & {
  /** 1-based cycle used from each file. @default 1 */
  cycle?: number;
  /** Largest E½ (or Ep) move between neighbouring scan rates for one couple (V). @default 0.12 */
  matchToleranceV?: number;
};

/** First-order follow-up reaction of an EC couple (followUpRateConstant.ts). */
export interface SeriesFollowUp {
  /** Median k_f over the files where it was determinable (1/s). */
  rateConstantPerS: number | null;
  perFile: Array<{ fileIndex: number; rateConstantPerS: number | null; lambda: number | null; reason: string | null }>;
}

export interface SeriesDiffusion {
  diffusionCm2PerS: number;
  /** From the ends of the slope's 95 % interval, when it has one. */
  intervalCm2PerS: [number, number] | null;
  /** Standard error of the slope D came from, relative to the slope; null without a degree of freedom. */
  slopeRelativeStdError: number | null;
  slopeDegreesOfFreedom: number;
  /**
   * 95 % interval that also carries the stated uncertainty of the area and the concentration
   * (combinedDiffusionInterval.ts); set by the run, null when the slope has no standard error.
   */
  combinedIntervalCm2PerS?: [number, number] | null;
  form: RandlesSevcikForm;
  /** α used by the irreversible form, with its origin. */
  alphaUsed: number | null;
  alphaSource: string | null;
  note: string | null;
}

export interface SeriesRateConstant {
  /** Median over the files where ψ was determinable (cm/s). */
  k0CmPerS: number | null;
  perFile: Array<{
    fileIndex: number;
    k0CmPerS: number | null;
    /** 'nicholson' inside 61–212 mV, 'irreversible' (both peaks, Wang eq. 2-5) beyond. */
    method: 'nicholson' | 'irreversible' | null;
    psi: NicholsonPsiResult | null;
    reason: string | null;
  }>;
  /** When every ΔEp is below the table: k° is at least this (cm/s). */
  lowerBoundCmPerS: number | null;
  /** D_O used (cm²/s) and where it came from. */
  diffusionOxCm2PerS: number | null;
  diffusionSource: string | null;
}

export interface SeriesSurface {
  coverageFromChargeMolPerCm2: number | null;
  coverageFromSlopeMolPerCm2: number | null;
  /**
   * Files behind coverageFromSlopeMolPerCm2: those with n·ΔEp ≤ 28.5 mV (Nernstian film, where
   * ip = n²F²AΓv/4RT holds) when at least two, else all. Added later, hence optional.
   */
  coverageFromSlopeFileCount?: number;
  /** |ip| (A) of the forward peak against v (V/s), all files. */
  fit: FitLineResult | null;
  /** Laviron k_s, median over files with n·ΔEp > 200 mV (1/s). */
  ksPerS: number | null;
  ksPerFile: Array<{ fileIndex: number; ksPerS: number | null }>;
  /** α from the Laviron Ep–log v slopes, when both peaks move apart. */
  lavironAlpha: number | null;
}

export interface SeriesCouple {
  /** 0-based, in order of E½. */
  index: number;
  /** Median E½ (or lone Ep) over the files (V). */
  eHalfV: number | null;
  forwardDirection: PeakDirection;
  points: SeriesPoint[];
  regime: SeriesRegime;
  kineticClass: SeriesKineticClass;
  /** k_f of a follow-up reaction, when most files show one; added later, hence optional. */
  followUp?: SeriesFollowUp | null;
  /** Forward-peak |ip| (A) against v^½ ((V/s)^½): the contract's slope/intercept/r2. */
  forwardFit: FitLineResult | null;
  anodicFit: FitLineResult | null;
  cathodicFit: FitLineResult | null;
  diffusion: SeriesDiffusion | null;
  logLog: { slope: number; reading: LogLogReading; fit: FitLineResult } | null;
  peakShift: { anodic: PeakPotentialVsLogScanRateResult | null; cathodic: PeakPotentialVsLogScanRateResult | null };
  /** α of an irreversible diffusing couple from Ep against log v. */
  alpha: number | null;
  rateConstant: SeriesRateConstant | null;
  /**
   * Electroactive area (cm²) from the forward slope when the user gave D and the concentration
   * (a standard of known D); reversible diffusing couples only.
   */
  electroactiveAreaCm2: number | null;
  surface: SeriesSurface | null;
  /** Plain statements of what the series shows, each with its number. */
  diagnostics: string[];
  /** Verdict of the slowest-scan-rate voltammogram, refined with the series evidence. */
  verdict: Verdict;
}

export type SeriesWarningCode =
  | 'SINGLE_SCAN_RATE' | 'NO_AREA' | 'NO_CONCENTRATION' | 'UNMATCHED_COUPLE' | 'NOT_DETERMINABLE'
  | 'NONLINEAR' | 'DUPLICATE_SCAN_RATE' | 'MISSING_CYCLE' | 'ELECTRON_COUNT';

export interface SeriesWarning {
  code: SeriesWarningCode;
  message: string;
  /** Series couple index, when the warning belongs to one. */
  couple?: number;
}

export interface SeriesAnalysis {
  couples: SeriesCouple[];
  warnings: SeriesWarning[];
}
