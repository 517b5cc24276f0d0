/**
 * One gap (A) from the gaps of a window of potentials, robust to single bad points, with its
 * standard uncertainty from the window's own scatter.
 * In: potentials (V) and gaps (A) of the window, the chosen potential first (chargingCurrentGap.ts).
 * Out: the median gap, its standard uncertainty (A; null with fewer than four points), the count.
 * Sources: the variance of the sample median of N normal deviates, π·σ²/(2N) (M. G. Kendall,
 *   A. Stuart, The Advanced Theory of Statistics, vol. 1, the asymptotic distribution of the
 *   median, from memory); σ from the residuals about a straight line in E (a capacitance or a tail
 *   that changes across the window is a trend, not noise); for correlated neighbours (a filtered
 *   record) N is replaced by N(1 − ρ)/(1 + ρ), ρ the lag-one correlation of the residuals
 *   (common practice, no source). The median of a line sampled evenly about its centre is its
 *   centre value, so the trend does not move the median.
 */
import { assertSameLength } from '../errors';
import { fitLine } from '../regression';
import { median } from '../statistics/median';

export interface WindowMedianGap {
  gapA: number;
  standardUncertaintyA: number | null;
  pointCount: number;
}

export function windowMedianGap(potentialV: ArrayLike<number>, gapA: ArrayLike<number>): WindowMedianGap {
  assertSameLength({ potentialV, gapA }, 1);
  const n = gapA.length;
  const m = median(gapA);
  if (n < 4) return { gapA: m, standardUncertaintyA: null, pointCount: n };
  const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => (potentialV[a] as number) - (potentialV[b] as number));
  const e = order.map((i) => potentialV[i] as number);
  const g = order.map((i) => gapA[i] as number);
  const line = fitLine(e, g);
  const r = g.map((y, i) => y - (line.slope * e[i]! + line.intercept));
  const s2 = r.reduce((s, x) => s + x * x, 0) / (n - 2);
  let lag = 0;
  for (let i = 1; i < n; i++) lag += r[i]! * r[i - 1]!;
  const rho = s2 > 0 ? Math.min(0.9, Math.max(0, lag / (n - 1) / s2)) : 0;
  const effective = Math.max(1, (n * (1 - rho)) / (1 + rho));
  return { gapA: m, standardUncertaintyA: Math.sqrt((Math.PI / 2) * (s2 / effective)), pointCount: n };
}
