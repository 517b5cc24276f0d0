/**
 * Standard rate constant k° of a totally irreversible, diffusing couple from the forward
 * (first-sweep) peak alone, when the formal potential E°′ is known.
 * In: forwardPeakV (V), forwardDirection ('cathodic' for a reduction first, 'anodic' for an
 *   oxidation first), formalPotentialV E°′ (V), scanRateVPerS, diffusionCm2PerS of the species
 *   present in the bulk (D_O for a reduction, D_R for an oxidation), forwardAlphaNa = α·nₐ of the
 *   forward wave (αc·nₐ for a reduction, (1 − αc)·nₐ for an oxidation), temperatureK.
 *   Out: k° (cm/s).
 * Source: the totally irreversible peak potential of one sweep into a uniform solution,
 *   Ep = E°′ ∓ (RT/(αnₐF))·[0.780 + ln(D^½/k°) + ½ ln(αnₐFv/RT)] (J. Wang, Analytical
 *   Electrochemistry 2nd ed. (2000) eq. 2-5; Bard & Faulkner, Electrochemical Methods 2nd ed.
 *   (2001) §6.3: "k° can be found from Ep when E°′ is known"), solved for ln k°:
 *     ln k° = 0.780 + ½ ln D + ½ ln(αnₐFv/RT) − |Ep − E°′|·αnₐF/RT.
 * Only the product αnₐ enters, so an n-electron couple needs no separate nₐ here.
 */
import { AnalysisError, assertFiniteInRange } from '../errors';
import { STANDARD_TEMPERATURE_K, inverseThermalVoltagePerV } from '../constants';
import type { PeakDirection } from '../peaks/peakTypes';

export interface ForwardPeakRateConstantInput {
  forwardPeakV: number;
  forwardDirection: PeakDirection;
  formalPotentialV: number;
  scanRateVPerS: number;
  diffusionCm2PerS: number;
}

export interface ForwardPeakRateConstantOptions {
  /** α·nₐ of the forward wave. @default 0.5 */
  forwardAlphaNa?: number;
  /** @default 298.15 */
  temperatureK?: number;
}

export function forwardPeakRateConstant(input: ForwardPeakRateConstantInput, options: ForwardPeakRateConstantOptions = {}): number {
  const alphaNa = options.forwardAlphaNa ?? 0.5;
  const t = options.temperatureK ?? STANDARD_TEMPERATURE_K;
  assertFiniteInRange('forwardPeakV', input.forwardPeakV);
  assertFiniteInRange('formalPotentialV', input.formalPotentialV);
  assertFiniteInRange('scanRateVPerS', input.scanRateVPerS, Number.MIN_VALUE);
  assertFiniteInRange('diffusionCm2PerS', input.diffusionCm2PerS, Number.MIN_VALUE);
  assertFiniteInRange('forwardAlphaNa', alphaNa, 0.01, 20);
  assertFiniteInRange('temperatureK', t, Number.MIN_VALUE);
  const f = inverseThermalVoltagePerV(t);
  // Distance of the forward peak past E°′ in its own direction.
  const past = input.forwardDirection === 'cathodic' ? input.formalPotentialV - input.forwardPeakV : input.forwardPeakV - input.formalPotentialV;
  if (!(past > 0)) {
    throw new AnalysisError('OUT_OF_RANGE', `the forward ${input.forwardDirection} peak at ${input.forwardPeakV.toFixed(4)} V does not lie past E°′ = ${input.formalPotentialV.toFixed(4)} V, so it is not a totally irreversible wave`);
  }
  return Math.exp(0.78 + 0.5 * Math.log(input.diffusionCm2PerS) + 0.5 * Math.log(alphaNa * f * input.scanRateVPerS) - past * alphaNa * f);
}
