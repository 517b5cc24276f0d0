/**
 * Extended-decay baselines (Nicholson's convention): the decaying current of a wave, fitted where
 * nothing else flows and extended in time under the next peak. Two uses: the return peak next to
 * the switch (the forward decay continued past the switch, Nicholson, Anal. Chem. 38 (1966)
 * 1406, from memory), and a wave sitting on the tail of an earlier wave on the same sweep (the
 * same convention applied within one sweep; our extension). The fit itself is
 * nicholsonReturnBaseline.ts.
 */
import type { PeakCandidate } from '../peaks/locatePeaksInSweep';
import type { SweepSignals } from '../peaks/sweepSignals';
import { findPrePeakWindow } from './findPrePeakWindow';
import { nicholsonReturnBaseline, type NicholsonReturnBaselineResult } from './nicholsonReturnBaseline';

/** A peak with the baseline drawn under it and that baseline as a function of point index. */
export interface BaselineRef {
  peak: PeakCandidate;
  /** Baseline current at point k (A), beyond the drawn span where the method extends in time. */
  evaluate: (index: number) => number | null;
  /**
   * The non-faradaic part of that baseline (charging/leakage background; for an extended decay,
   * the background under the decay, without the decay itself).
   */
  background: (index: number) => number | null;
}

/**
 * The forward decay fitted between the forward peak's half-way point and the switch, continued past
 * it. `decayEnd`: where a breakdown current starts before the switch; the fit stops there, and the
 * charging step at the switch, hidden under the breakdown's own decay, is not measured.
 */
export function decayAfterSwitch(sig: SweepSignals, peak: PeakCandidate, fw: BaselineRef, decayEnd?: number): NicholsonReturnBaselineResult | null {
  const fSeg = sig.segments[fw.peak.segmentIndex]!;
  const rSeg = sig.segments[peak.segmentIndex]!;
  const vertex = decayEnd !== undefined && decayEnd > fw.peak.index ? decayEnd : fSeg.end - 1;
  const ePeak = fw.peak.potentialV;
  const half = 0.5 * Math.abs(sig.potentialV[vertex]! - ePeak);
  let fitStart = vertex;
  while (fitStart > fw.peak.index && Math.abs(sig.potentialV[fitStart - 1]! - ePeak) >= half) fitStart--;
  if (vertex + 1 - fitStart < 5) return null;
  const known = fw.evaluate(fitStart) !== null && fw.evaluate(vertex) !== null;
  // A decaying forward background extends past the switch; a sampled line stops at the vertex,
  // and the charging step measured there then carries its value (held constant).
  return nicholsonReturnBaseline({
    ...sig,
    forwardFitStart: fitStart,
    forwardFitEnd: vertex + 1,
    vertexIndex: vertex,
    spanEnd: rSeg.end,
    ...(known ? { forwardBackgroundA: (k: number) => (k <= vertex || fw.evaluate(k) !== null ? (fw.evaluate(k) ?? 0) : (fw.evaluate(vertex) ?? 0)) } : {}),
  }, { switchStep: vertex === fSeg.end - 1 });
}

/** Decay of the previous wave, fitted between it and this wave's foot, extended under this wave. */
export function decayAfterPrevious(sig: SweepSignals, peak: PeakCandidate, prev: BaselineRef, marginPoints: number): NicholsonReturnBaselineResult | null {
  const seg = sig.segments[peak.segmentIndex]!;
  const s = seg.direction === 'positive' ? 1 : -1;
  const y = sig.locatingA.subarray(seg.start, seg.end).map((v) => s * v);
  const from = prev.peak.index - seg.start + Math.round((peak.index - prev.peak.index) / 5);
  const w = findPrePeakWindow(y, from, peak.index - seg.start, { noise: sig.noiseA, marginPoints });
  if (!w || w.end - w.start < 5) return null;
  const bg = prev.evaluate;
  if (bg(seg.start + w.start) === null || bg(peak.index) === null) return null;
  const fit = nicholsonReturnBaseline(
    { ...sig, forwardFitStart: seg.start + w.start, forwardFitEnd: seg.start + w.end, vertexIndex: seg.start + w.end - 1, spanEnd: seg.end, forwardBackgroundA: (k) => bg(k) ?? 0 },
    { switchStep: false },
  );
  // The earlier wave's current must be decaying in the sweep's direction of interest.
  return s * fit.cottrellCoefficientA > 0 ? fit : null;
}
