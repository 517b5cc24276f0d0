/**
 * k° of a diffusing series couple: per file by Nicholson's ψ inside 61–212 mV (n·ΔEp, 25 °C),
 * beyond it from the forward peak (with E°′ given, or E°′ from the return peak corrected by
 * simulation); the median, its range over αc, and whether it is a value, a lower bound or cannot
 * be told. Sources are in the called methods (kinetics/, series/ohmicWidening.ts).
 * Rules (ours): no k° for a follow-up reaction (the chemistry moves the return peak: Nicholson &
 *   Shain 1964); a couple that reads as reversible, or whose widening may be ohmic
 *   (ohmicWidening.ts), gets a lower bound only, never k° beside "reversible"; a ΔEp a few mV
 *   into the table in a reversible series is scatter (ψ is steep there).
 */
import { AnalysisError } from '../errors';
import { STANDARD_TEMPERATURE_K } from '../constants';
import { LAVAGNINI_RANGE_MV, TABLE_RANGE_MV, correctedIrreversibleRateConstant, forwardPeakRateConstant, nicholsonPsiAtAlpha, nicholsonRateConstant, psiMethodInRange } from '../kinetics';
import type { PeakDirection } from '../peaks/peakTypes';
import type { OhmicWideningResult } from '../series/ohmicWidening';
import type { SeriesPoint } from '../series/seriesPoint';
import { median } from '../statistics/median';
import { switchPastHalfWave } from './seriesDiffusion';
import type { ResolvedSeriesOptions } from './seriesFits';
import type { SeriesDiffusion, SeriesRateConstant, SeriesTransferCoefficient } from './seriesTypes';
import { forwardAlphaNaFromC } from './seriesTransferCoefficient';
import { rateConstantDrift, seriesFormalPotential } from './seriesFormalPotential';

export interface RateConstantInput {
  points: SeriesPoint[];
  forward: PeakDirection;
  diffusion: SeriesDiffusion | null;
  transfer: SeriesTransferCoefficient;
  /** The couple reads as reversible (series class or verdict). */
  reversible: boolean;
  /** Why the chemistry rules k° out, or null. */
  chemistry: string | null;
  ohmic: OhmicWideningResult | null;
}

type PerFile = SeriesRateConstant['perFile'][number];
type Ctx = RateConstantInput & { o: ResolvedSeriesOptions; dAt: (alphaC: number) => number };

function reasonOf(err: unknown): string {
  if (err instanceof AnalysisError) return err.message;
  throw err;
}

/** D_O and D_R from the bulk species' D and the ratio D_O/D_R. */
function pair(d: number, forward: PeakDirection, ratio: number): { dO: number; dR: number } {
  return forward === 'cathodic' ? { dO: d, dR: d / ratio } : { dO: d * ratio, dR: d };
}

/** k° of one file at one αc (cm/s), by the method its ΔEp calls for. */
function k0At(p: SeriesPoint, c: Ctx, alphaC: number, x25: number): { k0: number; method: PerFile['method']; e0: number | null; psi: PerFile['psi'] } {
  const o = c.o;
  const { dO, dR } = pair(c.dAt(alphaC), c.forward, o.diffusionRatio);
  if (x25 <= TABLE_RANGE_MV[1]) {
    const forwardAlpha = c.forward === 'cathodic' ? alphaC : 1 - alphaC;
    const used = psiMethodInRange(x25, o.psiMethod);
    const psi = nicholsonPsiAtAlpha(p.deltaEpV!, { forwardAlpha, switchPastHalfWaveV: switchPastHalfWave(p), electronCount: o.electronCount, temperatureK: o.temperatureK, method: used });
    const k0 = nicholsonRateConstant({ psi: psi.psi, diffusionOxCm2PerS: dO, diffusionRedCm2PerS: dR, scanRateVPerS: p.scanRateVPerS, electronCount: o.electronCount }, { alpha: alphaC, temperatureK: o.temperatureK });
    const source = used === 'table' ? 'nicholson-1965-table' as const : 'lavagnini-2004-fit' as const;
    return { k0, method: used === 'table' ? 'nicholson' : 'lavagnini', e0: null, psi: { psi: psi.psi, source, nDeltaEpMv25: x25 } };
  }
  const forwardPeak = c.forward === 'cathodic' ? p.epcV : p.epaV;
  if (o.formalPotentialV !== null && forwardPeak !== null) {
    const an = forwardAlphaNaFromC(alphaC, c.forward, o.transferElectronCount);
    const k0 = forwardPeakRateConstant({ forwardPeakV: forwardPeak, forwardDirection: c.forward, formalPotentialV: o.formalPotentialV, scanRateVPerS: p.scanRateVPerS, diffusionCm2PerS: c.forward === 'cathodic' ? dO : dR }, { forwardAlphaNa: an, temperatureK: o.temperatureK });
    return { k0, method: 'forward-peak', e0: o.formalPotentialV, psi: null };
  }
  if (p.epaV === null || p.epcV === null) throw new AnalysisError('NO_PEAK', 'no return peak, so E°′ is unknown: give E°′ for k° from the forward peak alone');
  const r = correctedIrreversibleRateConstant(
    { epaV: p.epaV, epcV: p.epcV, forwardDirection: c.forward, switchPotentialV: p.switchPotentialV ?? null, scanRateVPerS: p.scanRateVPerS, diffusionOxCm2PerS: dO, diffusionRedCm2PerS: dR },
    { alpha: alphaC, transferElectronCount: o.transferElectronCount, temperatureK: o.temperatureK },
  );
  return { k0: r.k0CmPerS, method: 'irreversible', e0: r.formalPotentialV, psi: null };
}

