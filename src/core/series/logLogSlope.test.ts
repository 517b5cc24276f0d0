import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { logLogSlope, readLogLogSlope } from './logLogSlope';
import { surfacePeakCurrent } from './lavironSurfaceWave';

const v = [0.025, 0.05, 0.1, 0.2, 0.4];

describe('logLogSlope', () => {
  // Randles–Ševčík, ip ∝ v^½ (Bard & Faulkner 2nd ed. §6.2): the five pairs computed from its full form give 0.500.
  it('reads 0.500 for the Randles–Ševčík pairs: diffusion', () => {
    const ip = [8.2791, 11.7083, 16.5581, 23.4167, 33.1162].map((u) => -u * 1e-6);
    const r = logLogSlope(v, ip);
    expect(r.slope).toBeCloseTo(0.5, 3);
    expect(r.reading).toBe('diffusion');
  });
  // Laviron, J. Electroanal. Chem. 52 (1974) 355; Bard & Faulkner 2nd ed. §14.3 (from memory): ip = k·v gives 1.000.
  it('reads 1.000 for a surface-confined wave: adsorbed', () => {
    const ip = v.map((s) => surfacePeakCurrent({ electronCount: 1, areaCm2: 0.0707, coverageMolPerCm2: 1e-10, scanRateVPerS: s }));
    const r = logLogSlope(v, ip);
    expect(r.slope).toBeCloseTo(1, 3);
    expect(r.reading).toBe('adsorbed-or-capacitive');
  });
  // Band limits: common practice, no source.
  it('calls the gap between the bands mixed', () => {
    expect(readLogLogSlope(0.75)).toBe('mixed');
    expect(readLogLogSlope(0.3)).toBe('mixed');
    expect(readLogLogSlope(0.6)).toBe('diffusion');
  });
  it('refuses zero scan rates or currents', () => {
    expect(() => logLogSlope([0, 1], [1, 2])).toThrow(AnalysisError);
    expect(() => logLogSlope([1, 2], [0, 2])).toThrow(/peak current 0/);
  });
});
