/**
 * Single-voltammogram verdict on a redox couple, with the numbers behind it.
 * Diagnostic values (all multiples of RT/nF, so they follow the stated temperature):
 *   reversible ΔEp = 2.218·RT/nF in the large-switch limit, and the switch-dependent value of
 *     Nicholson, Anal. Chem. 37 (1965) 1351 (reversibleDeltaEpAtSwitch.ts);
 *   reversible |Ep − Ep/2| = 2.20·RT/nF (Nicholson & Shain, Anal. Chem. 36 (1964) 706; Bard &
 *     Faulkner 2nd ed. §6.2, from memory);
 *   ideal adsorbed peak: ΔEp = 0, FWHM = 4·ln(1 + √2)·RT/nF = 3.5255·RT/nF (Bard & Faulkner 2nd ed.
 *     §14.3; Laviron, J. Electroanal. Chem. 52 (1974) 355, from memory);
 *   return/forward ratio = 1 for a chemically stable product (Wang, Analytical Electrochemistry,
 *     2nd ed. (2000) §2-1.1.1).
 * Thresholds (common practice, no source): 'reversible' when ΔEp ≤ the switch-dependent value
 *   + 0.31·RT/nF (8/n mV at 25 °C); 'irreversible' beyond 8.25·RT/nF (212/n mV at 25 °C, the last row
 *   of Nicholson's ψ table, ψ = 0.1) or with one peak only; 'chemically-coupled' when the ratio lies
 *   outside 0.8…1.2 widened by what slow electron transfer alone does to it at the measured ΔEp
 *   (kineticRatioEnvelope.ts: [0.8·low, 1.2·high]); 'adsorbed' when |ΔEp| ≤ 1.109·RT/nF and each measurable FWHM lies within
 *   ±25 % of 3.5255·RT/nF; 'adsorbed' also, at any ΔEp, when both peaks close with equal charges
 *   (surfaceWaveReasons), with the label naming slow (Laviron) electron transfer when ΔEp > 1.109·RT/nF.
 */
import { thermalVoltageV, STANDARD_TEMPERATURE_K } from '../constants';
import type { Verdict, VerdictCategory, VerdictEvidence } from './coupleTypes';
import { halfWidthReasons, irreversibleWidthReasons, mv, ratioBand, surfaceWaveReasons } from './classifyCoupleReasons';
import { reversibleDeltaEpAtSwitch, reversibleDeltaEpLimitV } from './reversibleDeltaEpAtSwitch';

export const VERDICT_LABELS: Record<VerdictCategory, string> = {
  reversible: 'reversible (diffusion, fast electron transfer)',
  'quasi-reversible': 'quasi-reversible (diffusion, slower electron transfer)',
  'irreversible': 'irreversible (slow electron transfer, or no usable return peak)',
  'chemically-coupled': 'chemically coupled (return peak differs from forward peak)',
  adsorbed: 'surface-confined (adsorbed redox species)',
  inconclusive: 'not classified (the numbers do not fit one picture)',
};

export interface ClassifyCoupleInput {
  deltaEpV: number | null;
  ratio: number | null;
  halfPeakWidthsV: { anodic: number | null; cathodic: number | null };
  fwhmV: { anodic: number | null; cathodic: number | null };
  /** Distance of the switch past the forward peak (V), when known. */
  switchPastPeakV: number | null;
  /** Which peaks exist. */
  hasAnodic: boolean;
  hasCathodic: boolean;
  /** True when a peak of the couple is only a shoulder of another wave. @default false */
  overlapping?: boolean;
  /** False when the lone peak's sweep is never reversed (a single linear sweep). @default true */
  returnSweepRecorded?: boolean;
  /** Corrected current 6·RT/nF past each Ep over its ip (PeakResult.tailFraction). */
  tailFractions?: { anodic: number | null; cathodic: number | null };
  /** Return/forward charge under the corrected peaks. */
  chargeRatio?: number | null;
}

