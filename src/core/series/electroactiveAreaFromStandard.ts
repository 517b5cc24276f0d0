/**
 * Electroactive electrode area from a scan-rate series of a standard couple of known D.
 * In: the slope of |ip| (A) against v^½ ((V/s)^½) for the standard, its electronCount n, bulk
 *   concentrationMolPerCm3 and diffusionCm2PerS; the Randles–Ševčík form and temperature.
 * Out: areaCm2 = slope / [k·n F C (n F D/RT)^½] (reversible form; see randlesSevcik.ts).
 * Source: Randles–Ševčík equation solved for A (Bard & Faulkner, Electrochemical Methods, 2nd ed.
 *   (2001), §6.2). Standards are usually ferri/ferrocyanide in KCl or ferrocene in MeCN; their D
 *   values scatter by 10 % or more between reports (e.g. ferrocene in MeCN: Wang, Rogers & Compton,
 *   J. Electroanal. Chem. 648 (2010) 15; spread from memory), which carries straight
 *   into the area as ±5 % (A ∝ D^-½).
 */
import { assertFiniteInRange } from '../errors';
import { randlesSevcikCoefficient } from './randlesSevcik';
import type { RandlesSevcikOptions } from './randlesSevcik';

export interface ElectroactiveAreaInput {
  slopeAPerSqrtVPerS: number;
  electronCount: number;
  concentrationMolPerCm3: number;
  diffusionCm2PerS: number;
}

export function electroactiveAreaFromStandard(input: ElectroactiveAreaInput, options: RandlesSevcikOptions = {}): number {
  assertFiniteInRange('slopeAPerSqrtVPerS', input.slopeAPerSqrtVPerS);
  assertFiniteInRange('diffusionCm2PerS', input.diffusionCm2PerS, Number.MIN_VALUE);
  const perUnitArea = randlesSevcikCoefficient(
    { electronCount: input.electronCount, areaCm2: 1, concentrationMolPerCm3: input.concentrationMolPerCm3 },
    options,
  );
  return Math.abs(input.slopeAPerSqrtVPerS) / (perUnitArea * Math.sqrt(input.diffusionCm2PerS));
}
