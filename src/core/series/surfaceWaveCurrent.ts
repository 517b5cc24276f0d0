/**
 * Current of a surface-confined (adsorbed) wave at a potential of its own sweep, from the wave's
 * peak potential and charge: the part of a charging-current reading a film still carries there.
 * In: potentialV, the sweep's peak potential epV (V), the wave's charge (C, magnitude), the scan
 *   rate (V/s), n, T (K); for the slow form αn of the sweep's direction. Out: the current's
 *   magnitude (A), anodic on the positive-going sweep, cathodic on the negative-going one.
 * Sources: Nernstian film, i = (nF/RT)·Q·v·θ/(1 + θ)², θ = exp(nF(E − E°′)/RT), peak Q·v·nF/4RT
 *   (E. Laviron, J. Electroanal. Chem. 52 (1974) 355; Bard & Faulkner, Electrochemical Methods,
 *   2nd ed. (2001), §14.3, with Q = nFAΓ); totally irreversible film,
 *   i = (αnF/RT)·Q·v·exp(x)·exp(−exp(x)), x = αnF(E − Ep)/RT towards the sweep, peak αnFQv/(e·RT)
 *   (E. Laviron, J. Electroanal. Chem. 101 (1979) 19, the irreversible wave; the form here is
 *   that wave written about its own Ep, which follows from it by substitution).
 * Assumptions of the sources: Langmuir isotherm, no lateral interactions, the wave's own Ep and Q
 *   as measured; neither form holds for a quasi-reversible film between the two limits.
 */
import { assertFiniteInRange } from '../errors';
import { inverseThermalVoltagePerV, STANDARD_TEMPERATURE_K } from '../constants';
import type { SweepDirection } from '../types';

export interface SurfaceWaveCurrentInput {
  potentialV: number;
  direction: SweepDirection;
  /** Peak potential of the wave on this sweep (V); E°′ for a Nernstian film. */
  epV: number;
  /** Charge under the wave (C, magnitude). */
  chargeC: number;
  scanRateVPerS: number;
  electronCount: number;
  /** @default 298.15 */
  temperatureK?: number;
}

function checked(input: SurfaceWaveCurrentInput): number {
  assertFiniteInRange('potentialV', input.potentialV);
  assertFiniteInRange('epV', input.epV);
  assertFiniteInRange('chargeC', input.chargeC, 0);
  assertFiniteInRange('scanRateVPerS', input.scanRateVPerS, Number.MIN_VALUE);
  assertFiniteInRange('electronCount', input.electronCount, Number.MIN_VALUE);
  return inverseThermalVoltagePerV(input.temperatureK ?? STANDARD_TEMPERATURE_K);
}

/** Nernstian film (Laviron 1974): the same bell on both sweeps, centred on E°′ (here epV). */
export function nernstianSurfaceCurrentA(input: SurfaceWaveCurrentInput): number {
  const f = checked(input);
  const nf = input.electronCount * f;
  // θ/(1 + θ)² written with |E − E°′| so that far tails do not overflow.
  const t = Math.exp(-nf * Math.abs(input.potentialV - input.epV));
  return nf * input.chargeC * input.scanRateVPerS * (t / (1 + t) ** 2);
}

/** Totally irreversible film (Laviron 1979) of transfer coefficient alphaN (αa·n or αc·n) on its sweep. */
export function irreversibleSurfaceCurrentA(input: SurfaceWaveCurrentInput & { alphaN: number }): number {
  const f = checked(input);
  assertFiniteInRange('alphaN', input.alphaN, Number.MIN_VALUE);
  const towards = input.direction === 'positive' ? input.potentialV - input.epV : input.epV - input.potentialV;
  const x = input.alphaN * f * towards;
  if (x > 50) return 0;
  return input.alphaN * f * input.chargeC * input.scanRateVPerS * Math.exp(x - Math.exp(x));
}
