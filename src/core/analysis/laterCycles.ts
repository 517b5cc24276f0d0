/**
 * A cycle after the first, measured as a wave from rest: the decay the earlier cycles still
 * drive (../baseline/earlierCycleDecay.ts) is taken out of the signals, the cycle is analysed as
 * usual, and the decay is put back into every current that is reported against the record
 * (peak and baseline currents, baseline curves and anchors, window-edge currents), so each peak's
 * baseline is drawn on the data as the line or decay it was measured on plus the earlier
 * cycles' decay. Heights, potentials, couples and verdicts are those of the wave itself.
 * Where no decay is left (the first cycle, a film, a wave that is not turned back) the cycle is
 * analysed as it stands.
 */
import { earlierCycleDecay, type EarlierCycleDecay } from '../baseline/earlierCycleDecay';
import type { SweepSignals } from '../peaks/sweepSignals';
import type { CycleRange } from '../types';
import { analyzeCycle } from './analyzeCycle';
import type { CycleAnalysis, ResolvedAnalyzeOptions } from './types';

/** Said in each baseline's description where the decay was added. */
export const EARLIER_CYCLES_NOTE = 'plus the decay the earlier cycles still drive (the current had the potential stayed at the cycle\'s start, from the semi-integral of the record)';

/** Analyses the cycles in turn; the signals are copied once, and only when a cycle needs it. */
export function analyzeCycles(sig: SweepSignals, cycles: CycleRange[], o: ResolvedAnalyzeOptions, thresholdA: number): CycleAnalysis[] {
  let work: SweepSignals | null = null;
  return cycles.map((c) => {
    const decay = earlierCycleDecay(sig, c);
    if (decay?.kind === 'not-at-rest') return notAtRest(analyzeCycle(sig, c, o, thresholdA), decay.share);
    if (!decay) return analyzeCycle(sig, c, o, thresholdA);
    work ??= { ...sig, currentA: Float64Array.from(sig.currentA), shownA: Float64Array.from(sig.shownA), locatingA: Float64Array.from(sig.locatingA), shownSlopeAPerV: Float64Array.from(sig.shownSlopeAPerV) };
    lift(work, decay, sig.potentialV);
    try {
      return withDecay(analyzeCycle(work, c, o, thresholdA), decay, sig);
    } finally {
      restore(work, sig, decay);
    }
  });
}

/** Takes the decay out of the working signals over its span. */
function lift(work: SweepSignals, d: EarlierCycleDecay, potentialV: Float64Array): void {
  const n = d.currentA.length;
  for (let j = 0; j < n; j++) {
    const k = d.startIndex + j;
    const y = d.currentA[j] as number;
    work.currentA[k]! -= y;
    work.shownA[k]! -= y;
    work.locatingA[k]! -= y;
    // dI/dE of the decay, by central differences (one-sided at the ends).
    const lo = Math.max(0, j - 1);
    const hi = Math.min(n - 1, j + 1);
    const dE = (potentialV[d.startIndex + hi] as number) - (potentialV[d.startIndex + lo] as number);
    if (dE !== 0) work.shownSlopeAPerV[k]! -= ((d.currentA[hi] as number) - (d.currentA[lo] as number)) / dE;
  }
}

/** Puts the signals back as they were over the decay's span. */
function restore(work: SweepSignals, sig: SweepSignals, d: EarlierCycleDecay): void {
  for (let k = d.startIndex; k < d.startIndex + d.currentA.length; k++) {
    work.currentA[k] = sig.currentA[k] as number;
    work.shownA[k] = sig.shownA[k] as number;
    work.locatingA[k] = sig.locatingA[k] as number;
    work.shownSlopeAPerV[k] = sig.shownSlopeAPerV[k] as number;
  }
}

function notAtRest(cycle: CycleAnalysis, share: number): CycleAnalysis {
  if (cycle.peaks.length === 0) return cycle;
  // A share is measured against the semi-integral at the switch before; past 100 % (a record that
  // did not start at rest, so that the earlier sweep's product is not all the product there) it
  // measures nothing and is not given.
  const how = share > 0 && share <= 1
    ? `${(share * 100).toPrecision(2)} % of it still at the surface, from the semi-integral of the current`
    : 'more of it at the surface than the earlier sweep made, by the semi-integral of the current: the record did not start at rest';
  const message = `this cycle starts before the earlier cycles' product is turned back (${how}): its baselines take it as a wave from rest, so its peak currents and ipa/ipc are not those of the couple; read cycle 1, or start the sweep further from the wave`;
  return { ...cycle, warnings: [...cycle.warnings, { code: 'NOT_AT_REST', message, cycle: cycle.index }] };
}

function withDecay(cycle: CycleAnalysis, d: EarlierCycleDecay, sig: SweepSignals): CycleAnalysis {
  const at = (k: number) => (k >= d.startIndex && k < d.startIndex + d.currentA.length ? (d.currentA[k - d.startIndex] as number) : 0);
  const nearest = (potentialV: number, from: number, to: number) => {
    let best = from;
    for (let k = from; k < to; k++) if (Math.abs((sig.potentialV[k] as number) - potentialV) < Math.abs((sig.potentialV[best] as number) - potentialV)) best = k;
    return best;
  };
  return {
    ...cycle,
    peaks: cycle.peaks.map((p) => ({
      ...p,
      rawCurrentA: p.rawCurrentA + at(p.index),
      baselineCurrentA: p.baselineCurrentA + at(p.index),
      baseline: {
        ...p.baseline,
        currentA: Float64Array.from(p.baseline.currentA, (y, j) => y + at(p.baseline.startIndex + j)),
        anchors: p.baseline.anchors.map((a) => ({ ...a, currentA: a.currentA + at(a.index ?? nearest(a.potentialV, p.baseline.startIndex, p.baseline.endIndex)) })),
        description: `${p.baseline.description}, ${EARLIER_CYCLES_NOTE}`,
      },
    })),
    windowEdges: (cycle.windowEdges ?? []).map((w) => ({ ...w, currentA: w.currentA + at((sig.segments[w.segmentIndex]?.end ?? 1) - 1) })),
  };
}
