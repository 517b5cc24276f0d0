/**
 * Settles the transport regime and kinetic class of a series couple from the per-file verdicts
 * and peak separations (the transfer coefficient is chosen in analysis/seriesTransferCoefficient.ts).
 * Rules (design; thresholds named with their sources):
 *   - surface when most files call the couple adsorbed, or when over three or more scan rates
 *     log|ip| rises with log v at a slope inside LOG_LOG_SURFACE_BAND (ip ∝ v, Laviron 1974; band:
 *     common practice, no source); its kinetic class from ΔEp against v (surfaceKinetics);
 *   - where most files have a peak pair, the median n·ΔEp (scaled to 25 °C) decides first: above
 *     212 mV (the end of Nicholson's 1965 table) irreversible, above 65 mV (ψ below 5 in the same
 *     table) quasi-reversible; otherwise the single-trace verdicts decide;
 *   - 'quasi-reversible' couples with median n·ΔEp above 212 mV are irreversible, quasi-reversible otherwise;
 *   - an irreversible-looking couple is irreversible when its forward peak is broader than 1.25× the reversible
 *     |Ep − Ep/2| = 2.20·RT/nF (Nicholson & Shain 1964; the 1.25 margin is common practice, no
 *     source); otherwise the loss of the return peak is put down to chemistry and the forward
 *     peak is treated as reversible; with no forward peak at all (a lone peak on the return sweep),
 *     or a lone forward peak at a single scan rate, the class is inconclusive.
 */
import { STANDARD_TEMPERATURE_K, thermalVoltageV } from '../constants';
import { median } from '../statistics/median';
import { LOG_LOG_SURFACE_BAND } from './logLogSlope';
import type { SeriesKineticClass, SeriesPoint, SeriesRegime } from './seriesPoint';
import type { VerdictCategory } from '../couples/coupleTypes';

export function mostCommon(categories: VerdictCategory[]): VerdictCategory {
  const counts = new Map<VerdictCategory, number>();
  for (const c of categories) counts.set(c, (counts.get(c) ?? 0) + 1);
  let best: VerdictCategory = 'inconclusive';
  let bestCount = 0;
  for (const [c, k] of counts) if (k > bestCount || (k === bestCount && c !== 'inconclusive')) { best = c; bestCount = k; }
  return best;
}

export function classifySeriesCouple(
  points: SeriesPoint[],
  electronCount: number,
  temperatureK: number,
  logLogSlope: number | null = null,
): { regime: SeriesRegime; kineticClass: SeriesKineticClass; majority: VerdictCategory } {
  const majority = mostCommon(points.map((p) => p.verdict));
  const rates = new Set(points.map((p) => p.scanRateVPerS)).size;
  const linearInV = logLogSlope !== null && rates >= 3 && logLogSlope >= LOG_LOG_SURFACE_BAND[0] && logLogSlope <= LOG_LOG_SURFACE_BAND[1];
  const deltas = points.flatMap((p) => (p.deltaEpV === null ? [] : [electronCount * p.deltaEpV * (STANDARD_TEMPERATURE_K / temperatureK)]));
  if (majority === 'adsorbed' || linearInV) return { regime: 'surface', kineticClass: surfaceKinetics(points, electronCount, temperatureK), majority };
  const rt = thermalVoltageV(temperatureK);
  const widths = points.flatMap((p) => (p.forwardHalfPeakWidthV === null ? [] : [p.forwardHalfPeakWidthV]));
  // Where most files have a peak pair, the measured separation outranks the single-trace labels.
  if (deltas.length * 2 >= points.length) {
    const d = median(deltas);
    if (d > 0.212) return { regime: 'diffusion', kineticClass: 'irreversible', majority };
    if (d > 0.065) return { regime: 'diffusion', kineticClass: 'quasi-reversible', majority };
  }
  switch (majority) {
    case 'reversible':
    case 'chemically-coupled':
      return { regime: 'diffusion', kineticClass: 'reversible', majority };
    case 'quasi-reversible':
      return { regime: 'diffusion', kineticClass: deltas.length && median(deltas) > 0.212 ? 'irreversible' : 'quasi-reversible', majority };
    case 'irreversible': {
      // A lone peak on the return sweep has no forward width to judge by: nothing to tell. Nor has
      // a lone forward peak at one scan rate: a fast follow-up reaction and a slow electron transfer
      // (αnₐ near 1) both narrow it, and only its shift with v tells them apart.
      if (widths.length === 0 || (rates < 2 && deltas.length === 0)) return { regime: 'diffusion', kineticClass: 'inconclusive', majority };
      const broad = median(widths) > 1.25 * (2.2 * rt) / electronCount;
      return { regime: 'diffusion', kineticClass: broad ? 'irreversible' : 'reversible', majority };
    }
    default:
      return { regime: 'diffusion', kineticClass: 'inconclusive', majority };
  }
}

/**
 * Kinetic class of a surface couple from n·ΔEp (25 °C) against scan rate: 'reversible' when it
 * stays within 1.109·RT/F (28.5 mV, as for a Nernstian layer whose ΔEp is 0, Bard & Faulkner 2nd
 * ed. §14.3, from memory) at every rate; 'quasi-reversible' (slow electron transfer in Laviron's
 * sense, J. Electroanal. Chem. 101 (1979) 19) when it exceeds that at the fastest rate and grows
 * by 20 mV or more from the slowest (margin: common practice, no source); 'inconclusive' otherwise.
 */
export function surfaceKinetics(points: SeriesPoint[], electronCount: number, temperatureK: number): SeriesKineticClass {
  const byRate = points.filter((p) => p.deltaEpV !== null).sort((a, b) => a.scanRateVPerS - b.scanRateVPerS);
  if (!byRate.length) return 'inconclusive';
  const x = byRate.map((p) => electronCount * p.deltaEpV! * (STANDARD_TEMPERATURE_K / temperatureK));
  const limit = 1.109 * thermalVoltageV(STANDARD_TEMPERATURE_K);
  if (x.every((d) => Math.abs(d) <= limit)) return 'reversible';
  const grows = byRate.length >= 2 && x[x.length - 1]! > limit && x[x.length - 1]! - x[0]! >= 0.02;
  return grows ? 'quasi-reversible' : 'inconclusive';
}

/**
 * n suggested by the forward peaks' |Ep − Ep/2| when they are narrower than a diffusing couple
 * can be for the assumed n: the reversible 2.20·RT/nF (Nicholson & Shain, Anal. Chem. 36 (1964)
 * 706; Bard & Faulkner 2nd ed. §6.2, from memory) is the narrowest a diffusion wave gets, since
 * slow kinetics only widen it. Below 0.75 of it (margin: common practice, no source) the median
 * width reads as n = round(2.20·RT/(F·width)); null when the widths fit the assumed n.
 */
export function suggestedElectronCount(points: SeriesPoint[], electronCount: number, temperatureK: number): { electronCount: number; halfPeakWidthV: number } | null {
  const widths = points.flatMap((p) => (p.forwardHalfPeakWidthV === null ? [] : [p.forwardHalfPeakWidthV]));
  if (!widths.length) return null;
  const w = median(widths);
  const reversible = 2.2 * thermalVoltageV(temperatureK);
  if (!(w > 0) || w >= (0.75 * reversible) / electronCount) return null;
  const n = Math.round(reversible / w);
  return n > electronCount ? { electronCount: n, halfPeakWidthV: w } : null;
}
