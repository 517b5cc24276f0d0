/**
 * The current that the earlier cycles of a voltammogram still drive during a later one.
 *
 * A cycle after the first does not start from a solution at rest: the product made on the
 * earlier sweeps is still near the electrode and is still being turned back at the start
 * potential, so the later cycle's forward sweep begins on a decaying current. The baselines
 * under a peak are built for a wave from rest; left on that decay, a reversible couple's second
 * cycle read ipc 4 % low and ipa 12 % low (ipa/ipc 0.91), and its ΔEp 2 mV narrow (simulated,
 * 0.1 V/s, vertices 300 mV each side of E°′). This module gives that decay, so that the later
 * cycle can be measured as a wave from rest and the decay drawn as part of its baseline.
 *
 * In: time (s, or any clock proportional to it), IUPAC current (A) and the sweeps of the whole
 *   record; the cycle; the noise level. Out: the decay from the cycle's first turn at which the
 *   surface is back at rest (the cycle's start, or, for a record that starts inside its range,
 *   the vertex on that side) to the cycle's end (A, IUPAC sign), with the charging current taken
 *   out before it was computed and the faradaic current at the turn; 'not-at-rest' for a later
 *   cycle where no turn brings the product left at the surface below REST_SHARE of its amount at
 *   the switch before (from the semi-integral: a slow couple whose return wave reaches the start
 *   potential); or null when no faradaic current is left at the turn (the first cycle, an
 *   adsorbed film, a wave that does not turn back).
 * Source: for planar semi-infinite diffusion the semi-integral of the faradaic current,
 *   I(t) = π^(−½)·∫₀ᵗ i(u)(t − u)^(−½) du, equals nFA·D_O^½·(C_O* − C_O(0, t)) whatever the kinetics
 *   (Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001), §6.7, convolutive voltammetry;
 *   section number from memory). Holding the potential at the cycle's start, where the wave is
 *   back at its limit, holds C_O(0, t) and so I(t): the decay is the current that keeps I(t) at
 *   its value at the turn, solved point by point for a current constant between samples (the
 *   step-function form of the integral, exact for such a current). For a reversible couple the
 *   rest of the later cycle is then exactly the first cycle's wave (the surface concentrations
 *   are a function of the potential alone), so the published tables and Randles–Ševčík hold for it.
 * Charging (our method): the capacitive current reverses at the turn and the faradaic current does
 *   not, so one quadratic in time plus a current that takes each sweep's sign is fitted through
 *   the turn (within 40 mV each side, the first points after it left out); that current is the
 *   charging current, taken out of the whole record, with the sign of each sweep, before the
 *   integral.
 * Limits: planar diffusion, D constant, the start potential on the wave's limit (the usual CV
 *   starts ≥ 150 mV from E½); the charging current taken as constant in size; records longer
 *   than MAX_POINTS are integrated on blocks of points averaged together.
 */
import { semiIntegralWeights } from './semiIntegralWeights';
import { fitLinearModel } from '../regression/fitLinearModel';
import type { CycleRange, SweepSegment } from '../types';

/** Most points the integral is taken over; longer records are averaged in blocks first. */
export const MAX_POINTS = 800;
/** Potential span on each side of the turn for the charging step (V). */
const STEP_SPAN_V = 0.04;
/** Points just after the turn left out of the step's fit (the cell's RC settling). */
const SETTLING_POINTS = 2;
/** Below this share of the earlier cycles' largest faradaic current, nothing is left to carry. */
const LEFT_SHARE = 0.02;
/**
 * Most of the product still at the surface at the turn, as a share of the semi-integral at the
 * switch before it, for the turn to count as back at rest (our threshold: a reversible couple
 * whose sweep starts 150 mV from E½ keeps 0.3 %).
 */
export const REST_SHARE = 0.02;

