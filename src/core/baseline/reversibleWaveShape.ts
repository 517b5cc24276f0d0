/**
 * The current of a reversible wave on a linear sweep, as a function of potential: the dimensionless
 * current function χ of Nicholson & Shain, computed once from their integral equation for planar,
 * semi-infinite diffusion with both species soluble,
 *   ∫₀^{σt} χ(z) / √(σt − z) dz = 1 / (1 + exp(ξ)),   ξ = nF(E − E½)/RT along a reduction sweep,
 * where i = nFAC√(πDσ)·χ and σ = nFv/RT (R. S. Nicholson, I. Shain, Anal. Chem. 36 (1964) 706,
 * eq. 24 and Table I; Bard & Faulkner 2nd ed. (2001) §6.2.1, eqs. 6.2.12-6.2.21).
 * Solved by product integration with χ constant on each step of 0.02 in σt, from ξ = +12 (the
 * wave not yet started) to ξ = −60 (1.5 V past E½ for n = 1 at 25 °C).
 * Out: the shape relative to its peak, 1 at ξ = −1.109 (the peak, Ep = E½ − 28.5/n mV at 25 °C),
 *   for ξ decreasing along the sweep; an oxidation sweep is the same with ξ = −nF(E − E½)/RT.
 */
import { semiIntegralWeights } from './semiIntegralWeights';

const START_XI = 12;
const END_XI = -60;
const STEP = 0.02;

interface Table {
  chi: Float64Array;
  peak: number;
  peakXi: number;
}

let table: Table | null = null;

function solve(): Table {
  const n = Math.round((START_XI - END_XI) / STEP);
  const chi = new Float64Array(n);
  // Weight of step j (χ_j on [jh, (j+1)h]) at x = (k+1)h, a function of k − j.
  const w = semiIntegralWeights(n, 2 * Math.sqrt(STEP));
  let peak = 0;
  let peakAt = 0;
  for (let k = 0; k < n; k++) {
    const x = (k + 1) * STEP;
    let known = 0;
    for (let j = 0; j < k; j++) known += chi[j]! * w[k - j]!;
    const value = (1 / (1 + Math.exp(START_XI - x)) - known) / w[0]!;
    chi[k] = value;
    if (value > peak) {
      peak = value;
      peakAt = k;
    }
  }
  return { chi, peak, peakXi: START_XI - (peakAt + 0.5) * STEP };
}

function shapeTable(): Table {
  return (table ??= solve());
}

/** χ at the peak (Nicholson & Shain's √π·χ is 0.4463 there). */
export function reversiblePeakChi(): number {
  return shapeTable().peak;
}

/** ξ of the peak, −1.109 in Nicholson & Shain's Table I. */
export function reversiblePeakXi(): number {
  return shapeTable().peakXi;
}

/**
 * The wave's current relative to its peak at ξ (linear interpolation in the table); 0 before the
 * table's start, and past its end the Cottrell decay χ ∝ 1/√(−ξ) (time counted from E½, where the
 * surface concentration has fallen to half) carried on from the last value.
 */
export function reversibleWaveShape(xi: number): number {
  const { chi, peak } = shapeTable();
  const u = (START_XI - xi) / STEP - 0.5;
  if (u <= 0) return u < -0.5 ? 0 : chi[0]! / peak;
  const last = chi.length - 1;
  if (u >= last) return (chi[last]! / peak) * Math.sqrt(END_XI / xi);
  const k = Math.floor(u);
  const f = u - k;
  return (chi[k]! * (1 - f) + chi[k + 1]! * f) / peak;
}
