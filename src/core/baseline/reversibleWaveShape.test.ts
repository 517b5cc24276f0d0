import { describe, expect, it } from 'vitest';
import { reversiblePeakChi, reversiblePeakXi, reversibleWaveShape } from './reversibleWaveShape';

// Nicholson & Shain, Anal. Chem. 36 (1964) 706, Table I; Bard & Faulkner 2nd ed. (2001) eqs. 6.2.18-6.2.21.
describe('reversibleWaveShape', () => {
  it('peaks at √π·χ = 0.4463, at n(E − E½)F/RT = −1.109', () => {
    expect(Math.sqrt(Math.PI) * reversiblePeakChi()).toBeCloseTo(0.4463, 3);
    expect(reversiblePeakXi()).toBeCloseTo(-1.109, 1);
    expect(reversibleWaveShape(reversiblePeakXi())).toBeCloseTo(1, 3);
  });

  it('has its half-peak point 2.20 RT/nF before the peak', () => {
    // Find ξ before the peak where the shape is 1/2.
    let lo = reversiblePeakXi();
    let hi = 10;
    for (let i = 0; i < 60; i++) {
      const mid = (lo + hi) / 2;
      if (reversibleWaveShape(mid) > 0.5) lo = mid;
      else hi = mid;
    }
    expect(lo - reversiblePeakXi()).toBeCloseTo(2.2, 1);
  });

  it('tends to the Cottrell decay far past the peak', () => {
    // Far past E½ the surface concentration is 0: i = nFAC√D/√(πt′) (Bard & Faulkner eq. 5.2.11),
    // i.e. √π·χ·√(σt′) → 1/√π with t′ counted from E½ (σt′ = −ξ).
    const far = (xi: number) => reversibleWaveShape(xi) * reversiblePeakChi() * Math.sqrt(Math.PI) * Math.sqrt(-xi);
    expect(far(-40)).toBeCloseTo(1 / Math.sqrt(Math.PI), 2);
    expect(far(-90)).toBeCloseTo(1 / Math.sqrt(Math.PI), 2);
    expect(reversibleWaveShape(-80)).toBeGreaterThan(0);
    expect(reversibleWaveShape(20)).toBe(0);
  });
});
