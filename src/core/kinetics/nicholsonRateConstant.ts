/**
 * Standard heterogeneous rate constant k° from Nicholson's ψ.
 * In: psi (pure number), diffusionOxCm2PerS D_O, diffusionRedCm2PerS D_R (defaults to D_O),
 *   scanRateVPerS, electronCount n, alpha, temperatureK. Out: k° in cm/s.
 * Source: R. S. Nicholson, Anal. Chem. 37, 1351 (1965): ψ = γ^α·k°/(π D_O a)^½ with
 *   γ = (D_O/D_R)^½ and a = nFv/RT, so k° = ψ·(π D_O n F v/RT)^½·(D_R/D_O)^(α/2)
 *   (Bard & Faulkner 2nd ed. eq. 6.5.5; the γ^α prefactor from memory).
 * Caution (common practice, no source): uncompensated resistance widens ΔEp exactly like slow
 *   kinetics; correct for iR first or the k° is a lower bound.
 */
import { assertFiniteInRange } from '../errors';
import { STANDARD_TEMPERATURE_K, inverseThermalVoltagePerV } from '../constants';

export interface NicholsonRateConstantInput {
  psi: number;
  diffusionOxCm2PerS: number;
  /** @default diffusionOxCm2PerS */
  diffusionRedCm2PerS?: number;
  scanRateVPerS: number;
  electronCount: number;
}

export interface NicholsonRateConstantOptions {
  /** Transfer coefficient α in (0, 1). @default 0.5 */
  alpha?: number;
  /** Temperature in K. @default 298.15 */
  temperatureK?: number;
}

export function nicholsonRateConstant(input: NicholsonRateConstantInput, options: NicholsonRateConstantOptions = {}): number {
  const alpha = options.alpha ?? 0.5;
  const temperatureK = options.temperatureK ?? STANDARD_TEMPERATURE_K;
  const dO = input.diffusionOxCm2PerS;
  const dR = input.diffusionRedCm2PerS ?? dO;
  assertFiniteInRange('psi', input.psi, Number.MIN_VALUE);
  assertFiniteInRange('diffusionOxCm2PerS', dO, Number.MIN_VALUE);
  assertFiniteInRange('diffusionRedCm2PerS', dR, Number.MIN_VALUE);
  assertFiniteInRange('scanRateVPerS', input.scanRateVPerS, Number.MIN_VALUE);
  assertFiniteInRange('electronCount', input.electronCount, Number.MIN_VALUE);
  assertFiniteInRange('alpha', alpha, Number.MIN_VALUE, 1);
  assertFiniteInRange('temperatureK', temperatureK, Number.MIN_VALUE);
  const a = input.electronCount * inverseThermalVoltagePerV(temperatureK) * input.scanRateVPerS;
  return input.psi * Math.sqrt(Math.PI * dO * a) * (dR / dO) ** (alpha / 2);
}
