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
    expect(tsv[0]).toBe('file\tseries\tv / (V/s)\tcycle\tcouple\tEpa / V vs SCE\tEpc / V vs SCE\tE½ / V vs SCE\tΔEp / mV\tipa / µA\tipc / µA\tip return / ip forward\t|Ep − Ep/2| forward / mV\treading\twarnings');
    const first = tsv[1]!.split('\t');
    expect(first[0]).toBe('slow_050mVs.csv');
    expect(first[2]).toBe('0.05');
    // No binary-float tails: at most six significant digits.
    for (const cell of first.slice(5, 13)) expect(cell.replace(/^-/, '').replace('.', '').replace(/^0+/, '').length).toBeLessThanOrEqual(6);
  });

  it('says which rows are current densities: µA cm⁻² in the heads when all are, a currents column in a mix', async () => {
    const store = createHalfwaveStore({ client: createInThreadClient(), storage: null });
    // The same simulated couple written as a density (A/cm² over its 0.0707 cm²), with no area stated.
    const [head, ...rows] = simulatedCsv(0.1).trim().split('\n');
    const density = ['Time (s),Potential (V),j (A/cm2)', ...rows.map((r) => {
      const [t, e, i] = r.split(',').map(Number) as [number, number, number];
      return `${t},${e},${i / 0.0707}`;
    })].join('\n') + '\n';
    expect(head).toBe('Time (s),Potential (V),Current (A)');
    await store.getState().addFiles([{ name: 'film_j.csv', data: density }], 'dens');
    await store.getState().addFiles([{ name: 'disk_i.csv', data: simulatedCsv(0.1) }], 'curr');
    const s = store.getState();
    const dens = resultsRows(s, 'dens');
    expect(dens.map((r) => r.perArea)).toEqual([true]);
    expect(resultsTsv(dens, 'SCE').split('\n')[0]).toContain('\tipa / µA cm⁻²\tipc / µA cm⁻²\t');
    const all = resultsRows(s, null);
    const tsv = resultsTsv(all, 'SCE').split('\n').map((l) => l.split('\t'));
    expect(tsv[0]?.at(-1)).toBe('currents');
    expect(tsv[0]?.[9]).toBe('ipa / µA or µA cm⁻²');
    expect(tsv.slice(1, 3).map((l) => [l[0], l.at(-1)])).toEqual([['film_j.csv', 'per cm²'], ['disk_i.csv', 'current']]);
    // The density is the current over the area, j = i/A (definition, common practice, no source): ipc/A to 0.1 %.
    const curr = all.find((r) => r.fileName === 'disk_i.csv');
    expect(Math.abs((all[0]?.ipcA as number) * 0.0707 / (curr?.ipcA as number) - 1)).toBeLessThan(1e-3);
  });
});
