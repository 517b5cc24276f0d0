/**
 * Converts a potential from one reference scale to another, always through SHE:
 *   E(vs to) = E(vs from) + E(from vs SHE) − E(to vs SHE).
 * In: valueV on the `from` scale (V), reference ids, and a context for the scales that need one
 *   (pH and temperature for RHE; the measured E½ of ferrocene, or an offset, for Fc⁺/Fc; user
 *   overrides of any tabulated value). Out: V on the `to` scale.
 * Sources: table in referenceElectrodes.ts (each row names its source); RHE from the Nernst equation,
 *   E(RHE vs SHE) = −(ln 10)·RT/F·pH (1 bar H₂, ideal), slope taken at the given temperature;
 *   Fc⁺/Fc: IUPAC recommendation of an internal reference (Gritzner & Kůta 1984, from memory) and
 *   the typical +0.40 V vs SCE in MeCN/0.1 M Bu₄NPF₆ (Connelly & Geiger, Chem. Rev. 96, 877
 *   (1996), from memory), used only when nothing was measured and labelled "typical".
 * Temperature: tabulated offsets are 25 °C values; at another temperature the published
 *   dependence of calomel and of fixed-filling Ag/AgCl electrodes is applied
 *   (referenceTemperature.ts) and the basis says so; other electrodes stay at their 25 °C value and
 *   `typical25` says so (the run warns).
 */
import { AnalysisError } from '../errors';
import { STANDARD_TEMPERATURE_K, thermalVoltageV } from '../constants';
import { REFERENCE_ELECTRODES, findReferenceElectrode } from './referenceElectrodes';
import { referenceTemperatureShift } from './referenceTemperature';
import type { ReferenceId } from './referenceElectrodes';

/** Typical E½ of Fc⁺/Fc in MeCN / 0.1 M Bu₄NPF₆, V vs SCE (Connelly & Geiger 1996, from memory). */
export const TYPICAL_FERROCENE_VS_SCE_V = 0.4;

/**
 * How far E½ of Fc⁺/Fc moves with the solvent (V vs SCE, 0.1 M Bu₄NPF₆), Connelly & Geiger,
 * Chem. Rev. 96 (1996) 877, Table 1 (from memory): MeCN +0.40, DMF +0.45, CH₂Cl₂ +0.46,
 * acetone +0.48, THF +0.56.
 */
export const FERROCENE_SPREAD = 'it depends on solvent and electrolyte: +0.40 (MeCN), +0.45 (DMF), +0.46 (CH₂Cl₂), +0.48 (acetone), +0.56 V (THF) vs SCE, so the typical value can be off by 0.15 V; measure ferrocene in the same solution';

export interface InternalStandard {
  /** Measured E½ of the internal standard (V) on the scale `scale`. */
  eHalfV: number;
  scale: ReferenceId;
  /** Where the E½ came from (file name, "user"). */
  origin: string;
}

export interface ConversionContext {
  /** pH of the solution, needed for RHE. */
  pH?: number;
  /** Temperature in K for the RHE slope. @default 298.15 */
  temperatureK?: number;
  /** Fc⁺/Fc position; the typical MeCN value is used when absent. */
  internalStandard?: InternalStandard;
  /** User values of E vs SHE (V) that replace the tabulated ones. */
  overridesVsSheV?: Partial<Record<ReferenceId, number>>;
}

export interface ReferencePosition {
  eVsSheV: number;
  /** How the value was obtained, in plain words (shown in provenance). */
  basis: string;
  /** True when a typical, not measured, value was used. */
  typical: boolean;
  /** True when a 25 °C value was used at another temperature for want of a published coefficient. */
  at25Only?: boolean;
}

/** Resolves a name or id to a ReferenceId, or throws UNKNOWN_REFERENCE listing the choices. */
export function resolveReferenceId(name: string): ReferenceId {
  const hit = findReferenceElectrode(name);
  if (!hit) {
    throw new AnalysisError('UNKNOWN_REFERENCE', `unknown reference electrode "${name}"; known: ${REFERENCE_ELECTRODES.map((r) => r.id).join(', ')}`);
  }
  return hit.id;
}

