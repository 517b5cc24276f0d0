/**
 * k_s, its status and range, and E°′ of a surface-confined series couple, with the checks that tell
 * slow electron transfer from an uncompensated resistance.
 * Sources: Laviron's general working curve for every ΔEp (kinetics/lavironWorkingCurve.ts;
 *   E. Laviron, J. Electroanal. Chem. 101, 19 (1979), from memory) per file (seriesSurfaceFiles.ts);
 *   his two Ep–log v lines, slopes −2.303RT/(αc·nF) and 2.303RT/((1 − αc)nF), so that
 *   1/|s_c| + 1/s_a = nF/(2.303RT) whatever αc: the apparent n = (2.303RT/F)(1/|s_c| + 1/s_a) must
 *   be the couple's n; the ohmic separation of a Nernstian film (series/filmOhmicSeparation.ts),
 *   which grows ∝ v where slow kinetics grow ∝ log v.
 * Rules (ours; common practice, no source):
 *   - the lines are inconsistent when the apparent n is off by more than 15 % (this project's
 *     simulated Laviron films, αc 0.3–0.7, read within 3 % from two files past 200/n mV);
 *   - the slope Γ and the charge Γ disagree when they differ by more than 10 % (or the slope's
 *     range over αc misses the charge Γ by that much);
 *   - the per-file Ru (Nernstian film, all ΔEp ohmic) and the per-file k_s, over the files with
 *     n·ΔEp ≥ 20 mV (KS_STEADY_MIN_N_DELTA_EP_V), are weighed as in
 *     series/ohmicWidening.ts: when one Ru explains every file within ±11 % (max/min 1.25) and no less
 *     steadily than one k_s at any αc of the range, or k_s drifts beyond max/min 1.25 at every αc,
 *     k_s cannot be told; when one k_s is steadier, but by less than 5 %, the Ru is named beside it;
 *   - with Ru given (potentials corrected afterwards) the Nernstian film's residual separation,
 *     G(ρ)·RT/nF − |Δi|·Ru, is weighed against each ΔEp: at half or more, k_s is a lower bound.
 * In any of the first three cases k_s and Laviron's α are not given as values.
 */
import { thermalVoltageV } from '../constants';
import { FILM_OHMIC_RHO_RANGE, nernstianFilmOhmicSeparation } from '../series/filmOhmicSeparation';
import { OHMIC_STEADY_SPREAD, foldSpread, spreadPercent } from '../series/ohmicWidening';
import type { SeriesPoint } from '../series/seriesPoint';
import { median } from '../statistics/median';
import { lavironRateConstantFromSeparation } from '../kinetics/lavironWorkingCurve';
import type { ResolvedSeriesOptions } from './seriesFits';
import { KS_MIN_N_DELTA_EP_V, type SurfaceFileReading } from './seriesSurfaceFiles';
import { ASSUMED_ALPHA_RANGE } from './seriesTransferCoefficient';
import type { SurfaceRate } from './seriesTypes';

/** Largest |apparent n/n − 1| of Laviron's two lines. */
export const LAVIRON_LINES_TOLERANCE = 0.15;
/** Largest |Γ_slope/Γ_charge − 1| before the two are said to disagree. */
export const COVERAGE_AGREEMENT = 0.1;

export interface SurfaceRateInput {
  points: SeriesPoint[];
  /** The files read on the working curve at `alphas` (readSurfaceFiles). */
  rows: SurfaceFileReading[];
  alphas: number[];
  source: SurfaceRate['ksAlphaSource'];
  /** Why the lines or the two Γ say the widening is not Laviron kinetics; empty when nothing does. */
  doubts: string[];
}

const sci = (x: number) => x.toExponential(2);

/** The αc a film's k_s is read at: given, Laviron's, or 0.5 then the ends of the assumed range. */
export function surfaceAlphaSet(o: ResolvedSeriesOptions, lavironAlpha: number | null): { alphas: number[]; source: SurfaceRate['ksAlphaSource'] } {
  if (o.alpha !== null) return { alphas: [o.alpha], source: 'given' };
  if (lavironAlpha !== null) return { alphas: [lavironAlpha], source: 'laviron' };
  return { alphas: [0.5, ...ASSUMED_ALPHA_RANGE], source: 'assumed' };
}

/** k_s of every file at αc index j (files the curve reached). */
const ksAt = (rows: SurfaceFileReading[], j: number) => rows.flatMap((r) => (r.atAlpha[j] ? [r.atAlpha[j].ksPerS] : []));

/**
 * Smallest n·ΔEp (V) of a file that enters the steadiness test of weighOhmic. Near the Nernstian end
 * a film's k_s varies about as 1/ΔEp (Laviron 1979), so a peak located to ±2–3 mV (a few points of a
 * noisy film peak some 90/n mV wide) reads k_s to about ±30 % at 10 mV and ±12 % at 20 mV: such
 * files still enter the median, but a drift among them is the reading's, not the film's (ours;
 * common practice, no source).
 */
