/**
 * Property checks over random but physical inputs (fast-check, fixed seed): the simulator always
 * returns finite columns of the right length, the ohmic identity holds, and charge is bounded by
 * what the solution (or the film) can supply. Common practice, no source.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { FARADAY_C_PER_MOL as F } from '../constants';
import { simulateCv } from './simulateCv';

const inputArb = fc.record({
  mechanism: fc.constantFrom('E' as const, 'EC' as const, 'surface' as const),
  logK0: fc.double({ min: -6, max: 1, noNaN: true }),
  alpha: fc.double({ min: 0.2, max: 0.8, noNaN: true }),
  electronCount: fc.integer({ min: 1, max: 3 }),
  logD: fc.double({ min: -6, max: -4.3, noNaN: true }),
  logV: fc.double({ min: -2, max: 1, noNaN: true }),
  ruOhm: fc.constantFrom(0, 50, 500),
  cdl: fc.constantFrom(0, 2e-5),
  logKf: fc.double({ min: -2, max: 3, noNaN: true }),
  logKs: fc.double({ min: -1, max: 4, noNaN: true }),
  reductionFirst: fc.boolean(),
});

describe('simulateCv properties', () => {
  it('finite output, ohmic identity and bounded charge for random inputs', () => {
    fc.assert(
      fc.property(inputArb, (x) => {
        const conc = 1e-6;
        const r = simulateCv({
          mechanism: x.mechanism, k0CmPerS: 10 ** x.logK0, alpha: x.alpha, electronCount: x.electronCount,
          diffusionOCm2PerS: 10 ** x.logD, diffusionRCm2PerS: 10 ** x.logD, scanRateVPerS: 10 ** x.logV,
          concentrationOMolPerCm3: x.reductionFirst ? conc : 0, concentrationRMolPerCm3: x.reductionFirst ? 0 : conc,
          startV: x.reductionFirst ? 0.5 : -0.5, switchV: x.reductionFirst ? -0.5 : 0.5, stepV: 0.002,
          uncompensatedOhm: x.ruOhm, doubleLayerFPerCm2: x.cdl, followUpRatePerS: 10 ** x.logKf, surfaceRatePerS: 10 ** x.logKs,
        });
        expect(r.currentA.length).toBe(1001);
        let faradaicCharge = 0;
        for (let k = 0; k < r.currentA.length; k++) {
          expect(Number.isFinite(r.currentA[k])).toBe(true);
          const drop = (r.potentialV[k] as number) - (r.interfacialPotentialV[k] as number);
          expect(Math.abs(drop - (r.currentA[k] as number) * x.ruOhm)).toBeLessThan(1e-9);
          if (k > 0) faradaicCharge += Math.abs(r.faradaicCurrentA[k] as number) * ((r.timeS[k] as number) - (r.timeS[k - 1] as number));
        }
        // Charge cannot exceed twice the film (both sweeps) or what diffusion supplies over the
        // run from a planar electrode, 2nFAC(Dt/π)^½ per sweep (Cottrell bound, Bard & Faulkner
        // 2nd ed. §5.2, from memory), with a factor 2 of margin.
        const tTotal = r.timeS[r.timeS.length - 1] as number;
        const bound = x.mechanism === 'surface'
          ? 2 * x.electronCount * F * 0.0707 * 1e-10
          : 4 * x.electronCount * F * 0.0707 * conc * Math.sqrt((10 ** x.logD * tTotal) / Math.PI);
        expect(faradaicCharge).toBeLessThan(bound * 1.0001);
      }),
      { seed: 20261201, numRuns: 25 },
    );
  });
});
