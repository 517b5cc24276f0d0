/**
 * Extended-decay baselines (Nicholson's convention): the decaying current of a wave, fitted where
 * nothing else flows and extended in time under the next peak. Two uses: the return peak next to
 * the switch (the forward decay continued past the switch, Nicholson, Anal. Chem. 38 (1966)
 * 1406, from memory), and a wave sitting on the tail of an earlier wave on the same sweep (the
 * same convention applied within one sweep; our extension). The fit itself is
 * nicholsonReturnBaseline.ts. Where the earlier wave is reversible (a dissolved couple or an
 * adsorbed layer), its own exact shape is extended instead (reversibleTailOfPrevious).
 */
import type { PeakCandidate } from '../peaks/locatePeaksInSweep';
import type { SweepSignals } from '../peaks/sweepSignals';
import { crossing } from '../peaks/levelCrossing';
import { findPrePeakWindow } from './findPrePeakWindow';
import { nicholsonReturnBaseline, type NicholsonReturnBaselineResult } from './nicholsonReturnBaseline';
import { waveShapeFor } from './knownWaveShapes';
import { anchorAt, formatMv, sampleBaseline } from './baselineCurve';
import type { BaselineCurve } from './baselineTypes';
import { thermalVoltageV } from '../constants';

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

/** Where the earlier wave's current is seen alone: from a fifth of the way past its peak to this wave's foot (sweep-relative). */
function betweenWaves(sig: SweepSignals, peak: PeakCandidate, prev: BaselineRef, marginPoints: number) {
  const seg = sig.segments[peak.segmentIndex]!;
  const s = seg.direction === 'positive' ? 1 : -1;
  const y = sig.locatingA.subarray(seg.start, seg.end).map((v) => s * v);
  const from = prev.peak.index - seg.start + Math.round((peak.index - prev.peak.index) / 5);
  return findPrePeakWindow(y, from, peak.index - seg.start, { noise: sig.noiseA, marginPoints });
}

/** Decay of the previous wave, fitted between it and this wave's foot, extended under this wave. */
export function decayAfterPrevious(sig: SweepSignals, peak: PeakCandidate, prev: BaselineRef, marginPoints: number): NicholsonReturnBaselineResult | null {
  const seg = sig.segments[peak.segmentIndex]!;
  const s = seg.direction === 'positive' ? 1 : -1;
  const w = betweenWaves(sig, peak, prev, marginPoints);
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

/**
 * The previous wave's own current extended under this one, when that wave has a known shape (a
 * reversible wave of a dissolved couple, or a Nernstian adsorbed layer; knownWaveShapes.ts): its height above
 * its own baseline times that shape placed by its Ep, over its own baseline. Unlike the fitted
 * decay, this holds right after the peak, so waves 150-300 mV apart are measured as well as lone
 * ones. Used only when the wave's half-peak width is a shape's (±10 %) and, between the waves, the
 * shape nowhere stands above the data by more than max(4σ, 3 % of the height); else null.
 */
export function reversibleTailOfPrevious(
  sig: SweepSignals,
  peak: PeakCandidate,
  prev: BaselineRef,
  wave: { temperatureK: number; electronCount: number },
  marginPoints: number,
): { curve: BaselineCurve; evaluate: (index: number) => number | null } | null {
  const seg = sig.segments[peak.segmentIndex]!;
  const s = seg.direction === 'positive' ? 1 : -1;
  const p = prev.peak.index;
  const base = prev.evaluate(p);
  if (base === null || prev.peak.segmentIndex !== peak.segmentIndex) return null;
  const height = s * (sig.locatingA[p]! - base);
  const halfV = height > 0 ? risingHalfPeakPotential(sig, prev, height, seg.start) : null;
  if (halfV === null) return null;
  const nfrt = wave.electronCount / thermalVoltageV(wave.temperatureK);
  const widthV = Math.abs(prev.peak.potentialV - halfV);
  const shape = waveShapeFor(widthV * nfrt);
  if (!shape) return null;
  // ξ from the peak, decreasing along the sweep.
  const xiAt = (j: number) => -s * nfrt * (sig.potentialV[j]! - prev.peak.potentialV);
  // Past the switch the wave goes on as if the potential had stayed at the vertex (Nicholson's convention).
  const vertex = seg.end - 1;
  const next = sig.segments[peak.segmentIndex + 1];
  const evaluate = (j: number): number | null => {
    const under = prev.evaluate(j);
    if (under === null || j < p) return null;
    if (j < seg.end) return under + s * height * shape.at(xiAt(j));
    if (!next || j >= next.end) return null;
    const tail = shape.afterSwitch(xiAt(vertex), nfrt * Math.abs(sig.potentialV[j]! - sig.potentialV[vertex]!));
    return tail === null ? null : under + s * height * tail;
  };
  // Between the waves the current is this shape plus, nearer this wave, its foot, which only adds
  // current in the sweep's direction: the shape must nowhere stand above the data.
  const w = betweenWaves(sig, peak, prev, marginPoints);
  if (w) {
    const tolerance = Math.max(4 * sig.noiseA, 0.03 * height);
    for (let j = seg.start + w.start; j < seg.start + w.end; j++) {
      if (!(s * ((evaluate(j) ?? NaN) - sig.locatingA[j]!) <= tolerance)) return null;
    }
  }
  if (evaluate(vertex) === null) return null;
  const curve = sampleBaseline(sig.potentialV, p, seg.end, (j) => evaluate(j)!, {
    method: 'nicholson',
    anchors: [anchorAt(sig, p)],
    description: `the previous wave (Ep ${formatMv(prev.peak.potentialV)}, |Ep − Ep/2| = ${formatMv(widthV)}) extended under this peak with ${shape.words}, over that wave's baseline`,
  });
  return { curve, evaluate };
}

/** Ep/2 of a wave on its rising side, where its current above its own baseline is half of `height`; null when that baseline does not reach so far. */
function risingHalfPeakPotential(sig: SweepSignals, wave: BaselineRef, height: number, sweepStart: number): number | null {
  const s = sig.segments[wave.peak.segmentIndex]!.direction === 'positive' ? 1 : -1;
  const above = (j: number) => {
    const b = wave.evaluate(j);
    return b === null ? NaN : s * (sig.locatingA[j]! - b);
  };
  return crossing(sig, above, wave.peak.index, sweepStart, -1, height / 2);
}
