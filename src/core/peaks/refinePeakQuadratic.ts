/**
 * Sub-sample peak position: a least-squares parabola I = c0 + c1·x + c2·x² (x = E − E_centre)
 * fitted to the raw points around a located extremum; its vertex gives Ep and the peak current.
 * Source: local quadratic (parabolic) interpolation of an extremum (common practice, no source);
 *   fit by its normal equations (regression/polynomialCoefficients.ts).
 * In: potential (V) and current (A, IUPAC) columns, the window [from, to) of point indices, and
 *   whether a maximum (+1, anodic) or a minimum (−1, cathodic) is sought.
 * Out: { potentialV, currentA } of the vertex, or null when the parabola opens the wrong way or
 *   its vertex falls outside the window (the caller then keeps the data point).
 */
import { polynomialCoefficients } from '../regression/polynomialCoefficients';
import { AnalysisError } from '../errors';

export interface RefinePeakQuadraticInput {
  potentialV: ArrayLike<number>;
  currentA: ArrayLike<number>;
  from: number;
  to: number;
}

export interface RefinePeakQuadraticOptions {
  /** +1 for a maximum, −1 for a minimum. @default 1 */
  orientation?: 1 | -1;
}

export interface QuadraticVertex {
  potentialV: number;
  currentA: number;
}

export function refinePeakQuadratic(input: RefinePeakQuadraticInput, options: RefinePeakQuadraticOptions = {}): QuadraticVertex | null {
  const { from, to } = input;
  if (to - from < 3) throw new AnalysisError('TOO_FEW_POINTS', `a quadratic peak fit needs at least 3 points, got ${to - from}`);
  const orientation = options.orientation ?? 1;
  const centre = input.potentialV[(from + to) >> 1] as number;
  const x: number[] = [];
  const y: number[] = [];
  let lo = Infinity;
  let hi = -Infinity;
  for (let k = from; k < to; k++) {
    const e = input.potentialV[k] as number;
    const i = input.currentA[k] as number;
    if (Number.isFinite(e) && Number.isFinite(i)) {
      x.push(e - centre);
      y.push(i);
      lo = Math.min(lo, e - centre);
      hi = Math.max(hi, e - centre);
    }
  }
  // A parabola needs three distinct potentials (a staircase can repeat them); else keep the point.
  if (x.length < 3 || new Set(x).size < 3) return null;
  // Fitted on u = x/scale (of order 1); potentials within a picovolt cannot be told apart.
  const scale = Math.max(-lo, hi);
  if (!(scale > 1e-12)) return null;
  const fit = polynomialCoefficients(x.map((v) => v / scale), y, 2);
  if (!fit) return null;
  const [c0 = NaN, c1 = NaN, c2 = NaN] = fit;
  if (!(orientation * c2 < 0)) return null;
  const uv = -c1 / (2 * c2);
  const xv = uv * scale;
  if (!(xv >= lo && xv <= hi)) return null;
  return { potentialV: centre + xv, currentA: c0 + c1 * uv + c2 * uv * uv };
}
