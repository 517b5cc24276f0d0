/**
 * Per-voltammogram analysis: for each cycle, locate anodic and cathodic peaks on every sweep, draw
 * the baseline under each, measure it, pair peaks into couples and give each couple a verdict.
 * The raw columns are never modified; the shown smoothing and dI/dE come back as separate arrays.
 * Methods and sources live in the files this one calls: ../peaks (location, measurement),
 *   ../baseline (pre-peak line, polynomial, two-point, Nicholson's extended decay), ../couples
 *   (pairing, metrics, verdict), ../smoothing (Savitzky–Golay).
 * In: a Voltammogram with its sweep segments and cycles (see ../types.ts); currents in the
 *   convention named by `currentConvention`. Out: VoltammogramAnalysis (IUPAC signs, positive
 *   peak heights; see ./types.ts), including the option values used.
 * Defaults (common practice, no source): light 5-point quadratic smoothing for display; peaks
 *   located on a 15/n mV quadratic smoothing; a peak needs a prominence of max(8σ, 1 % of the
 *   current range, minProminenceA); forward peaks on a linear pre-peak baseline, the return peak
 *   next to the switch on Nicholson's extended forward decay.
 */
import { AnalysisError, assertFiniteInRange, assertSameLength } from '../errors';
import { toIupacCurrent } from '../conventions/currentConvention';
import type { Voltammogram } from '../types';
import { prepareSweepSignals, windowForSpan, type SweepSignals } from '../peaks/sweepSignals';
import { hampelSpikes } from '../peaks/hampelSpikes';
import { analyzeCycles } from './laterCycles';
import { resolveCell, resolveMethod } from './resolveRun';
import { STANDARD_TEMPERATURE_K } from '../constants';
import type { AnalysisWarning, AnalyzeVoltammogramOptions, ResolvedAnalyzeOptions, SpikePoint, VoltammogramAnalysis } from './types';

export function analyzeVoltammogram(v: Voltammogram, options: AnalyzeVoltammogramOptions = {}): VoltammogramAnalysis {
  checkVoltammogram(v);
  return analyzeResolvedVoltammogram(v, resolveTraceOptions(v, options));
}

/** The options of one trace after defaults and checks, less what is derived from the data. */
export type TraceOptions = Omit<ResolvedAnalyzeOptions, 'locatingSmoothing'>;

/**
 * The analysis proper, on options already checked (resolveTraceOptions, or the run's resolveRun):
 * nothing here reads a default or checks an option again. The data are checked.
 */
export function analyzeResolvedVoltammogram(v: Voltammogram, trace: TraceOptions): VoltammogramAnalysis {
  checkVoltammogram(v);
  const first = v.segments[0]!;
  const locatingSmoothing = { window: windowForSpan(v.potentialV, first, 0.015 / trace.electronCount), order: 2 };
  const resolved: ResolvedAnalyzeOptions = { ...trace, locatingSmoothing };
  const iupac = toIupacCurrent(v.currentA, resolved.currentConvention);
  const cleaned = resolved.spikeFilter === 'off' ? null : hampelSpikes(iupac, v.segments);
  const spikes: SpikePoint[] = (cleaned?.indices ?? []).map((index) => ({ index, potentialV: v.potentialV[index]!, currentA: iupac[index]!, replacedByA: cleaned!.cleanedA[index]! }));
  const sig = prepareSweepSignals(
    { potentialV: v.potentialV, currentA: cleaned?.cleanedA ?? iupac, timeS: v.timeS, scanRateVPerS: resolved.scanRateVPerS, segments: v.segments },
    resolved.smoothing,
    (seg) => ({ window: windowForSpan(v.potentialV, seg, 0.015 / resolved.electronCount), order: 2 }),
  );
  const warnings: AnalysisWarning[] = [];
  if (spikes.length) warnings.push({ code: 'SPIKES', message: spikeMessage(spikes, v.currentKind === 'density' ? 'µA/cm²' : 'µA') });
  if (!sig.timeKnown) warnings.push({ code: 'NO_TIME_AXIS', message: 'no time column and no scan rate: peak charges are not computed' });
  const range = currentRange(sig);
  const scale = Math.max(...[currentRangeEnd(sig, 1), -currentRangeEnd(sig, -1)].map(Math.abs));
  const flat = !(range > 10 * sig.noiseA) || !(range > 1e-9 * scale);
  if (flat) {
    warnings.push({ code: 'FLAT_TRACE', message: `current range ${range.toExponential(3)} A is within 10× the noise (${sig.noiseA.toExponential(3)} A): no peaks can be told from noise` });
  }
  const peakThresholdA = Math.max(resolved.minSignalToNoise * sig.noiseA, resolved.minProminenceA, resolved.minRelativeProminence * range, Number.MIN_VALUE);
  const wanted = new Set(resolved.cycles);
  const chosen = v.cycles.filter((c) => wanted.has(c.index));
  const cycles = flat
    ? chosen.map((c) => ({ index: c.index, peaks: [], couples: [], warnings: [{ code: 'NO_PEAKS' as const, message: 'flat trace: no peaks searched', cycle: c.index }] }))
    : analyzeCycles(sig, chosen, resolved, peakThresholdA);
  return {
    cycles,
    smoothed: resolved.smoothing === 'off' ? null : { currentA: sig.shownA, derivativeAPerV: sig.shownSlopeAPerV },
    noiseA: sig.noiseA,
    peakThresholdA,
    options: resolved,
    warnings,
    spikes,
  };
}

