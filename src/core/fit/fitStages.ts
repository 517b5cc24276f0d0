/**
 * Runs Levenberg–Marquardt on a fit problem with frozen grids. When D, D_O/D_R or k_f move by
 * more than the grid margin (a factor 2) from where the grids were made, the iteration stops,
 * the grids are made again there and the iteration goes on (a frozen grid is at least as
 * accurate as the automatic one within that range). Common practice, no source.
 */
import type { SimulateCvOptions } from '../simulation';
import { GRID_MARGIN } from './fitModel';
import { leastSquaresProblem, type FitContext } from './fitProblem';
import type { FitModelValues, FitStage } from './fitTypes';
import { levenbergMarquardt, type FitProgress, type LevenbergMarquardtResult } from './levenbergMarquardt';

export interface StageOptions {
  maxIterations: number;
  numerics: SimulateCvOptions;
  stage: FitStage;
  onProgress?: ((p: FitProgress & { stage: FitStage }) => void) | undefined;
}

export interface StageResult {
  values: FitModelValues;
  lm: LevenbergMarquardtResult;
  iterations: number;
  evaluations: number;
}

const GRID_TOLERANCE = Math.log(GRID_MARGIN);
const MAX_REFREEZE = 6;

export function runStage(ctx: FitContext, start: FitModelValues, o: StageOptions): StageResult {
  let values = start;
  let iterations = 0;
  let evaluations = 0;
  let frozenAt = start;
  ctx.model.freezeGrids(start, o.numerics);
  for (let pass = 0; ; pass++) {
    const lm = levenbergMarquardt(leastSquaresProblem(ctx), ctx.layout.toInternal(values), {
      maxIterations: o.maxIterations - iterations,
      signal: ctx.signal,
      interrupt: (u) => pass < MAX_REFREEZE && gridsMoved(frozenAt, ctx.layout.fromInternal(u, ctx.base)),
      ...(o.onProgress ? { onProgress: (p: FitProgress) => o.onProgress?.({ ...p, iteration: p.iteration + iterations, evaluations: p.evaluations + evaluations, stage: o.stage }) } : {}),
    });
    values = ctx.layout.fromInternal(lm.u, ctx.base);
    iterations += lm.iterations;
    evaluations += lm.evaluations;
    if (pass >= MAX_REFREEZE || iterations >= o.maxIterations || !gridsMoved(frozenAt, values)) return { values, lm, iterations, evaluations };
    frozenAt = values;
    ctx.model.freezeGrids(values, o.numerics);
  }
}

function gridsMoved(a: FitModelValues, b: FitModelValues): boolean {
  return a.couples.some((c, j) => {
    const d = b.couples[j]!;
    return [
      [c.diffusionOCm2PerS, d.diffusionOCm2PerS], [c.diffusionRatio, d.diffusionRatio], [c.followUpRatePerS, d.followUpRatePerS],
    ].some(([x, y]) => Math.abs(Math.log(y! / x!)) > GRID_TOLERANCE);
  });
}
