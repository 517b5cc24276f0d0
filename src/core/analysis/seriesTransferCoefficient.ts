/**
 * The transfer coefficient of a series couple: one meaning everywhere (αc, the cathodic transfer
 * coefficient of O + ne⁻ → R, as the simulator and `--alpha` read it), the forward wave's αnₐ the
 * irreversible equations need, and where the value came from.
 * In: the couple's points, its kinetic class, its forward direction, the cell (αc given or not,
 *   nₐ, n, T). Out: SeriesTransferCoefficient.
 * Rules, with sources:
 *   - a given αc is used as it is; the forward wave runs with αc·nₐ (reduction first) or
 *     (1 − αc)·nₐ (oxidation first), αa + αc = 1 for one rate-determining step (R. Guidelli et al.,
 *     "Defining the transfer coefficient in electrochemistry", Pure Appl. Chem. 86, 245 (2014),
 *     from memory; Bard & Faulkner 2nd ed. §3.3);
 *   - measured only for a series that is totally irreversible by our own test (kineticClass
 *     'irreversible'), over its files beyond Nicholson's table (n·ΔEp > 212 mV at 25 °C) or
 *     without a return peak: from |dEp/d log v| = ln10·RT/(2αnₐF) (Wang, Analytical
 *     Electrochemistry 2nd ed. (2000) eq. 2-5), else from |Ep − Ep/2| = 1.857·RT/(αnₐF) (Bard &
 *     Faulkner §6.3). Both give the product αnₐ of the forward wave, which is kept as measured (D
 *     and k° need only the product); αc follows with the given nₐ, and an αc outside 0.05–0.95
 *     says nₐ is wrong rather than that the measurement is;
 *   - otherwise (reversible, quasi-reversible, or too few irreversible files) αc is assumed 0.5
 *     and 0.3–0.7 is carried into D and k° (the usual range for outer-sphere couples: Bard &
 *     Faulkner §3.3, from memory).
 */
import { thermalVoltageV, STANDARD_TEMPERATURE_K } from '../constants';
import type { PeakDirection } from '../peaks/peakTypes';
import { median } from '../statistics/median';
import type { SeriesKineticClass, SeriesPoint } from '../series/seriesPoint';
import { irreversibleShiftText, peakPotentialVsLogScanRate } from '../series/peakPotentialVsLogScanRate';
import type { SeriesTransferCoefficient } from './seriesTypes';

export interface TransferCoefficientCell {
  alpha: number | null;
  transferElectronCount: number;
  electronCount: number;
  temperatureK: number;
}

/** αc range assumed when nothing measures it. */
export const ASSUMED_ALPHA_RANGE: [number, number] = [0.3, 0.7];

/** αc from the forward wave's αnₐ (and back: the same map). */
export function alphaCFromForward(forwardAlphaNa: number, forward: PeakDirection, na: number): number {
  return forward === 'cathodic' ? forwardAlphaNa / na : 1 - forwardAlphaNa / na;
}

export function forwardAlphaNaFromC(alphaC: number, forward: PeakDirection, na: number): number {
  return (forward === 'cathodic' ? alphaC : 1 - alphaC) * na;
}

/** Files whose forward wave is totally irreversible: beyond the table, or without a return peak. */
export function irreversibleFiles(points: SeriesPoint[], n: number, temperatureK: number): SeriesPoint[] {
  return points.filter((p) => p.deltaEpV === null || n * p.deltaEpV * (STANDARD_TEMPERATURE_K / temperatureK) > 0.212);
}

/** αnₐ of the forward wave and its 95 % range from Ep against log v over the irreversible files. */
function fromPeakShift(files: SeriesPoint[], forward: PeakDirection, temperatureK: number): { value: number; range: [number, number] } | null {
  const ep = files.flatMap((p) => {
    const e = forward === 'anodic' ? p.epaV : p.epcV;
    return e === null ? [] : [{ v: p.scanRateVPerS, e }];
  });
  if (new Set(ep.map((x) => x.v)).size < 2) return null;
  const r = peakPotentialVsLogScanRate({ scanRatesVPerS: ep.map((x) => x.v), peakPotentialsV: ep.map((x) => x.e), direction: forward }, { temperatureK });
  if (r.alphaTimesTransferElectrons === null) return null;
  const k = (Math.LN10 * thermalVoltageV(temperatureK)) / 2;
  const ci = r.fit.slopeInterval;
  const s = forward === 'anodic' ? 1 : -1;
  const value = r.alphaTimesTransferElectrons;
  // The 95 % interval of the slope, widened to ±2 % of αnₐ at least: the law holds in the totally
  // irreversible limit only, and a series just past the table departs from it by about 1 % (measured
  // with the simulator).
  const fromCi = ci && s * ci[0] > 0 && s * ci[1] > 0 ? [k / Math.max(Math.abs(ci[0]), Math.abs(ci[1])), k / Math.min(Math.abs(ci[0]), Math.abs(ci[1]))] : [value, value];
  return { value, range: [Math.min(fromCi[0]!, 0.98 * value), Math.max(fromCi[1]!, 1.02 * value)] };
}

