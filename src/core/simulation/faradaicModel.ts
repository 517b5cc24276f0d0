/**
 * Contract between a mechanism and the time loop. Per time step the loop calls prepareStep(),
 * then currentAt() as often as the ohmic-drop iteration needs, then finishStep() once with the
 * final interfacial potential.
 */
import type { StepRule } from './vertexStepSchedule';

export interface FaradaicModel {
  /** Starts a time step of length `rule.dtS` with the backward-differentiation coefficients of `rule`. */
  prepareStep(rule: StepRule): void;
  /** Faradaic current (A, anodic positive) at the end of this step if the interface sat at `interfacialV`. */
  currentAt(interfacialV: number): number;
  /** Commits the step at `interfacialV`. */
  finishStep(interfacialV: number): void;
}

/**
 * Independent couples at one electrode: every couple sees the same interfacial potential and
 * their faradaic currents add (Kirchhoff's current law at the interface), so the ohmic drop and
 * the charging current are solved once, for the sum.
 */
export class SumOfCouplesModel implements FaradaicModel {
  constructor(private readonly parts: readonly FaradaicModel[]) {}

  prepareStep(rule: StepRule): void {
    for (const m of this.parts) m.prepareStep(rule);
  }

  currentAt(interfacialV: number): number {
    let sum = 0;
    for (const m of this.parts) sum += m.currentAt(interfacialV);
    return sum;
  }

  finishStep(interfacialV: number): void {
    for (const m of this.parts) m.finishStep(interfacialV);
  }
}
