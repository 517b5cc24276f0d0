/**
 * The pre-peak line of a reversible wave whose sweep starts on the wave's own foot.
 *
 * A sweep that starts from a solution at rest only 100-150 mV before E½ (n = 1) has no stretch of
 * background alone: its first points already carry the foot (e^(−ξ)/0.4463 of the peak, Nicholson
 * & Shain, Anal. Chem. 36 (1964) 706, eq. 24: 2 % at 120 mV) and the 1/√t current of the step in
 * surface concentration the start imposes. A line through them leans towards the peak and, 150 mV
 * on, reads ip 20-30 % low. Here the current of that started wave (reversibleWaveShape.ts,
 * startedReversibleWave: eq. 24 solved from the start) is taken out of the window: its height h
 * and the line a + b·E are solved together, h = s·(y_p − L[y](E_p)) / (1 − L[shape](E_p)), where
 * L[·] is the least-squares line through the window and the shape is 1 at the peak (a closed form
 * of the four passes lineUnderOwnFoot.ts makes for a far start).
 * Used for the first sweep of a record (from rest) when the wave's width is the started reversible
 * wave's (± 10 %) and the window's points lie on that wave over the line; null otherwise. sweepStartOnFoot says how close the start is, for the warning.
 */
import type { PeakCandidate } from '../peaks/locatePeaksInSweep';
import type { SweepSignals } from '../peaks/sweepSignals';
import { crossing } from '../peaks/levelCrossing';
import type { BaselineCurve } from './baselineTypes';
import { linearPrePeakBaseline } from './linearPrePeakBaseline';
import { reversiblePeakXi, reversibleWaveShape, startedReversibleWave, type StartedReversibleWave } from './reversibleWaveShape';
import { irreversibleWaveShapeFor } from './irreversibleWaveShape';

/** |Ep − Ep/2| of a reversible wave in RT/nF (Bard & Faulkner 2nd ed. (2001) eq. 6.2.21). */
const REVERSIBLE_HALF_WIDTH = 2.2;
/** Share of the peak a far-started reversible wave's foot may carry at the sweep's start for the start to count as before the wave (findPrePeakWindow.ts' foot level). */
export const START_FOOT_LEVEL = 0.003;
/** How far |Ep − Ep/2| may stray from the started wave's (our margin, as knownWaveShapes.ts). */
const WIDTH_TOLERANCE = 0.1;
/** How far a window point may lie off the started wave on its line: max(5σ, 0.05 % of the height) (our margin; a 2 s hold before a start 120 mV before E½ leaves 0.16 %). */
const RESIDUAL_NOISE = 5;
const RESIDUAL_SHARE = 5e-4;
/** The started wave's shape is used only where its start lies before its peak by at least this (in RT/nF). */
const LEAST_START_XI = 1;

/** How close a sweep's start is to a wave: its distance from the peak and from E½. */
export interface SweepStartOnFoot {
  startFromPeakV: number;
  startFromHalfV: number;
  /** Whether E½ is the couple's midpoint (else Ep ± 1.109 RT/nF, a reversible wave's). */
  halfFromCouple: boolean;
  /** A reversible wave's foot at that start, as a share of its peak (e^(−ξ)/0.4463), the distance scaled by 2.20 RT/nF over the wave's |Ep − Ep/2|. */
  footAtStart: number;
}

/**
 * Null when the start lies far enough before the wave that its foot there is below
 * START_FOOT_LEVEL. A wider (slower) wave's foot reaches further, about in proportion to its
 * |Ep − Ep/2| (`halfPeakWidthV`; e^(−αξ) against e^(−ξ), our scaling), so the distance is counted in
 * units of that width. A wave more than 10 % wider than a reversible one may be totally
 * irreversible, whose foot is 4.4·e^(−αξ) of its peak with α from the width (irreversibleWaveShape.ts,
 * Nicholson & Shain 1964): the larger of the two is taken, so that a slow wave started where its
 * foot still carries a per cent of its peak is named (α = 0.3 started 500 mV before Ep: 1.3 %,
 * which the scaled reversible foot put below 0.3 %).
 */
export function sweepStartOnFoot(sig: SweepSignals, peak: PeakCandidate, nfrt: number, halfPeakWidthV?: number | null, partnerV?: number): SweepStartOnFoot | null {
  const seg = sig.segments[peak.segmentIndex]!;
  const s = seg.direction === 'positive' ? 1 : -1;
  const fromPeak = -s * (sig.potentialV[seg.start]! - peak.potentialV);
  const halfXi = halfPeakWidthV ? Math.abs(halfPeakWidthV) * nfrt : null;
  const widthScale = halfXi ? Math.min(1, REVERSIBLE_HALF_WIDTH / halfXi) : 1;
  const slow = halfXi && halfXi > REVERSIBLE_HALF_WIDTH * (1 + WIDTH_TOLERANCE) ? irreversibleWaveShapeFor(halfXi) : null;
  const footAtStart = Math.max(reversibleWaveShape(fromPeak * nfrt * widthScale + reversiblePeakXi()), slow ? slow.at(fromPeak * nfrt) : 0);
  if (!(footAtStart > START_FOOT_LEVEL)) return null;
  const half = partnerV === undefined ? peak.potentialV - (s * reversiblePeakXi()) / nfrt : (peak.potentialV + partnerV) / 2;
  return { startFromPeakV: fromPeak, startFromHalfV: -s * (sig.potentialV[seg.start]! - half), halfFromCouple: partnerV !== undefined, footAtStart };
}