export interface EarlierCycleDecay {
  kind: 'decay';
  /** Index of the turn the cycle starts at; `currentA[0]` belongs to it. */
  startIndex: number;
  /** The decay at points startIndex … cycle end − 1 (A, IUPAC sign). */
  currentA: Float64Array;
  /** Charging current taken out before the integral (A, the size on an anodic-going sweep). */
  chargingA: number;
  /** Faradaic current at the turn (A, IUPAC sign). */
  atTurnA: number;
}

/** The cycle starts before the earlier cycles' product is turned back: no decay can be given. */
export interface NotAtRest {
  kind: 'not-at-rest';
  /** Semi-integral at the turn over its value at the switch before it. */
  share: number;
}

export interface EarlierCycleInput {
  potentialV: Float64Array;
  currentA: Float64Array;
  timeS: Float64Array;
  segments: SweepSegment[];
  noiseA: number;
}

export function earlierCycleDecay(input: EarlierCycleInput, cycle: CycleRange): EarlierCycleDecay | NotAtRest | null {
  const { segments } = input;
  // Nothing before the first cycle to carry (and nothing to compute for a one-cycle record).
  if (!segments.some((s) => s.cycle < cycle.index)) return null;
  let least: number | null = null;
  // The turns at the starts of the cycle's sweeps, in order: the cycle's own start when it is a
  // turn, else (a cycle that starts inside a sweep) the first vertex within it, and so on.
  for (let k = Math.max(1, segments.findIndex((s) => s.cycle === cycle.index)); k < segments.length && segments[k]!.cycle === cycle.index; k++) {
    const before = segments[k - 1]!;
    const first = segments[k]!;
    if (before.direction === first.direction || !(before.end - 1 === first.start || before.end === first.start)) continue;
    const found = decayFromTurn(input, k, cycle.end);
    if (found === null || found.kind === 'decay') return found;
    least = Math.min(least ?? Infinity, found.share);
  }
  // No turn brought the surface back to rest: said only where earlier cycles left a product.
  return least !== null ? { kind: 'not-at-rest', share: least } : null;
}

/** The decay from the turn that starts sweep k, or why there is none (null: nothing left to carry). */
function decayFromTurn(input: EarlierCycleInput, k: number, end: number): EarlierCycleDecay | NotAtRest | null {
  const { segments } = input;
  const before = segments[k - 1]!;
  const turn = before.end - 1;
  const sign = (m: number) => (segments[m]!.direction === 'positive' ? 1 : -1);
  const step = chargingStep(input, turn, before, segments[k]!, sign(k - 1), sign(k));
  if (!step) return null;
  const { chargingA, atTurnA } = step;
  // The faradaic history up to the turn: the charging taken out with each sweep's sign.
  const signs = sweepSigns(segments, turn + 1);
  const faradaic = (j: number) => (input.currentA[j] as number) - (signs[j] as number) * chargingA;
  let largest = 0;
  for (let j = 0; j <= turn; j++) largest = Math.max(largest, Math.abs(faradaic(j)));
  if (!(Math.abs(atTurnA) > Math.max(3 * input.noiseA, LEFT_SHARE * largest))) return null;
  // The switch before the turn: the start of the run of sweeps that ends at it.
  let run = k - 1;
  while (run > 0 && segments[run - 1]!.direction === before.direction) run--;
  const held = heldContinuation(input.timeS, faradaic, segments[run]!.start, turn, end, atTurnA);
  if (!held.currentA) return { kind: 'not-at-rest', share: held.share };
  return { kind: 'decay', startIndex: turn, currentA: held.currentA, chargingA, atTurnA };
}

/** +1 on positive-going sweeps, −1 on negative-going ones, for the first `length` points; a vertex shared by two sweeps belongs to the earlier. */
function sweepSigns(segments: SweepSegment[], length: number): Int8Array {
  const out = new Int8Array(length);
  for (const [m, seg] of segments.entries()) {
    const own = m > 0 && segments[m - 1]!.end - 1 === seg.start ? seg.start + 1 : seg.start;
    for (let j = own; j < Math.min(seg.end, length); j++) out[j] = seg.direction === 'positive' ? 1 : -1;
  }
  return out;
}

