/**
 * The current of a wave with slow electron transfer on a linear sweep, as a function of potential,
 * for the foot of a quasi-reversible or irreversible wave under its own pre-peak line
 * (lineUnderOwnFoot.ts).
 *
 * Source: planar semi-infinite diffusion, both species soluble with equal D, Butler–Volmer
 *   kinetics. With i = nFAC√(πDσ)·χ, σ = nFv/RT, ξ = nF(E − E°′)/RT along a reduction sweep and
 *   Nicholson's ψ = k°/√(πDσ), the surface concentrations follow from the convolution integral
 *   M(σt) = ∫₀^{σt} χ(z)/√(σt − z) dz (C_O(0) = C*(1 − M), C_R(0) = C*·M), so that
 *   χ = ψ·e^(−αξ)·[1 − M·(1 + e^ξ)]
 *   (R. S. Nicholson, Anal. Chem. 37 (1965) 1351; H. Matsuda, Y. Ayabe, Z. Elektrochem. 59 (1955)
 *   494; both from memory). Solved by product integration with χ constant on each step of
 *   0.05 in σt, from ξ = +12 to 2 RT/nF past the peak, as reversibleWaveShape.ts solves the
 *   reversible case.
 * Which wave: α is taken as 0.5, and ψ is placed by the peak's distance from the midpoint of its
 *   couple (E°′ when α = 0.5); the wave's width must agree with that wave's (kineticWaveShapeFor).
 *   A wave with no return peak, or one whose width says α is not 0.5, gets no shape.
 * Out: the shape relative to its peak, 1 at the peak, for ξ counted from the peak and decreasing
 *   along the sweep (an oxidation sweep is the same with ξ = −nF(E − E°′)/RT).
 */
import { semiIntegralWeights } from './semiIntegralWeights';

const START_XI = 12;
const END_XI = -40;
const STEP = 0.05;
/** How far past its peak (RT/nF) a wave is solved: the foot is what is read. */
const PAST_PEAK = 2;
/** ψ of the shapes at α = 0.5, from nearly reversible to irreversible. */
const PSI_GRID = [20, 7, 3, 2, 1.5, 1, 0.7, 0.5, 0.35, 0.25, 0.17, 0.1, 0.05, 0.02, 0.005];
/** Further down, for placing a wave by its peak's distance from E°′ (that still moves as ψ falls). */
const PSI_FAR = [0.002, 0.0007, 0.0002, 0.00005];
/** How far the measured width may stray from that of the wave placed by its peak (our margin; the αc 0.3 and 0.7 couples checked fall outside it). */
const WIDTH_AGREES = 0.1;

interface Shape {
  chi: Float64Array;
  /** ξ of the peak past E°′ (positive), in units of RT/nF. */
  pastFormal: number;
  /** Position of the peak in steps (fractional), and its χ. */
  peakAt: number;
  peak: number;
  /** |Ep − Ep/2| in units of RT/nF. */
  halfWidth: number;
}

const shapes = new Map<string, Shape>();

function solve(psi: number, alpha: number): Shape {
  const key = `${psi}|${alpha.toFixed(3)}`;
  const known = shapes.get(key);
  if (known) return known;
  const n = Math.round((START_XI - END_XI) / STEP);
  const xiAt = (k: number) => START_XI - (k + 0.5) * STEP;
  const { chi, peakAt, peak, halfAt } = solveSlowWave(n, STEP, (k) => psi * Math.exp(-alpha * xiAt(k)), (k) => 1 + Math.exp(xiAt(k)), PAST_PEAK);
  const shape = { chi, peakAt, peak, halfWidth: (peakAt - halfAt) * STEP, pastFormal: (peakAt + 0.5) * STEP - START_XI };
  shapes.set(key, shape);
  return shape;
}

/**
 * χ of a wave with slow electron transfer on steps of `step` in σt, by product integration with χ
 * constant on each step: χ_k = r_k·(1 − M·b_k)/(1 + r_k·w₀·b_k), r_k the forward rate over
 * √(πDσ) and b_k the back reaction's factor 1 + e^ξ (1 where it is left out, irreversibleWaveShape.ts).
 * Only the foot, the peak and its half-height point are read: it stops `pastPeak` (in σt) past the
 * peak. The peak between grid points is a parabola through the top three; the half-height point
 * before it is interpolated linearly (both in steps).
 */
