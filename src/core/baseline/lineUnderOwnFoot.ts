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
 * width agreeing. Any other slow wave (no return peak, or a width that says α is far from 0.5) is
 * tried as totally irreversible (irreversibleWaveShape.ts: one shape for every α, α from the
 * width), whose foot reaches furthest: a plain line read such waves 0.3–1.1 % low even from 0.7–0.9 V
 * before their peak. That foot is taken out only where the window and the wave's rising part show
 * it (showsIrreversibleFoot); otherwise the plain line stays.
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
import { irreversibleWaveShapeFor, type IrreversibleWaveShape } from './irreversibleWaveShape';
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
/** A totally irreversible wave's foot is taken out only where the window shows it (showsIrreversibleFoot). */
const FOOT_AGREES = 0.2;
const FOOT_KNOWN = 0.25;
const RISE_SHARE = 0.005;
const RISE_NOISE = 2;

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
  // A slow wave's shape, picked again by each pass's width: the α = 0.5 wave placed by its couple,
  // else the totally irreversible wave of that width.
  let slow: KineticWaveShape | IrreversibleWaveShape | null = null;
  let pick: ((width: number) => KineticWaveShape | IrreversibleWaveShape | null) | null = null;
  let under = (_j: number) => 0;
  let height = 0;
  for (let pass = 0; pass <= PASSES; pass++) {
    const line = lineThrough(sig, fitStart, fitEnd, (j) => sig.currentA[j]! - foot(j));
    if (!line) return null;
    under = (j: number) => line.intercept + line.slope * sig.potentialV[j]!;
    height = s * (sig.locatingA[peak.index]! - under(peak.index));
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
        if (!tail) return null;
        const placed = pastMidpoint === undefined ? null : kineticWaveShapeFor(width, pastMidpoint);
        pick = placed ? (w) => kineticWaveShapeFor(w, pastMidpoint!) : irreversibleWaveShapeFor;
      }
    }
    let at: (xi: number) => number;
    if (pick) {
      // The width is measured again over each new line; the shape follows it.
      slow = pick(width) ?? slow;
      if (!slow) return null;
      at = slow.at;
    } else {
      if (!found || (shape && found !== shape)) return null;
      shape = found;
      at = found.at;
    }
    if (pass < PASSES) foot = (j) => s * height * at(xiFromPeak(j));
  }
  if (slow && 'alpha' in slow) {
    const irreversible = slow;
    if (!showsIrreversibleFoot(sig, peak, window, under, height, (j) => irreversible.at(xiFromPeak(j)), s)) return null;
  }
  const words = slow ? slow.words : shape!.words;
  return linearPrePeakBaseline(
    { potentialV: sig.potentialV, currentA: sig.currentA, fitStart, fitEnd, spanStart, spanEnd: seg.end },
    { less: { what: `${OWN_FOOT_WORDS}, from ${words}`, currentA: foot } },
  ).curve;
}

/**
 * Whether a wave given the totally irreversible shape (irreversibleWaveShape.ts) is one. One width
 * cannot tell: a quasi-reversible couple with α far from 0.5, a reversible wave widened by an
 * ohmic drop, or one followed by a chemical step can be as wide, and their foot before the wave is
 * far smaller than the irreversible one's (the back reaction holds it near E°′). Taken out in full
 * it then tilts the line the other way, and ip read 1–56 % high on simulated couples (k° 3e-4 to
 * 3e-3 cm/s with α = 0.3, 1 kΩ at 1 V/s, EC) where the plain line read 0.05–10 % low. So the
 * wave must show that foot where the line is fitted and that shape where it rises:
 * - in the window, the foot's amplitude fitted freely beside the line (the same least squares with
 *   the shape as a third column) lies within FOOT_AGREES + 2 standard errors of the wave's height,
 *   and that standard error (from the noise σ) is at most FOOT_KNOWN of the height: a window too
 *   noisy to see the foot keeps the plain line. On the simulations: irreversible waves 0.98–1.09
 *   of the height, the others 0.02–0.87 (1.23 for one that starts on its foot, caught below);
 * - from the window's end to the peak, the current over the line stays within
 *   max(RISE_SHARE of the height, RISE_NOISE·σ) of the shape: irreversible waves 0.03–0.24 %
 *   (0.4 % where the sweep starts on the foot), the others 0.36–7 %.
 * Our criteria and margins, set on those simulations.
 */
function showsIrreversibleFoot(
  sig: SweepSignals,
  peak: PeakCandidate,
  window: [number, number],
  under: (j: number) => number,
  height: number,
  shape: (j: number) => number,
  s: 1 | -1,
): boolean {
  const [from, to] = window;
  // The foot's amplitude beside a free line: both taken off their own line through the window.
  const ly = lineThrough(sig, from, to, (j) => s * sig.currentA[j]!);
  const lf = lineThrough(sig, from, to, shape);
  if (!ly || !lf) return false;
  let sff = 0;
  let sfy = 0;
  for (let j = from; j < to; j++) {
    const e = sig.potentialV[j]!;
    const f = shape(j) - (lf.intercept + lf.slope * e);
    sff += f * f;
    sfy += f * (s * sig.currentA[j]! - (ly.intercept + ly.slope * e));
  }
  if (!(sff > 0)) return false;
  const amplitude = sfy / sff;
  const stdErr = sig.noiseA / Math.sqrt(sff);
  if (!(stdErr <= FOOT_KNOWN * height) || !(Math.abs(amplitude / height - 1) <= FOOT_AGREES + (2 * stdErr) / height)) return false;
  const limit = Math.max(RISE_SHARE * height, RISE_NOISE * sig.noiseA);
  for (let j = to; j < peak.index; j++) if (!(Math.abs(s * (sig.locatingA[j]! - under(j)) - height * shape(j)) <= limit)) return false;
  return true;
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
