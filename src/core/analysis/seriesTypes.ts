/**
 * Result and option types of the scan-rate series analysis (analyzeSeries): per couple followed
 * across the files, its fits, D, k°, Γ, k_s, k_f and the series verdict. The per-file point and the
 * regime words live in series/seriesPoint.ts. Units in every name; currents are positive
 * magnitudes unless named signed; potentials in V on the scale the run reports.
 */
import type { FitLineResult } from '../regression';
import type { LogLogReading, PeakPotentialVsLogScanRateResult, RandlesSevcikForm } from '../series';
import type { NicholsonPsiMethod, NicholsonPsiResult } from '../kinetics';
import type { CellValues } from './runTypes';
import type { VoltammogramAnalysis } from './types';
import type { Verdict } from '../couples/coupleTypes';
import type { SeriesKineticClass, SeriesPoint, SeriesRegime } from '../series/seriesPoint';
import type { PeakDirection } from '../peaks/peakTypes';
import type { OhmicWideningResult } from '../series/ohmicWidening';

/** One voltammogram of a series, already analysed. */
export interface SeriesFileInput {
  fileName: string;
  scanRateVPerS: number;
  analysis: VoltammogramAnalysis;
}

/** Options of a standalone series analysis: the series' cell values, the cycle, the matching tolerance and the ψ method. */
export type AnalyzeSeriesOptions = Pick<CellValues, 'electronCount' | 'areaCm2' | 'concentrationMolPerCm3' | 'temperatureK' | 'alpha'
  | 'transferElectronCount' | 'diffusionRatio' | 'diffusionCm2PerS' | 'formalPotentialV' | 'ruOhm'> & {
  /** 1-based cycle used from each file. @default 1 */
  cycle?: number;
  /** Largest E½ (or Ep) move between neighbouring scan rates for one couple (V). @default 0.12 */
  matchToleranceV?: number;
  /** ψ from ΔEp at α = 0.5: Nicholson's table or the Lavagnini fit. @default 'table' */
  psiMethod?: NicholsonPsiMethod;
};

/** Words that go with every α the series reports. */
export const ALPHA_MEANING = 'αc: cathodic transfer coefficient, of the reduction O + ne⁻ → R (an oxidation wave runs with 1 − αc); αnₐ: α times the electrons in the rate-determining step, of the forward (first-sweep) wave';

/** The transfer coefficient a series couple uses, whose it is and where it came from. */
export interface SeriesTransferCoefficient {
  /** αc, the cathodic transfer coefficient; null when a measured αnₐ is impossible with the given nₐ. */
  alphaC: number | null;
  /** αc over which D and k° are given: [αc, αc] when given, the measured interval, 0.3–0.7 when assumed. */
  alphaCRange: [number, number] | null;
  /** α·nₐ of the forward wave: αc·nₐ (reduction first) or (1 − αc)·nₐ (oxidation first). */
  forwardAlphaNa: number;
  forwardAlphaNaRange: [number, number];
  forwardWave: PeakDirection;
  transferElectronCount: number;
  source: 'given' | 'peak-shift' | 'half-peak-width' | 'assumed';
  /** The value, whose α it is and where it came from, in words. */
  text: string;
  /** Why a measured value was set aside, or that it does not fit nₐ. */
  note: string | null;
}

/** First-order follow-up reaction of an EC couple (followUpRateConstant.ts, series/followUpSignature.ts). */
export interface SeriesFollowUp {
  /** k_f from all the files' ratios at once (1/s); null when it cannot be told. */
  rateConstantPerS: number | null;
  /** Smallest and largest single-file k_f (1/s). */
  rangePerS: [number, number] | null;
  /** k_f is at least this (1/s) when the return peak is nearly gone at some rate. */
  lowerBoundPerS: number | null;
  /** How the follow-up reaction was recognised, each with its numbers. */
  evidence: string[];
  /** Nicholson & Shain's zones over the series: λ = k_f·RT/(nFv) below 0.1, 0.1–5, above 5, or mixed/unknown. */
  zone: 'diffusion' | 'intermediate' | 'kinetic' | 'mixed' | 'unknown';
  perFile: Array<{ fileIndex: number; rateConstantPerS: number | null; lambda: number | null; reason: string | null }>;
}

