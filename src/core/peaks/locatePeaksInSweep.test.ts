import { describe, expect, it } from 'vitest';
import { gaussianShape } from '../baseline/analyticShapes';
import type { SweepSegment } from '../types';
import { locatePeaksInSweep } from './locatePeaksInSweep';
import { prepareSweepSignals } from './sweepSignals';

// Analytic shapes: two Gaussians (2 µA at 0.2 V, 1 µA at 0.45 V, width 0.03 V) on a rising line,
// swept positive (anodic peaks) and the mirror image swept negative (cathodic peaks).
const n = 601;
const up = Float64Array.from({ length: n }, (_, k) => k * 0.001);
const shape = (e: number) => 1e-6 * e + 2e-6 * gaussianShape(e, 0.2, 0.03) + 1e-6 * gaussianShape(e, 0.45, 0.03);
const potentialV = Float64Array.from([...up, ...Array.from(up).reverse().slice(1)]);
const currentA = potentialV.map((e, k) => (k < n ? shape(e) : -shape(e)));
const segments: SweepSegment[] = [
  { start: 0, end: n, direction: 'positive', cycle: 1 },
  { start: n - 1, end: 2 * n - 1, direction: 'negative', cycle: 1 },
];
const sig = prepareSweepSignals({ potentialV, currentA, timeS: null, scanRateVPerS: 0.1, segments }, { window: 5, order: 2 }, () => ({ window: 15, order: 2 }));

describe('locatePeaksInSweep', () => {
  // The line adds a slope 1e-6 A/V; the Gaussian maximum moves by slope·w²/(2A) = 0.23 mV for
  // the 2 µA peak (derivative of A·exp(−x²/w²) + s·x set to zero, small-x expansion).
  it('finds both anodic maxima with sub-sample Ep', () => {
    const found = locatePeaksInSweep(sig, 0, { windows: null, minProminenceA: 1e-7, locatingWindow: 15 });
    expect(found.map((p) => p.direction)).toEqual(['anodic', 'anodic']);
    expect(found[0]!.potentialV).toBeCloseTo(0.2 + (1e-6 * 0.03 ** 2) / (2 * 2e-6), 4);
    expect(found[1]!.potentialV).toBeCloseTo(0.45, 3);
    expect(found.every((p) => p.confidence === 'high')).toBe(true);
  });

  it('finds cathodic minima on the negative-going sweep', () => {
    const found = locatePeaksInSweep(sig, 1, { windows: null, minProminenceA: 1e-7, locatingWindow: 15 });
    expect(found.map((p) => p.direction)).toEqual(['cathodic', 'cathodic']);
    expect(found[0]!.potentialV).toBeCloseTo(0.45, 3);
  });

  it('a user window picks one peak; a window without an interior maximum is low confidence', () => {
    const one = locatePeaksInSweep(sig, 0, { windows: [{ direction: 'anodic', fromV: 0.4, toV: 0.5 }], minProminenceA: 1e-7, locatingWindow: 15 });
    expect(one).toHaveLength(1);
    expect(one[0]!.origin).toBe('window');
    expect(one[0]!.potentialV).toBeCloseTo(0.45, 3);
    const edge = locatePeaksInSweep(sig, 0, { windows: [{ direction: 'anodic', fromV: 0.3, toV: 0.38 }], minProminenceA: 1e-7, locatingWindow: 15 });
    expect(edge[0]!.confidence).toBe('low');
  });

  it('a prominence threshold above both peaks finds nothing', () => {
    expect(locatePeaksInSweep(sig, 0, { windows: null, minProminenceA: 1e-5, locatingWindow: 15 })).toEqual([]);
  });
});
