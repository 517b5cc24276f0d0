/**
 * Savitzky–Golay filter for wide windows in O(n·order²) instead of O(n·window): the same
 * least-squares polynomial fit as the convolution in savitzkyGolaySmooth.ts, computed from the
 * window's power moments T_r = Σ x^r·y (x = k/m, k = −m…m), which are carried from one window to
 * the next instead of being summed again.
 * Source of the fit: A. Savitzky, M. J. E. Golay, Anal. Chem. 36 (1964) 1627–1639. The update is
 *   our own derivation (no source): moving the centre by one sample shifts every abscissa by
 *   h = 1/m, so by the binomial theorem Σ (x − h)^r·y = Σ_t C(r, t)·(−h)^(r−t)·T_t; then the point
 *   that left (x = −1 − h) is taken out and the point that came in (x = 1) is added.
 * In: samples y (any unit), odd window ≥ 3, order < window, derivative 0 or 1 (per sample).
 *   Out: the same values as the convolution (the smoothed signal, or dy/dk), including the
 *   off-centre fits at the ends, equal to within rounding (relative 1e-12 in the tests).
 * Rounding: the carried moments are summed again from the data every restartInterval(order)
 *   outputs, so the error of the update cannot grow without bound. Orders above 4 are not taken.
 */
import { monomialDerivativeRow, solveSmall, windowNormalMatrix } from './polynomialWindowFit';

/**
 * Outputs between two fresh sums of the moments. The carried error grows about as the cube of the
 * steps for order 4 (measured against the convolution on a peak on a large offset: 3e-11 of |y|
 * after 1024 steps, 1e-14 after 64), far slower for order ≤ 2 (3e-14 after 1024).
 */
export function restartInterval(order: number): number {
  return order <= 2 ? 1024 : 64;
}

/** Highest order filtered this way; higher orders keep the direct convolution. */
export const MAX_MOMENT_ORDER = 4;

/** T_r = Σ_{k=−m…m} (k/m)^r · y[centre + k], r = 0…q−1, summed directly. */
function sumMoments(y: ArrayLike<number>, centre: number, m: number, into: Float64Array): void {
  into.fill(0);
  const q = into.length;
  for (let k = -m; k <= m; k++) {
    const x = k / m;
    let p = y[centre + k] as number;
    for (let r = 0; r < q; r++) {
      into[r]! += p;
      p *= x;
    }
  }
}

/** Shift matrix S[r·q + t] = C(r, t)·(−h)^(r−t), lower triangular. */
function shiftMatrix(q: number, h: number): Float64Array {
  const s = new Float64Array(q * q);
  for (let r = 0; r < q; r++) {
    let binom = 1;
    for (let t = 0; t <= r; t++) {
      s[r * q + t] = binom * (-h) ** (r - t);
      binom = (binom * (r - t)) / (t + 1);
    }
  }
  return s;
}

const dot = (a: ArrayLike<number>, b: ArrayLike<number>) => {
  let v = 0;
  for (let r = 0; r < a.length; r++) v += (a[r] as number) * (b[r] as number);
  return v;
};

/** Off-centre fits for the first and last m points: one polynomial per end, evaluated at each. */
function fillEnds(y: ArrayLike<number>, out: Float64Array, window: number, order: number, derivative: number): void {
  const n = y.length;
  const m = (window - 1) / 2;
  const moments = new Float64Array(order + 1);
  for (const side of [-1, 1] as const) {
    sumMoments(y, side < 0 ? m : n - 1 - m, m, moments);
    const coef = solveSmall(windowNormalMatrix(window, order), Array.from(moments));
    for (let e = 0; e < m; e++) {
      const value = dot(monomialDerivativeRow(window, order, derivative, side * (m - e)), coef);
      out[side < 0 ? e : n - 1 - e] = value;
    }
  }
}

/** The filter over the whole signal; the caller has checked window, order and length. */
export function filterBySlidingMoments(y: ArrayLike<number>, window: number, order: number, derivative: number): Float64Array {
  const n = y.length;
  const out = new Float64Array(n);
  const m = (window - 1) / 2;
  const q = order + 1;
  const weights = solveSmall(windowNormalMatrix(window, order), monomialDerivativeRow(window, order, derivative, 0));
  const shift = shiftMatrix(q, 1 / m);
  const leaving = Array.from({ length: q }, (_, r) => (-1 - 1 / m) ** r);
  const moments = new Float64Array(q);
  const next = new Float64Array(q);
  const every = restartInterval(order);
  for (let i = m; i < n - m; i++) {
    if ((i - m) % every === 0) {
      sumMoments(y, i, m, moments);
    } else {
      const gone = y[i - 1 - m] as number;
      const came = y[i + m] as number;
      for (let r = 0; r < q; r++) {
        let v = 0;
        for (let t = 0; t <= r; t++) v += shift[r * q + t]! * moments[t]!;
        next[r] = v - leaving[r]! * gone + came;
      }
      moments.set(next);
    }
    out[i] = dot(weights, moments);
  }
  fillEnds(y, out, window, order, derivative);
  return out;
}
