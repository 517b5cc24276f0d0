/**
 * Splits a potential trace into monotonic sweeps and groups them into cycles.
 * In: potentialV (any length ≥ 2), optionally a per-point cycle number from the file.
 * Out: segments that share their vertex point, and cycles as point ranges.
 * Method (common practice, no source): a vertex is declared where the potential has moved back
 * from its running extreme by more than a hysteresis of `hysteresisFraction` of the total span,
 * so noise and staircase steps do not create false vertices. A new cycle starts when a sweep in
 * the first sweep's direction passes the starting potential again.
 */
import { AnalysisError } from '../errors';
import type { CycleRange, SweepDirection, SweepSegment } from '../types';

export interface FindSweepSegmentsOptions {
  /** Hysteresis as a fraction of the potential span. @default 0.02 */
  hysteresisFraction?: number;
  /** Per-point cycle numbers from the file; when given, cycles follow it. */
  cycleColumn?: ArrayLike<number> | null;
}

export interface SweepSplit {
  segments: SweepSegment[];
  cycles: CycleRange[];
}

export function findSweepSegments(potentialV: ArrayLike<number>, options: FindSweepSegmentsOptions = {}): SweepSplit {
  const n = potentialV.length;
  if (n < 2) throw new AnalysisError('TOO_FEW_POINTS', `a voltammogram needs at least 2 points, got ${n}`);
  const vertices = findVertices(potentialV, options.hysteresisFraction ?? 0.02);
  const bounds = [0, ...vertices, n - 1];
  const raw: Omit<SweepSegment, 'cycle'>[] = [];
  for (let k = 0; k + 1 < bounds.length; k++) {
    const a = bounds[k] as number;
    const b = bounds[k + 1] as number;
    if (b <= a) continue;
    const direction: SweepDirection = (potentialV[b] as number) >= (potentialV[a] as number) ? 'positive' : 'negative';
    raw.push({ start: a, end: b + 1, direction });
  }
  const cycleStarts = options.cycleColumn
    ? snapToVertices(cycleStartsFromColumn(options.cycleColumn), vertices)
    : cycleStartsFromTrace(potentialV, raw);
  return assignCycles(raw, cycleStarts, n);
}

function findVertices(e: ArrayLike<number>, fraction: number): number[] {
  const n = e.length;
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < n; i++) {
    const v = e[i] as number;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  const span = hi - lo;
  if (!(span > 0)) throw new AnalysisError('OUT_OF_RANGE', 'the potential never changes, so this is not a voltammogram');
  const h = fraction * span;
  const vertices: number[] = [];
  let dir = 0;
  let extremeIndex = 0;
  for (let i = 1; i < n; i++) {
    const v = e[i] as number;
    const ext = e[extremeIndex] as number;
    if (dir === 0) {
      if (Math.abs(v - (e[0] as number)) > h) {
        dir = v > (e[0] as number) ? 1 : -1;
        extremeIndex = i;
      }
      continue;
    }
    if ((v - ext) * dir > 0) extremeIndex = i;
    else if ((ext - v) * dir > h) {
      vertices.push(extremeIndex);
      dir = -dir;
      extremeIndex = i;
    }
  }
  // The trace may end exactly on a vertex; that point is the end of the last segment anyway.
  return vertices.filter((v) => v > 0 && v < n - 1);
}

function cycleStartsFromColumn(column: ArrayLike<number>): number[] {
  const starts = [0];
  for (let i = 1; i < column.length; i++) {
    if (column[i] !== column[i - 1]) starts.push(i);
  }
  return starts;
}

/**
 * Instruments disagree on whether the vertex point closes one cycle or opens the next, so a
 * cycle-column boundary within a few points of a vertex is moved onto it; otherwise a sliver
 * sweep of one or two points would appear at the joint.
 */
function snapToVertices(starts: number[], vertices: number[], reach = 3): number[] {
  // Both lists ascend, so one pointer walks the vertices once (a cycle column that changes on
  // every row of a zigzag trace would otherwise cost starts × vertices).
  let p = 0;
  const snapped = starts.map((s) => {
    if (s === 0) return 0;
    while (p < vertices.length && (vertices[p] as number) < s) p++;
    const below = p > 0 ? s - (vertices[p - 1] as number) : Infinity;
    const above = p < vertices.length ? (vertices[p] as number) - s : Infinity;
    // The nearest vertex within reach; on a tie, the earlier one.
    if (Math.min(below, above) > reach) return s;
    return below <= above ? s - below : s + above;
  });
  return snapped.filter((s, k) => k === 0 || s > (snapped[k - 1] as number));
}

function cycleStartsFromTrace(e: ArrayLike<number>, segs: Omit<SweepSegment, 'cycle'>[]): number[] {
  const starts = [0];
  const first = segs[0];
  if (!first) return starts;
  const e0 = e[0] as number;
  const sign = first.direction === 'positive' ? 1 : -1;
  let sawReverse = false;
  for (let k = 1; k < segs.length; k++) {
    const seg = segs[k] as Omit<SweepSegment, 'cycle'>;
    if (seg.direction !== first.direction) {
      sawReverse = true;
      continue;
    }
    if (!sawReverse) continue;
    // First point of this sweep at or past the starting potential.
    for (let i = seg.start; i < seg.end; i++) {
      if (((e[i] as number) - e0) * sign >= 0) {
        if (i < seg.end - 1) starts.push(i);
        sawReverse = false;
        break;
      }
    }
  }
  return starts;
}

function assignCycles(raw: Omit<SweepSegment, 'cycle'>[], starts: number[], n: number): SweepSplit {
  const cycles: CycleRange[] = starts.map((s, k) => ({ index: k + 1, start: s, end: starts[k + 1] ?? n }));
  const segments: SweepSegment[] = [];
  // Segments and cycles both ascend: the first cycle a segment can touch only moves forward.
  let first = 0;
  for (const seg of raw) {
    while (first < cycles.length && (cycles[first] as CycleRange).end <= seg.start) first++;
    // A segment that a cycle boundary cuts is split so that each piece lies in one cycle.
    let a = seg.start;
    for (let ci = first; ci < cycles.length; ci++) {
      const c = cycles[ci] as CycleRange;
      if (c.start >= seg.end) break;
      if (c.end <= a) continue;
      const b = Math.min(seg.end, c.end + (c.end < seg.end ? 1 : 0));
      if (b - a >= 2) segments.push({ start: a, end: b, direction: seg.direction, cycle: c.index });
      a = Math.max(a, c.end);
    }
  }
  return { segments, cycles };
}
