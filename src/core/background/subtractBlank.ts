/**
 * Background subtraction with a blank voltammogram (the supporting electrolyte alone, recorded
 * with the same electrode at the same scan rate): the blank's current, interpolated to each point
 * of the measurement along the sweep of the same direction and cycle, is subtracted point by point.
 * What remains is the faradaic current of the analyte, without the charging current and the
 * background processes of the electrolyte (common practice of the trade, no source: e.g. the
 * "blank subtraction" every voltammetric method description states).
 * In: the measurement and the blank as Voltammograms (IUPAC current, V, A, their own sweep
 *   segments). Out: the measurement's current minus the blank (A), and what the caller should say:
 *   the points that lay outside the blank's potential range (the blank's end value is used there)
 *   and the ratio of the scan rates (charging current scales with v).
 * Difference from plain point-by-point subtraction: the two records need not share a potential
 *   grid; the blank is linearly interpolated on its own sweep of the same direction.
 */
import { AnalysisError } from '../errors';
import type { SweepSegment, Voltammogram } from '../types';

export interface BlankSubtraction {
  currentA: Float64Array;
  /** Points of the measurement outside the potential range of the blank's matching sweep. */
  pointsOutsideBlank: number;
  /** Measurement scan rate over the blank's (1 when either is unknown). */
  scanRateRatio: number;
}

/** The blank's sweep that matches a measurement sweep: same direction, same cycle, else the first of that direction. */
function matchingSweep(blank: Voltammogram, seg: SweepSegment): SweepSegment | null {
  const same = blank.segments.filter((b) => b.direction === seg.direction);
  return same.find((b) => b.cycle === seg.cycle) ?? same[0] ?? null;
}

/**
 * Blank current at potential e on a monotonic sweep of the blank (linear interpolation, clamped).
 * A vertex the sweep shares with the previous one was recorded before the turn, when the charging
 * current still had the other sign, so it is not used for this sweep (only for the range).
 */
function blankAt(blank: Voltammogram, sweep: SweepSegment, e: number): { currentA: number; outside: boolean } {
  const p = blank.potentialV;
  const i = blank.currentA;
  const rising = sweep.direction === 'positive';
  const shared = blank.segments.some((b) => b.end - 1 === sweep.start);
  let lo = shared ? sweep.start + 1 : sweep.start;
  let hi = sweep.end - 1;
  const first = p[lo]!;
  const last = p[hi]!;
  const edge = p[sweep.start]!;
  if (rising ? e <= first : e >= first) {
    const outside = rising ? e < edge : e > edge;
    // Between the shared vertex and the sweep's first own point: the sweep's own line, extended.
    if (!outside && shared && hi > lo && p[lo + 1] !== first) {
      return { currentA: i[lo]! + ((e - first) * (i[lo + 1]! - i[lo]!)) / (p[lo + 1]! - first), outside };
    }
    return { currentA: i[lo]!, outside };
  }
  if (rising ? e >= last : e <= last) return { currentA: i[hi]!, outside: e !== last };
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (rising ? p[mid]! <= e : p[mid]! >= e) lo = mid;
    else hi = mid;
  }
  const span = p[hi]! - p[lo]!;
  const t = span === 0 ? 0 : (e - p[lo]!) / span;
  return { currentA: i[lo]! + t * (i[hi]! - i[lo]!), outside: false };
}

export function subtractBlank(measurement: Voltammogram, blank: Voltammogram): BlankSubtraction {
  if (!blank.segments.length) throw new AnalysisError('EMPTY_INPUT', 'the blank has no sweeps');
  const out = Float64Array.from(measurement.currentA);
  let outside = 0;
  measurement.segments.forEach((seg, n) => {
    const sweep = matchingSweep(blank, seg);
    if (!sweep) throw new AnalysisError('BAD_OPTION', `the blank has no ${seg.direction}-going sweep to subtract from the measurement's`);
    // A vertex shared with the previous sweep was recorded at the end of that sweep: done there.
    const from = n > 0 && measurement.segments[n - 1]!.end - 1 === seg.start ? seg.start + 1 : seg.start;
    for (let k = from; k < seg.end; k++) {
      const b = blankAt(blank, sweep, measurement.potentialV[k]!);
      out[k] = measurement.currentA[k]! - b.currentA;
      if (b.outside) outside++;
    }
  });
  const vm = measurement.scanRateVPerS;
  const vb = blank.scanRateVPerS;
  return { currentA: out, pointsOutsideBlank: outside, scanRateRatio: vm && vb ? vm / vb : 1 };
}
