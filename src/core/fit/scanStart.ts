/**
 * A coarse grid search over the parameters whose starting values the peak analysis gets worst
 * (rate constants, and R_u, which ΔEp confuses with slow kinetics), before the iteration: the
 * sum of squares is evaluated on a small grid around the starting values (other parameters held)
 * and the best grid point becomes the start. This keeps Levenberg–Marquardt from crawling along
 * the R_u–k° valley from a start on its far end. Common practice, no source.
 * In: the fit context and the starting values. Out: the best values found and the evaluations used.
 */
import { cloneValues } from './fitParameters';
import { residualsAt, type FitContext } from './fitProblem';
import type { FitModelValues } from './fitTypes';

const FACTORS: Record<string, number[]> = {
  k0CmPerS: [0.1, 1, 10, 100],
  surfaceRatePerS: [0.1, 1, 10, 100],
  followUpRatePerS: [0.1, 1, 10],
  uncompensatedOhm: [1, 5, 20, 80],
};
const MAX_POINTS = 64;

export function scanStart(ctx: FitContext, start: FitModelValues): { values: FitModelValues; evaluations: number } {
  const axes = ctx.layout.entries.filter((e) => e.parameter in FACTORS);
  if (axes.length === 0) return { values: start, evaluations: 0 };
  let grid: FitModelValues[] = [start];
  for (const e of axes) {
    const factors = FACTORS[e.parameter] as number[];
    if (grid.length * factors.length > MAX_POINTS) break;
    grid = grid.flatMap((v) => factors.map((f) => {
      const w = cloneValues(v);
      ctx.layout.set(w, e, ctx.layout.valueOf(v, e) * f);
      return w;
    }));
  }
  const r = new Float64Array(ctx.measuredA.length);
  let best = start;
  let bestCost = Infinity;
  for (const v of grid) {
    let cost = Infinity;
    try {
      residualsAt(ctx, v, r);
      cost = r.reduce((s, x) => s + x * x, 0);
    } catch (err) {
      if ((err as { code?: string }).code === 'CANCELLED') throw err;
    }
    if (cost < bestCost) [best, bestCost] = [v, cost];
  }
  return { values: best, evaluations: grid.length };
}