export interface SeriesDiffusion {
  /**
   * Headline D (cm²/s). With status 'range-only' D cannot be separated from another unknown (k_f):
   * this is then the geometric middle of rangeCm2PerS, never to be reported alone.
   */
  diffusionCm2PerS: number;
  /** 'value', or 'range-only' when only rangeCm2PerS can be told (note says why). @default 'value' */
  status?: 'value' | 'range-only';
  /** From the ends of the slope's 95 % interval, at the headline α. */
  intervalCm2PerS: [number, number] | null;
  /** Standard error of the slope D came from, relative to the slope; null without a degree of freedom. */
  slopeRelativeStdError: number | null;
  slopeDegreesOfFreedom: number;
  /**
   * 95 % interval that also carries the stated uncertainty of the area and the concentration
   * (combinedDiffusionInterval.ts); set by the run, null when the slope has no standard error.
   */
  combinedIntervalCm2PerS?: [number, number] | null;
  /** Over the slope's interval and αc's range (or the follow-up zone) together. */
  rangeCm2PerS: [number, number] | null;
  /** D at the low and the high end of αc's range, where α enters (cm²/s). */
  alphaEndsCm2PerS?: [number, number] | null;
  form: RandlesSevcikForm | 'follow-up-corrected' | 'follow-up-kinetic-zone';
  /** αc behind the headline D (null where α does not enter), with its origin. */
  alphaUsed: number | null;
  alphaSource: string | null;
  note: string | null;
}

export interface SeriesRateConstant {
  /** Median over the files where k° was determinable (cm/s); null unless status is 'value'. */
  k0CmPerS: number | null;
  /** 'value'; 'lower-bound' (k0CmPerS null, lowerBoundCmPerS set); 'cannot-tell' (reason says why). */
  status: 'value' | 'lower-bound' | 'cannot-tell';
  reason: string | null;
  /** k° of every file at every end of αc's range (or the measured interval): [low, high] (cm/s). */
  rangeCmPerS: [number, number] | null;
  perFile: Array<{
    fileIndex: number;
    k0CmPerS: number | null;
    /**
     * 'nicholson' (ψ from Nicholson's table) inside 61–212 mV, or 'lavagnini' (ψ from the Lavagnini
     * fit, asked for, inside its 63–141 mV); beyond, 'irreversible' (both peaks, departures
     * simulated) or 'forward-peak' (E°′ given).
     */
    method: 'nicholson' | 'lavagnini' | 'irreversible' | 'forward-peak' | null;
    psi: NicholsonPsiResult | null;
    /** k° at the ends of αc's range (cm/s). */
    rangeCmPerS?: [number, number] | null;
    /** k° at the low and at the high end of αc's range (cm/s), in that order. */
    k0AtAlphaEndsCmPerS?: [number, number] | null;
    /** E°′ this file's k° rests on (V), for the methods beyond the table. */
    formalPotentialV?: number | null;
    /** That E°′ at the ends of αc's range (V). */
    formalPotentialRangeV?: [number, number] | null;
    reason: string | null;
    /** How this file's k° was had when it differs from what was asked (ψ from the table beyond the Lavagnini fit's range). */
    note?: string | null;
  }>;
  /** Fold change of the per-file k° over the rates when it drifts steadily (status 'cannot-tell'), else null or absent. */
  driftFold?: number | null;
  /** k° is at least this (cm/s): from the reversible end of the table, or the apparent k° when ohmic drop may widen ΔEp. */
  lowerBoundCmPerS: number | null;
  /** D_O used (cm²/s) and where it came from. */
  diffusionOxCm2PerS: number | null;
  diffusionSource: string | null;
  /**
   * E°′ (V) with its origin: given; the median from the return peaks (methods beyond the table); or
   * the E½ of the file nearest reversibility when that bounds E°′ more narrowly than the return-peak
   * model over αc's range (seriesFormalPotential.ts).
   */
  formalPotentialV?: number | null;
  formalPotentialSource?: string | null;
  /** Where E°′ can lie (V): over αc's range (and nₐ when not given), or E½ ± half the file's widening. */
  formalPotentialRangeV?: [number, number] | null;
}

