/**
 * Double-layer capacitance from the charging current of a series of CVs, with the faradaic tail
 * of a nearby wave separated from it.
 * In: scanRatesVPerS and, per scan rate, the gap between forward and reverse currents (A) at one
 *   potential (a nearby film's modelled current already taken off), optionally its standard
 *   uncertainty from noise, a model uncertainty shared by all files (a film's subtracted current),
 *   and a current a nearby wave may still carry there, not taken off; areaCm2.
 * Out: Cd (F/cm²) with its 95 % interval when the data give it; otherwise the status says what
 *   they give (an upper bound, or nothing), the model used, the tail term, the single-rate values
 *   gap/(2Av), and a warning when those drift with v.
 * Sources: ic = A·Cd·v for an ideally polarizable electrode (Bard & Faulkner, Electrochemical
 *   Methods 2nd ed. (2001) §1.2), so the gap is 2·A·Cd·v; a diffusion-controlled faradaic current at
 *   a fixed potential of a wave grows as v^½ (the same dimensionless current function at every v,
 *   B&F §6.2), so gap/2 = b·v + c·v^½ with Cd = b/A. A leak (resistive, or a steady faradaic
 *   current) is the same on both sweeps at one potential and cancels in the gap, so the model has
 *   no constant term. Least squares and its intervals: N. R. Draper, H. Smith, Applied Regression
 *   Analysis, 3rd ed. (1998), ch. 5 (fitLinearModel.ts); the given uncertainties are carried
 *   through the same linear estimator, Var(Cd) = Σ wᵢ²uᵢ² (GUM, JCGM 100:2008, eq. 10).
 * Choices (ours): three or more distinct scan rates, b·v + c·v^½; two, b·v alone (the tail cannot
 *   be told apart) with a warning; one, the single value, an upper bound. The interval is the
 *   wider of the residual one (Student's t) and the propagated one (×1.96), widened by the shared
 *   model uncertainty (×1.96, in quadrature) and downward by what a wave may still carry. A Cd whose
 *   interval reaches 0 is only an upper bound; one whose whole interval lies below 0 is not
 *   determined. The single-rate values are said to drift when they spread by more than 10 % of
 *   their median (common practice, no source).
 */
import { assertFiniteInRange, assertSameLength } from '../errors';
import { fitLine, fitLinearModel } from '../regression';
import type { FitLineResult } from '../regression';
import { median } from '../statistics/median';
import { decimalsFor } from '../statistics/roundToUncertainty';

export type CapacitanceModel = 'charging+tail' | 'charging' | 'single-rate';
export type CapacitanceStatus = 'value' | 'upper-bound' | 'not-determined';

export interface DoubleLayerCapacitanceInput {
  scanRatesVPerS: ArrayLike<number>;
  /** Forward minus reverse current (A) per file; may be negative through noise. */
  gapCurrentsA: ArrayLike<number>;
  areaCm2: number;
  /** Standard uncertainty of each gap from noise (A). @default none */
  gapUncertaintiesA?: ArrayLike<number>;
  /** Standard uncertainty of each gap shared by all files (A), e.g. a subtracted film's current. @default none */
  sharedUncertaintiesA?: ArrayLike<number>;
  /** Current (A, ≥ 0) a nearby wave may still carry in each gap, not taken off. @default none */
  unsubtractedA?: ArrayLike<number>;
}

export interface DoubleLayerCapacitanceResult {
  /** Cd (F/cm²) when the data give a value; null for a bound or nothing. */
  capacitanceFPerCm2: number | null;
  status: CapacitanceStatus;
  /** Upper bound of Cd (F/cm²) when status is 'upper-bound'. */
  upperBoundFPerCm2: number | null;
  /** The model's own v coefficient over A (F/cm²), whatever the status; read with the status. */
  estimateFPerCm2: number;
  /** 95 % interval of Cd (F/cm²); null without degrees of freedom or given uncertainties. */
  capacitanceIntervalFPerCm2: [number, number] | null;
  model: CapacitanceModel;
  /** c of the faradaic tail c·v^½ in gap/2 (A/(V/s)^½); null when not in the model. */
  faradaicTailAPerSqrtVPerS: number | null;
  /** gap/(2Av) at each scan rate (F/cm²). */
  pointCapacitancesFPerCm2: number[];
  /** The straight line gap/2 = a + b·v (A against V/s), shown beside the plot; null with fewer than two scan rates. */
  fit: FitLineResult | null;
  /** Why the value cannot be trusted or is only a bound; null when fine. */
  warning: string | null;
}

