/**
 * Coverage and rate of a surface-confined series couple: Γ from the forward peak's charge, Γ from
 * the slope of ip against v in the form its regime allows, Laviron's α and k_s.
 * Sources: Γ = Q/(nFA) and the Nernstian slope n²F²AΓ/(4RT) (Laviron 1974; lavironSurfaceWave.ts);
 *   the irreversible slope α·n²F²AΓ/(2.718RT) and k_s, α from ΔEp and the Ep–log v lines
 *   (Laviron, J. Electroanal. Chem. 101, 19 (1979); lavironIrreversibleWave.ts,
 *   lavironRateConstant.ts).
 * Choice of the slope form (ours): over the files whose n·ΔEp stays within 1.109·RT/F (Nernstian
 *   film) when two scan rates or more are there; else over the files with n·ΔEp > 200 mV
 *   (irreversible limit), with αc given, else Laviron's α, else 0.5 with the range over αc
 *   0.3–0.7; else no slope Γ (the slope mixes regimes), and the charge stands alone.
 */
import { thermalVoltageV } from '../constants';
import { LAVIRON_MIN_N_DELTA_EP_V, lavironRateConstant, lavironTransferCoefficient } from '../kinetics';
import type { PeakDirection } from '../peaks/peakTypes';
import { irreversibleSurfaceCoverageFromSlope, surfaceCoverageFromCharge, surfaceCoverageFromSlope } from '../series';
import type { SeriesPoint } from '../series/seriesPoint';
import { median } from '../statistics/median';
import { fitAgainstScanRate, fitPeakShift, type ResolvedSeriesOptions } from './seriesFits';
import type { SeriesSurface } from './seriesTypes';
import { ASSUMED_ALPHA_RANGE } from './seriesTransferCoefficient';

type SlopeGamma = Pick<SeriesSurface, 'coverageFromSlopeMolPerCm2' | 'coverageFromSlopeFileCount' | 'coverageFromSlopeForm' | 'coverageFromSlopeRangeMolPerCm2' | 'coverageFromSlopeNote'>;

const distinctRates = (points: SeriesPoint[]) => new Set(points.map((p) => p.scanRateVPerS)).size;

function slopeCoverage(points: SeriesPoint[], o: ResolvedSeriesOptions, forward: PeakDirection, lavironAlpha: number | null): SlopeGamma {
  const none = { coverageFromSlopeMolPerCm2: null, coverageFromSlopeForm: null, coverageFromSlopeRangeMolPerCm2: null };
  if (o.areaCm2 === null) return { ...none, coverageFromSlopeNote: 'needs the electrode area' };
  const cell = { electronCount: o.electronCount, areaCm2: o.areaCm2 };
  const nernstian = points.filter((p) => p.deltaEpV !== null && o.electronCount * Math.abs(p.deltaEpV) <= 1.109 * thermalVoltageV(o.temperatureK));
  const nFit = distinctRates(nernstian) >= 2 ? fitAgainstScanRate(nernstian, (p) => p.forwardIpA) : null;
  if (nFit) {
    return { coverageFromSlopeMolPerCm2: surfaceCoverageFromSlope(nFit.slope, cell, { temperatureK: o.temperatureK }), coverageFromSlopeFileCount: nernstian.length,
      coverageFromSlopeForm: 'nernstian', coverageFromSlopeRangeMolPerCm2: null, coverageFromSlopeNote: `Nernstian film, n²F²AΓ/4RT over ${nernstian.length} files with n·ΔEp ≤ 28.5 mV` };
  }
  const slow = points.filter((p) => p.deltaEpV !== null && o.electronCount * p.deltaEpV > LAVIRON_MIN_N_DELTA_EP_V);
  const sFit = distinctRates(slow) >= 2 ? fitAgainstScanRate(slow, (p) => p.forwardIpA) : null;
  if (!sFit) return { ...none, coverageFromSlopeNote: 'the ip–v slope mixes Nernstian and slow files (neither two files with n·ΔEp ≤ 28.5 mV nor two beyond 200 mV): Γ from the charge only' };
  const alphaC = o.alpha ?? lavironAlpha ?? 0.5;
  const source = o.alpha !== null ? 'given' : lavironAlpha !== null ? "Laviron's α from the Ep–log v lines" : 'assumed 0.5';
  const gammaAt = (a: number) => irreversibleSurfaceCoverageFromSlope(sFit.slope, cell, { alpha: forward === 'cathodic' ? a : 1 - a, temperatureK: o.temperatureK });
  const ends = o.alpha === null && lavironAlpha === null ? ASSUMED_ALPHA_RANGE.map(gammaAt) : [];
  return {
    coverageFromSlopeMolPerCm2: gammaAt(alphaC), coverageFromSlopeFileCount: slow.length, coverageFromSlopeForm: 'laviron-irreversible',
    coverageFromSlopeRangeMolPerCm2: ends.length ? [Math.min(...ends), Math.max(...ends)] : null,
    coverageFromSlopeNote: `slow film, αnFQv/(2.718RT) over ${slow.length} files with n·ΔEp > 200 mV, αc = ${alphaC.toFixed(2)} (${source})${ends.length ? `; over αc 0.3–0.7 Γ spans ${ends.map((g) => g.toExponential(2)).join('–')} mol/cm²` : ''}`,
  };
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
  return { coverageFromChargeMolPerCm2, ...slopeCoverage(points, o, forward, lavironAlpha), fit, ksPerS: ks.length ? median(ks) : null, ksPerFile, lavironAlpha };
}
