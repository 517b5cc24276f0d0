/**
 * analyzeVoltammogram: options, provenance, user windows and baselines, and bad input. Physical
 * accuracy is checked in analyzeVoltammogram.simulated.test.ts.
 */
import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import type { Voltammogram } from '../types';
import { analyzeVoltammogram } from './analyzeVoltammogram';

const base = { k0CmPerS: Infinity, formalPotentialV: 0, startV: 0.4, switchV: -0.4, diffusionOCm2PerS: 7.6e-6, diffusionRCm2PerS: 7.6e-6 };
const reversible = simulatedVoltammogram(base);

describe('analyzeVoltammogram: results and provenance', () => {
  it('reports the option values used and never modifies the raw columns', () => {
    const before = Float64Array.from(reversible.currentA);
    const a = analyzeVoltammogram(reversible);
    expect(reversible.currentA).toEqual(before);
    expect(a.options).toMatchObject({ temperatureK: 298.15, electronCount: 1, smoothing: { window: 5, order: 2 }, currentConvention: 'iupac', forwardBaseline: 'linear', returnBaseline: 'nicholson', cycles: [1] });
    expect(a.options.locatingSmoothing.window % 2).toBe(1);
    expect(a.smoothed!.currentA).toHaveLength(reversible.currentA.length);
    expect(a.smoothed!.currentA).not.toBe(reversible.currentA);
    expect(a.peakThresholdA).toBeGreaterThan(0);
  });

  it('each peak carries the baseline that was subtracted, spanning the peak', () => {
    const { peaks } = analyzeVoltammogram(reversible).cycles[0]!;
    expect(peaks.map((p) => p.baseline.method)).toEqual(['linear', 'nicholson']);
    for (const p of peaks) {
      expect(p.baseline.startIndex).toBeLessThanOrEqual(p.index);
      expect(p.baseline.endIndex).toBeGreaterThan(p.index);
      expect(p.baseline.currentA).toHaveLength(p.baseline.endIndex - p.baseline.startIndex);
      expect(p.baseline.description.length).toBeGreaterThan(10);
    }
  });

  // d(E½)/dE of (Epa + Epc)/2 (Wang 2000 eq. 2-2) is exact arithmetic on the reported numbers.
  it('couple numbers are consistent: E½ = (Epa + Epc)/2, ΔEp = Epa − Epc', () => {
    const c = analyzeVoltammogram(reversible).cycles[0]!.couples[0]!;
    expect(c.eHalfV).toBeCloseTo((c.epaV! + c.epcV!) / 2, 15);
    expect(c.deltaEpV).toBeCloseTo(c.epaV! - c.epcV!, 15);
    expect(c.verdict.reasons.length).toBeGreaterThanOrEqual(2);
  });

  it('smoothing off returns no smoothed curve; two cycles give two cycle results; cycles option filters', () => {
    expect(analyzeVoltammogram(reversible, { smoothing: 'off' }).smoothed).toBeNull();
    const two = simulatedVoltammogram({ ...base, cycles: 2 });
    expect(analyzeVoltammogram(two).cycles.map((c) => c.index)).toEqual([1, 2]);
    expect(analyzeVoltammogram(two, { cycles: [2] }).cycles.map((c) => c.index)).toEqual([2]);
  });

  it('without time column and scan rate, charges are null and a warning says why', () => {
    const a = analyzeVoltammogram({ ...reversible, timeS: null, scanRateVPerS: null });
    expect(a.warnings.map((w) => w.code)).toContain('NO_TIME_AXIS');
    expect(a.cycles[0]!.peaks.every((p) => p.chargeC === null)).toBe(true);
    expect(a.cycles[0]!.couples[0]!.eHalfV).toBeCloseTo(analyzeVoltammogram(reversible).cycles[0]!.couples[0]!.eHalfV!, 3);
  });
});

