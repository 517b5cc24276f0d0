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
 *   (R. S. Nicholson, Anal. Chem. 37 (1965) 1351, eqs. 1-9; H. Matsuda, Y. Ayabe, Z. Elektrochem.
 *   59 (1955) 494, from memory). Solved by product integration with χ constant on each step of
 *   0.05 in σt, from ξ = +12 to ξ = −40, as reversibleWaveShape.ts solves the reversible case.
 * Which wave: one measurement, |Ep − Ep/2|, cannot give both ψ and α. Up to the width of an
 *   irreversible wave with α = 0.5 (1.857/0.5 = 3.71 RT/nF, Bard & Faulkner 2nd ed. (2001) eq.
 *   6.3.6), α is taken as 0.5 and ψ is the one whose wave has that width (shapes on a grid of ψ,
 *   blended by width); beyond it the wave is irreversible, with α = 1.857/width. The foot far before
 *   the wave rises as e^(−αξ), so an α that is wrong by 0.1 moves the foot 200 mV before E½ by
 *   about a fifth of its (then few per cent) size.
 * Out: the shape relative to its peak, 1 at the peak, for ξ counted from the peak and decreasing
 *   along the sweep (an oxidation sweep is the same with ξ = −nF(E − E°′)/RT).
 */

const START_XI = 12;
const END_XI = -40;
const STEP = 0.05;
/** ψ of the shapes at α = 0.5, from nearly reversible to irreversible. */
const PSI_GRID = [20, 7, 3, 2, 1.5, 1, 0.7, 0.5, 0.35, 0.25, 0.17, 0.1, 0.05, 0.02, 0.005];
/** ψ of an irreversible wave (its width no longer moves with ψ). */
const IRREVERSIBLE_PSI = 0.005;
/** |Ep − Ep/2| of a totally irreversible wave is 1.857/α in units of RT/nF (Bard & Faulkner eq. 6.3.6). */
const IRREVERSIBLE_WIDTH_TIMES_ALPHA = 1.857;

interface Shape {
  chi: Float64Array;
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
  const chi = new Float64Array(n);
  // Weight of step j (χ_j on [jh, (j+1)h]) at x = (k+1)h: 2(√(x − jh) − √(x − (j+1)h)), a function of k − j.
  const w = new Float64Array(n);
  for (let d = 0; d < n; d++) w[d] = 2 * Math.sqrt(STEP) * (Math.sqrt(d + 1) - Math.sqrt(d));
  let top = 0;
  for (let k = 0; k < n; k++) {
    let m = 0;
    for (let j = 0; j < k; j++) m += chi[j]! * w[k - j]!;
    const xi = START_XI - (k + 0.5) * STEP;
    const kf = psi * Math.exp(-alpha * xi);
    const both = 1 + Math.exp(xi);
    chi[k] = (kf * (1 - m * both)) / (1 + kf * w[0]! * both);
    if (chi[k]! > chi[top]!) top = k;
  }
  // The peak between grid points (a parabola through the top three), and the half-height point before it.
  const a = chi[top - 1] ?? chi[top]!;
  const c = chi[top + 1] ?? chi[top]!;
  const b = chi[top]!;
  const curve = a - 2 * b + c;
  const shift = curve < 0 ? (0.5 * (a - c)) / curve : 0;
  const peak = b - 0.25 * (a - c) * shift;
  const peakAt = top + shift;
  let half = top;
  while (half > 0 && chi[half]! > peak / 2) half--;
  const halfAt = half + (peak / 2 - chi[half]!) / (chi[half + 1]! - chi[half]!);
  const shape = { chi, peakAt, peak, halfWidth: (peakAt - halfAt) * STEP };
  shapes.set(key, shape);
  return shape;
}

/** The shape's current over its peak, ξ counted from the peak (0 before the table starts). */
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
 * The shape of a diffusing wave whose |Ep − Ep/2| is `halfWidth` RT/nF, wider than a reversible
 * wave's 2.20; null at or below that width.
 */
export function kineticWaveShapeFor(halfWidth: number): KineticWaveShape | null {
  const grid = PSI_GRID.map((psi) => solve(psi, 0.5));
  if (!(halfWidth > grid[0]!.halfWidth)) return null;
  const widest = grid[grid.length - 1]!;
  if (halfWidth >= widest.halfWidth) {
    const alpha = Math.min(0.5, Math.max(0.1, Math.round((IRREVERSIBLE_WIDTH_TIMES_ALPHA / halfWidth) * 100) / 100));
    const s = solve(IRREVERSIBLE_PSI, alpha);
    return { words: `an irreversible wave's shape with α = ${alpha.toFixed(2)} from its width (Nicholson 1965)`, at: (x) => valueAt(s, x) };
  }
  let k = 1;
  while (grid[k]!.halfWidth < halfWidth) k++;
  const lo = grid[k - 1]!;
  const hi = grid[k]!;
  const f = (halfWidth - lo.halfWidth) / (hi.halfWidth - lo.halfWidth);
  const psi = Math.exp(Math.log(PSI_GRID[k - 1]!) * (1 - f) + Math.log(PSI_GRID[k]!) * f);
  return {
    words: `a quasi-reversible wave's shape, ψ ≈ ${psi.toPrecision(2)} with α = 0.5 from its width (Nicholson 1965)`,
    at: (x) => valueAt(lo, x) * (1 - f) + valueAt(hi, x) * f,
  };
}

/** |Ep − Ep/2| (RT/nF) and the peak of √π·χ of the wave at ψ and α, as the tables give them (for checks). */
export function slowWaveMeasures(psi: number, alpha: number): { halfWidth: number; peakCurrentFunction: number } {
  const s = solve(psi, alpha);
  return { halfWidth: s.halfWidth, peakCurrentFunction: Math.sqrt(Math.PI) * s.peak };
}