/** Charging current ic = A·Cd·v (A), one sweep. */
export function chargingCurrentA(areaCm2: number, capacitanceFPerCm2: number, scanRateVPerS: number): number {
  assertFiniteInRange('areaCm2', areaCm2, 0);
  assertFiniteInRange('capacitanceFPerCm2', capacitanceFPerCm2, 0);
  assertFiniteInRange('scanRateVPerS', scanRateVPerS, 0);
  return areaCm2 * capacitanceFPerCm2 * scanRateVPerS;
}

/** pointUncertainties: standard uncertainty of each gap/(2Av) (F/cm²); a spread within 3 of the largest is noise. */
function driftWarning(points: number[], rates: number[], pointUncertainties: number[]): string | null {
  const m = median(points);
  const spread = Math.max(...points) - Math.min(...points);
  if (!(m > 0) || spread / m <= 0.1 || spread <= 3 * Math.max(0, ...pointUncertainties)) return null;
  const slow = points[rates.indexOf(Math.min(...rates))]!;
  const fast = points[rates.indexOf(Math.max(...rates))]!;
  return `the single-rate values gap/(2Av) drift from ${(slow * 1e6).toPrecision(3)} µF/cm² at the slowest rate to ${(fast * 1e6).toPrecision(3)} µF/cm² at the fastest: the region is not free of faradaic current (a tail ∝ v^½), so Cd comes from the fit of b·v + c·v^½, not from one rate`;
}

interface Estimator {
  model: CapacitanceModel;
  /** Cd (F/cm²) = Σ weights[i]·gap[i]. */
  weights: number[];
  /** Residual-based half-width of the 95 % interval (F/cm²); null without degrees of freedom. */
  residualHalfWidth: number | null;
  tail: number | null;
}

/** The linear estimator of Cd for the number of distinct rates, with its weights on each gap. */
function estimator(rates: number[], gaps: number[], areaCm2: number): Estimator {
  const n = rates.length;
  const distinct = new Set(rates).size;
  if (distinct < 2) return { model: 'single-rate', weights: rates.map((v) => 1 / (2 * areaCm2 * v * n)), residualHalfWidth: null, tail: null };
  const columns = distinct < 3 ? [rates] : [rates, rates.map(Math.sqrt)];
  const half = gaps.map((g) => g / 2);
  const m = fitLinearModel(columns, half);
  // Cd is linear in the gaps: its weight on gap i is the fitted b of a unit gap i, over 2A.
  const weights = rates.map((_, i) => fitLinearModel(columns, rates.map((__, j) => (i === j ? 0.5 : 0))).coefficients[0]! / areaCm2);
  const ci = m.intervals?.[0];
  return { model: distinct < 3 ? 'charging' : 'charging+tail', weights, residualHalfWidth: ci ? (ci[1] - ci[0]) / 2 / areaCm2 : null, tail: distinct < 3 ? null : m.coefficients[1]! };
}

const dot = (w: number[], x: ArrayLike<number> | undefined) => (x ? w.reduce((s, wi, i) => s + wi * (x[i] as number), 0) : 0);

function statusOf(cd: number, interval: [number, number] | null, singleRate: boolean): { status: CapacitanceStatus; upper: number | null; why: string | null } {
  const hi = interval ? interval[1] : cd;
  if (!(hi > 0)) return { status: 'not-determined', upper: null, why: `the gap gives no positive capacitance (${(cd * 1e6).toPrecision(3)} µF/cm²${interval ? `, 95 % up to ${(hi * 1e6).toPrecision(3)}` : ''}): no capacitance can be told from this noise, or the currents are not charging currents (check the sign convention and the potential)` };
  if (singleRate) return { status: 'upper-bound', upper: hi, why: null };
  if (interval && interval[0] <= 0) return { status: 'upper-bound', upper: hi, why: `the 95 % interval of Cd reaches 0 (${(interval[0] * 1e6).toPrecision(3)} to ${(hi * 1e6).toPrecision(3)} µF/cm²): no capacitance can be told from this noise; Cd ≤ ${(hi * 1e6).toPrecision(3)} µF/cm² only` };
  return { status: 'value', upper: null, why: null };
}

