/**
 * The fit slice without React, through its actions and the in-thread client (the worker's
 * handler table): a series is fitted with its own cell, progress shows while it runs, a cancel
 * leaves no result, errors reach the user, "use these values" carries α and R_u into the cell
 * and undo takes them back, and the results sheet carries the fit while it is current.
 * Input: seeded noisy voltammograms from the project's simulator (validated against Nicholson &
 * Shain, Anal. Chem. 36 (1964) 706 and Nicholson, Anal. Chem. 37 (1965) 1351 in
 * src/core/simulation); tolerances are those of the fit issue (E°′ 2 mV, k° 25 %, D 5 %).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { noisyVoltammograms } from '../core/fit/fitTestSupport';
import type { Voltammogram } from '../core/types';
import { createInThreadClient } from '../worker/inThreadClient';
import { subtractBlank } from '../core/background/subtractBlank';
import { fitRequestOf, mergeFitSetups } from './fitRequest';
import { createHalfwaveStore } from './store';
import type { FitProgressDetail, HalfwaveStore } from './types';

const toCsv = (v: Voltammogram) => `time_s,potential_V,current_A\n${Array.from(v.potentialV, (e, i) => `${v.timeS![i]},${e},${v.currentA[i]}`).join('\n')}\n`;

/** 1 mM, 0.0707 cm², k° = 0.01 cm/s, D = 8e-6 cm²/s, E°′ = 0.05 V, R_u = 80 Ω, two scan rates, 2 mV steps. */
let csv: string[] = [];
beforeAll(() => {
  csv = noisyVoltammograms({ startV: 0.45, switchV: -0.35, stepV: 0.002, uncompensatedOhm: 80, doubleLayerFPerCm2: 20e-6 },
    [{ formalPotentialV: 0.05, k0CmPerS: 0.01, alpha: 0.5, diffusionOCm2PerS: 8e-6, diffusionRCm2PerS: 8e-6 }], [0.1, 1]).map(toCsv);
});

async function seriesStore(): Promise<HalfwaveStore> {
  const store = createHalfwaveStore({ client: createInThreadClient(), storage: null });
  store.getState().seedSeriesCell('quasi', { areaCm2: 0.0707, concentrationMM: 1, resistanceOhm: 80 });
  await store.getState().addFiles(csv.map((data, k) => ({ name: `quasi_${k}.csv`, data })), 'quasi');
  return store;
}

