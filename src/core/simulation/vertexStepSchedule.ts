/**
 * Time steps of the simulator and the backward-differentiation coefficients of each. The steps
 * are Δt, integrated by BDF3 once the last three values are Δt apart, except after every vertex
 * of the waveform (t = 0 and every switch): there the
 * integration starts afresh with one backward-Euler step of Δt/2^K, stays at steps no longer
 * than τ/4 for 6τ, with τ = R_u·A·C_dl the cell's charging time constant, and then doubles its
 * step (only where the doubled step ends on the grid of Δt) until it is Δt again.
 * Why: the applied potential has a kink at a vertex. A BDF2 step across it uses the slope of
 *   the sweep before the switch; on a bare double layer it gave twice the charging current at
 *   the first step after the switch, and under R_u the error rang on for milliseconds (6.5 µA
 *   against the analytic 5.5 µA 1 ms after the switch for τ = 0.23 ms and Δt = 0.5 ms). A fresh
 *   start carries nothing from before the kink into the step after it, and steps of τ/4 follow
 *   the charging transient (e⁻⁶ of it is left after 6τ): a blank then follows the analytic
 *   response within 0.04 % of vC (simulateCv.ohmic.test.ts), at about 30 steps more per vertex.
 * Coefficients: dy/dt at the new step ≈ σ·y_new − a·y_latest − b·y_previous;
 *   BDF1: σ = a = 1/h, b = 0; BDF2 with step h after a step h′, ω = h/h′:
 *   σ = (1 + 2ω)/((1 + ω)h), a = (1 + ω)/h, b = −ω²/((1 + ω)h) (ω = 1: 3/2h, 2/h, −1/2h);
 *   BDF3 (equal steps): σ = 11/6h, a = 3/h, b = −3/2h, c = 1/3h on the value before the previous.
 *   Why BDF3: at one step per 1 mV point BDF2 put the reversible peak 0.005 % high; BDF3 puts it
 *   within 0.0002 %. It is stable on the whole negative real axis (A(86°)-stable), which holds
 *   the diffusion, decay and R_u·C_dl relaxations.
 * Source: variable-step BDF2, zero-stable for step ratios below 1 + √2 (here at most 2): E. Hairer,
 *   S. P. Nørsett, G. Wanner, "Solving Ordinary Differential Equations I", 2nd ed., Springer
 *   (1993), §III.5 (from memory); BDF3 coefficients and its A(86°) stability: E. Hairer, G. Wanner,
 *   "Solving Ordinary Differential Equations II", 2nd ed., Springer (1996), §V.1 (from memory); restarting a multistep method at a discontinuity of the
 *   forcing: common practice, no source.
 */

export interface StepRule {
  /** Small integer naming this rule, for the per-rule factorisations the models keep. */
  id: number;
  dtS: number;
  /** σ, 1/s. */
  sigmaPerS: number;
  /** a, 1/s. */
  latestWeightPerS: number;
  /** b, 1/s. */
  previousWeightPerS: number;
  /** c, weight of the value before the previous one (BDF3 only; 0 otherwise), 1/s. */
  olderWeightPerS: number;
}

/** Fewest halvings of Δt after a vertex (also with no R_u or no C_dl: the faradaic current has its own kink). */
const MIN_HALVINGS = 3;
/** Most halvings (τ far below Δt): Δt/65536. */
const MAX_HALVINGS = 16;
/** Steps at most τ/STEPS_PER_TAU for WINDOW_TAUS·τ after a vertex (measured on a blank: 0.04 % of vC). */
const STEPS_PER_TAU = 4;
const WINDOW_TAUS = 6;

export interface StepSchedule {
  /** Base step Δt, s. */
  dtS: number;
  /** The shortest step is Δt/2^halvings. */
  halvings: number;
  /** Backward Euler at the shortest step. */
  restart: StepRule;
  /** BDF2 with equal steps, by level j (step Δt/2^(halvings − j)). */
  equal: StepRule[];
  /** BDF2 after a step half as long, by level j. */
  doubled: StepRule[];
  /** BDF3 at the base step Δt, once the last three values are Δt apart. */
  third: StepRule;
  /** Time after a vertex during which steps stay at most τ/4 (0 without R_u·C_dl), s. */
  fineWindowS: number;
  /** Longest step allowed inside that window, s. */
  fineStepS: number;
}

function bdf1(id: number, h: number): StepRule {
  return { id, dtS: h, sigmaPerS: 1 / h, latestWeightPerS: 1 / h, previousWeightPerS: 0, olderWeightPerS: 0 };
}

function bdf2(id: number, h: number, ratio: number): StepRule {
  return { id, dtS: h, sigmaPerS: (1 + 2 * ratio) / ((1 + ratio) * h), latestWeightPerS: (1 + ratio) / h, previousWeightPerS: -(ratio * ratio) / ((1 + ratio) * h), olderWeightPerS: 0 };
}

/** BDF3 with equal steps: (11/6)y_new − 3y_n + (3/2)y_{n−1} − (1/3)y_{n−2} = h·y′_new. */
function bdf3(id: number, h: number): StepRule {
  return { id, dtS: h, sigmaPerS: 11 / (6 * h), latestWeightPerS: 3 / h, previousWeightPerS: -1.5 / h, olderWeightPerS: 1 / (3 * h) };
}

/** The steps for base step `dtS` and charging time constant `tauS` = R_u·A·C_dl (s, 0 when either is 0). */
export function vertexStepSchedule(dtS: number, tauS: number): StepSchedule {
  const wanted = tauS > 0 ? Math.ceil(Math.log2((STEPS_PER_TAU * dtS) / tauS)) : 0;
  const halvings = Math.min(MAX_HALVINGS, Math.max(MIN_HALVINGS, wanted));
  const shortest = dtS / 2 ** halvings;
  const equal: StepRule[] = [];
  const doubled: StepRule[] = [];
  for (let j = 0; j <= halvings; j++) {
    equal.push(bdf2(1 + 2 * j, shortest * 2 ** j, 1));
    doubled.push(bdf2(2 + 2 * j, shortest * 2 ** j, 2));
  }
  return { dtS, halvings, restart: bdf1(0, shortest), equal, doubled, third: bdf3(3 + 2 * halvings, dtS), fineWindowS: WINDOW_TAUS * tauS, fineStepS: tauS / STEPS_PER_TAU };
}
