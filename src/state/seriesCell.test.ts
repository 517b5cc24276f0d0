/**
 * Per-series cells through the store, without React, with the in-thread analysis client.
 * Input: our simulator's Nernstian couple (1 mM, 0.0707 cm², D = 1e-5 cm²/s, n = 1, 25 °C).
 * Numbers are checked with the Randles–Ševčík relation i_p = 0.4463·nFAC·(nFvD/RT)^½ (Bard &
 * Faulkner, Electrochemical Methods, 2nd ed. (2001), §6.2): with the slope
 * fixed by the data, D ∝ 1/(A·C)², so the cell a series is given shows up in D as that square.
 */
import { describe, expect, it, vi } from 'vitest';
import { createInThreadClient } from '../worker/inThreadClient';
import type { RunInput } from '../core/analysis/runTypes';
import type { RequestInput, RequestOutput } from '../worker/protocol';
import { displayScale } from './display';
import { fileRunRequest, runAheadSources, runInputOf } from '../run/runInput';
import { resolveCell, selectSeriesCell } from '../run/seriesCell';
import { openSessionText, saveSessionText } from './sessionActions';
import { createHalfwaveStore } from './store';
import { simulatedCsv } from './testSupport';
import { planTheory } from './theory';
import type { HalfwaveStore } from './types';

const RATES = [0.05, 0.1, 0.2];
const csv = (v: number) => simulatedCsv(v, 't/s,E/V,I/A');
const PREAMBLE = [
  'Sample: 2.0 mM ferrocene methanol in 0.1 M KCl',
  'Working electrode: gold disk, 2 mm (0.0314 cm2)',
  'Reference electrode: Ag/AgCl (sat. KCl)',
  'Temperature = 30 °C',
  '',
].join('\n');

function newStore(): HalfwaveStore {
  return createHalfwaveStore({ client: createInThreadClient(), storage: null });
}

async function loadSeries(store: HalfwaveStore, group: string, preamble = ''): Promise<string[]> {
  return store.getState().addFiles(RATES.map((v) => ({ name: `${group}-${v}.csv`, data: preamble + csv(v) })), group);
}

async function diffusion(store: HalfwaveStore, group: string): Promise<number> {
  await store.getState().analyzeGroup(group);
  const d = store.getState().series[group]?.result?.analysis.couples[0]?.diffusion?.diffusionCm2PerS;
  if (d === undefined) throw new Error(`no D for ${group}`);
  return d;
}

describe('inheritance of a new series', () => {
  it('takes area, concentration, temperature and reference from the files’ preambles, the rest from the defaults', async () => {
    const store = newStore();
    await loadSeries(store, 'gold', PREAMBLE);
    await loadSeries(store, 'plain');
    const gold = resolveCell(store.getState(), 'gold');
    // 2.0 mM = 2e-6 mol/cm³ read by the importer, back in mM; 303.15 K → 30 °C (SI Brochure 2019).
    expect(gold.cell).toMatchObject({ areaCm2: 0.0314, concentrationMM: 2, temperatureC: 30, fileReference: 'AgCl-sat', electronCount: 1 });
    expect(gold.origin).toMatchObject({ areaCm2: 'header', concentrationMM: 'header', temperatureC: 'header', fileReference: 'header', electronCount: 'default' });
    expect(gold.evidence.areaCm2).toMatch(/gold-0.05.csv, line 2: “Working electrode: gold disk, 2 mm \(0.0314 cm2\)”/);
    expect(gold.fileCount).toBe(3);
    const plain = resolveCell(store.getState(), 'plain');
    expect(plain.cell).toMatchObject({ areaCm2: 0.0707, concentrationMM: 1, temperatureC: 25, fileReference: 'AgCl-3M' });
    expect(Object.values(plain.origin).every((o) => o === 'default')).toBe(true);
  });

  it('a later file whose preamble gives the series its temperature has the earlier files analysed again at it', async () => {
    const inner = createInThreadClient();
    const seen: (number | undefined)[] = [];
    const store = createHalfwaveStore({
      storage: null,
      client: {
        transport: inner.transport,
        dispose: () => inner.dispose(),
        // Every analysis of a file: made where the file is read (the import's run ahead, rebuilt
        // here from the same snapshot), or asked for on its own.
        request: async (type, input, options) => {
          const out = await inner.request(type, input, options);
          const kelvin = (run: RunInput) => Object.values(run.cells ?? {})[0]?.temperatureK;
          if (type === 'import') {
            const i = input as RequestInput<'import'>;
            const o = out as RequestOutput<'import'>;
            if (i.ahead && o.ahead) seen.push(kelvin(fileRunRequest(runAheadSources(i.ahead, { fileName: i.fileName, measurement: o.measurement, sha256: o.sha256, warnings: o.warnings }), i.ahead.fileId).run));
          }
          if (type === 'runFiles') seen.push(kelvin((input as RequestInput<'runFiles'>).run));
          return out;
        },
      },
    });
    await store.getState().addFiles([{ name: 'plain.csv', data: csv(0.1) }], 'warm');
    await store.getState().addFiles([{ name: 'stated.csv', data: PREAMBLE + csv(0.2) }], 'warm');
    // The earlier file is analysed again in the background; wait for that request, not for a fixed time.
    await vi.waitFor(() => expect(seen).toHaveLength(3), { timeout: 20_000, interval: 10 });
    // 30 °C → 303.15 K (BIPM, SI Brochure 9th ed. 2019); the first file ran at 25 °C, then again at 30 °C.
    expect(seen).toEqual([298.15, 303.15, 303.15]);
  });

  it('notes files of one series that state different areas, and uses the first', async () => {
    const store = newStore();
    await store.getState().addFiles([
      { name: 'a.csv', data: PREAMBLE + csv(0.1) },
      { name: 'b.csv', data: PREAMBLE.replace('0.0314', '0.0707') + csv(0.2) },
    ], 'mixed');
    const r = resolveCell(store.getState(), 'mixed');
    expect(r.cell.areaCm2).toBe(0.0314);
    expect(r.notes.join(' ')).toMatch(/b\.csv states area \(cm²\) 0\.0707, a\.csv 0\.0314/);
  });
});

