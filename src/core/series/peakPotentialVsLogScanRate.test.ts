import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { irreversiblePeakShiftVPerDecade, irreversibleShiftText, peakPotentialVsLogScanRate } from './peakPotentialVsLogScanRate';

describe('peakPotentialVsLogScanRate', () => {
  // Wang (2000) eq. 2-5; Bard & Faulkner §6.3: α = 0.5, nₐ = 1 → 59.16 mV per decade at 25 °C
  // (ln10·RT/(2αnₐF), computed from eq. 2-5 with CODATA 2018 constants).
  it('shift is 59.16 mV/decade for α = 0.5 and 29.58 mV/decade for αnₐ = 1', () => {
    expect(irreversiblePeakShiftVPerDecade(0.5) * 1000).toBeCloseTo(59.16, 1);
    expect(irreversiblePeakShiftVPerDecade(1) * 1000).toBeCloseTo(29.58, 1);
  });
  // Same source: a cathodic peak moving −59.16 mV per decade gives α = 0.5.
  it('recovers α from a cathodic series', () => {
    const v = [0.01, 0.1, 1, 10];
    const ep = v.map((s) => -0.3 - 0.05916 * Math.log10(s));
    const r = peakPotentialVsLogScanRate({ scanRatesVPerS: v, peakPotentialsV: ep, direction: 'cathodic' });
    expect(r.alpha).toBeCloseTo(0.5, 3);
    expect(r.note).toBeNull();
  });
  it('recovers α·nₐ for an anodic series with nₐ = 2', () => {
    const v = [0.05, 0.2, 0.8];
    const ep = v.map((s) => 0.4 + irreversiblePeakShiftVPerDecade(0.6 * 2) * Math.log10(s));
    const r = peakPotentialVsLogScanRate({ scanRatesVPerS: v, peakPotentialsV: ep, direction: 'anodic' }, { transferElectronCount: 2 });
    expect(r.alphaTimesTransferElectrons).toBeCloseTo(1.2, 10);
    expect(r.alpha).toBeCloseTo(0.6, 10);
  });
  it('refuses α when the peak moves the wrong way', () => {
    const r = peakPotentialVsLogScanRate({ scanRatesVPerS: [0.1, 1], peakPotentialsV: [0.1, 0.12], direction: 'cathodic' });
    expect(r.alpha).toBeNull();
    expect(r.note).toMatch(/does not move negative/);
  });
  it('rejects non-positive scan rates', () => {
    expect(() => peakPotentialVsLogScanRate({ scanRatesVPerS: [0, 1], peakPotentialsV: [0, 0], direction: 'anodic' })).toThrow(AnalysisError);
  });
});

// Bard & Faulkner 2nd ed. (2001) eq. 6.3.4 via Wang (2000) eq. 2-5: (ln 10)·RT/(2F) is 29.58 mV at
// 25 °C and 30.77 mV at 37 °C (CODATA 2018 R and F).
describe('irreversibleShiftText', () => {
  it('states the slope at the series temperature', () => {
    expect(irreversibleShiftText(298.15)).toBe('29.6/(αnₐ) mV');
    expect(irreversibleShiftText(310.15)).toBe('30.8/(αnₐ) mV');
  });
});
