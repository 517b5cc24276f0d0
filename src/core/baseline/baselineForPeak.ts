/**
 * Draws the baseline under one located peak with the requested method, choosing fit windows from
 * the data when the user gave none (for 'polynomial', the pre-peak window plus, for a peak that
 * closes like an adsorbed layer's, an equally long window after it). Falls back to the linear pre-peak line (with a warning) when the
 * requested method lacks the points it needs, and to a flat line through the lowest point before
 * the peak when even that is impossible.
 * Methods: linearPrePeakBaseline.ts, polynomialBaseline.ts, twoPointBaseline.ts,
 *   nicholsonReturnBaseline.ts; windows: findPrePeakWindow.ts.
 */
import { AnalysisError } from '../errors';
import type { BaselineCurve, BaselineMethod, BaselineSpec } from './baselineTypes';
import type { PeakCandidate } from '../peaks/locatePeaksInSweep';
import type { SweepSignals } from '../peaks/sweepSignals';
import { baselineAt, sampleBaseline } from './baselineCurve';
import { findPrePeakWindow } from './findPrePeakWindow';
import { linearPrePeakBaseline } from './linearPrePeakBaseline';
import { lineUnderOwnFoot } from './lineUnderOwnFoot';
import { decayAfterPrevious, decayAfterSwitch, reversibleTailOfPrevious, type BaselineRef } from './extendedDecayBaselines';
import { polynomialBaseline } from './polynomialBaseline';
import { switchedChargingBaseline } from './switchedChargingBaseline';
import { twoPointBaseline } from './twoPointBaseline';

export interface BaselineRequest {
  method: BaselineMethod;
  spec: BaselineSpec | null;
  /** First point (voltammogram index) the pre-peak window may use. */
  regionStart: number;
  /** Points trimmed from the end of an automatic pre-peak window (see findPrePeakWindow.ts). */
  marginPoints: number;
  /**
   * For 'nicholson': the forward peak of the couple and its baseline. For 'linear' on a return
   * peak whose forward wave closed before the switch: the forward background whose slope is kept
   * (switchedChargingBaseline.ts).
   */
  forward: BaselineRef | null;
  /**
   * For 'nicholson' on a wave that follows another peak on the same sweep: that peak and its
   * baseline. The earlier wave's decaying current is fitted between the two and extended under
   * this one (Nicholson's convention applied within a sweep).
   */
  previous?: BaselineRef | null;
  /**
   * For 'nicholson' after a forward sweep that ends in a breakdown or catalytic current: the index
   * where that current starts; the decay is fitted before it and no charging step is measured.
   */
  forwardDecayEnd?: number;
  /** n and T of the cell: the reversible shape of a previous wave (reversibleTailOfPrevious) is drawn with them. */
  wave?: { temperatureK: number; electronCount: number };
  /** Potential of the peak's partner in its couple, where there is one (places a slow wave's foot, lineUnderOwnFoot.ts). */
  partnerV?: number;
}

export interface BaselineOutcome {
  curve: BaselineCurve;
  /** See BaselineRef.evaluate and BaselineRef.background. */
  evaluate: (index: number) => number | null;
  background: (index: number) => number | null;
  /** Set when the requested method could not be used. */
  fallbackReason: string | null;
}

export type { BaselineRef };

export function baselineForPeak(sig: SweepSignals, peak: PeakCandidate, request: BaselineRequest): BaselineOutcome {
  const { method, spec } = request;
  const sampled = (curve: BaselineCurve, fallbackReason: string | null = null): BaselineOutcome => {
    const evaluate = extendCurve(sig, curve);
    return { curve, evaluate, background: evaluate, fallbackReason };
  };
  if (method === 'two-point') return sampled(twoPointFromSpec(sig, peak, spec));
  if (method === 'nicholson') {
    const fw = request.forward;
    const prev = request.previous ?? null;
    const decay = attempt(() => (prev
      ? ((request.wave ? reversibleTailOfPrevious(sig, peak, prev, request.wave, request.marginPoints) : null) ?? decayAfterPrevious(sig, peak, prev, request.marginPoints))
      : fw ? decayAfterSwitch(sig, peak, fw, request.forwardDecayEnd) : null));
    if (decay) {
      // Another couple's wave is background to this one (its Ep is found above it); the couple's
      // own forward decay is not (ΔEp tables refer to the total return current).
      if (prev) return { curve: decay.curve, evaluate: decay.evaluate, background: decay.evaluate, fallbackReason: null };
      const under = fw!.background;
      return { curve: decay.curve, evaluate: decay.evaluate, background: (k) => under(k) ?? under(peak.index), fallbackReason: null };
    }
    const why = prev ? 'the current after the previous peak does not decay cleanly enough to extend' : fw ? "too few points between the forward peak and the switch for the extended decay. UNRELIABLE: the return sweep's own line takes the forward wave's decay, still flowing under the return peak, for background, so the return ip and the ratio read low (by tens of per cent for a slow couple); record a sweep turned further past the forward peak" : 'no forward peak on the preceding sweep to extend';
    return sampled(linearCurve(sig, peak, request, spec), why);
  }
  if (method === 'polynomial') return sampled(polynomialCurve(sig, peak, request, spec));
  if (spec === null && request.forward) {
    const switched = switchedCurve(sig, peak, request, request.forward);
    if (switched) return sampled(switched);
  }
  return sampled(linearCurve(sig, peak, request, spec));
}

