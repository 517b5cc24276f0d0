/**
 * Current sign conventions. The core works in the IUPAC convention (anodic current positive);
 * the older polarographic convention plots cathodic current positive.
 * In/out: currents in A. Conversion is a sign change of every point (the potential axis
 *   direction is a display matter and is not touched here).
 * Source: IUPAC Gold Book, "electrode current density" and "partial currents" (anodic positive);
 *   Analytical Sciences Digital Library, "Plotting Conventions for Voltammetry" (polarographic
 *   convention).
 */
import type { CurrentConvention } from '../types';

export type { CurrentConvention };

/** A copy of `currentA` in the IUPAC convention. */
export function toIupacCurrent(currentA: ArrayLike<number>, from: CurrentConvention): Float64Array {
  const out = Float64Array.from(currentA);
  if (from === 'polarographic') for (let i = 0; i < out.length; i++) out[i] = -(out[i] as number);
  return out;
}

/** A copy of IUPAC `currentA` in the requested convention. */
export function fromIupacCurrent(currentA: ArrayLike<number>, to: CurrentConvention): Float64Array {
  return toIupacCurrent(currentA, to);
}

/** One signed IUPAC current value in the requested convention. */
export function currentInConvention(currentA: number, to: CurrentConvention): number {
  return to === 'polarographic' ? -currentA : currentA;
}
