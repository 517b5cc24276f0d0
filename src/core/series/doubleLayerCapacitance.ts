/**
 * Double-layer capacitance from the charging current of a series of CVs, with the faradaic tail
 * of a nearby wave separated from it.
 * In: scanRatesVPerS and, per scan rate, the gap between forward and reverse currents (A) at one
 *   potential; areaCm2. Out: Cd (F/cm²) with its 95 % interval, the model used, the tail and leak
 *   terms, the single-rate values gap/(2Av), and a warning when those drift with v.
 * Sources: ic = A·Cd·v for an ideally polarizable electrode (Bard & Faulkner, Electrochemical
 *   Methods 2nd ed. (2001) §1.2), so the gap is 2·A·Cd·v; a diffusion-controlled faradaic current at
 *   a fixed potential of a wave grows as v^½ (the same dimensionless current function at every v,
 *   B&F §6.2), so gap/2 = a + b·v + c·v^½ with Cd = b/A (a: a constant leak).
 * Choices (ours): four or more distinct scan rates, the full three-term model; three, the two-term
 *   b·v + c·v^½ (no leak); two, the straight line a + b·v (the tail cannot be told apart) with a
 *   warning; one, the single value. The single-rate values are said to drift when they spread by
 *   more than 10 % of their median (common practice, no source).
 */
import { AnalysisError, assertFiniteInRange, assertSameLength } from '../errors';
import { fitLine, fitLinearModel } from '../regression';
import type { FitLineResult } from '../regression';
import { median } from '../statistics/median';

export type CapacitanceModel = 'charging+tail+leak' | 'charging+tail' | 'charging+leak' | 'single-rate';

export interface DoubleLayerCapacitanceResult {
  /** Cd (F/cm²) from the model's v term; the single value with one scan rate. */
  capacitanceFPerCm2: number;
  /** 95 % interval of Cd (F/cm²); null without degrees of freedom. */
  capacitanceIntervalFPerCm2: [number, number] | null;
  model: CapacitanceModel;
  /** c of the faradaic tail c·v^½ in gap/2 (A/(V/s)^½); null when not in the model. */
  faradaicTailAPerSqrtVPerS: number | null;
  /** gap/(2Av) at each scan rate (F/cm²). */
  pointCapacitancesFPerCm2: number[];
  /** The straight line gap/2 = a + b·v (A against V/s); null with fewer than two scan rates. */
  fit: FitLineResult | null;
  /** Why the single-rate values cannot be trusted, or that the tail could not be separated; null when fine. */
  warning: string | null;
}

/** Charging current ic = A·Cd·v (A), one sweep. */
export function chargingCurrentA(areaCm2: number, capacitanceFPerCm2: number, scanRateVPerS: number): number {
  assertFiniteInRange('areaCm2', areaCm2, 0);
  assertFiniteInRange('capacitanceFPerCm2', capacitanceFPerCm2, 0);
  assertFiniteInRange('scanRateVPerS', scanRateVPerS, 0);
  return areaCm2 * capacitanceFPerCm2 * scanRateVPerS;
}

function pointValues(v: ArrayLike<number>, gap: ArrayLike<number>, areaCm2: number): number[] {
  return Array.from(v, (s, i) => {
    assertFiniteInRange(`scanRatesVPerS[${i}]`, s, Number.MIN_VALUE);
    const g = gap[i] as number;
    assertFiniteInRange(`gapCurrentsA[${i}]`, g);
    if (g < 0) throw new AnalysisError('OUT_OF_RANGE', `gapCurrentsA[${i}] must be ≥ 0 (forward minus reverse magnitude), got ${g}`);
    return g / (2 * areaCm2 * s);
  });
}

function driftWarning(points: number[], rates: number[]): string | null {
  const m = median(points);
  if (!(m > 0) || (Math.max(...points) - Math.min(...points)) / m <= 0.1) return null;
  const slow = points[rates.indexOf(Math.min(...rates))]!;
  const fast = points[rates.indexOf(Math.max(...rates))]!;
  return `the single-rate values gap/(2Av) drift from ${(slow * 1e6).toPrecision(3)} µF/cm² at the slowest rate to ${(fast * 1e6).toPrecision(3)} µF/cm² at the fastest: the region is not free of faradaic current (a tail ∝ v^½) or leak, so Cd comes from the fit of a + b·v + c·v^½, not from one rate`;
}

export function doubleLayerCapacitance(input: { scanRatesVPerS: ArrayLike<number>; gapCurrentsA: ArrayLike<number>; areaCm2: number }): DoubleLayerCapacitanceResult {
  const { scanRatesVPerS: v, gapCurrentsA: gap, areaCm2 } = input;
  assertSameLength({ scanRatesVPerS: v, gapCurrentsA: gap }, 1);
  assertFiniteInRange('areaCm2', areaCm2, Number.MIN_VALUE);
  const points = pointValues(v, gap, areaCm2);
  const rates = Array.from(v);
  const half = Array.from(gap, (g) => g / 2);
  const distinct = new Set(rates).size;
  const drift = driftWarning(points, rates);
  if (distinct < 2) {
    return { capacitanceFPerCm2: points.reduce((a, b) => a + b, 0) / points.length, capacitanceIntervalFPerCm2: null, model: 'single-rate', faradaicTailAPerSqrtVPerS: null, pointCapacitancesFPerCm2: points, fit: null, warning: 'one scan rate: gap/(2Av) is only an upper bound on Cd, since a faradaic tail in the region (a diffusing couple\'s return current) widens the gap and cannot be told from the charging current at one rate; record two or more scan rates' };
  }
  const fit = fitLine(rates, half);
  if (distinct < 3) {
    const ci = fit.slopeInterval;
    return { capacitanceFPerCm2: fit.slope / areaCm2, capacitanceIntervalFPerCm2: ci ? [ci[0] / areaCm2, ci[1] / areaCm2] : null, model: 'charging+leak', faradaicTailAPerSqrtVPerS: null, pointCapacitancesFPerCm2: points, fit,
      warning: drift ?? 'two scan rates: a faradaic tail (∝ v^½) cannot be separated from the charging current' };
  }
  const sqrt = rates.map(Math.sqrt);
  const withLeak = distinct >= 4;
  const m = fitLinearModel(withLeak ? [rates.map(() => 1), rates, sqrt] : [rates, sqrt], half);
  const k = withLeak ? 1 : 0;
  const ci = m.intervals?.[k];
  return {
    capacitanceFPerCm2: m.coefficients[k]! / areaCm2, capacitanceIntervalFPerCm2: ci ? [ci[0] / areaCm2, ci[1] / areaCm2] : null,
    model: withLeak ? 'charging+tail+leak' : 'charging+tail', faradaicTailAPerSqrtVPerS: m.coefficients[k + 1]!, pointCapacitancesFPerCm2: points, fit, warning: drift,
  };
}
