/**
 * Coverage and rate of a surface-confined series couple: Γ from the forward peak's charge, Γ from
 * the slope of ip against v in the form its regime allows, Laviron's α, k_s and E°′.
 * Sources: Γ = Q/(nFA) and the Nernstian slope n²F²AΓ/(4RT) (Laviron 1974; lavironSurfaceWave.ts);
 *   the irreversible slope α·n²F²AΓ/(2.718RT) and α from the Ep–log v lines (Laviron, J.
 *   Electroanal. Chem. 101, 19 (1979); lavironIrreversibleWave.ts, lavironRateConstant.ts); k_s
 *   and E°′ from his general working curve (seriesSurfaceRate.ts).
 * Γ reported: the charge's (kinetics do not change Q = nFAΓ); the slope's is a check beside it.
 * Choice of the slope form (ours): over the files whose forward peak lies within 1 % of the
 *   Nernstian n²F²AΓv/(4RT) on Laviron's working curve at αc = 0.5 and every αc tried (NERNSTIAN_PEAK_TOLERANCE;
 *   files with n·ΔEp < 5 mV count as Nernstian) when two scan rates or more are there; else over
 *   the files with n·ΔEp > 200 mV (irreversible limit), with αc given, else Laviron's α, else 0.5
 *   with the range over αc 0.3–0.7; else no slope Γ, and the charge stands alone.
 */
import { thermalVoltageV } from '../constants';
import { LAVIRON_MIN_N_DELTA_EP_V, lavironTransferCoefficient } from '../kinetics';
import type { PeakDirection } from '../peaks/peakTypes';
import { irreversibleSurfaceCoverageFromSlope, surfaceCoverageFromCharge, surfaceCoverageFromSlope } from '../series';
import type { SeriesPoint } from '../series/seriesPoint';
import { median } from '../statistics/median';
import { fitAgainstScanRate, fitPeakShift, type ResolvedSeriesOptions } from './seriesFits';
import { readSurfaceFiles, type SurfaceFileReading } from './seriesSurfaceFiles';
import { COVERAGE_AGREEMENT, LAVIRON_LINES_TOLERANCE, seriesSurfaceRate, surfaceAlphaSet } from './seriesSurfaceRate';
import type { SeriesSurface } from './seriesTypes';
import { ASSUMED_ALPHA_RANGE } from './seriesTransferCoefficient';

type SlopeGamma = Pick<SeriesSurface, 'coverageFromSlopeMolPerCm2' | 'coverageFromSlopeFileCount' | 'coverageFromSlopeForm' | 'coverageFromSlopeRangeMolPerCm2' | 'coverageFromSlopeNote'>;

/** Smallest forward ip over the Nernstian one for a file to enter the Nernstian slope (Laviron 1979's ψ against m). */
export const NERNSTIAN_PEAK_TOLERANCE = 0.99;

const distinctRates = (points: SeriesPoint[]) => new Set(points.map((p) => p.scanRateVPerS)).size;

/** Files whose forward peak is Nernstian within 1 % at αc = 0.5 and at every αc read (below 5 mV: not read, Nernstian). */
function nernstianFiles(points: SeriesPoint[], rows: SurfaceFileReading[]): SeriesPoint[] {
  return points.filter((p) => {
    if (p.deltaEpV === null) return false;
    const r = rows.find((x) => x.fileIndex === p.fileIndex);
    const near = (x: number | null | undefined) => x != null && Math.abs(x - 1) <= 1 - NERNSTIAN_PEAK_TOLERANCE;
    return !r || (near(r.midAlphaPeakRatio) && r.atAlpha.every((a) => near(a?.forwardPeakRatio)));
  });
}

function slopeCoverage(points: SeriesPoint[], o: ResolvedSeriesOptions, forward: PeakDirection, lavironAlpha: number | null, rows: SurfaceFileReading[]): SlopeGamma {
  const none = { coverageFromSlopeMolPerCm2: null, coverageFromSlopeForm: null, coverageFromSlopeRangeMolPerCm2: null };
  if (o.areaCm2 === null) return { ...none, coverageFromSlopeNote: 'needs the electrode area' };
  const cell = { electronCount: o.electronCount, areaCm2: o.areaCm2 };
  const nernstian = nernstianFiles(points, rows);
  const nFit = distinctRates(nernstian) >= 2 ? fitAgainstScanRate(nernstian, (p) => p.forwardIpA) : null;
  if (nFit) {
    return { coverageFromSlopeMolPerCm2: surfaceCoverageFromSlope(nFit.slope, cell, { temperatureK: o.temperatureK }), coverageFromSlopeFileCount: nernstian.length,
      coverageFromSlopeForm: 'nernstian', coverageFromSlopeRangeMolPerCm2: null,
      coverageFromSlopeNote: `Nernstian film, n²F²AΓ/4RT over ${nernstian.length} files whose forward peak lies within 1 % of the Nernstian one on Laviron's working curve (n·ΔEp up to ${(Math.max(...nernstian.map((p) => o.electronCount * p.deltaEpV!)) * 1000).toFixed(1)} mV); Γ reported is the charge's` };
  }
  const slow = points.filter((p) => p.deltaEpV !== null && o.electronCount * p.deltaEpV > LAVIRON_MIN_N_DELTA_EP_V);
  const sFit = distinctRates(slow) >= 2 ? fitAgainstScanRate(slow, (p) => p.forwardIpA) : null;
  if (!sFit) return { ...none, coverageFromSlopeNote: 'neither two files Nernstian within 1 % of the peak current (Laviron\'s working curve) nor two beyond n·ΔEp = 200 mV: the ip–v slope would mix regimes, so Γ is the charge\'s only' };
  const alphaC = o.alpha ?? lavironAlpha ?? 0.5;
  const source = o.alpha !== null ? 'given' : lavironAlpha !== null ? "Laviron's α from the Ep–log v lines" : 'assumed 0.5';
  const gammaAt = (a: number) => irreversibleSurfaceCoverageFromSlope(sFit.slope, cell, { alpha: forward === 'cathodic' ? a : 1 - a, temperatureK: o.temperatureK });
  const ends = o.alpha === null && lavironAlpha === null ? ASSUMED_ALPHA_RANGE.map(gammaAt) : [];
  return {
    coverageFromSlopeMolPerCm2: gammaAt(alphaC), coverageFromSlopeFileCount: slow.length, coverageFromSlopeForm: 'laviron-irreversible',
    coverageFromSlopeRangeMolPerCm2: ends.length ? [Math.min(...ends), Math.max(...ends)] : null,
    coverageFromSlopeNote: `slow film, αnFQv/(2.718RT) over ${slow.length} files with n·ΔEp > 200 mV, αc = ${alphaC.toFixed(2)} (${source})${ends.length ? `; over αc 0.3–0.7 Γ spans ${ends.map((g) => g.toExponential(2)).join('–')} mol/cm²` : ''}; Γ reported is the charge's`,
  };
}

