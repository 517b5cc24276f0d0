import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { nicholsonPeakRatio } from './nicholsonPeakRatio';

describe('nicholsonPeakRatio', () => {
  // Nicholson, Anal. Chem. 38 (1966) 1406 (from memory); worked example: 0.600 + 0.485·0.200 + 0.086 = 0.783.
  it('i_pa = 10 µA, (i_pc)0 = 6 µA, (i_sp)0 = 2 µA gives 0.783', () => {
    expect(nicholsonPeakRatio({ forwardPeakA: 10e-6, returnPeakFromZeroA: 6e-6, switchingCurrentFromZeroA: 2e-6 })).toBeCloseTo(0.783, 3);
  });

  it('rejects a zero forward peak and NaN', () => {
    expect(() => nicholsonPeakRatio({ forwardPeakA: 0, returnPeakFromZeroA: 1, switchingCurrentFromZeroA: 1 })).toThrow(/> 0/);
    expect(() => nicholsonPeakRatio({ forwardPeakA: 1, returnPeakFromZeroA: NaN, switchingCurrentFromZeroA: 1 })).toThrow(AnalysisError);
  });
});
