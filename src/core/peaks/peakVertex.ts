/**
 * Ep of a located peak: the vertex of a least-squares parabola fitted to the raw points of the
 * peak's top, with the peak's skew (a cubic term) taken off first.
 * Window: the points whose smoothed current lies within a depth d of the top, d = max(1 % of the
 *   prominence, 3σ, w·prominence). The share w grows with the peak's own width only where that
 *   costs no bias: 20 % on a symmetric peak, less the more the peak is skewed, so that what the
 *   skew correction leaves of the skew's pull stays within 0.05 mV. Measured on this project's
 *   simulator (bench/peakVertexScatter.ts; 200 seeds, 0.1 V/s):
 *   - Scatter: a parabola's vertex scatters as 1/(√N·span) (least squares, common practice, no
 *     source); the 3σ window alone keeps a handful of points of a broad peak. A Nernstian film
 *     (FWHM 90.6 mV, Laviron 1979) at 2 mV steps: Ep's standard deviation 1.08 → 0.26 mV with 1 %
 *     noise, 1.25 → 0.59 mV with 2 %, 1.52 → 1.14 mV with 3 % (ΔEp 1.67 → 0.40, 1.88 → 0.88,
 *     2.42 → 1.91 mV); noise-free within 0.05 mV of E°′ before and after.
 *   - Skew: after the correction a wider window still pulls the vertex towards the peak's slow
 *     side, by K·S·w², S being how far the centroid of the part above 50 % of the prominence lies
 *     from that of the part above 80 % (0 on a symmetric peak). K = 4.4–11.0 on reversible,
 *     quasi-reversible (k° 0.01 cm/s), totally irreversible (α 0.3, 0.5) and EC diffusion waves and
 *     on Laviron's films with k_s 0.1–25 1/s at 0.1 V/s; 11 is used. A reversible diffusion wave
 *     (S 7–16 mV at n = 1, as its prominence is taken) keeps 2–3 % of its height, as much as the
 *     narrow window, so diffusion waves read as before (a reversible wave at 2 mV steps, 1 % noise:
 *     1.36 → 1.14 mV; totally irreversible 1.71 → 1.65 mV).
 *   A peak whose skew cannot be measured (its part above half the prominence runs off the sweep)
 *   keeps the narrow window. The first point below the floor on each side counts with the share
 *   of its interval that lies above the floor, so that the vertex moves smoothly as the sampling
 *   moves under the peak.
 * Fit: weighted parabola on the window → vertex E₀; a cubic over the points within twice the
 *   window's reach of E₀, weighted 1 − ((E − E₀)/span)², gives the skew b₃ (a cubic's b₃ on a span
 *   about the vertex is not moved by the shape's even terms); b₃·(E − E₀)³ is taken off the
 *   window's points and the parabola fitted again. Source: least-squares projection of a cubic
 *   term onto a parabola (our correction; common practice, no source). The plain vertex is kept
 *   when the span does not reach 1.5 times the window on both sides, the cubic does not open the
 *   peak's way, or the corrected vertex moves by more than half the window.
 * Peak current: the vertex current of the narrow window (corrected the same way): over 20 % of a
 *   film's height a parabola's vertex falls 0.3 % short of the peak (the shape's fourth-order term).
 * Loops: plain index loops into kept arrays (../scratch.ts); nothing is allocated per point.
 * In: the peak's top as signals turned so that the peak points up (PeakTop), the located point,
 *   its prominence and the trace's noise σ. Out: the vertex (current turned the same way), or null
 *   when no parabola opening downwards has its vertex inside the window.
 */
import { polynomialCoefficients } from '../regression/polynomialCoefficients';
import { keptScratch } from '../scratch';
import type { QuadraticVertex } from './refinePeakQuadratic';

