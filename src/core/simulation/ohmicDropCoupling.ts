/**
 * Self-consistent interfacial potential under uncompensated resistance and double-layer
 * charging, solved at every time step.
 * Model: E_applied = E_int + R_u·(i_F(E_int) + i_C), i_C = A·C_dl·dE_int/dt, with dE_int/dt
 *   discretised by the same backward formula as the diffusion (BDF1 after each vertex, then
 *   variable-step BDF2, then BDF3, vertexStepSchedule.ts), so the charging and faradaic currents refer to
 *   the same instant.
 * Source: the ohmic-drop model is the usual series R_u with a parallel C_dl‖Z_F interface
 *   (A. J. Bard, L. R. Faulkner, "Electrochemical Methods", 2nd ed. (2001), §1.2 and §1.3, from
 *   memory); the root finder is the Illinois variant of regula falsi (M. Dowell, P. Jarratt,
 *   BIT 11, 168 (1971), from memory) on a bracket grown from the previous step's solution.
 * g(E) = E + R_u·i(E) − E_applied increases with E (i_F and i_C both rise with E), so the root
 *   is unique. Failing to converge throws NOT_CONVERGED rather than returning a guess.
 */
import { AnalysisError } from '../errors';
import type { FaradaicModel } from './faradaicModel';

export interface ChargingHistory {
  /** Coefficient σ of the backward formula: dE/dt ≈ σ·E − history, 1/s. */
  sigmaPerS: number;
  /** History term of the backward formula, V/s. */
  historyVPerS: number;
}

const TOLERANCE_V = 1e-11;
const MAX_ITERATIONS = 200;
/** |g| below this (V) counts as converged: far below any measurable ohmic drop. */
const RESIDUAL_TOLERANCE_V = 1e-13;

/** Charging current, A, for interfacial potential e. */
export function chargingCurrentA(capacitanceF: number, h: ChargingHistory, e: number): number {
  return capacitanceF * (h.sigmaPerS * e - h.historyVPerS);
}

/** Reusable solver: holds the per-step data so that the time loop allocates nothing. */
export class InterfacialPotentialSolver {
  private appliedV = 0;
  private readonly history: ChargingHistory = { sigmaPerS: 0, historyVPerS: 0 };

  constructor(
    private readonly model: FaradaicModel,
    private readonly resistanceOhm: number,
    private readonly capacitanceF: number,
  ) {}

  /** E_int for this step; `guessV` is usually the previous step's value. */
  solve(appliedV: number, history: ChargingHistory, guessV: number): number {
    if (this.resistanceOhm === 0) return appliedV;
    this.appliedV = appliedV;
    this.history.sigmaPerS = history.sigmaPerS;
    this.history.historyVPerS = history.historyVPerS;
    let a = guessV;
    let ga = this.residual(a);
    if (ga === 0) return a;
    let width = 1e-3;
    let b = a;
    let gb = ga;
    for (let k = 0; k < 80 && Math.sign(gb) === Math.sign(ga); k++) {
      b = a - Math.sign(ga) * width;
      gb = this.residual(b);
      if (Math.sign(gb) === Math.sign(ga)) {
        a = b;
        ga = gb;
        width *= 2;
      }
    }
    if (Math.sign(gb) === Math.sign(ga)) throw this.notConverged();
    return this.illinois(a, ga, b, gb);
  }

  private residual(e: number): number {
    const total = this.model.currentAt(e) + chargingCurrentA(this.capacitanceF, this.history, e);
    return e + this.resistanceOhm * total - this.appliedV;
  }

  private illinois(a0: number, ga0: number, b0: number, gb0: number): number {
    let a = a0, ga = ga0, b = b0, gb = gb0;
    let side = 0;
    for (let k = 0; k < MAX_ITERATIONS; k++) {
      const c = (a * gb - b * ga) / (gb - ga);
      const gc = this.residual(c);
      if (Math.abs(gc) < RESIDUAL_TOLERANCE_V) return c;
      if (Math.sign(gc) === Math.sign(gb)) {
        b = c;
        gb = gc;
        if (side === -1) ga /= 2;
        side = -1;
      } else {
        a = c;
        ga = gc;
        if (side === 1) gb /= 2;
        side = 1;
      }
      if (Math.abs(b - a) < TOLERANCE_V) return (a + b) / 2;
    }
    throw this.notConverged();
  }

  private notConverged(): AnalysisError {
    return new AnalysisError('NOT_CONVERGED', `ohmic-drop iteration did not converge at applied potential ${this.appliedV} V`);
  }
}