describe('the memo the UI reads', () => {
  it('gives the same object while the resolved cell is the same, a new one when it changes', async () => {
    const store = newStore();
    await loadSeries(store, 'disk');
    const first = selectSeriesCell(store.getState(), 'disk');
    await store.getState().addFiles([{ name: 'elsewhere.csv', data: csv(0.1) }], 'other');
    expect(selectSeriesCell(store.getState(), 'disk')).toBe(first);
    store.getState().seedSeriesCell('disk', { areaCm2: 0.02 });
    expect(selectSeriesCell(store.getState(), 'disk').cell.areaCm2).toBe(0.02);
  });

  it('reads the headers again only when the series holds other files, not on every change of the store', async () => {
    const store = newStore();
    const [first] = await loadSeries(store, 'gold', PREAMBLE);
    const before = resolveCell(store.getState(), 'gold');
    // A change that leaves the series' files as they were (a file's progress) gives the same object.
    store.setState((s) => ({ files: { ...s.files, [first as string]: { ...s.files[first as string]!, progress: 0.5 } } }));
    expect(resolveCell(store.getState(), 'gold')).toBe(before);
    // A file that joins the series without a header leaves the values, in a new object counting it.
    await store.getState().addFiles([{ name: 'gold-0.4.csv', data: csv(0.4) }], 'gold');
    const after = resolveCell(store.getState(), 'gold');
    expect(after).not.toBe(before);
    expect(after.fileCount).toBe(4);
    expect(after.cell.areaCm2).toBe(0.0314);
    // A value entered for the series wins over the header, at once.
    store.getState().seedSeriesCell('gold', { areaCm2: 0.05 });
    expect(resolveCell(store.getState(), 'gold').cell.areaCm2).toBe(0.05);
    expect(resolveCell(store.getState(), 'gold').origin.areaCm2).toBe('entered');
    // A file moved to another series (the same file order, a new files object) leaves this one's count at once.
    store.getState().setFileGroup(first as string, 'elsewhere');
    expect(resolveCell(store.getState(), 'gold').fileCount).toBe(3);
    expect(resolveCell(store.getState(), 'elsewhere').fileCount).toBe(1);
  });
});