/**
 * A straight baseline ('linear', 'two-point') continues as the same line in E beyond its span, so
 * that a return-peak baseline can keep the forward background's slope (a tilted charging
 * background: the slope is shared by both sweeps, the offset flips and is re-measured at the
 * switch). Other curves exist only where they were drawn.
 */
function extendCurve(sig: SweepSignals, curve: BaselineCurve): (k: number) => number | null {
  const n = curve.potentialV.length;
  const e0 = curve.potentialV[0]!;
  const e1 = curve.potentialV[n - 1]!;
  const straight = (curve.method === 'linear' || curve.method === 'two-point') && n >= 2 && e1 !== e0;
  const slope = straight ? (curve.currentA[n - 1]! - curve.currentA[0]!) / (e1 - e0) : 0;
  return (k) => {
    const inside = baselineAt(curve, k);
    if (inside !== null || !straight) return inside;
    return curve.currentA[0]! + slope * (sig.potentialV[k]! - e0);
  };
}

/** Runs a decay fit; a failure of the data (e.g. a time column that does not increase) means fallback, not abort. */
function attempt<T>(fit: () => T | null): T | null {
  try {
    return fit();
  } catch (e) {
    if (e instanceof AnalysisError) return null;
    throw e;
  }
}

/** Local (sweep-relative) range [a, b) of the points whose potential lies between two values. */
function rangeBetween(sig: SweepSignals, peak: PeakCandidate, v1: number, v2: number): [number, number] | null {
  const seg = sig.segments[peak.segmentIndex]!;
  const lo = Math.min(v1, v2);
  const hi = Math.max(v1, v2);
  let a = -1;
  let b = -1;
  for (let k = seg.start; k < seg.end; k++) {
    const e = sig.potentialV[k]!;
    if (e >= lo && e <= hi) {
      if (a < 0) a = k;
      b = k + 1;
    }
  }
  return a >= 0 ? [a, b] : null;
}

function preWindow(sig: SweepSignals, peak: PeakCandidate, regionStart: number, spec: BaselineSpec | null, marginPoints: number): [number, number] | null {
  if (spec?.anchorsV) return rangeBetween(sig, peak, spec.anchorsV[0], spec.anchorsV[1]);
  const seg = sig.segments[peak.segmentIndex]!;
  const s = seg.direction === 'positive' ? 1 : -1;
  const y = sig.locatingA.subarray(seg.start, seg.end).map((v) => s * v);
  const w = findPrePeakWindow(y, regionStart - seg.start, peak.index - seg.start, { noise: sig.noiseA, marginPoints });
  return w ? [seg.start + w.start, seg.start + w.end] : null;
}

type WindowRequest = Pick<BaselineRequest, 'regionStart' | 'marginPoints' | 'wave' | 'partnerV'>;

/**
 * The pre-peak line; in a window found automatically, the foot of a wave of known shape (a
 * reversible dissolved couple, a Nernstian film, a slow or totally irreversible wave) is taken out
 * before the fit (lineUnderOwnFoot.ts). A window the user set is fitted as it stands.
 */
function linearCurve(sig: SweepSignals, peak: PeakCandidate, r: WindowRequest, spec: BaselineSpec | null): BaselineCurve {
  const seg = sig.segments[peak.segmentIndex]!;
  const w = preWindow(sig, peak, r.regionStart, spec, r.marginPoints);
  if (!w || w[1] - w[0] < 2) return flatCurve(sig, peak, r.regionStart);
  const footless = !spec?.anchorsV && r.wave ? lineUnderOwnFoot(sig, peak, w, r.wave, r.partnerV) : null;
  if (footless) return footless;
  const spanStart = Math.min(w[0], peak.index);
  return linearPrePeakBaseline({ ...sig, fitStart: w[0], fitEnd: w[1], spanStart, spanEnd: seg.end }).curve;
}

/**
 * Return peak of a closed forward wave (request.forward set with method 'linear'):
 * switchedChargingBaseline.ts, when the forward sweep had the longer stretch before its peak (its
 * background slope is then the better measured); null otherwise, and the return sweep's own
 * pre-peak line is used.
 */
function switchedCurve(sig: SweepSignals, peak: PeakCandidate, r: WindowRequest, fw: BaselineRef): BaselineCurve | null {
  const w = preWindow(sig, peak, r.regionStart, null, r.marginPoints);
  if (!w || w[1] - w[0] < 4) return null;
  const fSeg = sig.segments[fw.peak.segmentIndex]!;
  const seg = sig.segments[peak.segmentIndex]!;
  const forwardRun = Math.abs(fw.peak.potentialV - sig.potentialV[fSeg.start]!);
  const returnRun = Math.abs(peak.potentialV - sig.potentialV[seg.start]!);
  if (returnRun >= forwardRun) return null;
  return switchedChargingBaseline(sig, peak, { forwardBackground: fw.background, forwardPeakIndex: fw.peak.index, fitStart: w[0], fitEnd: w[1] });
}

