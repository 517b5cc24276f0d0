import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import { describeReferences, offsetFor, planReferences } from './runReference';

const v = simulatedVoltammogram({});

describe('planReferences', () => {
  // Bard & Faulkner inside cover (check-values.md §10): SCE 0.2412 V, Ag/AgCl sat. 0.197 V vs SHE.
  it('takes each file\'s own scale from its metadata and converts through SHE', () => {
    const inputs = [{ fileName: 'a', voltammogram: v, referenceElectrode: 'SCE' }, { fileName: 'b', voltammogram: v, referenceElectrode: 'Ag/AgCl' }];
    const plan = planReferences(inputs, { outputReference: 'SHE' });
    expect(offsetFor(plan, 0)).toBeCloseTo(0.2412, 12);
    expect(offsetFor(plan, 1)).toBeCloseTo(0.197, 12);
    expect(describeReferences(plan).warnings.some((w) => /liquid junction/.test(w.message))).toBe(true);
  });
  it('names the file and the fix when a scale is unknown', () => {
    const inputs = [{ fileName: 'mystery.csv', voltammogram: v, referenceElectrode: 'home-made wire' }];
    expect(() => planReferences(inputs, { outputReference: 'SCE' })).toThrow(AnalysisError);
    expect(() => planReferences(inputs, { outputReference: 'SCE' })).toThrow(/mystery\.csv.*home-made wire.*--from-ref/);
    expect(offsetFor(planReferences(inputs, {}), 0)).toBe(0);
  });
  // Connelly & Geiger 1996 (from memory): typical Fc⁺/Fc +0.40 V vs SCE — flagged as typical.
  it('warns when the Fc scale rests on the typical value', () => {
    const plan = planReferences([{ fileName: 'a', voltammogram: v, referenceElectrode: 'SCE' }], { outputReference: 'Fc' });
    expect(offsetFor(plan, 0)).toBeCloseTo(-0.4, 12);
    expect(describeReferences(plan).warnings.some((w) => /typical/.test(w.message))).toBe(true);
  });
});