export interface ClassifyCoupleOptions {
  /** @default 298.15 */
  temperatureK?: number;
  /** @default 1 */
  electronCount?: number;
}


/**
 * Verdict from the single-voltammogram numbers. A couple with a shoulder peak is reported as
 * 'inconclusive' with the verdict the numbers alone would give among its reasons, because heights
 * and ratio of overlapping waves are not trustworthy.
 */
export function classifyCouple(input: ClassifyCoupleInput, options: ClassifyCoupleOptions = {}): Verdict {
  const v = classifyFromNumbers(input, options);
  if (!input.overlapping) return v;
  const reasons = ['a peak of this couple is only a shoulder of another wave: its height, ratio and width are unreliable', `the numbers alone would say: ${v.label}`, ...v.reasons];
  return { ...v, category: 'inconclusive', label: 'not classified (overlapping waves)', reasons };
}

/** The measured numbers next to their theoretical values for this n and T. */
function buildEvidence(input: ClassifyCoupleInput, temperatureK: number, n: number): VerdictEvidence {
  const u = thermalVoltageV(temperatureK) / n;
  return {
    temperatureK,
    electronCount: n,
    deltaEpV: input.deltaEpV,
    reversibleDeltaEpLimitV: reversibleDeltaEpLimitV(n, temperatureK),
    reversibleDeltaEpAtSwitchV: input.switchPastPeakV === null ? null : reversibleDeltaEpAtSwitch(input.switchPastPeakV, { electronCount: n, temperatureK }).deltaEpV,
    reversibleHalfPeakWidthV: 2.2 * u,
    halfPeakWidthsV: input.halfPeakWidthsV,
    ratio: input.ratio,
    fwhmV: input.fwhmV,
    adsorbedFwhmV: 3.5255 * u,
  };
}

