import { describe, expect, it } from 'vitest';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import { analyzeVoltammogram } from '../analysis/analyzeVoltammogram';
import { analyzeSeries } from '../analysis/analyzeSeries';
import { followUpRateConstant } from './followUpRateConstant';

const ec = (kf: number, v: number, n = 1) =>
  simulatedVoltammogram({ mechanism: 'EC', k0CmPerS: 1, electronCount: n, followUpRatePerS: kf, scanRateVPerS: v, startV: 0.4, switchV: -0.3, doubleLayerFPerCm2: 20e-6 }, { noiseA: 5e-9, seed: 5 });

describe('followUpRateConstant', () => {
  // Nicholson & Shain, Anal. Chem. 36 (1964) 706 (from memory): the ratio depends on λ = k_f·RT/(nFv)
  // only, so the same k_f must come back at every scan rate; 10 % covers charging (20 µF/cm²) and noise.
  it.each([
    [1, 0.1],
    [1, 0.5],
    [5, 0.5],
    [0.3, 0.05],
  ])('k_f = %f 1/s at %f V/s comes back within 10 per cent', (kf, v) => {
    const c = analyzeVoltammogram(ec(kf, v)).cycles[0]!.couples.find((x) => x.deltaEpV !== null)!;
    const r = followUpRateConstant({ ratio: c.nicholsonRatio!, switchPastHalfWaveV: Math.abs(c.switchPotentialV! - c.eHalfV!), scanRateVPerS: v });
    expect(Math.abs(r.rateConstantPerS! / kf - 1)).toBeLessThan(0.1);
  });

  // Same source; n = 2 halves λ at equal k_f and v (λ = k_f·RT/(nFv)).
  it('n = 2: k_f = 1 1/s at 0.2 V/s comes back within 10 %', () => {
    const c = analyzeVoltammogram(ec(1, 0.2, 2), { electronCount: 2 }).cycles[0]!.couples.find((x) => x.deltaEpV !== null)!;
    const r = followUpRateConstant({ ratio: c.nicholsonRatio!, switchPastHalfWaveV: Math.abs(c.switchPotentialV! - c.eHalfV!), scanRateVPerS: 0.2 }, { electronCount: 2 });
    expect(Math.abs(r.rateConstantPerS! / 1 - 1)).toBeLessThan(0.1);
  });

  it('refuses ratios outside the working curve and bad input', () => {
    expect(followUpRateConstant({ ratio: 0.999, switchPastHalfWaveV: 0.3, scanRateVPerS: 0.1 }).reason).toMatch(/too little loss/);
    expect(followUpRateConstant({ ratio: 0.01, switchPastHalfWaveV: 0.3, scanRateVPerS: 0.1 }).reason).toMatch(/nearly gone/);
    expect(() => followUpRateConstant({ ratio: Number.NaN, switchPastHalfWaveV: 0.3, scanRateVPerS: 0.1 })).toThrow(/ratio/);
  });

  // A scan-rate series of an EC couple reports one k_f (seriesFollowUp in analysis/seriesKinetics.ts).
  it('series of four scan rates: k_f = 1 1/s within 10 %', () => {
    const files = [0.1, 0.2, 0.5, 1].map((v) => ({ fileName: `ec_${v}`, scanRateVPerS: v, analysis: analyzeVoltammogram(ec(1, v)) }));
    const c = analyzeSeries(files).couples[0]!;
    expect(c.verdict.category).toBe('chemically-coupled');
    expect(Math.abs(c.followUp!.rateConstantPerS! - 1)).toBeLessThan(0.1);
    expect(c.diagnostics.join(' ')).toMatch(/k_f = (9\.\d+e-1|1\.\d+e\+0) 1\/s/);
  });
});
