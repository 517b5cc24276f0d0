/**
 * Cyclic voltammogram of one or several independent couples at one planar electrode (a mixture
 * of species, each with its own mechanism, E°′, kinetics, diffusion coefficients and bulk
 * concentrations), sharing the electrode, the waveform, the double-layer capacitance and the
 * uncompensated resistance.
 * Method: each couple is its own faradaic model (diffusionCoupleModel.ts on its own expanding
 *   grid, or lavironSurfaceModel.ts); at every time step all couples see the same interfacial
 *   potential and their faradaic currents add, so the ohmic drop and the charging current are
 *   solved once for the sum (ohmicDropCoupling.ts) — not per couple, which would double-count
 *   C_dl and misplace the i·R_u drop. The time step is the finest any couple needs.
 * In: `cell` (shared fields of CvSimulationInput; couple fields in it are the defaults of every
 *   couple), `couples` (per-couple fields), options as for simulateCv (plus fixedGrids per couple).
 * Out: CvSimulationResult; faradaicCurrentA is the sum over the couples.
 * Difference from a mechanism with coupled couples: the species do not react with each other
 *   (no comproportionation, no shared intermediate).
 */
import { inverseThermalVoltagePerV } from '../constants';
import { AnalysisError } from '../errors';
import { runTimeLoop } from './cvTimeLoop';
import { DiffusionCoupleModel } from './diffusionCoupleModel';
import { expandingGrid } from './expandingGrid';
import { SumOfCouplesModel, type FaradaicModel } from './faradaicModel';
import { LavironSurfaceModel } from './lavironSurfaceModel';
import { DEFAULT_NUMERICS, DEFAULT_SIMULATION, type CoupleInput, type CvSimulationInput, type CvSimulationResult, type FixedGrid, type SimulateCvOptions, type SimulationNumerics } from './simulationTypes';
import { triangularWaveform } from './triangularWaveform';
import { vertexStepSchedule } from './vertexStepSchedule';
import { resolveDecayingSpecies, validateSimulationInput, validateSimulationOptions } from './validateSimulationInput';

export function simulateCvCouples(cell: Partial<CvSimulationInput>, couples: ReadonlyArray<Partial<CoupleInput>>, options: SimulateCvOptions = {}): CvSimulationResult {
  if (couples.length === 0) throw new AnalysisError('BAD_OPTION', 'couples must hold at least one couple');
  const inputs: CvSimulationInput[] = couples.map((c) => ({ ...DEFAULT_SIMULATION, ...cell, ...c }));
  for (const q of inputs) validateSimulationInput(q);
  validateSimulationOptions(options);
  const p = inputs[0] as CvSimulationInput;
  const wave = triangularWaveform(p.startV, p.switchV, p.scanRateVPerS, p.stepV, p.cycles);
  const pointStepV = Math.abs(p.switchV - p.startV) / wave.pointsPerSweep;
  const substeps = options.substepsPerPoint || Math.max(...inputs.map((q) => substepsFor(q, options, pointStepV)));
  const dtS = wave.intervalS / substeps;
  const totalTimeS = wave.timeS[wave.timeS.length - 1] as number;
  const built = inputs.map((q, j) => buildModel(q, options, totalTimeS, substeps, options.fixedGrids?.[j] ?? null));
  // The grid above is sized for the whole waveform (totalTimeS) even when only its first sweep is run.
  const points = options.firstSweepOnly ? wave.pointsPerSweep + 1 : wave.potentialV.length;
  const timeS = points === wave.timeS.length ? wave.timeS : wave.timeS.slice(0, points);
  const potentialV = points === wave.potentialV.length ? wave.potentialV : wave.potentialV.slice(0, points);
  assertAffordable(built.map((b) => b.numerics), points);
  const model = built.length === 1 ? (built[0] as { model: FaradaicModel }).model : new SumOfCouplesModel(built.map((b) => b.model));
  const capacitanceF = p.doubleLayerFPerCm2 * p.areaCm2;
  const schedule = vertexStepSchedule(dtS, capacitanceF * p.uncompensatedOhm);
  const columns = runTimeLoop(model, potentialV, { substeps, schedule, vertexEvery: wave.pointsPerSweep, capacitanceF, uncompensatedOhm: p.uncompensatedOhm });
  const coupleNumerics = built.map((b) => b.numerics);
  return { timeS, potentialV, ...columns, numerics: coupleNumerics[0] as SimulationNumerics, coupleNumerics };
}

