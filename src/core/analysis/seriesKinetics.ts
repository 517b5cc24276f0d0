/**
 * Rate constants and coverage of a series couple: k° per file (Nicholson's ψ inside its range,
 * the two-peak irreversible lines beyond it) and its median for a diffusing couple; Γ (from the
 * forward peak's charge and from the ip–v slope) and Laviron's k_s for a surface one.
 * Sources are in the called methods (kinetics/, series/lavironSurfaceWave.ts).
 */
import { AnalysisError } from '../errors';
import {
  LAVIRON_MIN_N_DELTA_EP_V, TABLE_RANGE_MV, followUpRateConstant, irreversibleRateConstant, lavironRateConstant, lavironTransferCoefficient, nicholsonPsi, nicholsonRateConstant,
} from '../kinetics';
import { STANDARD_TEMPERATURE_K, thermalVoltageV } from '../constants';
import { surfaceCoverageFromCharge, surfaceCoverageFromSlope } from '../series';
import { median } from '../statistics/median';
import { fitAgainstScanRate, fitPeakShift } from './seriesFits';
import type { ResolvedSeriesOptions } from './seriesFits';
import type { SeriesDiffusion, SeriesFollowUp, SeriesRateConstant, SeriesSurface } from './seriesTypes';
import type { SeriesPoint } from '../series/seriesPoint';
import type { PeakDirection } from '../peaks/peakTypes';

function reasonOf(err: unknown): string {
  if (err instanceof AnalysisError) return err.message;
  throw err;
}

/** D_O and D_R from the bulk species' D and the ratio D_O/D_R. */
function diffusionPair(dBulk: number, forward: PeakDirection, ratio: number): { dO: number; dR: number } {
  // A cathodic forward peak reduces O from the bulk; an anodic one oxidises R.
  return forward === 'cathodic' ? { dO: dBulk, dR: dBulk / ratio } : { dO: dBulk * ratio, dR: dBulk };
}

type PerFile = SeriesRateConstant['perFile'][number];

/** k° of one file: Nicholson's ψ inside 61–212 mV, both-peak irreversible lines beyond. */
function returnRatio(p: SeriesPoint, forward: PeakDirection): number {
  const [f, r] = forward === 'anodic' ? [p.ipaA, p.ipcA] : [p.ipcA, p.ipaA];
  return f && r ? r / f : 0;
}

function fileRateConstant(p: SeriesPoint, forward: PeakDirection, dO: number, dR: number, alphaMeasured: number | null, o: ResolvedSeriesOptions, chemical: boolean): PerFile {
  const none = { fileIndex: p.fileIndex, k0CmPerS: null, method: null, psi: null };
  if (p.deltaEpV === null || p.epaV === null || p.epcV === null) return { ...none, reason: 'no peak pair, so no ΔEp' };
  if (p.verdict === 'chemically-coupled' || chemical) {
    const which = p.verdict === 'chemically-coupled' ? 'this file' : 'most files of the series';
    return { ...none, reason: `a follow-up reaction consumes the product (${which}) and moves the return peak, so ΔEp is not a measure of electron-transfer kinetics (Nicholson & Shain 1964)` };
  }
  if (p.verdict === 'irreversible' && returnRatio(p, forward) < 0.5) {
    return { ...none, reason: 'the return peak is under half the forward one (irreversible-looking couple), so ΔEp is not a kinetic measure' };
  }
  const x25 = o.electronCount * p.deltaEpV * 1000 * (STANDARD_TEMPERATURE_K / o.temperatureK);
  try {
    if (x25 > TABLE_RANGE_MV[1]) {
      const alpha = o.alpha ?? alphaMeasured ?? 0.5;
      const r = irreversibleRateConstant(
        { epaV: p.epaV, epcV: p.epcV, scanRateVPerS: p.scanRateVPerS, diffusionOxCm2PerS: dO, diffusionRedCm2PerS: dR },
        { alpha, transferElectronCount: o.transferElectronCount, temperatureK: o.temperatureK },
      );
      return { fileIndex: p.fileIndex, k0CmPerS: r.k0CmPerS, method: 'irreversible', psi: null, reason: null };
    }
    const psi = nicholsonPsi(p.deltaEpV, { electronCount: o.electronCount, temperatureK: o.temperatureK });
    const k0CmPerS = nicholsonRateConstant(
      { psi: psi.psi, diffusionOxCm2PerS: dO, diffusionRedCm2PerS: dR, scanRateVPerS: p.scanRateVPerS, electronCount: o.electronCount },
      { alpha: o.alpha ?? 0.5, temperatureK: o.temperatureK },
    );
    return { fileIndex: p.fileIndex, k0CmPerS, method: 'nicholson', psi, reason: null };
  } catch (err) {
    return { ...none, reason: reasonOf(err) };
  }
}

