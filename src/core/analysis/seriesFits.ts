/**
 * The straight lines of a series couple: |ip| against v^½ (anodic, cathodic, forward), log|ip|
 * against log v and Ep against log v. Sources are in the called methods (series/, regression/).
 */
import { fitLine } from '../regression';
import type { FitLineResult } from '../regression';
import type { NicholsonPsiMethod } from '../kinetics';
import { logLogSlope, peakPotentialVsLogScanRate } from '../series';
import type { PeakPotentialVsLogScanRateResult } from '../series';
import type { ResolvedCell } from './runTypes';
import type { SeriesCouple } from './seriesTypes';
import type { SeriesPoint } from '../series/seriesPoint';

/** Series options after defaults and checks: the cell values the series uses, the cycle, the matching tolerance and the ψ method. */
export type ResolvedSeriesOptions = Pick<ResolvedCell, 'electronCount' | 'areaCm2' | 'concentrationMolPerCm3' | 'temperatureK' | 'alpha'
  | 'transferElectronCount' | 'transferElectronCountGiven' | 'diffusionRatio' | 'diffusionCm2PerS' | 'formalPotentialV' | 'ruOhm'> & { cycle: number; matchToleranceV: number; psiMethod: NicholsonPsiMethod };

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
 * The forward |ip| against v^½; with a single scan rate, the line through the origin (Randles–Ševčík
 * has no intercept) and every file's forward peak at that rate: replicates average, and with two or
 * more the slope's interval comes from their scatter. R² is left undefined (NaN).
 */
export function fitForwardAgainstSqrtScanRate(points: SeriesPoint[]): FitLineResult | null {
  const fit = fitAgainstSqrtScanRate(points, (p) => p.forwardIpA);
  if (fit) return fit;
  const peaks = points.filter((p) => p.forwardIpA !== null && p.forwardIpA > 0);
  if (peaks.length === 0 || new Set(points.map((p) => p.scanRateVPerS)).size !== 1) return null;
  return { ...fitLine(peaks.map(sqrtV), peaks.map((p) => p.forwardIpA as number), { throughOrigin: true }), r2: Number.NaN };
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
