/**
 * The return peak of a slow (totally irreversible) couple turned far past its forward peak sits on
 * the forward wave's decay, however far the switch lies: it is measured from that decay extended
 * past the switch (R. S. Nicholson, "Semiempirical procedure for measuring with stationary
 * electrode polarography rates of chemical reactions involving the product of electron transfer",
 * Anal. Chem. 38 (1966) 1406, from memory: the return peak measured from the current that would
 * flow with the potential held at the switch).
 * Reference: far past a totally irreversible wave the surface concentration of the reactant is
 * zero, so its current is the diffusion-limited one whatever the potential (Bard & Faulkner,
 * Electrochemical Methods, 2nd ed. (2001) §5.2, Cottrell, eq. 5.2.11, from memory): the current
 * with the potential held at the switch equals that of the same sweep continued past the switch.
 * Both are simulated with this project's simulator (src/core/simulation) on one space grid; the
 * true return ip is the largest difference of the faradaic currents, the true return Ep the
 * potential of the faradaic current's own extremum (the total return current, as Nicholson's
 * ΔEp tables take it). Scenario of our own making: E°′ = 0 V, k° = 2e-6 cm/s, 0.1 V/s, C_dl
 * 20 µF/cm², the switch 0.5–0.7 V past the forward peak and the return peak about 0.1 V before
 * the end of its sweep (there its candidate stands little above its surroundings, and was left
 * unpaired when the baselines were chosen: the return sweep's own straight line was drawn, ip
 * 57–69 % low).
 */
import { describe, expect, it } from 'vitest';
import { simulateCv, type CvSimulationInput } from '../simulation';
import { findSweepSegments } from '../sweeps/findSweepSegments';
import type { Voltammogram } from '../types';
import { analyzeVoltammogram } from './analyzeVoltammogram';

interface ReturnTruth {
  voltammogram: Voltammogram;
  returnIpA: number;
  returnEpV: number;
  forwardIpA: number;
}

/** The trace with C_dl, and the true return ip from the same sweep continued past the switch. */
function slowCoupleWithTruth(input: Partial<CvSimulationInput>): ReturnTruth {
  const run = simulateCv(input);
  const grid = { firstSpacingCm: run.numerics.firstSpacingCm, outerEdgeCm: run.numerics.outerEdgeCm };
  const startV = input.startV!;
  const switchV = input.switchV!;
  // Its first sweep lasts as long as the whole cycle.
  const continued = simulateCv({ ...input, switchV: 2 * switchV - startV }, { fixedGrids: [grid], firstSweepOnly: true });
  const split = findSweepSegments(run.potentialV);
  const fwd = split.segments[0]!;
  const back = split.segments[1]!;
  const s = switchV < startV ? 1 : -1; // return peak anodic (+1) after a reduction first
  let returnIpA = 0;
  let returnEpV = NaN;
  let extremum = -Infinity;
  for (let k = back.start; k < back.end; k++) {
    // Same time step in both runs: both sweeps move by the same increment per point.
    expect(Math.abs(continued.timeS[k]! - run.timeS[k]!)).toBeLessThan(1e-9);
    returnIpA = Math.max(returnIpA, s * (run.faradaicCurrentA[k]! - continued.faradaicCurrentA[k]!));
    if (s * run.faradaicCurrentA[k]! > extremum) {
      extremum = s * run.faradaicCurrentA[k]!;
      returnEpV = run.potentialV[k]!;
    }
  }
  let forwardIpA = 0;
  for (let k = fwd.start; k < fwd.end; k++) forwardIpA = Math.max(forwardIpA, -s * run.faradaicCurrentA[k]!);
  const voltammogram: Voltammogram = { potentialV: run.potentialV, currentA: run.currentA, timeS: run.timeS, segments: split.segments, cycles: split.cycles, scanRateVPerS: 0.1, scanRateSource: 'option' };
  return { voltammogram, returnIpA, returnEpV, forwardIpA };
}

const slow = { k0CmPerS: 2e-6, formalPotentialV: 0, scanRateVPerS: 0.1, doubleLayerFPerCm2: 20e-6, stepV: 0.001 };

describe('return peak of a slow couple far from the switch', () => {
  it.each([
    ['reduction first, α = 0.7, switch about 0.5 V past Epc', { ...slow, alpha: 0.7, startV: 0.8, switchV: -0.8 }],
    ['oxidation first, α = 0.3, switch about 0.7 V past Epa', { ...slow, alpha: 0.3, startV: -0.8, switchV: 1.0, concentrationOMolPerCm3: 0, concentrationRMolPerCm3: 1e-6 }],
  ])('%s: return ip within 1 % and Ep within 1 mV of the decay-based truth, measured on the extended decay', (_, input) => {
    const truth = slowCoupleWithTruth(input);
    const a = analyzeVoltammogram(truth.voltammogram);
    const couples = a.cycles[0]!.couples;
    expect(couples).toHaveLength(1);
    const c = couples[0]!;
    const reductionFirst = input.switchV < input.startV;
    const ipReturn = reductionFirst ? c.ipaA! : c.ipcA!;
    const epReturn = reductionFirst ? c.epaV! : c.epcV!;
    const ipForward = reductionFirst ? c.ipcA! : c.ipaA!;
    expect(Math.abs(ipForward / truth.forwardIpA - 1)).toBeLessThan(0.015);
    expect(Math.abs(ipReturn / truth.returnIpA - 1)).toBeLessThan(0.01);
    expect(Math.abs(epReturn - truth.returnEpV)).toBeLessThan(0.001);
    expect(Math.abs(c.ratio! - truth.returnIpA / truth.forwardIpA)).toBeLessThan(0.015);
    const returnPeak = a.cycles[0]!.peaks.find((p) => p.direction === (reductionFirst ? 'anodic' : 'cathodic'))!;
    expect(returnPeak.baseline.method).toBe('nicholson');
  });
});