export function seriesRateConstant(
  points: SeriesPoint[],
  forward: PeakDirection,
  diffusion: SeriesDiffusion | null,
  o: ResolvedSeriesOptions,
  alphaMeasured: number | null,
  reversible = false,
): SeriesRateConstant {
  // A D the user knows beats one estimated from peak heights (biased low for slow couples).
  const dBulk = o.diffusionCm2PerS ?? diffusion?.diffusionCm2PerS ?? null;
  const diffusionSource = o.diffusionCm2PerS !== null ? 'given by the user' : diffusion ? 'fitted from this series (Randles–Ševčík)' : null;
  if (dBulk === null) {
    return { k0CmPerS: null, perFile: [], lowerBoundCmPerS: null, diffusionOxCm2PerS: null, diffusionSource: null };
  }
  const { dO, dR } = diffusionPair(dBulk, forward, o.diffusionRatio);
  const chemical = points.filter((p) => p.verdict === 'chemically-coupled').length * 2 > points.length;
  const perFile = points.map((p) => fileRateConstant(p, forward, dO, dR, alphaMeasured, o, chemical));
  // A couple that reads as reversible at most scan rates: a ΔEp a few mV past 61 mV in one file is
  // within measurement scatter, and ψ is steep there, so such stray values give no k°.
  const determinable = perFile.filter((f) => f.k0CmPerS !== null).length;
  const stray = reversible && determinable * 2 < points.length;
  const ks = stray ? [] : perFile.flatMap((f) => (f.k0CmPerS === null ? [] : [f.k0CmPerS]));
  const narrow = points.filter((p) => p.deltaEpV !== null && o.electronCount * p.deltaEpV * (STANDARD_TEMPERATURE_K / o.temperatureK) * 1000 < TABLE_RANGE_MV[0]);
  let lowerBoundCmPerS: number | null = null;
  if (!ks.length && narrow.length) {
    // ψ ≥ 20 (the table's first row) at the fastest scan rate that still looks reversible.
    const vMax = Math.max(...narrow.map((p) => p.scanRateVPerS));
    lowerBoundCmPerS = nicholsonRateConstant(
      { psi: 20, diffusionOxCm2PerS: dO, diffusionRedCm2PerS: dR, scanRateVPerS: vMax, electronCount: o.electronCount },
      { alpha: o.alpha ?? 0.5, temperatureK: o.temperatureK },
    );
  }
  return { k0CmPerS: ks.length ? median(ks) : null, perFile, lowerBoundCmPerS, diffusionOxCm2PerS: dO, diffusionSource };
}

