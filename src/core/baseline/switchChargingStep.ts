/**
 * The step the double-layer charging current makes at a switching potential, told apart from the
 * faradaic current's own change of course there.
 *
 * At the switch the charging current Cd·A·dE/dt reverses at once (Bard & Faulkner, Electrochemical
 * Methods, 2nd ed. (2001) §1.2.4, eq. 1.2.15, from memory): a jump of 2·Cd·A·v. The faradaic current
 * is continuous there but not smooth: the semi-integral of a diffusion-controlled current is a
 * function of the surface state (Nicholson & Shain, Anal. Chem. 36 (1964) 706, eq. 24), whose
 * slope in time changes sign with dE/dt, and the semi-derivative of that kink adds a term
 * ∝ √(t − tλ) after the switch (the semi-derivative of t is 2√(t/π)). Half the difference of plain
 * means on either side takes in that departure, more the closer the switch is to the peak and the
 * wider the point spacing. Here each side is fitted in time and extrapolated to the switch: the
 * forward side (up to and with the vertex point) by a line, the return side by a + b·τ + c·√τ
 * (τ = t − tλ), over SIDE_WINDOW of potential (at least MIN_POINTS points); the step is the
 * difference of the two at tλ (the first return point, inside the charging current's turn-over
 * in Ru·Cd time, left out). Where the noise hides the kink (c within three standard errors of 0,
 * Draper & Smith, Applied Regression Analysis, 3rd ed. (1998) ch. 5), or has the sign of a charging
 * current still turning over (Ru·Cd·A of several points) rather than the return sweep's, the return side is a line.
 * In: time (s), current (A, IUPAC), the vertex index and the first index of the return sweep.
 * Out: the step, forward minus return at the switch (A, IUPAC); null when a side has too few points.
 */

import { AnalysisError } from '../errors';
import { fitLinearModel, type LinearModelFit } from '../regression/fitLinearModel';

/** Potential span fitted on each side of the switch (V): short against the wave (0.4 RT/F), long against the spacing (our choice). */
const SIDE_WINDOW_V = 0.01;
const MIN_POINTS = 4;

export interface SwitchChargingStepInput {
  potentialV: ArrayLike<number>;
  timeS: ArrayLike<number>;
  currentA: ArrayLike<number>;
  vertexIndex: number;
  /** First index of the return sweep (after the vertex). */
  returnStart: number;
  /** End (exclusive) of the return sweep. */
  returnEnd: number;
}

export function switchChargingStep(input: SwitchChargingStepInput): number | null {
  const { potentialV: e, timeS: t, currentA: y, vertexIndex: v } = input;
  const ev = e[v]!;
  const tv = t[v]!;
  let before = v;
  while (before > 0 && (v - before + 1 < MIN_POINTS || Math.abs(e[before - 1]! - ev) <= SIDE_WINDOW_V) && v - before < 200) before--;
  // The first return point is left out: the charging current turns over the cell's Ru·Cd time there.
  const first = Math.max(input.returnStart, v + 2);
  let after = first;
  while (after + 1 < input.returnEnd && (after - first + 1 < MIN_POINTS + 1 || Math.abs(e[after + 1]! - ev) <= SIDE_WINDOW_V) && after - first < 200) after++;
  if (v - before + 1 < MIN_POINTS || after - first + 1 < MIN_POINTS + 1) return null;
  const forwardAt = fitSide(before, v + 1, (k) => [1, t[k]! - tv], y)?.coefficients[0] ?? null;
  const tau = (k: number) => t[k]! - tv;
  const kinked = fitSide(first, after + 1, (k) => [1, tau(k), Math.sqrt(Math.max(0, tau(k)))], y);
  // Where the noise hides the kink (its √τ term within 3 standard errors of 0), a line has the smaller variance.
  // The faradaic kink turns the current towards the return sweep's sign; a √τ term of the other sign is the
  // charging current's own turn-over (Ru·Cd·A spanning several points), which a line passes through.
  const forwardSign = Math.sign(e[v]! - e[v - 1]!);
  const resolved = kinked && kinked.standardErrors && forwardSign * kinked.coefficients[2]! < 0 && Math.abs(kinked.coefficients[2]!) > 3 * kinked.standardErrors[2]!;
  const returnAt = resolved ? kinked.coefficients[0]! : fitSide(first, after + 1, (k) => [1, tau(k)], y)?.coefficients[0] ?? null;
  return forwardAt === null || returnAt === null ? null : forwardAt - returnAt;
}

/** Least squares over [from, to) (fitLinearModel.ts); the first column is ones, so the first coefficient is the value at τ = 0. */
function fitSide(from: number, to: number, row: (k: number) => number[], y: ArrayLike<number>): LinearModelFit | null {
  const rows = Array.from({ length: to - from }, (_, i) => row(from + i));
  const columns = rows[0]!.map((_, j) => rows.map((r) => r[j]!));
  try {
    return fitLinearModel(columns, Array.from({ length: to - from }, (_, i) => y[from + i]!));
  } catch (e) {
    if (e instanceof AnalysisError) return null;
    throw e;
  }
}
