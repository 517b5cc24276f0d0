/**
 * Result and option types of the per-voltammogram analysis (peaks, baselines, couples, verdicts).
 * Shared by the worker, the CLI, the series analysis and the UI. Field names are stable; new
 * fields may be added.
 *
 * Conventions: potentials in V, currents in A, charges in C, time in s. Signed currents
 * (`rawCurrentA`, baseline curves) are always in the IUPAC convention (anodic positive), whatever
 * convention the input used. Peak heights (`heightA`, `ipaA`, `ipcA`) are positive magnitudes.
 */

/** Kind of faradaic peak: anodic = oxidation (maximum on a positive-going sweep, IUPAC). */
export type PeakDirection = 'anodic' | 'cathodic';

/** Sign convention of the current column handed to the analysis. */
export type CurrentConvention = 'iupac' | 'polarographic';

/** How a baseline under a peak was drawn. */
export type BaselineMethod = 'linear' | 'polynomial' | 'two-point' | 'nicholson';

/** A point that defines or bounds a baseline. */
export interface BaselineAnchor {
  potentialV: number;
  currentA: number;
  /** Point index in the voltammogram, when the anchor is a data point. */
  index?: number;
}

/**
 * A baseline as drawn under a peak: exactly the current that was subtracted, over the points it
 * spans (`startIndex` inclusive to `endIndex` exclusive, indices into the voltammogram).
 */
export interface BaselineCurve {
  method: BaselineMethod;
  potentialV: Float64Array;
  /** Baseline current, IUPAC sign. */
  currentA: Float64Array;
  startIndex: number;
  endIndex: number;
  /** Points that defined the baseline (fit-window ends, manual anchors, extrapolation start). */
  anchors: BaselineAnchor[];
  /** Plain description of how it was made, including fit windows and parameters. */
  description: string;
}

/** How sure the peak finder is that a peak is real and well placed. */
export type PeakConfidence = 'high' | 'medium' | 'shoulder' | 'low';

/** User-given search window for a peak. Potentials in V, either order. */
export interface PeakWindow {
  direction: PeakDirection;
  fromV: number;
  toV: number;
  /** 1-based cycle; all cycles when absent. */
  cycle?: number;
}

/**
 * User choice of baseline for the peak whose Ep lies in [fromV, toV] (either order).
 * `anchorsV`: for 'two-point', the two anchor potentials (current is read from the smoothed
 * data on the peak's sweep unless `anchorCurrentsA` is given). For 'linear' and 'polynomial',
 * the two potentials bound the fit window.
 */
export interface BaselineSpec {
  direction: PeakDirection;
  fromV: number;
  toV: number;
  method: BaselineMethod;
  anchorsV?: [number, number];
  /** Explicit anchor currents (A, IUPAC sign) for 'two-point'. */
  anchorCurrentsA?: [number, number];
  /** Polynomial degree for 'polynomial'. @default 2 */
  degree?: number;
  /** 1-based cycle; all cycles when absent. */
  cycle?: number;
}

export interface PeakResult {
  direction: PeakDirection;
  /**
   * Peak potential Ep (V): vertex of a local parabola fitted to the raw points minus their
   * background (charging/leakage line; an extended decay of an earlier wave is not removed, so a
   * return peak's Ep is the extremum the published ΔEp tables refer to).
   */
  potentialV: number;
  /** Baseline-corrected peak current, positive magnitude (A). */
  heightA: number;
  /** Measured current at Ep (A, IUPAC sign), from the same parabola (background added back). */
  rawCurrentA: number;
  /** Baseline current at Ep (A, IUPAC sign). */
  baselineCurrentA: number;
  /** Index of the data point nearest to Ep. */
  index: number;
  /** Index into `voltammogram.segments`. */
  segmentIndex: number;
  /** True when the peak lies on the first sweep of its cycle. */
  onFirstSweep: boolean;
  /** Half-peak potential Ep/2 (V): where the corrected current is heightA/2 before the peak. */
  halfPeakPotentialV: number | null;
  /** |Ep − Ep/2| (V). */
  halfPeakWidthV: number | null;
  /** Full width at half height of the corrected peak (V), null when a side never falls to half. */
  fwhmV: number | null;
  baseline: BaselineCurve;
  /** Charge under the corrected peak, positive magnitude (C); null when time is unknown. */
  chargeC: number | null;
  /**
   * Corrected current 6·RT/nF past Ep (in the sweep direction) over heightA: ≈ 0 for a closed,
   * surface-confined wave, ≈ 0.5 for a diffusing one. Null when the sweep ends before that point.
   * Optional because it was added after the first release of these types; always set by
   * analyzeVoltammogram.
   */
  tailFraction?: number | null;
  confidence: PeakConfidence;
  /** Height above the local surroundings used for detection (A). */
  prominenceA: number;
  /** prominenceA divided by the estimated noise standard deviation. */
  signalToNoise: number;
  /** 'window' when found inside a user peak window. */
  origin: 'auto' | 'window';
}

