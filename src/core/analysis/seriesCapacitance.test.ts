/**
 * The double-layer capacitance of a series read beside an adsorbed film and in noise, on data from
 * this project's simulator (src/core/simulation; its surface wave is tied to Laviron 1974 by its
 * own tests) in scenarios of our own.
 */
import { describe, expect, it } from 'vitest';
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, STANDARD_TEMPERATURE_K } from '../constants';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import type { CvSimulationInput } from '../simulation';
import { analyzeRun } from './analyzeRun';
import { DEFAULT_SERIES_KEY } from './resolveRun';

const AREA = 0.05;
const CD = 40e-6;
const GAMMA = 5e-11;

function series(sim: Partial<CvSimulationInput>, rates: number[], at: number, noiseA = 0) {
  const files = rates.map((v, i) => ({
    fileName: `film-${v}.csv`,
    voltammogram: simulatedVoltammogram({ ...sim, scanRateVPerS: v, doubleLayerFPerCm2: CD, areaCm2: AREA }, { noiseA, seed: 31 + i }),
  }));
  return analyzeRun({ files, cells: { [DEFAULT_SERIES_KEY]: { areaCm2: AREA, capacitancePotentialV: at } }, report: {} }).series[0]!;
}

describe('seriesCapacitance', () => {
  const film = { mechanism: 'surface' as const, coverageMolPerCm2: GAMMA, surfaceRatePerS: Infinity, startV: 0.4, switchV: -0.4 };
  // Laviron, J. Electroanal. Chem. 52 (1974) 355 (Bard & Faulkner 2nd ed. §14.3): a Nernstian film
  // carries i = (F²AvΓ/RT)·θ/(1+θ)², θ = e^{F(E−E°′)/RT}, on both sweeps; 100 mV from E°′ that is
  // (F²Γ/RT)·θ/(1+θ)² = 3.68 µF/cm² of apparent capacitance beside 40, ∝ v like the charging.
  it('takes a Nernstian film\'s own current off a reading 100 mV from its wave', () => {
    const f = FARADAY_C_PER_MOL / (GAS_CONSTANT_J_PER_MOL_K * STANDARD_TEMPERATURE_K);
    const theta = Math.exp(f * 0.1);
    const excess = FARADAY_C_PER_MOL * f * GAMMA * theta / (1 + theta) ** 2;
    expect(excess / CD).toBeGreaterThan(0.08);
    const s = series(film, [0.01, 0.1, 1], 0.1);
    const cd = s.capacitance!;
    expect(cd.status).toBe('value');
    expect(Math.abs(cd.capacitanceFPerCm2! / CD - 1)).toBeLessThan(0.01);
    const [lo, hi] = cd.capacitanceIntervalFPerCm2!;
    expect(lo).toBeLessThan(CD);
    expect(hi).toBeGreaterThan(CD);
    // The interval is honest about the film's shape, not a zero width; nor so wide as the excess.
    expect(hi - lo).toBeGreaterThan(1e-3 * CD);
    expect(hi - lo).toBeLessThan(excess);
    expect(s.warnings.some((w) => /Nernstian film/.test(w.message) && /taken off/.test(w.message))).toBe(true);
  });
  // Bard & Faulkner §1.2: a blank's gap is 2·A·Cd·v; with Cd = 0.5 µF/cm² under noise of about the
  // charging current itself, no capacitance can be told: a bound, never a negative value.
  it('gives an upper bound, not a value, when noise swamps the charging current', () => {
    const blank = { mechanism: 'E' as const, concentrationOMolPerCm3: 0, concentrationRMolPerCm3: 0, startV: 0, switchV: 0.8 };
    const files = [0.02, 0.05, 0.1, 0.2].map((v, i) => ({
      fileName: `blank-${v}.csv`,
      voltammogram: simulatedVoltammogram({ ...blank, scanRateVPerS: v, doubleLayerFPerCm2: 0.5e-6, areaCm2: AREA }, { noiseA: 3 * AREA * 0.5e-6 * 0.2, seed: 7 + i }),
    }));
    const s = analyzeRun({ files, cells: { [DEFAULT_SERIES_KEY]: { areaCm2: AREA, capacitancePotentialV: 0.4 } }, report: {} }).series[0]!;
    const cd = s.capacitance!;
    expect(cd.status).not.toBe('value');
    expect(cd.capacitanceFPerCm2).toBeNull();
    if (cd.status === 'upper-bound') expect(cd.upperBoundFPerCm2!).toBeGreaterThan(0.5e-6);
    expect(cd.capacitanceIntervalFPerCm2![0]).toBeLessThan(0.5e-6);
  });
});