function classifyFromNumbers(input: ClassifyCoupleInput, options: ClassifyCoupleOptions): Verdict {
  const temperatureK = options.temperatureK ?? STANDARD_TEMPERATURE_K;
  const n = options.electronCount ?? 1;
  const u = thermalVoltageV(temperatureK) / n;
  const evidence = buildEvidence(input, temperatureK, n);
  const atSwitch = evidence.reversibleDeltaEpAtSwitchV;
  const verdict = (category: VerdictCategory, reasons: string[], label = VERDICT_LABELS[category]): Verdict => ({ category, label, reasons, evidence });
  if (!input.hasAnodic || !input.hasCathodic || input.deltaEpV === null) {
    const missing = input.hasAnodic ? 'cathodic' : 'anodic';
    if (input.returnSweepRecorded === false) {
      return verdict('inconclusive', [`no ${missing} peak can be looked for: the sweep was never reversed`], 'not classified (no return sweep recorded)');
    }
    // One trace cannot tell slow electron transfer from a fast one whose product a fast reaction
    // consumes (EC, Nicholson & Shain, Anal. Chem. 36 (1964) 706): both lose the return peak.
    return verdict('irreversible', [`no ${missing} partner peak was found for this wave: either slow electron transfer, or a fast one whose product a fast follow-up reaction consumes (EC); a scan-rate series tells them apart (the forward peak moving 29.6/n mV per decade, |Ep − Ep/2| = 1.857·RT/nF)`], 'irreversible (no return peak; or EC with a fast follow-up reaction)');
  }
  const dEp = input.deltaEpV;
  const surface = surfaceWaveReasons(input, evidence, u);
  if (surface) {
    const slow = dEp > 1.109 * u;
    const dEpText = `ΔEp = ${mv(dEp)}${slow ? ': electron transfer of the layer is slow at this scan rate (Laviron); k_s follows from ΔEp over a scan-rate series' : ': close to 0, as for a fast adsorbed couple'}`;
    return verdict('adsorbed', [...surface, dEpText], slow ? 'surface-confined (adsorbed; slow electron transfer, Laviron)' : VERDICT_LABELS.adsorbed);
  }
  const expected = atSwitch ?? evidence.reversibleDeltaEpLimitV;
  const expectText = atSwitch === null ? `2.218RT/nF = ${mv(expected)}` : `${mv(expected)} expected for a reversible couple at this switching potential (2.218RT/nF = ${mv(evidence.reversibleDeltaEpLimitV)})`;
  const dEpReason = `ΔEp = ${mv(dEp)} against ${expectText}`;
  const ratioReason = input.ratio === null ? 'return/forward ratio not measurable' : `return/forward peak-current ratio = ${input.ratio.toFixed(3)} (1 for a stable product)`;
  const widthReasons = halfWidthReasons(input, evidence);
  if (dEp >= 8.25 * u) {
    return verdict('irreversible', [
      `${dEpReason}: beyond ${mv(8.25 * u)}, the end of Nicholson's ψ table`,
      'both peaks are present: the return peak exists but lies far out, so electron transfer is slow (totally irreversible), not the product lost',
      ratioReason,
      ...widthReasons,
      ...irreversibleWidthReasons(input, temperatureK),
    ], 'irreversible (slow electron transfer)');
  }
  if (Math.abs(dEp) <= 1.109 * u) return classifySmallSeparation(verdict, input, evidence, dEpReason, ratioReason);
  const band = ratioBand(dEp * n * (STANDARD_TEMPERATURE_K / temperatureK));
  if (input.ratio !== null && (input.ratio < band.low || input.ratio > band.high)) {
    const label = input.ratio < 1 ? 'chemically coupled (product consumed by a follow-up reaction)' : 'chemically coupled or product adsorbed (return peak larger than forward)';
    return verdict('chemically-coupled', [`${ratioReason}: outside ${band.text}`, dEpReason, ...widthReasons], label);
  }
  const kineticRatio = input.ratio !== null && (input.ratio < 0.8 || input.ratio > 1.2) ? [`the ratio departs from 1 only as far as slow electron transfer alone explains at this ΔEp (${band.text}); no follow-up chemistry is needed`] : [];
  if (dEp < expected - 0.4 * u) {
    return verdict('inconclusive', [`${dEpReason}: smaller than diffusion theory allows, yet too large for an adsorbed layer`, ratioReason, ...kineticRatio, ...widthReasons]);
  }
  if (dEp <= expected + 0.31 * u) return verdict('reversible', [`${dEpReason}: within ${mv(0.31 * u)}`, ratioReason, ...kineticRatio, ...widthReasons]);
  return verdict('quasi-reversible', [
    `${dEpReason}: wider by ${mv(dEp - expected)}, below the irreversible limit ${mv(8.25 * u)}`,
    ratioReason,
    ...kineticRatio,
    ...widthReasons,
    'uncompensated resistance widens ΔEp in the same way; correct for iR drop or check that ΔEp grows with scan rate before reading this as slow kinetics',
  ]);
}

function classifySmallSeparation(
  verdict: (c: VerdictCategory, r: string[], l?: string) => Verdict,
  input: ClassifyCoupleInput,
  e: VerdictEvidence,
  dEpReason: string,
  ratioReason: string,
): Verdict {
  const reasons = [`${dEpReason}: close to 0, as for an adsorbed layer`, ratioReason];
  let fitsShape = true;
  for (const side of ['anodic', 'cathodic'] as const) {
    const w = input.fwhmV[side];
    if (w === null) continue;
    reasons.push(`${side} FWHM = ${mv(w)} (ideal adsorbed layer: 3.53RT/nF = ${mv(e.adsorbedFwhmV)})`);
    if (Math.abs(w / e.adsorbedFwhmV - 1) > 0.25) fitsShape = false;
  }
  if (input.fwhmV.anodic === null && input.fwhmV.cathodic === null) reasons.push('FWHM not measurable on either peak');
  return fitsShape ? verdict('adsorbed', reasons) : verdict('inconclusive', [...reasons, 'peak widths do not match an ideal adsorbed layer']);
}
