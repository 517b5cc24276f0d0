/**
 * k_s, its status and E°′ of a film, and the checks that tell slow kinetics from an uncompensated
 * resistance, on film series simulated with this project's simulator (surface mechanism with Ru,
 * validated against Laviron's peak lines in simulateCv.surface.test.ts); the simulator's inputs
 * (k_s, αc, E°′, Ru) are the expected values.
 * Sources: E. Laviron, J. Electroanal. Chem. 101, 19 (1979) (from memory): ΔEp is a function of
 *   m = (RT/nF)k_s/v and αc alone; beyond n·ΔEp = 200 mV Epc = E°′ − (RT/αnF)ln(αnFv/RTk_s) and
 *   Epa = E°′ + (RT/(1−α)nF)ln((1−α)nFv/RTk_s), so E°′ = αEpc + (1−α)Epa − (RT/nF)ln((1−α)/α), and
 *   the two Ep–log v slopes satisfy 1/|s_c| + 1/s_a = nF/(2.303RT).
 */
import { describe, expect, it } from 'vitest';
import { thermalVoltageV } from '../constants';
import { analyseSimulatedSeries } from './simulatedSeries';

const film = (alpha: number, ks: number, extra: Record<string, number> = {}) => ({
  mechanism: 'surface' as const, surfaceRatePerS: ks, coverageMolPerCm2: 1.5e-10, alpha, formalPotentialV: 0, areaCm2: 0.0314, startV: 0.7, switchV: -1.0, stepV: 0.001, ...extra,
});
const cell = { areaCm2: 0.0314 };

describe('k_s of a film on Laviron\'s working curve', () => {
  // Laviron 1979: ΔEp(m, α) for every m; between the Nernstian and the 200 mV regime too.
  it('k_s = 10 1/s, αc = 0.5, n·ΔEp 15–150 mV (no file past 200 mV): k_s within 1 %, an estimate over αc 0.3–0.7', () => {
    const { couple } = analyseSimulatedSeries(film(0.5, 10), [0.1, 0.2, 0.5, 1, 2], cell, { noiseA: 1e-10 });
    const s = couple.surface!;
    expect(Math.abs(s.ksPerS! / 10 - 1)).toBeLessThan(0.01);
    expect(s.ksStatus).toBe('estimate');
    expect(s.ksAlphaSource).toBe('assumed');
    expect(s.ksRangePerS![0]).toBeLessThan(10);
    expect(s.ksRangePerS![1]).toBeGreaterThan(9.9);
    expect(s.ksNote).toMatch(/0\.5 assumed/);
    // Every file's ip lies more than 1 % below the Nernstian one (Laviron's ψ at its m): no Nernstian slope Γ.
    expect(s.coverageFromSlopeForm).not.toBe('nernstian');
    expect(Math.abs(s.coverageFromChargeMolPerCm2! / 1.5e-10 - 1)).toBeLessThan(0.01);
  });

  // Laviron 1979: k_s is smallest at α = 0.5 for a given ΔEp; a true αc = 0.3 lies in the range.
  it('k_s = 10 1/s, αc = 0.3, one file past 200 mV: the range over αc 0.3–0.7 holds 10 1/s', () => {
    const { couple } = analyseSimulatedSeries(film(0.3, 10), [0.5, 1, 2, 5], cell, { noiseA: 1e-10 });
    const s = couple.surface!;
    expect(s.lavironAlpha).toBeNull();
    expect(s.ksStatus).toBe('estimate');
    expect(s.ksRangePerS![0]).toBeLessThan(10);
    expect(s.ksRangePerS![1]).toBeGreaterThan(10);
  });

  // Laviron 1979: his E°′ from the two peak lines, at the widest file, and the measured αc.
  it('αc = 0.3 measured from the lines: k_s within 1 %, E°′ within 1 mV of the simulated 0 V and of Laviron\'s two-line formula', () => {
    const { couple } = analyseSimulatedSeries(film(0.3, 10, { startV: 0.8, switchV: -1.2 }), [2, 5, 10, 20, 50], cell, { noiseA: 1e-10 });
    const s = couple.surface!;
    expect(Math.abs(s.lavironAlpha! - 0.3)).toBeLessThan(0.01);
    expect(s.ksStatus).toBe('value');
    expect(Math.abs(s.ksPerS! / 10 - 1)).toBeLessThan(0.01);
    expect(Math.abs(s.formalPotentialV!)).toBeLessThan(0.001);
    const wide = couple.points.reduce((a, p) => (p.deltaEpV! > a.deltaEpV! ? p : a));
    const a = s.lavironAlpha!;
    const twoLines = a * wide.epcV! + (1 - a) * wide.epaV! - thermalVoltageV(298.15) * Math.log((1 - a) / a);
    expect(Math.abs(s.formalPotentialV! - twoLines)).toBeLessThan(0.001);
    expect(couple.eHalfMeaning).toMatch(/E°′ = /);
  });
});

