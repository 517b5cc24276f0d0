/**
 * Input model of the cyclic-voltammetry simulator, its defaults and its options.
 * Units follow the core: V, A, s, cm, cm², mol/cm³, cm/s, cm²/s, F/cm², Ω, mol/cm², K.
 * Currents follow the IUPAC convention (anodic positive).
 */
import { STANDARD_TEMPERATURE_K } from '../constants';

/** Mechanism: E (Butler–Volmer couple in solution), EC (E plus a first-order decay of the
 * electrogenerated species), surface (adsorbed couple with Laviron kinetics). */
export type SimulationMechanism = 'E' | 'EC' | 'surface';

export interface CvSimulationInput {
  mechanism: SimulationMechanism;
  /** Formal potential E°′ of O + n e⁻ ⇌ R, V. */
  formalPotentialV: number;
  /** Standard heterogeneous rate constant, cm/s. `Infinity` gives a Nernstian (reversible) couple. */
  k0CmPerS: number;
  /** Transfer coefficient α of the reduction (0 < α < 1). */
  alpha: number;
  /** Electrons n transferred per molecule. */
  electronCount: number;
  diffusionOCm2PerS: number;
  diffusionRCm2PerS: number;
  /** Bulk concentration of the oxidised form O, mol/cm³ (1 mM = 1e-6). */
  concentrationOMolPerCm3: number;
  /** Bulk concentration of the reduced form R, mol/cm³. */
  concentrationRMolPerCm3: number;
  areaCm2: number;
  temperatureK: number;
  scanRateVPerS: number;
  /** Applied potential at t = 0, V. */
  startV: number;
  /** Vertex of each cycle, V; every cycle runs start → switch → start. */
  switchV: number;
  /** Number of full cycles (integer ≥ 1). */
  cycles: number;
  /** Potential increment between output points, V (the sweep is split into equal steps close to this). */
  stepV: number;
  /** Double-layer capacitance per area, F/cm². */
  doubleLayerFPerCm2: number;
  /** Uncompensated resistance, Ω. */
  uncompensatedOhm: number;
  /** First-order rate constant of the follow-up reaction (EC only), 1/s. */
  followUpRatePerS: number;
  /** Total surface coverage Γ of the adsorbed couple (surface only), mol/cm². */
  coverageMolPerCm2: number;
  /** Laviron surface rate constant k_s (surface only), 1/s. `Infinity` gives a Nernstian film. */
  surfaceRatePerS: number;
}

/**
 * Defaults: a 1 mM solution of O at a 3 mm disk, a fast one-electron couple at 0 V scanned at
 * 100 mV/s from +0.3 V to −0.3 V and back, with no charging or ohmic drop.
 */
export const DEFAULT_SIMULATION: Readonly<CvSimulationInput> = Object.freeze({
  mechanism: 'E',
  formalPotentialV: 0,
  k0CmPerS: 1,
  alpha: 0.5,
  electronCount: 1,
  diffusionOCm2PerS: 1e-5,
  diffusionRCm2PerS: 1e-5,
  concentrationOMolPerCm3: 1e-6,
  concentrationRMolPerCm3: 0,
  areaCm2: 0.0707,
  temperatureK: STANDARD_TEMPERATURE_K,
  scanRateVPerS: 0.1,
  startV: 0.3,
  switchV: -0.3,
  cycles: 1,
  stepV: 0.001,
  doubleLayerFPerCm2: 0,
  uncompensatedOhm: 0,
  followUpRatePerS: 1,
  coverageMolPerCm2: 1e-10,
  surfaceRatePerS: 1000,
});

/**
 * Default numerics of the dissolved-couple simulation (simulateCv.ts gives the accuracy they
 * reach): time step ≤ 0.04·RT/(nF) of sweep, first spacing 0.04 of the thinnest layer, spacing
 * ratio 1.15, outer edge 6·√(D_max·t_total); the surface mechanism steps at ≤ 0.002·RT/(nF).
 */