/** Laviron's α from the two lines, or why the lines are not one film's kinetics. */
function lavironLines(points: SeriesPoint[], o: ResolvedSeriesOptions): { alpha: number | null; apparentN: number | null; doubt: string | null } {
  const wide = points.filter((p) => p.deltaEpV !== null && o.electronCount * p.deltaEpV > LAVIRON_MIN_N_DELTA_EP_V);
  const anodic = fitPeakShift(wide, 'anodic', o);
  const cathodic = fitPeakShift(wide, 'cathodic', o);
  if (!anodic || !cathodic || !(anodic.slopeVPerDecade > 0) || !(cathodic.slopeVPerDecade < 0)) return { alpha: null, apparentN: null, doubt: null };
  const b = Math.LN10 * thermalVoltageV(o.temperatureK);
  const apparentN = b * (1 / anodic.slopeVPerDecade - 1 / cathodic.slopeVPerDecade);
  const alpha = lavironTransferCoefficient(anodic.slopeVPerDecade, cathodic.slopeVPerDecade);
  if (Math.abs(apparentN / o.electronCount - 1) <= LAVIRON_LINES_TOLERANCE) return { alpha, apparentN, doubt: null };
  const mv = (x: number) => `${(x * 1000).toFixed(0)} mV`;
  return {
    alpha: null, apparentN,
    doubt: `Laviron's two Ep–log v lines (${wide.length} files with n·ΔEp > 200 mV: ${mv(cathodic.slopeVPerDecade)} and +${mv(anodic.slopeVPerDecade)} per decade) imply n = ${apparentN.toFixed(2)}, not ${o.electronCount}: 1/|s_c| + 1/s_a must equal nF/(2.303RT) for any αc (Laviron 1979), so they are not one film's electron-transfer kinetics (they would give αc = ${alpha.toFixed(2)})`,
  };
}

function coverageDoubt(charge: number | null, slope: SlopeGamma): string | null {
  const g = slope.coverageFromSlopeMolPerCm2;
  if (charge === null || g === null || g === undefined) return null;
  const [lo, hi] = slope.coverageFromSlopeRangeMolPerCm2 ?? [g, g];
  if (charge >= lo * (1 - COVERAGE_AGREEMENT) && charge <= hi * (1 + COVERAGE_AGREEMENT)) return null;
  return `Γ from the ip–v slope (${g.toExponential(2)} mol/cm², ${slope.coverageFromSlopeForm} form) and Γ from the charge (${charge.toExponential(2)}) differ by ${((g / charge - 1) * 100).toFixed(0)} %, beyond the ±${COVERAGE_AGREEMENT * 100} % the two readings allow: the peaks are not shaped by the film's kinetics alone`;
}

export function seriesSurface(points: SeriesPoint[], o: ResolvedSeriesOptions, forward: PeakDirection): SeriesSurface {
  const fit = fitAgainstScanRate(points, (p) => p.forwardIpA);
  const cell = o.areaCm2 === null ? null : { electronCount: o.electronCount, areaCm2: o.areaCm2 };
  // The forward peak's baseline is drawn on its own sweep; the return peak's is carried across
  // the switch, where the charging current changes sign, so the forward charge is the safer one.
  const charges = points.flatMap((p) => {
    const q = p.forwardChargeC ?? (p.anodicChargeC ?? p.cathodicChargeC);
    return q === null ? [] : [q];
  });
  const coverageFromChargeMolPerCm2 = cell && charges.length ? median(charges.map((q) => surfaceCoverageFromCharge(q, cell))) : null;
  const lines = lavironLines(points, o);
  const { alphas, source } = surfaceAlphaSet(o, lines.alpha);
  const rows = readSurfaceFiles(points, alphas, o, forward);
  const slope = slopeCoverage(points, o, forward, lines.alpha, rows);
  const doubts = [lines.doubt, coverageDoubt(coverageFromChargeMolPerCm2, slope)].flatMap((d) => (d ? [d] : []));
  const rate = seriesSurfaceRate({ points, rows, alphas, source, doubts }, o);
  const lavironAlpha = rate.ksStatus === 'cannot-tell' ? null : lines.alpha;
  return { coverageFromChargeMolPerCm2, ...slope, fit, ...rate, lavironAlpha, lavironApparentElectronCount: lines.apparentN };
}
