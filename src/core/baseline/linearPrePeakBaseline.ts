/**
 * Linear pre-peak baseline: a least-squares straight line I = a + b·E through the capacitive
 * region before a wave's foot, extrapolated under the peak.
 * Source: the usual convention of measuring a forward peak current from the extrapolated
 *   charging current, e.g. A. J. Bard, L. R. Faulkner, Electrochemical Methods, 2nd ed. (2001),
 *   §6.2 (from memory); J. Wang, Analytical Electrochemistry, 2nd ed. (2000), §2-1.1.
 * In: potential (V) and current (A, IUPAC) columns; fit window [fitStart, fitEnd) and the span
 *   [spanStart, spanEnd) over which the line is drawn (point indices).
 * Out: the line sampled on the span, with the fit-window ends as anchors.
 * Fit: ordinary least squares (ml-regression-simple-linear).
 */
import { SimpleLinearRegression } from 'ml-regression-simple-linear';
import type { BaselineCurve } from './baselineTypes';
import { anchorAt, assertFinitePoints, assertRange, formatMv, sampleBaseline, type BaselineTrace } from './baselineCurve';

export interface LinearPrePeakBaselineInput extends BaselineTrace {
  fitStart: number;
  fitEnd: number;
  spanStart: number;
  spanEnd: number;
}

export interface LinearPrePeakBaselineOptions {
  /** Fit the line against potential or against point index (time-like). @default 'potential' */
  abscissa?: 'potential' | 'index';
  /** A current taken out of the window's points before the fit (e.g. a wave's own foot), and what it is, for the description. */
  less?: { what: string; currentA: (index: number) => number };
}

export interface LinearBaselineResult {
  curve: BaselineCurve;
  /** Line as a function of potential (A per V and A at 0 V), when fitted against potential. */
  slopeAPerV: number;
  interceptA: number;
}

export function linearPrePeakBaseline(
  input: LinearPrePeakBaselineInput,
  options: LinearPrePeakBaselineOptions = {},
): LinearBaselineResult {
  const n = input.currentA.length;
  assertRange('linear baseline fit window', input.fitStart, input.fitEnd, n, 2);
  assertRange('linear baseline span', input.spanStart, input.spanEnd, n, 1);
  assertFinitePoints(input, input.fitStart, input.fitEnd);
  const byIndex = options.abscissa === 'index';
  const x: number[] = [];
  const y: number[] = [];
  for (let k = input.fitStart; k < input.fitEnd; k++) {
    x.push(byIndex ? k : (input.potentialV[k] as number));
    y.push((input.currentA[k] as number) - (options.less?.currentA(k) ?? 0));
  }
  const fit = new SimpleLinearRegression(x, y);
  const slope = Number.isFinite(fit.slope) ? fit.slope : 0;
  const intercept = Number.isFinite(fit.intercept) ? fit.intercept : y.reduce((s, v) => s + v, 0) / y.length;
  const lineAt = (k: number) => intercept + slope * (byIndex ? k : (input.potentialV[k] as number));
  const a = input.potentialV[input.fitStart] as number;
  const b = input.potentialV[input.fitEnd - 1] as number;
  const curve = sampleBaseline(input.potentialV, input.spanStart, input.spanEnd, lineAt, {
    method: 'linear',
    anchors: [anchorAt(input, input.fitStart), anchorAt(input, input.fitEnd - 1)],
    description: `least-squares line through ${input.fitEnd - input.fitStart} points from ${formatMv(a)} to ${formatMv(b)}, ${options.less ? `less ${options.less.what}, ` : ''}extrapolated under the peak`,
  });
  return { curve, slopeAPerV: byIndex ? NaN : slope, interceptA: byIndex ? NaN : intercept };
}