/** Category ids of a couple's verdict (stable strings of the JSON contract). */
export type VerdictCategory = 'nernstian' | 'sluggish' | 'one-way' | 'follow-up-loss' | 'adsorbed' | 'inconclusive';

/** The numbers a verdict was based on (V unless named otherwise). */
export interface VerdictEvidence {
  temperatureK: number;
  electronCount: number;
  deltaEpV: number | null;
  /** 2.218·RT/nF, the large-switching-offset reversible limit. */
  reversibleDeltaEpLimitV: number;
  /** Reversible ΔEp expected for the actual switching offset (Nicholson 1965 table). */
  reversibleDeltaEpAtSwitchV: number | null;
  /** 2.20·RT/nF, reversible |Ep − Ep/2|. */
  reversibleHalfPeakWidthV: number;
  halfPeakWidthsV: { anodic: number | null; cathodic: number | null };
  ratio: number | null;
  /** FWHM of the peaks and the ideal adsorbed value 3.5255·RT/nF. */
  fwhmV: { anodic: number | null; cathodic: number | null };
  adsorbedFwhmV: number;
}

export interface Verdict {
  category: VerdictCategory;
  /** Plain-words label, e.g. "reversible (diffusion, fast electron transfer)". */
  label: string;
  /** Each reason states a measured number against its expectation. */
  reasons: string[];
  evidence: VerdictEvidence;
}

/** Scan-rate evidence from a series, for `refineVerdictWithSeries`. All optional. */
export interface SeriesEvidence {
  /** Slope of log10|ip| vs log10 v (0.5 diffusion, 1 surface). */
  logLogSlope?: number;
  /** dEp/d log10 v of the anodic / cathodic peak (V per decade). */
  epaShiftVPerDecade?: number;
  epcShiftVPerDecade?: number;
  /** R² of ip vs v^½ and of ip vs v. */
  sqrtScanRateR2?: number;
  scanRateR2?: number;
  /** Number of voltammograms in the series. */
  count?: number;
}

export interface CoupleResult {
  /** 0-based position within the cycle, in order of E½ (or of the lone peak's Ep). */
  index: number;
  epaV: number | null;
  epcV: number | null;
  /** (Epa + Epc)/2. */
  eHalfV: number | null;
  /** Epa − Epc. */
  deltaEpV: number | null;
  /** Baseline-corrected peak currents, positive magnitudes (A). */
  ipaA: number | null;
  ipcA: number | null;
  /** Return / forward peak current (ipc/ipa when the first sweep is positive-going). */
  ratio: number | null;
  /** Nicholson (1966) empirical return/forward ratio from the current at the switch. */
  nicholsonRatio: number | null;
  /**
   * Potential of the switch between the couple's forward and return sweeps (V), when its peaks lie
   * on consecutive sweeps. Added later, hence optional; always set by analyzeVoltammogram.
   */
  switchPotentialV?: number | null;
  /** Direction of the forward (first-sweep) peak. */
  forwardDirection: PeakDirection;
  /** Indices into the cycle's `peaks`. */
  anodicPeak: number | null;
  cathodicPeak: number | null;
  /** |Ep − Ep/2| of each peak (V). */
  anodicHalfPeakWidthV: number | null;
  cathodicHalfPeakWidthV: number | null;
  /** Charges under each corrected peak, positive magnitudes (C). */
  anodicChargeC: number | null;
  cathodicChargeC: number | null;
  verdict: Verdict;
}

