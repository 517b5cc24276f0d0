import { describe, expect, it } from 'vitest';
import { thermalVoltageV } from '../constants';
import { classifySeriesCouple, suggestedElectronCount, surfaceKinetics } from './classifySeriesCouple';
import type { SeriesPoint } from './seriesPoint';

function point(over: Partial<SeriesPoint>): SeriesPoint {
  return {
    fileIndex: 0, fileName: 'f', scanRateVPerS: 0.1, cycle: 1, epaV: 0.03, epcV: -0.03, eHalfV: 0, deltaEpV: 0.06, ipaA: 1e-6, ipcA: 1e-6,
    anodicChargeC: null, cathodicChargeC: null, forwardIpA: 1e-6, forwardHalfPeakWidthV: null, forwardChargeC: null, verdict: 'reversible', ...over,
  };
}

describe('classifySeriesCouple', () => {
  // End of Nicholson's 1965 table: n·ΔEp = 212 mV; beyond it the couple is treated as irreversible.
  it('splits quasi-reversible couples at n·ΔEp = 212 mV', () => {
    expect(classifySeriesCouple([point({ verdict: 'quasi-reversible', deltaEpV: 0.15 })], 1, 298.15).kineticClass).toBe('quasi-reversible');
    expect(classifySeriesCouple([point({ verdict: 'quasi-reversible', deltaEpV: 0.3 })], 1, 298.15).kineticClass).toBe('irreversible');
  });
  // Nicholson & Shain 1964: reversible |Ep − Ep/2| = 2.20 RT/nF (56.5 mV); irreversible is wider.
  it('calls a broad irreversible-looking peak irreversible and a narrow one reversible', () => {
    const rt = thermalVoltageV(298.15);
    expect(classifySeriesCouple([point({ verdict: 'irreversible', forwardHalfPeakWidthV: 3.7 * rt })], 1, 298.15).kineticClass).toBe('irreversible');
    expect(classifySeriesCouple([point({ verdict: 'irreversible', forwardHalfPeakWidthV: 2.2 * rt })], 1, 298.15).kineticClass).toBe('reversible');
    // A peak only on the return sweep (no forward peak, so no width): not called reversible.
    expect(classifySeriesCouple([point({ verdict: 'irreversible', forwardHalfPeakWidthV: null })], 1, 298.15).kineticClass).toBe('inconclusive');
  });
  // Nicholson & Shain 1964: a fast follow-up reaction narrows the forward peak to 1.857 RT/nF and
  // takes the return peak away; so does αnₐ ≈ 1. At one scan rate nothing tells them apart; over
  // several, the chemistry reading (and its Ep shift test) applies.
  it('leaves a lone narrow forward peak at one scan rate inconclusive', () => {
    const rt = thermalVoltageV(298.15);
    const lone = (v: number) => point({ scanRateVPerS: v, verdict: 'irreversible', epaV: null, eHalfV: null, deltaEpV: null, ipaA: null, forwardHalfPeakWidthV: 1.857 * rt });
    expect(classifySeriesCouple([lone(0.1)], 1, 298.15).kineticClass).toBe('inconclusive');
    expect(classifySeriesCouple([lone(0.1), lone(0.2)], 1, 298.15).kineticClass).toBe('reversible');
  });
  // Laviron 1974: ip ∝ v for a surface couple; a log–log slope near 1 over ≥ 3 scan rates wins.
  it('uses the log–log slope to recognise a surface couple', () => {
    const pts = [0.1, 1, 10].map((s) => point({ scanRateVPerS: s, verdict: 'quasi-reversible', deltaEpV: 0.1 }));
    expect(classifySeriesCouple(pts, 1, 298.15, 0.97).regime).toBe('surface');
    expect(classifySeriesCouple(pts, 1, 298.15, 0.5).regime).toBe('diffusion');
  });
});

describe('classifySeriesCouple, peak separation first', () => {
  // Nicholson 1965 table (from memory): ψ = 5 at 65 mV; a wider median ΔEp means slow transfer,
  // whatever label the single traces carry.
  it('calls a 90 mV couple quasi-reversible even when the traces say follow-up loss', () => {
    const pts = [0.1, 0.2].map((s) => point({ scanRateVPerS: s, verdict: 'chemically-coupled', deltaEpV: 0.09 }));
    expect(classifySeriesCouple(pts, 1, 298.15).kineticClass).toBe('quasi-reversible');
    const rev = [0.1, 0.2].map((s) => point({ scanRateVPerS: s, verdict: 'chemically-coupled', deltaEpV: 0.059 }));
    expect(classifySeriesCouple(rev, 1, 298.15).kineticClass).toBe('reversible');
  });
});

// Nicholson & Shain, Anal. Chem. 36 (1964) 706; Bard & Faulkner 2nd ed. §6.2 (from memory): reversible |Ep − Ep/2| =
// 2.20RT/nF = 56.5/n mV is the narrowest a diffusion wave gets.
describe('suggestedElectronCount', () => {
  it('a 28.3 mV forward half-peak width with n = 1 assumed reads as n = 2; 56.5 mV or wider gives nothing', () => {
    const rt = thermalVoltageV(298.15);
    expect(suggestedElectronCount([point({ forwardHalfPeakWidthV: 1.1 * rt })], 1, 298.15)).toEqual({ electronCount: 2, halfPeakWidthV: 1.1 * rt });
    expect(suggestedElectronCount([point({ forwardHalfPeakWidthV: 2.2 * rt })], 1, 298.15)).toBeNull();
    expect(suggestedElectronCount([point({ forwardHalfPeakWidthV: 1.1 * rt })], 2, 298.15)).toBeNull();
  });
});

// Bard & Faulkner 2nd ed. §14.3 (ΔEp = 0 for a Nernstian layer) and Laviron 1979 (ΔEp grows with v).
describe('surfaceKinetics', () => {
  it('ΔEp ≤ 28.5 mV throughout → reversible; growing from 10 to 280 mV → quasi-reversible', () => {
    expect(surfaceKinetics([point({ deltaEpV: 0.005 }), point({ scanRateVPerS: 1, deltaEpV: 0.02 })], 1, 298.15)).toBe('reversible');
    expect(surfaceKinetics([point({ deltaEpV: 0.01 }), point({ scanRateVPerS: 20, deltaEpV: 0.28 })], 1, 298.15)).toBe('quasi-reversible');
  });
});
