/**
 * The straight lines of a series couple: |ip| against v^½ (anodic, cathodic, forward), log|ip|
 * against log v, Ep against log v, and D from the forward slope by Randles–Ševčík in the form
 * the kinetic class calls for. Sources are in the called methods (series/, regression/).
 */
import { fitLine } from '../regression';
import type { FitLineResult } from '../regression';
import { STANDARD_TEMPERATURE_K } from '../constants';
import { TABLE_RANGE_MV, kineticPeakCurrentRatio, nicholsonPsi } from '../kinetics';
import { logLogSlope, peakPotentialVsLogScanRate, randlesSevcikDiffusion } from '../series';
import type { PeakPotentialVsLogScanRateResult } from '../series';
import { chooseIrreversibleAlpha } from '../series/classifySeriesCouple';
import type { ResolvedCell } from './runTypes';
import type { SeriesCouple, SeriesDiffusion } from './seriesTypes';
import type { SeriesKineticClass, SeriesPoint } from '../series/seriesPoint';
import type { PeakDirection } from '../peaks/peakTypes';

/** Series options after defaults and checks: the cell values the series uses, the cycle and the matching tolerance. */
export type ResolvedSeriesOptions = Pick<ResolvedCell, 'electronCount' | 'areaCm2' | 'concentrationMolPerCm3' | 'temperatureK' | 'alpha'
  | 'transferElectronCount' | 'diffusionRatio' | 'diffusionCm2PerS'> & { cycle: number; matchToleranceV: number };

type PointValue = (p: SeriesPoint) => number | null;

/** Pairs (x, y) of the points where `y` is known, when at least two distinct x remain. */
function pairs(points: SeriesPoint[], x: (p: SeriesPoint) => number, y: PointValue): { x: number[]; y: number[] } | null {
  const xs: number[] = [];
  const ys: number[] = [];
  for (const p of points) {
    const v = y(p);
    if (v === null || !Number.isFinite(v)) continue;
    xs.push(x(p));
    ys.push(v);
  }
  return new Set(xs).size >= 2 ? { x: xs, y: ys } : null;
}

const sqrtV = (p: SeriesPoint) => Math.sqrt(p.scanRateVPerS);
const scanRate = (p: SeriesPoint) => p.scanRateVPerS;

/** |ip| against v^½ for the chosen current; null with fewer than two scan rates. */
export function fitAgainstSqrtScanRate(points: SeriesPoint[], y: PointValue): FitLineResult | null {
  const d = pairs(points, sqrtV, y);
  return d ? fitLine(d.x, d.y) : null;
}

/**
 * The forward |ip| against v^½; with a single scan rate, the line through the origin and that
 * one point (Randles–Ševčík has no intercept), with R² left undefined (NaN).
 */
export function fitForwardAgainstSqrtScanRate(points: SeriesPoint[]): FitLineResult | null {
  const fit = fitAgainstSqrtScanRate(points, (p) => p.forwardIpA);
  if (fit) return fit;
  const one = points.find((p) => p.forwardIpA !== null && p.forwardIpA > 0);
  if (!one || new Set(points.map((p) => p.scanRateVPerS)).size !== 1) return null;
  return { ...fitLine([sqrtV(one)], [one.forwardIpA as number], { throughOrigin: true }), r2: Number.NaN };
}

/** |ip| against v; null with fewer than two scan rates. */
export function fitAgainstScanRate(points: SeriesPoint[], y: PointValue): FitLineResult | null {
  const d = pairs(points, scanRate, y);
  return d ? fitLine(d.x, d.y) : null;
}

export function fitLogLog(points: SeriesPoint[]): SeriesCouple['logLog'] {
  const d = pairs(points, scanRate, (p) => (p.forwardIpA !== null && p.forwardIpA > 0 ? p.forwardIpA : null));
  return d ? logLogSlope(d.x, d.y) : null;
}

export function fitPeakShift(points: SeriesPoint[], direction: 'anodic' | 'cathodic', o: ResolvedSeriesOptions): PeakPotentialVsLogScanRateResult | null {
  const d = pairs(points, scanRate, (p) => (direction === 'anodic' ? p.epaV : p.epcV));
  if (!d) return null;
  return peakPotentialVsLogScanRate(
    { scanRatesVPerS: d.x, peakPotentialsV: d.y, direction },
    { transferElectronCount: o.transferElectronCount, temperatureK: o.temperatureK },
  );
}

const alphaOf = (o: ResolvedSeriesOptions) => o.alpha ?? 0.5;

