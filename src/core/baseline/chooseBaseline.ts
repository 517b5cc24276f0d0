/**
 * Which baseline each located peak of a cycle gets, and what it is drawn from: the user's per-peak
 * choice when one covers the peak, else the defaults for forward and return peaks, with
 * Nicholson's extended decay where a wave follows another (the rules are in chooseMethod below).
 * In: the cycle's candidates in point order, their pairing, the baselines already drawn (earlier
 * peaks first). Out: a BaselineRequest for baselineForPeak.ts.
 * Sources: Nicholson, Anal. Chem. 38 (1966) 1406 (the return peak measured from the extended
 *   forward decay); the windows and margins are design choices stated beside each rule.
 */
import { thermalVoltageV } from '../constants';
import type { PeakCandidate } from '../peaks/locatePeaksInSweep';
import type { SweepSignals } from '../peaks/sweepSignals';
import type { BaselineRef, BaselineRequest } from './baselineForPeak';
import type { BaselineMethod, BaselineSpec } from './baselineTypes';

/** Default baseline methods of forward (first-sweep) and return peaks. */
export interface BaselineDefaults {
  forwardBaseline: Exclude<BaselineMethod, 'nicholson' | 'two-point'>;
  returnBaseline: Exclude<BaselineMethod, 'two-point'>;
}

/** What chooseBaseline needs to know about the cycle being analysed. */
export interface BaselineContext {
  sig: SweepSignals;
  /** The cycle's candidates in point order. */
  ordered: PeakCandidate[];
  /** Each paired candidate's partner. */
  partner: Map<PeakCandidate, PeakCandidate>;
  /** Baselines drawn so far, by candidate. */
  drawn: Map<PeakCandidate, BaselineRef>;
  /** Sweep index of the cycle's first sweep. */
  firstSegment: number | undefined;
  cycle: number;
  specs: BaselineSpec[];
  defaults: BaselineDefaults;
  /** n and T, for the 2·RT/nF foot margin. */
  wave: { temperatureK: number; electronCount: number };
  /** Sweeps that end in a breakdown or catalytic current (windowEdgeCurrent.ts), with the index where it starts. */
  edgeSweeps?: Map<number, number>;
}

export function chooseBaseline(ctx: BaselineContext, cand: PeakCandidate): BaselineRequest {
  const { sig, ordered, partner, drawn } = ctx;
  const onFirst = cand.segmentIndex === ctx.firstSegment;
  const spec = findBaselineSpec(ctx.specs, cand, ctx.cycle);
  const closed = (fw: PeakCandidate) => forwardWaveClosed(sig, drawn.get(fw) ?? null);
  const method = chooseMethod(spec, onFirst, ctx.defaults, cand, ordered, closed);
  const fwd = partner.get(cand);
  const under = onFirst ? undefined : waveBeforeSwitch(cand, ordered);
  const decaying = method === 'nicholson' ? (under ?? fwd) : undefined;
  const switched = method === 'linear' && spec === null && !onFirst && fwd !== undefined && fwd.segmentIndex === cand.segmentIndex - 1 && closed(fwd) ? fwd : undefined;
  const carriedFrom = decaying ?? switched;
  const forward = carriedFrom ? (drawn.get(carriedFrom) ?? null) : null;
  const before = previousPeakOnSweep(cand, ordered);
  const previous = method === 'nicholson' && spec === null && before ? (drawn.get(before) ?? null) : null;
  // A forward sweep that ends in a breakdown current: its wave's decay is fitted before the breakdown starts.
  const decayEnd = forward ? ctx.edgeSweeps?.get(forward.peak.segmentIndex) : undefined;
  return { method, spec, regionStart: prePeakRegionStart(sig, cand, ordered), marginPoints: footMarginPoints(sig, cand, ctx.wave), forward, previous, wave: ctx.wave, ...(fwd ? { partnerV: fwd.potentialV } : {}), ...(decayEnd !== undefined ? { forwardDecayEnd: decayEnd } : {}) };
}

