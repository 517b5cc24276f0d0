import { describe, expect, it } from 'vitest';
import { expandingGrid } from './expandingGrid';

describe('expandingGrid', () => {
  it('spacings grow geometrically: h0 = 1, γ = 2, edge 10 → nodes 0, 1, 3, 7, 15', () => {
    const g = expandingGrid(1, 2, 10);
    expect(Array.from(g.positionCm)).toEqual([0, 1, 3, 7, 15]);
    expect(Array.from(g.volumeCm)).toEqual([0.5, 1.5, 3, 6]);
  });

  it('control volumes tile the region up to the middle of the last interval (mass balance)', () => {
    const g = expandingGrid(1e-5, 1.08, 0.05);
    const n = g.volumeCm.length;
    const sum = g.volumeCm.reduce((a, b) => a + b, 0);
    expect(sum).toBeCloseTo((g.positionCm[n] as number) - (g.spacingCm[n - 1] as number) / 2, 12);
    expect(g.positionCm[n]).toBeGreaterThanOrEqual(0.05);
  });

  it('a uniform grid (γ = 1) and bad options', () => {
    expect(expandingGrid(0.25, 1, 1).positionCm.length).toBe(5);
    expect(() => expandingGrid(0, 1.1, 1)).toThrow(/firstSpacingCm/);
    expect(() => expandingGrid(1e-12, 1, 1)).toThrow(/nodes/);
  });
});