export const KS_STEADY_MIN_N_DELTA_EP_V = 0.02;

/** Without Ru: one Ru against one k_s, over the files resolved well enough. Returns the reason k_s cannot be told, or a note, or nothing. */
function weighOhmic(allRows: SurfaceFileReading[], alphas: number[], electronCount: number): { cannotTell: string | null; note: string | null; ruOhm: number | null } {
  const rows = allRows.filter((r) => electronCount * r.deltaEpV >= KS_STEADY_MIN_N_DELTA_EP_V);
  const rus = rows.flatMap((r) => (r.ohmicRuOhm === null ? [] : [r.ohmicRuOhm]));
  const ks = alphas.map((_, j) => ksAt(rows, j)).filter((k) => k.length === rows.length && k.length >= 3);
  if (rus.length < 3 || rus.length < rows.length || !ks.length) return { cannotTell: null, note: null, ruOhm: null };
  const ruSpread = foldSpread(rus);
  const kSpread = Math.min(...ks.map(foldSpread));
  const ru = Number(Math.sqrt(Math.min(...rus) * Math.max(...rus)).toPrecision(2));
  const ohmicLine = `one uncompensated Ru ≈ ${ru} Ω (Nernstian film, all of ΔEp ohmic) explains all ${rus.length} files within ${spreadPercent(ruSpread)}, one k_s within ${spreadPercent(kSpread)}`;
  if (ruSpread <= OHMIC_STEADY_SPREAD && ruSpread <= kSpread) {
    return { cannotTell: `ΔEp grows in proportion to v, as an ohmic drop on a film does (∝ ip·Ru), not as Laviron kinetics do (∝ log v): ${ohmicLine}`, note: null, ruOhm: ru };
  }
  if (kSpread > OHMIC_STEADY_SPREAD) {
    return { cannotTell: `the per-file k_s drifts ${kSpread.toFixed(2)}-fold over the scan rates at every αc tried, so ΔEp is not one film's Laviron kinetics${ruSpread <= 2 ? `; ${ohmicLine}` : ''}`, note: null, ruOhm: ruSpread <= 2 ? ru : null };
  }
  // Both steady alike (within 5 % of each other): say so beside k_s.
  if (ruSpread <= OHMIC_STEADY_SPREAD && ruSpread <= kSpread * 1.05) {
    return { cannotTell: null, note: `${ohmicLine}: k_s is taken as if all the widening were kinetic; with an uncompensated Ru of that size it would be higher (measure Ru and enter it)`, ruOhm: ru };
  }
  return { cannotTell: null, note: null, ruOhm: null };
}

/** With Ru given: how much of each corrected ΔEp a Nernstian film would still show (its largest share). */
function residualShare(points: SeriesPoint[], o: ResolvedSeriesOptions): number | null {
  const rtNf = thermalVoltageV(o.temperatureK) / o.electronCount;
  let share: number | null = null;
  for (const p of points) {
    const q = p.forwardChargeC ?? p.anodicChargeC ?? p.cathodicChargeC;
    if (p.deltaEpV === null || p.deltaEpV <= 0 || q === null || p.peakCurrentSpanA == null) continue;
    const rho = ((Math.abs(q) * p.scanRateVPerS) / (4 * rtNf)) * o.ruOhm / rtNf;
    if (rho > FILM_OHMIC_RHO_RANGE[1]) return 1;
    const residual = nernstianFilmOhmicSeparation(rho) * rtNf - Math.abs(p.peakCurrentSpanA) * o.ruOhm;
    share = Math.max(share ?? 0, residual / p.deltaEpV);
  }
  return share;
}

function lowerBoundOf(points: SeriesPoint[], alphas: number[], o: ResolvedSeriesOptions): number | null {
  const fastest = points.filter((p) => p.deltaEpV !== null).sort((a, b) => b.scanRateVPerS - a.scanRateVPerS)[0];
  if (!fastest) return null;
  const at = alphas.map((a) => lavironRateConstantFromSeparation({ deltaEpV: KS_MIN_N_DELTA_EP_V / o.electronCount, scanRateVPerS: fastest.scanRateVPerS, electronCount: o.electronCount }, { alpha: a, temperatureK: o.temperatureK }).ksPerS);
  return Math.min(...at);
}

