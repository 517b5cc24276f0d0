/**
 * The reason lines behind classifyCouple.ts verdicts: surface-wave evidence, the irreversible
 * half-peak width read as αn, the ratio band for follow-up chemistry and the |Ep − Ep/2| lines.
 * Sources are named at each function; thresholds are explained in classifyCouple.ts.
 */
import { thermalVoltageV } from '../constants';
import type { VerdictEvidence } from './coupleTypes';
import type { ClassifyCoupleInput } from './classifyCouple';
import { kineticRatioEnvelope } from './kineticRatioEnvelope';

import { formatMillivolts as mv } from '../units';

export { mv };

/**
 * Evidence of a surface-confined wave whatever its ΔEp: both peaks fall back to their baselines
 * (tail ≤ 0.15 of ip 6RT/nF past Ep, where a diffusing species keeps ≈ 0.5; simulated in
 * classifyCouple.test.ts), equal charges (0.85…1.15), and no peak narrower than 0.75 of
 * the ideal 3.53RT/nF (Laviron kinetics only broaden it; Laviron, J. Electroanal. Chem. 101
 * (1979) 19, from memory). Thresholds: common practice, no source. Null when any test fails.
 */
export function surfaceWaveReasons(input: ClassifyCoupleInput, e: VerdictEvidence, u: number): string[] | null {
  const tails = input.tailFractions;
  if (!tails || tails.anodic == null || tails.cathodic == null) return null;
  if (Math.max(Math.abs(tails.anodic), Math.abs(tails.cathodic)) > 0.15) return null;
  const q = input.chargeRatio ?? null;
  if (q !== null && (q < 0.85 || q > 1.15)) return null;
  const widths = [input.fwhmV.anodic, input.fwhmV.cathodic].filter((w): w is number => w !== null);
  if (widths.some((w) => w < 0.75 * e.adsorbedFwhmV)) return null;
  const reasons = [`both peaks fall back to their baselines: ${(100 * tails.anodic).toFixed(1)} % (anodic) and ${(100 * tails.cathodic).toFixed(1)} % (cathodic) of ip at ${mv(6 * u)} past Ep, where a diffusing species still carries about half — no diffusion tail`];
  if (q !== null) reasons.push(`return/forward charge = ${q.toFixed(3)}: what the forward sweep converts comes back (1 for a surface-confined couple)`);
  for (const side of ['anodic', 'cathodic'] as const) {
    const w = input.fwhmV[side];
    if (w !== null) reasons.push(`${side} FWHM = ${mv(w)} (ideal adsorbed layer 3.53RT/nF = ${mv(e.adsorbedFwhmV)}; slow electron transfer broadens it)`);
  }
  return reasons;
}

/**
 * αn from each peak's |Ep − Ep/2| = 1.857·RT/(αnF) (Bard & Faulkner 2nd ed. §6.3, from memory;
 * Wang (2000) §2-1.1.2: 48/(αn) mV), the totally irreversible shape.
 */
export function irreversibleWidthReasons(input: ClassifyCoupleInput, temperatureK: number): string[] {
  const out: string[] = [];
  for (const side of ['anodic', 'cathodic'] as const) {
    const w = input.halfPeakWidthsV[side];
    if (w !== null && w > 0) out.push(`${side} |Ep − Ep/2| = ${mv(w)} reads as αn = ${((1.857 * thermalVoltageV(temperatureK)) / w).toFixed(2)} for a totally irreversible wave (1.857RT/αnF)`);
  }
  return out;
}

/**
 * Ratio band outside which the return peak is put down to chemistry: 0.8…1.2 around what slow
 * electron transfer with 0.3 ≤ α ≤ 0.7 gives at this n·ΔEp (kineticRatioEnvelope.ts), i.e.
 * [0.8·low, 1.2·high]; 0.8…1.2 for a reversible separation.
 */
export function ratioBand(nDeltaEp25V: number): { low: number; high: number; text: string } {
  const e = kineticRatioEnvelope(nDeltaEp25V);
  const low = 0.8 * e.low;
  const high = 1.2 * e.high;
  const kinetic = e.low < 1 ? `; electron transfer with α = 0.3…0.7 alone gives ${e.low.toFixed(2)}…${e.high.toFixed(2)} here` : '';
  return { low, high, text: `${low.toFixed(2)}…${high.toFixed(2)}${kinetic}` };
}

export function halfWidthReasons(input: ClassifyCoupleInput, e: VerdictEvidence): string[] {
  const out: string[] = [];
  for (const side of ['anodic', 'cathodic'] as const) {
    const w = input.halfPeakWidthsV[side];
    if (w !== null) out.push(`${side} |Ep − Ep/2| = ${mv(w)} (reversible: 2.20RT/nF = ${mv(e.reversibleHalfPeakWidthV)})`);
  }
  return out;
}
