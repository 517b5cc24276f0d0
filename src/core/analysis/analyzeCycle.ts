/**
 * One cycle of the per-voltammogram analysis: locate peaks on each sweep, pair them, draw the
 * baselines (forward sweeps first, so that the return peak can extend the forward decay), measure
 * the peaks and build the couples. Called by analyzeVoltammogram.ts; methods and sources are in
 * the files it calls.
 */
import { formatMillivolts } from '../units';
import type { CycleAnalysis, AnalysisWarning, ResolvedAnalyzeOptions } from './types';
import type { CoupleResult } from '../couples/coupleTypes';
import type { PeakResult, PeakWindow } from '../peaks/peakTypes';
import type { CycleRange } from '../types';
import type { SweepSignals } from '../peaks/sweepSignals';
import { locatePeaksInSweep, type PeakCandidate } from '../peaks/locatePeaksInSweep';
import { isAtWindowEdge, windowEdgeCurrent, type WindowEdgeCurrent } from '../peaks/windowEdgeCurrent';
import { measurePeak } from '../peaks/measurePeak';
import { baselineForPeak, type BaselineRef } from '../baseline/baselineForPeak';
import { chooseBaseline, type BaselineContext } from '../baseline/chooseBaseline';
import { pairPeaksIntoCouples } from '../couples/pairPeaksIntoCouples';
import { buildCouple } from '../couples/buildCouple';
import { reversibleDeltaEpLimitV, reversibleMidpointOffset } from '../couples/reversibleDeltaEpAtSwitch';
import { thermalVoltageV } from '../constants';
import { sweepStartOnFoot, usesStartedWave } from '../baseline/startedWaveFoot';
import { usesOwnFoot } from '../baseline/lineUnderOwnFoot';
import { tiltedChargingBias } from '../baseline/tiltedChargingBias';

const mv = formatMillivolts;

export function analyzeCycle(sig: SweepSignals, cycle: CycleRange, o: ResolvedAnalyzeOptions, thresholdA: number): CycleAnalysis {
  const warnings: AnalysisWarning[] = [];
  const warn = (code: AnalysisWarning['code'], message: string) => warnings.push({ code, message, cycle: cycle.index });
  const segIdx = sig.segments.flatMap((s, k) => (s.cycle === cycle.index ? [k] : []));
  const windowEdges: WindowEdgeCurrent[] = [];
  const candidates = segIdx.flatMap((k) => locateOnSweep(sig, k, cycle.index, o, thresholdA, warn, windowEdges));
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
  const drawn = new Map<PeakCandidate, BaselineRef>();
  const measured = new Map<PeakCandidate, PeakResult>();
  const ctx: BaselineContext = {
    sig, ordered, partner, drawn, firstSegment: firstSeg, cycle: cycle.index, specs: o.baselines, edgeSweeps: new Map(windowEdges.map((e) => [e.segmentIndex, e.fromIndex])),
    defaults: { forwardBaseline: o.forwardBaseline, returnBaseline: o.returnBaseline }, wave: { temperatureK: o.temperatureK, electronCount: o.electronCount },
  };
  // A later cycle's pre-wave stretch carries the earlier cycles' decay: its tilt is not the background's.
  const firstCycle = cycle.index === sig.segments[0]?.cycle;
  for (const cand of ordered) {
    const onFirst = cand.segmentIndex === firstSeg;
    const request = chooseBaseline(ctx, cand);
    const outcome = baselineForPeak(sig, cand, request);
    if (outcome.fallbackReason) warn('BASELINE_FALLBACK', `${cand.direction} peak at ${mv(cand.potentialV)}: extended-decay baseline not possible (${outcome.fallbackReason}); linear pre-peak line used`);
    drawn.set(cand, { peak: cand, evaluate: outcome.evaluate, background: outcome.background });
    const peak = measurePeak(sig, cand, outcome.curve, onFirst, outcome.background, (6 * thermalVoltageV(o.temperatureK)) / o.electronCount);
    if (peak && onFirst && cand === ordered.find((c) => c.segmentIndex === firstSeg)) warnStartOnFoot(sig, cand, peak, partner.get(cand)?.potentialV, o, warn);
    if (peak && firstCycle && outcome.curve.method === 'nicholson' && request.forward && !request.previous) warnTiltedCharging(sig, request.forward, measured.get(request.forward.peak), peak, warn);
    if (peak) measured.set(cand, peak);
    else warn('LOW_SIGNAL', `${cand.direction} feature at ${mv(cand.potentialV)} does not rise above its baseline; dropped`);
  }
  const peaks = ordered.flatMap((c) => (measured.has(c) ? [measured.get(c)!] : []));
  const couples = buildCouples(sig, peaks, firstSeg, o, warn);
  if (peaks.length === 0) warn('NO_PEAKS', `no peak rose ${thresholdA.toExponential(3)} A above its surroundings in cycle ${cycle.index}`);
  return { index: cycle.index, peaks, couples, warnings, windowEdges };
}

