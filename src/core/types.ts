/**
 * Shared data model of the numeric core. Quantities carry their unit in the name; columns are
 * typed arrays. Currents follow the IUPAC convention inside the core: anodic (oxidation) current
 * positive, cathodic negative. Potentials are in volts on the file's own reference scale unless a
 * conversion says otherwise.
 */

/** Sign convention of a current column: IUPAC (anodic positive) or polarographic (cathodic positive). */
export type CurrentConvention = 'iupac' | 'polarographic';

/** Where a scan rate came from, in order of precedence. */
export type ScanRateSource = 'option' | 'time' | 'metadata' | 'filename';

/** Direction in which the potential moves during a sweep. */
export type SweepDirection = 'positive' | 'negative';

/**
 * One monotonic sweep of the potential. `start` is inclusive, `end` exclusive. Consecutive
 * segments share their vertex: `segments[k].end - 1 === segments[k + 1].start`.
 */
export interface SweepSegment {
  start: number;
  end: number;
  direction: SweepDirection;
  /** 1-based cycle the segment belongs to. */
  cycle: number;
}

/** A cycle as a contiguous point range, `start` inclusive, `end` exclusive. */
export interface CycleRange {
  /** 1-based. */
  index: number;
  start: number;
  end: number;
}

/** A cyclic voltammogram as the core sees it. */
export interface Voltammogram {
  potentialV: Float64Array;
  currentA: Float64Array;
  timeS: Float64Array | null;
  segments: SweepSegment[];
  cycles: CycleRange[];
  scanRateVPerS: number | null;
  scanRateSource: ScanRateSource | null;
  /**
   * What `currentA` holds: a current (A), or a current density (A/cm²) when the file gave only a
   * density and no electrode area; results are then per cm² of electrode. @default 'current'
   */
  currentKind?: CurrentKind;
}

/** A current in A, or a current density in A/cm². */
export type CurrentKind = 'current' | 'density';