function spikeMessage(spikes: SpikePoint[], unit: 'µA' | 'µA/cm²'): string {
  const shown = spikes.slice(0, 8).map((p) => `${(p.currentA * 1e6).toPrecision(3)} ${unit} at ${p.potentialV.toFixed(3)} V (point ${p.index})`).join(', ');
  return `${spikes.length} isolated bad point${spikes.length > 1 ? 's' : ''} left out of peak finding and baselines (Hampel test against a running median): ${shown}${spikes.length > 8 ? ', …' : ''}`;
}

/** Largest (sign 1) or smallest (sign −1) located current. */
function currentRangeEnd(sig: SweepSignals, sign: 1 | -1): number {
  let best = -Infinity;
  // An index loop: for…of over a typed array allocates an iterator result per point until the
  // engine optimises the loop, and a first run of the analysis is never optimised yet.
  const a = sig.locatingA;
  for (let k = 0; k < a.length; k++) best = Math.max(best, sign * (a[k] as number));
  return sign * best;
}

function currentRange(sig: SweepSignals): number {
  return currentRangeEnd(sig, 1) - currentRangeEnd(sig, -1);
}

function checkVoltammogram(v: Voltammogram): void {
  assertSameLength({ potentialV: v.potentialV, currentA: v.currentA, ...(v.timeS ? { timeS: v.timeS } : {}) }, 5);
  assertFiniteColumn('potentialV', v.potentialV);
  assertFiniteColumn('currentA', v.currentA);
  if (v.timeS) assertFiniteColumn('timeS', v.timeS);
  if (v.segments.length === 0) throw new AnalysisError('EMPTY_INPUT', 'the voltammogram has no sweep segments (split it with findSweepSegments first)');
  for (let k = 0; k < v.segments.length; k++) {
    const seg = v.segments[k]!;
    if (!(seg.start >= 0 && seg.end <= v.potentialV.length && seg.end - seg.start >= 2)) {
      throw new AnalysisError('OUT_OF_RANGE', `segment ${k} [${seg.start}, ${seg.end}) is not a valid range of ${v.potentialV.length} points`);
    }
  }
}

/**
 * Throws NON_FINITE at the first point that is not a finite number. A function of its own: the
 * loop over every point is what the engine optimises, and kept small it compiles quickly.
 */
function assertFiniteColumn(name: string, col: ArrayLike<number>): void {
  for (let k = 0; k < col.length; k++) {
    if (!Number.isFinite(col[k]!)) throw new AnalysisError('NON_FINITE', `${name} is not finite at point ${k} (value ${col[k]})`);
  }
}

/** Checks the options of a single trace and fills in the defaults (the run does this in resolveRun). */
export function resolveTraceOptions(v: Voltammogram, o: AnalyzeVoltammogramOptions): TraceOptions {
  const { electronCount, temperatureK } = resolveCell({ electronCount: o.electronCount ?? 1, temperatureK: o.temperatureK ?? STANDARD_TEMPERATURE_K });
  const method = resolveMethod(o);
  const scanRateVPerS = o.scanRateVPerS ?? v.scanRateVPerS;
  if (scanRateVPerS !== null) assertFiniteInRange('scanRateVPerS', scanRateVPerS, 1e-9);
  for (const w of o.peakWindows ?? []) {
    if (!Number.isFinite(w.fromV) || !Number.isFinite(w.toV) || w.fromV === w.toV) {
      throw new AnalysisError('BAD_OPTION', `peak window ${w.direction} [${w.fromV}, ${w.toV}] V must have two different finite ends`);
    }
  }
  const cycles = o.cycles ?? v.cycles.map((c) => c.index);
  const present = new Set(v.cycles.map((c) => c.index));
  const missing = cycles.filter((k) => !present.has(k));
  if (missing.length) {
    throw new AnalysisError('BAD_OPTION', `cycles option names cycle ${missing.join(', ')}, but the voltammogram has cycles ${v.cycles.map((c) => c.index).join(', ') || 'none'}`);
  }
  return {
    temperatureK, electronCount, smoothing: method.smoothing, currentConvention: o.currentConvention ?? 'iupac',
    peakWindows: o.peakWindows ?? [], baselines: o.baselines ?? [], forwardBaseline: method.forwardBaseline, returnBaseline: method.returnBaseline,
    minSignalToNoise: method.minSignalToNoise, minProminenceA: method.minProminenceA, minRelativeProminence: method.minRelativeProminence,
    maxDeltaEpV: method.maxDeltaEpV, scanRateVPerS, cycles, spikeFilter: method.spikeFilter,
  };
}
