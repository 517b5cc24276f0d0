import { describe, expect, it } from 'vitest';
import { gaussianShape, uniformGrid } from '../baseline/analyticShapes';
import { reversibleWaveShape } from '../baseline/reversibleWaveShape';
import { thermalVoltageV } from '../constants';
import { refinePeakDeskewed, refinePeakQuadratic } from './refinePeakQuadratic';

describe('refinePeakQuadratic', () => {
  // Hand check: an exact parabola with its vertex between samples (0.2437 V, 5 µA) is recovered.
  it('recovers the vertex of an exact parabola between samples', () => {
    const e = uniformGrid(21, 0.2, 0.3);
    const i = e.map((x) => 5e-6 - 2e-3 * (x - 0.2437) ** 2);
    const v = refinePeakQuadratic({ potentialV: e, currentA: i, from: 4, to: 15 })!;
    expect(v.potentialV).toBeCloseTo(0.2437, 12);
    expect(v.currentA).toBeCloseTo(5e-6, 15);
  });

  it('finds a minimum with orientation −1 and refuses the wrong orientation', () => {
    const e = uniformGrid(21, -0.1, 0.1);
    const i = e.map((x) => -3e-6 + 1e-3 * (x - 0.012) ** 2);
    expect(refinePeakQuadratic({ potentialV: e, currentA: i, from: 0, to: 21 }, { orientation: -1 })!.potentialV).toBeCloseTo(0.012, 12);
    expect(refinePeakQuadratic({ potentialV: e, currentA: i, from: 0, to: 21 })).toBeNull();
  });

  it('returns null when the vertex lies outside the window, and rejects < 3 points', () => {
    const e = uniformGrid(21, 0, 0.2);
    const i = e.map((x) => -((x - 0.5) ** 2));
    expect(refinePeakQuadratic({ potentialV: e, currentA: i, from: 0, to: 21 })).toBeNull();
    expect(() => refinePeakQuadratic({ potentialV: e, currentA: i, from: 0, to: 2 })).toThrow(/at least 3/);
  });

  // A least-squares parabola is determined only by three or more distinct abscissae (common practice, no source).
  it('returns null, not a solver fault, when the window holds fewer than three distinct potentials (a staircase step)', () => {
    const e = [0.1, 0.1, 0.1, 0.2, 0.2, 0.2];
    const i = [1e-6, 2e-6, 1.5e-6, 1e-6, 2e-6, 1e-6];
    expect(refinePeakQuadratic({ potentialV: e, currentA: i, from: 0, to: 6 })).toBeNull();
    const tiny = [0, 1e-300, 2e-300, 3e-300, 4e-300];
    expect(refinePeakQuadratic({ potentialV: tiny, currentA: [0, 1, 2, 1, 0], from: 0, to: 5 })).toBeNull();
  });
});

describe('refinePeakDeskewed', () => {
  // The reversible wave's exact shape (Nicholson & Shain, Anal. Chem. 36 (1964) 706, Table I:
  // peak at ξ = −1.109, i.e. Ep = E½ − 28.5 mV for n = 1 at 25 °C) on a 0.2 mV grid, oxidation
  // sweep with E½ = 0; the window holds the top 6 %, as 2 % noise makes it (3σ).
  const u = thermalVoltageV(298.15);
  const e = uniformGrid(1201, -0.1, 0.14);
  const idx = (keep: (j: number) => boolean) => Array.from(e.keys()).filter(keep);
  const i = e.map((x) => reversibleWaveShape(-x / u));
  const trueEp = 1.109 * u;
  const top = (level: number) => {
    const k = idx((j) => i[j]! >= level);
    return { from: k[0]!, to: k[k.length - 1]! + 1 };
  };
  const wideAround = (v: number, reach: number) => {
    const k = idx((j) => Math.abs(e[j]! - v) <= reach);
    return { potentialV: k.map((j) => e[j]!), currentA: k.map((j) => i[j]!) };
  };

  // Measured: the plain vertex +1.14 mV, the corrected one +0.31 mV (the shape's higher odd terms).
  it('puts the vertex of a reversible wave within 0.4 mV of Ep, where the plain parabola leans 1 mV towards the tail', () => {
    const w = top(0.94);
    const plain = refinePeakQuadratic({ potentialV: e, currentA: i, ...w })!;
    expect(plain.potentialV - trueEp).toBeGreaterThan(0.001);
    const reach = Math.max(plain.potentialV - e[w.from]!, e[w.to - 1]! - plain.potentialV);
    const fixed = refinePeakDeskewed({ potentialV: e.subarray(w.from, w.to), currentA: i.subarray(w.from, w.to) }, wideAround(plain.potentialV, 2 * reach), plain)!;
    expect(Math.abs(fixed.potentialV - trueEp)).toBeLessThan(0.0004);
    expect(fixed.currentA).toBeCloseTo(1, 3);
  });

  // A symmetric peak has no cubic term (common practice, no source): nothing to take off.
  it('leaves a symmetric peak where the parabola put it, and gives up when the wide span is short', () => {
    const g = e.map((x) => gaussianShape(x, 0.02, 0.03));
    const k = idx((j) => g[j]! >= 0.94);
    const w = { from: k[0]!, to: k[k.length - 1]! + 1 };
    const plain = refinePeakQuadratic({ potentialV: e, currentA: g, ...w })!;
    const near = idx((j) => Math.abs(e[j]! - plain.potentialV) <= 0.02);
    const fixed = refinePeakDeskewed({ potentialV: e.subarray(w.from, w.to), currentA: g.subarray(w.from, w.to) }, { potentialV: near.map((j) => e[j]!), currentA: near.map((j) => g[j]!) }, plain)!;
    expect(Math.abs(fixed.potentialV - plain.potentialV)).toBeLessThan(0.00001);
    expect(refinePeakDeskewed({ potentialV: e.subarray(w.from, w.to), currentA: g.subarray(w.from, w.to) }, { potentialV: [0.01, 0.02, 0.03], currentA: [1, 1, 1] }, plain)).toBeNull();
  });
});
