/**
 * D of the bulk species of a series couple from the forward slope of |ip| against v^½, in the
 * form its kinetics call for, with a range that holds the slope's 95 % interval, what is not
 * known (αc, or k_f of a follow-up reaction) and ±2 % for the peak currents' baselines.
 * Forms and sources (Randles–Ševčík, series/randlesSevcik.ts):
 *   reversible: 0.4463 (Bard & Faulkner 2nd ed. §6.2);
 *   quasi-reversible: each |ip| divided first by K(ψ, α) (kineticPeakCurrentRatio.ts), ψ from ΔEp
 *     at αc (nicholsonPsiAtAlpha.ts), at the headline αc and at the ends of its range;
 *   irreversible: 0.4958·(αnₐ)^½ with the forward wave's αnₐ and its range (§6.3);
 *   follow-up reaction (EC): |ip| divided by F(λ)/0.4463 (followUpCurrentFunction.ts), λ from k_f;
 *     with k_f only bounded below, F lies between F(λ_min) and 0.4958 (Nicholson & Shain 1964):
 *     0.4958 is used when λ_min ≥ 5 at every rate (pure kinetic zone, F within 1.5 % of it),
 *     otherwise D cannot be separated from k_f and only its range is given.
 */
import { STANDARD_TEMPERATURE_K, inverseThermalVoltagePerV } from '../constants';
import { NICHOLSON_SWITCH_PAST_V, TABLE_RANGE_MV, followUpCurrentFunction, kineticPeakCurrentRatio, nicholsonPsiAtAlpha, psiMethodInRange } from '../kinetics';
import type { FitLineResult } from '../regression';
import { RANDLES_SEVCIK_REVERSIBLE, randlesSevcikDiffusion, type RandlesSevcikOptions } from '../series';
import type { PeakDirection } from '../peaks/peakTypes';
import type { SeriesKineticClass, SeriesPoint } from '../series/seriesPoint';
import { fitForwardAgainstSqrtScanRate, type ResolvedSeriesOptions } from './seriesFits';
import type { SeriesDiffusion, SeriesFollowUp, SeriesTransferCoefficient } from './seriesTypes';

export interface DiffusionInput {
  fit: FitLineResult | null;
  kineticClass: SeriesKineticClass;
  points: SeriesPoint[];
  forward: PeakDirection;
  transfer: SeriesTransferCoefficient;
  followUp: SeriesFollowUp | null;
}

type Cell = { electronCount: number; areaCm2: number; concentrationMolPerCm3: number };

interface DiffusionOfFit {
  d: number;
  ends: number[];
  /** The slope's standard error over the slope, and its degrees of freedom (for D's combined interval). */
  rel: number | null;
  dof: number;
}

/** D from a fit, the D of its slope interval's ends, and the slope's relative standard error. */
function dOf(fit: FitLineResult, cell: Cell, rs: RandlesSevcikOptions): DiffusionOfFit {
  const ci = fit.slopeInterval;
  return {
    d: randlesSevcikDiffusion(fit.slope, cell, rs), ends: ci && ci[0] > 0 ? ci.map((s) => randlesSevcikDiffusion(s, cell, rs)) : [],
    rel: fit.slopeStdError === null ? null : fit.slopeStdError / fit.slope, dof: fit.degreesOfFreedom,
  };
}

/** The note of a series recorded at one scan rate: the line through the origin, its replicates averaged. */
function oneRateNote(peakCount: number): string {
  return peakCount > 1
    ? `one scan rate only: D from the mean of ${peakCount} replicate peaks through the origin (its interval from their scatter), with no check of linearity`
    : 'one scan rate only: D from a single peak through the origin, with no check of linearity';
}

const statsOf = (x: DiffusionOfFit | null) => ({ slopeRelativeStdError: x?.rel ?? null, slopeDegreesOfFreedom: x?.dof ?? 0 });

