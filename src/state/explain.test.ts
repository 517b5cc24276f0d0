/**
 * Each explanation states the inputs its number was computed from: D recomputed by hand from the
 * slope and the cell values the explanation lists must equal the series' D. Randles–Ševčík,
 * reversible: ip = 0.4463·nFAC·(nFvD/RT)^½ (Bard & Faulkner, Electrochemical Methods, 2nd ed.
 * (2001), §6.2), so D = (RT/nF)·(slope/(0.4463·nFAC))²; F and R: CODATA 2018.
 */
import { describe, expect, it } from 'vitest';
import { analyzeRun } from '../core/analysis/analyzeRun';
import { simulatedVoltammogram } from '../core/peaks/simulatedVoltammogram';
import { explainCouple } from './explain';

const F = 96485.33212;
const R = 8.314462618;

describe('explainCouple', () => {
  const files = [0.05, 0.1, 0.2, 0.5].map((v, k) => ({ fileName: `f${k}.csv`, series: 's', voltammogram: simulatedVoltammogram({ k0CmPerS: Infinity, scanRateVPerS: v }, { noiseA: 2e-8, seed: 11 + k }) }));
  const run = analyzeRun({ files, cells: { s: { areaCm2: 0.0707, concentrationMolPerCm3: 1e-6 } } });
  const series = run.series[0]!;
  const couple = series.analysis.couples[0]!;
  const x = explainCouple(series, couple);

  it('D: formula, source, and inputs that give back the same D by hand', () => {
    expect(x.D?.formula).toContain('0.4463');
    expect(x.D?.source).toContain('Bard & Faulkner');
    const inputs = Object.fromEntries(x.D?.inputs ?? []);
    expect(inputs['A (electrode area)']).toBe('0.0707 cm²');
    expect(inputs['C (bulk concentration)']).toBe('1 mM');
    const slopeA = Number(/^([\d.]+) µA/.exec(inputs.slope ?? '')?.[1]) * 1e-6;
    const byHand = (R * 298.15 / F) * (slopeA / (0.4463 * F * 0.0707 * 1e-6)) ** 2;
    // The slope is printed to four significant digits: agreement to 0.1 %.
    expect(Math.abs(byHand / (couple.diffusion?.diffusionCm2PerS as number) - 1)).toBeLessThan(1e-3);
  });

  it('gives no explanation for a number that was not determined', () => {
    expect(x.gamma).toBeUndefined();
    expect(x.ks).toBeUndefined();
    expect(x.Cd).toBeUndefined();
  });
});