/** Why a file asked to use the Lavagnini fit took ψ from Nicholson's table, or null. */
function psiNote(x25: number, method: PerFile['method'], o: ResolvedSeriesOptions): string | null {
  if (o.psiMethod !== 'lavagnini' || method !== 'nicholson') return null;
  return `n·ΔEp = ${x25.toFixed(1)} mV lies outside ${LAVAGNINI_RANGE_MV[0]}–${LAVAGNINI_RANGE_MV[1]} mV of the Lavagnini et al. (2004) fit: ψ from Nicholson's table (1965) for this file`;
}

function fileRateConstant(p: SeriesPoint, c: Ctx): PerFile {
  const none = { fileIndex: p.fileIndex, k0CmPerS: null, method: null, psi: null };
  const o = c.o;
  const x25 = p.deltaEpV === null ? Infinity : o.electronCount * p.deltaEpV * 1000 * (STANDARD_TEMPERATURE_K / o.temperatureK);
  const userE0 = o.formalPotentialV !== null && (c.forward === 'cathodic' ? p.epcV : p.epaV) !== null;
  if (p.deltaEpV === null && !userE0) return { ...none, reason: 'no peak pair, so no ΔEp (and no E°′ given for the forward peak alone)' };
  if (x25 < TABLE_RANGE_MV[0]) return { ...none, reason: `n·ΔEp = ${x25.toFixed(1)} mV: within the reversible range, below Nicholson's table` };
  const alphaC = c.transfer.alphaC;
  if (alphaC === null) return { ...none, reason: c.transfer.note ?? 'αc not known' };
  try {
    const head = k0At(p, c, alphaC, x25);
    const ends = (c.transfer.alphaCRange ?? [alphaC, alphaC]).map((a) => (a === alphaC ? head : k0At(p, c, a, x25)));
    const k0s = ends.map((e) => e.k0);
    const e0s = [head, ...ends].flatMap((e) => (e.e0 === null ? [] : [e.e0]));
    return {
      fileIndex: p.fileIndex, k0CmPerS: head.k0, method: head.method, psi: head.psi, rangeCmPerS: [Math.min(...k0s, head.k0), Math.max(...k0s, head.k0)], k0AtAlphaEndsCmPerS: [k0s[0]!, k0s[1]!],
      formalPotentialV: head.e0, formalPotentialRangeV: e0s.length ? [Math.min(...e0s), Math.max(...e0s)] : null, reason: null, note: psiNote(x25, head.method, o),
    };
  } catch (err) {
    return { ...none, reason: reasonOf(err) };
  }
}

/** k° ≥ this (cm/s): ψ ≥ 20 (the table's first row) at the fastest file that still reads as reversible. */
function reversibleEndBound(c: Ctx): number | null {
  const o = c.o;
  const narrow = c.points.filter((p) => p.deltaEpV !== null && o.electronCount * p.deltaEpV * (STANDARD_TEMPERATURE_K / o.temperatureK) * 1000 < TABLE_RANGE_MV[0]);
  if (!narrow.length) return null;
  const alphaC = c.transfer.alphaC ?? 0.5;
  const { dO, dR } = pair(c.dAt(alphaC), c.forward, o.diffusionRatio);
  const vMax = Math.max(...narrow.map((p) => p.scanRateVPerS));
  return nicholsonRateConstant({ psi: 20, diffusionOxCm2PerS: dO, diffusionRedCm2PerS: dR, scanRateVPerS: vMax, electronCount: o.electronCount }, { alpha: alphaC, temperatureK: o.temperatureK });
}