/** |Eλ − E½| of a file (V); when either is unknown, that of Nicholson's table (112.5 mV), so the table is used as it stands. */
export function switchPastHalfWave(p: SeriesPoint): number {
  return p.switchPotentialV != null && p.eHalfV !== null ? Math.abs(p.switchPotentialV - p.eHalfV) : NICHOLSON_SWITCH_PAST_V;
}

/** Forward |ip| with each file divided by `factor` (files where it is null are left out), fitted against v^½. */
function scaledFit(points: SeriesPoint[], factor: (p: SeriesPoint) => number | null): FitLineResult | null {
  return fitForwardAgainstSqrtScanRate(points.flatMap((p) => {
    const k = p.forwardIpA !== null && p.forwardIpA > 0 ? factor(p) : null;
    return k === null ? [] : [{ ...p, forwardIpA: (p.forwardIpA as number) / k }];
  }));
}

/** ψ of one file from ΔEp at αc: Infinity below Nicholson's table, null beyond it or without ΔEp (ψ from the table where the Lavagnini fit, when asked for, does not reach). */
export function filePsi(p: SeriesPoint, o: ResolvedSeriesOptions, forwardAlpha: number): number | null {
  if (p.deltaEpV === null) return null;
  const x25 = o.electronCount * p.deltaEpV * 1000 * (STANDARD_TEMPERATURE_K / o.temperatureK);
  if (x25 < TABLE_RANGE_MV[0]) return Infinity;
  if (x25 > TABLE_RANGE_MV[1]) return null;
  return nicholsonPsiAtAlpha(p.deltaEpV, { forwardAlpha, switchPastHalfWaveV: switchPastHalfWave(p), electronCount: o.electronCount, temperatureK: o.temperatureK, method: psiMethodInRange(x25, o.psiMethod) }).psi;
}

/** K(ψ) of one file at αc: 1 below Nicholson's table, null beyond it or without ΔEp. */
function kineticRatio(p: SeriesPoint, o: ResolvedSeriesOptions, forwardAlpha: number): number | null {
  const psi = filePsi(p, o, forwardAlpha);
  return psi === null ? null : psi === Infinity ? 1 : kineticPeakCurrentRatio(psi, forwardAlpha);
}

/**
 * The range of the D values given, widened by ±2 % for the peak currents themselves: each is read
 * above an extrapolated baseline, which the simulator tests put within −0.2 % to +0.7 % of ip
 * (analyzeVoltammogram.simulated.test.ts); ±1 % of ip is ±2 % of D (our allowance).
 */
function range(values: number[]): [number, number] | null {
  const v = values.filter(Number.isFinite);
  return v.length ? [0.98 * Math.min(...v), 1.02 * Math.max(...v)] : null;
}

function quasiReversible(input: DiffusionInput, o: ResolvedSeriesOptions, cell: Cell): SeriesDiffusion | null {
  const t = input.transfer;
  const at = (alphaC: number) => {
    const forwardAlpha = input.forward === 'cathodic' ? alphaC : 1 - alphaC;
    const fit = scaledFit(input.points, (p) => kineticRatio(p, o, forwardAlpha));
    return fit ? dOf(fit, cell, { temperatureK: o.temperatureK }) : null;
  };
  const alphaC = t.alphaC ?? 0.5;
  const head = at(alphaC);
  if (!head) return null;
  const [lo, hi] = (t.alphaCRange ?? [alphaC, alphaC]).map((a) => (a === alphaC ? head : at(a)));
  const all = [head, lo, hi].flatMap((x) => (x ? [x.d, ...x.ends] : []));
  return {
    diffusionCm2PerS: head.d, intervalCm2PerS: head.ends.length ? [head.ends[0]!, head.ends[1]!] : null, rangeCm2PerS: range(all), form: 'reversible',
    ...statsOf(head), alphaEndsCm2PerS: lo && hi ? [lo.d, hi.d] : null,
    alphaUsed: alphaC, alphaSource: t.source,
    note: `quasi-reversible couple: each peak divided by K(ψ) before the reversible form (ψ from ΔEp at αc = ${alphaC}; ${t.source === 'assumed' ? `range over αc ${t.alphaCRange?.join('–')}` : t.text})`,
  };
}

