/**
 * One cycle of the per-voltammogram analysis: locate peaks on each sweep, pair them, draw the
 * baselines (forward sweeps first, so that the return peak can extend the forward decay), measure
 * the peaks and build the couples. Called by analyzeVoltammogram.ts; methods and sources are in
 * the files it calls.
 */
import type { BaselineMethod, BaselineSpec, CoupleResult, CycleAnalysis, AnalysisWarning, PeakResult, PeakWindow, ResolvedAnalyzeOptions } from './types';
import type { CycleRange } from '../types';
import type { SweepSignals } from '../peaks/sweepSignals';
import { locatePeaksInSweep, type PeakCandidate } from '../peaks/locatePeaksInSweep';
import { measurePeak } from '../peaks/measurePeak';
import { baselineForPeak, type BaselineRef } from '../baseline/baselineForPeak';
import { pairPeaksIntoCouples } from '../couples/pairPeaksIntoCouples';
import { buildCouple } from '../couples/buildCouple';
import { thermalVoltageV } from '../constants';

const mv = (v: number) => `${(v * 1000).toFixed(1)} mV`;

export function analyzeCycle(sig: SweepSignals, cycle: CycleRange, o: ResolvedAnalyzeOptions, thresholdA: number): CycleAnalysis {
  const warnings: AnalysisWarning[] = [];
  const warn = (code: AnalysisWarning['code'], message: string) => warnings.push({ code, message, cycle: cycle.index });
  const segIdx = sig.segments.flatMap((s, k) => (s.cycle === cycle.index ? [k] : []));
  const candidates = segIdx.flatMap((k) => locateOnSweep(sig, k, cycle.index, o, thresholdA, warn));
  const anodic = candidates.filter((c) => c.direction === 'anodic');
  const cathodic = candidates.filter((c) => c.direction === 'cathodic');
  const topProminence = Math.max(0, ...candidates.map((c) => c.prominenceA));
  const byProminence = (c: PeakCandidate) => (topProminence > 0 ? c.prominenceA / topProminence : 1);
  const pairs = pairPeaksIntoCouples(anodic.map((c) => c.potentialV), cathodic.map((c) => c.potentialV), {
    maxDeltaEpV: o.maxDeltaEpV,
    anodicWeights: anodic.map(byProminence),
    cathodicWeights: cathodic.map(byProminence),
  });
  const partner = new Map<PeakCandidate, PeakCandidate>();
  for (const p of pairs) {
    if (p.anodic === null || p.cathodic === null) continue;
    partner.set(anodic[p.anodic]!, cathodic[p.cathodic]!);
    partner.set(cathodic[p.cathodic]!, anodic[p.anodic]!);
  }
  const firstSeg = segIdx[0];
  const ordered = [...candidates].sort((a, b) => a.index - b.index);
  const refs = new Map<PeakCandidate, BaselineRef>();
  const measured = new Map<PeakCandidate, PeakResult>();
  for (const cand of ordered) {
    const onFirst = cand.segmentIndex === firstSeg;
    const spec = findSpec(o.baselines, cand, cycle.index);
    const closed = (fw: PeakCandidate) => forwardClosed(sig, refs.get(fw) ?? null);
    const method = chooseMethod(spec, onFirst, o, cand, ordered, partner, closed);
    const fwd = partner.get(cand);
    const carried = method === 'nicholson' || (method === 'linear' && spec === null && !onFirst && fwd !== undefined && fwd.segmentIndex === cand.segmentIndex - 1 && closed(fwd));
    const forward = carried && fwd ? (refs.get(fwd) ?? null) : null;
    const before = previousOnSweep(cand, ordered);
    const previous = method === 'nicholson' && spec === null && before ? (refs.get(before) ?? null) : null;
    const marginPoints = footMarginPoints(sig, cand, o);
    const outcome = baselineForPeak(sig, cand, { method, spec, regionStart: regionStartFor(sig, cand, ordered), marginPoints, forward, previous });
    if (outcome.fallbackReason) warn('BASELINE_FALLBACK', `${cand.direction} peak at ${mv(cand.potentialV)}: extended-decay baseline not possible (${outcome.fallbackReason}); linear pre-peak line used`);
    refs.set(cand, { peak: cand, evaluate: outcome.evaluate, background: outcome.background });
    const peak = measurePeak(sig, cand, outcome.curve, onFirst, outcome.background, (6 * thermalVoltageV(o.temperatureK)) / o.electronCount);
    if (peak) measured.set(cand, peak);
    else warn('LOW_SIGNAL', `${cand.direction} feature at ${mv(cand.potentialV)} does not rise above its baseline; dropped`);
  }
  const peaks = ordered.flatMap((c) => (measured.has(c) ? [measured.get(c)!] : []));
  const couples = buildCouples(sig, peaks, firstSeg, o, warn);
  if (peaks.length === 0) warn('NO_PEAKS', `no peak rose ${thresholdA.toExponential(3)} A above its surroundings in cycle ${cycle.index}`);
  return { index: cycle.index, peaks, couples, warnings };
}

