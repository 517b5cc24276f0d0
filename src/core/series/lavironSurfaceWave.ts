/**
 * Ideal Nernstian wave of a surface-confined (adsorbed) couple: peak current, charge, width, and
 * the surface coverage Γ back from the peak charge or from the slope of ip against v.
 * In: electronCount n, areaCm2, coverageMolPerCm2 Γ, scanRateVPerS, temperatureK; charges in C
 *   (magnitude), slopes in A/(V/s). Out: A, C, V, mol/cm².
 * Source: E. Laviron, J. Electroanal. Chem. 52, 355 (1974); Bard & Faulkner, Electrochemical
 *   Methods, 2nd ed. (2001), §14.3: ip = n²F²AΓv/(4RT), Q = nFAΓ, FWHM = 3.53·RT/(nF)
 *   (the exact factor 4·ln(1 + √2) = 3.5255 follows from the θ(1 − θ) peak shape).
 * Assumptions of the source: Langmuir isotherm, no lateral interactions, equal adsorption of O and
 *   R, fast electron transfer (ΔEp ≈ 0). Real films deviate; the width is a useful check.
 */
import { assertFiniteInRange } from '../errors';
import { FARADAY_C_PER_MOL, STANDARD_TEMPERATURE_K, thermalVoltageV } from '../constants';

export interface SurfaceWaveOptions {
  /** Temperature in K. @default 298.15 */
  temperatureK?: number;
}

export interface SurfaceCell {
  electronCount: number;
  areaCm2: number;
}

function checkCell(cell: SurfaceCell): void {
  assertFiniteInRange('electronCount', cell.electronCount, Number.MIN_VALUE);
  assertFiniteInRange('areaCm2', cell.areaCm2, Number.MIN_VALUE);
}

function temperatureOf(options: SurfaceWaveOptions): number {
  const t = options.temperatureK ?? STANDARD_TEMPERATURE_K;
  assertFiniteInRange('temperatureK', t, Number.MIN_VALUE);
  return t;
}

/** ip / v in A/(V/s) for a coverage Γ: n²F²AΓ/(4RT). */
function surfaceSlopePerCoverage(cell: SurfaceCell, temperatureK: number): number {
  const n = cell.electronCount;
  return (n * n * FARADAY_C_PER_MOL * cell.areaCm2) / (4 * thermalVoltageV(temperatureK));
}

/** Peak current magnitude in A. */
export function surfacePeakCurrent(
  input: SurfaceCell & { coverageMolPerCm2: number; scanRateVPerS: number },
  options: SurfaceWaveOptions = {},
): number {
  checkCell(input);
  assertFiniteInRange('coverageMolPerCm2', input.coverageMolPerCm2, 0);
  assertFiniteInRange('scanRateVPerS', input.scanRateVPerS, 0);
  return surfaceSlopePerCoverage(input, temperatureOf(options)) * input.coverageMolPerCm2 * input.scanRateVPerS;
}

/** Charge under one peak in C: Q = nFAΓ. */
export function surfaceCharge(input: SurfaceCell & { coverageMolPerCm2: number }): number {
  checkCell(input);
  assertFiniteInRange('coverageMolPerCm2', input.coverageMolPerCm2, 0);
  return input.electronCount * FARADAY_C_PER_MOL * input.areaCm2 * input.coverageMolPerCm2;
}

/** Γ in mol/cm² from the (baseline-corrected) charge under one peak: Γ = |Q|/(nFA). */
export function surfaceCoverageFromCharge(chargeC: number, cell: SurfaceCell): number {
  checkCell(cell);
  assertFiniteInRange('chargeC', chargeC);
  return Math.abs(chargeC) / (cell.electronCount * FARADAY_C_PER_MOL * cell.areaCm2);
}

/** Γ in mol/cm² from the slope of ip (A) against v (V/s): Γ = 4RT·|slope|/(n²F²A). */
export function surfaceCoverageFromSlope(slopeAPerVPerS: number, cell: SurfaceCell, options: SurfaceWaveOptions = {}): number {
  checkCell(cell);
  assertFiniteInRange('slopeAPerVPerS', slopeAPerVPerS);
  return Math.abs(slopeAPerVPerS) / surfaceSlopePerCoverage(cell, temperatureOf(options));
}

/** Full width at half maximum in V: 4·ln(1 + √2)·RT/(nF). */
export function surfacePeakWidthV(electronCount: number, options: SurfaceWaveOptions = {}): number {
  assertFiniteInRange('electronCount', electronCount, Number.MIN_VALUE);
  return (4 * Math.log(1 + Math.SQRT2) * thermalVoltageV(temperatureOf(options))) / electronCount;
}
