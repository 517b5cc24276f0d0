/**
 * Scan rate from a recorded time column: the magnitude of dE/dt fitted per sweep segment.
 * The scan rate of a linear sweep is v = |dE/dt| (IUPAC, "Terminology of electrochemical
 * methods of analysis", Pure Appl. Chem. 92 (2020) 641, linear-sweep and cyclic voltammetry).
 * In: potentialV and timeS (same length, time in s), the sweep segments of the trace.
 * Out: v in V/s (positive), the per-segment values and their relative spread.
 * Method: each segment's slope is the least-squares line E = a + b·t over its points (Legendre–
 * Gauss normal equations), so a staircase ramp gives its mean rate; the segments are combined by
 * their median so that one odd segment (an interrupted sweep, a hold at the vertex) does not
 * move the result (robust combination: common practice, no source). Segments shorter than
 * `minPoints` points or whose time does not advance are left out.
 */
import { median } from '../statistics/median';
import { AnalysisError, assertSameLength } from '../errors';
import type { SweepSegment } from '../types';

export interface ScanRateFromTimeOptions {
  /** Fewest points a segment needs to take part. @default 5 */
  minPoints?: number;
}

export interface ScanRateFromTimeResult {
  scanRateVPerS: number;
  /** |slope| of each segment that took part, in V/s, in segment order. */
  perSegmentVPerS: number[];
  /** (max − min) / median of the per-segment rates; 0 for a single segment. */
  relativeSpread: number;
}

export function scanRateFromTime(
  potentialV: ArrayLike<number>,
  timeS: ArrayLike<number>,
  segments: SweepSegment[],
  options: ScanRateFromTimeOptions = {},
): ScanRateFromTimeResult {
  assertSameLength({ potentialV, timeS }, 2);
  const minPoints = options.minPoints ?? 5;
  const rates: number[] = [];
  for (const seg of segments) {
    if (seg.start < 0 || seg.end > potentialV.length || seg.end - seg.start < minPoints) continue;
    const slope = fitSlope(timeS, potentialV, seg.start, seg.end);
    if (slope !== null && slope !== 0) rates.push(Math.abs(slope));
  }
  if (rates.length === 0) {
    throw new AnalysisError('TOO_FEW_POINTS', `no sweep segment has ${minPoints} or more points with advancing time, so the time column gives no scan rate`);
  }
  const middle = median(rates);
  const spread = (Math.max(...rates) - Math.min(...rates)) / middle;
  return { scanRateVPerS: middle, perSegmentVPerS: rates, relativeSpread: spread };
}

/** Least-squares slope of y on x over [start, end); null when x does not vary or is not finite. */
function fitSlope(x: ArrayLike<number>, y: ArrayLike<number>, start: number, end: number): number | null {
  const n = end - start;
  let mx = 0;
  let my = 0;
  for (let i = start; i < end; i++) {
    mx += x[i] as number;
    my += y[i] as number;
  }
  mx /= n;
  my /= n;
  let sxx = 0;
  let sxy = 0;
  for (let i = start; i < end; i++) {
    const dx = (x[i] as number) - mx;
    sxx += dx * dx;
    sxy += dx * ((y[i] as number) - my);
  }
  if (!(sxx > 0) || !Number.isFinite(sxy)) return null;
  return sxy / sxx;
}
