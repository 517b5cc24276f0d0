import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { RANDLES_SEVCIK_IRREVERSIBLE, RANDLES_SEVCIK_REVERSIBLE } from '../series/randlesSevcik';
import { kineticPeakCurrentRatio } from './kineticPeakCurrentRatio';

describe('kineticPeakCurrentRatio', () => {
  // Matsuda & Ayabe 1955 (from memory): the ratio tends to 1 for fast kinetics (large ψ).
  it('is 1 for a fast couple', () => {
    expect(kineticPeakCurrentRatio(50, 0.5)).toBeCloseTo(1, 2);
  });
  // Bard & Faulkner 2nd ed. §6.2 and §6.3 (0.4958 from memory): the totally irreversible limit is
  // (0.4958/0.4463)·α^½ = 0.7855 for α = 0.5.
  it('tends to the irreversible limit 0.7855 for small ψ', () => {
    const limit = (RANDLES_SEVCIK_IRREVERSIBLE / RANDLES_SEVCIK_REVERSIBLE) * Math.sqrt(0.5);
    expect(Math.abs(kineticPeakCurrentRatio(0.005, 0.5) / limit - 1)).toBeLessThan(0.01);
  });
  it('falls monotonically with ψ', () => {
    const values = [7, 1, 0.35, 0.1].map((p) => kineticPeakCurrentRatio(p, 0.5));
    for (let k = 1; k < values.length; k++) expect(values[k]).toBeLessThan(values[k - 1] as number);
  });
  it('rejects bad input', () => {
    expect(() => kineticPeakCurrentRatio(0, 0.5)).toThrow(AnalysisError);
    expect(() => kineticPeakCurrentRatio(1, 1)).toThrow(/alpha/);
  });
});
