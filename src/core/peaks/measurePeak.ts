/**
 * Measures a located peak against its baseline: height at Ep, half-peak potential Ep/2, full width
 * at half height, and the charge under the corrected peak.
 * Definitions: ip = |I(Ep) − I_baseline(Ep)|; Ep/2 is where the corrected current is ip/2 on the
 *   side the sweep comes from (Nicholson & Shain, Anal. Chem. 36 (1964) 706; Bard & Faulkner 2nd
 *   ed. §6.2, from memory); charge Q = ∫|I − I_baseline| dt (Faraday's law).
 * Charge limits (our choice): from the last point before the peak where the corrected current is
 *   ≤ 0 (or the baseline's start) to the first point after it where the corrected current falls
 *   below 0.1 % of ip (or the end of the sweep / baseline; at 1 % a Nernstian film's θ(1 − θ) tail
 *   left 0.25 % of its charge out). For a diffusion wave the latter is usually the switch, so Q is
 *   "charge passed under the wave up to the switch".
 * Tail (our measure of a closed peak): the corrected current `tailOffsetV` past Ep, in the sweep
 *   direction, over ip. A surface-confined wave falls to ~1 % of ip 6·RT/nF past Ep (θ(1 − θ)
 *   shape, Bard & Faulkner 2nd ed. §14.3, from memory), a diffusing one keeps about half of it.
 * In: sweep signals, the located peak, its baseline and optionally the background part of that
 *   baseline (Ep is then re-measured above the background). Out: the PeakResult, or null when
 *   the corrected height is not positive (the peak does not rise above its own baseline).
 */
import type { BaselineCurve } from '../baseline/baselineTypes';
import type { PeakResult } from './peakTypes';
import { baselineAt } from '../baseline/baselineCurve';
import type { PeakCandidate } from './locatePeaksInSweep';
import { ownStart, type SweepSignals } from './sweepSignals';
import { peakVertex } from './peakVertex';
import { crossing } from './levelCrossing';

export function measurePeak(
  sig: SweepSignals,
  located: PeakCandidate,
  baseline: BaselineCurve,
  onFirstSweep: boolean,
  background?: (index: number) => number | null,
  tailOffsetV = 0.154,
): PeakResult | null {
  const seg = sig.segments[located.segmentIndex]!;
  const s = seg.direction === 'positive' ? 1 : -1;
  // Peaks from user windows stay where the window put them.
  const movable = located.origin === 'auto' && located.confidence !== 'shoulder' && located.confidence !== 'low';
  const peak = background && movable ? relocateAboveBackground(sig, located, background, s) : located;
  const baseAtEp = baselineAtPotential(sig, baseline, peak);
  if (baseAtEp === null) return null;
  const heightA = s * (peak.currentA - baseAtEp);
  if (!(heightA > 0)) return null;
  const lo = Math.max(seg.start, baseline.startIndex);
  const hi = Math.min(seg.end, baseline.endIndex);
  const corrected = (k: number) => s * (sig.shownA[k]! - (baselineAt(baseline, k) ?? NaN));
  const before = crossing(sig, corrected, peak.index, lo, -1, heightA / 2);
  const after = crossing(sig, corrected, peak.index, hi - 1, 1, heightA / 2);
  return {
    direction: peak.direction,
    potentialV: peak.potentialV,
    heightA,
    rawCurrentA: peak.currentA,
    baselineCurrentA: baseAtEp,
    index: peak.index,
    segmentIndex: peak.segmentIndex,
    onFirstSweep,
    halfPeakPotentialV: before,
    halfPeakWidthV: before === null ? null : Math.abs(peak.potentialV - before),
    fwhmV: before !== null && after !== null ? Math.abs(after - before) : null,
    baseline,
    chargeC: sig.timeKnown ? chargeUnderPeak(sig, corrected, peak.index, lo, hi, heightA) : null,
    tailFraction: tailFraction(sig, corrected, peak, hi, tailOffsetV, heightA),
    confidence: peak.confidence,
    prominenceA: peak.prominenceA,
    signalToNoise: sig.noiseA > 0 ? peak.prominenceA / sig.noiseA : Infinity,
    origin: peak.origin,
  };
}