describe('analyzeVoltammogram: user windows and baselines', () => {
  const two = simulatedVoltammogram({ ...base, switchV: -0.6 }, { extra: [{ formalPotentialV: -0.25 }] });

  it('a cathodic peak window restricts the cathodic search to that window', () => {
    const a = analyzeVoltammogram(two, { peakWindows: [{ direction: 'cathodic', fromV: -0.35, toV: -0.2 }] });
    const cathodic = a.cycles[0]!.peaks.filter((p) => p.direction === 'cathodic');
    expect(cathodic).toHaveLength(1);
    expect(cathodic[0]!.origin).toBe('window');
    expect(cathodic[0]!.potentialV).toBeGreaterThan(-0.3);
    expect(cathodic[0]!.potentialV).toBeLessThan(-0.25);
  });

  // The reversible couple's verdict and numbers (Nicholson & Shain 1964, via the simulator) must
  // survive a window dragged over a stretch with no wave: such a window holds nothing above the
  // noise threshold, is kept as empty, and the automatic cathodic peak stays.
  it('a window over an empty stretch is kept as empty and does not replace the automatic peak', () => {
    const plain = analyzeVoltammogram(reversible);
    const a = analyzeVoltammogram(reversible, { peakWindows: [{ direction: 'cathodic', fromV: 0.25, toV: 0.35 }] });
    const cathodic = a.cycles[0]!.peaks.filter((p) => p.direction === 'cathodic');
    expect(cathodic).toHaveLength(1);
    expect(cathodic[0]!.origin).toBe('auto');
    expect(a.cycles[0]!.couples[0]!.verdict.category).toBe('reversible');
    expect(a.cycles[0]!.couples[0]!.ipcA).toBe(plain.cycles[0]!.couples[0]!.ipcA);
    expect(a.cycles[0]!.warnings.map((w) => w.code)).toContain('WINDOW_EMPTY');
    expect(a.cycles[0]!.warnings.find((w) => w.code === 'WINDOW_EMPTY')?.message).toMatch(/no peak above the noise threshold.*automatically.*kept/);
  });

  it('two-point and polynomial baselines are used where asked', () => {
    const a = analyzeVoltammogram(reversible, {
      baselines: [
        { direction: 'cathodic', fromV: -0.1, toV: 0.05, method: 'two-point', anchorsV: [0.2, -0.2] },
        { direction: 'anodic', fromV: -0.05, toV: 0.1, method: 'polynomial', anchorsV: [-0.39, -0.3], degree: 1 },
      ],
    });
    const [cathodic, anodic] = a.cycles[0]!.peaks;
    expect(cathodic!.baseline.method).toBe('two-point');
    expect(cathodic!.baseline.anchors.map((p) => p.potentialV)).toEqual([0.2, -0.2]);
    expect(anodic!.baseline.method).toBe('polynomial');
  });

  it('a two-point baseline without anchors is a BAD_OPTION error naming the peak', () => {
    expect(() => analyzeVoltammogram(reversible, { baselines: [{ direction: 'cathodic', fromV: -0.1, toV: 0.05, method: 'two-point' }] })).toThrow(/needs anchorsV/);
  });

  it('a time column that stalls near the switch makes the extended decay fall back with a warning', () => {
    const timeS = Float64Array.from(reversible.timeS!);
    const vertex = reversible.segments[0]!.end - 1;
    timeS[vertex - 5] = timeS[vertex - 6]!;
    const a = analyzeVoltammogram({ ...reversible, timeS });
    expect(a.cycles[0]!.peaks.map((p) => p.baseline.method)).toEqual(['linear', 'linear']);
    expect(a.cycles[0]!.warnings.map((w) => w.code)).toContain('BASELINE_FALLBACK');
  });

  it('a single linear sweep: the lone peak is not called irreversible, because nothing was reversed', () => {
    const first = reversible.segments[0]!;
    const half: Voltammogram = {
      ...reversible,
      potentialV: reversible.potentialV.slice(0, first.end),
      currentA: reversible.currentA.slice(0, first.end),
      timeS: reversible.timeS!.slice(0, first.end),
      segments: [first],
      cycles: [{ index: 1, start: 0, end: first.end }],
    };
    const couple = analyzeVoltammogram(half).cycles[0]!.couples[0]!;
    expect(couple.epcV).not.toBeNull();
    expect(couple.verdict.category).toBe('inconclusive');
    expect(couple.verdict.label).toMatch(/no return sweep/);
  });

  it('returnBaseline linear replaces the extended decay on the return peak', () => {
    const a = analyzeVoltammogram(reversible, { returnBaseline: 'linear' });
    expect(a.cycles[0]!.peaks.map((p) => p.baseline.method)).toEqual(['linear', 'linear']);
  });
});

describe('analyzeVoltammogram: bad and empty input', () => {
  const flat: Voltammogram = { ...reversible, currentA: new Float64Array(reversible.currentA.length).fill(1e-9) };

  it('a flat trace gives no peaks and warnings, not an exception', () => {
    const a = analyzeVoltammogram(flat);
    expect(a.warnings.map((w) => w.code)).toContain('FLAT_TRACE');
    expect(a.cycles[0]!.peaks).toEqual([]);
    expect(a.cycles[0]!.warnings.map((w) => w.code)).toContain('NO_PEAKS');
  });

  it('NaN in the current is a NON_FINITE error that names the point', () => {
    const bad = Float64Array.from(reversible.currentA);
    bad[17] = NaN;
    expect(() => analyzeVoltammogram({ ...reversible, currentA: bad })).toThrow(/currentA is not finite at point 17/);
  });

  it('unequal columns, missing segments and bad options are typed errors', () => {
    const short = { ...reversible, currentA: reversible.currentA.subarray(1) };
    expect(() => analyzeVoltammogram(short)).toThrow(AnalysisError);
    expect(() => analyzeVoltammogram({ ...reversible, segments: [] })).toThrow(/no sweep segments/);
    expect(() => analyzeVoltammogram(reversible, { electronCount: 0 })).toThrow(/electron count n/);
    expect(() => analyzeVoltammogram(reversible, { smoothing: { window: 4, order: 2 } })).toThrow(/odd window/);
    expect(() => analyzeVoltammogram(reversible, { temperatureK: -5 })).toThrow(/temperature \(K\)/);
    expect(() => analyzeVoltammogram(reversible, { peakWindows: [{ direction: 'anodic', fromV: 0.1, toV: 0.1 }] })).toThrow(/peak window/);
    expect(() => analyzeVoltammogram(reversible, { cycles: [3] })).toThrow(/names cycle 3/);
  });

  it('fewer than 5 points is TOO_FEW_POINTS', () => {
    const tiny: Voltammogram = { ...reversible, potentialV: new Float64Array(3), currentA: new Float64Array(3), timeS: null };
    try {
      analyzeVoltammogram(tiny);
      expect.unreachable();
    } catch (e) {
      expect((e as AnalysisError).code).toBe('TOO_FEW_POINTS');
    }
  });
});
