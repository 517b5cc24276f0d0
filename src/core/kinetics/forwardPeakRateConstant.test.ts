import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import { analyzeVoltammogram } from '../analysis/analyzeVoltammogram';
import { forwardPeakRateConstant } from './forwardPeakRateConstant';
import { irreversiblePeakPotentials } from './irreversibleRateConstant';

describe('forwardPeakRateConstant', () => {
  // J. Wang, Analytical Electrochemistry 2nd ed. (2000) eq. 2-5 (irreversiblePeakPotentials): the peak it
  // places for k° = 1e-5 cm/s, E°′ = 0.1 V gives back that k°, for a reduction (αc = 0.3) and an
  // oxidation (forward αnₐ = 1 − αc = 0.7).
  it('inverts eq. 2-5 for a reduction and an oxidation', () => {
    const p = irreversiblePeakPotentials({ formalPotentialV: 0.1, k0CmPerS: 1e-5, scanRateVPerS: 0.2, diffusionOxCm2PerS: 1e-5, diffusionRedCm2PerS: 6e-6 }, { alpha: 0.3 });
    const common = { formalPotentialV: 0.1, scanRateVPerS: 0.2 };
    expect(forwardPeakRateConstant({ ...common, forwardPeakV: p.epcV, forwardDirection: 'cathodic', diffusionCm2PerS: 1e-5 }, { forwardAlphaNa: 0.3 })).toBeCloseTo(1e-5, 15);
    expect(forwardPeakRateConstant({ ...common, forwardPeakV: p.epaV, forwardDirection: 'anodic', diffusionCm2PerS: 6e-6 }, { forwardAlphaNa: 0.7 })).toBeCloseTo(1e-5, 15);
  });

  // Same equation (Bard & Faulkner 2nd ed. §6.3: k° from Ep when E°′ is known) on this project's
  // simulator (validated against the 0.4958 current function): a totally irreversible reduction,
  // k° = 1e-4 cm/s, αc = 0.4, E°′ = 0, located Ep on a 2 mV grid with noise: k° within 3 %.
  it('recovers k° of a simulated irreversible reduction from its forward peak within 3 %', () => {
    const v = simulatedVoltammogram({ k0CmPerS: 1e-4, alpha: 0.4, scanRateVPerS: 0.1, startV: 0.6, switchV: -0.9, stepV: 0.002 }, { noiseA: 2e-9, seed: 4 });
    const c = analyzeVoltammogram(v).cycles[0]!.couples[0]!;
    const k0 = forwardPeakRateConstant({ forwardPeakV: c.epcV!, forwardDirection: 'cathodic', formalPotentialV: 0, scanRateVPerS: 0.1, diffusionCm2PerS: 1e-5 }, { forwardAlphaNa: 0.4 });
    expect(Math.abs(k0 / 1e-4 - 1)).toBeLessThan(0.03);
  });

  it('refuses a forward peak on the wrong side of E°′ and bad input', () => {
    const base = { forwardPeakV: 0.05, forwardDirection: 'cathodic' as const, formalPotentialV: 0, scanRateVPerS: 0.1, diffusionCm2PerS: 1e-5 };
    expect(() => forwardPeakRateConstant(base)).toThrow(AnalysisError);
    expect(() => forwardPeakRateConstant({ ...base, forwardPeakV: Number.NaN })).toThrow(/forwardPeakV/);
    expect(() => forwardPeakRateConstant({ ...base, forwardPeakV: -0.3 }, { forwardAlphaNa: 0 })).toThrow(/forwardAlphaNa/);
  });
});
