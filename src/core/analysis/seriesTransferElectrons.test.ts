/**
 * nₐ not given for n > 1, per-file k° that drift with scan rate, and E°′ where αc is only assumed:
 * scan-rate series simulated with this project's simulator (a one-step n-electron couple, so the
 * true nₐ = n; validated against the 0.4958 and 0.4463 current functions and Nicholson's table),
 * analysed as a user would.
 * Sources: the forward wave of a totally irreversible couple fixes only αnₐ, Ep shifting by
 * 29.6/(αnₐ) mV per decade (J. Wang, Analytical Electrochemistry 2nd ed. (2000) eq. 2-5; Bard &
 * Faulkner 2nd ed. (2001) §6.3); the return wave runs with (1 − αc)·nₐ (Guidelli et al., Pure Appl.
 * Chem. 86, 245 (2014), from memory), so a wrong nₐ makes the return-peak k° drift with v.
 */
import { describe, expect, it } from 'vitest';
import { analyseSimulatedSeries } from './simulatedSeries';

const cell = { areaCm2: 0.0707, concentrationMolPerCm3: 1e-6 };
const rel = (x: number | null | undefined, truth: number) => Math.abs((x ?? NaN) / truth - 1);
const inRange = (r: [number, number] | null | undefined, truth: number) => !!r && r[0] <= truth && truth <= r[1];

describe('n = 2, αc = 0.4, k° = 1e-5 cm/s, totally irreversible, E°′ = 0', () => {
  // αnₐ = 0.8 from the forward wave: with nₐ = 1 it reads αc = 0.8, and the return-peak k° (and E°′)
  // come out wrong and drift with v; with nₐ = 2, αc = 0.4 and k° is steady.
  const sim = { k0CmPerS: 1e-5, alpha: 0.4, electronCount: 2, startV: 0.5, switchV: -0.9, stepV: 0.002, diffusionOCm2PerS: 1e-5, diffusionRCm2PerS: 1e-5 };
  const rates = [0.05, 0.2, 0.5, 2];

  it('nₐ not given: k° cannot be told, its range and E°′\'s hold the truth, and nₐ = 2 is named as the steady one', () => {
    const { couple } = analyseSimulatedSeries(sim, rates, { ...cell, electronCount: 2 });
    const k = couple.rateConstant!;
    expect(k.status).toBe('cannot-tell');
    expect(k.k0CmPerS).toBeNull();
    expect(k.reason).toMatch(/nₐ was not given/);
    expect(k.reason).toMatch(/nₐ = 1: the per-file k° drifts/);
    expect(k.reason).toMatch(/Only nₐ = 2 gives one k°/);
    expect(inRange(k.rangeCmPerS, 1e-5)).toBe(true);
    expect(k.formalPotentialV ?? null).toBeNull();
    expect(inRange(k.formalPotentialRangeV, 0)).toBe(true);
  });

  it('nₐ = 2 given: k° within 5 % and E°′ within 3 mV', () => {
    const { couple } = analyseSimulatedSeries(sim, rates, { ...cell, electronCount: 2, transferElectronCount: 2 });
    const k = couple.rateConstant!;
    expect(k.status).toBe('value');
    expect(rel(k.k0CmPerS, 1e-5)).toBeLessThan(0.05);
    expect(Math.abs(k.formalPotentialV!)).toBeLessThan(0.003);
  });

  // The same wrong nₐ given on purpose: no nₐ to range over, so the drift itself must show.
  it('nₐ = 1 given (wrong): the per-file k° drift is flagged, with no median', () => {
    const { couple } = analyseSimulatedSeries(sim, rates, { ...cell, electronCount: 2, transferElectronCount: 1 });
    const k = couple.rateConstant!;
    expect(k.status).toBe('cannot-tell');
    expect(k.k0CmPerS).toBeNull();
    expect(k.driftFold!).toBeGreaterThan(1.5);
    expect(k.reason).toMatch(/drifts .*-fold with scan rate/);
  });
});

describe('E°′ where αc is only assumed', () => {
  // αc = 0.35, k° = 0.005 cm/s, E°′ = 0, reduction first, 0.01–10 V/s: the slowest file is near the
  // reversible end, the fastest beyond Nicholson's table (Anal. Chem. 37, 1351 (1965)). E°′ from the
  // return peaks at the assumed αc = 0.5 was 30 mV off; the E½ of the slowest file bounds it (its
  // midpoint moves at most half its widening, Nicholson 1965; Bard & Faulkner eq. 6.2.4 for E½).
  const { couple } = analyseSimulatedSeries({ k0CmPerS: 0.005, alpha: 0.35, startV: 0.5, switchV: -0.7, stepV: 0.002 }, [0.01, 0.1, 1, 10], cell);
  const k = couple.rateConstant!;

  it('E°′ within 5 mV of the truth, its range holds it, and the text says which estimate is used', () => {
    expect(couple.transferCoefficient?.source).toBe('assumed');
    expect(Math.abs(k.formalPotentialV!)).toBeLessThan(0.005);
    expect(inRange(k.formalPotentialRangeV, 0)).toBe(true);
    expect(k.formalPotentialSource).toMatch(/from E½ of .*nearest reversibility/);
    expect(couple.eHalfMeaning).toMatch(/from the E½ of the file nearest reversibility/);
  });

  it('each return-peak file gives E°′ over αc 0.3–0.7, a range that holds the truth', () => {
    const beyond = k.perFile.filter((f) => f.method === 'irreversible');
    expect(beyond.length).toBeGreaterThan(0);
    for (const f of beyond) expect(inRange(f.formalPotentialRangeV, 0)).toBe(true);
  });
});
