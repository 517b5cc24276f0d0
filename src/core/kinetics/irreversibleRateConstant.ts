/**
 * Standard rate constant k° and formal potential E°′ of a totally irreversible, diffusing couple
 * from the positions of both peaks.
 * In: epaV, epcV (V), scanRateVPerS, alpha (of the reduction), transferElectronCount nₐ,
 *   diffusionOxCm2PerS D_O and diffusionRedCm2PerS D_R, temperatureK. Out: k° (cm/s), E°′ (V).
 * Source: the totally irreversible peak potential (J. Wang, Analytical Electrochemistry, 2nd ed.
 *   (2000), eq. 2-5; Bard & Faulkner 2nd ed. §6.3), written for the reduction with α and for the
 *   oxidation with 1 − α:
 *     Epc = E°′ − (RT/αnₐF)·[0.780 + ln(D_O^½/k°) + ½ ln(αnₐFv/RT)]
 *     Epa = E°′ + (RT/(1−α)nₐF)·[0.780 + ln(D_R^½/k°) + ½ ln((1−α)nₐFv/RT)]
 *   The two lines are solved together for ln k° and E°′ (algebra, no further source).
 * Range: only for couples past Nicholson's table (nₐ·ΔEp > 212 mV at 25 °C), where both waves are
 *   totally irreversible; the function refuses below that.
 */
import { AnalysisError, assertFiniteInRange } from '../errors';
import { STANDARD_TEMPERATURE_K, thermalVoltageV } from '../constants';
import { TABLE_RANGE_MV } from './nicholsonPsi';

export interface IrreversibleRateConstantInput {
  epaV: number;
  epcV: number;
  scanRateVPerS: number;
  diffusionOxCm2PerS: number;
  /** @default diffusionOxCm2PerS */
  diffusionRedCm2PerS?: number;
}

export interface IrreversibleRateConstantOptions {
  /** Transfer coefficient α of the reduction, in (0, 1). @default 0.5 */
  alpha?: number;
  /** Electrons in the rate-determining step nₐ. @default 1 */
  transferElectronCount?: number;
  /** Temperature in K. @default 298.15 */
  temperatureK?: number;
}

/** The bracket [0.780 + ln(D^½/k°) + ½ ln(a·nₐFv/RT)] without the −ln k° term. */
function bracket(a: number, na: number, dCm2PerS: number, v: number, rt: number): number {
  return 0.78 + 0.5 * Math.log(dCm2PerS) + 0.5 * Math.log((a * na * v) / rt);
}

export function irreversibleRateConstant(
  input: IrreversibleRateConstantInput,
  options: IrreversibleRateConstantOptions = {},
): { k0CmPerS: number; formalPotentialV: number } {
  const alpha = options.alpha ?? 0.5;
  const na = options.transferElectronCount ?? 1;
  const t = options.temperatureK ?? STANDARD_TEMPERATURE_K;
  const dO = input.diffusionOxCm2PerS;
  const dR = input.diffusionRedCm2PerS ?? dO;
  for (const [name, value] of [['epaV', input.epaV], ['epcV', input.epcV]] as const) assertFiniteInRange(name, value);
  assertFiniteInRange('scanRateVPerS', input.scanRateVPerS, Number.MIN_VALUE);
  assertFiniteInRange('diffusionOxCm2PerS', dO, Number.MIN_VALUE);
  assertFiniteInRange('diffusionRedCm2PerS', dR, Number.MIN_VALUE);
  assertFiniteInRange('alpha', alpha, 0.01, 0.99);
  assertFiniteInRange('transferElectronCount', na, Number.MIN_VALUE);
  assertFiniteInRange('temperatureK', t, Number.MIN_VALUE);
  const x = na * (input.epaV - input.epcV) * 1000 * (STANDARD_TEMPERATURE_K / t);
  if (x <= TABLE_RANGE_MV[1]) {
    throw new AnalysisError('OUT_OF_RANGE', `nₐ·ΔEp = ${x.toFixed(1)} mV (at 25 °C): both waves are totally irreversible only beyond ${TABLE_RANGE_MV[1]} mV`);
  }
  const rt = thermalVoltageV(t);
  const bc = rt / (alpha * na);
  const ba = rt / ((1 - alpha) * na);
  const gc = bracket(alpha, na, dO, input.scanRateVPerS, rt);
  const ga = bracket(1 - alpha, na, dR, input.scanRateVPerS, rt);
  // ΔEp = ba·(ga − ln k°) + bc·(gc − ln k°)
  const lnK = (ba * ga + bc * gc - (input.epaV - input.epcV)) / (ba + bc);
  return { k0CmPerS: Math.exp(lnK), formalPotentialV: input.epcV + bc * (gc - lnK) };
}