/**
 * A return peak on the extended forward decay under a tilted background (tiltedChargingBias.ts):
 * said with the bound on its ip when that reaches TILT_NOTED of it, in the record's first cycle
 * (a later one's pre-wave stretch carries the earlier cycles' decay). Only said: the numbers stay,
 * since a leak current (slope kept) and a potential-dependent double layer (slope flipped) look
 * alike on one trace.
 */
function warnTiltedCharging(sig: SweepSignals, forward: BaselineRef, forwardPeak: PeakResult | undefined, peak: PeakResult, warn: (c: AnalysisWarning['code'], m: string) => void): void {
  const seg = sig.segments[forward.peak.segmentIndex]!;
  // The forward line's fit window: its anchors that are points of the forward sweep (else the whole stretch before the peak).
  const ends = (forwardPeak?.baseline.anchors ?? []).flatMap((a) => (a.index !== undefined && a.index >= seg.start && a.index < forward.peak.index ? [a.index] : []));
  const window: [number, number] = ends.length >= 2 ? [Math.min(...ends), Math.max(...ends) + 1] : [seg.start, forward.peak.index];
  const tilt = tiltedChargingBias(sig, forward.background, forward.peak.index, seg.end - 1, peak.potentialV, window, sig.noiseA);
  if (!tilt || !(peak.heightA > 0)) return;
  const share = tilt.biasA / peak.heightA;
  if (share < TILT_NOTED || Math.abs(tilt.slopeAPerV) < TILT_SIGNIFICANT * tilt.slopeStdErrAPerV) return;
  warn('BACKGROUND_TILT', `${peak.direction} peak at ${mv(peak.potentialV)}: the background before the forward wave is not flat (${(tilt.slopeAPerV * 1e6).toPrecision(3)} ± ${(tilt.slopeStdErrAPerV * 1e6).toPrecision(2)} µA/V). The return baseline keeps that slope past the switch, right for a leak current; if the tilt is double-layer charging (a capacitance that changes with potential, whose current turns sign with the sweep), this peak's ip is off by up to ${tilt.biasA.toExponential(2)} A (${(100 * share).toFixed(1)} %), and the ratio with it, the forward peak not. Subtract a blank recorded at the same scan rate (--blank)`);
}

/** A tilt bound from this share of the return ip on is said (our choice: 1 %, about the precision the return ip is read to). */
const TILT_NOTED = 0.01;
/** ... and only a slope this many standard errors from zero (our choice; 3σ, common practice, no source). */
const TILT_SIGNIFICANT = 3;

/**
 * A first sweep that starts on the wave's own foot (startedWaveFoot.ts): said always, with the
 * distance, and loudly when the baseline could not take the started wave's current out.
 */
function warnStartOnFoot(sig: SweepSignals, cand: PeakCandidate, peak: PeakResult, partnerV: number | undefined, o: ResolvedAnalyzeOptions, warn: (c: AnalysisWarning['code'], m: string) => void): void {
  const n = o.electronCount;
  const on = sweepStartOnFoot(sig, cand, n / thermalVoltageV(o.temperatureK), peak.halfPeakWidthV, partnerV);
  if (!on) return;
  const half = on.halfFromCouple ? "the couple's E½ (midpoint of its peaks)" : `its E½ (taken as Ep ${cand.direction === 'cathodic' ? '+' : '−'} ${(28.5 / n).toFixed(1)} mV, a reversible wave's)`;
  const where = `${cand.direction} peak at ${mv(cand.potentialV)}: the sweep starts on the wave's foot, ${(on.startFromHalfV * 1000).toFixed(0)} mV before ${half} and ${(on.startFromPeakV * 1000).toFixed(0)} mV before Ep (a wave of this width carries about ${(100 * on.footAtStart).toFixed(1)} % of its peak there), with no background alone before the wave`;
  const need = `start the sweep at least ${(200 / n).toFixed(0)} mV before E½ (README, Known limits)`;
  if (usesStartedWave(peak.baseline)) {
    warn('START_ON_FOOT', `${where}; the baseline takes out the current of a reversible wave swept from there out of a solution at rest (Nicholson & Shain 1964, eq. 24). It rests on that model and on the few points before the wave (their noise is extrapolated under the peak); a hold at the start potential would make ip and ΔEp wrong: ${need}`);
  } else if (usesOwnFoot(peak.baseline)) {
    warn('START_ON_FOOT', `${where}; the baseline takes out the wave's own foot as from a sweep started far before it, without the current of the start itself: ip and ΔEp may be off by several per cent; ${need}`);
  } else {
    warn('START_ON_FOOT', `${where}. UNRELIABLE: the started reversible wave's shape does not fit it (a hold at the start potential before the sweep, or not a reversible wave), and the pre-peak line runs through the rising foot, so ip (forward and return), ΔEp and the verdict are off (a reversible wave started 120 mV before E½ reads ip 20 % low, ΔEp 7 mV narrow); ${need}`);
  }
}