function polynomialCurve(sig: SweepSignals, peak: PeakCandidate, r: WindowRequest, spec: BaselineSpec | null): BaselineCurve {
  const seg = sig.segments[peak.segmentIndex]!;
  const degree = spec?.degree ?? 2;
  const w = preWindow(sig, peak, r.regionStart, spec, r.marginPoints);
  if (!w || w[1] - w[0] < degree + 2) return linearCurve(sig, peak, r, spec);
  const after = spec?.anchorsV ? null : postPeakWindow(sig, peak, w);
  const fitRanges: Array<[number, number]> = after ? [w, after] : [w];
  return polynomialBaseline({ ...sig, fitRanges, spanStart: Math.min(w[0], peak.index), spanEnd: after ? after[1] : seg.end }, { degree });
}

/**
 * Background after a closed peak (one whose current falls back to within 5 % of its height over
 * the pre-peak line, as an adsorbed layer's does): as many points as the pre-peak window, starting
 * where the current has fallen back. Null for a diffusion wave, whose tail never falls back.
 */
function postPeakWindow(sig: SweepSignals, peak: PeakCandidate, pre: [number, number]): [number, number] | null {
  const seg = sig.segments[peak.segmentIndex]!;
  const s = seg.direction === 'positive' ? 1 : -1;
  const line = linearPrePeakBaseline({ ...sig, fitStart: pre[0], fitEnd: pre[1], spanStart: peak.index, spanEnd: seg.end }).curve;
  const excess = (k: number) => s * (sig.locatingA[k]! - (baselineAt(line, k) ?? NaN));
  const height = excess(peak.index);
  let k = peak.index;
  while (k < seg.end - 1 && excess(k) > 0.05 * height) k++;
  const end = Math.min(seg.end, k + (pre[1] - pre[0]));
  return excess(k) <= 0.05 * height && end - k >= 5 ? [k, end] : null;
}

function twoPointFromSpec(sig: SweepSignals, peak: PeakCandidate, spec: BaselineSpec | null): BaselineCurve {
  if (!spec?.anchorsV) throw new AnalysisError('BAD_OPTION', `two-point baseline for the ${peak.direction} peak near ${peak.potentialV.toFixed(3)} V needs anchorsV`);
  const seg = sig.segments[peak.segmentIndex]!;
  const anchors = spec.anchorsV.map((v, j) => {
    const explicit = spec.anchorCurrentsA?.[j];
    return { potentialV: v, currentA: explicit ?? currentAtPotential(sig, seg.start, seg.end, v) };
  }) as [{ potentialV: number; currentA: number }, { potentialV: number; currentA: number }];
  const span = rangeBetween(sig, peak, anchors[0].potentialV, anchors[1].potentialV);
  if (!span || peak.index < span[0] || peak.index >= span[1]) {
    throw new AnalysisError('BAD_OPTION', `two-point anchors ${spec.anchorsV.join(' V and ')} V must lie on the peak's sweep on either side of ${peak.potentialV.toFixed(3)} V`);
  }
  return twoPointBaseline({ potentialV: sig.potentialV, spanStart: span[0], spanEnd: span[1], anchors });
}

/** Shown (smoothed) current at a potential on a sweep, by linear interpolation. */
export function currentAtPotential(sig: SweepSignals, start: number, end: number, potentialV: number): number {
  for (let k = start; k + 1 < end; k++) {
    const e0 = sig.potentialV[k]!;
    const e1 = sig.potentialV[k + 1]!;
    if ((potentialV - e0) * (potentialV - e1) <= 0 && e0 !== e1) {
      return sig.shownA[k]! + ((sig.shownA[k + 1]! - sig.shownA[k]!) * (potentialV - e0)) / (e1 - e0);
    }
  }
  throw new AnalysisError('OUT_OF_RANGE', `potential ${potentialV} V is not on the peak's sweep`);
}

function flatCurve(sig: SweepSignals, peak: PeakCandidate, regionStart: number): BaselineCurve {
  const seg = sig.segments[peak.segmentIndex]!;
  const s = seg.direction === 'positive' ? 1 : -1;
  let low = Math.min(regionStart, peak.index);
  for (let k = low; k <= peak.index; k++) if (s * sig.locatingA[k]! < s * sig.locatingA[low]!) low = k;
  const level = sig.locatingA[low]!;
  return sampleBaseline(sig.potentialV, low, seg.end, () => level, {
    method: 'linear',
    anchors: [{ potentialV: sig.potentialV[low]!, currentA: level, index: low }],
    description: 'flat line through the lowest point before the peak (too few points for a fitted line)',
  });
}
