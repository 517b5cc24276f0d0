/**
 * Starting values of a fit from the peak analysis, so that a fit needs no guessing. This is the
 * only file of the fit that reads analysis results.
 * Per couple (ranked by peak height, then ordered by potential), as medians over the voltammograms:
 *   E°′ from E½ (a lone peak: Ep ∓ 28.5/n mV, Nicholson & Shain, Anal. Chem. 36 (1964) 706;
 *     a surface peak: Ep); D from the forward peak current by Randles–Ševčík (reversible form);
 *   k° (and R_u when it is fitted) from ΔEp across the series through Nicholson's ψ with the
 *     ohmic widening taken off (peakSeparationStart.ts);
 *   k_f from the Nicholson (1966) ratio (followUpRateConstant), else λ = 0.05 at the slowest scan;
 *   Γ from the forward peak charge (Q = nFAΓ) or, without a time axis, from the Laviron peak
 *     current; k_s from Laviron's ΔEp expression (J. Electroanal. Chem. 101 (1979) 19) when
 *     n·ΔEp > 200 mV, else k_s = 5·nFv/RT (a nearly reversible film);
 *   α = 0.5; C_dl from the current early in the first sweep, i = −A·C_dl·v (Bard & Faulkner,
 *     Electrochemical Methods, 2nd ed. (2001), §1.2); a fitted R_u that ΔEp cannot give (one
 *     scan rate, a surface couple) from 1 mV of drop at the largest current.
 * Couples the analysis did not find are placed 100 mV beyond the last one found.
 * In: the records, cell, mechanism, couple count, cycle and n per couple. Out: values and notes.
 */
import { analyzeVoltammogram } from '../analysis/analyzeVoltammogram';
import type { CoupleResult } from '../couples/coupleTypes';
import { FARADAY_C_PER_MOL, inverseThermalVoltagePerV } from '../constants';
import { followUpRateConstant, lavironRateConstant, LAVIRON_MIN_N_DELTA_EP_V } from '../kinetics';
import { randlesSevcikPeakCurrent, surfacePeakCurrent } from '../series';
import type { Voltammogram } from '../types';
import type { CoupleValues, FitCell, FitMechanism, FitModelValues } from './fitTypes';
import { peakSeparationStart } from './peakSeparationStart';

export interface StartingValuesInput {
  records: readonly Voltammogram[];
  cell: FitCell;
  mechanism: FitMechanism;
  coupleCount: number;
  cycle: number;
  electronCounts: number[];
  /** R_u when known (Ω), null when it is fitted. */
  ruOhm: number | null;
}

const median = (xs: number[]): number | null => {
  const s = xs.filter(Number.isFinite).sort((a, b) => a - b);
  return s.length ? (s[(s.length - 1) >> 1]! + s[s.length >> 1]!) / 2 : null;
};

export function fitStartingValues(input: StartingValuesInput): { values: FitModelValues; notes: string[] } {
  const perRecord = input.records.map((v) => couplesOf(v, input));
  const couples: CoupleValues[] = [];
  const ruFromSeparation: number[] = [];
  for (let j = 0; j < input.coupleCount; j++) {
    const found = perRecord.map((list, k) => ({ c: list[j], v: input.records[k]! })).filter((x): x is { c: CoupleResult; v: Voltammogram } => x.c !== undefined);
    const start = found.length ? coupleStart(found, input, j) : { values: placeholder(couples, input), ruOhm: null };
    couples.push(start.values);
    if (start.ruOhm !== null) ruFromSeparation.push(start.ruOhm);
  }
  const missing = input.coupleCount - Math.max(0, ...perRecord.map((l) => l.length));
  const notes = missing > 0 ? [`the peak analysis found ${input.coupleCount - missing} of ${input.coupleCount} couples; the others start 100 mV beyond the last one found`] : [];
  const currents = input.records.map((v) => Math.max(...Array.from(v.currentA, Math.abs)));
  const cdl = median(input.records.map((v) => earlyCapacitance(v, input.cell.areaCm2)));
  // An ohmic drop of 1 mV at the largest current when ΔEp cannot tell R_u from slow kinetics.
  const ru = input.ruOhm ?? Math.max(median(ruFromSeparation) ?? 0, 1e-3 / Math.max(...currents));
  return { values: { couples, shared: { uncompensatedOhm: ru, doubleLayerFPerCm2: Math.max(cdl ?? 0, 1e-7) } }, notes };
}