function fromHalfPeakWidth(files: SeriesPoint[], temperatureK: number): { value: number; range: [number, number] } | null {
  const w = files.flatMap((p) => (p.forwardHalfPeakWidthV === null || !(p.forwardHalfPeakWidthV > 0) ? [] : [p.forwardHalfPeakWidthV]));
  if (!w.length) return null;
  const an = (width: number) => (1.857 * thermalVoltageV(temperatureK)) / width;
  return { value: an(median(w)), range: [an(Math.max(...w)), an(Math.min(...w))] };
}

function assumed(forward: PeakDirection, na: number, why: string): SeriesTransferCoefficient {
  const [lo, hi] = ASSUMED_ALPHA_RANGE;
  const ends = [forwardAlphaNaFromC(lo, forward, na), forwardAlphaNaFromC(hi, forward, na)];
  return {
    alphaC: 0.5, alphaCRange: [lo, hi], forwardAlphaNa: forwardAlphaNaFromC(0.5, forward, na),
    forwardAlphaNaRange: [Math.min(...ends), Math.max(...ends)], forwardWave: forward, transferElectronCount: na, source: 'assumed',
    text: `αc assumed 0.5 (${why}); D and k° are given over αc ${lo}–${hi}`, note: null,
  };
}

export function seriesTransferCoefficient(points: SeriesPoint[], kineticClass: SeriesKineticClass, forward: PeakDirection, cell: TransferCoefficientCell): SeriesTransferCoefficient {
  const na = cell.transferElectronCount;
  const wave = `${forward === 'cathodic' ? 'reduction' : 'oxidation'} first`;
  if (cell.alpha !== null) {
    const an = forwardAlphaNaFromC(cell.alpha, forward, na);
    return {
      alphaC: cell.alpha, alphaCRange: [cell.alpha, cell.alpha], forwardAlphaNa: an, forwardAlphaNaRange: [an, an], forwardWave: forward,
      transferElectronCount: na, source: 'given', text: `αc = ${cell.alpha} given; forward wave (${wave}) αnₐ = ${an.toFixed(3)} with nₐ = ${na}`, note: null,
    };
  }
  if (kineticClass === 'reversible') return { ...assumed(forward, na, ''), text: 'αc does not enter: the couple reads as reversible' };
  if (kineticClass === 'quasi-reversible') return assumed(forward, na, 'the series is not totally irreversible, so Ep against log v does not measure α; a whole-curve fit of the series does (Fit view, or fit on the command line)');
  if (kineticClass !== 'irreversible') return assumed(forward, na, 'the series is not totally irreversible, so Ep against log v does not measure α');
  const files = irreversibleFiles(points, cell.electronCount, cell.temperatureK);
  const shift = fromPeakShift(files, forward, cell.temperatureK);
  const width = shift ? null : fromHalfPeakWidth(files, cell.temperatureK);
  const m = shift ?? width;
  if (!m) return assumed(forward, na, 'fewer than two scan rates beyond Nicholson\'s table and no peak width');
  const how = shift ? `Ep against log v over ${files.length} files (${irreversibleShiftText(cell.temperatureK)} per decade)` : '|Ep − Ep/2| = 1.857RT/(αnₐF)';
  const alphaC = alphaCFromForward(m.value, forward, na);
  const ends = m.range.map((x) => alphaCFromForward(x, forward, na));
  const possible = alphaC >= 0.05 && alphaC <= 0.95;
  const suggested = Math.max(1, Math.round(m.value / 0.5));
  return {
    alphaC: possible ? alphaC : null,
    alphaCRange: possible ? [Math.max(0.05, Math.min(...ends)), Math.min(0.95, Math.max(...ends))] : null,
    forwardAlphaNa: m.value, forwardAlphaNaRange: m.range, forwardWave: forward, transferElectronCount: na,
    source: shift ? 'peak-shift' : 'half-peak-width',
    text: `forward wave (${wave}) αnₐ = ${m.value.toFixed(3)} (95 % ${m.range[0].toFixed(3)}–${m.range[1].toFixed(3)}) from ${how}; αc = ${possible ? alphaC.toFixed(3) : '—'} with nₐ = ${na}`,
    note: possible ? null : `αnₐ = ${m.value.toFixed(2)} is not possible with nₐ = ${na} (αc would be ${alphaC.toFixed(2)}): give nₐ (${suggested} fits αc ≈ 0.5); D and k° from the forward peak use the measured αnₐ, E°′ from the return peak needs αc`,
  };
}