export function doubleLayerCapacitance(input: DoubleLayerCapacitanceInput): DoubleLayerCapacitanceResult {
  const { scanRatesVPerS: v, gapCurrentsA: gap, areaCm2 } = input;
  assertSameLength({ scanRatesVPerS: v, gapCurrentsA: gap, ...(input.gapUncertaintiesA ? { gapUncertaintiesA: input.gapUncertaintiesA } : {}), ...(input.sharedUncertaintiesA ? { sharedUncertaintiesA: input.sharedUncertaintiesA } : {}), ...(input.unsubtractedA ? { unsubtractedA: input.unsubtractedA } : {}) }, 1);
  assertFiniteInRange('areaCm2', areaCm2, Number.MIN_VALUE);
  const rates = Array.from(v, (s, i) => (assertFiniteInRange(`scanRatesVPerS[${i}]`, s, Number.MIN_VALUE), s));
  const gaps = Array.from(gap, (g, i) => (assertFiniteInRange(`gapCurrentsA[${i}]`, g), g));
  const points = gaps.map((g, i) => g / (2 * areaCm2 * rates[i]!));
  const est = estimator(rates, gaps, areaCm2);
  const cd = dot(est.weights, gaps);
  const u = input.gapUncertaintiesA;
  const propagated = u ? 1.96 * Math.sqrt(est.weights.reduce((s, w, i) => s + (w * (u[i] as number)) ** 2, 0)) : null;
  const stat = est.residualHalfWidth === null && propagated === null ? null : Math.max(est.residualHalfWidth ?? 0, propagated ?? 0);
  const shared = 1.96 * Math.abs(dot(est.weights, input.sharedUncertaintiesA));
  const below = Math.max(0, dot(est.weights, input.unsubtractedA));
  const half = stat === null && !shared ? null : Math.hypot(stat ?? 0, shared);
  const interval: [number, number] | null = half === null ? (below ? [cd - below, cd] : null) : [cd - half - below, cd + half];
  const singleRate = est.model === 'single-rate';
  const { status, upper, why } = statusOf(cd, interval, singleRate);
  const notes = [
    singleRate ? 'one scan rate: gap/(2Av) is only an upper bound on Cd, since a faradaic tail in the region (a diffusing couple\'s return current) widens the gap and cannot be told from the charging current at one rate; record two or more scan rates' : driftWarning(points, rates, rates.map((r, i) => (u ? (u[i] as number) / (2 * areaCm2 * r) : 0))),
    est.model === 'charging' ? 'two scan rates: a faradaic tail (∝ v^½) cannot be separated from the charging current' : null,
    why,
  ].filter((s): s is string => s !== null);
  return {
    capacitanceFPerCm2: status === 'value' ? cd : null, status, upperBoundFPerCm2: upper, estimateFPerCm2: cd, capacitanceIntervalFPerCm2: interval,
    model: est.model, faradaicTailAPerSqrtVPerS: est.tail, pointCapacitancesFPerCm2: points, fit: rates.length >= 2 && new Set(rates).size >= 2 ? fitLine(rates, gaps.map((g) => g / 2)) : null,
    warning: notes.length ? notes.join('; ') : null,
  };
}

/**
 * Cd in words for a report, in µF/cm²: "= value (95 % low–high)" rounded to its interval
 * (roundToUncertainty.ts, half the 95 % width as the uncertainty; at most 4 decimals, a narrower
 * interval said to be so), "≤ bound", or "not determined".
 */
export function describeCapacitance(c: DoubleLayerCapacitanceResult): string {
  const u = (x: number) => x * 1e6;
  if (c.status === 'not-determined') return 'not determined (no positive capacitance from this noise)';
  const ci = c.capacitanceIntervalFPerCm2;
  // At most 4 decimals of µF/cm²: an interval narrower than that (noiseless data) is said so.
  const digits = ci && ci[1] > ci[0] ? Math.min(4, decimalsFor(u(ci[1] - ci[0]) / 2)) : null;
  const fmt = (x: number) => (digits === null ? u(x).toPrecision(3) : u(x).toFixed(digits));
  const range = ci && fmt(ci[0]) === fmt(ci[1]) ? `95 % within ± 0.0001, noiseless data` : ci ? `95 % ${fmt(ci[0])}–${fmt(ci[1])}` : null;
  if (c.status === 'upper-bound') return `≤ ${fmt(c.upperBoundFPerCm2!)} µF/cm²${c.model === 'single-rate' ? ' (one scan rate)' : ' (the interval reaches 0)'}`;
  return `= ${fmt(c.capacitanceFPerCm2!)} µF/cm²${range ? ` (${range})` : ''}`;
}
