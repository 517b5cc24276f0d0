/**
 * fitWithComparison's own part (the fits themselves are tested in fitVoltammograms.*.test.ts and
 * compareFitModels.test.ts): refusals before any fit, and errors that name the file instead of
 * the voltammogram's number. Input from the validated simulator (fitTestSupport.ts).
 */
import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { noisyVoltammograms, TEST_CELL } from './fitTestSupport';
import { fitWithComparison } from './fitWithComparison';

const records = noisyVoltammograms({ startV: 0.45, switchV: -0.35, stepV: 0.004 }, [{ formalPotentialV: 0.05 }], [0.1, 1]);

describe('fitWithComparison', () => {
  it('refuses to weigh E against EC for a surface film, before fitting anything', () => {
    let models = 0;
    expect(() => fitWithComparison({ records, cell: TEST_CELL }, { mechanism: 'surface' }, { compare: 'mechanism', onModel: () => models++ })).toThrow(/surface/);
    expect(models).toBe(0);
  });

  it('names the file where the core names the voltammogram', () => {
    const noRate = [records[0]!, { ...records[1]!, scanRateVPerS: null }];
    let err: unknown = null;
    try {
      fitWithComparison({ records: noRate, cell: TEST_CELL }, {}, { recordNames: ['slow.csv', 'fast.csv'] });
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(AnalysisError);
    expect((err as AnalysisError).message).toContain('"fast.csv"');
    expect((err as AnalysisError).message).not.toMatch(/voltammogram 2/);
  });
});