export const DEFAULT_NUMERICS = Object.freeze({
  maxStepThermal: 0.04,
  maxStepThermalSurface: 0.002,
  firstSpacingFraction: 0.04,
  gridExpansion: 1.15,
  outerEdgeDiffusionLengths: 6,
});

export interface SimulateCvOptions {
  /**
   * Time steps per output point. `0` chooses automatically so that each step moves the applied
   * potential by at most `maxStepThermal` thermal voltages. @default 0
   */
  substepsPerPoint?: number;
  /**
   * Largest potential move per time step, in units of RT/(nF) (used when substepsPerPoint is 0).
   * The surface mechanism reports step-mean currents (half-step lag), so it steps finer.
   * @default 0.04 (0.002 for the surface mechanism)
   */
  maxStepThermal?: number;
  /**
   * First grid spacing as a fraction of the smallest relevant layer thickness (diffusion layer
   * √(D/(nfv)), and for EC the reaction layer √(D/k_f)). @default 0.04
   */
  firstSpacingFraction?: number;
  /** Ratio of consecutive grid spacings of the expanding grid. @default 1.15 */
  gridExpansion?: number;
  /** Outer grid edge in units of √(D_max·t_total). @default 6 */
  outerEdgeDiffusionLengths?: number;
  /**
   * EC only: which species decays. `auto` takes the one absent from the bulk (the product of the
   * first sweep). @default 'auto'
   */
  decayingSpecies?: 'auto' | 'O' | 'R';
  /**
   * Fixed space grid per couple (index j for couple j of simulateCvCouples; index 0 for
   * simulateCv) instead of one derived from D, v and k_f. The node count then stays the same
   * while parameters change, so the current is a smooth function of them (a fit's
   * finite-difference Jacobian needs that). `null` or a missing entry keeps the automatic grid.
   * @default none
   */
  fixedGrids?: ReadonlyArray<FixedGrid | null>;
  /**
   * Compute only the first sweep (start to switch): the columns then hold its points alone. The
   * space grid stays the one of the whole waveform, so those points are exactly those of the full
   * run. For a caller that reads the forward wave only. @default false
   */
  firstSweepOnly?: boolean;
}

/** First spacing and outer edge of an expanding grid, cm (the expansion ratio is `gridExpansion`). */
export interface FixedGrid {
  firstSpacingCm: number;
  outerEdgeCm: number;
}

/** The fields that belong to one couple; the rest (cell, waveform, C_dl, R_u) is shared by all couples at an electrode. */
export type CoupleField = 'mechanism' | 'formalPotentialV' | 'k0CmPerS' | 'alpha' | 'electronCount' | 'diffusionOCm2PerS' | 'diffusionRCm2PerS'
  | 'concentrationOMolPerCm3' | 'concentrationRMolPerCm3' | 'followUpRatePerS' | 'coverageMolPerCm2' | 'surfaceRatePerS';

export type CoupleInput = Pick<CvSimulationInput, CoupleField>;

/** Simulated voltammogram as columns; `potentialV` is the applied potential. */
export interface CvSimulationResult {
  timeS: Float64Array;
  /** Applied potential, V. */
  potentialV: Float64Array;
  /** Total current (faradaic + charging), A, anodic positive; point 0 repeats the first time step's value. */
  currentA: Float64Array;
  /** Potential across the interface, E_applied − i·R_u, V. */
  interfacialPotentialV: Float64Array;
  faradaicCurrentA: Float64Array;
  chargingCurrentA: Float64Array;
  /** Numerical settings actually used (of the first couple). */
  numerics: SimulationNumerics;
  /** Numerical settings of every couple (simulateCvCouples; one entry for simulateCv). */
  coupleNumerics: SimulationNumerics[];
}

export interface SimulationNumerics {
  substepsPerPoint: number;
  /** Nodes per species (0 for a surface couple). */
  spacePoints: number;
  firstSpacingCm: number;
  outerEdgeCm: number;
}
