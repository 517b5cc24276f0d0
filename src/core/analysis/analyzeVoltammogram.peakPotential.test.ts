/**
 * Ep and ΔEp of broad and noisy peaks through the whole analysis (Ep: peaks/peakVertex.ts) against
 * published values, on this project's simulator (its own validation: simulation/*.test.ts) with
 * seeded Gaussian noise. Statistics measured with bench/peakVertexScatter.ts (200 seeds per row)
 * and here; tolerances with margin: a mean within its measured bias plus 4 standard errors of the
 * seeds used, a standard deviation below the measured one plus 40 % (the sample standard deviation
 * of 40 seeds itself scatters by about 11 %) and below the one measured before the window scaled
 * with the peak (the 3σ window alone), so a return to that window fails.
 */
import { describe, expect, it } from 'vitest';
import { FARADAY_C_PER_MOL as F, thermalVoltageV } from '../constants';
import { reversibleDeltaEpAtSwitch } from '../couples/reversibleDeltaEpAtSwitch';
import { seededGaussian } from '../random/seededGaussian';
import { simulateCv, type CvSimulationInput } from '../simulation';
import { findSweepSegments } from '../sweeps/findSweepSegments';
import type { Voltammogram } from '../types';
import { analyzeVoltammogram } from './analyzeVoltammogram';

const u = thermalVoltageV(298.15);
const A = 0.0707;
const C = 1e-6;
const D = 1e-5;
const V = 0.1;
const SEEDS = 40;

function voltammogram(input: Partial<CvSimulationInput>, stepMv: number, noiseA = 0, seed = 1): Voltammogram {
  const r = simulateCv({ ...input, scanRateVPerS: V, stepV: stepMv / 1000 });
  const currentA = Float64Array.from(r.currentA);
  const g = seededGaussian(seed);
  if (noiseA > 0) for (let k = 0; k < currentA.length; k++) currentA[k]! += noiseA * g();
  const split = findSweepSegments(r.potentialV);
  return { potentialV: r.potentialV, currentA, timeS: r.timeS, segments: split.segments, cycles: split.cycles, scanRateVPerS: V, scanRateSource: 'option' };
}

/** The first cycle's largest couple (at 2 % noise a pair of noise features is now and then paired too). */
function couple(v: Voltammogram) {
  const couples = analyzeVoltammogram(v).cycles[0]!.couples.filter((c) => c.deltaEpV !== null);
  expect(couples.length).toBeGreaterThanOrEqual(1);
  return couples.sort((a, b) => b.ipaA! + b.ipcA! - a.ipaA! - a.ipcA!)[0]!;
}

function stats(xs: number[]): { mean: number; sd: number } {
  const mean = xs.reduce((a, b) => a + b, 0) / xs.length;
  return { mean, sd: Math.sqrt(xs.reduce((a, b) => a + (b - mean) ** 2, 0) / (xs.length - 1)) };
}

const mv = (x: number) => x * 1000;