export function solveSlowWave(n: number, step: number, rate: (k: number) => number, back: (k: number) => number, pastPeak: number): { chi: Float64Array; peakAt: number; peak: number; halfAt: number } {
  const chi = new Float64Array(n);
  // Weight of step j (χ_j on [jh, (j+1)h]) at x = (k+1)h, a function of k − j.
  const w = semiIntegralWeights(n, 2 * Math.sqrt(step));
  let top = 0;
  let length = n;
  for (let k = 0; k < n; k++) {
    let m = 0;
    for (let j = 0; j < k; j++) m += chi[j]! * w[k - j]!;
    const kf = rate(k);
    const both = back(k);
    chi[k] = (kf * (1 - m * both)) / (1 + kf * w[0]! * both);
    if (chi[k]! > chi[top]!) top = k;
    if ((k - top) * step > pastPeak) {
      length = k + 1;
      break;
    }
  }
  const a = chi[top - 1] ?? chi[top]!;
  const c = chi[top + 1] ?? chi[top]!;
  const b = chi[top]!;
  const curve = a - 2 * b + c;
  const shift = curve < 0 ? (0.5 * (a - c)) / curve : 0;
  const peak = b - 0.25 * (a - c) * shift;
  let half = top;
  while (half > 0 && chi[half]! > peak / 2) half--;
  const halfAt = half + (peak / 2 - chi[half]!) / (chi[half + 1]! - chi[half]!);
  return { chi: chi.subarray(0, length), peakAt: top + shift, peak, halfAt };
}

/** The shape's current over its peak, ξ counted from the peak (0 before the table starts; held at its last value past the end, 2 RT/nF past the peak). */
function valueAt(s: Shape, xiFromPeak: number): number {
  const u = s.peakAt - xiFromPeak / STEP;
  if (u <= 0) return 0;
  const last = s.chi.length - 1;
  if (u >= last) return (s.chi[last] as number) / s.peak;
  const k = Math.floor(u);
  const f = u - k;
  return ((s.chi[k] as number) * (1 - f) + (s.chi[k + 1] as number) * f) / s.peak;
}

export interface KineticWaveShape {
  /** What was assumed, for the baseline's description. */
  words: string;
  /** Current over the peak current at ξ from the peak (decreasing along the sweep). */
  at: (xiFromPeak: number) => number;
}

/**
 * The shape of a diffusing wave whose |Ep − Ep/2| is `halfWidth` RT/nF (wider than a reversible
 * wave's 2.20) and whose peak lies `pastMidpoint` RT/nF from the midpoint of its couple (ΔEp/2,
 * from the return peak). With α = 0.5 that midpoint is E°′, and the peak's distance from it
 * places the wave on the ψ scale; the width must then agree with that wave's within WIDTH_AGREES,
 * or α is not 0.5 and no shape is given (null), as at or below a reversible wave's width.
 * The width alone does not place a wave: near the irreversible end it hardly moves while the far
 * foot still does, and a shape placed by it (or an α taken from it) read irreversible waves far
 * from α = 0.5 up to 11 % high from a start 575 mV before their peak (independent simulation).
 */
export function kineticWaveShapeFor(halfWidth: number, pastMidpoint: number): KineticWaveShape | null {
  const psis = [...PSI_GRID, ...PSI_FAR];
  if (!(halfWidth > solve(psis[0]!, 0.5).halfWidth)) return null;
  // The peak's distance from E°′ grows as ψ falls: the two grid waves around it, by bisection
  // (each wave is solved once, when first needed).
  let lo = 0;
  let hi = psis.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (solve(psis[mid]!, 0.5).pastFormal < pastMidpoint) lo = mid;
    else hi = mid;
  }
  const placed = blend(solve(psis[lo]!, 0.5), solve(psis[hi]!, 0.5), psis[lo]!, psis[hi]!, pastMidpoint);
  return Math.abs(halfWidth / placed.halfWidth - 1) <= WIDTH_AGREES ? placed : null;
}

/** The two waves around the peak's distance from E°′, blended linearly in it (held at the ends). */
function blend(lo: Shape, hi: Shape, psiLo: number, psiHi: number, pastFormal: number): KineticWaveShape & { halfWidth: number } {
  const f = Math.min(1, Math.max(0, (pastFormal - lo.pastFormal) / (hi.pastFormal - lo.pastFormal)));
  const psi = Math.exp(Math.log(psiLo) * (1 - f) + Math.log(psiHi) * f);
  return {
    words: `a quasi-reversible wave's shape, ψ ≈ ${psi.toPrecision(2)} with α = 0.5, placed by its peak's distance from the midpoint of its couple (Nicholson 1965)`,
    at: (x) => valueAt(lo, x) * (1 - f) + valueAt(hi, x) * f,
    halfWidth: lo.halfWidth * (1 - f) + hi.halfWidth * f,
  };
}

/** |Ep − Ep/2| and |Ep − E°′| (RT/nF) and the peak of √π·χ of the wave at ψ and α (for checks). */
export function slowWaveMeasures(psi: number, alpha: number): { halfWidth: number; pastFormal: number; peakCurrentFunction: number } {
  const s = solve(psi, alpha);
  return { halfWidth: s.halfWidth, pastFormal: s.pastFormal, peakCurrentFunction: Math.sqrt(Math.PI) * s.peak };
}