function irreversible(input: DiffusionInput, fit: FitLineResult, o: ResolvedSeriesOptions, cell: Cell): SeriesDiffusion {
  const t = input.transfer;
  const rsAt = (an: number): RandlesSevcikOptions => {
    const m = Math.max(1, Math.ceil(an));
    return { form: 'irreversible', alpha: an / m, transferElectronCount: m, temperatureK: o.temperatureK };
  };
  const head = dOf(fit, cell, rsAt(t.forwardAlphaNa));
  const ends = t.forwardAlphaNaRange.map((an) => dOf(fit, cell, rsAt(an)));
  const all = [head, ...ends].flatMap((x) => [x.d, ...x.ends]);
  // αc runs opposite to the forward αnₐ for an oxidation first: order the ends by αc.
  const byAlphaC = input.forward === 'cathodic' ? ends : [...ends].reverse();
  return {
    diffusionCm2PerS: head.d, intervalCm2PerS: head.ends.length ? [head.ends[0]!, head.ends[1]!] : null, rangeCm2PerS: range(all), form: 'irreversible',
    ...statsOf(head), alphaEndsCm2PerS: [byAlphaC[0]!.d, byAlphaC[1]!.d],
    alphaUsed: t.alphaC, alphaSource: t.source, note: `irreversible form with the forward wave's αnₐ = ${t.forwardAlphaNa.toFixed(3)} (${t.text})`,
  };
}

function followUpCorrected(input: DiffusionInput, fu: SeriesFollowUp, o: ResolvedSeriesOptions, cell: Cell): SeriesDiffusion | null {
  const nf = o.electronCount * inverseThermalVoltagePerV(o.temperatureK);
  // A slow electron transfer lowers the peak too: K(ψ) at αc is applied as well (the two effects
  // taken as independent, which holds when either is small).
  const alphaC = input.transfer.alphaC ?? 0.5;
  const quasi = input.kineticClass === 'quasi-reversible';
  const atRate = (kf: number, a = alphaC) => scaledFit(input.points, (p) => {
    const k = quasi ? kineticRatio(p, o, input.forward === 'cathodic' ? a : 1 - a) : 1;
    return k === null ? null : (k * followUpCurrentFunction(kf / (nf * p.scanRateVPerS))) / RANDLES_SEVCIK_REVERSIBLE;
  });
  const base = { alphaUsed: null, alphaSource: null };
  if (fu.rateConstantPerS !== null) {
    const head = atRate(fu.rateConstantPerS);
    if (!head) return null;
    const rs = { temperatureK: o.temperatureK };
    const h = dOf(head, cell, rs);
    const alphaEnds = quasi ? (input.transfer.alphaCRange ?? []).map((a) => atRate(fu.rateConstantPerS!, a)) : [];
    const fits = [...(fu.rangePerS ?? []).map((k) => atRate(k)), ...alphaEnds];
    const all = [h, ...fits.flatMap((f) => (f ? [dOf(f, cell, rs)] : []))].flatMap((x) => [x.d, ...x.ends]);
    return { ...base, ...statsOf(h), diffusionCm2PerS: h.d, intervalCm2PerS: h.ends.length ? [h.ends[0]!, h.ends[1]!] : null, rangeCm2PerS: range(all), form: 'follow-up-corrected',
      note: `follow-up reaction: each peak divided by F(λ)/0.4463, λ = k_f·RT/(nFv) with k_f = ${fu.rateConstantPerS.toPrecision(3)} 1/s (Nicholson & Shain 1964)${input.kineticClass === 'quasi-reversible' ? `, and by K(ψ) at αc = ${alphaC} for the slow electron transfer` : ''}` };
  }
  if (fu.lowerBoundPerS === null) return null;
  const kinetic = input.fit ? dOf(input.fit, cell, { form: 'irreversible', alpha: 1, transferElectronCount: o.electronCount, temperatureK: o.temperatureK }) : null;
  const bound = atRate(fu.lowerBoundPerS);
  if (!kinetic || !bound) return null;
  const b = dOf(bound, cell, { temperatureK: o.temperatureK });
  const pure = input.points.every((p) => fu.lowerBoundPerS! / (nf * p.scanRateVPerS) >= 5);
  const rangeCm2PerS = range([kinetic.d, ...kinetic.ends, b.d, ...b.ends]);
  return pure
    ? { ...base, ...statsOf(kinetic), diffusionCm2PerS: kinetic.d, intervalCm2PerS: kinetic.ends.length ? [kinetic.ends[0]!, kinetic.ends[1]!] : null, rangeCm2PerS, form: 'follow-up-kinetic-zone',
      note: `pure kinetic zone of a follow-up reaction (λ ≥ 5 at every rate, k_f > ${fu.lowerBoundPerS.toPrecision(2)} 1/s): current function 0.4958, not 0.4463 (Nicholson & Shain 1964)` }
    : { ...base, ...statsOf(null), diffusionCm2PerS: Math.sqrt(rangeCm2PerS![0] * rangeCm2PerS![1]), status: 'range-only', intervalCm2PerS: rangeCm2PerS, rangeCm2PerS, form: 'follow-up-kinetic-zone',
      note: `D cannot be separated from k_f: k_f is only known to exceed ${fu.lowerBoundPerS.toPrecision(2)} 1/s, so the current function lies between ${followUpCurrentFunction(fu.lowerBoundPerS / (nf * Math.max(...input.points.map((p) => p.scanRateVPerS)))).toFixed(4)} and 0.4958 (Nicholson & Shain 1964); D lies in the range given` };
}