describe('fit slice', () => {
  it('fits the series with its cell and shows progress while it runs; the result is kept for the series', async () => {
    const store = await seriesStore();
    const act = store.getState();
    expect(act.fitSetupOf('quasi')).toMatchObject({ mechanism: 'E', compare: 'mechanism', windowV: null });
    act.setFitSetup('quasi', { compare: 'none' });
    const seen: FitProgressDetail[] = [];
    const stop = store.subscribe((s) => {
      const p = s.fits.quasi?.progress;
      if (p && seen.at(-1) !== p) seen.push(p);
    });
    await act.runFit('quasi');
    stop();
    const entry = store.getState().fits.quasi;
    expect(entry?.status).toBe('ready');
    expect(seen.some((p) => p.stage === 'iterate' && (p.costA2 ?? 0) > 0)).toBe(true);
    expect(entry?.fileNames).toEqual(['quasi_0.csv', 'quasi_1.csv']);
    expect(entry?.cell).toMatchObject({ areaCm2: 0.0707, concentrationMolPerCm3: 1e-6, electronCount: 1 });
    const c = entry?.result?.values.couples[0];
    // Fit issue tolerances; R_u held at the cell's 80 Ω, the simulator's value.
    expect(Math.abs((c?.formalPotentialV ?? 0) - 0.05)).toBeLessThan(0.002);
    expect(Math.abs((c?.k0CmPerS ?? 0) / 0.01 - 1)).toBeLessThan(0.25);
    expect(Math.abs((c?.diffusionOCm2PerS ?? 0) / 8e-6 - 1)).toBeLessThan(0.05);
    expect(entry?.result?.values.shared.uncompensatedOhm).toBe(80);
    expect(store.getState().fitIsCurrent('quasi')).toBe(true);
  });

  it('a cancel while it iterates leaves the series without a result, marked cancelled', async () => {
    const store = await seriesStore();
    store.getState().setFitSetup('quasi', { compare: 'none' });
    const stop = store.subscribe((s) => {
      if (s.fits.quasi?.progress?.stage === 'iterate') s.cancelFit('quasi');
    });
    await store.getState().runFit('quasi');
    stop();
    expect(store.getState().fits.quasi).toMatchObject({ status: 'cancelled', result: null, error: null });
  });

  it('a window outside the data is a user error that says what and keeps the files', async () => {
    const store = await seriesStore();
    store.getState().setFitSetup('quasi', { compare: 'none', windowV: [2, 3] });
    await store.getState().runFit('quasi');
    const entry = store.getState().fits.quasi;
    expect(entry?.status).toBe('error');
    expect(entry?.error?.code).toMatch(/^[A-Z_]+$/);
    expect(entry?.error?.message).toMatch(/window|points/i);
    expect(store.getState().fileOrder).toHaveLength(2);
  });

  it('"use these values" carries α and R_u into the cell in one undoable step; the sheet carries the fit while it is current', async () => {
    const store = await seriesStore();
    const act = store.getState();
    act.setFitSetup('quasi', { compare: 'none', free: ['formalPotentialV', 'k0CmPerS', 'alpha', 'diffusionOCm2PerS', 'uncompensatedOhm'] });
    await act.runFit('quasi');
    const carry = store.getState().carryableFitValues('quasi');
    expect(carry.map((v) => v.field).sort()).toEqual(['alpha', 'resistanceOhm']);
    const before = store.getState().seriesCells.quasi;
    await act.useFitValues('quasi');
    const own = store.getState().seriesCells.quasi;
    for (const v of carry) expect(own?.[v.field]).toBe(v.value);
    // Carrying the fit's own free values leaves it current: the sheet still has it.
    expect(store.getState().fitIsCurrent('quasi')).toBe(true);
    const json = JSON.parse(await act.exportGroup('quasi', 'json')) as { fits: { series: string; params: Record<string, number | null>; criteria: { bic: number } }[] };
    expect(json.fits).toHaveLength(1);
    expect(json.fits[0]?.series).toBe('quasi');
    expect(Math.abs((json.fits[0]?.params.E0 ?? 0) - 0.05)).toBeLessThan(0.002);
    expect(Number.isFinite(json.fits[0]?.criteria.bic)).toBe(true);
    expect(await act.undoFitValues('quasi')).toBe(true);
    expect(store.getState().seriesCells.quasi).toEqual(before);
    expect(store.getState().fits.quasi?.carried).toBeNull();
    // A changed area makes the fit outdated: it is no longer carried over, nor written into the sheet.
    await act.updateSeriesCell('quasi', (o) => ({ ...o, areaCm2: 0.1 }));
    expect(store.getState().fitIsCurrent('quasi')).toBe(false);
    expect(await act.useFitValues('quasi')).toEqual([]);
    expect(await act.exportGroup('quasi', 'csv')).not.toContain('# table: fit');
  });

  it('the blank the analysis subtracts is taken off before the fit too, and a new blank makes the fit outdated', async () => {
    const store = await seriesStore();
    // A made-up background (demo only): 2 µA + 5 µA/V·E, recorded on the first file's own potentials and times.
    const lines = (csv[0] as string).trim().split('\n');
    const blankCsv = [lines[0], ...lines.slice(1).map((l) => {
      const [t, e] = l.split(',');
      return `${t},${e},${2e-6 + 5e-6 * Number(e)}`;
    })].join('\n') + '\n';
    await store.getState().addFiles([{ name: 'electrolyte_only.csv', data: blankCsv }], 'quasi');
    const act = store.getState();
    act.setFitSetup('quasi', { compare: 'none' });
    const keyBefore = fitRequestOf(store.getState(), 'quasi', act.fitSetupOf('quasi')).key;
    await act.updateSeriesCell('quasi', (o) => ({ ...o, blankFiles: ['electrolyte_only.csv'] }));
    const built = fitRequestOf(store.getState(), 'quasi', act.fitSetupOf('quasi'));
    expect(built.names).toEqual(['quasi_0.csv', 'quasi_1.csv']);
    expect(built.request.options.cycle).toBe(1);
    act.setFitSetup('quasi', { cycle: 2 });
    expect(fitRequestOf(store.getState(), 'quasi', store.getState().fitSetupOf('quasi')).request.options.cycle).toBe(2);
    act.setFitSetup('quasi', { cycle: 1 });
    expect(built.key).not.toBe(keyBefore);
    const files = Object.values(store.getState().files);
    const m0 = files.find((f) => f.fileName === 'quasi_0.csv')?.measurement;
    const blank = files.find((f) => f.fileName === 'electrolyte_only.csv')?.measurement;
    if (!m0 || !blank) throw new Error('files not loaded');
    // The same subtraction as the analysis (core/background/subtractBlank), point for point (arithmetic, no published value).
    expect(Array.from(built.request.records[0]?.currentA ?? [])).toEqual(Array.from(subtractBlank(m0, blank).currentA));
    expect(built.notes).toEqual(['blank subtracted before the fit, as in the analysis: quasi_0.csv − electrolyte_only.csv; quasi_1.csv − electrolyte_only.csv']);
    expect(built.request.records[0]?.currentA[10]).toBeCloseTo((m0.currentA[10] as number) - (2e-6 + 5e-6 * (m0.potentialV[10] as number)), 12);
  });
});

