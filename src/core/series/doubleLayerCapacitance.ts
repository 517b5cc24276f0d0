/**
 * Double-layer capacitance from the charging current of a series of CVs.
 * In: scanRatesVPerS and, per scan rate, the gap between forward and reverse currents (A) in a
 *   potential region free of faradaic current; areaCm2.
 * Out: capacitanceFPerCm2 from the slope of (gap/2) against v divided by the area, and the
 *   single-scan-rate values gap/(2Av) for comparison.
 * Source: ic = A·Cd·v for an ideally polarizable electrode (Bard & Faulkner, Electrochemical
 *   Methods, 2nd ed. (2001), §1.2); forward and reverse charging currents have opposite signs,
 *   so the gap is 2·A·Cd·v.
 * Difference: the line is fitted with a free intercept (a small constant leak or residual
 *   faradaic current shows up there instead of biasing Cd); with one scan rate only the
 *   single-point value is returned.
 */
import { AnalysisError, assertFiniteInRange, assertSameLength } from '../errors';
import { fitLine } from '../regression';
import type { FitLineResult } from '../regression';

export interface DoubleLayerCapacitanceResult {
  /** From the slope of gap/2 against v (F/cm²); from the single value when only one v is given. */
  capacitanceFPerCm2: number;
  /** gap/(2Av) at each scan rate (F/cm²). */
  pointCapacitancesFPerCm2: number[];
  /** The fit of gap/2 (A) against v (V/s); null with fewer than two distinct scan rates. */
  fit: FitLineResult | null;
}

/** Charging current ic = A·Cd·v (A), one sweep. */
export function chargingCurrentA(areaCm2: number, capacitanceFPerCm2: number, scanRateVPerS: number): number {
  assertFiniteInRange('areaCm2', areaCm2, 0);
  assertFiniteInRange('capacitanceFPerCm2', capacitanceFPerCm2, 0);
  assertFiniteInRange('scanRateVPerS', scanRateVPerS, 0);
  return areaCm2 * capacitanceFPerCm2 * scanRateVPerS;
}

export function doubleLayerCapacitance(
  input: { scanRatesVPerS: ArrayLike<number>; gapCurrentsA: ArrayLike<number>; areaCm2: number },
): DoubleLayerCapacitanceResult {
  const { scanRatesVPerS: v, gapCurrentsA: gap, areaCm2 } = input;
  assertSameLength({ scanRatesVPerS: v, gapCurrentsA: gap }, 1);
  assertFiniteInRange('areaCm2', areaCm2, Number.MIN_VALUE);
  const points = Array.from(v, (s, i) => {
    assertFiniteInRange(`scanRatesVPerS[${i}]`, s, Number.MIN_VALUE);
    const g = gap[i] as number;
    assertFiniteInRange(`gapCurrentsA[${i}]`, g);
    if (g < 0) throw new AnalysisError('OUT_OF_RANGE', `gapCurrentsA[${i}] must be ≥ 0 (forward minus reverse magnitude), got ${g}`);
    return g / (2 * areaCm2 * s);
  });
  const distinct = new Set(Array.from(v)).size;
  if (distinct < 2) {
    return { capacitanceFPerCm2: points.reduce((a, b) => a + b, 0) / points.length, pointCapacitancesFPerCm2: points, fit: null };
  }
  const fit = fitLine(v, Array.from(gap, (g) => g / 2));
  return { capacitanceFPerCm2: fit.slope / areaCm2, pointCapacitancesFPerCm2: points, fit };
}
