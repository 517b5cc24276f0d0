import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { fitLine } from '../regression';
import { electroactiveAreaFromStandard } from './electroactiveAreaFromStandard';

describe('electroactiveAreaFromStandard', () => {
  // Randles–Ševčík full form (Bard & Faulkner 2nd ed. §6.2): the five pairs were computed for A = 0.0707 cm²,
  // C = 1 mM, D = 7.6e-6 cm²/s (ferricyanide in 1 M KCl, Konopka & McDuffie 1970, from memory).
  it('returns 0.0707 cm² for the tabulated series', () => {
    const v = [0.025, 0.05, 0.1, 0.2, 0.4];
    const ip = [8.2791, 11.7083, 16.5581, 23.4167, 33.1162].map((u) => u * 1e-6);
    const slope = fitLine(v.map(Math.sqrt), ip).slope;
    const a = electroactiveAreaFromStandard({ slopeAPerSqrtVPerS: slope, electronCount: 1, concentrationMolPerCm3: 1e-6, diffusionCm2PerS: 7.6e-6 });
    expect(Math.abs(a / 0.0707 - 1)).toBeLessThan(1e-4);
  });
  it('rejects a zero D', () => {
    expect(() => electroactiveAreaFromStandard({ slopeAPerSqrtVPerS: 1e-5, electronCount: 1, concentrationMolPerCm3: 1e-6, diffusionCm2PerS: 0 })).toThrow(AnalysisError);
  });
});