export interface PeakTop {
  /** Potentials of the trace (V). */
  potentialV: Float64Array;
  /** Smoothed current at point k, turned so that the peak points up (A): chooses the window. */
  level: (k: number) => number;
  /** Raw current at point k, turned the same way (A): fitted; a non-finite value leaves the point out. */
  raw: (k: number) => number;
  /** The points [lo, hi) the window may take (one sweep). */
  lo: number;
  hi: number;
}

/** Narrow window: 1 % of the prominence, or 3σ (common practice, no source). */
const NARROW_SHARE = 0.01;
const NOISE_MULTIPLE = 3;
/** Largest share of the prominence the window reaches (a symmetric peak's; measured, see the file comment). */
const MAX_SHARE = 0.2;
/** K of the skew's residual pull K·S·w², the largest measured, and the pull allowed (V). */
const SKEW_FACTOR = 11;
const SKEW_PULL_V = 5e-5;
/** Points the window may reach on each side of the top, and the skew's probe. */
const MAX_SIDE = 400;
const MAX_PROBE = 4000;

export interface PeakTopWindow {
  /** Depth of the window below the top (A). */
  depthA: number;
  /** Depth of the narrow window, max(1 % of the prominence, 3σ) (A). */
  narrowA: number;
  /** Share of the prominence the peak's skew allows (0 when the skew cannot be measured). */
  share: number;
  /** Centroid drift S from the part above 80 % to the part above 50 % of the prominence (V), or null. */
  skewV: number | null;
}

/** The window of the peak whose top is point k (file comment). */
export function peakTopWindow(top: PeakTop, k: number, prominenceA: number, noiseA: number): PeakTopWindow {
  const narrow = Math.max(NARROW_SHARE * prominenceA, NOISE_MULTIPLE * noiseA);
  const upper = prominenceA > 0 ? centroidAbove(top, k, 0.2 * prominenceA) : null;
  const lower = prominenceA > 0 ? centroidAbove(top, k, 0.5 * prominenceA) : null;
  if (upper === null || lower === null) return { depthA: narrow, narrowA: narrow, share: 0, skewV: null };
  const skewV = lower - upper;
  const pull = SKEW_FACTOR * Math.abs(skewV);
  const share = pull > 0 ? Math.min(MAX_SHARE, Math.sqrt(SKEW_PULL_V / pull)) : MAX_SHARE;
  return { depthA: Math.max(narrow, share * prominenceA), narrowA: narrow, share, skewV };
}

/**
 * Centroid potential of the part of the peak that lies above top − depth: Σ(I − level)·E / Σ(I − level)
 * over the raw points whose smoothed current stays above that level; null when the part runs into
 * the ends of [lo, hi) or the probe's reach, or holds no current.
 */
function centroidAbove(top: PeakTop, k: number, depthA: number): number | null {
  const floor = top.level(k) - depthA;
  let a = k;
  let b = k;
  while (a - 1 >= top.lo && k - a < MAX_PROBE && top.level(a - 1) >= floor) a--;
  while (b + 1 < top.hi && b - k < MAX_PROBE && top.level(b + 1) >= floor) b++;
  if (a - 1 < top.lo || b + 1 >= top.hi || !(top.level(a - 1) < floor) || !(top.level(b + 1) < floor)) return null;
  const centre = top.potentialV[k]!;
  let s0 = 0;
  let s1 = 0;
  for (let j = a; j <= b; j++) {
    const w = top.raw(j) - floor;
    if (!Number.isFinite(w)) continue;
    s0 += w;
    s1 += w * (top.potentialV[j]! - centre);
  }
  return s0 > 0 ? centre + s1 / s0 : null;
}

const scratchU = keptScratch();
const scratchY = keptScratch();
const scratchWide = keptScratch();
const scratchTop = keptScratch();

export function peakVertex(top: PeakTop, k: number, prominenceA: number, noiseA: number): QuadraticVertex | null {
  const w = peakTopWindow(top, k, prominenceA, noiseA);
  const v = vertexInWindow(top, k, w.depthA);
  if (!v || !(w.depthA > w.narrowA)) return v;
  const narrow = vertexInWindow(top, k, w.narrowA);
  return narrow ? { potentialV: v.potentialV, currentA: narrow.currentA } : v;
}

