import { describe, expect, it } from 'vitest';
import { celsiusToKelvin, diskAreaCm2, formatFixed, formatMillivolts, formatScanRate, kelvinToCelsius, millimolarToMolPerCm3, molPerCm3ToMillimolar } from './units';

// BIPM, SI Brochure 9th ed. (2019), §2.3.1: T/K = t/°C + 273.15; Table 8: 1 L = 1000 cm³.
describe('unit conversions', () => {
  it('25 °C is 298.15 K and back', () => {
    expect(celsiusToKelvin(25)).toBeCloseTo(298.15, 12);
    expect(kelvinToCelsius(298.15)).toBe(25);
    expect(kelvinToCelsius(273.15)).toBe(0);
  });
  it('1 mM is 1e-6 mol/cm³ and back (worked by hand: 1e-3 mol per 1000 cm³)', () => {
    expect(millimolarToMolPerCm3(1)).toBe(1e-6);
    expect(molPerCm3ToMillimolar(2.5e-6)).toBe(2.5);
  });
  it('a 3 mm disk has 0.0707 cm² (π·0.3²/4 = 0.070686)', () => {
    expect(diskAreaCm2(0.3)).toBeCloseTo(0.0706858, 6);
  });
  it('formats mV with the digits asked for', () => {
    expect(formatMillivolts(0.05916)).toBe('59.2 mV');
    expect(formatMillivolts(-0.0012, 2)).toBe('-1.20 mV');
  });
});

// IEEE 754 doubles: a scan rate fitted from a time column carries a float tail (0.1 → 0.10000000000000005);
// messages print six significant digits at most (common practice, no source).
describe('formatScanRate', () => {
  it('prints no binary-float tail', () => {
    expect(formatScanRate(0.10000000000000005)).toBe('0.1 V/s');
    expect(formatScanRate(100.00000000000006)).toBe('100 V/s');
    expect(formatScanRate(0.049999999999999996)).toBe('0.05 V/s');
    expect(formatScanRate(0.0123456789)).toBe('0.0123457 V/s');
  });
});

// Rounding convention (common practice, no source): a value that rounds to zero prints without a sign.
describe('formatFixed', () => {
  it('prints no negative zero', () => {
    expect(formatFixed(-0.00002, 3)).toBe('0.000');
    expect(formatFixed(-0.0004, 3)).toBe('0.000');
    expect(formatFixed(-0.0006, 3)).toBe('-0.001');
    expect(formatFixed(-0, 1)).toBe('0.0');
    expect(formatFixed(-0.2, 0)).toBe('0');
    expect(formatFixed(1.25, 1)).toBe((1.25).toFixed(1));
  });
});
