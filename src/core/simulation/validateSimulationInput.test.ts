import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { simulateCv } from './simulateCv';

describe('simulateCv input checks', () => {
  it.each([
    [{ scanRateVPerS: -1 }, /scanRateVPerS/],
    [{ alpha: 1.2 }, /alpha/],
    [{ electronCount: 1.5 }, /electronCount/],
    [{ startV: 0.1, switchV: 0.1 }, /switchV/],
    [{ cycles: 0 }, /cycles/],
    [{ k0CmPerS: 0 }, /k0CmPerS/],
    [{ diffusionOCm2PerS: Number.NaN }, /diffusionOCm2PerS/],
    [{ mechanism: 'ECE' as never }, /mechanism/],
    [{ stepV: 2 }, /stepV/],
  ])('rejects %o with BAD_OPTION naming the field', (input, pattern) => {
    try {
      simulateCv(input);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(AnalysisError);
      expect((e as AnalysisError).code).toBe('BAD_OPTION');
      expect((e as Error).message).toMatch(pattern);
    }
  });

  it('rejects bad numerical options', () => {
    expect(() => simulateCv({}, { substepsPerPoint: 1.5 })).toThrow(/substepsPerPoint/);
    expect(() => simulateCv({}, { gridExpansion: 0.9 })).toThrow(/gridExpansion/);
    expect(() => simulateCv({ stepV: 1e-5 }, { gridExpansion: 1.001, firstSpacingFraction: 0.001 })).toThrow(/node-steps/);
  });

  it('defaults give 601 + 600 points and a finite current everywhere', () => {
    const r = simulateCv({});
    expect(r.currentA.length).toBe(1201);
    expect(r.currentA.every((x) => Number.isFinite(x))).toBe(true);
  });
});
