/**
 * The constant that takes potentials from the scale a file was recorded on to the scale results
 * are reported on: offset = E(from vs SHE) − E(to vs SHE), so that E(vs to) = E(vs from) + offset.
 * This is the one function the screen's display scale and the analysis run both use.
 * In: the two scale ids and a conversion context (pH, temperature, internal standard, user values).
 * Out: the offset (V), the plain-words basis of each scale, and whether a typical (not measured)
 *   value entered. Source: convertPotential.ts (conversion through SHE); temperature coefficients
 *   are applied only when both ends have one (referenceTemperature.ts).
 */
import { STANDARD_TEMPERATURE_K } from '../constants';
import { referenceVsShe, type ConversionContext } from './convertPotential';
import { REFERENCE_ELECTRODES, type ReferenceId } from './referenceElectrodes';
import { HG_OXIDE_ACID_STANDARD_POTENTIAL_V, hgOxideVsRheV, hydroxideNominalPh } from './hgOxideElectrode';

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
  const hgo = hgOxideAndRhe(from, to, context);
  if (hgo) return hgo;
  let a = referenceVsShe(from, context);
  let b = referenceVsShe(to, context);
  // When one electrode has no published temperature dependence, correcting only the other would
  // be half a correction: both stay at their 25 °C values then (the run warns).
  if (a.at25Only || b.at25Only) {
    const at25 = { ...context, temperatureK: STANDARD_TEMPERATURE_K };
    if (!a.at25Only && TABULATED(from)) a = referenceVsShe(from, at25);
    if (!b.at25Only && TABULATED(to)) b = referenceVsShe(to, at25);
  }
  return { offsetV: a.eVsSheV - b.eVsSheV, from, to, basis: [a.basis, b.basis], typical: a.typical || b.typical };
}

/** Hg/HgO fillings: mol/L of hydroxide. */
const HG_OXIDE_MOLAR: Partial<Record<ReferenceId, 0.1 | 1>> = { 'HgO-1M': 1, 'HgO-0.1M': 0.1, 'HgO-1M-KOH': 1, 'HgO-0.1M-KOH': 0.1 };

/**
 * Between an Hg/HgO electrode and the RHE the offset is taken directly (hgOxideVsRheV: 0.926 V in
 * the filling's own solution whatever its pH), not through SHE, where the electrode's activity
 * value and a nominal pH would not cancel. Not when the user gave the electrode a value of their own.
 */
function hgOxideAndRhe(from: ReferenceId, to: ReferenceId, context: ConversionContext): ReferenceOffset | null {
  const hgo = from === 'RHE' ? to : to === 'RHE' ? from : null;
  const molar = hgo === null ? undefined : HG_OXIDE_MOLAR[hgo];
  if (hgo === null || molar === undefined || context.overridesVsSheV?.[hgo] !== undefined || context.overridesVsSheV?.RHE !== undefined) return null;
  const rhe = referenceVsShe('RHE', context);
  const pH = context.pH as number;
  const e = hgOxideVsRheV(molar, pH, context.temperatureK ?? STANDARD_TEMPERATURE_K);
  const label = REFERENCE_ELECTRODES.find((r) => r.id === hgo)?.label ?? hgo;
  const fill = hydroxideNominalPh(molar);
  const basis = `${label} vs RHE at pH ${pH}: ${e.toFixed(4)} V = ${HG_OXIDE_ACID_STANDARD_POTENTIAL_V.toFixed(4)} V + (ln 10)RT/F·(pH − ${fill.toFixed(1)}) (both answer to pH alike, so in the filling's own solution the pair reads E° of HgO + 2H⁺ + 2e⁻ → Hg + H₂O, 0.926 V, Bard & Faulkner 2001 App. C, from memory, whatever the pH; the filling's pH taken as 14 + log10 c, the pH given read on the same scale; no junction)`;
  const offsetV = from === 'RHE' ? -e : e;
  return { offsetV, from, to, basis: [basis, rhe.basis], typical: false };
}

function direct(std: NonNullable<ConversionContext['internalStandard']>): string {
  return `Fc⁺/Fc: E½ = ${std.eHalfV.toFixed(4)} V vs ${std.scale}, measured (${std.origin}); 0 V on the Fc⁺/Fc scale by definition`;
}

/** Scales whose value is a tabulated 25 °C number (not SHE itself, RHE, the internal standard or
 *  the scales that exist only through a measured standard). */
const TABULATED = (id: ReferenceId) => id !== 'SHE' && id !== 'RHE' && id !== 'Fc' && id !== 'pseudo' && id !== 'AgAg+';
