/**
 * Entry checks of the simulator: every field finite and in a physical range, with an
 * AnalysisError('BAD_OPTION') that names the field and its value.
 */
import { AnalysisError, assertFiniteInRange } from '../errors';
import { DEFAULT_NUMERICS, type CvSimulationInput, type SimulateCvOptions } from './simulationTypes';

const MECHANISMS = ['E', 'EC', 'surface'];

function assertPositiveOrInfinite(name: string, value: number): void {
  if (!(typeof value === 'number' && value > 0 && !Number.isNaN(value))) {
    throw new AnalysisError('BAD_OPTION', `${name} must be a positive number or Infinity, got ${String(value)}`);
  }
}

export function validateSimulationInput(p: CvSimulationInput): void {
  if (!MECHANISMS.includes(p.mechanism)) {
    throw new AnalysisError('BAD_OPTION', `mechanism must be one of ${MECHANISMS.join(', ')}, got ${String(p.mechanism)}`);
  }
  assertFiniteInRange('formalPotentialV', p.formalPotentialV, -10, 10);
  assertPositiveOrInfinite('k0CmPerS', p.k0CmPerS);
  assertFiniteInRange('alpha', p.alpha, 0.01, 0.99);
  if (!Number.isInteger(p.electronCount) || p.electronCount < 1 || p.electronCount > 6) {
    throw new AnalysisError('BAD_OPTION', `electronCount must be an integer from 1 to 6, got ${String(p.electronCount)}`);
  }
  assertFiniteInRange('diffusionOCm2PerS', p.diffusionOCm2PerS, 1e-12, 1);
  assertFiniteInRange('diffusionRCm2PerS', p.diffusionRCm2PerS, 1e-12, 1);
  assertFiniteInRange('concentrationOMolPerCm3', p.concentrationOMolPerCm3, 0, 1e-1);
  assertFiniteInRange('concentrationRMolPerCm3', p.concentrationRMolPerCm3, 0, 1e-1);
  assertFiniteInRange('areaCm2', p.areaCm2, 1e-12, 1e4);
  assertFiniteInRange('temperatureK', p.temperatureK, 150, 700);
  assertFiniteInRange('scanRateVPerS', p.scanRateVPerS, 1e-6, 1e6);
  assertFiniteInRange('startV', p.startV, -10, 10);
  assertFiniteInRange('switchV', p.switchV, -10, 10);
  if (p.startV === p.switchV) throw new AnalysisError('BAD_OPTION', `switchV must differ from startV (both ${p.startV} V)`);
  if (!Number.isInteger(p.cycles) || p.cycles < 1 || p.cycles > 1000) {
    throw new AnalysisError('BAD_OPTION', `cycles must be an integer from 1 to 1000, got ${String(p.cycles)}`);
  }
  assertFiniteInRange('stepV', p.stepV, 1e-7, Math.abs(p.switchV - p.startV));
  assertFiniteInRange('doubleLayerFPerCm2', p.doubleLayerFPerCm2, 0, 1);
  assertFiniteInRange('uncompensatedOhm', p.uncompensatedOhm, 0, 1e9);
  assertFiniteInRange('followUpRatePerS', p.followUpRatePerS, 0, 1e9);
  assertFiniteInRange('coverageMolPerCm2', p.coverageMolPerCm2, 0, 1e-6);
  assertPositiveOrInfinite('surfaceRatePerS', p.surfaceRatePerS);
}

export function validateSimulationOptions(o: SimulateCvOptions): void {
  const s = o.substepsPerPoint ?? 0;
  if (!Number.isInteger(s) || s < 0 || s > 10000) {
    throw new AnalysisError('BAD_OPTION', `substepsPerPoint must be 0 (automatic) or an integer up to 10000, got ${String(s)}`);
  }
  if (o.maxStepThermal !== undefined) assertFiniteInRange('maxStepThermal', o.maxStepThermal, 1e-5, 10);
  assertFiniteInRange('firstSpacingFraction', o.firstSpacingFraction ?? DEFAULT_NUMERICS.firstSpacingFraction, 1e-6, 1);
  assertFiniteInRange('gridExpansion', o.gridExpansion ?? DEFAULT_NUMERICS.gridExpansion, 1, 3);
  assertFiniteInRange('outerEdgeDiffusionLengths', o.outerEdgeDiffusionLengths ?? DEFAULT_NUMERICS.outerEdgeDiffusionLengths, 2, 50);
  const d = o.decayingSpecies ?? 'auto';
  if (d !== 'auto' && d !== 'O' && d !== 'R') {
    throw new AnalysisError('BAD_OPTION', `decayingSpecies must be auto, O or R, got ${String(d)}`);
  }
  for (const [j, g] of (o.fixedGrids ?? []).entries()) {
    if (!g) continue;
    assertFiniteInRange(`fixedGrids[${j}].firstSpacingCm`, g.firstSpacingCm, Number.MIN_VALUE);
    assertFiniteInRange(`fixedGrids[${j}].outerEdgeCm`, g.outerEdgeCm, g.firstSpacingCm);
  }
}

/** EC: which species decays; the decaying one must be absent from the bulk. */
export function resolveDecayingSpecies(p: CvSimulationInput, choice: 'auto' | 'O' | 'R'): 'O' | 'R' {
  const firstProduct = p.switchV > p.startV ? 'O' : 'R';
  const species = choice !== 'auto' ? choice : p.concentrationRMolPerCm3 === 0 && p.concentrationOMolPerCm3 > 0 ? 'R'
    : p.concentrationOMolPerCm3 === 0 && p.concentrationRMolPerCm3 > 0 ? 'O' : firstProduct;
  const bulk = species === 'O' ? p.concentrationOMolPerCm3 : p.concentrationRMolPerCm3;
  if (bulk !== 0 && p.followUpRatePerS > 0) {
    throw new AnalysisError('BAD_OPTION', `EC: the decaying species ${species} has a bulk concentration of ${bulk} mol/cm³; it must be 0 (set concentration${species}MolPerCm3 to 0 or choose decayingSpecies)`);
  }
  return species;
}