export function seriesSurface(points: SeriesPoint[], o: ResolvedSeriesOptions): SeriesSurface {
  const fit = fitAgainstScanRate(points, (p) => p.forwardIpA);
  const cell = o.areaCm2 === null ? null : { electronCount: o.electronCount, areaCm2: o.areaCm2 };
  // The forward peak's baseline is drawn on its own sweep; the return peak's is carried across
  // the switch, where the charging current changes sign, so the forward charge is the safer one.
  const charges = points.flatMap((p) => {
    const q = p.forwardChargeC ?? (p.anodicChargeC ?? p.cathodicChargeC);
    return q === null ? [] : [q];
  });
  const coverageFromChargeMolPerCm2 = cell && charges.length ? median(charges.map((q) => surfaceCoverageFromCharge(q, cell))) : null;
  // ip = n²F²AΓv/4RT holds for a Nernstian film only; slow electron transfer lowers ip (Laviron
  // 1979), so the slope is taken over the files whose ΔEp is still within 1.109·RT/nF when it can be.
  const nernstian = points.filter((p) => p.deltaEpV !== null && o.electronCount * Math.abs(p.deltaEpV) <= 1.109 * thermalVoltageV(o.temperatureK));
  const slopePoints = new Set(nernstian.map((p) => p.scanRateVPerS)).size >= 2 ? nernstian : points;
  const slopeFit = slopePoints === points ? fit : fitAgainstScanRate(slopePoints, (p) => p.forwardIpA);
  const coverageFromSlopeMolPerCm2 = cell && slopeFit ? surfaceCoverageFromSlope(slopeFit.slope, cell, { temperatureK: o.temperatureK }) : null;
  const wide = points.filter((p) => p.deltaEpV !== null && o.electronCount * p.deltaEpV > LAVIRON_MIN_N_DELTA_EP_V);
  const anodic = fitPeakShift(wide, 'anodic', o);
  const cathodic = fitPeakShift(wide, 'cathodic', o);
  let lavironAlpha: number | null = null;
  if (anodic && cathodic && anodic.slopeVPerDecade > 0 && cathodic.slopeVPerDecade < 0) {
    lavironAlpha = lavironTransferCoefficient(anodic.slopeVPerDecade, cathodic.slopeVPerDecade);
  }
  const alpha = o.alpha ?? lavironAlpha ?? 0.5;
  const ksPerFile = points.map((p) => ({
    fileIndex: p.fileIndex,
    ksPerS: p.deltaEpV !== null && o.electronCount * p.deltaEpV > LAVIRON_MIN_N_DELTA_EP_V
      ? lavironRateConstant({ deltaEpV: p.deltaEpV, scanRateVPerS: p.scanRateVPerS, electronCount: o.electronCount }, { alpha, temperatureK: o.temperatureK })
      : null,
  }));
  const ks = ksPerFile.flatMap((k) => (k.ksPerS === null ? [] : [k.ksPerS]));
  return { coverageFromChargeMolPerCm2, coverageFromSlopeMolPerCm2, coverageFromSlopeFileCount: slopePoints.length, fit, ksPerS: ks.length ? median(ks) : null, ksPerFile, lavironAlpha };
}

/** k_f per file from its Nicholson (1966) ratio and switching distance (followUpRateConstant.ts), and the median. */
export function seriesFollowUp(points: SeriesPoint[], o: ResolvedSeriesOptions): SeriesFollowUp {
  const perFile = points.map((p) => {
    const none = { fileIndex: p.fileIndex, rateConstantPerS: null, lambda: null };
    const ratio = p.nicholsonRatio ?? null;
    const eSwitch = p.switchPotentialV ?? null;
    if (ratio === null || eSwitch === null || p.eHalfV === null) return { ...none, reason: 'no return peak next to the switch, so no Nicholson ratio' };
    if (ratio >= 1) return { ...none, reason: `ratio ${ratio.toFixed(3)} ≥ 1: nothing is consumed` };
    try {
      const r = followUpRateConstant(
        { ratio, switchPastHalfWaveV: Math.abs(eSwitch - p.eHalfV), scanRateVPerS: p.scanRateVPerS },
        { electronCount: o.electronCount, temperatureK: o.temperatureK },
      );
      return { fileIndex: p.fileIndex, rateConstantPerS: r.rateConstantPerS, lambda: r.lambda, reason: r.reason };
    } catch (err) {
      return { ...none, reason: reasonOf(err) };
    }
  });
  const ks = perFile.flatMap((f) => (f.rateConstantPerS === null ? [] : [f.rateConstantPerS]));
  return { rateConstantPerS: ks.length ? median(ks) : null, perFile };
}