describe('editing one series', () => {
  it('changes that series’ D by (A·C)² and leaves the other series alone', async () => {
    const store = newStore();
    await loadSeries(store, 'disk');
    await loadSeries(store, 'film');
    const d0 = await diffusion(store, 'disk');
    // The simulator's D = 1e-5 cm²/s is recovered from the slope; ±3 % for peak fitting.
    expect(Math.abs(d0 / 1e-5 - 1)).toBeLessThan(0.03);
    await store.getState().updateSeriesCell('film', (own) => ({ ...own, areaCm2: 0.0314, concentrationMM: 0.5 }));
    const dFilm = await diffusion(store, 'film');
    expect(dFilm / d0).toBeCloseTo(((0.0707 * 1) / (0.0314 * 0.5)) ** 2, 6);
    expect(await diffusion(store, 'disk')).toBeCloseTo(d0, 15);
    expect(store.getState().settings.chemistry.areaCm2).toBe(0.0707);
  });

  it('n, T and Ru of a series reach its files’ own analyses; undo and redo bring the values and numbers back', async () => {
    const store = newStore();
    const [id] = await loadSeries(store, 'disk');
    await loadSeries(store, 'other');
    const key = id as string;
    const dep0 = store.getState().results[key]?.run?.analysis.cycles[0]?.couples[0]?.deltaEpV as number;
    await store.getState().updateSeriesCell('disk', (own) => ({ ...own, resistanceOhm: 500 }));
    expect(store.getState().results[key]?.run?.analysedPotentialV).toBeInstanceOf(Float64Array);
    const other = store.getState().fileOrder.find((f) => store.getState().files[f]?.group === 'other') as string;
    expect(store.getState().results[other]?.run?.analysedPotentialV).toBeNull();
    // Correcting data that had no ohmic drop narrows ΔEp (common practice, no source).
    expect(store.getState().results[key]?.run?.analysis.cycles[0]?.couples[0]?.deltaEpV).toBeLessThan(dep0);
    await store.getState().undo();
    expect(store.getState().seriesCells.disk?.resistanceOhm).toBeUndefined();
    expect(store.getState().results[key]?.run?.analysis.cycles[0]?.couples[0]?.deltaEpV).toBeCloseTo(dep0, 12);
    await store.getState().redo();
    expect(resolveCell(store.getState(), 'disk').cell.resistanceOhm).toBe(500);
  });

  it('the results sheet and the theory overlay use the series’ cell', async () => {
    const store = newStore();
    const ids = await loadSeries(store, 'gold', PREAMBLE);
    await store.getState().updateSeriesCell('gold', (own) => ({ ...own, electronCount: 1, concentrationMM: 1 }));
    const run = runInputOf(store.getState());
    expect(run.cells?.gold).toMatchObject({ areaCm2: 0.0314, concentrationMolPerCm3: 1e-6, inputReference: 'AgCl-sat' });
    expect(run.cells?.gold?.temperatureK).toBeCloseTo(303.15, 12);
    await store.getState().analyzeGroup('gold');
    const plan = planTheory(store.getState(), ids[1] as string);
    expect(plan.ok && plan.params).toMatchObject({ areaCm2: 0.0314, temperatureK: 303.15, concentrationOMolPerCm3: 1e-6 });
  });

  it('shows each series against the global display scale from its own recording scale', async () => {
    const store = newStore();
    await loadSeries(store, 'sat', PREAMBLE);
    await loadSeries(store, 'threeMolar');
    const s = store.getState();
    // vs SHE: Ag/AgCl sat. KCl 0.197 V (Bard & Faulkner 2nd ed., inside back cover), 3 M KCl 0.210 V (compiled, primary source not seen).
    expect(displayScale(s.settings, resolveCell(s, 'sat').cell).offsetV).toBeCloseTo(0.197 - 0.21, 9);
    expect(displayScale(s.settings, resolveCell(s, 'threeMolar').cell).offsetV).toBe(0);
  });
});

describe('sessions carry the series’ cells', () => {
  it('round-trips the per-series values with the raw data', async () => {
    const store = newStore();
    await loadSeries(store, 'disk');
    await loadSeries(store, 'film');
    await store.getState().updateSeriesCell('film', (own) => ({ ...own, areaCm2: 0.0314, alpha: null, fileReference: 'SCE' }));
    const fresh = newStore();
    await openSessionText(fresh, await saveSessionText(store, true));
    expect(fresh.getState().seriesCells).toEqual({ film: { areaCm2: 0.0314, alpha: null, fileReference: 'SCE' } });
    expect(resolveCell(fresh.getState(), 'film').cell.areaCm2).toBe(0.0314);
    expect(resolveCell(fresh.getState(), 'disk').cell.areaCm2).toBe(0.0707);
  });

  it('an older session without per-series values loads; its global cell becomes what every series falls back to', async () => {
    const store = newStore();
    await loadSeries(store, 'disk');
    const doc = JSON.parse(await saveSessionText(store, true));
    delete doc.settings.seriesCells;
    doc.settings.chemistry.areaCm2 = 0.05;
    doc.settings.chemistry.temperatureC = 20;
    const fresh = newStore();
    await openSessionText(fresh, JSON.stringify(doc));
    expect(fresh.getState().seriesCells).toEqual({});
    expect(resolveCell(fresh.getState(), 'disk').cell).toMatchObject({ areaCm2: 0.05, temperatureC: 20 });
  });

  it('keeps only well-typed per-series values from a hand-edited session', async () => {
    const store = newStore();
    const doc = JSON.parse(await saveSessionText(store, false));
    doc.settings.seriesCells = { x: { areaCm2: 'big', electronCount: 2, fileReference: 'nowhere', alpha: null } };
    await openSessionText(store, JSON.stringify(doc));
    expect(store.getState().seriesCells).toEqual({ x: { electronCount: 2, alpha: null } });
  });
});
