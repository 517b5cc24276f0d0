/**
 * Manual two-point baseline: the straight line through two user-chosen anchors, drawn over a span.
 * Source: the manual tangent/two-point baseline of routine voltammetric practice (common
 *   practice, no source).
 * In: potential column (V), the span [spanStart, spanEnd) and two anchors (V, A with IUPAC sign).
 * Out: the line I(E) through the anchors, sampled on the span.
 */
import { AnalysisError } from '../errors';
import type { BaselineAnchor, BaselineCurve } from './baselineTypes';
import { assertRange, formatMv, sampleBaseline } from './baselineCurve';

export interface TwoPointBaselineInput {
  potentialV: ArrayLike<number>;
  spanStart: number;
  spanEnd: number;
  anchors: [BaselineAnchor, BaselineAnchor];
}

export function twoPointBaseline(input: TwoPointBaselineInput): BaselineCurve {
  assertRange('two-point baseline span', input.spanStart, input.spanEnd, input.potentialV.length, 1);
  const [a, b] = input.anchors;
  for (const p of [a, b]) {
    if (!Number.isFinite(p.potentialV) || !Number.isFinite(p.currentA)) {
      throw new AnalysisError('NON_FINITE', `two-point baseline anchor (${p.potentialV} V, ${p.currentA} A) is not finite`);
    }
  }
  if (a.potentialV === b.potentialV) {
    throw new AnalysisError('BAD_OPTION', `two-point baseline anchors must differ in potential, both are at ${a.potentialV} V`);
  }
  const slope = (b.currentA - a.currentA) / (b.potentialV - a.potentialV);
  return sampleBaseline(input.potentialV, input.spanStart, input.spanEnd, (k) => a.currentA + slope * ((input.potentialV[k] as number) - a.potentialV), {
    method: 'two-point',
    anchors: [a, b],
    description: `straight line through (${formatMv(a.potentialV)}, ${a.currentA.toExponential(3)} A) and (${formatMv(b.potentialV)}, ${b.currentA.toExponential(3)} A)`,
  });
}