function locateOnSweep(sig: SweepSignals, k: number, cycle: number, o: ResolvedAnalyzeOptions, thresholdA: number, warn: (c: AnalysisWarning['code'], m: string) => void, edges: WindowEdgeCurrent[]): PeakCandidate[] {
  const seg = sig.segments[k]!;
  const direction = seg.direction === 'positive' ? 'anodic' : 'cathodic';
  if (seg.end - seg.start < 7) {
    warn('SHORT_SEGMENT', `sweep ${k} has only ${seg.end - seg.start} points; not searched for peaks`);
    return [];
  }
  const forCycle = o.peakWindows.filter((w) => w.direction === direction && (w.cycle === undefined || w.cycle === cycle));
  const found = locateWithWindows(sig, k, forCycle, direction, o, thresholdA, warn);
  const edgePoints = Math.ceil(o.locatingSmoothing.window / 2);
  const edge = windowEdgeCurrent(sig, k, thresholdA, { edgePoints, electronCount: o.electronCount });
  if (!edge) return found;
  edges.push(edge);
  const kept = found.filter((c) => !isAtWindowEdge(sig, edge, c.index, edgePoints));
  const dropped = found.length > kept.length ? '; the extremum there is not a peak' : '';
  warn('WINDOW_EDGE', `breakdown or catalytic current at the window edge: ${direction} current still rising steeply from ${edge.fromV.toFixed(3)} V to the ${edge.atSwitch ? 'switching potential' : 'end of the record'} at ${edge.toV.toFixed(3)} V${dropped} (or a wave cut off by the switch)`);
  return kept;
}

/**
 * The peaks of a sweep: automatically, or in the user's windows. A window the user set must hold a
 * peak that stands above the noise threshold like any other; an empty one is kept as "empty" and
 * never takes the place of the peaks found automatically.
 */
function locateWithWindows(sig: SweepSignals, k: number, forCycle: PeakWindow[], direction: string, o: ResolvedAnalyzeOptions, thresholdA: number, warn: (c: AnalysisWarning['code'], m: string) => void): PeakCandidate[] {
  const options = { minProminenceA: thresholdA, locatingWindow: o.locatingSmoothing.window };
  if (!forCycle.length) return locatePeaksInSweep(sig, k, { ...options, windows: null });
  const found = locatePeaksInSweep(sig, k, { ...options, windows: forCycle });
  const real = found.filter((c) => c.prominenceA >= thresholdA);
  const empty = forCycle.length - real.length;
  if (empty > 0) {
    warn('WINDOW_EMPTY', `${empty === 1 ? 'a' : empty} ${direction} peak window${empty === 1 ? '' : 's'} on sweep ${k} hold${empty === 1 ? 's' : ''} no peak above the noise threshold (${thresholdA.toExponential(2)} A); kept as empty${real.length ? '' : ', and the peaks found automatically on this sweep are kept'}`);
  }
  return real.length ? real : locatePeaksInSweep(sig, k, { ...options, windows: null });
}

/**
 * A reversible couple turned close past its forward peak: its E½ is not E°′ (D_O = D_R) but moved
 * towards the return peak. The forward peak stays 1.109·RT/nF before E½ (Nicholson & Shain 1964,
 * Table I), so the measured ΔEp gives the offset, (ΔEp − 2.218·RT/nF)/2; the table's value at this
 * switch (reversibleMidpointOffset) says when it is worth saying.
 */
