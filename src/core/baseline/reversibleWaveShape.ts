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
 * startedReversibleWave: the same equation for a sweep that starts at ξᵢ on the wave's foot from a
 *   solution at rest (only O present): the right side 1/(1 + exp(ξ)) then jumps from 0 at the start
 *   (the semi-integral of the current is fixed by the surface concentrations alone, Nicholson &
 *   Shain's eq. 24 holds for any potential program), which adds the 1/√t current of that step
 *   (Cottrell) to the foot and lowers the rest of it.
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

function solve(startXi = START_XI): Table {
  const n = Math.round((startXi - END_XI) / STEP);
  const chi = new Float64Array(n);
  // Weight of step j (χ_j on [jh, (j+1)h]) at x = (k+1)h, a function of k − j.
  const w = semiIntegralWeights(n, 2 * Math.sqrt(STEP));
  let peak = 0;
  let peakAt = 0;
  for (let k = 0; k < n; k++) {
    const x = (k + 1) * STEP;
    let known = 0;
    for (let j = 0; j < k; j++) known += chi[j]! * w[k - j]!;
    const value = (1 / (1 + Math.exp(startXi - x)) - known) / w[0]!;
    chi[k] = value;
    if (value > peak) {
      peak = value;
      peakAt = k;
    }
  }
  return { chi, peak, peakXi: startXi - (peakAt + 0.5) * STEP };
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
  return shapeAt(shapeTable(), START_XI, xi);
}

/** A reversible wave swept from ξᵢ (its start, from a solution at rest): its peak and its shape relative to that peak. */
export interface StartedReversibleWave {
  /** ξ of the sweep's start (from E½, decreasing along the sweep). */
  startXi: number;
  /** ξ of its peak, and √π·χ there. */
  peakXi: number;
  peakCurrentFunction: number;
  /** Current relative to this wave's own peak at ξ; 0 before the start. */
  at: (xi: number) => number;
}

const started = new Map<number, StartedReversibleWave>();

/** The wave of a sweep started at ξᵢ (rounded to the table's step; ξᵢ ≥ 12 is the wave from far before its foot). */
export function startedReversibleWave(startXi: number): StartedReversibleWave {
  const key = Math.min(START_XI, Math.round(startXi / STEP) * STEP);
  let wave = started.get(key);
  if (!wave) {
    const t = key >= START_XI ? shapeTable() : solve(key);
    wave = { startXi: key, peakXi: t.peakXi, peakCurrentFunction: Math.sqrt(Math.PI) * t.peak, at: (xi) => (xi > key ? 0 : shapeAt(t, key, xi)) };
    if (started.size > 64) started.clear();
    started.set(key, wave);
  }
  return wave;
}

function shapeAt(t: Table, startXi: number, xi: number): number {
  const { chi, peak } = t;
  const u = (startXi - xi) / STEP - 0.5;
  if (u <= 0) return u < -0.5 ? 0 : chi[0]! / peak;
  const last = chi.length - 1;
  if (u >= last) return (chi[last]! / peak) * Math.sqrt(END_XI / xi);
  const k = Math.floor(u);
  const f = u - k;
  return (chi[k]! * (1 - f) + chi[k + 1]! * f) / peak;
}