export type AnalysisWarningCode =
  | 'NO_PEAKS'
  | 'NO_TIME_AXIS'
  | 'NON_FINITE_POINTS'
  | 'SHORT_SEGMENT'
  | 'FLAT_TRACE'
  | 'BASELINE_FALLBACK'
  | 'WINDOW_EMPTY'
  | 'SWITCH_OUTSIDE_TABLE'
  | 'UNPAIRED_PEAK'
  | 'LOW_SIGNAL';

export interface AnalysisWarning {
  code: AnalysisWarningCode;
  message: string;
  /** 1-based cycle, when the warning belongs to one. */
  cycle?: number;
}

export interface CycleAnalysis {
  /** 1-based cycle index, as in `voltammogram.cycles`. */
  index: number;
  peaks: PeakResult[];
  couples: CoupleResult[];
  warnings: AnalysisWarning[];
}

/** Smoothing setting; `window` is an odd point count, `order` < window. */
export interface SmoothingSetting {
  window: number;
  order: number;
}

export interface AnalyzeVoltammogramOptions {
  /** Temperature (K). @default 298.15 */
  temperatureK?: number;
  /** Electrons per molecule, n. @default 1 */
  electronCount?: number;
  /**
   * Savitzky–Golay smoothing of the shown curve, or 'off'. Ep/2, FWHM and the two-point anchor
   * currents are read from this curve; Ep and ip come from the raw points. @default { window: 5, order: 2 }
   */
  smoothing?: SmoothingSetting | 'off';
  /** Sign convention of `currentA` in the input. @default 'iupac' */
  currentConvention?: CurrentConvention;
  /** Restrict peak search to these windows (per direction); automatic search when absent. */
  peakWindows?: PeakWindow[];
  /** Per-peak baseline choices; defaults apply to peaks not covered. */
  baselines?: BaselineSpec[];
  /** Baseline for forward (first-sweep) peaks. @default 'linear' */
  forwardBaseline?: Exclude<BaselineMethod, 'nicholson' | 'two-point'>;
  /** Baseline for return peaks. @default 'nicholson' */
  returnBaseline?: Exclude<BaselineMethod, 'two-point'>;
  /** Minimum prominence over noise standard deviation for a peak. @default 8 */
  minSignalToNoise?: number;
  /** Minimum absolute prominence (A). @default 0 */
  minProminenceA?: number;
  /** Minimum prominence as a fraction of the voltammogram's current range. @default 0.01 */
  minRelativeProminence?: number;
  /**
   * Largest Epa − Epc allowed within a couple (V); when each direction has a single dominant peak
   * (a totally irreversible couple) that pair may lie up to twice this apart. @default 0.6
   */
  maxDeltaEpV?: number;
  /** Scan rate (V/s) when the voltammogram carries none and has no time column. */
  scanRateVPerS?: number;
  /** 1-based cycles to analyse. @default all */
  cycles?: number[];
}

/** The option values actually used, for provenance. */
export interface ResolvedAnalyzeOptions {
  temperatureK: number;
  electronCount: number;
  smoothing: SmoothingSetting | 'off';
  /** Smoothing used internally to locate peaks (never shown as data). */
  locatingSmoothing: SmoothingSetting;
  currentConvention: CurrentConvention;
  peakWindows: PeakWindow[];
  baselines: BaselineSpec[];
  forwardBaseline: Exclude<BaselineMethod, 'nicholson' | 'two-point'>;
  returnBaseline: Exclude<BaselineMethod, 'two-point'>;
  minSignalToNoise: number;
  minProminenceA: number;
  /** Added after the first release of these types, hence optional; always set by analyzeVoltammogram. */
  minRelativeProminence?: number;
  maxDeltaEpV: number;
  scanRateVPerS: number | null;
  cycles: number[];
}

export interface VoltammogramAnalysis {
  cycles: CycleAnalysis[];
  /** Smoothed current (A, IUPAC) and its derivative dI/dE (A/V) per point; raw data untouched. */
  smoothed: { currentA: Float64Array; derivativeAPerV: Float64Array } | null;
  /** Robust estimate of the current noise standard deviation (A). */
  noiseA: number;
  /** Prominence a feature needed to count as a peak (A). Always set by analyzeVoltammogram. */
  peakThresholdA?: number;
  options: ResolvedAnalyzeOptions;
  warnings: AnalysisWarning[];
}
