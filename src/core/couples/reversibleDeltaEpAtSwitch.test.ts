import { describe, expect, it } from 'vitest';
import { reversibleDeltaEpAtSwitch, reversibleDeltaEpLimitV } from './reversibleDeltaEpAtSwitch';

describe('reversibleDeltaEpAtSwitch', () => {
  // Nicholson, Anal. Chem. 37 (1965) 1351 via Bard & Faulkner 2nd ed. §6.5 (from memory),
  // 2.218 as quoted by Elgrishi et al., J. Chem. Educ. 95 (2018) 197: limit 2.218 RT/F = 56.99 mV at 298.15 K.
  it('limit is 56.99 mV for n = 1 and half that for n = 2 at 25 °C', () => {
    expect(reversibleDeltaEpLimitV(1, 298.15) * 1000).toBeCloseTo(56.99, 1);
    expect(reversibleDeltaEpLimitV(2, 298.15) * 1000).toBeCloseTo(28.49, 1);
  });

  // Same table (Nicholson 1965 via B&F §6.5, from memory): 121.5 mV past the peak → 59.2 mV; 71.5 → 60.5.
  it('returns the table rows exactly and interpolates between them', () => {
    expect(reversibleDeltaEpAtSwitch(0.1215).deltaEpV * 1000).toBeCloseTo(59.2, 10);
    expect(reversibleDeltaEpAtSwitch(0.0715).deltaEpV * 1000).toBeCloseTo(60.5, 10);
    expect(reversibleDeltaEpAtSwitch(0.1465).deltaEpV * 1000).toBeCloseTo((59.2 + 58.3) / 2, 10);
    expect(reversibleDeltaEpAtSwitch(10).deltaEpV * 1000).toBeGreaterThan(56.99);
    expect(reversibleDeltaEpAtSwitch(10).deltaEpV * 1000).toBeLessThan(57.1);
  });

  it('n = 2 halves both columns; a switch closer than the first row is flagged', () => {
    expect(reversibleDeltaEpAtSwitch(0.06075, { electronCount: 2 }).deltaEpV * 1000).toBeCloseTo(29.6, 10);
    expect(reversibleDeltaEpAtSwitch(0.03).inTable).toBe(false);
    expect(() => reversibleDeltaEpAtSwitch(-0.1)).toThrow(/≥ 0/);
  });

  // Both table columns are multiples of RT/nF, so at 50 °C every value scales by 323.15/298.15.
  it('scales with absolute temperature', () => {
    const hot = reversibleDeltaEpAtSwitch((0.1215 * 323.15) / 298.15, { temperatureK: 323.15 }).deltaEpV;
    expect(hot * 1000).toBeCloseTo((59.2 * 323.15) / 298.15, 8);
  });
});
