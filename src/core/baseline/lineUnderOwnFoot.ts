/**
 * The pre-peak line of a wave with a known shape, fitted with the wave's own foot taken out.
 *
 * A diffusion wave starts long before its peak: its foot rises as e^(−ξ), and Nicholson & Shain's
 * integral equation (Anal. Chem. 36 (1964) 706, eq. 24) gives √π·χ = e^(−ξ) there, i.e.
 * i/ip = e^(−ξ)/0.4463 (ξ = nF(E − E½)/RT along a reduction sweep): 0.1 % of the peak 200 mV
 * before E½ (n = 1, 25 °C), 1 % at 140 mV. A Nernstian adsorbed layer's 4e^ξ/(1 + e^ξ)² (Laviron,
 * J. Electroanal. Chem. 52 (1974) 355) is as wide: 1.2 % of its peak 150 mV before E°′. A straight
 * line fitted through that convex rise and extrapolated under the peak leans towards it: a sweep
 * that starts 200 mV before E½ read a reversible couple's ip 3 % low (150 mV: 10 %). Here the foot,
 * the wave's height times its shape placed by its Ep (knownWaveShapes.ts), is
 * subtracted from the window before the line is fitted, and the height is measured again over the
 * new line (four passes).
 *
 * For a wave whose |Ep − Ep/2| is a known shape's (2.20 RT/nF for a dissolved couple, 1.763 for a
 * Nernstian film; ± 10 %) and whose tail agrees (a dissolved couple's stays up, a film's falls).
 * A wider wave with a dissolved couple's tail has slow electron transfer: its foot rises more
 * slowly (as e^(−αξ)) and reaches further, and its shape comes from kineticWaveShape.ts: α = 0.5,
 * placed by the peak's distance from the midpoint of its couple (`partnerV`, the return peak), its
 * width agreeing. A slow wave with no return peak, or one whose width says α is far from 0.5,
 * keeps the plain line.
 * The diffusion shape starts far before the wave; where the record's first sweep starts so close
 * that the foot carries over 0.3 % of the peak at its start (150 mV before E½ for n = 1), the
 * started wave's own shape is used instead (startedWaveFoot.ts). Null otherwise (the plain line is then used).
 */
import type { PeakCandidate } from '../peaks/locatePeaksInSweep';
import type { SweepSignals } from '../peaks/sweepSignals';
import { crossing } from '../peaks/levelCrossing';
import { thermalVoltageV } from '../constants';
import type { BaselineCurve } from './baselineTypes';
import { linearPrePeakBaseline } from './linearPrePeakBaseline';
import { waveShapeFor, type WaveShape } from './knownWaveShapes';
import { kineticWaveShapeFor, type KineticWaveShape } from './kineticWaveShape';
import { lineThrough, lineUnderStartedFoot, sweepStartOnFoot } from './startedWaveFoot';

const PASSES = 4;
/** Said in the description of a line drawn under the wave's own foot (usesOwnFoot). */
const OWN_FOOT_WORDS = "the wave's own foot";

/** Whether a baseline was drawn under a wave's own foot of a far-started shape (this file). */
export function usesOwnFoot(curve: BaselineCurve): boolean {
  return curve.description.includes(OWN_FOOT_WORDS);
}
/** How far past Ep the tail is read (in RT/nF), and the least it may have kept of the height there. */
const TAIL_AT = 3;
const TAIL_KEPT = 0.5;

export function lineUnderOwnFoot(
  sig: SweepSignals,
  peak: PeakCandidate,
  window: [number, number],
  wave: { temperatureK: number; electronCount: number },
  partnerV?: number,
): BaselineCurve | null {
  const seg = sig.segments[peak.segmentIndex]!;
  const s = seg.direction === 'positive' ? 1 : -1;
  const nfrt = wave.electronCount / thermalVoltageV(wave.temperatureK);
  const [fitStart, fitEnd] = window;
  const spanStart = Math.min(fitStart, peak.index);
  // ξ of the wave at point j, counted from its peak and decreasing along the sweep.
  const xiFromPeak = (j: number) => -s * nfrt * (sig.potentialV[j]! - peak.potentialV);
  // The peak's distance from the midpoint of its couple (E°′ for α = 0.5), in RT/nF.
  const pastMidpoint = partnerV === undefined ? undefined : (Math.abs(peak.potentialV - partnerV) / 2) * nfrt;
  // The record's first sweep (from rest) started on the wave's foot: the started wave's own shape.
  if (peak.segmentIndex === 0 && sweepStartOnFoot(sig, peak, nfrt)) {
    const started = lineUnderStartedFoot(sig, peak, window, nfrt);
    if (started && diffusing(sig, peak, started.under, started.height, nfrt, s)) return started.curve;
  }
  let foot = (_j: number) => 0;
  let shape: WaveShape | undefined;
  let kinetic: KineticWaveShape | null = null;
  for (let pass = 0; pass <= PASSES; pass++) {
    const line = lineThrough(sig, fitStart, fitEnd, (j) => sig.currentA[j]! - foot(j));
    if (!line) return null;
    const under = (j: number) => line.intercept + line.slope * sig.potentialV[j]!;
    const height = s * (sig.locatingA[peak.index]! - under(peak.index));
    if (!(height > 0)) return null;
    const halfV = crossing(sig, (j) => s * (sig.locatingA[j]! - under(j)), peak.index, spanStart, -1, height / 2);
    if (halfV === null) return null;
    const width = Math.abs(peak.potentialV - halfV) * nfrt;
    const found = waveShapeFor(width);
    if (pass === 0) {
      const tail = diffusing(sig, peak, under, height, nfrt, s);
      if (found) {
        if (tail !== found.diffusing) return null;
      } else {
        // Wider than a reversible wave, with a dissolved species' tail: slow electron transfer.
        kinetic = tail && pastMidpoint !== undefined ? kineticWaveShapeFor(width, pastMidpoint) : null;
        if (!kinetic) return null;
      }
    }
    let at: (xi: number) => number;
    if (kinetic) {
      // The width is measured again over each new line; the shape follows it.
      kinetic = kineticWaveShapeFor(width, pastMidpoint!) ?? kinetic;
      at = kinetic.at;
    } else {
      if (!found || (shape && found !== shape)) return null;
      shape = found;
      at = found.at;
    }
    if (pass < PASSES) foot = (j) => s * height * at(xiFromPeak(j));
  }
  const words = kinetic ? kinetic.words : shape!.words;
  return linearPrePeakBaseline(
    { potentialV: sig.potentialV, currentA: sig.currentA, fitStart, fitEnd, spanStart, spanEnd: seg.end },
    { less: { what: `${OWN_FOOT_WORDS}, from ${words}`, currentA: foot } },
  ).curve;
}

/**
 * Whether the wave's tail stays up: a dissolved species' wave keeps 0.68 of its height 3 RT/nF past
 * Ep (reversibleWaveShape.ts); an adsorbed layer's has fallen to 0.18 (Nernstian) and, broadened by
 * slow kinetics to a dissolved couple's half-peak width, still well below half. False also when
 * the sweep ends before that point.
 */
function diffusing(sig: SweepSignals, peak: PeakCandidate, under: (j: number) => number, height: number, nfrt: number, s: 1 | -1): boolean {
  const seg = sig.segments[peak.segmentIndex]!;
  for (let j = peak.index; j < seg.end; j++) {
    if (s * (sig.potentialV[j]! - peak.potentialV) * nfrt < TAIL_AT) continue;
    return s * (sig.locatingA[j]! - under(j)) >= TAIL_KEPT * height;
  }
  return false;
}
