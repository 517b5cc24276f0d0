/**
 * Model choice between E and EC on simulated EC series (seeded noise, charging, R_u). Oracle: the
 * simulator's EC mechanism, validated in src/core/simulation/simulateCv.ec.test.ts against
 * Nicholson & Shain, Anal. Chem. 36 (1964) 706 (the return/forward ratio depends on
 * λ = k_f·RT/(nFv) alone). Criteria: Akaike, IEEE Trans. Autom. Control 19 (1974) 716; Schwarz,
 * Ann. Stat. 6 (1978) 461; grades: Kass & Raftery, J. Am. Stat. Assoc. 90 (1995) 773.
 */
import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { compareFitModels, mechanismCandidates, ohmicCandidates } from './compareFitModels';
import { estimateOf, noisyVoltammograms, relativeError, TEST_CELL } from './fitTestSupport';

const WAVEFORM = { startV: 0.4, switchV: -0.3, stepV: 0.002, uncompensatedOhm: 50, doubleLayerFPerCm2: 20e-6 };
const couple = (kf: number) => [{ mechanism: 'EC' as const, formalPotentialV: 0.05, k0CmPerS: 1, followUpRatePerS: kf, diffusionOCm2PerS: 1e-5, diffusionRCm2PerS: 1e-5 }];
const base = { start: { shared: { uncompensatedOhm: 50 } } };

describe('compareFitModels: E against EC', () => {
  // λ = k_f·RT/(Fv) from 1.0 down to 0.05: the return peak shrinks visibly (Nicholson & Shain 1964).
  it('k_f = 2 s⁻¹ at 0.05–1 V/s: EC is recommended, very strongly, and its k_f is within 20 %', () => {
    const records = noisyVoltammograms(WAVEFORM, couple(2), [0.05, 0.1, 0.3, 1]);
    const c = compareFitModels({ records, cell: TEST_CELL }, mechanismCandidates(base));
    expect(c.preferred).toBe('EC');
    expect(c.evidence).toBe('very strong');
    expect(c.recommendation).toMatch(/^EC is preferred over E: ΔBIC [\d.]+ \(very strong evidence\)/);
    const ec = c.candidates.find((x) => x.label === 'EC');
    expect(relativeError(estimateOf(ec!.result, 'followUpRatePerS').value, 2)).toBeLessThan(0.2);
    expect(c.candidates[0]?.deltaBic).toBe(0);
  });

  // λ ≤ 2.6e-5 (k_f·t over the whole scan < 0.1 %): the loss is below the noise, so the extra
  // parameter does not pay for itself (BIC's ln m penalty) and k_f has only an upper bound.
  it('k_f = 0.001 s⁻¹ at 1–5 V/s: E is recommended, and the EC fit gives k_f only as an upper bound', () => {
    const records = noisyVoltammograms(WAVEFORM, couple(0.001), [1, 2, 5]);
    const c = compareFitModels({ records, cell: TEST_CELL }, mechanismCandidates(base));
    expect(c.preferred).toBe('E');
    const ec = c.candidates.find((x) => x.label === 'EC');
    expect(estimateOf(ec!.result, 'followUpRatePerS').status).toBe('upper-bound');
    expect(ec!.result.notes.some((n) => /^k_f < [\d.e-]+ 1\/s at 95 %/.test(n))).toBe(true);
  });

  it('builds R_u-free and R_u-held candidates, and refuses a comparison of one model', () => {
    const [held, fitted] = ohmicCandidates({ ...base, free: ['formalPotentialV', 'uncompensatedOhm'] });
    expect(held?.options.free).toEqual(['formalPotentialV']);
    expect(fitted?.options.free).toEqual(['formalPotentialV', 'uncompensatedOhm']);
    expect(held?.label).toBe('R_u held at 50 Ω');
    expect(() => compareFitModels({ records: [], cell: TEST_CELL }, [held!])).toThrow(AnalysisError);
  });
});
