/**
 * Measures a located peak against its baseline: height at Ep, half-peak potential Ep/2, full width
 * at half height, and the charge under the corrected peak.
 * Definitions: ip = |I(Ep) − I_baseline(Ep)|; Ep/2 is where the corrected current is ip/2 on the
 *   side the sweep comes from (Nicholson & Shain, Anal. Chem. 36 (1964) 706; Bard & Faulkner 2nd
 *   ed. §6.2, from memory); charge Q = ∫|I − I_baseline| dt (Faraday's law).
 * Charge limits (our choice): from the last point before the peak where the corrected current is
 *   ≤ 0 (or the baseline's start) to the first point after it where the corrected current falls
 *   below 1 % of ip (or the end of the sweep / baseline). For a diffusion wave the latter is usually
 *   the switch, so Q is "charge passed under the wave up to the switch".
 * In: sweep signals, the located peak and its baseline. Out: the PeakResult, or null when the
 *   corrected height is not positive (the peak does not rise above its own baseline).
 */
import type { BaselineCurve, PeakResult } from '../analysis/types';
import { baselineAt } from '../baseline/baselineCurve';
import type { PeakCandidate } from './locatePeaksInSweep';
import type { SweepSignals } from './sweepSignals';

export function measurePeak(sig: SweepSignals, peak: PeakCandidate, baseline: BaselineCurve, onFirstSweep: boolean): PeakResult | null {
  const seg = sig.segments[peak.segmentIndex]!;
  const s = seg.direction === 'positive' ? 1 : -1;
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
    confidence: peak.confidence,
    prominenceA: peak.prominenceA,
    signalToNoise: sig.noiseA > 0 ? peak.prominenceA / sig.noiseA : Infinity,
    origin: peak.origin,
  };
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

/** Potential where corrected(k) first falls to `level`, walking from `from` towards `limit`. */
function crossing(sig: SweepSignals, corrected: (k: number) => number, from: number, limit: number, dir: 1 | -1, level: number): number | null {
  for (let k = from; dir > 0 ? k < limit : k > limit; k += dir) {
    const a = corrected(k);
    const b = corrected(k + dir);
    if (a >= level && b < level) {
      const e0 = sig.potentialV[k]!;
      const e1 = sig.potentialV[k + dir]!;
      return e0 + ((a - level) / (a - b)) * (e1 - e0);
    }
  }
  return null;
}

function chargeUnderPeak(sig: SweepSignals, corrected: (k: number) => number, peak: number, lo: number, hi: number, heightA: number): number {
  let a = peak;
  while (a > lo && corrected(a - 1) > 0) a--;
  let b = peak;
  while (b < hi - 1 && corrected(b + 1) > 0.01 * heightA) b++;
  let q = 0;
  for (let k = a; k < b; k++) q += 0.5 * (corrected(k) + corrected(k + 1)) * (sig.timeS[k + 1]! - sig.timeS[k]!);
  return Math.abs(q);
}