/** The analysis' couples of the fitted cycle, the largest `coupleCount`, in order of potential. */
function couplesOf(v: Voltammogram, input: StartingValuesInput): CoupleResult[] {
  let list: CoupleResult[];
  try {
    const a = analyzeVoltammogram(v, { electronCount: input.electronCounts[0] ?? input.cell.electronCount, temperatureK: input.cell.temperatureK, cycles: [input.cycle] });
    list = a.cycles[0]?.couples ?? [];
  } catch {
    // No usable peaks: every couple gets a placeholder start.
    list = [];
  }
  const height = (c: CoupleResult) => Math.max(c.ipaA ?? 0, c.ipcA ?? 0);
  return [...list].sort((a, b) => height(b) - height(a)).slice(0, input.coupleCount).sort((a, b) => potentialOf(a, 1, 'E') - potentialOf(b, 1, 'E'));
}

function potentialOf(c: CoupleResult, n: number, mechanism: FitMechanism): number {
  if (c.eHalfV !== null) return c.eHalfV;
  const shift = mechanism === 'surface' ? 0 : 0.0285 / n;
  return c.epaV !== null ? c.epaV - shift : (c.epcV as number) + shift;
}

function coupleStart(found: { c: CoupleResult; v: Voltammogram }[], input: StartingValuesInput, j: number): { values: CoupleValues; ruOhm: number | null } {
  const n = input.electronCounts[j] ?? input.cell.electronCount;
  const { cell } = input;
  const f = inverseThermalVoltagePerV(cell.temperatureK);
  const rates = found.map((x) => x.v.scanRateVPerS as number);
  const forwardIp = found.map(({ c }) => (c.forwardDirection === 'cathodic' ? c.ipcA : c.ipaA) ?? Number.NaN);
  const formalPotentialV = median(found.map(({ c }) => potentialOf(c, n, input.mechanism))) ?? 0;
  const base: CoupleValues = { formalPotentialV, k0CmPerS: 1, alpha: 0.5, diffusionOCm2PerS: 1e-5, diffusionRatio: 1, followUpRatePerS: 0.05 * n * f * Math.min(...rates), coverageMolPerCm2: 1e-10, surfaceRatePerS: 5 * n * f * Math.max(...rates) };
  if (input.mechanism === 'surface') return { values: { ...base, ...surfaceStart(found, forwardIp, n, cell) }, ruOhm: null };
  const unit = rates.map((v) => randlesSevcikPeakCurrent({ electronCount: n, areaCm2: cell.areaCm2, concentrationMolPerCm3: cell.concentrationMolPerCm3, diffusionCm2PerS: 1, scanRateVPerS: v }, { temperatureK: cell.temperatureK }));
  const d = median(forwardIp.map((ip, k) => (ip / unit[k]!) ** 2)) ?? base.diffusionOCm2PerS;
  const kinetic = kineticStart(found, forwardIp, d, n, input);
  // The Nicholson-ratio working curve costs ten simulations: only for EC.
  const kf = input.mechanism === 'EC' ? median(found.map(({ c, v }) => followUpStart(c, v, n, cell.temperatureK))) : null;
  const values = { ...base, diffusionOCm2PerS: d, k0CmPerS: kinetic.k0CmPerS, ...(kf !== null ? { followUpRatePerS: kf } : {}) };
  return { values, ruOhm: input.ruOhm === null && new Set(rates).size > 1 ? kinetic.ruOhm : null };
}