// (a) Nernstian adsorbed layer (Laviron, J. Electroanal. Chem. 101 (1979) 19): both peaks at E°′,
// ΔEp = 0, ip = n²F²AΓv/4RT, FWHM 90.6/n mV at 25 °C: a broad, symmetric peak.
describe('Nernstian film: Ep at E°′ (Laviron 1979)', () => {
  const film: Partial<CvSimulationInput> = { mechanism: 'surface', surfaceRatePerS: Infinity, coverageMolPerCm2: 1e-10, areaCm2: A, formalPotentialV: 0, startV: -0.35, switchV: 0.35 };
  const ip = (F * A * 1e-10 * V) / (4 * u);

  // Measured: within 0.04 mV at every phase of the grid (bench/peakVertexScatter.ts).
  it.each([1, 2, 5])('noise-free, %i mV steps: Epa and Epc within 0.1 mV of E°′', (stepMv) => {
    const c = couple(voltammogram(film, stepMv));
    expect(Math.abs(mv(c.epaV!))).toBeLessThan(0.1);
    expect(Math.abs(mv(c.epcV!))).toBeLessThan(0.1);
  });

  // 2 mV steps, noise 2 % of ip. Measured over 200 seeds: Epa bias 0.00, sd 0.59 mV; ΔEp bias
  // +0.02, sd 0.88 mV (with the 3σ window alone: sd 1.25 and 1.88 mV).
  it(`2 % noise, 2 mV steps, ${SEEDS} seeds: mean Epa within 0.4 mV of E°′ and ΔEp within 0.6 mV of 0; scatter 0.85 and 1.25 mV at most`, () => {
    const epa: number[] = [];
    const dEp: number[] = [];
    for (let seed = 1; seed <= SEEDS; seed++) {
      const c = couple(voltammogram(film, 2, 0.02 * ip, 500 + seed));
      epa.push(mv(c.epaV!));
      dEp.push(mv(c.deltaEpV!));
    }
    const a = stats(epa);
    const d = stats(dEp);
    expect(Math.abs(a.mean)).toBeLessThan(0.4);
    expect(Math.abs(d.mean)).toBeLessThan(0.6);
    expect(a.sd).toBeLessThan(0.85);
    expect(d.sd).toBeLessThan(1.25);
  });

  // A slow film (Laviron 1979: k_s = 5 1/s at 0.1 V/s, peaks skewed away from each other): the
  // window stays narrow enough that the skew correction's residual pull stays within 0.05 mV a
  // peak, 0.1 mV on ΔEp. Reference: the same simulated current at 0.05 mV steps, each extremum by a
  // 3-point parabola. Measured: −0.09, −0.09 and −0.11 mV at 1, 2 and 5 mV steps (the 1 % window
  // alone: −0.01, −0.01 and −0.10 mV).
  it('noise-free slow film (k_s 5 1/s): ΔEp within 0.15 mV of the finely sampled curve\'s', () => {
    const slow = { ...film, surfaceRatePerS: 5, switchV: 0.45 };
    const fine = simulateCv({ ...slow, scanRateVPerS: V, stepV: 0.00005 });
    const extremum = (from: number, to: number, s: number) => {
      let k = from;
      for (let j = from; j < to; j++) if (s * fine.currentA[j]! > s * fine.currentA[k]!) k = j;
      const [y0, y1, y2] = [fine.currentA[k - 1]!, fine.currentA[k]!, fine.currentA[k + 1]!];
      return fine.potentialV[k]! + ((0.5 * (y0 - y2)) / (y0 - 2 * y1 + y2)) * (fine.potentialV[k + 1]! - fine.potentialV[k]!);
    };
    const half = (fine.potentialV.length - 1) / 2;
    const reference = extremum(1, half, 1) - extremum(half + 1, 2 * half, -1);
    for (const stepMv of [1, 2, 5]) {
      const c = couple(voltammogram(slow, stepMv));
      expect(Math.abs(mv(c.deltaEpV! - reference))).toBeLessThan(0.15);
    }
  });
});

