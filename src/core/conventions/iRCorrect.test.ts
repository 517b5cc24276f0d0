import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { iRCorrect, iRCorrectPoint } from './iRCorrect';

describe('iRCorrect', () => {
  // Ohm's law (Bard & Faulkner 2nd ed. §1.3.4, from memory): 10 µA anodic through 1 kΩ is 10 mV;
  // the interface sits 10 mV below the applied potential.
  it('subtracts i·Ru with IUPAC sign', () => {
    const e = iRCorrect([0.5, 0.5], [10e-6, -10e-6], 1000);
    expect(e[0]).toBeCloseTo(0.49, 12);
    expect(e[1]).toBeCloseTo(0.51, 12);
    expect(iRCorrectPoint(0.2, 0, 500)).toBe(0.2);
  });
  it('rejects negative Ru and unequal columns', () => {
    expect(() => iRCorrect([0], [0], -1)).toThrow(AnalysisError);
    expect(() => iRCorrect([0, 1], [0], 1)).toThrow(AnalysisError);
  });
});