describe('ohmic drop on a film is not read as Laviron kinetics', () => {
  const nernstian = { mechanism: 'surface' as const, surfaceRatePerS: Infinity, coverageMolPerCm2: 4e-10, formalPotentialV: 0, startV: 0.6, switchV: -0.6, stepV: 0.001 };
  const big = { areaCm2: 0.2 };

  // Laviron 1979: 1/|s_c| + 1/s_a = nF/(2.303RT); an ohmic drop gives ΔEp ∝ ip·Ru ∝ v, which breaks it.
  it('Nernstian film with Ru = 150 Ω, 0.5–20 V/s, no Ru given: k_s cannot be told, Ru named within 10 %', () => {
    const { couple, warnings } = analyseSimulatedSeries({ ...nernstian, areaCm2: 0.2, uncompensatedOhm: 150 }, [0.5, 1, 2, 5, 10, 20], big, { noiseA: 1e-9 });
    const s = couple.surface!;
    expect(s.ksStatus).toBe('cannot-tell');
    expect(s.ksPerS).toBeNull();
    expect(s.lavironAlpha).toBeNull();
    expect(Math.abs(s.lavironApparentElectronCount! - 1)).toBeGreaterThan(0.15);
    expect(Math.abs(s.ohmicRuOhm! / 150 - 1)).toBeLessThan(0.1);
    expect(s.ksNote).toMatch(/uncompensated resistance/);
    expect(couple.verdict.label).toMatch(/cannot tell/);
    expect(warnings.join(' ')).toMatch(/uncompensated resistance\?/);
  });

  // Same film, Ru given: a correction afterwards leaves part of the drop (the interface was swept
  // unevenly), so what is left is no measure of k_s: a lower bound only.
  it('the same film with --ru 150: k_s a lower bound, not a value', () => {
    const { couple } = analyseSimulatedSeries({ ...nernstian, areaCm2: 0.2, uncompensatedOhm: 150 }, [0.5, 2, 5, 20], { ...big, ruOhm: 150 }, { noiseA: 1e-9 });
    expect(couple.surface!.ksStatus).toBe('lower-bound');
    expect(couple.surface!.ksPerS).toBeNull();
  });

  // Laviron 1974: a Nernstian film has ΔEp = 0; below 5 mV nothing is read from ΔEp.
  it('Nernstian film without Ru: k_s only a lower bound', () => {
    const { couple } = analyseSimulatedSeries({ ...nernstian, coverageMolPerCm2: 1e-10 }, [0.05, 0.2, 1], cell, { noiseA: 1e-10 });
    expect(couple.surface!.ksStatus).toBe('lower-bound');
    expect(couple.surface!.ksLowerBoundPerS).toBeGreaterThan(100);
    expect(couple.surface!.coverageFromSlopeForm).toBe('nernstian');
  });

  // Laviron 1979: near the Nernstian end k_s varies about as 1/ΔEp, so the few-mV ΔEp of the slow
  // files, located to a few points on a noisy peak, scatter k_s widely; they must not turn a
  // Laviron film into "cannot tell" (a 2 mV step and 1 % noise at 0.1 V/s, as in a real film).
  it.each([1, 2, 3, 4, 5, 6])('k_s = 25 1/s with noisy slow files (n·ΔEp 6–12 mV among them), noise seed %i: a value within 5 %, not "cannot tell"', (seed) => {
    const truth = { ...film(0.5, 25), coverageMolPerCm2: 6e-11, startV: -0.05, switchV: 0.65, formalPotentialV: 0.28, stepV: 0.002, doubleLayerFPerCm2: 4e-6, uncompensatedOhm: 60 };
    const { couple } = analyseSimulatedSeries(truth, [0.1, 0.2, 0.5, 1, 2, 5, 10, 20], cell, { noiseA: 3e-9, seed: 10 * seed });
    const s = couple.surface!;
    expect(s.ksStatus).toBe('value');
    expect(Math.abs(s.ksPerS! / 25 - 1)).toBeLessThan(0.05);
    expect(Math.abs(s.lavironAlpha! - 0.5)).toBeLessThan(0.02);
  });
});
