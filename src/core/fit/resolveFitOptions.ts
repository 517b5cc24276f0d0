/**
 * Checks and completes the input and options of a fit once, where the fit starts; the inner
 * functions then take the resolved record.
 */
import { AnalysisError, assertFiniteInRange } from '../errors';
import type { Voltammogram } from '../types';
import { DEFAULT_FREE, PARAMETER_SPECS } from './fitParameters';
import type { FitCell, FitInput, FitMechanism, FitParameter, FitVoltammogramsOptions } from './fitTypes';

export interface ResolvedFit {
  records: readonly Voltammogram[];
  cell: FitCell;
  mechanism: FitMechanism;
  coupleCount: number;
  free: FitParameter[];
  /**
   * Parameters asked free that the model cannot tell apart from others (held at their value,
   * reported undetermined): D_O/D_R for the E mechanism (see fitNotes.ts).
   */
  confounded: FitParameter[];
  background: boolean;
  cycle: number;
  windowV: [number, number] | undefined;
  initialSpecies: 'O' | 'R';
  electronCounts: number[];
  maxIterations: number;
  profile: boolean;
}

const MECHANISMS: FitMechanism[] = ['E', 'EC', 'surface'];

export function resolveFitOptions(input: FitInput, o: FitVoltammogramsOptions): ResolvedFit {
  const { records, cell } = input;
  if (!Array.isArray(records) || records.length === 0) throw new AnalysisError('EMPTY_INPUT', 'a fit needs at least one voltammogram');
  const mechanism = o.mechanism ?? 'E';
  if (!MECHANISMS.includes(mechanism)) throw new AnalysisError('BAD_OPTION', `mechanism must be E, EC or surface, got ${String(mechanism)}`);
  checkCell(cell, mechanism);
  const coupleCount = o.coupleCount ?? 1;
  if (!Number.isInteger(coupleCount) || coupleCount < 1 || coupleCount > 4) throw new AnalysisError('BAD_OPTION', `coupleCount must be an integer from 1 to 4, got ${String(coupleCount)}`);
  const asked = [...new Set(o.free ?? DEFAULT_FREE[mechanism])];
  for (const name of asked) {
    if (name !== 'background' && !(name in PARAMETER_SPECS)) throw new AnalysisError('BAD_OPTION', `free: unknown parameter "${String(name)}"`);
  }
  const confounded = mechanism === 'E' && asked.includes('diffusionRatio') ? ['diffusionRatio' as const] : [];
  const free = asked.filter((p) => !(confounded as FitParameter[]).includes(p));
  const cycle = o.cycle ?? 1;
  if (!Number.isInteger(cycle) || cycle < 1) throw new AnalysisError('BAD_OPTION', `cycle must be a whole number ≥ 1, got ${String(cycle)}`);
  if (o.windowV) {
    o.windowV.forEach((x, i) => assertFiniteInRange(`windowV[${i}]`, x, -10, 10));
    if (o.windowV[0] === o.windowV[1]) throw new AnalysisError('BAD_OPTION', `windowV must span a range, got ${o.windowV[0]} … ${o.windowV[1]} V`);
  }
  const electronCounts = Array.from({ length: coupleCount }, (_, j) => o.electronCounts?.[j] ?? cell.electronCount);
  electronCounts.forEach((n, j) => {
    if (!Number.isInteger(n) || n < 1 || n > 6) throw new AnalysisError('BAD_OPTION', `electronCounts[${j}] must be an integer from 1 to 6, got ${String(n)}`);
  });
  const maxIterations = o.maxIterations ?? 60;
  assertFiniteInRange('maxIterations', maxIterations, 1, 10000);
  return {
    records, cell, mechanism, coupleCount, free, confounded, background: free.includes('background'), cycle, windowV: o.windowV, electronCounts, maxIterations,
    initialSpecies: o.initialSpecies ?? (records[0]!.segments[0]?.direction === 'positive' ? 'R' : 'O'), profile: o.profile ?? true,
  };
}

function checkCell(cell: FitCell, mechanism: FitMechanism): void {
  if (!cell) throw new AnalysisError('BAD_OPTION', 'a fit needs the cell: area, concentration, n and temperature');
  assertFiniteInRange('cell.areaCm2', cell.areaCm2, 1e-12, 1e4);
  if (mechanism !== 'surface') assertFiniteInRange('cell.concentrationMolPerCm3', cell.concentrationMolPerCm3, 1e-15, 1e-1);
  assertFiniteInRange('cell.temperatureK', cell.temperatureK, 150, 700);
  if (!Number.isInteger(cell.electronCount) || cell.electronCount < 1 || cell.electronCount > 6) {
    throw new AnalysisError('BAD_OPTION', `cell.electronCount must be an integer from 1 to 6, got ${String(cell.electronCount)}`);
  }
}