function formalPotential(rows: SurfaceFileReading[], source: SurfaceRate['ksAlphaSource'], alphas: number[]): Pick<SurfaceRate, 'formalPotentialV' | 'formalPotentialRangeV' | 'formalPotentialSource'> {
  const head = rows.flatMap((r) => (r.atAlpha[0]?.formalPotentialV != null ? [r.atAlpha[0].formalPotentialV] : []));
  const all = rows.flatMap((r) => r.atAlpha.flatMap((a) => (a?.formalPotentialV != null ? [a.formalPotentialV] : [])));
  if (!head.length) return { formalPotentialV: null, formalPotentialRangeV: null, formalPotentialSource: null };
  const alphaText = source === 'assumed' ? `αc assumed 0.5, range over αc ${ASSUMED_ALPHA_RANGE.join('–')}` : `αc = ${alphas[0]!.toFixed(3)} (${source === 'given' ? 'given' : "Laviron's lines"})`;
  return {
    formalPotentialV: median(head), formalPotentialRangeV: [Math.min(...all), Math.max(...all)],
    formalPotentialSource: `both peaks of ${head.length} files placed on Laviron's working curve at each file's k_s (Epc − ξc·RT/nF and Epa − ξa·RT/nF averaged; Laviron 1979), median; ${alphaText}`,
  };
}

export function seriesSurfaceRate(input: SurfaceRateInput, o: ResolvedSeriesOptions): SurfaceRate {
  const { rows, alphas, source } = input;
  const perFile = input.points.map((p) => {
    const r = rows.find((x) => x.fileIndex === p.fileIndex);
    const ks = r ? r.atAlpha.flatMap((a) => (a ? [a.ksPerS] : [])) : [];
    return { fileIndex: p.fileIndex, ksPerS: r?.atAlpha[0]?.ksPerS ?? null, rangePerS: ks.length > 1 ? [Math.min(...ks), Math.max(...ks)] as [number, number] : null };
  });
  const base = { ksPerFile: perFile, ksAlphaSource: source, ksFileCount: 0, ksRangePerS: null, ksLowerBoundPerS: null, ohmicRuOhm: null, formalPotentialV: null, formalPotentialRangeV: null, formalPotentialSource: null };
  const head = ksAt(rows, 0);
  const apparent = head.length ? ` (read as kinetics, the files would give k_s ≈ ${sci(median(head))} 1/s)` : '';
  const weighed = o.ruOhm > 0 ? null : weighOhmic(rows, alphas, o.electronCount);
  const doubts = [...input.doubts, ...(weighed?.cannotTell ? [weighed.cannotTell] : [])];
  if (doubts.length) {
    const ru = weighed?.ruOhm ?? null;
    return { ...base, ohmicRuOhm: ru, ksPerS: null, ksStatus: 'cannot-tell', ksNote: `cannot tell — uncompensated resistance?${ru !== null ? ` (Ru ≈ ${ru} Ω would explain it)` : ''}: ${doubts.join('; ')}; k_s and Laviron's α are not given${apparent} (measure Ru and enter it with --ru, or compensate it, and rerun)` };
  }
  if (!head.length) {
    const bound = lowerBoundOf(input.points, alphas, o);
    return { ...base, ksPerS: null, ksStatus: 'lower-bound', ksLowerBoundPerS: bound, ksNote: `every file's n·ΔEp is below ${KS_MIN_N_DELTA_EP_V * 1000} mV, within the reading's resolution: k_s ≥ ${bound === null ? '?' : sci(bound)} 1/s (Laviron's working curve at n·ΔEp = 5 mV and the fastest scan rate)` };
  }
  const all = rows.flatMap((r) => r.atAlpha.flatMap((a) => (a ? [a.ksPerS] : [])));
  const range: [number, number] = [Math.min(...all), Math.max(...all)];
  const ks = median(head);
  const e0 = formalPotential(rows, source, alphas);
  const share = o.ruOhm > 0 ? residualShare(input.points, o) : null;
  if (share !== null && share >= 0.5) {
    return { ...base, ...e0, ksFileCount: head.length, ksPerS: null, ksStatus: 'lower-bound', ksLowerBoundPerS: range[0], ksRangePerS: null,
      ksNote: `Ru = ${o.ruOhm} Ω was taken off the potentials afterwards, but a Nernstian film with that Ru would still show ${(share * 100).toFixed(0)} % of the widest ΔEp (the interface was swept unevenly): k_s ≥ ${sci(range[0])} 1/s only` };
  }
  const alphaNote = source === 'assumed' ? `αc not measured: 0.5 assumed, range over αc ${ASSUMED_ALPHA_RANGE.join('–')}` : source === 'given' ? `αc = ${alphas[0]} given` : `αc = ${alphas[0]!.toFixed(3)} from Laviron's Ep–log v lines`;
  const status = source === 'assumed' || head.length < 2 ? 'estimate' : 'value';
  const note = `Laviron's working curve on ${head.length} file${head.length > 1 ? 's' : ''} with n·ΔEp ≥ 5 mV, median; ${alphaNote}${head.length < 2 ? '; one file: no check that k_s is one constant' : ''}${weighed?.note ? `; ${weighed.note}` : ''}`;
  return { ...base, ...e0, ohmicRuOhm: weighed?.ruOhm ?? null, ksFileCount: head.length, ksPerS: ks, ksStatus: status, ksRangePerS: range, ksNote: note };
}
