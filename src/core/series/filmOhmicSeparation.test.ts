import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { FARADAY_C_PER_MOL, thermalVoltageV } from '../constants';
import { filmResistanceFromSeparation, nernstianFilmOhmicSeparation } from './filmOhmicSeparation';

describe('nernstianFilmOhmicSeparation', () => {
  // Hand-worked first order in Ru (derived in the file's header from i = v·g(E − i·Ru)·(1 − Ru·di/dE)):
  // each peak moves by 2·ip·Ru, so nFΔEp/RT → 4ρ as ρ → 0.
  it('small ρ: separation 4ρ within 0.5 %', () => {
    expect(Math.abs(nernstianFilmOhmicSeparation(0.02) / 0.08 - 1)).toBeLessThan(5e-3);
  });
  // Identity: the drop can never move the two peaks apart by more than 4ρ (the first-order share),
  // and the separation grows with ρ.
  it('grows with ρ and stays below 4ρ', () => {
    const rhos = [0.05, 0.3, 1, 3, 10, 30];
    const seps = rhos.map(nernstianFilmOhmicSeparation);
    seps.forEach((s, i) => {
      expect(s).toBeLessThan(4 * rhos[i]!);
      if (i) expect(s).toBeGreaterThan(seps[i - 1]!);
    });
  });
  it('rejects ρ < 0 and ρ beyond the table', () => {
    expect(() => nernstianFilmOhmicSeparation(-1)).toThrow(AnalysisError);
    expect(() => nernstianFilmOhmicSeparation(100)).toThrow(AnalysisError);
  });
});

describe('filmResistanceFromSeparation', () => {
  // Round trip through the definition ρ = ip,N·Ru·nF/RT with ip,N = nFQv/(4RT) (Laviron 1974, Q = nFAΓ).
  it('the ΔEp of ρ = 2 gives back its Ru', () => {
    const rt = thermalVoltageV(298.15);
    const q = FARADAY_C_PER_MOL * 0.2 * 4e-10;
    const v = 5;
    const ipN = (q * v) / (4 * rt);
    const ru = (2 * rt) / ipN;
    const got = filmResistanceFromSeparation({ deltaEpV: nernstianFilmOhmicSeparation(2) * rt, chargeC: q, scanRateVPerS: v, electronCount: 1 });
    expect(Math.abs(got! / ru - 1)).toBeLessThan(1e-3);
  });
  it('null beyond the table; rejects a zero charge', () => {
    expect(filmResistanceFromSeparation({ deltaEpV: 5, chargeC: 1e-6, scanRateVPerS: 1, electronCount: 1 })).toBeNull();
    expect(() => filmResistanceFromSeparation({ deltaEpV: 0.1, chargeC: 0, scanRateVPerS: 1, electronCount: 1 })).toThrow(AnalysisError);
  });
});
