/**
 * Uncompensated resistance against slow electron transfer: how much of the growth of ΔEp with
 * scan rate the ohmic drop at the two peaks can account for, and whether k° is then only a lower
 * bound.
 * In: per file its scan rate (V/s), ΔEp (V), the reversible ΔEp expected at its switching potential
 *   (V), and the signed total currents at Epa and Epc (A, IUPAC); n, T and the user's Ru (Ω, 0
 *   when none was given). Out: per file the widening and the drop (V), whether ΔEp grows, the
 *   drop's share of the widening, the Ru that alone would explain the widening at the fastest file,
 *   and the verdict on k°.
 * Sources: an uncompensated resistance moves each peak by i·Ru and widens ΔEp as slow kinetics do
 *   (Bard & Faulkner, Electrochemical Methods 2nd ed. (2001) §1.3.4 and §6.5, from memory).
 *   Near the reversible end (Nicholson, Anal. Chem. 37, 1351 (1965), Table I: ψ ≥ 2 for
 *   n·ΔEp ≤ 72 mV) the kinetic widening grows about as 1/ψ ∝ v^½, just as i_p·Ru does, so one
 *   concentration cannot tell them apart (the ohmic part scales with concentration, the kinetic
 *   one does not). Correcting E − i·Ru after the measurement leaves part of the ohmic widening,
 *   because the interface was not swept linearly (measured with this project's simulator: a
 *   Nernstian couple with 300 Ω, corrected, still widens from 62 to 75 mV over 0.1–2 V/s).
 * Rules (ours; common practice, no source): ΔEp grows when the fastest file's exceeds the
 *   slowest's by more than 2/n mV (25 °C). With Ru given, k° is a lower bound when at a widening
 *   file that widens most the drop |Δi|·Ru is at least half the widening. Without Ru, k° is a lower
 *   bound when every file stays within n·ΔEp ≤ 72 mV (25 °C). Beyond that, without Ru, k° stands
 *   as if all the widening were kinetic, but when one Ru explains every file's widening within ±11 %
 *   (OHMIC_STEADY_SPREAD) and no less steadily than one k° does (weighOhmicAgainstKinetics), the
 *   text says so and names that Ru. It does not turn k° into a bound: over the ψ range where both
 *   fit, the two scatter alike (a simulated k° = 0.01 cm/s series over one decade, with no Ru at
 *   all, reads one Ru within ±0.7 % and k° within ±1.6 %), so which fits better says nothing.
 */
import { STANDARD_TEMPERATURE_K } from '../constants';
import { formatMillivolts, formatScanRate } from '../units';

export interface OhmicWideningFile {
  fileIndex: number;
  scanRateVPerS: number;
  deltaEpV: number;
  reversibleDeltaEpV: number;
  /** i(Epa) − i(Epc), signed IUPAC currents at the two peaks (A): the ohmic ΔEp is this times Ru. */
  peakCurrentSpanA: number;
}

export interface OhmicWideningOptions {
  /** @default 1 */
  electronCount?: number;
  /** @default 298.15 */
  temperatureK?: number;
  /** The user's uncompensated resistance (Ω), already taken off the potentials; 0 when none. @default 0 */
  ruOhm?: number;
}

export interface OhmicWideningResult {
  ruOhm: number;
  perFile: Array<{ fileIndex: number; wideningV: number; ohmicDropV: number | null }>;
  grows: boolean;
  /** Drop over widening at the file that widens most; null without Ru or widening. */
  ohmicShare: number | null;
  /** Ru (Ω) that alone would explain the widening of the fastest file. */
  explainingRuOhm: number | null;
  /** True when k° can only be a lower bound on this evidence. */
  limitsK0: boolean;
  text: string;
}

const mv = formatMillivolts;

export function ohmicWidening(files: OhmicWideningFile[], options: OhmicWideningOptions = {}): OhmicWideningResult {
  const n = options.electronCount ?? 1;
  const scale = n * (STANDARD_TEMPERATURE_K / (options.temperatureK ?? STANDARD_TEMPERATURE_K));
  const ruOhm = options.ruOhm ?? 0;
  const byRate = [...files].sort((a, b) => a.scanRateVPerS - b.scanRateVPerS);
  const perFile = byRate.map((f) => ({
    fileIndex: f.fileIndex, wideningV: f.deltaEpV - f.reversibleDeltaEpV, ohmicDropV: ruOhm > 0 ? Math.abs(f.peakCurrentSpanA) * ruOhm : null,
  }));
  const first = byRate[0];
  const last = byRate[byRate.length - 1];
  const grows = !!first && !!last && last !== first && (last.deltaEpV - first.deltaEpV) * scale > 0.002;
  const lastFile = perFile[perFile.length - 1];
  const explainingRuOhm = lastFile && last && lastFile.wideningV > 0 && Math.abs(last.peakCurrentSpanA) > 0 ? lastFile.wideningV / Math.abs(last.peakCurrentSpanA) : null;
  const widest = perFile.reduce<(typeof perFile)[number] | null>((a, f) => (a === null || f.wideningV > a.wideningV ? f : a), null);
  const ohmicShare = widest && widest.ohmicDropV !== null && widest.wideningV * scale > 0.001 ? widest.ohmicDropV / widest.wideningV : null;
  const nearReversible = byRate.every((f) => f.deltaEpV * scale <= 0.072);
  const limitsK0 = grows && (ruOhm > 0 ? (ohmicShare ?? 0) >= 0.5 : nearReversible);
  return { ruOhm, perFile, grows, ohmicShare, explainingRuOhm, limitsK0, text: describe(grows, ruOhm, ohmicShare, explainingRuOhm, limitsK0, last, lastFile) };
}

