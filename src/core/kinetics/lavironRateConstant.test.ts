import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { lavironPeakPotentials, lavironRateConstant, lavironTransferCoefficient } from './lavironRateConstant';
import { thermalVoltageV } from '../constants';

describe('lavironRateConstant', () => {
  // Laviron, J. Electroanal. Chem. 101, 19 (1979) (from memory), worked example computed from it:
  // α = 0.5, n = 1, v = 10 V/s, ΔEp = 300 mV → k_s = 10.51 s⁻¹.
  it('k_s = 10.51 s⁻¹ for the worked example', () => {
    const ks = lavironRateConstant({ deltaEpV: 0.3, scanRateVPerS: 10, electronCount: 1 });
    expect(Math.abs(ks / 10.51 - 1)).toBeLessThan(5e-3);
  });
  // Same source: back-substituting k_s into the two Ep lines gives ΔEp = 300.0 mV, ±150 mV about E°′.
  it('round trip through the Ep lines returns ΔEp = 300 mV', () => {
    const ks = lavironRateConstant({ deltaEpV: 0.3, scanRateVPerS: 10, electronCount: 1 });
    const { epaV, epcV } = lavironPeakPotentials({ formalPotentialV: 0.2, rateConstantPerS: ks, scanRateVPerS: 10, electronCount: 1 });
    expect((epaV - epcV) * 1000).toBeCloseTo(300, 6);
    expect((epaV - 0.2) * 1000).toBeCloseTo(150, 6);
  });
  it('round trip holds for α ≠ 0.5 and n = 2', () => {
    const opts = { alpha: 0.35, temperatureK: 310 };
    const p = lavironPeakPotentials({ formalPotentialV: 0, rateConstantPerS: 3, scanRateVPerS: 50, electronCount: 2 }, opts);
    expect(lavironRateConstant({ deltaEpV: p.epaV - p.epcV, scanRateVPerS: 50, electronCount: 2 }, opts)).toBeCloseTo(3, 8);
  });
  // Laviron (1979), from memory: the expression must not be used below 200/n mV.
  it('refuses n·ΔEp ≤ 200 mV', () => {
    expect(() => lavironRateConstant({ deltaEpV: 0.15, scanRateVPerS: 1, electronCount: 1 })).toThrow(AnalysisError);
    expect(() => lavironRateConstant({ deltaEpV: 0.15, scanRateVPerS: 1, electronCount: 1 })).toThrow(/200 mV/);
  });
});

describe('lavironTransferCoefficient', () => {
  // Laviron 1979 (from memory): slopes 2.303RT/((1−α)nF) and −2.303RT/(αnF).
  it('recovers α = 0.3 from the two slopes', () => {
    const b = Math.LN10 * thermalVoltageV(298.15);
    expect(lavironTransferCoefficient(b / 0.7, -b / 0.3)).toBeCloseTo(0.3, 12);
  });
  it('rejects slopes of the wrong sign', () => {
    expect(() => lavironTransferCoefficient(-0.1, -0.1)).toThrow(AnalysisError);
  });
});
