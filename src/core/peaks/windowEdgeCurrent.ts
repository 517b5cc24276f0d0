/**
 * A current still rising steeply where a sweep ends (at the switching potential, or where the
 * record stops): solvent breakdown or a catalytic current at the edge of the window, not a peak.
 * In: the sweep signals, the sweep's index, the smallest prominence a peak needs (A). Out: the
 *   stretch to shade (potential range, direction, current at the edge) or null.
 * Test (ours; common practice, no source): over the last 30/n mV before the sweep's end (or before
 *   a maximum within a few points of it), the current in the sweep's direction (the locating
 *   smoothing) rises by more than twice the peak threshold, and faster in the second half than in
 *   the first: an accelerating, exponential-like rise, as a Tafel current, I ∝ exp(αnF(E − E_bd)/RT)
 *   (Bard & Faulkner 2nd ed. (2001) §3.4), has, and a diffusion peak, which slows down towards its
 *   top, has not. The stretch to shade starts where dI/dE falls below a tenth of its value at the
 *   edge. A maximum within max(3, half the locating window) points of the end is not a peak.
 */
import { ownStart, type SweepSignals } from './sweepSignals';
import type { PeakDirection } from './peakTypes';

export interface WindowEdgeCurrent {
  /** Direction of the current at the edge (anodic on a positive-going sweep). */
  direction: PeakDirection;
  segmentIndex: number;
  /** Where the steep rise starts and where the sweep ends (V); shade between them. */
  fromV: number;
  /** Point index where the steep rise starts. */
  fromIndex: number;
  toV: number;
  /** Current at the sweep's end (A, IUPAC). */
  currentA: number;
  /** True when the sweep ends at a switching potential (another sweep follows). */
  atSwitch: boolean;
}

export interface WindowEdgeOptions {
  /** Points from the end within which an extremum is part of the edge. @default 3 */
  edgePoints?: number;
  /** Span of the test before the edge (V, at n = 1). @default 0.03 */
  spanV?: number;
  /** @default 1 */
  electronCount?: number;
}

/** Index `span` of potential back from `from` on the sweep (not before `start`). */
function back(sig: SweepSignals, from: number, start: number, spanV: number): number {
  let j = from;
  while (j > start && Math.abs(sig.potentialV[from]! - sig.potentialV[j]!) < spanV) j--;
  return j;
}

export function windowEdgeCurrent(sig: SweepSignals, segmentIndex: number, thresholdA: number, options: WindowEdgeOptions = {}): WindowEdgeCurrent | null {
  const seg = sig.segments[segmentIndex]!;
  const start = ownStart(sig.segments, segmentIndex);
  const end = seg.end - 1;
  const s = seg.direction === 'positive' ? 1 : -1;
  const y = (k: number) => s * sig.locatingA[k]!;
  const edgePoints = Math.max(3, options.edgePoints ?? 3);
  // A maximum just before the end (a catalyst or film giving way) is where the rise is judged.
  let top = end;
  for (let k = end - 1; k >= Math.max(start, end - edgePoints); k--) if (y(k) > y(top)) top = k;
  const spanV = (options.spanV ?? 0.03) / (options.electronCount ?? 1);
  const j = back(sig, top, start, spanV);
  const mid = back(sig, top, start, spanV / 2);
  if (j === start || mid <= j || mid >= top) return null;
  const rise = y(top) - y(j);
  const late = y(top) - y(mid);
  const early = y(mid) - y(j);
  if (!(rise > 2 * thresholdA) || !(late > 1.2 * Math.max(early, 0))) return null;
  let steepest = 0;
  for (let k = j; k <= top; k++) steepest = Math.max(steepest, sig.shownSlopeAPerV[k]!);
  let onset = top;
  while (onset > start && sig.shownSlopeAPerV[onset - 1]! > 0.01 * steepest) onset--;
  return {
    direction: s > 0 ? 'anodic' : 'cathodic', segmentIndex, fromV: sig.potentialV[onset]!, fromIndex: onset, toV: sig.potentialV[end]!, currentA: sig.currentA[end]!,
    atSwitch: segmentIndex + 1 < sig.segments.length,
  };
}

/** True when the located extremum at `index` lies within the edge's last points: part of the edge, not a peak. */
export function isAtWindowEdge(sig: SweepSignals, edge: WindowEdgeCurrent, index: number, edgePoints = 3): boolean {
  const seg = sig.segments[edge.segmentIndex]!;
  return index >= seg.end - 1 - Math.max(3, edgePoints) && index < seg.end;
}
