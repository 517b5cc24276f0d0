/**
 * Peak current of a surface-confined couple in the totally irreversible (slow electron transfer)
 * limit, and the surface coverage Γ back from the slope of ip against v.
 * In: electronCount n, areaCm2, α of the wave (αc for a reduction, 1 − αc for an oxidation),
 *   scanRateVPerS, temperatureK; Γ in mol/cm² or the slope in A/(V/s). Out: A or mol/cm².
 * Source: E. Laviron, J. Electroanal. Chem. 101, 19 (1979) (from memory): far from E°′,
 *   ip = αnFQv/(2.718·RT) with Q = nFAΓ, so ip/v = α·n²F²AΓ/(2.718·RT), against n²F²AΓ/(4RT) for a
 *   Nernstian film (Laviron 1974). The Nernstian form on a slow film gives Γ 27 % low at α = 0.5
 *   (4·0.5/2.718 = 0.736) and 56 % low at α = 0.3.
 * Validity: files with n·ΔEp > 200 mV (the same regime as Laviron's k_s line).
 */
import { assertFiniteInRange } from '../errors';
import { FARADAY_C_PER_MOL, STANDARD_TEMPERATURE_K, thermalVoltageV } from '../constants';
import type { SurfaceCell } from './lavironSurfaceWave';

export interface LavironIrreversibleOptions {
  /** α of the wave. @default 0.5 */
  alpha?: number;
  /** @default 298.15 */
  temperatureK?: number;
}

/** ip/(vΓ) in A·cm²/(V/s·mol). */
function slopePerCoverage(cell: SurfaceCell, options: LavironIrreversibleOptions): number {
  const alpha = options.alpha ?? 0.5;
  const t = options.temperatureK ?? STANDARD_TEMPERATURE_K;
  assertFiniteInRange('electronCount', cell.electronCount, Number.MIN_VALUE);
  assertFiniteInRange('areaCm2', cell.areaCm2, Number.MIN_VALUE);
  assertFiniteInRange('alpha', alpha, 0.01, 0.99);
  assertFiniteInRange('temperatureK', t, Number.MIN_VALUE);
  const n = cell.electronCount;
  return (alpha * n * n * FARADAY_C_PER_MOL * cell.areaCm2) / (Math.E * thermalVoltageV(t));
}

/** Peak current magnitude (A) of the irreversible surface wave. */
export function irreversibleSurfacePeakCurrent(input: SurfaceCell & { coverageMolPerCm2: number; scanRateVPerS: number }, options: LavironIrreversibleOptions = {}): number {
  assertFiniteInRange('coverageMolPerCm2', input.coverageMolPerCm2, 0);
  assertFiniteInRange('scanRateVPerS', input.scanRateVPerS, 0);
  return slopePerCoverage(input, options) * input.coverageMolPerCm2 * input.scanRateVPerS;
}

/** Γ (mol/cm²) from the slope of ip (A) against v (V/s) over irreversible files. */
export function irreversibleSurfaceCoverageFromSlope(slopeAPerVPerS: number, cell: SurfaceCell, options: LavironIrreversibleOptions = {}): number {
  assertFiniteInRange('slopeAPerVPerS', slopeAPerVPerS);
  return Math.abs(slopeAPerVPerS) / slopePerCoverage(cell, options);
}
