/**
 * Results sheet through the store and the worker handler: provenance, the display scale and each
 * file's own windows reach the sheet, and its numbers are the screen's to the last digit (one run
 * model). Scale offsets: Ag/AgCl (3 M KCl) 0.210 V (handbook value, see the reference table) and
 * SCE 0.2412 V vs SHE (Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001), inside cover), so
 * E(vs SCE) = E(vs Ag/AgCl 3 M) − 0.0312 V.
 */
import { describe, expect, it } from 'vitest';
import { createInThreadClient } from '../worker/inThreadClient';
import { createHalfwaveStore } from './store';
import { simulatedCsv } from './testSupport';

const csv = (scanRateVPerS: number) => simulatedCsv(scanRateVPerS, 't/s,E/V,I/A');

/** Rows of the '# table: NAME' block as objects keyed by its header. */
function table(sheet: string, name: string): Record<string, string>[] {
  const block = sheet.split('\n\n').find((b) => b.startsWith(`# table: ${name}`));
  const [, header, ...rows] = (block ?? '').trim().split('\n');
  const keys = (header ?? '').split(',');
  return rows.map((r) => Object.fromEntries(r.split(',').map((v, i) => [keys[i] ?? `c${i}`, v])));
}

describe('results sheet of a group', () => {
  it('carries provenance, converts to the display scale and keeps per-file windows', async () => {
    const store = createHalfwaveStore({ client: createInThreadClient(), storage: null });
    const ids = await store.getState().addFiles([{ name: 'a-50mVs.csv', data: csv(0.05) }, { name: 'b-200mVs.csv', data: csv(0.2) }], 'sim');
    await store.getState().updateSettings((s) => ({ ...s, reference: { ...s.reference, fileReference: 'AgCl-3M', displayReference: 'SCE' } }));
    // A cathodic window (file scale) that holds the forward peak near −0.03 V.
    await store.getState().updateFileSettings(ids[0] as string, (f) => ({ ...f, peakWindows: [{ direction: 'cathodic', fromV: -0.2, toV: 0.1 }] }));
    const sheet = await store.getState().exportGroup('sim', 'csv');

    const sha = store.getState().files[ids[0] as string]?.sha256 as string;
    expect(sheet).toContain(sha);
    expect(sheet).toMatch(/^# results sheet,Halfwave,\d+\.\d+\.\d+/);
    const couples = table(sheet, 'raw couples');
    expect(couples.map((c) => c.file)).toEqual(['a-50mVs.csv', 'b-200mVs.csv']);
    for (const c of couples) {
      // Simulated E°′ = 0 V on the file scale → −0.0312 V vs SCE; ±3 mV for peak fitting.
      expect(Math.abs(Number(c.E_half_V) + 0.0312)).toBeLessThan(0.003);
    }
    const onScreen = store.getState().results[ids[0] as string]?.run?.analysis.cycles[0]?.couples[0]?.eHalfV as number;
    expect(Math.abs(onScreen + 0.0312)).toBeLessThan(0.003);
    const json = JSON.parse(await store.getState().exportGroup('sim', 'json')) as { files: Array<{ cycles: Array<{ couples: Array<{ Ehalf: number }> }> }> };
    expect(json.files[0]?.cycles[0]?.couples[0]?.Ehalf).toBe(onScreen);
    expect(table(sheet, 'raw series')).toHaveLength(1);
  });

  it('reports a group without files as an error', async () => {
    const store = createHalfwaveStore({ client: createInThreadClient(), storage: null });
    await expect(store.getState().exportGroup('nothing here', 'json')).rejects.toThrow(/at least one file/);
  });
});
