import { describe, expect, it } from 'vitest';
import { FARADAY_C_PER_MOL as F } from '../constants';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import { analyzeVoltammogram } from '../analysis/analyzeVoltammogram';

const A = 0.0707;
const gamma = 1e-10;
const film = { mechanism: 'surface' as const, areaCm2: A, coverageMolPerCm2: gamma, doubleLayerFPerCm2: 20e-6, stepV: 0.002 };

describe('return-peak baseline of a surface-confined film with double-layer charging (simulator)', () => {
  // Faraday's law Q = nFAΓ = 0.6822 µC (computed, CODATA 2018 F; Bard & Faulkner 2nd ed.
  // §14.3); i_c = A·C_d·v changes sign at the switch (B&F §1.2, from memory). Tolerance 3 %: the pre-peak
  // windows start 0.3–0.4 V from E°′, where the wave's foot is still 0.1–1 % of its peak.
  it.each([
    ['Nernstian, 0.1 V/s, −0.4 → 0.4 V', { surfaceRatePerS: 1000, scanRateVPerS: 0.1, startV: -0.4, switchV: 0.4 }],
    ['Nernstian, 0.1 V/s, 0.4 → −0.4 V', { surfaceRatePerS: 1000, scanRateVPerS: 0.1, startV: 0.4, switchV: -0.4 }],
    ['Nernstian, switch only 0.2 V past E°′', { surfaceRatePerS: 1000, scanRateVPerS: 0.1, startV: -0.4, switchV: 0.2 }],
    ['k_s = 25 s⁻¹ at 1 V/s, −0.3 → 0.5 V', { surfaceRatePerS: 25, scanRateVPerS: 1, startV: -0.3, switchV: 0.5 }],
    ['k_s = 25 s⁻¹ at 5 V/s (Laviron, ΔEp ≈ 150 mV)', { surfaceRatePerS: 25, scanRateVPerS: 5, startV: -0.5, switchV: 0.5 }],
  ])('%s: anodic and cathodic charge within 3 per cent of nFAΓ', (_, run) => {
    const q = F * A * gamma;
    const a = analyzeVoltammogram(simulatedVoltammogram({ ...film, ...run }, { noiseA: 2e-9, seed: 11 }));
    const c = a.cycles[0]!.couples[0]!;
    expect(Math.abs(c.anodicChargeC! / q - 1)).toBeLessThan(0.03);
    expect(Math.abs(c.cathodicChargeC! / q - 1)).toBeLessThan(0.03);
    const ret = a.cycles[0]!.peaks.find((p) => !p.onFirstSweep)!;
    expect(ret.baseline.method).toBe('linear');
  });
});
