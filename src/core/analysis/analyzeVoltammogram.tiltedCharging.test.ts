/**
 * A double-layer capacitance that changes with potential tilts the background, and its current
 * turns sign with the sweep: i_c = A·C_d(E)·dE/dt (Bard & Faulkner, Electrochemical Methods,
 * 2nd ed. (2001) §1.2.2, from memory). The return baseline keeps the forward slope, so only the
 * return peak moves, by about 2·(dI/dE)·(E_p,return − E_switch) (our derivation,
 * tiltedChargingBias.ts). The numbers are left as they are (a leak current tilts the same way and
 * is measured right); the warning must say it, with the bound, and stay silent for a flat
 * background and for noise.
 * Traces: this project's simulator (src/core/simulation) for a reversible couple without C_d; the
 * charging current A·C_d0·(1 + s·(E − E°′))·dE/dt added here (our own scenario: 20 µF/cm²,
 * s = 0 or 3 /V, 1 V/s, 3 mm disk).
 */
import { describe, expect, it } from 'vitest';
import { simulateCv } from '../simulation';
import { findSweepSegments } from '../sweeps/findSweepSegments';
import { seededGaussian } from '../random/seededGaussian';
import type { Voltammogram } from '../types';
import { analyzeVoltammogram } from './analyzeVoltammogram';

const areaCm2 = 0.0707;
const scanRateVPerS = 1;

function tilted(slopePerV: number, noiseA = 0): Voltammogram {
  const run = simulateCv({ k0CmPerS: Infinity, formalPotentialV: 0, startV: 0.35, switchV: -0.35, scanRateVPerS, areaCm2, stepV: 0.001 });
  const split = findSweepSegments(run.potentialV);
  const currentA = Float64Array.from(run.faradaicCurrentA);
  const g = seededGaussian(11);
  for (const seg of split.segments) {
    const dEdt = seg.direction === 'positive' ? scanRateVPerS : -scanRateVPerS;
    for (let k = seg.start; k < seg.end; k++) currentA[k]! += areaCm2 * 20e-6 * (1 + slopePerV * run.potentialV[k]!) * dEdt + noiseA * g();
  }
  return { potentialV: run.potentialV, currentA, timeS: run.timeS, segments: split.segments, cycles: split.cycles, scanRateVPerS, scanRateSource: 'option' };
}

const tiltWarnings = (v: Voltammogram) => analyzeVoltammogram(v).cycles[0]!.warnings.filter((w) => w.code === 'BACKGROUND_TILT');

describe('tilted charging background under the return peak', () => {
  it('flat C_d: no warning', () => {
    expect(tiltWarnings(tilted(0))).toHaveLength(0);
  });

  it('C_d rising 3 /V: the return ip moves, the forward ip not; the warning states a bound within a third of the actual shift', () => {
    const flat = analyzeVoltammogram(tilted(0)).cycles[0]!.couples[0]!;
    const a = analyzeVoltammogram(tilted(3));
    const c = a.cycles[0]!.couples[0]!;
    expect(Math.abs(c.ipcA! / flat.ipcA! - 1)).toBeLessThan(0.003);
    const shift = Math.abs(c.ipaA! / flat.ipaA! - 1);
    expect(shift).toBeGreaterThan(0.02);
    const w = a.cycles[0]!.warnings.filter((x) => x.code === 'BACKGROUND_TILT');
    expect(w).toHaveLength(1);
    const stated = Number(/\(([0-9.]+) %\)/.exec(w[0]!.message)![1]) / 100;
    expect(Math.abs(stated / shift - 1)).toBeLessThan(1 / 3);
    expect(w[0]!.message).toMatch(/blank/);
  });

  it('flat C_d under 1 % noise of the peak: no warning (the slope stays within 3 standard errors)', () => {
    expect(tiltWarnings(tilted(0, 6e-7))).toHaveLength(0);
  });
});
