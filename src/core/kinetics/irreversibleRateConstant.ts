/**
 * Standard rate constant k° and formal potential E°′ of a totally irreversible, diffusing couple
 * from the positions of both peaks, and the peak positions the same equation predicts.
 * In: epaV, epcV (V), scanRateVPerS, alpha = αc (the cathodic transfer coefficient, of
 *   O + ne⁻ → R), transferElectronCount nₐ, diffusionOxCm2PerS D_O and diffusionRedCm2PerS D_R,
 *   temperatureK. Out: k° (cm/s), E°′ (V).
 * Source: the totally irreversible peak potential (J. Wang, Analytical Electrochemistry, 2nd ed.
 *   (2000), eq. 2-5; Bard & Faulkner 2nd ed. §6.3), written for the reduction with αc and for the
 *   oxidation with 1 − αc:
 *     Epc = E°′ − (RT/αnₐF)·[0.780 + ln(D_O^½/k°) + ½ ln(αnₐFv/RT)]
 *     Epa = E°′ + (RT/(1−α)nₐF)·[0.780 + ln(D_R^½/k°) + ½ ln((1−α)nₐFv/RT)]
 *   The two lines are solved together for ln k° and E°′ (algebra, no further source).
 * Limit of the source: the equation describes one sweep into a uniform solution. The return peak
 *   starts from the profile the forward sweep left and does not obey it (k° comes out 2–12 % high);
 *   correctedIrreversibleRateConstant.ts removes that. This two-peak solution is its first guess.
 * Range: only for couples past Nicholson's table (nₐ·ΔEp > 212 mV at 25 °C), where both waves are
 *   totally irreversible; the checked function refuses below that.
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
  /** αc, the cathodic transfer coefficient (of O + ne⁻ → R), in (0, 1); the oxidation runs with 1 − αc. @default 0.5 */
  alpha?: number;
  /** Electrons in the rate-determining step nₐ. @default 1 */
  transferElectronCount?: number;
  /** Temperature in K. @default 298.15 */
  temperatureK?: number;
}

interface Resolved { alpha: number; na: number; rt: number; dO: number; dR: number; v: number }

/** The bracket [0.780 + ln(D^½/k°) + ½ ln(a·nₐFv/RT)] without the −ln k° term. */
function bracket(a: number, na: number, dCm2PerS: number, v: number, rt: number): number {
  return 0.78 + 0.5 * Math.log(dCm2PerS) + 0.5 * Math.log((a * na * v) / rt);
}

function resolve(input: IrreversibleRateConstantInput, options: IrreversibleRateConstantOptions): Resolved {
  const alpha = options.alpha ?? 0.5;
  const na = options.transferElectronCount ?? 1;
  const t = options.temperatureK ?? STANDARD_TEMPERATURE_K;
  const dO = input.diffusionOxCm2PerS;
  const dR = input.diffusionRedCm2PerS ?? dO;
  assertFiniteInRange('scanRateVPerS', input.scanRateVPerS, Number.MIN_VALUE);
  assertFiniteInRange('diffusionOxCm2PerS', dO, Number.MIN_VALUE);
  assertFiniteInRange('diffusionRedCm2PerS', dR, Number.MIN_VALUE);
  assertFiniteInRange('alpha', alpha, 0.01, 0.99);
  assertFiniteInRange('transferElectronCount', na, Number.MIN_VALUE);
  assertFiniteInRange('temperatureK', t, Number.MIN_VALUE);
  return { alpha, na, rt: thermalVoltageV(t), dO, dR, v: input.scanRateVPerS };
}

/** Epa and Epc (V) that eq. 2-5 predicts for a couple with this E°′ and k°. */
export function irreversiblePeakPotentials(
  input: Omit<IrreversibleRateConstantInput, 'epaV' | 'epcV'> & { formalPotentialV: number; k0CmPerS: number },
  options: IrreversibleRateConstantOptions = {},
): { epaV: number; epcV: number } {
  const r = resolve({ ...input, epaV: 0, epcV: 0 }, options);
  assertFiniteInRange('k0CmPerS', input.k0CmPerS, Number.MIN_VALUE);
  const lnK = Math.log(input.k0CmPerS);
  const bc = r.rt / (r.alpha * r.na);
  const ba = r.rt / ((1 - r.alpha) * r.na);
  return {
    epcV: input.formalPotentialV - bc * (bracket(r.alpha, r.na, r.dO, r.v, r.rt) - lnK),
    epaV: input.formalPotentialV + ba * (bracket(1 - r.alpha, r.na, r.dR, r.v, r.rt) - lnK),
  };
}

/** The two lines of eq. 2-5 solved for k° and E°′, without the range check. */
export function solveIrreversiblePeaks(input: IrreversibleRateConstantInput, options: IrreversibleRateConstantOptions = {}): { k0CmPerS: number; formalPotentialV: number } {
  for (const [name, value] of [['epaV', input.epaV], ['epcV', input.epcV]] as const) assertFiniteInRange(name, value);
  const r = resolve(input, options);
  const bc = r.rt / (r.alpha * r.na);
  const ba = r.rt / ((1 - r.alpha) * r.na);
  const gc = bracket(r.alpha, r.na, r.dO, r.v, r.rt);
  const ga = bracket(1 - r.alpha, r.na, r.dR, r.v, r.rt);
  // ΔEp = ba·(ga − ln k°) + bc·(gc − ln k°)
  const lnK = (ba * ga + bc * gc - (input.epaV - input.epcV)) / (ba + bc);
  return { k0CmPerS: Math.exp(lnK), formalPotentialV: input.epcV + bc * (gc - lnK) };
}

export function irreversibleRateConstant(
  input: IrreversibleRateConstantInput,
  options: IrreversibleRateConstantOptions = {},
): { k0CmPerS: number; formalPotentialV: number } {
  const na = options.transferElectronCount ?? 1;
  const t = options.temperatureK ?? STANDARD_TEMPERATURE_K;
  const x = na * (input.epaV - input.epcV) * 1000 * (STANDARD_TEMPERATURE_K / t);
  if (x <= TABLE_RANGE_MV[1]) {
    throw new AnalysisError('OUT_OF_RANGE', `nₐ·ΔEp = ${x.toFixed(1)} mV (at 25 °C): both waves are totally irreversible only beyond ${TABLE_RANGE_MV[1]} mV`);
  }
  return solveIrreversiblePeaks(input, options);
}
