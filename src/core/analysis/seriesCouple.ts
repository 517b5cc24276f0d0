/**
 * One couple followed through a scan-rate series: its points, fits, regime and kinetic class,
 * follow-up chemistry, transfer coefficient, D, ohmic check, k° (or Γ and k_s for a film), the
 * meaning of its E½, the refined verdict and the diagnostics. Sources are in the called methods;
 * the order of the steps is the design:
 *   regime and class (classifySeriesCouple) → follow-up signature (followUpSignature) → α
 *   (seriesTransferCoefficient) → D (seriesDiffusion; with Ru after each peak's ohmic deficit,
 *   seriesOhmicDiffusion) → ohmic check (ohmicWidening) → k°
 *   (seriesRateConstant) → verdict (refineVerdictWithSeries), with k° never beside "reversible".
 */
import { refineVerdictWithSeries } from '../couples/refineVerdictWithSeries';
import type { SeriesEvidence, Verdict } from '../couples/coupleTypes';
import { classifySeriesCouple, electroactiveAreaFromStandard, followUpSignature, ohmicWidening } from '../series';
import { weighOhmicAgainstKinetics, type OhmicWideningFile, type OhmicWideningResult } from '../series/ohmicWidening';
import type { SeriesPoint } from '../series/seriesPoint';
import { median } from '../statistics/median';
import type { CoupleRef } from './matchSeriesCouples';
import { describeSeriesCouple, describeHalfWave } from './seriesDiagnostics';
import { seriesDiffusionWithOhmicDeficit } from './seriesOhmicDiffusion';
import { fitAgainstScanRate, fitAgainstSqrtScanRate, fitForwardAgainstSqrtScanRate, fitLogLog, fitPeakShift, type ResolvedSeriesOptions } from './seriesFits';
import { seriesFollowUp } from './seriesFollowUp';
import { seriesRateConstant } from './seriesRateConstant';
import { seriesSurface } from './seriesSurface';
import { seriesTransferCoefficient } from './seriesTransferCoefficient';
import { rateConstantOverTransferElectrons } from './seriesTransferElectrons';
import type { SeriesCouple, SeriesFollowUp, SeriesRateConstant } from './seriesTypes';

/** A of a reversible standard of known D from its forward slope (electroactiveAreaFromStandard.ts). */
function electroactiveArea(fit: SeriesCouple['forwardFit'], reversible: boolean, o: ResolvedSeriesOptions): number | null {
  if (!fit || !reversible || o.diffusionCm2PerS === null || o.concentrationMolPerCm3 === null) return null;
  return electroactiveAreaFromStandard(
    { slopeAPerSqrtVPerS: fit.slope, electronCount: o.electronCount, concentrationMolPerCm3: o.concentrationMolPerCm3, diffusionCm2PerS: o.diffusionCm2PerS },
    { temperatureK: o.temperatureK },
  );
}

/** The single-trace verdict refined with what the series shows (two scan rates at least). */
function seriesVerdict(first: Verdict, c: Omit<SeriesCouple, 'verdict'>, followUp: SeriesFollowUp | null, regimeLine: string): Verdict {
  const e: SeriesEvidence = { count: new Set(c.points.map((p) => p.scanRateVPerS)).size };
  if ((e.count ?? 0) < 2) return first;
  if (c.logLog) e.logLogSlope = c.logLog.slope;
  if (c.peakShift.anodic) e.epaShiftVPerDecade = c.peakShift.anodic.slopeVPerDecade;
  if (c.peakShift.cathodic) e.epcShiftVPerDecade = c.peakShift.cathodic.slopeVPerDecade;
  if (c.forwardFit) e.sqrtScanRateR2 = c.forwardFit.r2;
  const linear = fitAgainstScanRate(c.points, (p) => p.forwardIpA);
  if (linear) e.scanRateR2 = linear.r2;
  const refined = refineVerdictWithSeries(first, e);
  if (followUp) {
    return { ...refined, category: 'chemically-coupled', label: 'chemically coupled (product consumed by a follow-up reaction)', reasons: [...followUp.evidence, ...refined.reasons] };
  }
  if (c.ohmic?.limitsK0 && refined.category === 'quasi-reversible') {
    return { ...refined, category: 'inconclusive', label: 'not classified (ΔEp widens with v, but ohmic drop explains it as well as slow electron transfer)', reasons: [...refined.reasons, c.ohmic.text] };
  }
  if (c.regime !== 'surface' || c.kineticClass !== 'quasi-reversible' || refined.category !== 'adsorbed') return refined;
  if (c.surface?.ksStatus === 'cannot-tell') {
    return { ...refined, label: 'surface-confined (adsorbed; ΔEp widens with v — uncompensated resistance or slow electron transfer, cannot tell)', reasons: [...refined.reasons, regimeLine] };
  }
  // The slowest file of a slow film looks Nernstian; the series shows the Laviron regime.
  return { ...refined, label: 'surface-confined (adsorbed; slow electron transfer, Laviron)', reasons: [...refined.reasons, regimeLine] };
}