const STARTED_WORDS = 'for a sweep started';

/** Whether a baseline was drawn under the started wave's own current (lineUnderStartedFoot). */
export function usesStartedWave(curve: BaselineCurve): boolean {
  return curve.description.includes(STARTED_WORDS);
}

export interface StartedFootLine {
  curve: BaselineCurve;
  under: (j: number) => number;
  height: number;
}

export function lineUnderStartedFoot(sig: SweepSignals, peak: PeakCandidate, window: [number, number], nfrt: number): StartedFootLine | null {
  const seg = sig.segments[peak.segmentIndex]!;
  const s = seg.direction === 'positive' ? 1 : -1;
  const xiFromPeak = (j: number) => -s * nfrt * (sig.potentialV[j]! - peak.potentialV);
  const startFromPeak = xiFromPeak(seg.start);
  if (!(startFromPeak >= LEAST_START_XI)) return null;
  // Placed by its own peak, which a near start moves a little: two lookups settle it.
  let wave = startedReversibleWave(startFromPeak + reversiblePeakXi());
  wave = startedReversibleWave(startFromPeak + wave.peakXi);
  const shape = (j: number) => wave.at(xiFromPeak(j) + wave.peakXi);
  const [from, to] = window;
  const ly = lineThrough(sig, from, to, (j) => sig.currentA[j]!);
  const ls = lineThrough(sig, from, to, shape);
  if (!ly || !ls) return null;
  const ep = peak.potentialV;
  const g = ls.intercept + ls.slope * ep;
  if (!(g < 0.9)) return null;
  const height = (s * (sig.locatingA[peak.index]! - (ly.intercept + ly.slope * ep))) / (1 - g);
  if (!(height > 0)) return null;
  const foot = (j: number) => s * height * shape(j);
  const spanStart = Math.min(from, peak.index);
  const fit = linearPrePeakBaseline(
    { potentialV: sig.potentialV, currentA: sig.currentA, fitStart: from, fitEnd: to, spanStart, spanEnd: seg.end },
    { less: { what: `the wave's own current, from the reversible wave's shape ${STARTED_WORDS} ${(startFromPeak / nfrt * 1000).toFixed(0)} mV before its peak from a solution at rest (Nicholson & Shain 1964, eq. 24)`, currentA: foot } },
  );
  const under = (j: number) => fit.interceptA + fit.slopeAPerV * sig.potentialV[j]!;
  const measured = s * (sig.locatingA[peak.index]! - under(peak.index));
  const halfV = crossing(sig, (j) => s * (sig.locatingA[j]! - under(j)), peak.index, spanStart, -1, measured / 2);
  if (halfV === null || !(measured > 0)) return null;
  const width = Math.abs(ep - halfV) * nfrt;
  if (Math.abs(width / halfWidth(wave) - 1) > WIDTH_TOLERANCE) return null;
  // The window must be that wave on a line: a hold at the start potential before the sweep (a
  // quiet time) leaves a foot without the start's step current, and the line then misses it.
  const tolerance = Math.max(RESIDUAL_NOISE * sig.noiseA, RESIDUAL_SHARE * measured);
  for (let j = from; j < to; j++) if (!(Math.abs(sig.currentA[j]! - foot(j) - under(j)) <= tolerance)) return null;
  return { curve: fit.curve, under, height: measured };
}

/** |Ep − Ep/2| of the started wave in RT/nF (bisection on its rising side). */
function halfWidth(wave: StartedReversibleWave): number {
  let lo = wave.peakXi;
  let hi = wave.startXi;
  if (!(wave.at(hi) < 0.5)) return NaN;
  for (let i = 0; i < 50; i++) {
    const mid = (lo + hi) / 2;
    if (wave.at(mid) > 0.5) lo = mid;
    else hi = mid;
  }
  return lo - wave.peakXi;
}

/** Least-squares line value = intercept + slope·E through the window (closed form, E counted from the window's first point). */
export function lineThrough(sig: SweepSignals, from: number, to: number, value: (j: number) => number): { slope: number; intercept: number } | null {
  const e0 = sig.potentialV[from]!;
  let n = 0, sx = 0, sy = 0, sxx = 0, sxy = 0;
  for (let j = from; j < to; j++) {
    const x = sig.potentialV[j]! - e0;
    const y = value(j);
    if (!Number.isFinite(x) || !Number.isFinite(y)) return null;
    n++; sx += x; sy += y; sxx += x * x; sxy += x * y;
  }
  const det = n * sxx - sx * sx;
  if (n < 2 || !(det !== 0)) return null;
  const slope = (n * sxy - sx * sy) / det;
  return { slope, intercept: (sy - slope * sx) / n - slope * e0 };
}
