/**
 * Correction of the applied potential for the ohmic drop across the uncompensated resistance.
 * In: potentialV (applied, V), currentA (IUPAC sign: anodic positive, A), ruOhm (Ω, ≥ 0).
 * Out: the interfacial potential E − i·Ru (V), a new array.
 * Source: Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001), §1.3.4 (ohmic drop, from
 *   memory): an anodic current makes the working electrode's true potential lag the applied one by
 *   i·Ru, so the correction subtracts i·Ru with i signed in the IUPAC convention.
 * Caution: post-hoc correction cannot undo the distortion of the current itself; a Ru that is
 *   too large over-corrects and may even fold the potential axis back (reported by the caller).
 */
import { assertFiniteInRange, assertSameLength } from '../errors';

export function iRCorrect(potentialV: ArrayLike<number>, currentA: ArrayLike<number>, ruOhm: number): Float64Array {
  assertSameLength({ potentialV, currentA }, 1);
  assertFiniteInRange('ruOhm', ruOhm, 0);
  const out = new Float64Array(potentialV.length);
  for (let i = 0; i < out.length; i++) out[i] = (potentialV[i] as number) - (currentA[i] as number) * ruOhm;
  return out;
}

/** The correction for one point: E − i·Ru (V). */
export function iRCorrectPoint(potentialV: number, currentA: number, ruOhm: number): number {
  assertFiniteInRange('ruOhm', ruOhm, 0);
  return potentialV - currentA * ruOhm;
}