/** Never k° beside "reversible": the value becomes a lower bound. */
function boundedIfReversible(k: SeriesRateConstant | null, verdict: Verdict): SeriesRateConstant | null {
  if (!k || k.status !== 'value' || verdict.category !== 'reversible') return k;
  return { ...k, status: 'lower-bound', lowerBoundCmPerS: k.k0CmPerS, k0CmPerS: null, rangeCmPerS: null, reason: 'the series reads as reversible: the apparent k° is only a lower bound' };
}

function ohmicFiles(points: SeriesPoint[]): OhmicWideningFile[] {
  return points.flatMap((p) => (p.deltaEpV !== null && p.reversibleDeltaEpV != null && p.peakCurrentSpanA != null
    ? [{ fileIndex: p.fileIndex, scanRateVPerS: p.scanRateVPerS, deltaEpV: p.deltaEpV, reversibleDeltaEpV: p.reversibleDeltaEpV, peakCurrentSpanA: p.peakCurrentSpanA }] : []));
}

function ohmicOf(points: SeriesPoint[], o: ResolvedSeriesOptions) {
  const files = ohmicFiles(points);
  return files.length >= 2 ? ohmicWidening(files, { electronCount: o.electronCount, temperatureK: o.temperatureK, ruOhm: o.ruOhm }) : null;
}

/**
 * Without Ru: the ohmic check weighed against the per-file k° (ohmicWidening.ts). k° stays a value;
 * when one Ru explains the widening as well, its reason says so, so the number cannot be read alone.
 */
function weighedOhmic(ohmic: OhmicWideningResult | null, k: SeriesRateConstant | null, points: SeriesPoint[], o: ResolvedSeriesOptions): { ohmic: OhmicWideningResult | null; rate: SeriesRateConstant | null } {
  if (!ohmic || !k || k.status !== 'value' || k.k0CmPerS === null) return { ohmic, rate: k };
  const k0ByFile = new Map(k.perFile.flatMap((f) => (f.k0CmPerS === null ? [] : [[f.fileIndex, [f.k0CmPerS, ...(f.k0AtAlphaEndsCmPerS ?? [])]] as [number, number[]]])));
  const weighed = weighOhmicAgainstKinetics(ohmic, ohmicFiles(points), k0ByFile, o);
  if (weighed === ohmic) return { ohmic, rate: k };
  return { ohmic: weighed, rate: { ...k, reason: k.reason ? `${k.reason}; ${weighed.text}` : weighed.text } };
}

