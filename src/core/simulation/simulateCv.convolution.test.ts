/**
 * Whole-curve check of the finite-difference simulator against an independent method: the
 * integral (convolution) equation of a Nernstian couple under linear diffusion,
 *   c_O(0,t) = C − (πD)^(−½) ∫₀ᵗ J(τ)(t − τ)^(−½) dτ,  c_O(0,t) = C·θ/(1 + θ), θ = e^{nf(E−E°′)},
 * (R. S. Nicholson, I. Shain, Anal. Chem. 36, 706 (1964); Bard & Faulkner 2nd ed. §6.2, from
 * memory) solved by the step-function discretisation of the Abel kernel (R. S. Nicholson,
 * M. L. Olmstead, in "Electrochemistry: Calculations, Simulation, and Instrumentation", Dekker
 * (1972), from memory). No grid, no time-stepping of a PDE: nothing is shared with the simulator.
 */
import { describe, expect, it } from 'vitest';
import { FARADAY_C_PER_MOL as F, inverseThermalVoltagePerV } from '../constants';
import { simulateCv } from './simulateCv';

const f = inverseThermalVoltagePerV(298.15);
const D = 1e-5;
const C = 1e-6;
const v = 0.1;
const startV = 0.3;
const switchV = -0.3;

/** Reduction flux J (mol cm⁻² s⁻¹) on intervals of `stepV`, J[k] belonging to the interval midpoint. */
function solveConvolutionEquation(stepV: number): Float64Array {
  const perSweep = Math.round((startV - switchV) / stepV);
  const total = 2 * perSweep;
  const dt = stepV / v;
  const weight = new Float64Array(total + 1);
  for (let m = 0; m <= total; m++) weight[m] = 2 * Math.sqrt(dt) * (Math.sqrt(m + 1) - Math.sqrt(m));
  const flux = new Float64Array(total + 1);
  for (let k = 1; k <= total; k++) {
    const mid = k - 0.5;
    const e = startV - (mid <= perSweep ? mid : 2 * perSweep - mid) * stepV;
    let history = 0;
    for (let j = 1; j < k; j++) history += (flux[j] as number) * (weight[k - j] as number);
    flux[k] = (Math.sqrt(Math.PI * D) * C / (1 + Math.exp(f * e)) - history) / (weight[0] as number);
  }
  return flux;
}

describe('simulateCv against the convolution integral equation (reversible E, whole cycle)', () => {
  it('every point of the forward and reverse sweep agrees within 0.3 % of the peak current', () => {
    const fine = 0.0002;
    const ratio = Math.round(0.001 / fine);
    const flux = solveConvolutionEquation(fine);
    const r = simulateCv({ k0CmPerS: Infinity, startV, switchV, areaCm2: 1, diffusionOCm2PerS: D, diffusionRCm2PerS: D, concentrationOMolPerCm3: C, scanRateVPerS: v });
    const peak = 0.4463 * F * C * Math.sqrt(f * v * D);
    let worst = 0;
    for (let k = 1; k < r.currentA.length - 1; k++) {
      const j = k * ratio;
      const independentA = -F * 0.5 * ((flux[j] as number) + (flux[j + 1] as number));
      worst = Math.max(worst, Math.abs(independentA - (r.currentA[k] as number)) / peak);
    }
    expect(worst).toBeLessThan(0.003);
  });
});
