/**
 * Several couples at one electrode: superposition without ohmic drop, one interfacial potential
 * and one charging current for the sum with it, and fixed grids.
 */
import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { simulateCv } from './simulateCv';
import { automaticGrid, simulateCvCouples } from './simulateCvCouples';
import { DEFAULT_SIMULATION } from './simulationTypes';

const cell = { startV: 0.4, switchV: -0.4, stepV: 0.002, scanRateVPerS: 0.2 };
const first = { formalPotentialV: 0.075, k0CmPerS: 0.02, diffusionOCm2PerS: 8e-6, diffusionRCm2PerS: 8e-6 };
const second = { formalPotentialV: -0.075, k0CmPerS: 0.5, alpha: 0.4, concentrationOMolPerCm3: 2e-6 };

describe('simulateCvCouples', () => {
  // Linear diffusion equations with independent species: the faradaic currents superpose
  // (Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001), §6.6 on multicomponent systems, from memory).
  it('without R_u and C_dl the current is the sum of the couples simulated alone (to 1e-12 of ip)', () => {
    const both = simulateCvCouples(cell, [first, second]);
    const a = simulateCv({ ...cell, ...first });
    const b = simulateCv({ ...cell, ...second });
    const scale = Math.max(...Array.from(both.currentA, Math.abs));
    for (let k = 0; k < both.currentA.length; k++) {
      expect(Math.abs((both.currentA[k] as number) - (a.currentA[k] as number) - (b.currentA[k] as number))).toBeLessThan(1e-12 * scale);
    }
    expect(both.coupleNumerics).toHaveLength(2);
  });

  // Bard & Faulkner 2nd ed. §1.2 (from memory): a blank electrode draws A·C_d·v however many
  // couples share it, so the charging current is counted once.
  it('charging is counted once: two blank couples draw ±A·Cdl·v like one', () => {
    const blank = { concentrationOMolPerCm3: 0, concentrationRMolPerCm3: 0 };
    const r = simulateCvCouples({ ...cell, doubleLayerFPerCm2: 20e-6, uncompensatedOhm: 200 }, [blank, blank]);
    const quarter = Math.round((r.currentA.length - 1) / 4);
    expect(r.currentA[quarter] as number).toBeCloseTo(-DEFAULT_SIMULATION.areaCm2 * 20e-6 * 0.2, 12);
  });

  // Series R_u with the interface (Bard & Faulkner 2nd ed. §1.3, from memory): E_applied = E_int + i·R_u
  // with i the total of all couples and the charging current.
  it('with R_u the applied potential is the interfacial potential plus the total current times R_u (to 1 nV)', () => {
    const ru = 300;
    const r = simulateCvCouples({ ...cell, doubleLayerFPerCm2: 20e-6, uncompensatedOhm: ru }, [first, second]);
    for (let k = 1; k < r.currentA.length; k++) {
      expect(Math.abs((r.potentialV[k] as number) - (r.interfacialPotentialV[k] as number) - (r.currentA[k] as number) * ru)).toBeLessThan(1e-9);
    }
    // The drop shifts both waves: not the same as adding two couples that each carry their own drop.
    const a = simulateCv({ ...cell, ...first, uncompensatedOhm: ru });
    const b = simulateCv({ ...cell, ...second, uncompensatedOhm: ru });
    const noCdl = simulateCvCouples({ ...cell, uncompensatedOhm: ru }, [first, second]);
    let gap = 0;
    for (let k = 0; k < noCdl.currentA.length; k++) gap = Math.max(gap, Math.abs((noCdl.currentA[k] as number) - (a.currentA[k] as number) - (b.currentA[k] as number)));
    expect(gap).toBeGreaterThan(1e-8);
  });

  it('a fixed grid equal to the automatic one gives the same voltammogram; a bad one is refused', () => {
    const input = { ...DEFAULT_SIMULATION, ...cell, ...first };
    const totalTimeS = (2 * 0.8) / 0.2;
    const grid = automaticGrid(input, {}, totalTimeS);
    const fixed = simulateCv(input, { fixedGrids: [grid] });
    const auto = simulateCv(input);
    expect(Array.from(fixed.currentA)).toEqual(Array.from(auto.currentA));
    expect(() => simulateCv(input, { fixedGrids: [{ firstSpacingCm: 1e-4, outerEdgeCm: 1e-5 }] })).toThrow(/fixedGrids\[0\]\.outerEdgeCm/);
  });

  it('refuses an empty list of couples', () => {
    expect(() => simulateCvCouples(cell, [])).toThrow(AnalysisError);
  });
});

describe('simulateCv firstSweepOnly', () => {
  // A property of the method, no external source: the time loop is causal and the grid is the whole
  // waveform's, so the first sweep run alone must reproduce the full run's first sweep exactly.
  it('gives exactly the first sweep of the full run', () => {
    const input = { mechanism: 'E' as const, k0CmPerS: 0.01, alpha: 0.4, startV: 0.4, switchV: -0.4, stepV: 0.002, scanRateVPerS: 0.5, cycles: 2 };
    const full = simulateCv(input);
    const first = simulateCv(input, { firstSweepOnly: true });
    expect(first.potentialV.length).toBe(401);
    expect(first.potentialV[400]).toBeCloseTo(-0.4, 12);
    for (let k = 0; k < first.currentA.length; k++) expect(first.currentA[k]).toBe(full.currentA[k]);
  });
});
