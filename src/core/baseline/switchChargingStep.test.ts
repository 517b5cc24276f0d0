/**
 * The charging step at a switch, told apart from the faradaic current's kink there: a hand-made
 * case, then this project's simulator against Nicholson's empirical ratio (Anal. Chem. 38 (1966)
 * 1406), which is 1 for a reversible couple at any switching potential.
 */
import { describe, expect, it } from 'vitest';
import { switchChargingStep } from './switchChargingStep';
import { analyzeVoltammogram } from '../analysis/analyzeVoltammogram';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';

describe('switchChargingStep', () => {
  // Hand-made: a forward line, then a step of −2 µA and a √τ departure (the semi-derivative of a kink, 2√(τ/π)).
  it('recovers a 2 µA step under a √τ kink exactly', () => {
    const n = 41;
    const v = 20;
    const timeS = Float64Array.from({ length: n }, (_, k) => k * 0.01);
    const potentialV = Float64Array.from({ length: n }, (_, k) => 0.1 - 0.001 * (v - Math.abs(k - v)));
    const currentA = Float64Array.from({ length: n }, (_, k) => {
      const tau = (k - v) * 0.01;
      return k <= v ? -10e-6 + 5e-6 * tau : -8e-6 + 3e-6 * tau + 40e-6 * Math.sqrt(tau / Math.PI);
    });
    const step = switchChargingStep({ potentialV, timeS, currentA, vertexIndex: v, returnStart: v + 1, returnEnd: n });
    expect(step).not.toBeNull();
    expect(Math.abs(step! - -2e-6)).toBeLessThan(1e-12);
  });

  it('gives null with too few points on the return side', () => {
    const timeS = Float64Array.from([0, 1, 2, 3, 4, 5, 6]);
    const potentialV = Float64Array.from([0.5, 0.4, 0.3, 0.2, 0.3, 0.4, 0.5]);
    expect(switchChargingStep({ potentialV, timeS, currentA: new Float64Array(7), vertexIndex: 3, returnStart: 4, returnEnd: 7 })).toBeNull();
  });

  // Nicholson 1966: (ipa/ipc) = (ipa)0/ipc + 0.485 (isp)0/ipc + 0.086, 1 for a reversible couple.
  // With half the current jump of 3-point means taken as the charging step it read 0.905 here
  // (switch 60 mV past E½) and moved with the point spacing.
  // (The simulator's own time steps put 0.6 % between 1 and 0.2 mV spacing, hence 1.5 %.)
  it.each([0.001, 0.0005, 0.0002])('a reversible couple turned 60 mV past E½ (point spacing %f V) gives a ratio within 1.5 % of 1', (stepV) => {
    const v = simulatedVoltammogram({ k0CmPerS: Infinity, formalPotentialV: 0.2, startV: 0.5, switchV: 0.14, areaCm2: 0.0707, concentrationOMolPerCm3: 1e-6, concentrationRMolPerCm3: 0, diffusionOCm2PerS: 1e-5, diffusionRCm2PerS: 1e-5, scanRateVPerS: 0.1, doubleLayerFPerCm2: 2e-5, stepV });
    const couple = analyzeVoltammogram(v).cycles[0]!.couples[0]!;
    expect(Math.abs(couple.nicholsonRatio! - 1)).toBeLessThan(0.015);
  });
});
