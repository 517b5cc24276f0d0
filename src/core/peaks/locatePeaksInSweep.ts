/**
 * Locates the faradaic peaks of one sweep: anodic maxima on a positive-going sweep and cathodic
 * minima on a negative-going one (IUPAC). The current is oriented so that wanted peaks point up.
 * Steps: prominent maxima of the locating-smoothed current (findProminentMaxima.ts), shoulders
 *   from its derivative (findShoulders.ts), a minimum prominence of max(minSignalToNoise·σ,
 *   minProminenceA, minRelativeProminence·current range), then Ep by a parabola on the raw points
 *   of the peak's top, its skew taken off first (peakVertex.ts: the window reaches max(1 % of the
 *   prominence, 3σ) and, on a peak symmetric enough for it to cost no bias, up to 20 % of the
 *   prominence; a noisy Nernstian film's Ep scatters half as much or less than with the 3σ window
 *   alone). With user windows only the windows are searched: the highest point inside each,
 *   flagged 'low' confidence when it sits on the window edge.
 * Thresholds (common practice, no source): 'high' confidence from 3× the minimum prominence.
 */
import type { PeakConfidence, PeakDirection, PeakWindow } from './peakTypes';
import { savitzkyGolayDerivative } from '../smoothing/savitzkyGolaySmooth';
import { findProminentMaxima, type ProminentMaximum } from './findProminentMaxima';
import { findShoulders, type Shoulder } from './findShoulders';
import { peakVertex } from './peakVertex';
import { ownStart, type SweepSignals } from './sweepSignals';

export interface PeakCandidate {
  direction: PeakDirection;
  segmentIndex: number;
  /** Point index of the located extremum (voltammogram index). */
  index: number;
  potentialV: number;
  currentA: number;
  prominenceA: number;
  confidence: PeakConfidence;
  origin: 'auto' | 'window';
}

export interface LocatePeaksOptions {
  /** Windows for this sweep's direction, or null for the automatic search. */
  windows: PeakWindow[] | null;
  minProminenceA: number;
  /** Locating smoothing window of this sweep (points). */
  locatingWindow: number;
}

export function locatePeaksInSweep(sig: SweepSignals, segmentIndex: number, options: LocatePeaksOptions): PeakCandidate[] {
  const seg = sig.segments[segmentIndex]!;
  const start = ownStart(sig.segments, segmentIndex);
  const s = seg.direction === 'positive' ? 1 : -1;
  const direction: PeakDirection = s > 0 ? 'anodic' : 'cathodic';
  const y = signedStretch(sig.locatingA, start, seg.end, s);
  const found = options.windows
    ? options.windows.flatMap((w) => searchWindow(sig, start, y, w))
    : searchAutomatically(y, options);
  return found.map((f) => {
    const refined = f.shoulder ? null : refine(sig, start, y, f.local, f.prominence, s);
    const index = start + f.local;
    return {
      direction,
      segmentIndex,
      index,
      potentialV: refined?.potentialV ?? sig.potentialV[index]!,
      currentA: refined?.currentA ?? sig.locatingA[index]!,
      prominenceA: f.prominence,
      confidence: f.confidence,
      origin: options.windows ? 'window' : 'auto',
    };
  });
}

/** a[start, end) times the sweep's sign (±1), so that its peaks are maxima. */
function signedStretch(a: Float64Array, start: number, end: number, sign: number): Float64Array {
  const y = new Float64Array(end - start);
  for (let i = 0; i < y.length; i++) y[i] = sign * a[start + i]!;
  return y;
}

interface Found { local: number; prominence: number; confidence: PeakConfidence; shoulder: boolean }

function searchAutomatically(y: Float64Array, options: LocatePeaksOptions): Found[] {
  const min = options.minProminenceA;
  const maxima = findProminentMaxima(y, { minProminence: min });
  const out: Found[] = maxima.map((m) => ({ local: m.index, prominence: m.prominence, confidence: m.prominence >= 3 * min ? 'high' : 'medium', shoulder: false }));
  if (y.length < options.locatingWindow + 2) return out;
  const d = savitzkyGolayDerivative(y, { window: options.locatingWindow, order: 2 });
  for (const sh of findShoulders(d)) {
    if (maxima.some((m) => Math.abs(m.index - sh.index) <= options.locatingWindow)) continue;
    if (!onFlankOfMaximum(y, sh.index, sh.flank, maxima)) continue;
    const prominence = shoulderHeight(y, sh);
    if (prominence >= min) out.push({ local: sh.index, prominence, confidence: 'shoulder', shoulder: true });
  }
  return out.sort((a, b) => a.local - b.local);
}

/**
 * A shoulder must sit on the flank of a located maximum (the next one for a rising flank, the
 * previous one for a falling flank) within three of that maximum's half-widths at half
 * prominence; a flat stretch far from any peak (e.g. where a current has decayed to zero
 * between two waves) is not a shoulder. Limit: our choice, common practice, no source.
 */
function onFlankOfMaximum(y: Float64Array, k: number, flank: 'rising' | 'falling', maxima: ProminentMaximum[]): boolean {
  const m = flank === 'rising' ? maxima.find((p) => p.index > k) : maxima.filter((p) => p.index < k).at(-1);
  if (!m) return false;
  const half = y[m.index]! - m.prominence / 2;
  const dir = flank === 'rising' ? -1 : 1;
  let j = m.index;
  while (j + dir >= 0 && j + dir < y.length && y[j + dir]! >= half) j += dir;
  const halfWidth = Math.max(1, Math.abs(j - m.index));
  return Math.abs(k - m.index) <= 3 * halfWidth;
}

/**
 * Size of a shoulder: how far the flattened stretch departs from the chord between the two steep
 * points that bracket it. A flank without a second wave follows its chord closely; noise wiggles
 * depart from it by about the noise. Our measure (common practice, no source).
 */
function shoulderHeight(y: Float64Array, sh: Shoulder): number {
  const a = sh.leftBracket;
  const b = sh.rightBracket;
  const chord = y[a]! + ((y[b]! - y[a]!) * (sh.index - a)) / (b - a);
  return Math.abs(y[sh.index]! - chord);
}

function searchWindow(sig: SweepSignals, start: number, y: Float64Array, w: PeakWindow): Found[] {
  const lo = Math.min(w.fromV, w.toV);
  const hi = Math.max(w.fromV, w.toV);
  const inside: number[] = [];
  for (let k = 0; k < y.length; k++) {
    const e = sig.potentialV[start + k]!;
    if (e >= lo && e <= hi) inside.push(k);
  }
  if (inside.length < 3) return [];
  let best = inside[0]!;
  for (const k of inside) if (y[k]! > y[best]!) best = k;
  const first = inside[0]!;
  const last = inside[inside.length - 1]!;
  const onEdge = best === first || best === last;
  const prominence = y[best]! - Math.max(y[first]!, y[last]!);
  return [{ local: best, prominence: Math.max(prominence, 0), confidence: onEdge ? 'low' : 'high', shoulder: onEdge }];
}

/** Ep by peakVertex.ts on the raw points, its window chosen on the locating-smoothed current. */
function refine(sig: SweepSignals, start: number, y: Float64Array, k: number, prominence: number, s: 1 | -1) {
  const top = { potentialV: sig.potentialV, level: (j: number) => y[j - start]!, raw: (j: number) => s * sig.currentA[j]!, lo: start, hi: start + y.length };
  const v = peakVertex(top, start + k, prominence, sig.noiseA);
  return v && { potentialV: v.potentialV, currentA: s * v.currentA };
}
