/**
 * The forward peak's line with the wave's own foot taken out, on this project's simulator (planar
 * diffusion, no charging current: the true baseline is zero) against Randles–Ševčík,
 * ip = 0.4463·nFAC·(nFvD/RT)^½ (Nicholson & Shain, Anal. Chem. 36 (1964) 706, Table I; Bard &
 * Faulkner 2nd ed. (2001) eq. 6.2.19).
 */
import { describe, expect, it } from 'vitest';
import { FARADAY_C_PER_MOL as F, inverseThermalVoltagePerV } from '../constants';
import { analyzeVoltammogram } from '../analysis/analyzeVoltammogram';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import { reversiblePeakChi, reversibleWaveShape } from './reversibleWaveShape';

const A = 0.0707;
const C = 1e-6;
const D = 1e-5;
const cell = { k0CmPerS: Infinity, formalPotentialV: 0.2, switchV: -0.1, areaCm2: A, concentrationOMolPerCm3: C, diffusionOCm2PerS: D, diffusionRCm2PerS: D, scanRateVPerS: 0.1 };
const randlesSevcikA = 0.4463 * F * A * C * Math.sqrt(inverseThermalVoltagePerV(298.15) * 0.1 * D);
const forwardPeak = (startV: number, extra: object = {}) => {
  const peak = analyzeVoltammogram(simulatedVoltammogram({ ...cell, startV, ...extra })).cycles[0]!.peaks.find((p) => p.direction === 'cathodic');
  expect(peak).toBeDefined();
  return peak!;
};

describe('lineUnderOwnFoot', () => {
  // Derived from Nicholson & Shain's eq. 24: for ξ ≫ 1 its right side is e^(−ξ)(1 − e^(−ξ) …),
  // solved to first order by √π·χ = e^(−ξ); within 1.5 % from ξ = 5 (the table's own steps included).
  it('uses a shape whose foot is e^(−ξ)/0.4463 of the peak', () => {
    for (const xi of [5, 6, 7, 8, 9]) expect(Math.abs((reversibleWaveShape(xi) * Math.sqrt(Math.PI) * reversiblePeakChi()) / Math.exp(-xi) - 1)).toBeLessThan(0.015);
  });

  // A plain line through the foot read ip 0.9 % low from 250 mV and 3 % low from 200 mV.
  it.each([0.4, 0.45, 0.5, 0.7])('a sweep started at %f V (E½ 0.2 V) gives ipc within 0.3 % of Randles–Ševčík', (startV) => {
    const peak = forwardPeak(startV);
    expect(Math.abs(peak.heightA / randlesSevcikA - 1)).toBeLessThan(0.003);
    expect(peak.baseline.description).toContain("less the wave's own foot, from the reversible wave's own shape");
  });

  // Bard & Faulkner eq. 6.2.20 (from the same table): Ep = E½ − 1.109 RT/nF = 171.5 mV here.
  it('puts Ep where the reversible wave has it, even 200 mV from the start', () => {
    expect(forwardPeak(0.4).potentialV).toBeCloseTo(0.2 - 1.109 / inverseThermalVoltagePerV(298.15), 3);
  });

  it('leaves a surface-confined wave to the plain line (its tail does not stay up)', () => {
    const film = analyzeVoltammogram(simulatedVoltammogram({ mechanism: 'surface', surfaceRatePerS: 20, coverageMolPerCm2: 1e-10, formalPotentialV: 0.2, startV: 0.6, switchV: -0.2, scanRateVPerS: 2, areaCm2: A }));
    const peaks = film.cycles[0]!.peaks;
    expect(peaks.length).toBe(2);
    for (const p of peaks) expect(p.baseline.description).not.toContain('foot');
  });

  // Bard & Faulkner 2nd ed. eq. 6.3.8 (Nicholson & Shain 1964, Table III): a totally irreversible
  // peak is 0.4958·nFAC·(αnFvD/RT)^½. Here k° = 1e-4 cm/s, α = 0.5 puts Ep 235 mV below E°′,
  // at −35 mV (eq. 6.3.7), and the return peak at +429 mV. Its foot rises as e^(−αξ), twice as
  // slowly as a reversible wave's: a plain line read ip 1 % low from a start 500 mV before Ep.
  // A sweep that turns back before the return peak has no couple to place the wave: plain line.
  it.each([0.5, 0.8])('an irreversible wave started %f V before its Ep gives ipc within 0.3 % of 0.4958·nFAC(αFvD/RT)^½', (before) => {
    const irreversibleA = 0.4958 * F * A * C * Math.sqrt(0.5 * inverseThermalVoltagePerV(298.15) * 0.1 * D);
    const peak = forwardPeak(-0.035 + before, { k0CmPerS: 1e-4, alpha: 0.5, formalPotentialV: 0.2, switchV: -0.6 });
    expect(Math.abs(peak.heightA / irreversibleA - 1)).toBeLessThan(0.003);
    expect(peak.baseline.description).toContain("less the wave's own foot, from a quasi-reversible wave's shape, ψ ≈ 0.0097 with α = 0.5");
  });

  it('keeps the plain line for a slow wave with no return peak, and for one whose width says α is not 0.5', () => {
    const alone = forwardPeak(-0.035 + 0.3, { k0CmPerS: 1e-4, alpha: 0.5, formalPotentialV: 0.2, switchV: -0.6 });
    expect(alone.baseline.description).not.toContain('foot');
    const lopsided = forwardPeak(0.4, { k0CmPerS: 0.003, alpha: 0.3 });
    expect(lopsided.baseline.description).not.toContain('foot');
  });

  // No closed form for a quasi-reversible peak: the same wave started 700 mV before E°′ (its foot
  // there below 1e-5 of the peak) is the reference. A plain line read it 3 % low from 200 mV and 10 % from 150 mV.
  it.each([0.35, 0.4, 0.45])('a quasi-reversible wave (ψ ≈ 0.9) started at %f V (E°′ 0.2 V) gives the ipc of a sweep started 700 mV before within 1 %', (startV) => {
    const quasi = { k0CmPerS: 0.01, alpha: 0.5 };
    const far = forwardPeak(0.9, quasi);
    const near = forwardPeak(startV, quasi);
    expect(Math.abs(near.heightA / far.heightA - 1)).toBeLessThan(startV > 0.36 ? 0.003 : 0.01);
    expect(near.baseline.description).toContain("less the wave's own foot, from a quasi-reversible wave's shape");
  });
});
