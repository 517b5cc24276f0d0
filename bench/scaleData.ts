/**
 * Seeded inputs at scale, shared by the scale bench (scaleBench.ts) and the browser spec
 * (test/browser/scale.test.ts): many small exports and one 1,000,000-row export, all from this
 * project's simulator (src/core/simulation) with seeded Gaussian noise, written as CSV text with
 * time, potential and current columns. Scenarios of our own invention, not measurements.
 */
import { seededGaussian } from '../src/core/random/seededGaussian';
import { simulateCv } from '../src/core/simulation';

export const CSV_HEADER = 'Time (s),Potential (V),Current (A)';

/** Scan rates the small files cycle through (V/s). */
const SMALL_RATES_V_PER_S = [0.05, 0.1, 0.2, 0.5];

/** Noise added to every current (A): about 0.1 % of the 19 µA peak at 0.1 V/s. */
const NOISE_A = 2e-8;

/**
 * `count` small exports: a Nernstian couple (E°′ = 0 V, 1 mM, 0.0707 cm², D = 1e-5 cm²/s,
 * +0.3 → −0.3 → +0.3 V in 1 mV steps, 1,201 rows) at four scan rates in turn, each file with
 * its own noise seed, so no two files are equal.
 */
export function smallCvFiles(count: number): { name: string; text: string }[] {
  const sims = SMALL_RATES_V_PER_S.map((scanRateVPerS) => ({ scanRateVPerS, sim: simulateCv({ k0CmPerS: Infinity, scanRateVPerS }) }));
  return Array.from({ length: count }, (_, k) => {
    const { scanRateVPerS, sim } = sims[k % sims.length]!;
    const g = seededGaussian(1000 + k);
    const rows = [CSV_HEADER];
    for (let i = 0; i < sim.potentialV.length; i++) {
      rows.push(`${sim.timeS[i]!.toFixed(5)},${sim.potentialV[i]!.toFixed(6)},${(sim.currentA[i]! + NOISE_A * g()).toExponential(6)}`);
    }
    const mvs = String(Math.round(scanRateVPerS * 1000)).padStart(3, '0');
    return { name: `batch_${String(k + 1).padStart(3, '0')}_${mvs}mVs.csv`, text: `${rows.join('\n')}\n` };
  });
}

export interface BigTrace {
  timeS: Float64Array;
  potentialV: Float64Array;
  currentA: Float64Array;
}

/**
 * `rows` points of repeated cycles (+0.3 → −0.3 → +0.3 V at 0.1 V/s) of the same Nernstian couple:
 * the potential is the exact triangle on a fine grid (`rows / cycles` points per cycle, 12 µV
 * steps for the defaults), the current is the simulated one (0.12 mV steps) interpolated linearly
 * onto that grid plus seeded noise. Built in well under a second.
 */
export function bigCvTrace(rows = 1_000_000, cycles = 10, seed = 7): BigTrace {
  const sim = simulateCv({ k0CmPerS: Infinity, scanRateVPerS: 0.1, stepV: 0.00012 });
  const last = sim.currentA.length - 1;
  const perCycle = rows / cycles;
  const stepV = 1.2 / perCycle;
  const g = seededGaussian(seed);
  const timeS = new Float64Array(rows);
  const potentialV = new Float64Array(rows);
  const currentA = new Float64Array(rows);
  for (let k = 0; k < rows; k++) {
    const u = (k % perCycle) / perCycle;
    const x = u * last;
    const i = Math.min(Math.floor(x), last - 1);
    const f = x - i;
    timeS[k] = (k * stepV) / 0.1;
    potentialV[k] = u < 0.5 ? 0.3 - 1.2 * u : -0.9 + 1.2 * u;
    currentA[k] = sim.currentA[i]! * (1 - f) + sim.currentA[i + 1]! * f + NOISE_A * g();
  }
  return { timeS, potentialV, currentA };
}

/** The trace as CSV text (about 31 MB for 1,000,000 rows). */
export function traceCsv(trace: BigTrace): string {
  const rows = new Array<string>(trace.timeS.length + 1);
  rows[0] = CSV_HEADER;
  for (let k = 0; k < trace.timeS.length; k++) {
    rows[k + 1] = `${trace.timeS[k]!.toFixed(5)},${trace.potentialV[k]!.toFixed(6)},${trace.currentA[k]!.toExponential(6)}`;
  }
  return `${rows.join('\n')}\n`;
}