function locateOnSweep(sig: SweepSignals, k: number, cycle: number, o: ResolvedAnalyzeOptions, thresholdA: number, warn: (c: AnalysisWarning['code'], m: string) => void): PeakCandidate[] {
  const seg = sig.segments[k]!;
  const direction = seg.direction === 'positive' ? 'anodic' : 'cathodic';
  if (seg.end - seg.start < 7) {
    warn('SHORT_SEGMENT', `sweep ${k} has only ${seg.end - seg.start} points; not searched for peaks`);
    return [];
  }
  const forDirection = o.peakWindows.filter((w) => w.direction === direction);
  const windows: PeakWindow[] | null = forDirection.length ? forDirection.filter((w) => w.cycle === undefined || w.cycle === cycle) : null;
  const found = locatePeaksInSweep(sig, k, { windows, minProminenceA: thresholdA, locatingWindow: o.locatingSmoothing.window });
  if (windows && windows.length > 0 && found.length < windows.length) warn('WINDOW_EMPTY', `a ${direction} peak window on sweep ${k} holds fewer than 3 points`);
  return found;
}

function findSpec(specs: BaselineSpec[], c: PeakCandidate, cycle: number): BaselineSpec | null {
  return specs.find((s) => s.direction === c.direction && (s.cycle === undefined || s.cycle === cycle) && c.potentialV >= Math.min(s.fromV, s.toV) && c.potentialV <= Math.max(s.fromV, s.toV)) ?? null;
}

function previousOnSweep(c: PeakCandidate, all: PeakCandidate[]): PeakCandidate | undefined {
  return all.filter((p) => p.segmentIndex === c.segmentIndex && p.index < c.index).at(-1);
}

/**
 * Extended decay (Nicholson's convention) for a wave that follows another peak on its sweep, and
 * for the return peak next to the switch whose partner is the forward sweep's last peak, unless
 * that forward wave has closed before the switch (forwardClosed); the pre-peak line otherwise. With returnBaseline 'linear' or 'polynomial' only the forward-sweep
 * rule remains.
 */
function chooseMethod(
  spec: BaselineSpec | null,
  onFirst: boolean,
  o: ResolvedAnalyzeOptions,
  c: PeakCandidate,
  all: PeakCandidate[],
  partner: Map<PeakCandidate, PeakCandidate>,
  closed: (forward: PeakCandidate) => boolean,
): BaselineMethod {
  if (spec) return spec.method;
  const following = previousOnSweep(c, all) !== undefined;
  if (onFirst) return following && o.forwardBaseline === 'linear' ? 'nicholson' : o.forwardBaseline;
  if (o.returnBaseline !== 'nicholson') return o.returnBaseline;
  if (following) return 'nicholson';
  const fwd = partner.get(c);
  const firstOnSweep = all.find((p) => p.segmentIndex === c.segmentIndex) === c;
  const lastOnForward = fwd ? all.filter((p) => p.segmentIndex === fwd.segmentIndex).at(-1) === fwd : false;
  const extend = fwd && fwd.segmentIndex === c.segmentIndex - 1 && firstOnSweep && lastOnForward && !closed(fwd);
  return extend ? 'nicholson' : 'linear';
}

