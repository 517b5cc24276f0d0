import { describe, expect, it } from 'vitest';
import { gaussianShape, uniformGrid } from './analyticShapes';
import { findPrePeakWindow } from './findPrePeakWindow';
import { FARADAY_C_PER_MOL as F, inverseThermalVoltagePerV } from '../constants';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import { analyzeVoltammogram } from '../analysis/analyzeVoltammogram';

describe('findPrePeakWindow', () => {
  // Analytic shape: sloping line plus a Gaussian of width 0.03 V at 0.3 V. 1 % of the height is
  // reached √ln(100)·0.03 = 0.0644 V before the centre, so the foot lies near 0.236 V.
  it('ends the window at the foot of a Gaussian on a sloping line', () => {
    const e = uniformGrid(601, 0, 0.6);
    const y = e.map((x) => 0.2 + 0.5 * x + gaussianShape(x, 0.3, 0.03));
    const w = findPrePeakWindow(y, 0, 300, { footFraction: 0.01 })!;
    expect(w.start).toBe(0);
    expect(e[w.end]!).toBeGreaterThan(0.225);
    expect(e[w.end]!).toBeLessThan(0.245);
    // Default 0.3 %: √ln(333)·0.03 = 0.0723 V before the centre, foot near 0.228 V.
    const d = findPrePeakWindow(y, 0, 300)!;
    expect(e[d.end]!).toBeGreaterThan(0.218);
    expect(e[d.end]!).toBeLessThan(0.238);
  });

  it('returns null with fewer than 5 points before the peak', () => {
    expect(findPrePeakWindow([0, 1, 2, 3, 4, 5], 0, 4)).toBeNull();
  });
});

// Randles–Ševčík ip = 0.4463·nFAC(nFvD/RT)^½ (Bard & Faulkner 2nd ed. §6.2),
// simulated with this project's simulator: a sweep that starts only 265 mV before E°′ (the demo
// probe's window) still gives ip within 1 % once the window stops where the foot reaches 0.3 %
// of the peak (it was −1.1 % with a 1 % foot threshold).
describe('pre-peak window on a short approach to the wave', () => {
  it('reversible couple, start 265 mV before E°′, 0.01 and 0.1 V/s: ip within 1 % of Randles–Ševčík', () => {
    for (const v of [0.01, 0.1]) {
      const vg = simulatedVoltammogram({ formalPotentialV: -0.165, k0CmPerS: 100, diffusionOCm2PerS: 6.8e-6, diffusionRCm2PerS: 6.8e-6, startV: 0.1, switchV: -0.45, scanRateVPerS: v });
      const c = analyzeVoltammogram(vg).cycles[0]!.couples[0]!;
      const ip = 0.4463 * F * 0.0707 * 1e-6 * Math.sqrt(inverseThermalVoltagePerV(298.15) * v * 6.8e-6);
      expect(Math.abs(c.ipcA! / ip - 1)).toBeLessThan(0.01);
    }
  });
});
