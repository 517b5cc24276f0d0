/**
 * Vocabulary of the peaks of a voltammogram: direction, confidence, user search windows and the
 * measured peak. Potentials in V, currents in A; signed currents (rawCurrentA, baselineCurrentA)
 * are IUPAC (anodic positive) whatever convention the input used; heights are positive magnitudes.
 */
import type { BaselineCurve } from '../baseline/baselineTypes';

/** Kind of faradaic peak: anodic = oxidation (maximum on a positive-going sweep, IUPAC). */
export type PeakDirection = 'anodic' | 'cathodic';

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

export interface PeakResult {
  direction: PeakDirection;
  /**
   * Peak potential Ep (V): vertex of a parabola fitted to the raw points of the peak's top minus
   * their background (charging/leakage line; an extended decay of an earlier wave is not removed,
   * so a return peak's Ep is the extremum the published ΔEp tables refer to), with the peak's skew
   * (a cubic term) taken off first, over a window that reaches up to 20 % of a symmetric peak's
   * height and less on a skewed one (peakVertex.ts).
   */
  potentialV: number;
  /** Baseline-corrected peak current, positive magnitude (A). */
  heightA: number;
  /** Measured current at Ep (A, IUPAC sign): the vertex current of the narrow window's parabola (background added back). */
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

