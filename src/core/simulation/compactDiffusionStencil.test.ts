import { describe, expect, it } from 'vitest';
import { compactDiffusionWeights } from './compactDiffusionStencil';
import { expandingGrid } from './expandingGrid';

describe('compactDiffusionWeights', () => {
  // Numerov / Mehrstellen weights on an equal grid: h·(1/12, 10/12, 1/12) (L. Collatz, The
  // Numerical Treatment of Differential Equations, 3rd ed. 1960, from memory); surface node
  // h·(1/3, 1/6), worked by hand from exactness for 1, x, x², x³.
  it('equal spacing gives h/12, 10h/12, h/12 inside and h/3, h/6 at the surface', () => {
    const w = compactDiffusionWeights(new Float64Array([0.3, 0.3, 0.3, 0.3]));
    expect(w.lower[2]).toBeCloseTo(0.3 / 12, 14);
    expect(w.diagonal[2]).toBeCloseTo((10 * 0.3) / 12, 14);
    expect(w.upper[2]).toBeCloseTo(0.3 / 12, 14);
    expect(w.diagonal[0]).toBeCloseTo(0.1, 14);
    expect(w.upper[0]).toBeCloseTo(0.05, 14);
    expect(w.lower[0]).toBe(0);
  });

  // Identity by construction (the conditions in the file's header): on an unequal grid each
  // interior relation is exact for c = x⁴ (c″ = 12x²), and the surface one for c = x³.
  it('is exact for x⁴ inside and x³ at the surface on an expanding grid (ratio 1.2)', () => {
    const g = expandingGrid(0.01, 1.2, 1);
    const w = compactDiffusionWeights(g.spacingCm);
    const x = g.positionCm;
    for (let i = 1; i < g.spacingCm.length - 1; i++) {
      const a = x[i - 1] as number, b = x[i] as number, c = x[i + 1] as number;
      const left = (w.lower[i] as number) * 12 * a * a + (w.diagonal[i] as number) * 12 * b * b + (w.upper[i] as number) * 12 * c * c;
      const right = (c ** 4 - b ** 4) / (c - b) - (b ** 4 - a ** 4) / (b - a);
      expect(Math.abs(left / right - 1)).toBeLessThan(1e-12);
    }
    const h = g.spacingCm[0] as number;
    // D·c′(0) = D(c_1 − c_0)/h − Σ m·c″ for c = x³: c′(0) = 0, c″ = 6x.
    expect(Math.abs(h ** 2 - (w.upper[0] as number) * 6 * h) / h ** 2).toBeLessThan(1e-12);
  });

  // Common practice, no source: beyond the ratio where the compact weights lose diagonal
  // dominance the finite-volume control volumes are used.
  it('falls back to the finite-volume control volumes for a ratio of 2', () => {
    const w = compactDiffusionWeights(new Float64Array([1, 2, 4]));
    expect(Array.from(w.diagonal)).toEqual([0.5, 1.5, 3]);
    expect(Array.from(w.lower)).toEqual([0, 0, 0]);
    expect(Array.from(w.upper)).toEqual([0, 0, 0]);
  });
});
