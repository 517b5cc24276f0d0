/**
 * The constant that takes potentials from the scale a file was recorded on to the scale results
 * are reported on: offset = E(from vs SHE) − E(to vs SHE), so that E(vs to) = E(vs from) + offset.
 * This is the one function the screen's display scale and the analysis run both use.
 * In: the two scale ids and a conversion context (pH, temperature, internal standard, user values).
 * Out: the offset (V), the plain-words basis of each scale, and whether a typical (not measured)
 *   value entered. Source: convertPotential.ts (conversion through SHE).
 */
import { referenceVsShe, type ConversionContext } from './convertPotential';
import type { ReferenceId } from './referenceElectrodes';

export interface ReferenceOffset {
  /** Add to a potential on `from` to get it on `to` (V). */
  offsetV: number;
  from: ReferenceId;
  to: ReferenceId;
  /** How each scale's position against SHE was obtained. */
  basis: string[];
  /** True when a typical rather than measured value was used (e.g. Fc⁺/Fc not measured). */
  typical: boolean;
}

export function referenceOffset(from: ReferenceId, to: ReferenceId, context: ConversionContext = {}): ReferenceOffset {
  if (from === to) return { offsetV: 0, from, to, basis: [], typical: false };
  // Between the internal standard's own scale and Fc⁺/Fc the measured E½ is the whole offset
  // (definition of the Fc⁺/Fc scale); no typical value enters.
  const std = context.internalStandard;
  if (std && to === 'Fc' && from === std.scale) return { offsetV: -std.eHalfV, from, to, basis: [direct(std)], typical: false };
  if (std && from === 'Fc' && to === std.scale) return { offsetV: std.eHalfV, from, to, basis: [direct(std)], typical: false };
  const a = referenceVsShe(from, context);
  const b = referenceVsShe(to, context);
  return { offsetV: a.eVsSheV - b.eVsSheV, from, to, basis: [a.basis, b.basis], typical: a.typical || b.typical };
}

function direct(std: NonNullable<ConversionContext['internalStandard']>): string {
  return `Fc⁺/Fc: E½ = ${std.eHalfV.toFixed(4)} V vs ${std.scale}, measured (${std.origin}); 0 V on the Fc⁺/Fc scale by definition`;
}