function warnMidpointOffset(couple: Omit<CoupleResult, 'index'>, index: number, o: ResolvedAnalyzeOptions, warn: (c: AnalysisWarning['code'], m: string) => void): void {
  const forwardV = couple.forwardDirection === 'anodic' ? couple.epaV : couple.epcV;
  if (couple.verdict.category !== 'reversible' || couple.switchPotentialV == null || forwardV === null || couple.deltaEpV === null) return;
  const past = Math.abs(couple.switchPotentialV - forwardV);
  const expected = reversibleMidpointOffset(past, { electronCount: o.electronCount, temperatureK: o.temperatureK });
  if (expected.deltaEpV < MIDPOINT_OFFSET_NOTED_V) return;
  const measured = Math.max(0, (couple.deltaEpV - reversibleDeltaEpLimitV(o.electronCount, o.temperatureK)) / 2);
  const towards = couple.forwardDirection === 'cathodic' ? 'positive' : 'negative';
  warn('MIDPOINT_OFFSET', `couple ${index + 1}: the switch lies only ${(past * 1000).toFixed(0)} mV past the forward peak, so E½ = (Epa + Epc)/2 lies about ${(measured * 1000).toFixed(1)} mV ${towards} of the couple's true E½ (E°′ when D_O = D_R): half of ΔEp's excess over 2.218·RT/nF, the return peak alone moving with the switch (Nicholson & Shain, Anal. Chem. 36 (1964) 706; Nicholson, Anal. Chem. 37 (1965) 1351, whose table, via Bard & Faulkner 2nd ed. §6.5, from memory, gives ${expected.inTable ? '' : 'at least '}${(expected.deltaEpV * 1000).toFixed(1)} mV here). Turn the sweep ≥ 270/n mV past the peak for E½ within 0.4 mV`);
}

/** Midpoint offsets from here on are said (V): the potentials are given to 0.1 mV (our choice). */
const MIDPOINT_OFFSET_NOTED_V = 5e-4;

/**
 * A couple whose ΔEp is narrower than any diffusing couple of this n allows (at least
 * 2.218·RT/nF, more with the switch close: Nicholson & Shain, Anal. Chem. 36 (1964) 706;
 * Nicholson, Anal. Chem. 37 (1965) 1351), yet too wide for an adsorbed layer: the same zone in
 * which classifyCouple.ts gives no verdict (0.4·RT/nF below the reversible value, our margin).
 * Said loudly, since its E½, ΔEp and anything read from them would otherwise pass as numbers.
 */
function warnNarrowDeltaEp(couple: Omit<CoupleResult, 'index'>, index: number, o: ResolvedAnalyzeOptions, warn: (c: AnalysisWarning['code'], m: string) => void): void {
  const e = couple.verdict.evidence;
  const dEp = couple.deltaEpV;
  if (couple.verdict.category !== 'inconclusive' || dEp === null) return;
  const u = thermalVoltageV(o.temperatureK) / o.electronCount;
  const expected = e.reversibleDeltaEpAtSwitchV ?? e.reversibleDeltaEpLimitV;
  if (!(dEp < expected - 0.4 * u) || !(Math.abs(dEp) > 1.109 * u)) return;
  const n = o.electronCount;
  warn('NARROW_DELTA_EP', `couple ${index + 1}: ΔEp = ${mv(dEp)} is narrower than a diffusing couple allows for n = ${n} (at least ${mv(expected)} here; 2.218·RT/nF = ${mv(e.reversibleDeltaEpLimitV)}, Nicholson & Shain 1964). UNRELIABLE: its E½ and ΔEp are not measurements of the couple. Likely causes: peak potentials located imprecisely (noise on a broad top; smooth more, or average cycles), more electrons than n = ${n} (n = ${n + 1} allows ${mv(e.reversibleDeltaEpLimitV * n / (n + 1))}), or a partly adsorbed couple`);
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
    warnMidpointOffset(couple, index, o, warn);
    warnNarrowDeltaEp(couple, index, o, warn);
    if (mapped.anodic === null || mapped.cathodic === null) warn('UNPAIRED_PEAK', `${mapped.anodic === null ? 'cathodic' : 'anodic'} peak at ${mv((couple.epaV ?? couple.epcV)!)} has no partner`);
    return { index, ...couple };
  });
}
