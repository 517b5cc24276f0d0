import { describe, expect, it } from 'vitest';
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, thermalVoltageV } from './constants';

describe('constants', () => {
  // CODATA 2018 (Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021)): exact F and R.
  it('F and R are the CODATA 2018 values', () => {
    expect(FARADAY_C_PER_MOL).toBe(96485.33212);
    expect(GAS_CONSTANT_J_PER_MOL_K).toBe(8.314462618);
  });
  // CODATA 2018, derived: RT/F = 25.692 579 mV and (ln 10)RT/F = 59.159 35 mV at 298.15 K.
  it('RT/F at 298.15 K is 25.692579 mV', () => {
    expect(thermalVoltageV(298.15) * 1000).toBeCloseTo(25.692579, 5);
    expect(Math.LN10 * thermalVoltageV(298.15) * 1000).toBeCloseTo(59.15935, 4);
  });
});
