/**
 * Rate constants and coverage of a series couple: Nicholson's k° per file and its median for a
 * diffusing couple, Γ (from charge and from the ip–v slope) and Laviron's k_s for a surface one.
 * Sources are in the called methods (kinetics/, series/lavironSurfaceWave.ts).
 */
import { AnalysisError } from '../errors';
import { LAVIRON_MIN_N_DELTA_EP_V, TABLE_RANGE_MV, lavironRateConstant, lavironTransferCoefficient, nicholsonPsi, nicholsonRateConstant } from '../kinetics';
import { STANDARD_TEMPERATURE_K } from '../constants';
import { surfaceCoverageFromCharge, surfaceCoverageFromSlope } from '../series';
import { median } from './matchSeriesCouples';
import { fitAgainstScanRate, fitPeakShift } from './seriesFits';
import type { ResolvedSeriesOptions } from './seriesFits';
import type { SeriesDiffusion, SeriesPoint, SeriesRateConstant, SeriesSurface } from './seriesTypes';
import type { PeakDirection } from './types';

function reasonOf(err: unknown): string {
  if (err instanceof AnalysisError) return err.message;
  throw err;
}

/** D_O and D_R from the bulk species' D and the ratio D_O/D_R. */
function diffusionPair(dBulk: number, forward: PeakDirection, ratio: number): { dO: number; dR: number } {
  // A cathodic forward peak reduces O from the bulk; an anodic one oxidises R.
  return forward === 'cathodic' ? { dO: dBulk, dR: dBulk / ratio } : { dO: dBulk * ratio, dR: dBulk };
}

export function seriesRateConstant(
  points: SeriesPoint[],
  forward: PeakDirection,
  diffusion: SeriesDiffusion | null,
  o: ResolvedSeriesOptions,
): SeriesRateConstant {
  const dBulk = diffusion?.diffusionCm2PerS ?? o.diffusionCm2PerS;
  const diffusionSource = diffusion ? 'fitted from this series (Randles–Ševčík)' : o.diffusionCm2PerS !== null ? 'given by the user' : null;
  const alpha = o.alpha ?? 0.5;
  if (dBulk === null) {
    return { k0CmPerS: null, perFile: [], lowerBoundCmPerS: null, diffusionOxCm2PerS: null, diffusionSource: null };
  }
  const { dO, dR } = diffusionPair(dBulk, forward, o.diffusionRatio);
  const kOf = (psi: number, v: number) => nicholsonRateConstant(
    { psi, diffusionOxCm2PerS: dO, diffusionRedCm2PerS: dR, scanRateVPerS: v, electronCount: o.electronCount },
    { alpha, temperatureK: o.temperatureK },
  );
  const perFile = points.map((p) => {
    if (p.deltaEpV === null) return { fileIndex: p.fileIndex, k0CmPerS: null, psi: null, reason: 'no peak pair, so no ΔEp' };
    try {
      const psi = nicholsonPsi(p.deltaEpV, { electronCount: o.electronCount, temperatureK: o.temperatureK });
      return { fileIndex: p.fileIndex, k0CmPerS: kOf(psi.psi, p.scanRateVPerS), psi, reason: null };
    } catch (err) {
      return { fileIndex: p.fileIndex, k0CmPerS: null, psi: null, reason: reasonOf(err) };
    }
  });
  const ks = perFile.flatMap((f) => (f.k0CmPerS === null ? [] : [f.k0CmPerS]));
  const narrow = points.filter((p) => p.deltaEpV !== null && o.electronCount * p.deltaEpV * (STANDARD_TEMPERATURE_K / o.temperatureK) * 1000 < TABLE_RANGE_MV[0]);
  let lowerBoundCmPerS: number | null = null;
  if (!ks.length && narrow.length) {
    // ψ ≥ 20 (the table's first row) at the fastest scan rate that still looks reversible.
    const vMax = Math.max(...narrow.map((p) => p.scanRateVPerS));
    lowerBoundCmPerS = kOf(20, vMax);
  }
  return { k0CmPerS: ks.length ? median(ks) : null, perFile, lowerBoundCmPerS, diffusionOxCm2PerS: dO, diffusionSource };
}

export function seriesSurface(points: SeriesPoint[], o: ResolvedSeriesOptions): SeriesSurface {
  const fit = fitAgainstScanRate(points, (p) => p.forwardIpA);
  const cell = o.areaCm2 === null ? null : { electronCount: o.electronCount, areaCm2: o.areaCm2 };
  const charges = points.flatMap((p) => (p.forwardChargeC === null ? [] : [p.forwardChargeC]));
  const coverageFromChargeMolPerCm2 = cell && charges.length ? median(charges.map((q) => surfaceCoverageFromCharge(q, cell))) : null;
  const coverageFromSlopeMolPerCm2 = cell && fit ? surfaceCoverageFromSlope(fit.slope, cell, { temperatureK: o.temperatureK }) : null;
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
  return { coverageFromChargeMolPerCm2, coverageFromSlopeMolPerCm2, fit, ksPerS: ks.length ? median(ks) : null, ksPerFile, lavironAlpha };
}
