/**
 * Turns a pair of measured peaks into a couple: Epa, Epc, E½ = (Epa + Epc)/2, ΔEp = Epa − Epc,
 * baseline-corrected ipa and ipc, the return/forward ratio, Nicholson's (1966) empirical ratio
 * from the switching current, |Ep − Ep/2| of each peak, the charges, and the verdict.
 * Sources: E½ as the peak midpoint, Wang, Analytical Electrochemistry, 2nd ed. (2000) eq. 2-2;
 *   ratio measured from the extended forward decay, Nicholson, Anal. Chem. 38 (1966) 1406
 *   (nicholsonPeakRatio.ts for the empirical form); verdict, classifyCouple.ts.
 * In: the cycle's measured peaks, the pair (indices into them), the forward direction and the
 *   sweep signals. Out: CoupleResult (currents as positive magnitudes, potentials in V).
 */
import type { CoupleResult } from './coupleTypes';
import type { PeakDirection, PeakResult } from '../peaks/peakTypes';
import { nicholsonPeakRatio } from '../baseline/nicholsonPeakRatio';
import type { SweepSignals } from '../peaks/sweepSignals';
import { classifyCouple } from './classifyCouple';
import { switchChargingStep } from '../baseline/switchChargingStep';
import type { PeakPair } from './pairPeaksIntoCouples';

export interface BuildCoupleOptions {
  temperatureK: number;
  electronCount: number;
}

export function buildCouple(sig: SweepSignals, peaks: PeakResult[], pair: PeakPair, forwardDirection: PeakDirection, options: BuildCoupleOptions): Omit<CoupleResult, 'index'> {
  const a = pair.anodic === null ? null : peaks[pair.anodic]!;
  const c = pair.cathodic === null ? null : peaks[pair.cathodic]!;
  const fwd = forwardDirection === 'anodic' ? a : c;
  const ret = forwardDirection === 'anodic' ? c : a;
  const both = a !== null && c !== null;
  const consecutive = fwd !== null && ret !== null && ret.segmentIndex === fwd.segmentIndex + 1;
  const vertex = fwd ? sig.segments[fwd.segmentIndex]!.end - 1 : -1;
  // Nicholson's switching-current formula holds only for the couple whose peaks flank the switch.
  const flanksSwitch = consecutive && !peaks.some((p) => (p.segmentIndex === fwd.segmentIndex && p.index > fwd.index) || (p.segmentIndex === ret.segmentIndex && p.index < ret.index));
  const ratio = fwd && ret ? ret.heightA / fwd.heightA : null;
  const verdict = classifyCouple(
    {
      deltaEpV: both ? a.potentialV - c.potentialV : null,
      ratio,
      halfPeakWidthsV: { anodic: a?.halfPeakWidthV ?? null, cathodic: c?.halfPeakWidthV ?? null },
      fwhmV: { anodic: a?.fwhmV ?? null, cathodic: c?.fwhmV ?? null },
      switchPastPeakV: consecutive ? Math.abs(sig.potentialV[vertex]! - fwd.potentialV) : null,
      hasAnodic: a !== null,
      hasCathodic: c !== null,
      overlapping: a?.confidence === 'shoulder' || c?.confidence === 'shoulder',
      tailFractions: { anodic: a?.tailFraction ?? null, cathodic: c?.tailFraction ?? null },
      chargeRatio: fwd?.chargeC && ret?.chargeC != null ? ret.chargeC / fwd.chargeC : null,
      returnSweepRecorded: (fwd ?? ret)!.segmentIndex + 1 < sig.segments.length || !(fwd ?? ret)!.onFirstSweep,
    },
    options,
  );
  return {
    epaV: a?.potentialV ?? null,
    epcV: c?.potentialV ?? null,
    eHalfV: both ? (a.potentialV + c.potentialV) / 2 : null,
    deltaEpV: both ? a.potentialV - c.potentialV : null,
    ipaA: a?.heightA ?? null,
    ipcA: c?.heightA ?? null,
    ratio,
    nicholsonRatio: flanksSwitch ? empiricalRatio(sig, fwd, ret, vertex) : null,
    switchPotentialV: consecutive ? sig.potentialV[vertex]! : null,
    forwardDirection,
    anodicPeak: pair.anodic,
    cathodicPeak: pair.cathodic,
    anodicHalfPeakWidthV: a?.halfPeakWidthV ?? null,
    cathodicHalfPeakWidthV: c?.halfPeakWidthV ?? null,
    anodicChargeC: a?.chargeC ?? null,
    cathodicChargeC: c?.chargeC ?? null,
    verdict,
  };
}

/**
 * Nicholson (1966): return peak and switching current from zero, signed along each sweep. The
 * formula wants faradaic currents; the double-layer charging current i_c flips sign at the switch,
 * so half the charging step there (switchChargingStep.ts: each side's trend extrapolated to the
 * switch, the faradaic kink apart) is taken off both (our correction; 0 without charging).
 */
function empiricalRatio(sig: SweepSignals, fwd: PeakResult, ret: PeakResult, vertex: number): number {
  const sFwd = fwd.direction === 'anodic' ? 1 : -1;
  const rSeg = sig.segments[ret.segmentIndex]!;
  const step = switchChargingStep({ potentialV: sig.potentialV, timeS: sig.timeS, currentA: sig.currentA, vertexIndex: vertex, returnStart: rSeg.start, returnEnd: rSeg.end });
  const chargingA = step === null ? 0 : (sFwd * step) / 2;
  return nicholsonPeakRatio({
    forwardPeakA: fwd.heightA,
    returnPeakFromZeroA: -sFwd * ret.rawCurrentA - chargingA,
    switchingCurrentFromZeroA: sFwd * sig.currentA[vertex]! - chargingA,
  });
}
