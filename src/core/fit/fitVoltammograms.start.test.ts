/**
 * Starting far off, progress, cancel and bad input. Oracle for the values: the validated
 * simulator (Nicholson & Shain, Anal. Chem. 36 (1964) 706; Nicholson, Anal. Chem. 37 (1965) 1351).
 * Iteration: Marquardt, J. SIAM 11 (1963) 431; Bates & Watts, Nonlinear Regression Analysis
 * (1988) §2.2.3 (relative-offset stop).
 */
import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { findSweepSegments } from '../sweeps/findSweepSegments';
import type { Voltammogram } from '../types';
import { estimateOf, noisyVoltammograms, relativeError, TEST_CELL } from './fitTestSupport';
import type { FitStage } from './fitTypes';
import { fitVoltammograms } from './fitVoltammograms';

const TRUTH = { formalPotentialV: 0.05, k0CmPerS: 0.01, alpha: 0.45, diffusionOCm2PerS: 8e-6, diffusionRCm2PerS: 8e-6 };
const WAVEFORM = { startV: 0.45, switchV: -0.35, stepV: 0.001, uncompensatedOhm: 50, doubleLayerFPerCm2: 20e-6 };
const [RECORD] = noisyVoltammograms(WAVEFORM, [TRUTH], [0.2]) as [Voltammogram];
const base = { start: { shared: { uncompensatedOhm: 50 } } };

describe('fitVoltammograms from poor starts', () => {
  it.each([
    ['k° ten times too high, E°′ 50 mV too positive', { k0CmPerS: 0.1, formalPotentialV: 0.1 }],
    ['k° ten times too low, E°′ 50 mV too negative', { k0CmPerS: 0.001, formalPotentialV: 0.0 }],
  ])('%s: converges to E°′ within 2 mV, k° within 25 %, D within 5 %', (_, start) => {
    const r = fitVoltammograms({ records: [RECORD], cell: TEST_CELL }, { start: { couples: [start], shared: { uncompensatedOhm: 50 } } });
    expect(r.converged).toBe(true);
    expect(r.start.couples[0]).toMatchObject(start);
    expect(Math.abs(estimateOf(r, 'formalPotentialV').value - 0.05)).toBeLessThan(0.002);
    expect(relativeError(estimateOf(r, 'k0CmPerS').value, 0.01)).toBeLessThan(0.25);
    expect(relativeError(estimateOf(r, 'diffusionOCm2PerS').value, 8e-6)).toBeLessThan(0.05);
  });
});

describe('fitVoltammograms progress and cancel', () => {
  it('reports each iteration with a finite sum of squares that never rises', () => {
    const seen: { iteration: number; costA2: number; stage: FitStage }[] = [];
    fitVoltammograms({ records: [RECORD], cell: TEST_CELL }, { ...base, onProgress: (p) => seen.push(p) });
    const iterating = seen.filter((p) => p.stage === 'iterate');
    expect(iterating.length).toBeGreaterThan(1);
    iterating.forEach((p, k) => {
      expect(Number.isFinite(p.costA2)).toBe(true);
      if (k > 0) expect(p.costA2).toBeLessThanOrEqual((iterating[k - 1] as { costA2: number }).costA2);
    });
  });

  it('a cancel during the iteration stops the fit before the next simulation: no evaluation runs after it', () => {
    let cancelled = false;
    let readsAfterCancel = 0;
    const signal = {
      get aborted() {
        if (cancelled) readsAfterCancel++;
        return cancelled;
      },
    };
    const run = () => fitVoltammograms({ records: [RECORD], cell: TEST_CELL }, { ...base, signal, onProgress: (p) => { if (p.iteration >= 1) cancelled = true; } });
    expect(run).toThrow(expect.objectContaining({ name: 'AnalysisError', code: 'CANCELLED' }));
    // The signal is read before every simulation; the first read after the cancel throws.
    expect(readsAfterCancel).toBe(1);
  });
});

describe('fitVoltammograms input checks', () => {
  const fit = (o: Parameters<typeof fitVoltammograms>[1], records: Voltammogram[] = [RECORD], cell = TEST_CELL) => () => fitVoltammograms({ records, cell }, o);
  const code = (f: () => unknown, c: string, pattern: RegExp) => {
    try {
      f();
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(AnalysisError);
      expect((e as AnalysisError).code).toBe(c);
      expect((e as Error).message).toMatch(pattern);
    }
  };

  it('names the bad option, the bad cell value or the record at fault', () => {
    code(fit({ free: ['bogus' as never] }), 'BAD_OPTION', /free: unknown parameter "bogus"/);
    code(fit({ free: ['followUpRatePerS'] }), 'BAD_OPTION', /followUpRatePerS does not belong to the E mechanism/);
    code(fit({ coupleCount: 0 }), 'BAD_OPTION', /coupleCount/);
    code(fit({}, [RECORD], { ...TEST_CELL, areaCm2: -1 }), 'BAD_OPTION', /cell\.areaCm2/);
    code(fit({ windowV: [0.9, 0.95] }), 'TOO_FEW_POINTS', /voltammogram 1 has 0 points inside the window/);
    code(fit({}, []), 'EMPTY_INPUT', /at least one voltammogram/);
    code(fit({}, [{ ...RECORD, scanRateVPerS: null }]), 'BAD_OPTION', /voltammogram 1 has no scan rate/);
  });

  it.each([
    ['starts inside the range (0 → 0.2 → −0.2 → 0 V)', (i: number) => (i <= 100 ? i : i <= 300 ? 200 - i : i - 400) * 0.002, 401],
    ['returns past the start (0 → 0.2 → −0.2 V)', (i: number) => (i <= 100 ? i : 200 - i) * 0.002, 301],
  ])('refuses a cycle that %s: the simulated waveform runs start → vertex → start', (_, potential, n) => {
    const e = Float64Array.from({ length: n }, (_, i) => potential(i));
    const { segments, cycles } = findSweepSegments(e);
    const odd: Voltammogram = { potentialV: e, currentA: new Float64Array(n), timeS: null, segments, cycles, scanRateVPerS: 0.1, scanRateSource: 'option' };
    code(fit({}, [odd]), 'BAD_OPTION', /start → vertex → start/);
  });
});