/** D of the bulk species, or null (with the reason) when it cannot be had. */
export function seriesDiffusion(input: DiffusionInput, o: ResolvedSeriesOptions): { diffusion: SeriesDiffusion | null; reason: string | null } {
  const fit = input.fit;
  if (!fit) return { diffusion: null, reason: 'needs at least two scan rates' };
  if (o.areaCm2 === null) return { diffusion: null, reason: 'needs the electrode area' };
  if (o.concentrationMolPerCm3 === null) return { diffusion: null, reason: 'needs the bulk concentration' };
  const cell = { electronCount: o.electronCount, areaCm2: o.areaCm2, concentrationMolPerCm3: o.concentrationMolPerCm3 };
  if (input.followUp) {
    const d = followUpCorrected(input, input.followUp, o, cell);
    if (d) return { diffusion: d, reason: null };
  }
  if (input.kineticClass === 'irreversible') return { diffusion: irreversible(input, fit, o, cell), reason: null };
  if (input.kineticClass === 'quasi-reversible') {
    const d = quasiReversible(input, o, cell);
    if (d) return { diffusion: d, reason: null };
  }
  const h = dOf(fit, cell, { temperatureK: o.temperatureK });
  const note = input.kineticClass === 'quasi-reversible' ? 'quasi-reversible couple: no ψ could be read, so the reversible form is used on the raw peaks and D is a lower bound'
    : input.kineticClass === 'inconclusive' ? 'kinetic class unclear: reversible form used'
      : new Set(input.points.map((p) => p.scanRateVPerS)).size === 1 ? oneRateNote(fit.pointCount) : null;
  const interval: [number, number] | null = h.ends.length ? [h.ends[0]!, h.ends[1]!] : null;
  return { diffusion: { diffusionCm2PerS: h.d, intervalCm2PerS: interval, rangeCm2PerS: range([h.d, ...h.ends]), form: 'reversible', ...statsOf(h), alphaUsed: null, alphaSource: null, note }, reason: null };
}
