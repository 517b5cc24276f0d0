import { describe, expect, it } from 'vitest';
import { currentInConvention, fromIupacCurrent, toIupacCurrent } from './currentConvention';

describe('current sign convention', () => {
  // IUPAC Gold Book (anodic positive) vs the polarographic convention (cathodic positive),
  // ASDL "Plotting Conventions for Voltammetry": the conversion is a sign change and round-trips exactly.
  it('negates polarographic currents and round-trips', () => {
    const polar = [1e-6, -2e-6, 0];
    const iupac = toIupacCurrent(polar, 'polarographic');
    expect(Array.from(iupac)).toEqual([-1e-6, 2e-6, -0]);
    expect(Array.from(fromIupacCurrent(iupac, 'polarographic'))).toEqual(polar);
    expect(Array.from(toIupacCurrent(polar, 'iupac'))).toEqual(polar);
    expect(currentInConvention(3e-6, 'polarographic')).toBe(-3e-6);
  });
  it('does not modify its input', () => {
    const input = Float64Array.from([1, 2]);
    toIupacCurrent(input, 'polarographic');
    expect(Array.from(input)).toEqual([1, 2]);
  });
});
