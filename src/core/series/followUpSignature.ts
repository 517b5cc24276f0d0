/**
 * Recognises a first-order chemical reaction that consumes the product of the electron transfer
 * (EC) from what a scan-rate series shows, also when the single files disagree.
 * In: the couple's points (scan rate, peak currents, Nicholson ratio, forward |Ep − Ep/2|), its
 *   forward direction, the majority single-file verdict, the forward Ep shift (V per decade), n, T.
 * Out: which signature was seen, with its numbers, or null.
 * Signatures (R. S. Nicholson, I. Shain, Anal. Chem. 36 (1964) 706, from memory; Bard & Faulkner
 *   2nd ed. (2001) §12.3):
 *   - most files lose part of the return peak (their single-file verdict is chemically coupled);
 *   - the return/forward ratio rises towards 1 as v rises (less time for the reaction): its slope
 *     against log v is positive with a 95 % interval above 0 (or, as the ratio levels off near 1,
 *     it rises from the slowest to the fastest rate by 2√2 times the uncertainty of one ratio and
 *     never falls back by more than twice it), and the lowest ratio lies below 1 by
 *     at least twice the uncertainty of one ratio (0.03, FOLLOW_UP_RATIO_UNCERTAINTY: at most
 *     0.94), so measurably; a reversible couple without chemistry reads 0.99–1.00 here (the
 *     threshold: ours, no source). A slow reaction (λ ≲ 0.01, ratio 0.90 at the slowest rate) is
 *     then named, and k_f comes from the working curve over the series;
 *   - pure kinetic zone: the return peak is missing or below 0.3 of the forward one in most files,
 *     the forward peak moves 29.6/n mV per decade of v in the sweep direction (within 30 %) and
 *     |Ep − Ep/2| = 1.857·RT/nF (within 15 %), the shape of an irreversible wave with αn replaced by
 *     n. A totally irreversible electron transfer gives the same only with αnₐ = n (αc ≈ 1 for
 *     n = 1), which is unusual; the evidence says so.
 */
import { thermalVoltageV } from '../constants';
import type { VerdictCategory } from '../couples/coupleTypes';
import type { PeakDirection } from '../peaks/peakTypes';
import { FOLLOW_UP_RATIO_UNCERTAINTY } from '../kinetics/jointFollowUpRateConstant';
import { fitLine } from '../regression';
import type { SeriesPoint } from './seriesPoint';

export interface FollowUpSignatureInput {
  points: SeriesPoint[];
  forward: PeakDirection;
  majority: VerdictCategory;
  forwardShiftVPerDecade: number | null;
  electronCount: number;
  temperatureK: number;
}

export interface FollowUpSignature {
  kind: 'majority' | 'rising-ratio' | 'kinetic-zone';
  /** Whether the pure-kinetic-zone shape (shift and width) was seen, whatever the kind. */
  kineticZone: boolean;
  evidence: string[];
}

/** Return over forward peak current of a file, 0 when the return peak is missing. */
export function returnRatioOf(p: SeriesPoint, forward: PeakDirection): number | null {
  const [f, r] = forward === 'anodic' ? [p.ipaA, p.ipcA] : [p.ipcA, p.ipaA];
  if (f === null || !(f > 0)) return null;
  return r === null ? 0 : r / f;
}

function risingRatio(points: SeriesPoint[], forward: PeakDirection): string | null {
  const rows = points.flatMap((p) => {
    const r = p.nicholsonRatio ?? returnRatioOf(p, forward);
    return r === null ? [] : [{ v: p.scanRateVPerS, r }];
  });
  if (new Set(rows.map((x) => x.v)).size < 3) return null;
  const fit = fitLine(rows.map((x) => Math.log10(x.v)), rows.map((x) => x.r));
  const low = Math.min(...rows.map((x) => x.r));
  const ci = fit.slopeInterval;
  const sorted = [...rows].sort((a, b) => a.v - b.v);
  const slow = sorted[0]!;
  const fast = sorted[sorted.length - 1]!;
  const sigma = FOLLOW_UP_RATIO_UNCERTAINTY;
  // A ratio that levels off near 1 is curved in log v, so the line's interval can miss a real rise:
  // a rise from the slowest to the fastest rate beyond 2√2σ with no step down beyond 2σ is one too.
  const steady = sorted.every((x, i) => i === 0 || x.r > sorted[i - 1]!.r - 2 * sigma);
  const lineRises = fit.slope > 0 && ci !== null && ci[0] > 0;
  const endsRise = steady && fast.r - slow.r >= 2 * Math.SQRT2 * sigma;
  if (!(lineRises || endsRise) || low > 1 - 2 * sigma) return null;
  const rate = (v: number) => Number(v.toPrecision(6));
  const how = lineRises ? `${fit.slope.toFixed(2)} per decade, 95 % ${ci[0].toFixed(2)}–${ci[1].toFixed(2)}` : `a rise of ${(fast.r - slow.r).toFixed(3)}, beyond 2√2 × ${sigma} for two ratios, never falling back by more than ${2 * sigma}`;
  return `the return/forward ratio rises with scan rate, from ${slow.r.toFixed(2)} at ${rate(slow.v)} V/s to ${fast.r.toFixed(2)} at ${rate(fast.v)} V/s (${how}), and lies measurably below 1: the signature of a follow-up reaction (Nicholson & Shain 1964)`;
}

function kineticZone(input: FollowUpSignatureInput): string | null {
  const { points, forward, electronCount: n, temperatureK } = input;
  const ratios = points.map((p) => returnRatioOf(p, forward));
  if (ratios.filter((r) => r !== null && r < 0.3).length * 2 <= points.length) return null;
  const rt = thermalVoltageV(temperatureK);
  const expectedShift = (Math.LN10 * rt) / (2 * n);
  const s = input.forwardShiftVPerDecade;
  const signed = s === null ? null : (forward === 'anodic' ? s : -s);
  if (signed === null || Math.abs(signed / expectedShift - 1) > 0.3) return null;
  const widths = points.flatMap((p) => (p.forwardHalfPeakWidthV === null ? [] : [p.forwardHalfPeakWidthV]));
  if (!widths.length) return null;
  const w = widths.sort((a, b) => a - b)[Math.floor(widths.length / 2)]!;
  const expectedWidth = (1.857 * rt) / n;
  if (Math.abs(w / expectedWidth - 1) > 0.15) return null;
  return `the return peak is missing or below 0.3 of the forward one in most files, the forward peak moves ${(signed * 1000).toFixed(1)} mV per decade of v (29.6/n = ${(expectedShift * 1000).toFixed(1)} mV expected) and |Ep − Ep/2| = ${(w * 1000).toFixed(1)} mV (1.857RT/nF = ${(expectedWidth * 1000).toFixed(1)} mV): the pure kinetic zone of a follow-up reaction (Nicholson & Shain 1964); a totally irreversible electron transfer would need αnₐ = ${n}, which is unusual`;
}

export function followUpSignature(input: FollowUpSignatureInput): FollowUpSignature | null {
  const evidence: string[] = [];
  if (input.majority === 'chemically-coupled') evidence.push('most files lose part of the return peak (single-file verdict: chemically coupled)');
  const rising = risingRatio(input.points, input.forward);
  if (rising) evidence.push(rising);
  const zone = kineticZone(input);
  if (zone) evidence.push(zone);
  if (!evidence.length) return null;
  const kind = input.majority === 'chemically-coupled' ? 'majority' : rising ? 'rising-ratio' : 'kinetic-zone';
  return { kind, kineticZone: zone !== null, evidence };
}
