/**
 * Input, option and result types of the whole-curve fit (fitVoltammograms, compareFitModels).
 * Units follow the core (V, A, s, cm, cm², mol/cm³, cm/s, cm²/s, F/cm², Ω, mol/cm², K); currents
 * are IUPAC (anodic positive).
 */
import type { Voltammogram } from '../types';
import type { FitProgress } from './levenbergMarquardt';

export type FitMechanism = 'E' | 'EC' | 'surface';

/** The values of one couple. */
export interface CoupleValues {
  /** E°′, V. */
  formalPotentialV: number;
  k0CmPerS: number;
  /** Transfer coefficient α of the reduction, kept within (0.05, 0.95). */
  alpha: number;
  /** D_O, cm²/s. */
  diffusionOCm2PerS: number;
  /** D_O/D_R (pure number). */
  diffusionRatio: number;
  /** EC: first-order rate constant of the follow-up reaction, 1/s. */
  followUpRatePerS: number;
  /** Surface: total coverage Γ, mol/cm². */
  coverageMolPerCm2: number;
  /** Surface: Laviron rate constant k_s, 1/s. */
  surfaceRatePerS: number;
}

/** Values shared by all couples and all voltammograms of one fit (same electrode and cell). */
export interface SharedValues {
  uncompensatedOhm: number;
  /** Double-layer capacitance per area, F/cm². */
  doubleLayerFPerCm2: number;
}

export type CoupleParameter = keyof CoupleValues;
export type SharedParameter = keyof SharedValues;
/** What a user may free; 'background' is a straight line a + b·E per voltammogram. */
export type FitParameter = CoupleParameter | SharedParameter | 'background';

export interface FitModelValues {
  couples: CoupleValues[];
  shared: SharedValues;
}

/** Fixed quantities of the cell (never fitted). */
export interface FitCell {
  areaCm2: number;
  /** Bulk concentration of the species present at the start, mol/cm³ (E and EC; unused for surface). */
  concentrationMolPerCm3: number;
  /** Electrons n per molecule, for every couple unless FitVoltammogramsOptions.electronCounts says otherwise. */
  electronCount: number;
  temperatureK: number;
}

export interface FitInput {
  /** One voltammogram, or a scan-rate series fitted jointly (shared parameters). Each needs its scan rate. */
  records: Voltammogram[];
  cell: FitCell;
}

export interface FitVoltammogramsOptions {
  /** @default 'E' */
  mechanism?: FitMechanism;
  /** Number of independent couples in the record. @default 1 */
  coupleCount?: number;
  /**
   * Free parameters (the same for every couple). @default E, EC: formalPotentialV, k0CmPerS,
   * alpha, diffusionOCm2PerS, doubleLayerFPerCm2 (+ followUpRatePerS for EC); surface:
   * formalPotentialV, alpha, coverageMolPerCm2, surfaceRatePerS, doubleLayerFPerCm2
   */
  free?: FitParameter[];
  /** Potential window fitted (V, either order), on both sweeps. @default the whole cycle */
  windowV?: [number, number];
  /** 1-based cycle fitted; earlier cycles are simulated too. @default 1 */
  cycle?: number;
  /** Species present at the start. @default O when the first sweep runs negative, else R */
  initialSpecies?: 'O' | 'R';
  /** Electrons per couple (in E°′ order of the starting values). @default cell.electronCount for all */
  electronCounts?: number[];
  /**
   * Starting values of free parameters and the values of fixed ones, per couple (in E°′ order)
   * and shared. Missing entries come from the peak analysis (fitStartingValues.ts); R_u
   * defaults to 0 Ω.
   */
  start?: { couples?: Partial<CoupleValues>[]; shared?: Partial<SharedValues> };
  /** Largest number of Levenberg–Marquardt iterations per stage. @default 60 */
  maxIterations?: number;
  /** Profile-likelihood bounds for rate constants whose linearised interval is not trustworthy. @default true */
  profile?: boolean;
  onProgress?: ((p: FitProgress & { stage: FitStage }) => void) | undefined;
  /** Checked between simulations; when aborted the fit throws AnalysisError('CANCELLED'). */
  signal?: { readonly aborted: boolean } | undefined;
}

/** 'iterate': the main least-squares iteration; 'profile': profile-likelihood bounds of a rate constant. */
export type FitStage = 'iterate' | 'profile';

export type EstimateStatus = 'estimate' | 'lower-bound' | 'upper-bound' | 'undetermined' | 'fixed';

export interface ParameterEstimate {
  parameter: CoupleParameter | SharedParameter;
  /** 0-based couple in order of E°′; null for a shared parameter. */
  couple: number | null;
  /** Best value, in the unit of the name. */
  value: number;
  free: boolean;
  /** Standard error in the unit of the name (delta method for log-scale parameters); null when fixed. */
  standardError: number | null;
  /** 95 % interval; a null end is not limited by the data. Null when fixed. */
  interval: [number | null, number | null] | null;
  intervalMethod: 'linearized' | 'profile' | null;
  status: EstimateStatus;
  /** The estimate sits at the edge of the range the fit searches. */
  atSearchLimit: boolean;
  /** Why a bound or 'undetermined' was given, when the reason is not the profile likelihood alone. */
  reason?: string;
}

export interface RecordFit {
  scanRateVPerS: number;
  pointCount: number;
  rmsA: number;
  /** Fitted straight background a + b·E, when 'background' was free. */
  background: { offsetA: number; slopeAPerV: number } | null;
  /** Indices of the fitted points in the voltammogram and the model current there (A). */
  indices: Int32Array;
  modelA: Float64Array;
}

export interface FitResult {
  mechanism: FitMechanism;
  /** Best values; couples in order of E°′. */
  values: FitModelValues;
  /** Starting values (after the peak analysis and the user's), couples in order of E°′. */
  start: FitModelValues;
  parameters: ParameterEstimate[];
  /** Correlation of the free parameters (labels like 'k0CmPerS[1]'); null where undefined. */
  correlation: { labels: string[]; matrix: (number | null)[][] };
  windowV: [number, number];
  pointCount: number;
  rmsA: number;
  residualStdA: number;
  degreesOfFreedom: number;
  iterations: number;
  evaluations: number;
  converged: boolean;
  stopReason: string;
  /** Akaike and Bayesian information criteria, k = free parameters incl. background terms. */
  criteria: { aic: number; bic: number; parameterCount: number };
  records: RecordFit[];
  /** Identifiability and caveats in words. */
  notes: string[];
}