/**
 * The charging current (clamped at zero: a capacitor's current follows the sweep) and the
 * faradaic current at the turn. Null when either side is too short to fit.
 */
function chargingStep(input: EarlierCycleInput, turn: number, before: SweepSegment, first: SweepSegment, signBefore: number, signAfter: number): { chargingA: number; atTurnA: number } | null {
  const { potentialV: e, currentA: i, timeS: t } = input;
  const near = (k: number) => Math.abs((e[k] as number) - (e[turn] as number)) <= STEP_SPAN_V;
  let left = turn;
  while (left - 1 >= before.start && near(left - 1)) left--;
  let right = turn;
  while (right + 1 < first.end && near(right + 1)) right++;
  // One smooth (quadratic) faradaic current through the turn, and a charging current that
  // takes each sweep's sign: y = a + b·u + c·u² + κ·s(u).
  const scale = Math.max(Math.abs((t[left] as number) - (t[turn] as number)), Math.abs((t[right] as number) - (t[turn] as number))) || 1;
  const cols: number[][] = [[], [], [], []];
  const y: number[] = [];
  const add = (k: number, s: number) => {
    const u = ((t[k] as number) - (t[turn] as number)) / scale;
    cols[0]!.push(1);
    cols[1]!.push(u);
    cols[2]!.push(u * u);
    cols[3]!.push(s);
    y.push(i[k] as number);
  };
  for (let k = left; k <= turn; k++) add(k, signBefore);
  for (let k = turn + 1 + SETTLING_POINTS; k <= right; k++) add(k, signAfter);
  if (turn - left < 5 || right - turn - SETTLING_POINTS < 5) return null;
  let fit: number[];
  try {
    fit = fitLinearModel(cols, y).coefficients;
  } catch {
    return null;
  }
  const [a, , , kappa] = fit as [number, number, number, number];
  const chargingA = Math.max(0, kappa);
  return { chargingA, atTurnA: a + signBefore * (kappa - chargingA) };
}

/**
 * The current over (turn, end) that keeps the semi-integral at its value at the turn, given the
 * faradaic history up to the turn; index `turn` itself carries `atTurnA`. Also the semi-integral
 * at the turn over its value at the switch before it (`switchAt`), the share of the product
 * still at the surface; above REST_SHARE the current is not solved (null). The constant π^(−½) and the factor 2 of the step-function weights cancel.
 */
