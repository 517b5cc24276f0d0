/**
 * The `fit` request through the in-thread transport (the same handler table the worker runs):
 * progress with iteration and cost, the comparison summary, errors that name the file, and a
 * cancel that stops the fit at its next simulation. Input: seeded noisy voltammograms from the
 * project's simulator (validated against Nicholson & Shain, Anal. Chem. 36 (1964) 706 in
 * src/core/simulation); the tolerances are those of the fit issue (E°′ 2 mV, k° 25 %).
 */
import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../core/errors';
import { noisyVoltammograms, TEST_CELL } from '../core/fit/fitTestSupport';
import type { Voltammogram } from '../core/types';
import { CancelledError } from './errors';
import type { FitProgressDetail, FitRequest } from './fitRun';
import { createInThreadClient } from './inThreadClient';

const records = noisyVoltammograms({ startV: 0.45, switchV: -0.35, stepV: 0.002, uncompensatedOhm: 0, doubleLayerFPerCm2: 20e-6 },
  [{ formalPotentialV: 0.05, k0CmPerS: 0.01, alpha: 0.5, diffusionOCm2PerS: 8e-6, diffusionRCm2PerS: 8e-6 }], [0.1, 1]);

function request(rs: Voltammogram[], patch: Partial<FitRequest> = {}): FitRequest {
  return { records: rs, fileNames: rs.map((_, k) => `run${k + 1}.csv`), cell: TEST_CELL, options: { mechanism: 'E', free: ['formalPotentialV', 'k0CmPerS', 'diffusionOCm2PerS'], start: { shared: { doubleLayerFPerCm2: 20e-6 } } }, compare: 'none', ...patch };
}

describe('fit request in-thread', () => {
  const client = createInThreadClient();

  it('reports starting values, then iteration and cost, and returns the chosen fit with the E-against-EC advice', async () => {
    const seen: FitProgressDetail[] = [];
    const out = await client.request('fit', request(records, { compare: 'mechanism' }), { onProgress: (_f, _s, d) => d && seen.push(d) });
    expect(seen.map((d) => `${d.model}:${d.stage}`)).toContain('E:start');
    expect(seen.map((d) => `${d.model}:${d.stage}`)).toContain('EC:start');
    expect(seen.some((d) => d.stage === 'iterate' && (d.costA2 ?? 0) > 0)).toBe(true);
    expect(out.result.mechanism).toBe('E');
    // Fit issue tolerances against the simulator's input.
    expect(Math.abs((out.result.values.couples[0]?.formalPotentialV ?? 0) - 0.05)).toBeLessThan(0.002);
    expect(Math.abs((out.result.values.couples[0]?.k0CmPerS ?? 0) / 0.01 - 1)).toBeLessThan(0.25);
    expect(out.comparison?.candidates.map((c) => c.label).sort()).toEqual(['E', 'EC']);
    expect(out.comparison?.recommendation).toMatch(/E/);
  });

  it('a cancel during the iteration stops the fit: CancelledError, no progress after it', async () => {
    const ctrl = new AbortController();
    let after = 0;
    const err = await client.request('fit', request(records), {
      signal: ctrl.signal,
      onProgress: (_f, _s, d) => {
        if (ctrl.signal.aborted) after++;
        if (d?.stage === 'iterate') ctrl.abort();
      },
    }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(CancelledError);
    expect(after).toBe(0);
  });

  it('a bad option comes back as AnalysisError with its code and the file named', async () => {
    const short = { ...records[0]!, scanRateVPerS: null };
    const err = await client.request('fit', request([short])).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(AnalysisError);
    expect((err as AnalysisError).message).toMatch(/run1\.csv/);
  });
});
