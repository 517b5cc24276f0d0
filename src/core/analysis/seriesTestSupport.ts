/**
 * Test support: builds per-trace analysis results (VoltammogramAnalysis) from a few numbers, so
 * the series layer can be tested against published equations without running the peak finder.
 * Used only by tests.
 */
import { STANDARD_TEMPERATURE_K } from '../constants';
import type { VoltammogramAnalysis } from './types';
import type { CoupleResult, VerdictCategory } from '../couples/coupleTypes';
import type { PeakDirection, PeakResult } from '../peaks/peakTypes';

export interface FakeCouple {
  epaV: number | null;
  epcV: number | null;
  ipaA: number | null;
  ipcA: number | null;
  forward?: PeakDirection;
  verdict?: VerdictCategory;
  chargeC?: number | null;
  halfPeakWidthV?: number | null;
}

function fakePeak(direction: PeakDirection, potentialV: number, heightA: number, c: FakeCouple): PeakResult {
  return {
    direction, potentialV, heightA, rawCurrentA: direction === 'anodic' ? heightA : -heightA, baselineCurrentA: 0, index: 0,
    segmentIndex: 0, onFirstSweep: (c.forward ?? 'anodic') === direction, halfPeakPotentialV: null,
    halfPeakWidthV: c.halfPeakWidthV ?? null, fwhmV: null,
    baseline: { method: 'linear', potentialV: new Float64Array(0), currentA: new Float64Array(0), startIndex: 0, endIndex: 0, anchors: [], description: 'test' },
    chargeC: c.chargeC ?? null, confidence: 'high', prominenceA: heightA, signalToNoise: 100, origin: 'auto',
  };
}

function fakeCouple(index: number, c: FakeCouple, peaks: PeakResult[]): CoupleResult {
  const forward = c.forward ?? 'anodic';
  const anodicPeak = c.epaV !== null && c.ipaA !== null ? peaks.push(fakePeak('anodic', c.epaV, c.ipaA, c)) - 1 : null;
  const cathodicPeak = c.epcV !== null && c.ipcA !== null ? peaks.push(fakePeak('cathodic', c.epcV, c.ipcA, c)) - 1 : null;
  const both = c.epaV !== null && c.epcV !== null;
  return {
    index, epaV: c.epaV, epcV: c.epcV, eHalfV: both ? ((c.epaV as number) + (c.epcV as number)) / 2 : null,
    deltaEpV: both ? (c.epaV as number) - (c.epcV as number) : null, ipaA: c.ipaA, ipcA: c.ipcA, ratio: null, nicholsonRatio: null,
    forwardDirection: forward, anodicPeak, cathodicPeak, anodicHalfPeakWidthV: null, cathodicHalfPeakWidthV: null,
    anodicChargeC: null, cathodicChargeC: null,
    verdict: {
      category: c.verdict ?? 'reversible', label: 'test', reasons: [],
      evidence: {
        temperatureK: STANDARD_TEMPERATURE_K, electronCount: 1, deltaEpV: null, reversibleDeltaEpLimitV: 0.057, reversibleDeltaEpAtSwitchV: null,
        reversibleHalfPeakWidthV: 0.0565, halfPeakWidthsV: { anodic: null, cathodic: null }, ratio: null,
        fwhmV: { anodic: null, cathodic: null }, adsorbedFwhmV: 0.0906,
      },
    },
  };
}

/** One-cycle analysis holding the given couples. */
export function fakeAnalysis(couples: FakeCouple[]): VoltammogramAnalysis {
  const peaks: PeakResult[] = [];
  const list = couples.map((c, i) => fakeCouple(i, c, peaks));
  return {
    cycles: [{ index: 1, peaks, couples: list, warnings: [] }],
    smoothed: null,
    noiseA: 0,
    options: {
      temperatureK: STANDARD_TEMPERATURE_K, electronCount: 1, smoothing: 'off', locatingSmoothing: { window: 5, order: 2 }, currentConvention: 'iupac', minRelativeProminence: 0.01,
      peakWindows: [], baselines: [], forwardBaseline: 'linear', returnBaseline: 'nicholson', minSignalToNoise: 8, minProminenceA: 0,
      maxDeltaEpV: 0.6, scanRateVPerS: null, cycles: [1],
    },
    warnings: [],
  };
}
