/**
 * Starting k° and R_u from ΔEp across scan rates: the inverted Nicholson table, its limits, and
 * simulated series (the simulator's ΔEp is tied to Nicholson's table within 2 mV in
 * src/core/simulation/simulateCv.kinetics.test.ts).
 */
import { describe, expect, it } from 'vitest';
import { NICHOLSON_TABLE } from '../kinetics/nicholsonPsi';
import { simulateCv } from '../simulation';
import { cathodicFirstPeaks } from '../simulation/simulationTestSupport';
import { kineticDeltaEpMv, peakSeparationStart } from './peakSeparationStart';

const cell = { diffusionCm2PerS: 1e-5, electronCount: 1, temperatureK: 298.15 };

function separations(k0CmPerS: number, ruOhm: number, rates: number[]) {
  return rates.map((v) => {
    const p = cathodicFirstPeaks(simulateCv({ k0CmPerS, uncompensatedOhm: ruOhm, concentrationOMolPerCm3: 5e-6, scanRateVPerS: v, startV: 0.4, switchV: -0.4 }));
    return { scanRateVPerS: v, deltaEpV: p.anodic.potentialV - p.cathodic.potentialV, forwardPeakA: -p.cathodic.currentA };
  });
}

describe('kineticDeltaEpMv', () => {
  // R. S. Nicholson, Anal. Chem. 37 (1965) 1351, Table I (values as in nicholsonPsi.ts).
  it('returns n·ΔEp of every row of Nicholson\'s table at its ψ', () => {
    for (const row of NICHOLSON_TABLE) expect(kineticDeltaEpMv(row.psi)).toBeCloseTo(row.nDeltaEpMv, 9);
  });

  // Reversible limit 2.218·RT/nF = 57.0 mV at 25 °C (Nicholson & Shain, Anal. Chem. 36 (1964) 706);
  // totally irreversible: each peak moves 2.303·RT/(2αnF) per decade of v, i.e. ΔEp by 4.6·RT/(αnF)
  // per decade of ψ at α = 0.5 (Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001), eq. 6.3.6).
  it('approaches 57.0 mV for a fast couple and widens by 236.6 mV per decade of ψ beyond the table', () => {
    expect(kineticDeltaEpMv(1e6)).toBeCloseTo(57.0, 1);
    expect(kineticDeltaEpMv(0.01) - kineticDeltaEpMv(0.1)).toBeCloseTo(236.6, 1);
    expect(kineticDeltaEpMv(0.5)).toBeGreaterThan(kineticDeltaEpMv(0.75));
  });
});

describe('peakSeparationStart', () => {
  it('a reversible couple behind 30 Ω: R_u within 20 % and k° on the reversible side (≥ 0.1 cm/s)', () => {
    const s = peakSeparationStart(separations(Infinity, 30, [0.1, 0.5, 2]), { ...cell, ruOhm: null });
    expect(Math.abs((s?.ruOhm ?? 0) / 30 - 1)).toBeLessThan(0.2);
    expect(s?.k0CmPerS).toBeGreaterThanOrEqual(0.1);
  });

  it('a quasi-reversible couple without R_u: k° within 30 % of 0.01 cm/s and a drop below 5 mV at the fastest scan', () => {
    const points = separations(0.01, 0, [0.1, 0.5, 2]);
    const s = peakSeparationStart(points, { ...cell, ruOhm: null });
    expect(Math.abs((s?.k0CmPerS ?? 0) / 0.01 - 1)).toBeLessThan(0.3);
    expect((s?.ruOhm ?? 0) * points[2]!.forwardPeakA).toBeLessThan(0.005);
  });

  // Why this is only a start: over 0.1–2 V/s a Nernstian couple behind 120 Ω and a k° = 0.01 cm/s
  // couple without R_u have ΔEp within 8 mV of each other; only the whole wave shape (the fit) tells them apart.
  it('ΔEp alone hardly separates R_u from slow kinetics (simulated: within 8 mV at every scan rate)', () => {
    const ohmic = separations(Infinity, 120, [0.1, 0.5, 2]);
    const slow = separations(0.01, 0, [0.1, 0.5, 2]);
    ohmic.forEach((p, k) => expect(Math.abs(p.deltaEpV - slow[k]!.deltaEpV)).toBeLessThan(0.008));
  });

  it('with R_u known, its widening is taken off before ψ; one scan rate cannot give R_u; no ΔEp gives null', () => {
    const known = peakSeparationStart(separations(0.01, 100, [0.5]), { ...cell, ruOhm: 100 });
    expect(Math.abs((known?.k0CmPerS ?? 0) / 0.01 - 1)).toBeLessThan(0.3);
    expect(peakSeparationStart(separations(0.01, 100, [0.5]), { ...cell, ruOhm: null })?.ruOhm).toBe(0);
    expect(peakSeparationStart([{ scanRateVPerS: 1, deltaEpV: Number.NaN, forwardPeakA: 1e-6 }], { ...cell, ruOhm: null })).toBeNull();
  });
});