/** Potential of a reference electrode against SHE (V) in the given context. */
export function referenceVsShe(id: ReferenceId, context: ConversionContext = {}): ReferencePosition {
  const override = context.overridesVsSheV?.[id];
  if (override !== undefined) {
    if (!Number.isFinite(override)) throw new AnalysisError('BAD_OPTION', `override for ${id} must be finite, got ${override}`);
    return { eVsSheV: override, basis: `${id}: user value ${override} V vs SHE`, typical: false };
  }
  if (id === 'RHE') return rheVsShe(context);
  if (id === 'Fc') return ferroceneVsShe(context);
  if (id === 'pseudo' || id === 'AgAg+') return scaleThroughStandard(id, context);
  const entry = REFERENCE_ELECTRODES.find((r) => r.id === id);
  if (!entry || entry.eVsSheV === null) throw new AnalysisError('UNKNOWN_REFERENCE', `no tabulated value for ${id}`);
  const at25 = { eVsSheV: entry.eVsSheV, basis: `${entry.label}: ${entry.eVsSheV} V vs SHE (${entry.source})`, typical: false };
  const t = context.temperatureK ?? STANDARD_TEMPERATURE_K;
  if (id === 'SHE' || Math.abs(t - STANDARD_TEMPERATURE_K) < 0.05) return at25;
  const shift = referenceTemperatureShift(id, entry.eVsSheV, t);
  const celsius = (t - 273.15).toFixed(1);
  if (!shift) return { ...at25, basis: `${at25.basis}; no published temperature coefficient applied: its 25 °C value is used at ${celsius} °C`, at25Only: true };
  const e = entry.eVsSheV + shift.shiftV;
  return { eVsSheV: e, basis: `${entry.label}: ${e.toFixed(4)} V vs SHE at ${celsius} °C (${entry.eVsSheV} V at 25 °C, ${entry.source}; ${(shift.shiftV * 1000).toFixed(1)} mV from the ${shift.source})`, typical: false };
}

function rheVsShe(context: ConversionContext): ReferencePosition {
  const pH = context.pH;
  if (pH === undefined || !Number.isFinite(pH) || pH < -2 || pH > 16) {
    throw new AnalysisError('BAD_OPTION', `the RHE scale needs the pH of the solution (-2…16), got ${String(pH)}`);
  }
  const t = context.temperatureK ?? STANDARD_TEMPERATURE_K;
  const e = -Math.LN10 * thermalVoltageV(t) * pH;
  return { eVsSheV: e, basis: `RHE at pH ${pH}, ${(t - 273.15).toFixed(1)} °C: ${e.toFixed(4)} V vs SHE (Nernst)`, typical: false };
}

function ferroceneVsShe(context: ConversionContext): ReferencePosition {
  const std = context.internalStandard;
  if (std) {
    if (std.scale === 'Fc') throw new AnalysisError('BAD_OPTION', 'the internal standard must be measured against a real reference, not Fc itself');
    const scale = referenceVsShe(std.scale, context);
    return { eVsSheV: std.eHalfV + scale.eVsSheV, basis: `Fc⁺/Fc: E½ = ${std.eHalfV.toFixed(4)} V vs ${std.scale} measured (${std.origin})`, typical: scale.typical };
  }
  const sce = referenceVsShe('SCE', context);
  return {
    eVsSheV: TYPICAL_FERROCENE_VS_SCE_V + sce.eVsSheV,
    basis: `Fc⁺/Fc: typical +${TYPICAL_FERROCENE_VS_SCE_V} V vs SCE for MeCN/0.1 M Bu₄NPF₆ (Connelly & Geiger, Chem. Rev. 96 (1996) 877, Table 1, from memory), not measured — ${FERROCENE_SPREAD}`,
    typical: true,
  };
}

/**
 * A scale with no fixed potential (a pseudo-reference wire, Ag/Ag⁺ in an organic solvent) is
 * placed only through an internal standard measured on it: E(scale vs SHE) = E(Fc vs SHE) − E½(Fc
 * vs scale). Fc vs SHE itself is the typical value, so the result is marked typical; the
 * conversion to the Fc⁺/Fc scale does not depend on it (referenceOffset.ts takes it directly).
 */
function scaleThroughStandard(id: 'pseudo' | 'AgAg+', context: ConversionContext): ReferencePosition {
  const std = context.internalStandard;
  const label = id === 'pseudo' ? 'a pseudo-reference' : 'Ag/Ag⁺';
  if (!std || std.scale !== id) {
    throw new AnalysisError('UNKNOWN_REFERENCE', `${label} has no fixed potential; it can be converted only through an internal standard (Fc⁺/Fc) measured in the same or a companion file`);
  }
  const { internalStandard: _measured, ...withoutStandard } = context;
  const fc = ferroceneVsShe(withoutStandard);
  return { eVsSheV: fc.eVsSheV - std.eHalfV, basis: `${label}: Fc⁺/Fc measured at ${std.eHalfV.toFixed(4)} V on it (${std.origin}); placed vs SHE through the typical Fc⁺/Fc value`, typical: true };
}

/** E on the `to` scale (V) from E on the `from` scale (V). */
export function convertPotential(valueV: number, from: ReferenceId, to: ReferenceId, context: ConversionContext = {}): number {
  if (!Number.isFinite(valueV)) throw new AnalysisError('NON_FINITE', `potential to convert must be finite, got ${valueV}`);
  if (from === to) return valueV;
  return valueV + referenceVsShe(from, context).eVsSheV - referenceVsShe(to, context).eVsSheV;
}