/** k° (and R_u when it is fitted) from ΔEp across the series (peakSeparationStart.ts). */
function kineticStart(found: { c: CoupleResult; v: Voltammogram }[], forwardIp: number[], d: number, n: number, input: StartingValuesInput): { k0CmPerS: number; ruOhm: number } {
  const points = found.map(({ c, v }, k) => ({ scanRateVPerS: v.scanRateVPerS as number, deltaEpV: c.deltaEpV ?? Number.NaN, forwardPeakA: forwardIp[k]! }));
  return peakSeparationStart(points, { diffusionCm2PerS: d, electronCount: n, temperatureK: input.cell.temperatureK, ruOhm: input.ruOhm }) ?? { k0CmPerS: 1, ruOhm: input.ruOhm ?? 0 };
}

function followUpStart(c: CoupleResult, v: Voltammogram, n: number, temperatureK: number): number {
  if (c.nicholsonRatio === null || c.eHalfV === null || c.switchPotentialV == null) return Number.NaN;
  try {
    const r = followUpRateConstant({ ratio: c.nicholsonRatio, switchPastHalfWaveV: Math.abs(c.switchPotentialV - c.eHalfV), scanRateVPerS: v.scanRateVPerS as number }, { electronCount: n, temperatureK });
    return r.rateConstantPerS ?? Number.NaN;
  } catch {
    return Number.NaN;
  }
}

function surfaceStart(found: { c: CoupleResult; v: Voltammogram }[], forwardIp: number[], n: number, cell: FitCell): Partial<CoupleValues> {
  const fromCharge = found.map(({ c }) => ((c.forwardDirection === 'cathodic' ? c.cathodicChargeC : c.anodicChargeC) ?? Number.NaN) / (n * FARADAY_C_PER_MOL * cell.areaCm2));
  const fromCurrent = found.map(({ v }, k) => forwardIp[k]! / surfacePeakCurrent({ electronCount: n, areaCm2: cell.areaCm2, coverageMolPerCm2: 1, scanRateVPerS: v.scanRateVPerS as number }, { temperatureK: cell.temperatureK }));
  const gamma = median(fromCharge) ?? median(fromCurrent);
  const ks = median(found.map(({ c, v }) => (c.deltaEpV !== null && n * c.deltaEpV > LAVIRON_MIN_N_DELTA_EP_V
    ? lavironRateConstant({ deltaEpV: c.deltaEpV, scanRateVPerS: v.scanRateVPerS as number, electronCount: n }, { temperatureK: cell.temperatureK }) : Number.NaN)));
  return { ...(gamma !== null ? { coverageMolPerCm2: gamma } : {}), ...(ks !== null ? { surfaceRatePerS: ks } : {}) };
}

function placeholder(previous: CoupleValues[], input: StartingValuesInput): CoupleValues {
  const last = previous[previous.length - 1];
  const anyRecord = input.records[0]!;
  const mid = (Math.min(...anyRecord.potentialV) + Math.max(...anyRecord.potentialV)) / 2;
  const f = inverseThermalVoltagePerV(input.cell.temperatureK);
  const v = anyRecord.scanRateVPerS ?? 0.1;
  return last ? { ...last, formalPotentialV: last.formalPotentialV + 0.1 }
    : { formalPotentialV: mid, k0CmPerS: 0.01, alpha: 0.5, diffusionOCm2PerS: 1e-5, diffusionRatio: 1, followUpRatePerS: 0.05 * f * v, coverageMolPerCm2: 1e-10, surfaceRatePerS: 5 * f * v };
}

/** C_dl from the median current between 1 % and 5 % of the first sweep (before any faradaic onset). */
function earlyCapacitance(v: Voltammogram, areaCm2: number): number {
  const s = v.segments[0];
  if (!s || !v.scanRateVPerS) return Number.NaN;
  const len = s.end - s.start;
  const early = Array.from(v.currentA.subarray(s.start + Math.floor(0.01 * len), s.start + Math.max(Math.ceil(0.05 * len), 2)));
  const sign = s.direction === 'negative' ? -1 : 1;
  const i = median(early.map((x) => sign * x));
  return i !== null && i > 0 ? i / (areaCm2 * v.scanRateVPerS) : Number.NaN;
}
