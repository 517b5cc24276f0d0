import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { thermalVoltageV } from '../constants';
import { lavironCathodicPeak, lavironPeakSeparation, lavironRateConstantFromSeparation } from './lavironWorkingCurve';

describe('lavironCathodicPeak', () => {
  // Hand-worked: with m = 1e6 the film stays at equilibrium, θ = 1/(1 + e^{s}); −dθ/ds peaks at
  // s = 0 with e^0/(1 + e^0)² = 1/4 (Laviron, J. Electroanal. Chem. 52, 355 (1974), ψ = 1/4).
  it('fast film: peak at E°′ with ψ = 1/4', () => {
    const p = lavironCathodicPeak(1e6, 0.5);
    expect(Math.abs(p.xi)).toBeLessThan(2e-3);
    expect(p.psi).toBeCloseTo(0.25, 4);
  });
  // Laviron, J. Electroanal. Chem. 101, 19 (1979), irreversible limit (from memory):
  // Epc = E°′ − (RT/αnF)·ln(α/m), so ξc = −ln(α/m)/α, and ip = αn²F²AΓv/(e·RT), so ψ = α/e.
  for (const alpha of [0.3, 0.5, 0.7]) {
    it(`slow film, α = ${alpha}: ξc = −ln(α/m)/α within 0.001 and ψ = α/e within 0.05 %`, () => {
      const m = 1e-4;
      const p = lavironCathodicPeak(m, alpha);
      expect(Math.abs(p.xi + Math.log(alpha / m) / alpha)).toBeLessThan(1e-3);
      expect(Math.abs(p.psi / (alpha / Math.E) - 1)).toBeLessThan(5e-4);
    });
  }
  it('rejects m ≤ 0 and α outside 0.01–0.99', () => {
    expect(() => lavironCathodicPeak(0, 0.5)).toThrow(AnalysisError);
    expect(() => lavironCathodicPeak(1, 1)).toThrow(AnalysisError);
    expect(() => lavironCathodicPeak(Number.NaN, 0.5)).toThrow(AnalysisError);
  });
});

describe('lavironPeakSeparation', () => {
  // Laviron 1979 (from memory): both large-separation lines, ξa − ξc = ln((1−α)/m)/(1−α) + ln(α/m)/α.
  it('slow film, α = 0.3: separation matches the two Ep lines within 0.002 RT/F', () => {
    const m = 1e-4;
    const s = lavironPeakSeparation(m, 0.3);
    expect(Math.abs(s.separation - (Math.log(0.7 / m) / 0.7 + Math.log(0.3 / m) / 0.3))).toBeLessThan(2e-3);
  });
  // Identity of the model: swapping α and 1 − α swaps the two peaks' distances from E°′.
  it('α ↔ 1 − α mirrors the peaks', () => {
    const a = lavironPeakSeparation(0.3, 0.35);
    const b = lavironPeakSeparation(0.3, 0.65);
    expect(a.anodic.xi).toBeCloseTo(-b.cathodic.xi, 9);
    expect(a.separation).toBeCloseTo(b.separation, 9);
  });
  // Laviron 1979 (from memory): ΔEp grows steadily as m falls (his working curve).
  it('ΔEp grows as m falls', () => {
    const seps = [10, 1, 0.1, 0.01].map((m) => lavironPeakSeparation(m, 0.5).separation);
    for (let i = 1; i < seps.length; i++) expect(seps[i]!).toBeGreaterThan(seps[i - 1]!);
  });
});

describe('lavironRateConstantFromSeparation', () => {
  // Laviron 1979 (from memory): log k_s = α log(1−α) + (1−α) log α − log(RT/nFv) − α(1−α)nFΔEp/(2.303RT)
  // for n·ΔEp > 200 mV. At n·ΔEp = 500 mV the curve and the line agree within 0.5 %.
  for (const alpha of [0.3, 0.5]) {
    it(`n·ΔEp = 500 mV, α = ${alpha}: k_s as Laviron's large-separation expression within 0.5 %`, () => {
      const rt = thermalVoltageV(298.15);
      const [d, v, n] = [0.25, 10, 2];
      const closed = 10 ** (alpha * Math.log10(1 - alpha) + (1 - alpha) * Math.log10(alpha) - Math.log10(rt / (n * v)) - (alpha * (1 - alpha) * n * d) / (Math.LN10 * rt));
      const got = lavironRateConstantFromSeparation({ deltaEpV: d, scanRateVPerS: v, electronCount: n }, { alpha });
      expect(Math.abs(got.ksPerS / closed - 1)).toBeLessThan(5e-3);
    });
  }
  // Round trip through the curve itself (an identity): the ΔEp at m gives back m.
  it('round trip: ΔEp at m = 0.7 gives k_s = 0.7·nFv/RT', () => {
    const rt = thermalVoltageV(298.15);
    const sep = lavironPeakSeparation(0.7, 0.4).separation;
    const got = lavironRateConstantFromSeparation({ deltaEpV: sep * rt, scanRateVPerS: 2, electronCount: 1 }, { alpha: 0.4 });
    expect(Math.abs(got.ksPerS / ((0.7 * 2) / rt) - 1)).toBeLessThan(1e-4);
  });
  it('refuses ΔEp ≤ 0 and a ΔEp beyond the curve', () => {
    expect(() => lavironRateConstantFromSeparation({ deltaEpV: 0, scanRateVPerS: 1, electronCount: 1 })).toThrow(AnalysisError);
    expect(() => lavironRateConstantFromSeparation({ deltaEpV: 1e-7, scanRateVPerS: 1, electronCount: 1 })).toThrow(/working curve/);
  });
});
