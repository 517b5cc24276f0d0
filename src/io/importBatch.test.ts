/**
 * The asynchronous paths: progress rises to 1, an abort stops the import, and a batch keeps
 * going past a bad file without touching the good ones. Data: invented (test/fixtures/layoutWriter).
 */
import { describe, expect, it } from 'vitest';
import { makeSyntheticCv, writeLayout } from '../../test/fixtures/layoutWriter';
import { importBatch } from './importBatch';
import { importVoltammogram, importVoltammogramAsync } from './importVoltammogram';

const cv = makeSyntheticCv({ cycles: 3, stepV: 0.0001 });
const text = writeLayout(cv, { delimiter: '\t', header: { potential: 'E (V)', current: 'I (A)' }, columns: ['potential', 'current'] });

describe('importVoltammogramAsync and importBatch', () => {
  it('gives the same numbers as the synchronous import, with rising progress ending at 1', async () => {
    const seen: number[] = [];
    const r = await importVoltammogramAsync('a.txt', text, { onProgress: (p) => seen.push(p) });
    expect(r.measurement.potentialV).toEqual(importVoltammogram('a.txt', text).measurement.potentialV);
    expect(seen.length).toBeGreaterThan(2);
    expect(seen.every((p, i) => i === 0 || p >= (seen[i - 1] as number))).toBe(true);
    expect(seen[seen.length - 1]).toBe(1);
  });

  it('an aborted import rejects with the abort reason', async () => {
    const ctrl = new AbortController();
    ctrl.abort(new Error('user cancelled'));
    await expect(importVoltammogramAsync('a.txt', text, { signal: ctrl.signal })).rejects.toThrow('user cancelled');
  });

  it('a batch of 120 files with one bad file: 119 results, one ImportError in its slot', async () => {
    const small = writeLayout(makeSyntheticCv({ cycles: 1, stepV: 0.005 }), { delimiter: ',', header: { potential: 'E (V)', current: 'I (A)' }, columns: ['potential', 'current'] });
    const files = Array.from({ length: 120 }, (_, i) => ({ name: `run${i + 1}_20mVs.txt`, data: i === 57 ? 'no numbers here' : small }));
    let last = 0;
    const items = await importBatch(files, { onProgress: (p) => (last = p) });
    expect(items.filter((x) => x.ok).length).toBe(119);
    const bad = items[57];
    expect(bad?.ok).toBe(false);
    if (bad && !bad.ok) expect(bad.error.code).toBe('NO_TABLE');
    expect(last).toBe(1);
    const good = items[0];
    if (good?.ok) expect(good.result.measurement.scanRateVPerS).toBeCloseTo(0.02, 12);
  });
});