/** The deskewed vertex over the points whose smoothed current lies within depthA of the top k. */
export function vertexInWindow(top: PeakTop, k: number, depthA: number): QuadraticVertex | null {
  const { level, lo, hi } = top;
  const floor = level(k) - depthA;
  let a = k;
  let b = k;
  while (a - 1 >= lo && k - a < MAX_SIDE && level(a - 1) >= floor) a--;
  while (b + 1 < hi && b - k < MAX_SIDE && level(b + 1) >= floor) b++;
  // The first point below the floor on each side counts with the share of its interval that lies
  // above the floor, so that the fit moves smoothly as the sampling moves under the peak (with
  // whole points only, a symmetric peak's vertex moved by up to 0.2 mV with the grid's phase at
  // 5 mV steps); a side widened to two points by force has none.
  const left = a > k - 2 ? 0 : edgeShare(level(a), level(a - 1), floor, a - 1 >= lo);
  const right = b < k + 2 ? 0 : edgeShare(level(b), level(b + 1), floor, b + 1 < hi);
  a = Math.max(lo, Math.min(a, k - 2));
  b = Math.min(hi - 1, Math.max(b, k + 2));
  if (b - a < 2) return null;
  const window: TopWindow = { a, b, left, right };
  const plain = plainVertex(top, k, window);
  if (!plain) return null;
  return deskewedVertex(top, k, window, plain) ?? plain;
}

/** The window's points a..b, with the points a − 1 and b + 1 counted by the shares left and right (0: left out). */
interface TopWindow {
  a: number;
  b: number;
  left: number;
  right: number;
}

/** Share of the interval from an inside point (level li) to the next one out (lj) that lies above the floor; 0 without one. */
function edgeShare(li: number, lj: number, floor: number, exists: boolean): number {
  if (!exists) return 0;
  const share = (li - floor) / (li - lj);
  return share > 0 && share <= 1 ? share : 0;
}

/** Weighted least-squares parabola on the window about E[k]; its vertex when it opens downwards inside the window. */
function plainVertex(top: PeakTop, k: number, w: TopWindow): QuadraticVertex | null {
  const e = top.potentialV;
  const centre = e[k]!;
  const from = w.left > 0 ? w.a - 1 : w.a;
  const to = w.right > 0 ? w.b + 1 : w.b;
  let lo = Infinity;
  let hi = -Infinity;
  for (let j = from; j <= to; j++) {
    lo = Math.min(lo, e[j]! - centre);
    hi = Math.max(hi, e[j]! - centre);
  }
  // Fitted on u = (E − centre)/scale (of order 1); potentials within a picovolt cannot be told apart.
  const scale = Math.max(-lo, hi);
  if (!(scale > 1e-12)) return null;
  const size = to - from + 1;
  const n = fillScratch(top, from, to, centre, scale, 0, size, (j) => topWeight(w, j), scratchTop);
  if (n < 3) return null;
  const fit = polynomialCoefficients(scratchU(size).subarray(0, n), scratchY(size).subarray(0, n), 2, scratchTop(size).subarray(0, n));
  if (!fit || !(fit[2]! < 0)) return null;
  const uv = -fit[1]! / (2 * fit[2]!);
  if (!(uv * scale >= lo && uv * scale <= hi)) return null;
  return { potentialV: centre + uv * scale, currentA: fit[0]! + fit[1]! * uv + fit[2]! * uv * uv };
}

function topWeight(w: TopWindow, j: number): number {
  if (j < w.a) return j === w.a - 1 ? w.left : 0;
  if (j > w.b) return j === w.b + 1 ? w.right : 0;
  return 1;
}