export function seriesRateConstant(input: RateConstantInput, o: ResolvedSeriesOptions): SeriesRateConstant {
  // A D the user knows beats one estimated from peak heights (biased low for slow couples).
  const fitted = input.diffusion && input.diffusion.status !== 'range-only' ? input.diffusion.diffusionCm2PerS : null;
  const dBulk = o.diffusionCm2PerS ?? fitted;
  const empty = { k0CmPerS: null, rangeCmPerS: null, perFile: [], lowerBoundCmPerS: null, diffusionOxCm2PerS: null, diffusionSource: null };
  if (input.chemistry) return { ...empty, status: 'cannot-tell', reason: input.chemistry };
  if (dBulk === null && input.reversible) return { ...empty, status: 'lower-bound', reason: 'the couple reads as reversible; without D there is no number for the bound' };
  if (dBulk === null) return { ...empty, status: 'cannot-tell', reason: 'no D: give the area and concentration, or D itself' };
  const ends = input.diffusion?.alphaEndsCm2PerS ?? null;
  const range = input.transfer.alphaCRange;
  const dAt = (a: number) => (o.diffusionCm2PerS !== null || !ends || !range || a === input.transfer.alphaC ? dBulk : a === range[0] ? ends[0] : ends[1]);
  const c: Ctx = { ...input, o, dAt };
  const perFile = input.points.map((p) => fileRateConstant(p, c));
  const got = perFile.filter((f) => f.k0CmPerS !== null);
  const k0 = got.length ? median(got.map((f) => f.k0CmPerS!)) : null;
  const lows = got.map((f) => Math.min(f.rangeCmPerS?.[0] ?? Infinity, f.k0CmPerS!));
  const highs = got.map((f) => Math.max(f.rangeCmPerS?.[1] ?? 0, f.k0CmPerS!));
  const base = {
    perFile, diffusionOxCm2PerS: pair(dBulk, input.forward, o.diffusionRatio).dO,
    diffusionSource: o.diffusionCm2PerS !== null ? 'given by the user' : 'fitted from this series (Randles–Ševčík)',
    ...seriesFormalPotential(got, input, o),
  };
  const apparent = k0 !== null && got.length * 2 >= input.points.length ? k0 : null;
  const bound = Math.max(reversibleEndBound(c) ?? 0, apparent ?? 0) || null;
  if (input.reversible) {
    return { ...base, k0CmPerS: null, status: 'lower-bound', rangeCmPerS: null, lowerBoundCmPerS: bound, reason: 'the couple reads as reversible: ΔEp does not resolve the electron-transfer rate, so k° is only bounded from below' };
  }
  if (input.ohmic?.limitsK0 && k0 !== null) {
    return { ...base, k0CmPerS: null, status: 'lower-bound', rangeCmPerS: null, lowerBoundCmPerS: bound ?? k0, reason: input.ohmic.text };
  }
  if (k0 === null) {
    const why = perFile.find((f) => f.reason)?.reason ?? 'no file gave k°';
    return bound !== null
      ? { ...base, k0CmPerS: null, status: 'lower-bound', rangeCmPerS: null, lowerBoundCmPerS: bound, reason: 'ΔEp stays below the 61 mV start of Nicholson\'s table at the rates that read as reversible' }
      : { ...base, k0CmPerS: null, status: 'cannot-tell', rangeCmPerS: null, lowerBoundCmPerS: null, reason: why };
  }
  // The range holds every file at every end of αc's range: the files' own scatter belongs to it.
  const rangeCmPerS: [number, number] = [Math.min(...lows, k0), Math.max(...highs, k0)];
  const drift = rateConstantDrift(got, input.points);
  if (drift) {
    const doubt = base.formalPotentialSource && o.formalPotentialV === null ? { formalPotentialSource: `${base.formalPotentialSource} (a model whose k° drifts with v: doubtful)` } : {};
    return { ...base, ...doubt, k0CmPerS: null, status: 'cannot-tell', rangeCmPerS, lowerBoundCmPerS: null, reason: drift.text, driftFold: drift.fold };
  }
  return { ...base, k0CmPerS: k0, status: 'value', rangeCmPerS, lowerBoundCmPerS: null, reason: null };
}
