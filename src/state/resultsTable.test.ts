/**
 * The results table across files, through the store's actions with the in-thread client: two
 * simulated files of one series (our simulator: Nernstian couple, E°′ = 0 V, 1 mM, 0.0707 cm²,
 * D = 1e-5 cm²/s), rows per file and cycle, sorting, and the tab-separated text.
 */
import { describe, expect, it } from 'vitest';
import { createInThreadClient } from '../worker/inThreadClient';
import { resultsRows, resultsTsv } from './resultsTable';
import { createHalfwaveStore } from './store';
import { simulatedCsv } from './testSupport';

describe('results across files', () => {
  it('gives one row per file and couple, sorts by any column and copies as TSV with units', async () => {
    const store = createHalfwaveStore({ client: createInThreadClient(), storage: null });
    await store.getState().addFiles([{ name: 'slow_050mVs.csv', data: simulatedCsv(0.05) }, { name: 'fast_500mVs.csv', data: simulatedCsv(0.5) }], 'sim');
    const s = store.getState();
    const rows = resultsRows(s, 'sim');
    expect(rows.map((r) => r.fileName)).toEqual(['slow_050mVs.csv', 'fast_500mVs.csv']);
    // Randles–Ševčík: ip ∝ v½ (Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001), §6.2),
    // so ten times the scan rate gives √10 = 3.16 times the peak current (±3 %).
    expect(Math.abs((rows[1]!.ipcA as number) / (rows[0]!.ipcA as number) / Math.sqrt(10) - 1)).toBeLessThan(0.03);
    const byRate = resultsRows(s, 'sim', { column: 'scanRate', descending: true });
    expect(byRate.map((r) => r.scanRateVPerS)).toEqual([0.5, 0.05]);
    expect(resultsRows(s, 'other')).toEqual([]);
    const tsv = resultsTsv(rows, 'SCE').split('\n');
    expect(tsv[0]).toBe('file\tseries\tv / (V/s)\tcycle\tcouple\tEpa / V vs SCE\tEpc / V vs SCE\tE½ / V vs SCE\tΔEp / mV\tipa / µA\tipc / µA\tipc/ipa or ipa/ipc (return/forward)\t|Ep − Ep/2| forward / mV\treading\twarnings');
    const first = tsv[1]!.split('\t');
    expect(first[0]).toBe('slow_050mVs.csv');
    expect(first[2]).toBe('0.05');
    // No binary-float tails: at most six significant digits.
    for (const cell of first.slice(5, 13)) expect(cell.replace(/^-/, '').replace('.', '').replace(/^0+/, '').length).toBeLessThanOrEqual(6);
  });
});