export function buildSeriesCouple(index: number, points: SeriesPoint[], first: CoupleRef['couple'], o: ResolvedSeriesOptions): SeriesCouple {
  const forward = first.forwardDirection;
  const logLog = fitLogLog(points);
  const cls = classifySeriesCouple(points, o.electronCount, o.temperatureK, logLog?.slope ?? null);
  const forwardFit = fitForwardAgainstSqrtScanRate(points);
  const peakShift = { anodic: fitPeakShift(points, 'anodic', o), cathodic: fitPeakShift(points, 'cathodic', o) };
  const forwardShift = forward === 'anodic' ? peakShift.anodic : peakShift.cathodic;
  const diffusing = cls.regime === 'diffusion';
  const signature = diffusing
    ? followUpSignature({ points, forward, majority: cls.majority, forwardShiftVPerDecade: forwardShift?.slopeVPerDecade ?? null, electronCount: o.electronCount, temperatureK: o.temperatureK })
    : null;
  // Nicholson and Shain's EC scheme has a fast electron transfer: the forward peak's shift and narrowing are the chemistry's.
  const kineticClass = signature?.kind === 'kinetic-zone' ? 'reversible' : cls.kineticClass;
  const followUp = signature ? seriesFollowUp(points, o, signature) : null;
  const transfer = diffusing ? seriesTransferCoefficient(points, kineticClass, forward, o) : null;
  const measuredOhmic = diffusing && !followUp ? ohmicOf(points, o) : null;
  const ohmicMayWiden = measuredOhmic?.limitsK0 === true;
  const diffusion = transfer ? seriesDiffusionWithOhmicDeficit({ fit: forwardFit, kineticClass, points, forward, transfer, followUp }, o, ohmicMayWiden).diffusion : null;
  const chemistry = followUp ? 'a follow-up reaction consumes the product and moves the return peak, so ΔEp is not a measure of electron-transfer kinetics (Nicholson & Shain 1964)' : null;
  const firstRate = transfer ? seriesRateConstant({ points, forward, reversible: kineticClass === 'reversible', chemistry, ohmic: measuredOhmic, diffusion, transfer }, o) : null;
  const { ohmic, rate: headRate } = weighedOhmic(measuredOhmic, firstRate, points, o);
  const rateInput = { points, forward, reversible: kineticClass === 'reversible', chemistry, ohmic };
  // nₐ not given with n > 1: the return-peak methods are run at every possible nₐ.
  const rateAtNa = (na: number) => {
    const on = { ...o, transferElectronCount: na };
    const t = seriesTransferCoefficient(points, kineticClass, forward, on);
    if (t.alphaC === null) return null;
    const d = seriesDiffusionWithOhmicDeficit({ fit: forwardFit, kineticClass, points, forward, transfer: t, followUp }, on, ohmicMayWiden).diffusion;
    return seriesRateConstant({ ...rateInput, diffusion: d, transfer: t }, on);
  };
  const rateConstant = headRate && !o.transferElectronCountGiven && o.electronCount > 1 && !chemistry
    ? rateConstantOverTransferElectrons(headRate, rateAtNa, o.electronCount) : headRate;
  const surface = cls.regime === 'surface' ? seriesSurface(points, o, forward) : null;
  // E½ of the files that have both peaks; none where no file has (a lone peak's Ep is not E½).
  const halves = points.flatMap((p) => (p.eHalfV !== null ? [p.eHalfV] : []));
  const couple: Omit<SeriesCouple, 'verdict'> = {
    index, eHalfV: halves.length ? median(halves) : null, forwardDirection: forward, points, regime: cls.regime, kineticClass, followUp, transferCoefficient: transfer, ohmic,
    forwardFit, anodicFit: fitAgainstSqrtScanRate(points, (p) => p.ipaA), cathodicFit: fitAgainstSqrtScanRate(points, (p) => p.ipcA), diffusion, logLog, peakShift,
    alpha: surface ? (o.alpha ?? surface.lavironAlpha) : transfer && transfer.source !== 'assumed' ? transfer.alphaC : null,
    rateConstant, electroactiveAreaCm2: electroactiveArea(forwardFit, diffusing && kineticClass === 'reversible' && !followUp, o), surface, diagnostics: [],
  };
  const regimeLine = describeSeriesCouple(couple, o)[0] ?? '';
  const verdict = seriesVerdict(first.verdict, couple, followUp, regimeLine);
  couple.rateConstant = boundedIfReversible(rateConstant, verdict);
  couple.eHalfMeaning = describeHalfWave(couple);
  couple.diagnostics = describeSeriesCouple(couple, o);
  return { ...couple, verdict };
}
