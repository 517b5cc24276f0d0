/**
 * Γ from the ip–v slope of a slow film, on film series simulated with this project's simulator
 * (surface mechanism, validated against Laviron's peak and k_s lines in simulateCv.surface.test.ts)
 * with Γ = 1e-10 mol/cm², k_s = 1 1/s and a known αc.
 * Source: E. Laviron, J. Electroanal. Chem. 101, 19 (1979) (from memory): beyond n·ΔEp = 200 mV
 * ip = αnFQv/(2.718RT), Q = nFAΓ; the Nernstian n²F²AΓ/(4RT) (Laviron 1974) would put Γ 27 % low at
 * α = 0.5 and 56 % low at α = 0.3; αc from the Ep–log v lines, slopes 2.303RT/((1 − α)nF) and
 * −2.303RT/(αnF).
 */
import { describe, expect, it } from 'vitest';
import { surfaceCoverageFromSlope } from '../series';
import { analyseSimulatedSeries } from './simulatedSeries';

const film = (alpha: number, ks: number) => ({ mechanism: 'surface' as const, surfaceRatePerS: ks, coverageMolPerCm2: 1e-10, alpha, startV: 0.7, switchV: -0.7, stepV: 0.002 });
const cell = { areaCm2: 0.0707 };

describe('Γ of a slow film from the ip–v slope', () => {
  it.each([
    [0.5, 0.73],
    [0.3, 0.44],
  ])('αc = %f, k_s = 1 1/s, 2–50 V/s: Γ within 3 % by the irreversible form (the Nernstian form gives %f of it); Laviron αc within 0.02; k_s within 5 %', (alpha, nernstianShare) => {
    const { couple } = analyseSimulatedSeries(film(alpha, 1), [2, 5, 20, 50], cell, { noiseA: 1e-9 });
    const s = couple.surface!;
    expect(s.coverageFromSlopeForm).toBe('laviron-irreversible');
    expect(Math.abs(s.coverageFromSlopeMolPerCm2! / 1e-10 - 1)).toBeLessThan(0.03);
    expect(Math.abs(s.lavironAlpha! - alpha)).toBeLessThan(0.02);
    expect(couple.alpha).toBeCloseTo(s.lavironAlpha!, 12);
    expect(Math.abs(s.ksPerS! - 1)).toBeLessThan(0.05);
    const nernstian = surfaceCoverageFromSlope(s.fit!.slope, { electronCount: 1, areaCm2: 0.0707 });
    expect(Math.abs(nernstian / 1e-10 - nernstianShare)).toBeLessThan(0.03);
    expect(couple.eHalfMeaning).toMatch(/not E°′/);
    expect(couple.diagnostics.join(' ')).toMatch(/Laviron αc = 0\.\d+ \(cathodic transfer coefficient/);
  });

  // Laviron 1979 (from memory): an irreversible oxidation peak has ψ = (1 − αc)/e, above the Nernstian
  // 1/4 when 1 − αc > 0.68; such files must not pass for Nernstian ones by their peak height.
  it('oxidation first, αc = 0.3, k_s = 10 1/s, 2–50 V/s: no Nernstian slope Γ, the irreversible one within 3 %', () => {
    const { couple } = analyseSimulatedSeries({ ...film(0.3, 10), startV: -0.8, switchV: 1.0, areaCm2: 0.0707 }, [2, 5, 20, 50], cell, { noiseA: 1e-9 });
    expect(couple.surface?.coverageFromSlopeForm).toBe('laviron-irreversible');
    expect(Math.abs(couple.surface!.coverageFromSlopeMolPerCm2! / 1e-10 - 1)).toBeLessThan(0.03);
  });

  // A series with one Nernstian and one slow file: neither form holds for the slope, so no slope Γ.
  it('mixed regimes (k_s = 10 1/s at 0.3, 1, 10 V/s): no slope Γ, and why', () => {
    const { couple } = analyseSimulatedSeries(film(0.5, 10), [0.3, 1, 10], cell, { noiseA: 1e-9 });
    expect(couple.surface?.coverageFromSlopeMolPerCm2).toBeNull();
    expect(couple.surface?.coverageFromSlopeNote).toMatch(/mix regimes/);
    expect(Math.abs(couple.surface!.coverageFromChargeMolPerCm2! / 1e-10 - 1)).toBeLessThan(0.03);
  });
});