/**
 * True when the forward peak's current has fallen back to its own baseline before the switch (a
 * surface-confined wave): over the last quarter of the stretch between the peak and the vertex
 * the corrected current stays within max(5 % of the peak, 4σ). There is no decay to extend then,
 * and the charging current changes sign at the switch, so the return peak takes the pre-peak line
 * of its own sweep (our rule; the 5 % level is common practice, no source).
 */
function forwardClosed(sig: SweepSignals, ref: BaselineRef | null): boolean {
  if (!ref) return false;
  const seg = sig.segments[ref.peak.segmentIndex]!;
  const s = seg.direction === 'positive' ? 1 : -1;
  const vertex = seg.end - 1;
  const from = vertex - Math.floor((vertex - ref.peak.index) / 4);
  const base = ref.evaluate(ref.peak.index);
  if (base === null || vertex - from < 3) return false;
  const height = s * (sig.locatingA[ref.peak.index]! - base);
  const limit = Math.max(0.05 * height, 4 * sig.noiseA);
  for (let k = from; k <= vertex; k++) {
    const b = ref.evaluate(k);
    if (b === null || Math.abs(sig.locatingA[k]! - b) > limit) return false;
  }
  return height > 0;
}

/** 2·RT/nF of potential, in points of the peak's sweep. */
function footMarginPoints(sig: SweepSignals, c: PeakCandidate, o: ResolvedAnalyzeOptions): number {
  const seg = sig.segments[c.segmentIndex]!;
  const stepV = Math.abs(sig.potentialV[seg.end - 1]! - sig.potentialV[seg.start]!) / Math.max(1, seg.end - seg.start - 1);
  return stepV > 0 ? Math.round((2 * thermalVoltageV(o.temperatureK)) / o.electronCount / stepV) : 0;
}

/** The pre-peak window starts 2 % into the sweep, or halfway from the previous peak on the sweep. */
function regionStartFor(sig: SweepSignals, c: PeakCandidate, all: PeakCandidate[]): number {
  const seg = sig.segments[c.segmentIndex]!;
  const prev = all.filter((p) => p.segmentIndex === c.segmentIndex && p.index < c.index).at(-1);
  if (prev) return prev.index + Math.floor((c.index - prev.index) / 2);
  return seg.start + Math.max(1, Math.round(0.02 * (seg.end - seg.start)));
}

/** Pairs the measured peaks (weighted by height, so small features stay single) and builds the couples. */
function buildCouples(sig: SweepSignals, peaks: PeakResult[], firstSeg: number | undefined, o: ResolvedAnalyzeOptions, warn: (c: AnalysisWarning['code'], m: string) => void): CoupleResult[] {
  const forwardDirection = firstSeg !== undefined && sig.segments[firstSeg]!.direction === 'negative' ? 'cathodic' : 'anodic';
  const a = peaks.flatMap((p, k) => (p.direction === 'anodic' ? [k] : []));
  const c = peaks.flatMap((p, k) => (p.direction === 'cathodic' ? [k] : []));
  const top = Math.max(0, ...peaks.map((p) => p.heightA));
  const weight = (k: number) => (top > 0 ? peaks[k]!.heightA / top : 1);
  const pairs = pairPeaksIntoCouples(a.map((k) => peaks[k]!.potentialV), c.map((k) => peaks[k]!.potentialV), {
    maxDeltaEpV: o.maxDeltaEpV,
    anodicWeights: a.map(weight),
    cathodicWeights: c.map(weight),
  });
  return pairs.map((pair, index) => {
    const mapped = { anodic: pair.anodic === null ? null : a[pair.anodic]!, cathodic: pair.cathodic === null ? null : c[pair.cathodic]! };
    const couple = buildCouple(sig, peaks, mapped, forwardDirection, o);
    if (mapped.anodic === null || mapped.cathodic === null) warn('UNPAIRED_PEAK', `${mapped.anodic === null ? 'cathodic' : 'anodic'} peak at ${mv((couple.epaV ?? couple.epcV)!)} has no partner`);
    return { index, ...couple };
  });
}
