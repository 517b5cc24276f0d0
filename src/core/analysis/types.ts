/**
 * Result and option types of the per-voltammogram analysis (analyzeVoltammogram): its options,
 * the per-cycle results and warnings. The peak, baseline and couple vocabulary lives with its owner
 * (peaks/, baseline/, couples/). Field names are stable; new fields may be added.
 *
 * Conventions: potentials in V, currents in A, charges in C, time in s. Signed currents
 * (`rawCurrentA`, baseline curves) are always in the IUPAC convention (anodic positive), whatever
 * convention the input used. Peak heights (`heightA`, `ipaA`, `ipcA`) are positive magnitudes.
 */

import type { BaselineMethod, BaselineSpec } from '../baseline/baselineTypes';
import type { CoupleResult } from '../couples/coupleTypes';
import type { PeakResult, PeakWindow } from '../peaks/peakTypes';
import type { WindowEdgeCurrent } from '../peaks/windowEdgeCurrent';
import type { SmoothingSetting } from '../smoothing/smoothingTypes';
import type { CurrentConvention } from '../types';
import type { CellValues, MethodOptions, TraceChoices } from './runTypes';

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
  | 'LOW_SIGNAL'
  | 'SPIKES'
  | 'WINDOW_EDGE'
  | 'NOT_AT_REST'
  | 'START_ON_FOOT'
  | 'MIDPOINT_OFFSET'
  | 'NARROW_DELTA_EP'
  | 'BACKGROUND_TILT';

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
  /** Sweeps that end in a current still rising steeply (breakdown or catalytic current at the window edge): shade fromV–toV. Added later, hence optional. */
  windowEdges?: WindowEdgeCurrent[];
}

/** Options of a standalone trace analysis: the run's method options, n and T, and the trace's own choices. */
export type AnalyzeVoltammogramOptions = Omit<MethodOptions, 'seriesCycle' | 'matchToleranceV' | 'psiMethod'>
  & Pick<CellValues, 'temperatureK' | 'electronCount'>
  & TraceChoices & {
    /** Sign convention of `currentA` in the input. @default 'iupac' */
    currentConvention?: CurrentConvention;
    /** Scan rate (V/s) when the voltammogram carries none and has no time column. */
    scanRateVPerS?: number;
    /** 1-based cycles to analyse. @default all */
    cycles?: number[];
  };

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
  minRelativeProminence: number;
  maxDeltaEpV: number;
  scanRateVPerS: number | null;
  cycles: number[];
  /** Isolated bad points found and left out ('hampel') or kept ('off'). Added later, hence optional. */
  spikeFilter?: 'hampel' | 'off';
}

/** An isolated bad point left out of the analysis (hampelSpikes.ts): draw it, list it. */
export interface SpikePoint {
  index: number;
  potentialV: number;
  /** The recorded current (A, IUPAC). */
  currentA: number;
  /** The running median that replaced it (A, IUPAC). */
  replacedByA: number;
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
  /** Isolated bad points left out of peak finding and baselines. Added later, hence optional. */
  spikes?: SpikePoint[];
}