/** Steps per output point so that each step moves the potential by at most maxStepThermal·RT/(nF). */
function substepsFor(q: CvSimulationInput, o: SimulateCvOptions, pointStepV: number): number {
  const nf = q.electronCount * inverseThermalVoltagePerV(q.temperatureK);
  const maxStep = o.maxStepThermal ?? (q.mechanism === 'surface' ? DEFAULT_NUMERICS.maxStepThermalSurface : DEFAULT_NUMERICS.maxStepThermal);
  return Math.max(1, Math.ceil((nf * pointStepV) / maxStep));
}

/** About 10 s of computing on a laptop core; beyond that a setting is almost surely a mistake. */
const MAX_NODE_STEPS = 3e8;

function assertAffordable(all: SimulationNumerics[], points: number): void {
  const nodes = all.reduce((s, n) => s + Math.max(n.spacePoints, 10), 0);
  const substeps = (all[0] as SimulationNumerics).substepsPerPoint;
  const work = substeps * (points - 1) * nodes;
  if (work > MAX_NODE_STEPS) {
    throw new AnalysisError('BAD_OPTION', `this simulation needs ${work.toExponential(1)} node-steps (${points} points × ${substeps} steps × ${nodes} nodes; limit ${MAX_NODE_STEPS.toExponential(0)}): use a larger stepV or coarser numerical options`);
  }
}

function buildModel(p: CvSimulationInput, o: SimulateCvOptions, totalTimeS: number, substeps: number, fixed: FixedGrid | null): { model: FaradaicModel; numerics: SimulationNumerics } {
  if (p.mechanism === 'surface') {
    return { model: new LavironSurfaceModel(p), numerics: { substepsPerPoint: substeps, spacePoints: 0, firstSpacingCm: 0, outerEdgeCm: 0 } };
  }
  const decaying = p.mechanism === 'EC' ? resolveDecayingSpecies(p, o.decayingSpecies ?? 'auto') : 'none';
  const { firstSpacingCm, outerEdgeCm } = fixed ?? automaticGrid(p, o, totalTimeS);
  const grid = expandingGrid(firstSpacingCm, o.gridExpansion ?? DEFAULT_NUMERICS.gridExpansion, outerEdgeCm);
  const numerics = { substepsPerPoint: substeps, spacePoints: grid.volumeCm.length, firstSpacingCm, outerEdgeCm };
  return { model: new DiffusionCoupleModel(p, grid, decaying), numerics };
}

/**
 * First spacing: a fraction of the thinnest layer (diffusion layer √(D/(nfv)), and for EC the
 * reaction layer √(D/k_f)); outer edge: several √(D_max·t_total).
 */
export function automaticGrid(p: CvSimulationInput, o: SimulateCvOptions, totalTimeS: number): FixedGrid {
  const nf = p.electronCount * inverseThermalVoltagePerV(p.temperatureK);
  const dMin = Math.min(p.diffusionOCm2PerS, p.diffusionRCm2PerS);
  const dMax = Math.max(p.diffusionOCm2PerS, p.diffusionRCm2PerS);
  let layerCm = Math.sqrt(dMin / (nf * p.scanRateVPerS));
  if (p.mechanism === 'EC' && p.followUpRatePerS > 0) layerCm = Math.min(layerCm, Math.sqrt(dMin / p.followUpRatePerS));
  const firstSpacingCm = (o.firstSpacingFraction ?? DEFAULT_NUMERICS.firstSpacingFraction) * layerCm;
  const outerEdgeCm = Math.max((o.outerEdgeDiffusionLengths ?? DEFAULT_NUMERICS.outerEdgeDiffusionLengths) * Math.sqrt(dMax * totalTimeS), 20 * firstSpacingCm);
  return { firstSpacingCm, outerEdgeCm };
}
