import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { nicholsonRateConstant } from './nicholsonRateConstant';

const base = { psi: 1, diffusionOxCm2PerS: 7.6e-6, scanRateVPerS: 0.1, electronCount: 1 };

describe('nicholsonRateConstant', () => {
  // Nicholson, Anal. Chem. 37, 1351 (1965), ψ definition (from memory); worked example, computed:
  // ψ = 1, D = 7.6e-6 cm²/s, 0.1 V/s, α = 0.5 → k° = 9.640e-3 cm/s.
  it('k° = 9.640e-3 cm/s for ψ = 1', () => {
    expect(Math.abs(nicholsonRateConstant(base) / 9.64e-3 - 1)).toBeLessThan(1e-3);
  });
  // Same source, D_R = 6.3e-6: (D_R/D_O)^(α/2) factor → 9.198e-3 cm/s.
  it('includes the diffusion-ratio factor: 9.198e-3 cm/s', () => {
    expect(Math.abs(nicholsonRateConstant({ ...base, diffusionRedCm2PerS: 6.3e-6 }) / 9.198e-3 - 1)).toBeLessThan(1e-3);
  });
  // Lavagnini fit ψ = 1.0570 at 84 mV → k° = 1.0190e-2 cm/s (Lavagnini et al. 2004, from memory; computed).
  it('k° = 1.0190e-2 cm/s with the fit value of ψ', () => {
    expect(Math.abs(nicholsonRateConstant({ ...base, psi: 1.057 }) / 1.019e-2 - 1)).toBeLessThan(1e-3);
  });
  it('rejects a non-positive ψ or D', () => {
    expect(() => nicholsonRateConstant({ ...base, psi: 0 })).toThrow(AnalysisError);
    expect(() => nicholsonRateConstant({ ...base, diffusionOxCm2PerS: Number.NaN })).toThrow(/diffusionOxCm2PerS/);
  });
});
