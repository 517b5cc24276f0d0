/**
 * The least-squares problem of a fit: residuals r = measured − model at the fitted points (with
 * the straight background projected out when it is free), as a function of the internal
 * coordinates for Levenberg–Marquardt, and the Jacobian in report coordinates for the errors.
 */
import { AnalysisError } from '../errors';
import { projectOutBackground, type StraightLine } from './backgroundProjection';
import { type FitModel } from './fitModel';
import { cloneValues, type ParameterLayout } from './fitParameters';
import type { FitModelValues } from './fitTypes';
import type { Columns } from './leastSquaresAlgebra';
import type { LeastSquaresProblem } from './levenbergMarquardt';

export interface FitContext {
  layout: ParameterLayout;
  model: FitModel;
  /** Values of the fixed parameters (free ones are overwritten from u). */
  base: FitModelValues;
  background: boolean;
  /** Measured currents at the fitted points, concatenated, A. */
  measuredA: Float64Array;
  signal?: { readonly aborted: boolean } | undefined;
}

export function measuredCurrents(model: FitModel): Float64Array {
  const out = new Float64Array(model.pointCount);
  for (const r of model.records) out.set(r.currentA, r.offset);
  return out;
}

/** r = measured − model, background projected out when free; returns the background lines. */
export function residualsAt(ctx: FitContext, values: FitModelValues, out: Float64Array): StraightLine[] | null {
  const check = () => {
    if (ctx.signal?.aborted) throw new AnalysisError('CANCELLED', `fit cancelled after ${ctx.model.simulations} simulations`);
  };
  ctx.model.evaluate(values, out, check);
  const y = ctx.measuredA;
  for (let i = 0; i < out.length; i++) out[i] = (y[i] as number) - (out[i] as number);
  return ctx.background ? projectOutBackground(ctx.model.records, out) : null;
}

export function leastSquaresProblem(ctx: FitContext): LeastSquaresProblem {
  return {
    ...ctx.layout.bounds(),
    parameterCount: ctx.layout.size,
    residualCount: ctx.measuredA.length,
    stepSizes: new Float64Array(ctx.layout.size).fill(1e-5),
    residuals: (u, out) => {
      residualsAt(ctx, ctx.layout.fromInternal(u, ctx.base), out);
    },
  };
}

/** Forward-difference ∂r/∂y in report coordinates y at `values` (r0 = residuals there). */
export function reportJacobian(ctx: FitContext, values: FitModelValues, r0: Float64Array): Columns {
  return ctx.layout.entries.map((e) => {
    const h = ctx.layout.reportStep(values, e);
    const moved = cloneValues(values);
    ctx.layout.fromReport(moved, e, ctx.layout.toReport(values, e) + h);
    const col = new Float64Array(r0.length);
    residualsAt(ctx, moved, col);
    for (let i = 0; i < col.length; i++) col[i] = ((col[i] as number) - (r0[i] as number)) / h;
    return col;
  });
}
