/**
 * Theory overlay: simulated files (our simulator, Nernstian, D = 1e-5 cm²/s, 1 mM, 0.0707 cm²) at
 * three scan rates → series → overlay. The overlay uses D from the Randles–Ševčík fit of the
 * series (Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001), §6.2.2), so its peak must
 * reproduce the measured peak within the fit's accuracy (3 %, common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import { createInThreadClient } from '../worker/inThreadClient';
import { createHalfwaveStore } from './store';
import { simulatedCsv } from './testSupport';

const csv = (scanRateVPerS: number) => simulatedCsv(scanRateVPerS, 't/s,E/V,I/A');

describe('theory overlay', () => {
  it('simulates the fitted couple and matches the measured cathodic peak', async () => {
    const store = createHalfwaveStore({ client: createInThreadClient(), storage: null });
    const ids = await store.getState().addFiles([0.05, 0.1, 0.2].map((v) => ({ name: `sim-${v}.csv`, data: csv(v) })), 'sim');
    const id = ids[1] as string;
    expect(store.getState().theory[id]).toBeUndefined();
    await store.getState().analyzeGroup('sim');
    await store.getState().simulateTheory(id);
    const t = store.getState().theory[id];
    expect(t?.status).toBe('ready');
    expect(t?.description).toMatch(/^E mechanism: E°′ -?0\.00\d\d V vs Ag\/AgCl, 3 M KCl, D \S+ cm²\/s, k° fast \(Nernstian\)/);
    // D recovered from the ip–v½ slope: simulated with 1e-5 cm²/s; ±3 %.
    const d = Number(/D (\S+) cm²/.exec(t?.description ?? '')?.[1]);
    expect(Math.abs(d / 1e-5 - 1)).toBeLessThan(0.03);
    const simMin = Math.min(...(t?.curve?.currentA ?? []));
    const ipc = store.getState().results[id]?.run?.analysis.cycles[0]?.couples[0]?.ipcA as number;
    expect(Math.abs(-simMin / ipc - 1)).toBeLessThan(0.03);
  });

  it('refuses with a reason when the series cannot give D', async () => {
    const store = createHalfwaveStore({ client: createInThreadClient(), storage: null });
    const [id] = await store.getState().addFiles([{ name: 'one.csv', data: csv(0.1) }], 'alone');
    await store.getState().simulateTheory(id as string);
    expect(store.getState().theory[id as string]?.error?.message).toMatch(/^No theory overlay: /);
  });
});
