/**
 * Baseline for the return peak of a wave that has closed before the switch (a surface-confined
 * layer): the charging/leakage line of the forward sweep, with its slope in E kept and its offset
 * re-measured on the return sweep itself, between the switch and the return wave's foot.
 * Why: the double-layer charging current i_c = A·C_d·v changes sign at the switch (Bard &
 *   Faulkner, Electrochemical Methods, 2nd ed. (2001) §1.2, from memory), so no
 *   forward baseline may be carried across it, while the short stretch before the return foot is
 *   too curved near a nearby foot to give a trustworthy slope of its own. The slope is shared by
 *   both sweeps (a tilted background); the offset is the mean residual over the half of the
 *   return pre-peak window nearest the switch. Design choice, no published source.
 * In: sweep signals, the return peak, the forward peak's background (A, IUPAC, as a function of
 *   point index), the pre-peak window [fitStart, fitEnd) on the return sweep. Out: the line
 *   sampled from fitStart to the end of the return sweep, method 'linear'.
 */
import type { BaselineCurve } from './baselineTypes';
import type { PeakCandidate } from '../peaks/locatePeaksInSweep';
import type { SweepSignals } from '../peaks/sweepSignals';
import { anchorAt, formatMv, sampleBaseline } from './baselineCurve';

export interface SwitchedChargingInput {
  forwardBackground: (index: number) => number | null;
  forwardPeakIndex: number;
  fitStart: number;
  fitEnd: number;
}

export function switchedChargingBaseline(sig: SweepSignals, peak: PeakCandidate, input: SwitchedChargingInput): BaselineCurve | null {
  const fSeg = sig.segments[peak.segmentIndex - 1];
  const seg = sig.segments[peak.segmentIndex]!;
  if (!fSeg) return null;
  const k1 = fSeg.start;
  const k2 = fSeg.end - 1;
  const b1 = input.forwardBackground(k1);
  const b2 = input.forwardBackground(k2);
  const dE = sig.potentialV[k2]! - sig.potentialV[k1]!;
  if (b1 === null || b2 === null || dE === 0) return null;
  const slope = (b2 - b1) / dE;
  const end = input.fitStart + Math.max(2, Math.floor((input.fitEnd - input.fitStart) / 2));
  if (end > input.fitEnd) return null;
  let sum = 0;
  for (let k = input.fitStart; k < end; k++) sum += sig.currentA[k]! - slope * sig.potentialV[k]!;
  const offset = sum / (end - input.fitStart);
  return sampleBaseline(sig.potentialV, input.fitStart, seg.end, (k) => offset + slope * sig.potentialV[k]!, {
    method: 'linear',
    anchors: [anchorAt(sig, input.fitStart), anchorAt(sig, end - 1)],
    description: `forward background slope ${(slope * 1e6).toExponential(3)} µA/V kept; offset from ${end - input.fitStart} points of the return sweep from ${formatMv(sig.potentialV[input.fitStart]!)} to ${formatMv(sig.potentialV[end - 1]!)} (the wave closed before the switch, and the charging current changes sign there)`,
  });
}