/**
 * Largest max/min of the per-file Ru for the widening to count as ohmic (ours; common practice, no
 * source): simulated Nernstian couples with 150–300 Ω give one Ru within ±2 %; ±11 % leaves room
 * for the peaks' reading.
 */
export const OHMIC_STEADY_SPREAD = 1.25;

/** max/min of positive values: how steady one constant is over the files (1 = all equal). */
export const foldSpread = (x: number[]): number => Math.max(...x) / Math.min(...x);

/** A max/min spread as ± % about the geometric middle: 1.25 → "±11 %". */
export const spreadPercent = (s: number): string => `±${(((s - 1) / (s + 1)) * 100).toFixed(0)} %`;

/** Files whose widening (n·ΔEp, 25 °C) is at least this (V) enter the per-file Ru: below it the reading's rounding dominates. */
const WEIGHED_WIDENING_V = 0.003;

/**
 * Without Ru: the Ru each widening file alone would need, against the per-file k° (same files), each
 * file's k° given at one or more αc (the same αc in the same place for every file). When the Ru
 * scatter (max/min) is no larger than the smallest k° scatter over those αc, an uncompensated Ru
 * would explain the series as well as slow kinetics: k° stands, and the text says so and names the
 * Ru (limitsK0 unchanged).
 */
export function weighOhmicAgainstKinetics(
  ohmic: OhmicWideningResult, files: OhmicWideningFile[], k0ByFile: ReadonlyMap<number, readonly number[]>, options: Pick<OhmicWideningOptions, 'electronCount' | 'temperatureK'> = {},
): OhmicWideningResult {
  if (ohmic.ruOhm > 0 || ohmic.limitsK0 || !ohmic.grows) return ohmic;
  const scale = (options.electronCount ?? 1) * (STANDARD_TEMPERATURE_K / (options.temperatureK ?? STANDARD_TEMPERATURE_K));
  const rows = files.flatMap((f) => {
    const w = f.deltaEpV - f.reversibleDeltaEpV;
    const k = k0ByFile.get(f.fileIndex);
    return w * scale >= WEIGHED_WIDENING_V && Math.abs(f.peakCurrentSpanA) > 0 && k !== undefined && k.length && k.every((x) => x > 0) ? [{ ru: w / Math.abs(f.peakCurrentSpanA), k }] : [];
  });
  const ways = Math.min(...rows.map((r) => r.k.length));
  if (rows.length < 3) return ohmic;
  const ruSpread = foldSpread(rows.map((r) => r.ru));
  const kSpread = Math.min(...Array.from({ length: ways }, (_, j) => foldSpread(rows.map((r) => r.k[j]!))));
  if (ruSpread > kSpread || ruSpread > OHMIC_STEADY_SPREAD) return ohmic;
  const ru = Math.sqrt(Math.min(...rows.map((r) => r.ru)) * Math.max(...rows.map((r) => r.ru)));
  return {
    ...ohmic,
    text: `ΔEp widens in proportion to the peak current, as an ohmic drop would: one Ru ≈ ${Number(ru.toPrecision(2))} Ω explains all ${rows.length} widening files within ${spreadPercent(ruSpread)}, and their k° agree within ${spreadPercent(kSpread)}; from one concentration slow kinetics and ohmic drop cannot be told apart, so k° is given as if all the widening were kinetic: with an uncompensated Ru of that size it would be higher, up to reversible (measure Ru and enter it, or vary the concentration)`,
  };
}

function describe(grows: boolean, ruOhm: number, share: number | null, explaining: number | null, limits: boolean, last: OhmicWideningFile | undefined, lastFile: { wideningV: number; ohmicDropV: number | null } | undefined): string {
  if (!grows || !last || !lastFile) return 'ΔEp does not grow with scan rate: no ohmic or kinetic widening to weigh';
  const at = `at ${formatScanRate(last.scanRateVPerS)} ΔEp is ${mv(lastFile.wideningV)} wider than reversible`;
  if (ruOhm > 0) {
    const drop = `the iR correction (Ru = ${ruOhm} Ω) moved the peaks apart by ${mv(lastFile.ohmicDropV ?? 0)}`;
    return limits
      ? `${at}; ${drop}, ${((share ?? 0) * 100).toFixed(0)} % of the widening: a correction after the measurement leaves part of that drop, so the widening may be ohmic and k° is only a lower bound`
      : `${at}; ${drop}, ${((share ?? 0) * 100).toFixed(0)} % of the widening: the widening is taken as kinetic`;
  }
  const ru = explaining === null ? '' : `; an uncompensated resistance of ${Number(explaining.toPrecision(2))} Ω alone would explain it`;
  return limits
    ? `${at}${ru}; every ΔEp stays at the reversible end (n·ΔEp ≤ 72 mV), where slow kinetics and ohmic drop widen ΔEp alike: without Ru, k° is only a lower bound (measure Ru, or vary the concentration)`
    : `${at}${ru}; no Ru given: k° assumes the widening is kinetic`;
}
