/**
 * Polynomial baseline: a least-squares polynomial I = Σ a_k·E^k fitted to the background before
 * (and, if the caller includes it, after) a peak, evaluated under the peak.
 * Source: general least-squares background fitting, e.g. Bard & Faulkner, Electrochemical
 *   Methods, 2nd ed. (2001), §6.2 on extrapolated baselines (from memory); the degree is the
 *   user's choice. Fit: ml-regression-polynomial.
 * In: potential (V), current (A, IUPAC); fit point ranges and the drawn span (point indices).
 * Out: the polynomial sampled on the span. Potentials are centred on the fit window before fitting
 *   so that the normal equations stay well conditioned.
 * Caution: a polynomial of degree ≥ 2 extrapolates poorly far from its window.
 */
import { PolynomialRegression } from 'ml-regression-polynomial';
import { AnalysisError } from '../errors';
import type { BaselineCurve } from './baselineTypes';
import { anchorAt, assertFinitePoints, assertRange, formatMv, sampleBaseline, type BaselineTrace } from './baselineCurve';

export interface PolynomialBaselineInput extends BaselineTrace {
  /** One or more fit windows [start, end), point indices. */
  fitRanges: Array<[number, number]>;
  spanStart: number;
  spanEnd: number;
}

export interface PolynomialBaselineOptions {
  /** Polynomial degree. @default 2 */
  degree?: number;
}

export function polynomialBaseline(input: PolynomialBaselineInput, options: PolynomialBaselineOptions = {}): BaselineCurve {
  const degree = options.degree ?? 2;
  if (!Number.isInteger(degree) || degree < 0 || degree > 6) {
    throw new AnalysisError('BAD_OPTION', `polynomial baseline degree must be an integer in [0, 6], got ${degree}`);
  }
  const n = input.currentA.length;
  assertRange('polynomial baseline span', input.spanStart, input.spanEnd, n, 1);
  const x: number[] = [];
  const y: number[] = [];
  for (const [a, b] of input.fitRanges) {
    assertRange('polynomial baseline fit window', a, b, n, 1);
    assertFinitePoints(input, a, b);
    for (let k = a; k < b; k++) {
      x.push(input.potentialV[k] as number);
      y.push(input.currentA[k] as number);
    }
  }
  if (x.length < degree + 2) {
    throw new AnalysisError('TOO_FEW_POINTS', `a degree-${degree} baseline needs at least ${degree + 2} fit points, got ${x.length}`);
  }
  const centre = x.reduce((s, v) => s + v, 0) / x.length;
  const fit = new PolynomialRegression(x.map((v) => v - centre), y, degree);
  const first = input.fitRanges[0]!;
  const last = input.fitRanges[input.fitRanges.length - 1]!;
  return sampleBaseline(input.potentialV, input.spanStart, input.spanEnd, (k) => fit.predict((input.potentialV[k] as number) - centre), {
    method: 'polynomial',
    anchors: [anchorAt(input, first[0]), anchorAt(input, last[1] - 1)],
    description: `least-squares polynomial of degree ${degree} through ${x.length} points between ${formatMv(input.potentialV[first[0]] as number)} and ${formatMv(input.potentialV[last[1] - 1] as number)}`,
  });
}
