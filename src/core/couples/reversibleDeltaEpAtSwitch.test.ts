import { describe, expect, it } from 'vitest';
import { reversibleDeltaEpAtSwitch, reversibleDeltaEpLimitV, reversibleMidpointOffset } from './reversibleDeltaEpAtSwitch';
import { analyzeVoltammogram } from '../analysis/analyzeVoltammogram';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';

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

// Nicholson, Anal. Chem. 37 (1965) 1351, as tabulated in Bard & Faulkner 2nd ed. §6.5 (from memory):
// n·ΔEp = 60.5 mV for a switch 71.5 mV past the forward peak, 57.0 mV far away; the forward peak
// stays 1.109·RT/nF before E½ (Nicholson & Shain 1964, Table I), so the midpoint lies
// (60.5 − 57.0)/2 = 1.75 mV from E½ towards the return peak.
describe('reversibleMidpointOffset and its warning', () => {
  it('is 1.75 mV at the first row and 0 far away', () => {
    expect(reversibleMidpointOffset(0.0715).deltaEpV * 1000).toBeCloseTo(1.75, 1);
    expect(reversibleMidpointOffset(5).deltaEpV * 1000).toBeLessThan(0.05);
  });

  const midpoint = (switchV: number) => {
    const v = simulatedVoltammogram({ k0CmPerS: Infinity, formalPotentialV: 0.2, startV: 0.5, switchV, diffusionOCm2PerS: 1e-5, diffusionRCm2PerS: 1e-5, concentrationOMolPerCm3: 1e-6, concentrationRMolPerCm3: 0 });
    const cycle = analyzeVoltammogram(v).cycles[0]!;
    return { eHalfV: cycle.couples[0]!.eHalfV!, warnings: cycle.warnings.filter((w) => w.code === 'MIDPOINT_OFFSET') };
  };

  it('a simulated couple turned 100 mV past E½ has its midpoint 1.75 ± 0.4 mV positive of E°′, and says so', () => {
    const { eHalfV, warnings } = midpoint(0.1);
    expect(Math.abs((eHalfV - 0.2) * 1000 - 1.75)).toBeLessThan(0.4);
    expect(warnings.length).toBe(1);
    expect(warnings[0]!.message).toMatch(/lies about 1\.[5-9] mV positive/);
  });

  it('says nothing when the switch lies 300 mV past E½', () => {
    expect(midpoint(-0.1).warnings).toEqual([]);
  });
});