/** K(ψ) of one file: 1 below Nicholson's table (reversible), null beyond it or without ΔEp. */
function kineticRatio(p: SeriesPoint, o: ResolvedSeriesOptions, forwardAlpha: number): number | null {
  if (p.deltaEpV === null) return null;
  const x25 = o.electronCount * p.deltaEpV * 1000 * (STANDARD_TEMPERATURE_K / o.temperatureK);
  if (x25 < TABLE_RANGE_MV[0]) return 1;
  if (x25 > TABLE_RANGE_MV[1]) return null;
  return kineticPeakCurrentRatio(nicholsonPsi(p.deltaEpV, { electronCount: o.electronCount, temperatureK: o.temperatureK }).psi, forwardAlpha);
}

/** |ip|/K(ψ) against v^½ over the files where ψ is known; null when none is. */
function kineticallyCorrectedFit(points: SeriesPoint[], o: ResolvedSeriesOptions, forward: PeakDirection): FitLineResult | null {
  // The forward wave of an oxidation runs with 1 − α (α is that of the reduction).
  const forwardAlpha = forward === 'cathodic' ? alphaOf(o) : 1 - alphaOf(o);
  const kept = points.flatMap((p) => {
    if (p.forwardIpA === null || !(p.forwardIpA > 0)) return [];
    const k = kineticRatio(p, o, forwardAlpha);
    return k === null ? [] : [{ ...p, forwardIpA: p.forwardIpA / k }];
  });
  return fitForwardAgainstSqrtScanRate(kept);
}

/** D of the bulk species from the forward slope, or null (with the reason) when it cannot be had. */
export function seriesDiffusion(
  fit: FitLineResult | null,
  kineticClass: SeriesKineticClass,
  shift: PeakPotentialVsLogScanRateResult | null,
  points: SeriesPoint[],
  o: ResolvedSeriesOptions,
  forward: PeakDirection = 'cathodic',
): { diffusion: SeriesDiffusion | null; reason: string | null } {
  if (!fit) return { diffusion: null, reason: 'needs at least two scan rates' };
  if (o.areaCm2 === null) return { diffusion: null, reason: 'needs the electrode area' };
  if (o.concentrationMolPerCm3 === null) return { diffusion: null, reason: 'needs the bulk concentration' };
  const cell = { electronCount: o.electronCount, areaCm2: o.areaCm2, concentrationMolPerCm3: o.concentrationMolPerCm3 };
  const irreversible = kineticClass === 'irreversible';
  const a = irreversible ? chooseIrreversibleAlpha(o.alpha, shift, points, o.transferElectronCount, o.temperatureK) : null;
  const rs = {
    form: irreversible ? ('irreversible' as const) : ('reversible' as const),
    temperatureK: o.temperatureK,
    transferElectronCount: o.transferElectronCount,
    ...(a ? { alpha: a.alpha } : {}),
  };
  // A quasi-reversible peak is lower than the reversible one by K(ψ); divide it out first.
  const corrected = kineticClass === 'quasi-reversible' ? kineticallyCorrectedFit(points, o, forward) : null;
  const used = corrected ?? fit;
  const d = randlesSevcikDiffusion(used.slope, cell, rs);
  const ci = used.slopeInterval;
  const intervalCm2PerS: [number, number] | null = ci && ci[0] > 0
    ? [randlesSevcikDiffusion(ci[0], cell, rs), randlesSevcikDiffusion(ci[1], cell, rs)]
    : null;
  const note = kineticClass === 'quasi-reversible'
    ? corrected
      ? `quasi-reversible couple: peak currents divided by K(ψ) (Nicholson's ψ from ΔEp, α = ${alphaOf(o)}; working curve from the simulator) before the reversible form`
      : 'quasi-reversible couple: no ψ could be read, so the reversible form is used on the raw peaks and D is a lower bound'
    : kineticClass === 'inconclusive' ? 'kinetic class unclear: reversible form used'
      : fit.pointCount === 1 ? 'one scan rate only: D from a single peak through the origin, with no check of linearity' : null;
  return {
    diffusion: {
      diffusionCm2PerS: d, intervalCm2PerS, form: rs.form, alphaUsed: a?.alpha ?? null, alphaSource: a?.source ?? null, note,
      slopeRelativeStdError: used.slopeStdError === null ? null : used.slopeStdError / used.slope, slopeDegreesOfFreedom: used.degreesOfFreedom,
    },
    reason: null,
  };
}
