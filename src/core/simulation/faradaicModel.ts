/**
 * Contract between a mechanism and the time loop. Per time step the loop calls prepareStep(),
 * then currentAt() as often as the ohmic-drop iteration needs, then finishStep() once with the
 * final interfacial potential.
 */
export interface FaradaicModel {
  prepareStep(): void;
  /** Faradaic current (A, anodic positive) at the end of this step if the interface sat at `interfacialV`. */
  currentAt(interfacialV: number): number;
  /** Commits the step at `interfacialV`. */
  finishStep(interfacialV: number): void;
}