/** The vertex with the peak's skew taken off first (file comment), or null to keep the plain one. */
function deskewedVertex(top: PeakTop, k: number, w: TopWindow, plain: QuadraticVertex): QuadraticVertex | null {
  const e = top.potentialV;
  const e0 = plain.potentialV;
  // The window's reach: to where its edges cross the floor (the inside point moved by the edge's share).
  const leftEdge = e[w.a]! + w.left * ((e[w.a - 1] ?? e[w.a]!) - e[w.a]!);
  const rightEdge = e[w.b]! + w.right * ((e[w.b + 1] ?? e[w.b]!) - e[w.b]!);
  const reach = Math.max(Math.abs(leftEdge - e0), Math.abs(rightEdge - e0));
  if (!(reach > 0)) return null;
  const span = 2 * reach;
  let wa = k;
  let wb = k;
  while (wa - 1 >= top.lo && Math.abs(e[wa - 1]! - e0) <= span) wa--;
  while (wb + 1 < top.hi && Math.abs(e[wb + 1]! - e0) <= span) wb++;
  const low = Math.min(e[wa]!, e[wb]!) - e0;
  const high = Math.max(e[wa]!, e[wb]!) - e0;
  if (!(low <= -1.5 * reach) || !(high >= 1.5 * reach)) return null;
  // The cubic's points weigh 1 − ((E − E₀)/span)², falling to 0 at the span's ends: b₃ then moves
  // smoothly with the sampling (with equal weights it carried most of the 0.2 mV above), and the
  // correction leaves less of the skew (K 4.4–11 instead of 5.4–15).
  const from = Math.min(wa, w.left > 0 ? w.a - 1 : w.a);
  const to = Math.max(wb, w.right > 0 ? w.b + 1 : w.b);
  const size = to - from + 1;
  const wideWeight = (j: number) => Math.max(0, 1 - ((e[j]! - e0) * (e[j]! - e0)) / (span * span));
  fillScratch(top, from, to, e0, reach, 0, size, (j) => topWeight(w, j), scratchTop);
  const n = fillScratch(top, from, to, e0, reach, 0, size, wideWeight, scratchWide);
  if (n < 8) return null;
  const u = scratchU(size).subarray(0, n);
  const y = scratchY(size).subarray(0, n);
  const cubic = polynomialCoefficients(u, y, 3, scratchWide(size).subarray(0, n));
  if (!cubic || !(cubic[2]! < 0) || !Number.isFinite(cubic[3]!)) return null;
  const b3 = cubic[3]!;
  for (let j = 0; j < n; j++) y[j] = y[j]! - b3 * u[j]! * u[j]! * u[j]!;
  const flat = polynomialCoefficients(u, y, 2, scratchTop(size).subarray(0, n));
  if (!flat || !(flat[2]! < 0)) return null;
  const uv = -flat[1]! / (2 * flat[2]!);
  if (!(Math.abs(uv) <= 0.5)) return null;
  return { potentialV: e0 + uv * reach, currentA: flat[0]! + flat[1]! * uv + flat[2]! * uv * uv + b3 * uv * uv * uv };
}

/**
 * Writes u = (E − centre)/scale, the raw current and a weight of the finite points from..to
 * (inclusive) into the kept arrays (of `size`, asked for whole so that they are not renewed in
 * between) from position `at`; returns the position after the last one written. Points of weight 0
 * are written too (they keep the positions of two fills over the same points alike).
 */
function fillScratch(top: PeakTop, from: number, to: number, centre: number, scale: number, at: number, size: number, weight: (j: number) => number, weights: (length: number) => Float64Array): number {
  const u = scratchU(size);
  const y = scratchY(size);
  const w = weights(size);
  let n = at;
  for (let j = from; j <= to; j++) {
    const i = top.raw(j);
    const x = top.potentialV[j]!;
    if (!Number.isFinite(i) || !Number.isFinite(x)) continue;
    u[n] = (x - centre) / scale;
    y[n] = i;
    w[n] = weight(j);
    n++;
  }
  return n;
}
