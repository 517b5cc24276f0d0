/**
 * The totally irreversible wave of irreversibleWaveShape.ts against the published values of its
 * integral equation.
 */
import { describe, expect, it } from 'vitest';
import { irreversibleWaveMeasures, irreversibleWaveShapeFor } from './irreversibleWaveShape';

describe('totally irreversible wave shape', () => {
  // Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001) eq. 6.3.8 (Nicholson & Shain, Anal.
  // Chem. 36 (1964) 706, Table III): √π·χ at the peak 0.4958; |Ep − Ep/2| = 1.857 RT/αnₐF (same
  // §6.3.1, from memory). The table's step of 0.01 leaves first-order errors of 0.1 % and 0.2 %.
  it('peak √π·χ 0.4958 and |Ep − Ep/2| 1.857 RT/αnₐF, within 0.3 %', () => {
    const m = irreversibleWaveMeasures();
    expect(Math.abs(m.peakCurrentFunction / 0.4958 - 1)).toBeLessThan(0.003);
    expect(Math.abs(m.halfWidth / 1.857 - 1)).toBeLessThan(0.003);
  });

  // J. Wang, Analytical Electrochemistry, 2nd ed. (2000), eq. 2-5: Ep = E°′ − (RT/αnₐF)[0.780 +
  // ln(D^½/k°) + ln b^½], i.e. k_f/√(πDb) = e^0.780/√π at the peak: x_p = 0.780 − ½·ln π = 0.208.
  it('puts the peak at x = 0.780 − ½·ln π within 0.01', () => {
    expect(Math.abs(irreversibleWaveMeasures().peakX - (0.78 - 0.5 * Math.log(Math.PI)))).toBeLessThan(0.01);
  });

  // Far before the peak M → 0 and χ = e^x (the same integral equation), so the foot over the peak
  // is e^(x − x_p)·e^(x_p)·√π/0.4958 = 4.40·e^(−αξ) for ξ RT/nF before Ep.
  it.each([0.3, 0.5, 0.7])('α = %f from its width: a foot of 4.40·e^(−αξ) of the peak far before it (within 2 %)', (alpha) => {
    const shape = irreversibleWaveShapeFor(1.857 / alpha)!;
    expect(Math.abs(shape.alpha / alpha - 1)).toBeLessThan(0.003);
    expect(shape.at(0)).toBeCloseTo(1, 4);
    for (const xi of [20, 25, 30]) {
      const y = alpha * xi;
      if (y > 12) continue;
      expect(Math.abs(shape.at(xi) / (4.4 * Math.exp(-y)) - 1)).toBeLessThan(0.02);
    }
  });

  it('gives no shape for a width that would mean α below 0.2', () => {
    expect(irreversibleWaveShapeFor(1.857 / 0.15)).toBeNull();
    expect(irreversibleWaveShapeFor(0)).toBeNull();
  });
});
