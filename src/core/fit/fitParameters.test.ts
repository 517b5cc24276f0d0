/**
 * The parameter layout: which parameters a mechanism has, internal ↔ physical round trips and
 * the search limits. Common practice, no source.
 */
import { describe, expect, it } from 'vitest';
import { ParameterLayout } from './fitParameters';
import type { FitModelValues } from './fitTypes';

const values = (): FitModelValues => ({
  couples: [0.1, -0.05].map((e) => ({ formalPotentialV: e, k0CmPerS: 0.02, alpha: 0.4, diffusionOCm2PerS: 7e-6, diffusionRatio: 1.2, followUpRatePerS: 3, coverageMolPerCm2: 1e-10, surfaceRatePerS: 50 })),
  shared: { uncompensatedOhm: 80, doubleLayerFPerCm2: 2e-5 },
});

describe('ParameterLayout', () => {
  it('orders free parameters per couple, then shared; labels couples from 1', () => {
    const l = ParameterLayout.build('EC', 2, ['followUpRatePerS', 'formalPotentialV', 'uncompensatedOhm', 'background'], 298.15);
    expect(l.entries.map((e) => l.label(e))).toEqual(['formalPotentialV[1]', 'followUpRatePerS[1]', 'formalPotentialV[2]', 'followUpRatePerS[2]', 'uncompensatedOhm']);
  });

  it('round-trips values through internal coordinates, and E°′ moves in units of RT/F', () => {
    const l = ParameterLayout.build('E', 2, ['formalPotentialV', 'k0CmPerS', 'alpha', 'diffusionOCm2PerS', 'uncompensatedOhm', 'doubleLayerFPerCm2'], 298.15);
    const u = l.toInternal(values());
    const back = l.fromInternal(u, values());
    expect(back.couples[1]?.formalPotentialV).toBeCloseTo(-0.05, 14);
    expect(back.couples[0]?.k0CmPerS).toBeCloseTo(0.02, 14);
    expect(back.shared.uncompensatedOhm).toBeCloseTo(80, 12);
    // RT/F at 25 °C = 25.693 mV (CODATA 2018 constants).
    expect(u[0]).toBeCloseTo(0.1 / 0.025693, 3);
  });

  it('clamps values outside the search limits (α into 0.05–0.95) and reports them at the limit', () => {
    const l = ParameterLayout.build('E', 1, ['alpha'], 298.15);
    const v = values();
    v.couples[0]!.alpha = 0.99;
    const clamped = l.fromInternal(l.toInternal(v), v);
    expect(clamped.couples[0]?.alpha).toBe(0.95);
    expect(l.atLimit(clamped, l.entries[0]!)).toBe(true);
  });

  it('refuses parameters of another mechanism and an empty free list', () => {
    expect(() => ParameterLayout.build('surface', 1, ['k0CmPerS'], 298.15)).toThrow(/k0CmPerS does not belong to the surface mechanism/);
    expect(() => ParameterLayout.build('E', 1, ['background'], 298.15)).toThrow(/no parameter of the model is free/);
  });
});
