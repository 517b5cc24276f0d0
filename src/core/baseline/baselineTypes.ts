/**
 * Vocabulary of the baselines drawn under peaks: the method, the anchors, the exact curve that was
 * subtracted, and the user's per-peak choice. Potentials in V, currents in A (IUPAC sign).
 */
import type { PeakDirection } from '../peaks/peakTypes';

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

