/**
 * The ohmic peak deficit against an independent solution: the integral (convolution) equation of
 * linear diffusion with the interfacial potential E − i·Ru solved at each step,
 *   c_O(0,t) = C − (πD)^(−½) ∫₀ᵗ J(τ)(t − τ)^(−½) dτ,  c_R(0,t) = C − c_O(0,t)  (D_O = D_R),
 *   Nernstian: c_O/c_R = e^{f(E − E°′)};  Butler–Volmer: J = k°e^{−αfη}(c_O − c_R e^{fη}),
 *   η = E_app + F·A·J·Ru − E°′ (reduction flux J, cathodic current −FAJ),
 * (R. S. Nicholson, Anal. Chem. 37, 667 (1965), the ohmic term; R. S. Nicholson, I. Shain, Anal.
 * Chem. 36, 706 (1964); both from memory) with the step-function discretisation of the Abel
 * kernel (Nicholson & Olmstead, in "Electrochemistry: Calculations, Simulation, and
 * Instrumentation", Dekker (1972), from memory). No space grid: nothing is shared with the
 * simulator the ratio is computed with.
 */
import { describe, expect, it } from 'vitest';
import { FARADAY_C_PER_MOL as F, inverseThermalVoltagePerV } from '../constants';
import { ohmicDropParameter, ohmicPeakCurrentRatio, OHMIC_RHO_MAX } from './ohmicPeakCurrentRatio';

const f = inverseThermalVoltagePerV(298.15);
const cell = { electronCount: 1, areaCm2: 1, concentrationMolPerCm3: 1e-6, temperatureK: 298.15 };
const D = 1e-5;
const v = 1;

/** Largest cathodic current (A) of one forward sweep from +0.5 V to −1.0 V (E°′ = 0) by the convolution equation. */
function convolutionPeakA(k0: number, alpha: number, ruOhm: number, stepV = 0.0002): number {
  const total = Math.round(1.5 / stepV);
  const dt = stepV / v;
  const w = new Float64Array(total + 1);
  for (let m = 0; m <= total; m++) w[m] = 2 * Math.sqrt(dt) * (Math.sqrt(m + 1) - Math.sqrt(m));
  const flux = new Float64Array(total + 1);
  const s = Math.sqrt(Math.PI * D);
  const c = cell.concentrationMolPerCm3;
  let peak = 0;
  for (let k = 1; k <= total; k++) {
    const e = 0.5 - (k - 0.5) * stepV;
    let history = 0;
    for (let j = 1; j < k; j++) history += (flux[j] as number) * (w[k - j] as number);
    // g(J) rises with J (more conversion lowers c_O, raises c_R and the drop): bisection.
    const g = (J: number) => {
      const conv = (history + J * (w[0] as number)) / s;
      const eta = e + F * cell.areaCm2 * J * ruOhm;
      if (k0 === Infinity) return c / (1 + Math.exp(-f * eta)) - (c - conv);
      return J - k0 * Math.exp(-alpha * f * eta) * (c - conv - conv * Math.exp(f * eta));
    };
    let lo = -1e-6;
    let hi = (s * c - history) / (w[0] as number);
    for (let it = 0; it < 80; it++) {
      const mid = 0.5 * (lo + hi);
      if (g(mid) > 0) hi = mid; else lo = mid;
    }
    flux[k] = 0.5 * (lo + hi);
    peak = Math.max(peak, F * cell.areaCm2 * (flux[k] as number));
  }
  return peak;
}

function independentRatio(rho: number, psi: number, alpha: number): number {
  const ru = rho / ohmicDropParameter(cell, v, D, 1);
  const k0 = psi === Infinity ? Infinity : psi * Math.sqrt(Math.PI * D * f * v);
  return convolutionPeakA(k0, alpha, ru) / convolutionPeakA(k0, alpha, 0);
}

describe('ohmicPeakCurrentRatio', () => {
  it('is 1 without resistance (by definition)', () => {
    expect(ohmicPeakCurrentRatio(0, Infinity, 0.5)).toBe(1);
  });

  it('ρ of a 2 mM, 0.0707 cm², D = 7.6e-6 cm²/s couple at 2 V/s with 150 Ω is 0.865 (Randles–Ševčík 0.4463, Bard & Faulkner 2nd ed. §6.2, worked by hand)', () => {
    // ip = 0.4463·F·A·C·(fvD)^½ = 0.4463·96485·0.0707·2e-6·(38.92·2·7.6e-6)^½ = 1.481e-4 A; ×150 Ω × f = 0.865.
    const rho = ohmicDropParameter({ ...cell, areaCm2: 0.0707, concentrationMolPerCm3: 2e-6 }, 2, 7.6e-6, 150);
    expect(rho).toBeCloseTo(0.865, 2);
  });

  // Independent convolution-integral solution (see the file header): Nernstian couple.
  it.each([0.2, 0.865, 3])('Nernstian, ρ = %s: within 0.2 % of the convolution equation', (rho) => {
    const ours = ohmicPeakCurrentRatio(rho, Infinity, 0.5);
    expect(ours).toBeLessThan(1);
    expect(Math.abs(ours / independentRatio(rho, Infinity, 0.5) - 1)).toBeLessThan(0.002);
  });

  // Same, Butler–Volmer at ψ = 0.5 and 2 (Nicholson 1965 Table I spans ψ 0.1–20).
  it.each([[0.5, 0.5], [2, 0.35]])('ψ = %s, α = %s, ρ = 0.6: within 0.2 % of the convolution equation', (psi, alpha) => {
    const ours = ohmicPeakCurrentRatio(0.6, psi, alpha);
    expect(ours).toBeLessThan(0.99);
    expect(Math.abs(ours / independentRatio(0.6, psi, alpha) - 1)).toBeLessThan(0.002);
  });

  it('refuses ρ beyond its working curve, a negative ρ and a NaN ψ', () => {
    expect(() => ohmicPeakCurrentRatio(OHMIC_RHO_MAX * 1.01, Infinity, 0.5)).toThrow(/rho/);
    expect(() => ohmicPeakCurrentRatio(-0.1, Infinity, 0.5)).toThrow(/rho/);
    expect(() => ohmicPeakCurrentRatio(0.5, Number.NaN, 0.5)).toThrow(/psi/);
  });
});
