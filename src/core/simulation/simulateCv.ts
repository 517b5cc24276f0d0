/**
 * Digital simulation of a cyclic voltammogram at a planar electrode.
 * Mechanisms: E and EC (dissolved couple, semi-infinite linear diffusion, Butler–Volmer
 *   kinetics) and surface (adsorbed couple, Laviron kinetics); each with double-layer charging
 *   and uncompensated resistance solved self-consistently at every time step.
 * Method: fully implicit finite differences — BDF3 in time (started afresh with BDF1, short
 *   steps and variable-step BDF2 at t = 0 and at every switch, vertexStepSchedule.ts) on an
 *   exponentially expanding space grid, compact three-point (Mehrstellen) discretisation, Thomas
 *   elimination run from the bulk so that the electrode boundary condition (Butler–Volmer with
 *   the unknown flux) is solved in closed form; the ohmic-drop coupling is a bracketed scalar
 *   root per step. Sources are named in the component files: expandingGrid.ts,
 *   bdf2DiffusionSpecies.ts, compactDiffusionStencil.ts, solveTridiagonalThomas.ts, butlerVolmerFlux.ts,
 *   lavironSurfaceModel.ts, ohmicDropCoupling.ts; the grid and the time loop in simulateCvCouples.ts
 *   and cvTimeLoop.ts. General reference: D. Britz, T. Strutwolf,
 *   "Digital Simulation in Electrochemistry", 4th ed., Springer (2016) (from memory).
 * In: CvSimulationInput (units in the names). Out: columns timeS, potentialV (applied),
 *   currentA (total, IUPAC: anodic positive), interfacialPotentialV, faradaicCurrentA,
 *   chargingCurrentA. The first point (t = 0) carries the currents of the first time step
 *   (t = Δt/2^K, vertexStepSchedule.ts), since an instantaneous current at t = 0 is undefined for a potential applied at t = 0.
 * Default numerics (DEFAULT_NUMERICS) and the accuracy they reach (measured with this code, n = 1,
 *   1 mV points, sweep ±0.5 V around E°′; references in simulateCv.*.test.ts):
 *   time step ≤ 0.04·RT/(nF) of sweep (one step per 1 mV point), first spacing 0.04·√(D/(nfv)),
 *   spacing ratio 1.15, outer edge 6·√(D_max·t_total): about 40 nodes per species.
 *   Reversible peak current within 0.001 % of 0.446295 (the exact Nernstian peak function;
 *   Nicholson & Shain's 0.4463), irreversible within 0.01 % of 0.4958; the grid gives most of
 *   that, the BDF3 step < 0.0002 % (BDF2 with the finite-volume stencil, used before, gave
 *   +0.05 %: +0.045 % from the stencil, +0.005 % from the step). E_p within 0.05 mV of theory; ΔE_p within 0.5 mV of the
 *   switching-potential table and within 2 mV of Nicholson's ψ table; the whole reversible cycle
 *   within 0.1 % of ip of an independent convolution-integral solution. A blank under R_u follows
 *   the analytic RC response within 0.04 % of vC through every switch (vertexStepSchedule.ts).
 *   The surface mechanism steps at ≤ 0.002·RT/(nF) and is exact per step.
 *   2,000 points take about 6 ms on the 2-core reference machine (see `npm run bench`).
 */
import { simulateCvCouples } from './simulateCvCouples';
import type { CvSimulationInput, CvSimulationResult, SimulateCvOptions } from './simulationTypes';

/** One couple: simulateCvCouples with the couple's own fields taken from `input`. */
export function simulateCv(input: Partial<CvSimulationInput>, options: SimulateCvOptions = {}): CvSimulationResult {
  return simulateCvCouples(input, [{}], options);
}