/**
 * Ep measured on the current minus its background (a sloping charging current would otherwise
 * pull the raw extremum sideways): the same vertex as in locatePeaksInSweep (peakVertex.ts: a
 * parabola over a window that scales with the peak's height and skew, the skew taken off first),
 * on raw − background, its window chosen on locating-smoothed − background. An extended decay is
 * not part of the background, so a return peak keeps the extremum of the total faradaic current
 * that the published ΔEp tables refer to. Falls back to the located peak.
 */
function relocateAboveBackground(sig: SweepSignals, peak: PeakCandidate, background: (k: number) => number | null, s: 1 | -1): PeakCandidate {
  const seg = sig.segments[peak.segmentIndex]!;
  const lo = ownStart(sig.segments, peak.segmentIndex);
  const level = (k: number) => s * (sig.locatingA[k]! - (background(k) ?? NaN));
  const raw = (k: number) => s * (sig.currentA[k]! - (background(k) ?? NaN));
  let k = Math.max(peak.index, lo);
  while (k + 1 < seg.end && level(k + 1) > level(k)) k++;
  while (k - 1 > lo && level(k - 1) > level(k)) k--;
  if (!Number.isFinite(level(k))) return peak;
  const v = peakVertex({ potentialV: sig.potentialV, level, raw, lo, hi: seg.end }, k, peak.prominenceA, sig.noiseA);
  if (!v) return peak;
  const near = nearestIndex(sig.potentialV, lo, seg.end, k, v.potentialV);
  return { ...peak, index: near, potentialV: v.potentialV, currentA: s * v.currentA + (background(near) ?? 0) };
}

/** The point of [lo, hi) nearest to a potential, walking from point `from` (a sweep's potential is monotonic). */
function nearestIndex(e: Float64Array, lo: number, hi: number, from: number, potentialV: number): number {
  let best = from;
  for (let j = from - 1; j >= lo && Math.abs(e[j]! - potentialV) < Math.abs(e[best]! - potentialV); j--) best = j;
  for (let j = best + 1; j < hi && Math.abs(e[j]! - potentialV) < Math.abs(e[best]! - potentialV); j++) best = j;
  return best;
}

/** Baseline at Ep by linear interpolation between the two points around Ep. */
function baselineAtPotential(sig: SweepSignals, baseline: BaselineCurve, peak: PeakCandidate): number | null {
  const k = peak.index;
  const here = baselineAt(baseline, k);
  if (here === null) return null;
  for (const j of [k - 1, k + 1]) {
    const other = baselineAt(baseline, j);
    const e0 = sig.potentialV[k]!;
    const e1 = sig.potentialV[j];
    if (other === null || e1 === undefined || e1 === e0) continue;
    const t = (peak.potentialV - e0) / (e1 - e0);
    if (t >= 0 && t <= 1) return here + t * (other - here);
  }
  return here;
}

/** Corrected current tailOffsetV past Ep over ip; null when the sweep or baseline ends before. */
function tailFraction(sig: SweepSignals, corrected: (k: number) => number, peak: PeakCandidate, hi: number, tailOffsetV: number, heightA: number): number | null {
  for (let k = peak.index; k < hi; k++) {
    if (Math.abs(sig.potentialV[k]! - peak.potentialV) < tailOffsetV) continue;
    const r = corrected(k) / heightA;
    return Number.isFinite(r) ? r : null;
  }
  return null;
}

function chargeUnderPeak(sig: SweepSignals, corrected: (k: number) => number, peak: number, lo: number, hi: number, heightA: number): number {
  let a = peak;
  while (a > lo && corrected(a - 1) > 0) a--;
  let b = peak;
  while (b < hi - 1 && corrected(b + 1) > 0.001 * heightA) b++;
  let q = 0;
  for (let k = a; k < b; k++) q += 0.5 * (corrected(k) + corrected(k + 1)) * (sig.timeS[k + 1]! - sig.timeS[k]!);
  return Math.abs(q);
}
