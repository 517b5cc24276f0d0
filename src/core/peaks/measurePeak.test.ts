import { describe, expect, it } from 'vitest';
import { gaussianShape } from '../baseline/analyticShapes';
import { twoPointBaseline } from '../baseline/twoPointBaseline';
import type { SweepSegment } from '../types';
import type { PeakCandidate } from './locatePeaksInSweep';
import { measurePeak } from './measurePeak';
import { prepareSweepSignals } from './sweepSignals';

// Analytic shape on one positive sweep, 0…0.6 V in 0.5 mV steps at 0.1 V/s: a Gaussian of
// amplitude 2 µA and width w = 0.04 V centred at 0.3 V on a 0.5 µA offset.
const n = 1201;
const potentialV = Float64Array.from({ length: n }, (_, k) => k * 0.0005);
const currentA = potentialV.map((e) => 0.5e-6 + 2e-6 * gaussianShape(e, 0.3, 0.04));
const segments: SweepSegment[] = [{ start: 0, end: n, direction: 'positive', cycle: 1 }];
const sig = prepareSweepSignals({ potentialV, currentA, timeS: null, scanRateVPerS: 0.1, segments }, { window: 5, order: 2 }, () => ({ window: 31, order: 2 }));
const peak: PeakCandidate = { direction: 'anodic', segmentIndex: 0, index: 600, potentialV: 0.3, currentA: 2.5e-6, prominenceA: 2e-6, confidence: 'high', origin: 'auto' };
const baseline = twoPointBaseline({ potentialV, spanStart: 0, spanEnd: n, anchors: [{ potentialV: 0, currentA: 0.5e-6 }, { potentialV: 0.6, currentA: 0.5e-6 }] });

describe('measurePeak', () => {
  // Gaussian exp(−(x/w)²): half height at x = w√ln2, so Ep − Ep/2 = 33.30 mV and FWHM = 66.60 mV;
  // area = A·w·√π, and t = E/v, so Q = 2 µA · 0.04 V · √π / 0.1 V/s = 1.41796 µC.
  it('height, Ep/2, FWHM and charge of a Gaussian on a flat baseline', () => {
    const r = measurePeak(sig, peak, baseline, true)!;
    expect(r.heightA).toBeCloseTo(2e-6, 12);
    expect(r.halfPeakPotentialV! * 1000).toBeCloseTo((0.3 - 0.04 * Math.sqrt(Math.LN2)) * 1000, 2);
    expect(r.halfPeakWidthV! * 1000).toBeCloseTo(33.302, 2);
    expect(r.fwhmV! * 1000).toBeCloseTo(66.604, 2);
    expect(r.chargeC! / ((2e-6 * 0.04 * Math.sqrt(Math.PI)) / 0.1)).toBeCloseTo(1, 2);
    expect(r.baselineCurrentA).toBeCloseTo(0.5e-6, 15);
  });

  it('a feature below its baseline is dropped (null)', () => {
    const high = twoPointBaseline({ potentialV, spanStart: 0, spanEnd: n, anchors: [{ potentialV: 0, currentA: 3e-6 }, { potentialV: 0.6, currentA: 3e-6 }] });
    expect(measurePeak(sig, peak, high, true)).toBeNull();
  });
});