// (b) Reversible diffusion wave: Epc = E½ − 1.109·RT/nF (Nicholson & Shain, Anal. Chem. 36 (1964)
// 706, Table I); ΔEp at this switch from Nicholson, Anal. Chem. 37 (1965) 1351 (as tabulated in
// Bard & Faulkner 2nd ed. §6.5, from memory; the table is rounded to 0.1 mV).
describe('reversible wave: Ep − E½ = −1.109 RT/F and ΔEp (Nicholson & Shain 1964, Nicholson 1965)', () => {
  const rev: Partial<CvSimulationInput> = { k0CmPerS: Infinity, formalPotentialV: 0, startV: 0.4, switchV: -0.4, areaCm2: A, concentrationOMolPerCm3: C, diffusionOCm2PerS: D, diffusionRCm2PerS: D };
  const ip = 0.4463 * F * A * C * Math.sqrt((D * V) / u);
  const tableDeltaEp = (epcV: number) => reversibleDeltaEpAtSwitch(Math.abs(-0.4 - epcV)).deltaEpV;

  // Measured: Epc −0.02 to −0.05 mV, ΔEp −0.12 to −0.14 mV from the table over grid phases.
  it.each([1, 2, 5])('noise-free, %i mV steps: Epc within 0.1 mV, ΔEp within 0.2 mV of the published values', (stepMv) => {
    const c = couple(voltammogram(rev, stepMv));
    expect(Math.abs(mv(c.epcV! + 1.109 * u))).toBeLessThan(0.1);
    expect(Math.abs(mv(c.deltaEpV! - tableDeltaEp(c.epcV!)))).toBeLessThan(0.2);
  });

  // 1 mV steps, noise 1 % of ip. Measured over 200 seeds: Epc bias +0.03 mV, sd 0.87 mV; ΔEp −0.07 mV
  // from its noise-free value, sd 1.24 mV. This skewed wave keeps about the narrow window.
  it(`1 % noise, 1 mV steps, ${SEEDS} seeds: mean Epc within 0.6 mV, mean ΔEp within 0.9 mV of the noise-free ΔEp`, () => {
    const clean = couple(voltammogram(rev, 1)).deltaEpV!;
    const epc: number[] = [];
    const dEp: number[] = [];
    for (let seed = 1; seed <= SEEDS; seed++) {
      const c = couple(voltammogram(rev, 1, 0.01 * ip, 700 + seed));
      epc.push(mv(c.epcV! + 1.109 * u));
      dEp.push(mv(c.deltaEpV! - clean));
    }
    expect(Math.abs(stats(epc).mean)).toBeLessThan(0.6);
    expect(Math.abs(stats(dEp).mean)).toBeLessThan(0.9);
  });
});

// (c) Totally irreversible wave (Bard & Faulkner 2nd ed. §6.3, eq. 6.3.4, from memory; Matsuda &
// Ayabe): Epc = E°′ − (RT/αF)[0.780 + ln(D^½/k°) + ln(αFv/RT)^½], |Ep − Ep/2| = 1.857·RT/αF: broad
// (95 mV at α = 0.5) and skewed. The analysis measures Ep above the pre-peak line, which here lies
// under the wave's long foot and tilts Ep by about +0.35 mV (so before and after this window).
describe('totally irreversible wave: Ep by B&F eq. 6.3.4', () => {
  const k0 = 1e-5;
  const alpha = 0.5;
  const irr: Partial<CvSimulationInput> = { k0CmPerS: k0, alpha, formalPotentialV: 0, startV: 0.1, switchV: -0.8, areaCm2: A, concentrationOMolPerCm3: C, diffusionOCm2PerS: D, diffusionRCm2PerS: D };
  const ip = 0.4958 * F * A * C * Math.sqrt((D * alpha * V) / u);
  const published = -(u / alpha) * (0.78 + Math.log(Math.sqrt(D) / k0) + 0.5 * Math.log((alpha * V) / u));
  const forward = (v: Voltammogram) => {
    const peaks = analyzeVoltammogram(v).cycles[0]!.peaks.filter((p) => p.direction === 'cathodic' && p.onFirstSweep);
    return peaks.sort((a, b) => b.heightA - a.heightA)[0]!;
  };

  it.each([1, 2, 5])('noise-free, %i mV steps: Epc within 0.5 mV of eq. 6.3.4 (measured +0.33 to +0.35 mV)', (stepMv) => {
    expect(Math.abs(mv(forward(voltammogram(irr, stepMv)).potentialV - published))).toBeLessThan(0.5);
  });

  // 2 mV steps, noise 1 % of ip. Measured over 200 seeds: bias +0.38 mV, sd 1.65 mV.
  it(`1 % noise, 2 mV steps, ${SEEDS} seeds: mean Epc within 1.5 mV of eq. 6.3.4`, () => {
    const epc: number[] = [];
    for (let seed = 1; seed <= SEEDS; seed++) epc.push(mv(forward(voltammogram(irr, 2, 0.01 * ip, 900 + seed)).potentialV - published));
    expect(Math.abs(stats(epc).mean)).toBeLessThan(1.5);
  });
});