function heldContinuation(timeS: Float64Array, faradaic: (j: number) => number, switchAt: number, turn: number, end: number, atTurnA: number): { currentA: Float64Array | null; share: number } {
  const grid = blockGrid(timeS, faradaic, turn, end);
  const { t, i, turnAt } = grid;
  const n = t.length;
  const x = Float64Array.from(i);
  const tau1 = uniformStart(t);
  // Weight of the current held over (t[j−1], t[j]] at time t[m]: √(t[m] − t[j−1]) − √(t[m] − t[j]).
  // On evenly spaced blocks (the usual record) it depends on m − j alone, in block units, and is
  // computed once; the first block may be shorter (tau1 blocks long).
  const w = semiIntegralWeights(tau1 === null ? 0 : n, 1);
  const semiIntegral = tau1 === null
    ? (m: number, upTo: number) => {
      let sum = 0;
      for (let j = 1; j <= upTo; j++) sum += (x[j] as number) * (Math.sqrt((t[m] as number) - (t[j - 1] as number)) - Math.sqrt((t[m] as number) - (t[j] as number)));
      return sum;
    }
    : (m: number, upTo: number) => {
      let sum = upTo >= 1 ? (x[1] as number) * (Math.sqrt(m - 1 + tau1) - Math.sqrt(m - 1)) : 0;
      for (let j = 2; j <= upTo; j++) sum += (x[j] as number) * (w[m - j] as number);
      return sum;
    };
  const ownWeight = (m: number) => (tau1 === null ? Math.sqrt((t[m] as number) - (t[m - 1] as number)) : m === 1 ? Math.sqrt(tau1) : 1);
  const held = semiIntegral(turnAt, turnAt);
  // The grid point nearest the switch (block ends are spaced evenly back from the turn).
  let atSwitch = turnAt;
  while (atSwitch > 1 && (t[atSwitch - 1] as number) >= (timeS[switchAt] as number)) atSwitch--;
  const share = Math.abs(held) / Math.abs(semiIntegral(atSwitch, atSwitch));
  // Not back at rest (the first cycle's own switch, a slow couple): no decay is drawn, and the
  // continuation, the costly part, is not solved.
  if (!(share <= REST_SHARE)) return { currentA: null, share };
  for (let m = turnAt + 1; m < n; m++) {
    const own = ownWeight(m);
    x[m] = own > 0 ? (held - semiIntegral(m, m - 1)) / own : (x[m - 1] as number);
  }
  // Back to the record's points (linear in time between block ends).
  const out = new Float64Array(end - turn);
  out[0] = atTurnA;
  let m = turnAt;
  for (let k = turn + 1; k < end; k++) {
    const tk = timeS[k] as number;
    while (m + 1 < n - 1 && (t[m + 1] as number) < tk) m++;
    const t0 = t[m] as number;
    const t1 = t[m + 1] as number;
    const a = m === turnAt ? atTurnA : (x[m] as number);
    const b = x[m + 1] as number;
    out[k - turn] = t1 > t0 ? a + ((b - a) * (tk - t0)) / (t1 - t0) : b;
  }
  return { currentA: out, share };
}

/**
 * When the blocks after the first are evenly spaced in time (within 15 %: a time column rounded
 * by the instrument, or one rebuilt from rounded potentials, still counts), the first block's
 * length in units of the others; null otherwise.
 */
function uniformStart(t: Float64Array): number | null {
  const n = t.length;
  if (n < 4) return null;
  const steps = Array.from({ length: n - 3 }, (_, k) => (t[k + 2] as number) - (t[k + 1] as number)).sort((a, b) => a - b);
  const h = steps[steps.length >> 1] as number;
  if (!(h > 0) || !steps.every((d) => Math.abs(d - h) <= 0.15 * h)) return null;
  return ((t[1] as number) - (t[0] as number)) / h;
}

/**
 * The record cut into blocks of `size` points averaged together (size 1 below MAX_POINTS), with
 * a block boundary at the turn: block times are their last point's, so each block's current is
 * held over (previous end, own end], as the integral's step form takes it. Points after the turn
 * carry zeros, to be solved for.
 */
function blockGrid(timeS: Float64Array, faradaic: (j: number) => number, turn: number, end: number): { t: Float64Array; i: Float64Array; turnAt: number } {
  const size = Math.max(1, Math.ceil(end / MAX_POINTS));
  const ends: number[] = [];
  for (let k = turn; k > 0; k -= size) ends.push(k);
  ends.reverse();
  const turnAt = ends.length;
  for (let k = turn + size; k < end - 1 + size; k += size) ends.push(Math.min(k, end - 1));
  const t = new Float64Array(ends.length + 1);
  const i = new Float64Array(ends.length + 1);
  t[0] = timeS[0] as number;
  let from = 1;
  for (const [b, last] of ends.entries()) {
    t[b + 1] = timeS[last] as number;
    if (last <= turn) {
      let sum = 0;
      for (let k = from; k <= last; k++) sum += faradaic(k);
      i[b + 1] = sum / (last - from + 1);
    }
    from = last + 1;
  }
  return { t, i, turnAt };
}
