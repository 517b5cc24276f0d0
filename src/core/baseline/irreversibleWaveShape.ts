/**
 * The current of a totally irreversible wave on a linear sweep, as a function of potential, for
 * the foot of such a wave under its own pre-peak line (lineUnderOwnFoot.ts).
 *
 * Source: planar semi-infinite diffusion, a one-step electron transfer whose back reaction is
 *   negligible. With i = nFAC√(πDb)·χ(bt), b = αnₐFv/RT, the surface concentration of O is
 *   C*(1 − M(bt)) with M(u) = ∫₀^u χ(z)/√(u − z) dz, and the rate k_f = k°·e^(−αnₐF(E − E°′)/RT)
 *   grows as e^(bt) along the sweep, so that χ = e^x·(1 − M) with x = bt + ln(k_f(0)/√(πDb))
 *   (Nicholson & Shain, Anal. Chem. 36 (1964) 706; Bard & Faulkner, Electrochemical Methods, 2nd
 *   ed. (2001) §6.3.1, from memory). Neither α, k°, E°′ nor the scan rate is left in it: every
 *   totally irreversible wave has one shape in x, only placed by its peak and stretched by α.
 *   Solved by product integration (solveSlowWave, kineticWaveShape.ts) with χ constant on each step of 0.01
 *   in x, from x = −13 (the foot there 1e-5 of the peak) to 1 past the peak. The step's first-order
 *   error leaves the peak √π·χ at 0.4953 (0.4958 in Bard & Faulkner eq. 6.3.8) and |Ep − Ep/2| at
 *   1.861 RT/αnₐF (1.857, same §, from memory): the width that gives α below is this table's own,
 *   so the shape and the measured wave agree at half height. Its peak lies at x = 0.208 (0.780 − ½ln π
 *   from E_p = E°′ − (RT/αnₐF)[0.780 + ln(D^½/k°) + ln b^½], J. Wang, Analytical Electrochemistry,
 *   2nd ed. (2000), eq. 2-5).
 * Which α: |Ep − Ep/2| = 1.857 RT/αnₐF alone gives it (it is a width in units of RT/nF here, so α
 *   stands for αnₐ/n). Whether a wave is totally irreversible at all one width cannot tell; the
 *   caller asks the window before the wave and the wave's rising part (lineUnderOwnFoot.ts).
 * Out: the shape relative to its peak, 1 at the peak, for ξ counted in RT/nF from the peak,
 *   positive before it and decreasing along the sweep (either direction).
 */
import { solveSlowWave } from './kineticWaveShape';

const STEP = 0.01;
const START_X = -13;
/** How far past its peak (in x) the table runs: the foot and the rising part are what is read. */
const PAST_PEAK = 1;
/** α read from a width is used only from this value up (our bound: transfer coefficients of one-step couples lie near 0.3–0.7, Bard & Faulkner §3.3, from memory; wider waves are likely something else). */
const LEAST_ALPHA = 0.2;

interface Table {
  chi: Float64Array;
  /** Position of the peak in steps (fractional) and its χ. */
  peakAt: number;
  peak: number;
  /** |Ep − Ep/2| in x (units of RT/αnₐF). */
  halfWidth: number;
}

let table: Table | null = null;

function solve(): Table {
  if (table) return table;
  const n = Math.round((PAST_PEAK + 4 - START_X) / STEP);
  const { chi, peakAt, peak, halfAt } = solveSlowWave(n, STEP, (k) => Math.exp(START_X + (k + 0.5) * STEP), () => 1, PAST_PEAK);
  table = { chi, peakAt, peak, halfWidth: (peakAt - halfAt) * STEP };
  return table;
}

/** The wave's current over its peak current, x counted from the peak (0 before the table starts). */
function valueAt(t: Table, xFromPeak: number): number {
  const u = t.peakAt + xFromPeak / STEP;
  if (u <= 0) return 0;
  const last = t.chi.length - 1;
  if (u >= last) return t.chi[last]! / t.peak;
  const k = Math.floor(u);
  const f = u - k;
  return (t.chi[k]! * (1 - f) + t.chi[k + 1]! * f) / t.peak;
}

export interface IrreversibleWaveShape {
  /** α (αnₐ/n) read from the width. */
  alpha: number;
  /** What was assumed, for the baseline's description. */
  words: string;
  /** Current over the peak current at ξ = nF|E − Ep|/RT before the peak (positive) or past it (negative). */
  at: (xiFromPeak: number) => number;
}

/**
 * The totally irreversible wave whose |Ep − Ep/2| is `halfWidth` RT/nF: α = 1.857/halfWidth (the
 * table's own 1.861), null where that α is below LEAST_ALPHA or not finite. Far before the peak
 * χ = e^x, and the peak lies at x_p = 0.21 with √π·χ_p = 0.4958, so the foot is
 * e^(0.21)·√π/0.4958·e^(−αξ) = 4.4·e^(−αξ) of the peak: 1 % at 520 mV before Ep for α = 0.3
 * (n = 1, 25 °C), 0.1 % at 720 mV.
 */
export function irreversibleWaveShapeFor(halfWidth: number): IrreversibleWaveShape | null {
  const t = solve();
  const alpha = t.halfWidth / halfWidth;
  if (!Number.isFinite(alpha) || alpha < LEAST_ALPHA) return null;
  return {
    alpha,
    words: `a totally irreversible wave's shape with αnₐ/n = ${alpha.toFixed(2)} from its width (Nicholson & Shain 1964)`,
    at: (xi) => valueAt(t, -alpha * xi),
  };
}

/** √π·χ at the peak, |Ep − Ep/2| in RT/αnₐF and x of the peak (for checks against the published values). */
export function irreversibleWaveMeasures(): { peakCurrentFunction: number; halfWidth: number; peakX: number } {
  const t = solve();
  return { peakCurrentFunction: Math.sqrt(Math.PI) * t.peak, halfWidth: t.halfWidth, peakX: START_X + (t.peakAt + 0.5) * STEP };
}