export interface SeriesSurface extends SurfaceRate {
  coverageFromChargeMolPerCm2: number | null;
  /** Γ from the ip–v slope in the form the files' regime allows; null when they mix regimes. */
  coverageFromSlopeMolPerCm2: number | null;
  /** Files behind coverageFromSlopeMolPerCm2. Added later, hence optional. */
  coverageFromSlopeFileCount?: number;
  /** 'nernstian' (n²F²AΓ/4RT, n·ΔEp ≤ 28.5 mV) or 'laviron-irreversible' (αn²F²AΓ/2.718RT, n·ΔEp > 200 mV). */
  coverageFromSlopeForm?: 'nernstian' | 'laviron-irreversible' | null;
  /** Γ from the slope over αc 0.3–0.7 when α was assumed (mol/cm²). */
  coverageFromSlopeRangeMolPerCm2?: [number, number] | null;
  /** Which form and why, or why there is no slope Γ. */
  coverageFromSlopeNote?: string;
  /** |ip| (A) of the forward peak against v (V/s), all files. */
  fit: FitLineResult | null;
  /** αc from the Laviron Ep–log v slopes (files with n·ΔEp > 200 mV), when both peaks move apart and the two slopes agree with one αc and n. */
  lavironAlpha: number | null;
  /** n implied by Laviron's two lines, (2.303RT/F)(1/|s_c| + 1/s_a); null without both lines. Added later, hence optional. */
  lavironApparentElectronCount?: number | null;
}

/** k_s of a film with its status and range, E°′ from Laviron's working curve (seriesSurfaceRate.ts). */
export interface SurfaceRate {
  /** Median k_s over the files with n·ΔEp ≥ 5 mV at the headline αc (1/s); null unless status is 'value' or 'estimate'. */
  ksPerS: number | null;
  /**
   * 'value' (αc given or from Laviron's lines, two files or more); 'estimate' (αc assumed, or one
   * file: read with ksRangePerS); 'lower-bound' (ksLowerBoundPerS); 'cannot-tell' (ksNote says why:
   * Laviron's lines inconsistent, the two Γ disagree, or ΔEp grows ∝ v as an uncompensated Ru's does).
   */
  ksStatus: 'value' | 'estimate' | 'lower-bound' | 'cannot-tell';
  /** k_s of every file at every αc used (1/s). */
  ksRangePerS: [number, number] | null;
  ksLowerBoundPerS: number | null;
  /** How k_s was had: files, αc and its origin, or why it is only a bound or cannot be told. */
  ksNote: string;
  /** Files behind the median. */
  ksFileCount: number;
  ksAlphaSource: 'given' | 'laviron' | 'assumed';
  /** Per file: k_s at the headline αc, and over the αc used. */
  ksPerFile: Array<{ fileIndex: number; ksPerS: number | null; rangePerS: [number, number] | null }>;
  /** Ru (Ω) that would explain the widening as ohmic drop on a Nernstian film (filmOhmicSeparation.ts); null when it does not. */
  ohmicRuOhm: number | null;
  /** E°′ from both peaks on Laviron's working curve (V), median over files; with its range over files and αc. */
  formalPotentialV: number | null;
  formalPotentialRangeV: [number, number] | null;
  formalPotentialSource: string | null;
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
  /** k_f of a follow-up reaction, when the series shows one (followUpSignature.ts); added later, hence optional. */
  followUp?: SeriesFollowUp | null;
  /** The transfer coefficient used: αc, the forward αnₐ, their origin (diffusing couples). */
  transferCoefficient?: SeriesTransferCoefficient | null;
  /** How much of the ΔEp widening the ohmic drop can explain (diffusing couples with a peak pair). */
  ohmic?: OhmicWideningResult | null;
  /** What eHalfV is: ≈ E°′ for a reversible couple, the peak midpoint otherwise. */
  eHalfMeaning?: string;
  /** Forward-peak |ip| (A) against v^½ ((V/s)^½): the contract's slope/intercept/r2. */
  forwardFit: FitLineResult | null;
  anodicFit: FitLineResult | null;
  cathodicFit: FitLineResult | null;
  diffusion: SeriesDiffusion | null;
  logLog: { slope: number; reading: LogLogReading; fit: FitLineResult } | null;
  peakShift: { anodic: PeakPotentialVsLogScanRateResult | null; cathodic: PeakPotentialVsLogScanRateResult | null };
  /** αc (cathodic transfer coefficient) of an irreversible diffusing couple, measured or given; see transferCoefficient. */
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
  | 'NONLINEAR' | 'DUPLICATE_SCAN_RATE' | 'MISSING_CYCLE' | 'ELECTRON_COUNT' | 'OHMIC_DROP' | 'IMPLAUSIBLE_D';

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
