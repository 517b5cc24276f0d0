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

/**
 * The same vertex with the peak's skew taken out first. A diffusion wave rises steeply and falls
 * slowly, and a parabola fitted to its top leans towards the slow side: on simulated reversible
 * couples with 2 % noise the window holds the top 6 % and each Ep moved about 1 mV outwards, ΔEp
 * 2 mV wide. The skew is the cubic term b₃ of a cubic fitted over `wide` (the points within twice
 * the window's reach of the vertex; a cubic's b₃ on a symmetric span is not moved by the shape's
 * even terms). b₃·(E − E₀)³ is taken off the `top` points (the parabola's window) and the
 * parabola fitted again; the vertex current gets it back. Source: least-squares projection of a
 * cubic term onto a parabola (our correction; common practice, no source).
 * Null (keep the plain vertex) when `wide` does not reach 1.5 times the window on both sides, the
 * cubic does not open the peak's way, or the corrected vertex moves by more than half the window.
 */
export function refinePeakDeskewed(
  top: { potentialV: ArrayLike<number>; currentA: ArrayLike<number> },
  wide: { potentialV: number[]; currentA: number[] },
  plain: QuadraticVertex,
  options: RefinePeakQuadraticOptions = {},
): QuadraticVertex | null {
  const orientation = options.orientation ?? 1;
  const e0 = plain.potentialV;
  const reach = reachOf(top.potentialV, e0);
  if (!(reach > 0) || wide.potentialV.length < 8) return null;
  let lo = Infinity;
  let hi = -Infinity;
  for (const e of wide.potentialV) {
    lo = Math.min(lo, e - e0);
    hi = Math.max(hi, e - e0);
  }
  if (!(lo <= -1.5 * reach) || !(hi >= 1.5 * reach)) return null;
  const cubic = polynomialCoefficients(wide.potentialV.map((e) => (e - e0) / reach), wide.currentA, 3);
  if (!cubic) return null;
  const b2 = cubic[2]! / (reach * reach);
  const b3 = cubic[3]! / (reach * reach * reach);
  if (!(orientation * b2 < 0) || !Number.isFinite(b3)) return null;
  const skew = (e: number) => b3 * (e - e0) * (e - e0) * (e - e0);
  const flat = Float64Array.from({ length: top.currentA.length }, (_, k) => (top.currentA[k] as number) - skew(top.potentialV[k] as number));
  const v = refinePeakQuadratic({ potentialV: top.potentialV, currentA: flat, from: 0, to: flat.length }, { orientation });
  if (!v || Math.abs(v.potentialV - e0) > 0.5 * reach) return null;
  return { potentialV: v.potentialV, currentA: v.currentA + skew(v.potentialV) };
}

/** How far a window's potentials reach from a vertex (V). */
export function reachOf(potentialV: ArrayLike<number>, vertexV: number): number {
  let reach = 0;
  for (let k = 0; k < potentialV.length; k++) reach = Math.max(reach, Math.abs((potentialV[k] as number) - vertexV));
  return reach;
}