function findBaselineSpec(specs: BaselineSpec[], c: PeakCandidate, cycle: number): BaselineSpec | null {
  return specs.find((s) => s.direction === c.direction && (s.cycle === undefined || s.cycle === cycle) && c.potentialV >= Math.min(s.fromV, s.toV) && c.potentialV <= Math.max(s.fromV, s.toV)) ?? null;
}

export function previousPeakOnSweep(c: PeakCandidate, all: PeakCandidate[]): PeakCandidate | undefined {
  return all.filter((p) => p.segmentIndex === c.segmentIndex && p.index < c.index).at(-1);
}

/**
 * The forward wave whose decay runs on under a return peak: for the first peak of a return sweep,
 * the last peak of the sweep before the switch, paired with it or not. That wave's current keeps
 * decaying past the switch however far the switch lies from it (Nicholson, Anal. Chem. 38 (1966)
 * 1406); the pairing of candidates, done before any baseline is drawn, often misses a small
 * return peak far from the switch (its prominence is measured on that very decay), and a return
 * peak of another couple sits on the same decay. Undefined for a later peak of the sweep.
 */
function waveBeforeSwitch(c: PeakCandidate, all: PeakCandidate[]): PeakCandidate | undefined {
  if (all.find((p) => p.segmentIndex === c.segmentIndex) !== c) return undefined;
  return all.filter((p) => p.segmentIndex === c.segmentIndex - 1).at(-1);
}

/**
 * Extended decay (Nicholson's convention) for a wave that follows another peak on its sweep, and
 * for the first return peak after the switch that sits on the forward sweep's last wave
 * (waveBeforeSwitch), unless that forward wave has closed before the switch (forwardWaveClosed);
 * the pre-peak line otherwise. With returnBaseline 'linear' or 'polynomial' only the forward-sweep
 * rule remains.
 */
function chooseMethod(
  spec: BaselineSpec | null,
  onFirst: boolean,
  defaults: BaselineDefaults,
  c: PeakCandidate,
  all: PeakCandidate[],
  closed: (forward: PeakCandidate) => boolean,
): BaselineMethod {
  if (spec) return spec.method;
  const following = previousPeakOnSweep(c, all) !== undefined;
  if (onFirst) return following && defaults.forwardBaseline === 'linear' ? 'nicholson' : defaults.forwardBaseline;
  if (defaults.returnBaseline !== 'nicholson') return defaults.returnBaseline;
  if (following) return 'nicholson';
  const under = waveBeforeSwitch(c, all);
  return under && !closed(under) ? 'nicholson' : 'linear';
}

/**
 * True when the forward peak's current has fallen back to its own baseline before the switch (a
 * surface-confined wave): over the last quarter of the stretch between the peak and the vertex
 * the corrected current stays within max(5 % of the peak, 4σ). There is no decay to extend then,
 * and the charging current changes sign at the switch, so the return peak takes the pre-peak line
 * of its own sweep (our rule; the 5 % level is common practice, no source).
 */
function forwardWaveClosed(sig: SweepSignals, ref: BaselineRef | null): boolean {
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
function footMarginPoints(sig: SweepSignals, c: PeakCandidate, wave: { temperatureK: number; electronCount: number }): number {
  const seg = sig.segments[c.segmentIndex]!;
  const stepV = Math.abs(sig.potentialV[seg.end - 1]! - sig.potentialV[seg.start]!) / Math.max(1, seg.end - seg.start - 1);
  return stepV > 0 ? Math.round((2 * thermalVoltageV(wave.temperatureK)) / wave.electronCount / stepV) : 0;
}

/** The pre-peak window starts 2 % into the sweep, or halfway from the previous peak on the sweep. */
function prePeakRegionStart(sig: SweepSignals, c: PeakCandidate, all: PeakCandidate[]): number {
  const seg = sig.segments[c.segmentIndex]!;
  const prev = all.filter((p) => p.segmentIndex === c.segmentIndex && p.index < c.index).at(-1);
  if (prev) return prev.index + Math.floor((c.index - prev.index) / 2);
  return seg.start + Math.max(1, Math.round(0.02 * (seg.end - seg.start)));
}