describe('a fit of current densities', () => {
  it('is per cm²: area 1, the cell\'s R_u held as R_u·A (Ω·cm²), said in the notes, and R_u is not carried back', async () => {
    const store = createHalfwaveStore({ client: createInThreadClient(), storage: null });
    store.getState().seedSeriesCell('dens', { areaCm2: 0.0707, concentrationMM: 1, resistanceOhm: 80 });
    const asDensity = (text: string) => {
      const [, ...rows] = text.trim().split('\n');
      return ['time_s,potential_V,j (A/cm2)', ...rows.map((r) => {
        const [t, e, i] = r.split(',').map(Number) as [number, number, number];
        return `${t},${e},${i / 0.0707}`;
      })].join('\n') + '\n';
    };
    await store.getState().addFiles(csv.map((data, k) => ({ name: `dens_${k}.csv`, data: asDensity(data) })), 'dens');
    const built = fitRequestOf(store.getState(), 'dens', store.getState().fitSetupOf('dens'));
    expect(built.perArea).toBe(true);
    expect(built.cell.areaCm2).toBe(1);
    // j·(R_u·A) = i·R_u (Ohm's law, common practice, no source).
    expect(built.request.options.start?.shared?.uncompensatedOhm).toBeCloseTo(80 * 0.0707, 12);
    expect(built.notes.join(' ')).toMatch(/current densities.*A = 1 cm².*Ω·cm²/);
  });
});

describe('fit setups read back from a session', () => {
  it('keep what is valid and leave out what is not (unknown mechanism, parameters of another mechanism, a reversed window)', () => {
    expect(mergeFitSetups({
      good: { mechanism: 'EC', coupleCount: 2, free: ['formalPotentialV', 'followUpRatePerS', 'coverageMolPerCm2'], windowV: [-0.2, 0.3], cycle: 2, compare: 'mechanism' },
      reversed: { mechanism: 'E', coupleCount: 9, free: ['k0CmPerS'], windowV: [0.3, -0.2], compare: 'none' },
      film: { mechanism: 'surface', coupleCount: 1, free: ['coverageMolPerCm2'], windowV: null, compare: 'mechanism' },
      strange: { mechanism: 'ECE', free: ['k0CmPerS'], compare: 'none' },
      empty: { mechanism: 'E', free: ['followUpRatePerS'], compare: 'none' },
    })).toEqual({
      good: { mechanism: 'EC', coupleCount: 2, free: ['formalPotentialV', 'followUpRatePerS'], windowV: [-0.2, 0.3], cycle: 2, compare: 'mechanism' },
      reversed: { mechanism: 'E', coupleCount: 1, free: ['k0CmPerS'], windowV: null, cycle: 1, compare: 'none' },
    });
    expect(mergeFitSetups([])).toEqual({});
    expect(mergeFitSetups(null)).toEqual({});
  });
});
