/**
 * The straight lines of a series couple: |ip| against v^½ (anodic, cathodic, forward), log|ip|
 * against log v, Ep against log v, and D from the forward slope by Randles–Ševčík in the form
 * the kinetic class calls for. Sources are in the called methods (series/, regression/).
 */
import { fitLine } from '../regression';
import type { FitLineResult } from '../regression';
import { logLogSlope, peakPotentialVsLogScanRate, randlesSevcikDiffusion } from '../series';
import type { PeakPotentialVsLogScanRateResult } from '../series';
import { chooseIrreversibleAlpha } from './seriesClassify';
import type { SeriesCouple, SeriesDiffusion, SeriesKineticClass, SeriesPoint } from './seriesTypes';

export interface ResolvedSeriesOptions {
  electronCount: number;
  areaCm2: number | null;
  concentrationMolPerCm3: number | null;
  temperatureK: number;
  alpha: number | null;
  transferElectronCount: number;
  diffusionRatio: number;
  diffusionCm2PerS: number | null;
  cycle: number;
  matchToleranceV: number;
}

type Pick = (p: SeriesPoint) => number | null;

/** Pairs (x, y) of the points where `y` is known, when at least two distinct x remain. */
function pairs(points: SeriesPoint[], x: (p: SeriesPoint) => number, y: Pick): { x: number[]; y: number[] } | null {
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
export function fitAgainstSqrtScanRate(points: SeriesPoint[], y: Pick): FitLineResult | null {
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
export function fitAgainstScanRate(points: SeriesPoint[], y: Pick): FitLineResult | null {
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

function slowestPoint(points: SeriesPoint[]): SeriesPoint | null {
  const usable = points.filter((p) => p.forwardIpA !== null && p.forwardIpA > 0);
  return usable.sort((a, b) => a.scanRateVPerS - b.scanRateVPerS)[0] ?? null;
}

/** D of the bulk species from the forward slope, or null (with the reason) when it cannot be had. */
export function seriesDiffusion(
  fit: FitLineResult | null,
  kineticClass: SeriesKineticClass,
  shift: PeakPotentialVsLogScanRateResult | null,
  points: SeriesPoint[],
  o: ResolvedSeriesOptions,
): { diffusion: SeriesDiffusion | null; reason: string | null } {
  if (!fit) return { diffusion: null, reason: 'needs at least two scan rates' };
  if (o.areaCm2 === null) return { diffusion: null, reason: 'needs the electrode area (--area)' };
  if (o.concentrationMolPerCm3 === null) return { diffusion: null, reason: 'needs the bulk concentration (--conc)' };
  const cell = { electronCount: o.electronCount, areaCm2: o.areaCm2, concentrationMolPerCm3: o.concentrationMolPerCm3 };
  const irreversible = kineticClass === 'irreversible';
  const a = irreversible ? chooseIrreversibleAlpha(o.alpha, shift, points, o.transferElectronCount, o.temperatureK) : null;
  const rs = {
    form: irreversible ? ('irreversible' as const) : ('reversible' as const),
    temperatureK: o.temperatureK,
    transferElectronCount: o.transferElectronCount,
    ...(a ? { alpha: a.alpha } : {}),
  };
  // A quasi-reversible couple comes closest to the reversible limit at the slowest scan rate,
  // where its ip/v^½ is largest; the slope of the whole series is pulled down further.
  const slowest = kineticClass === 'quasi-reversible' ? slowestPoint(points) : null;
  const d = slowest
    ? randlesSevcikDiffusion((slowest.forwardIpA as number) / Math.sqrt(slowest.scanRateVPerS), cell, rs)
    : randlesSevcikDiffusion(fit.slope, cell, rs);
  const ci = fit.slopeInterval;
  const intervalCm2PerS: [number, number] | null = !slowest && ci && ci[0] > 0
    ? [randlesSevcikDiffusion(ci[0], cell, rs), randlesSevcikDiffusion(ci[1], cell, rs)]
    : null;
  const note = kineticClass === 'quasi-reversible'
    ? `quasi-reversible couple: D from the slowest scan rate (${slowest ? Number(slowest.scanRateVPerS.toPrecision(4)) : '?'} V/s) with the reversible form; the peak current lies below the reversible limit, so this D is a lower bound`
    : kineticClass === 'unknown' ? 'kinetic class unclear: reversible form used'
      : fit.pointCount === 1 ? 'one scan rate only: D from a single peak through the origin, with no check of linearity' : null;
  return {
    diffusion: { diffusionCm2PerS: d, intervalCm2PerS, form: rs.form, alphaUsed: a?.alpha ?? null, alphaSource: a?.source ?? null, note },
    reason: null,
  };
}
