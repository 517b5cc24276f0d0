/**
 * One scan-rate series of an analysis run, over its files' results: the series analysis
 * (analyzeSeries.ts) with the series' cell, the double-layer capacitance from the charging gaps
 * when a featureless potential was given (seriesCapacitance.ts), and the basis of the reference scales used.
 * Sources are named in the methods called (series/doubleLayerCapacitance.ts, analyzeSeries.ts).
 */
import { AnalysisError } from '../errors';
import { combinedDiffusionInterval } from '../series';
import type { ReferenceId } from '../reference';
import type { CurrentKind } from '../types';
import { analyzeResolvedSeries } from './analyzeSeries';
import { defaultsUsed } from './defaultsUsed';
import { describeSeriesReferences } from './runReference';
import { seriesCapacitance } from './seriesCapacitance';
import type { ResolvedCell, ResolvedMethod, RunFileResult, RunSeriesResult, RunWarning } from './runTypes';
import type { SeriesAnalysis } from './seriesTypes';

/** D's interval with the stated uncertainty of A and C (GUM; combinedDiffusionInterval.ts), on each couple that has D. */
function withCombinedIntervals(analysis: SeriesAnalysis, cell: Pick<ResolvedCell, 'areaRelativeUncertainty' | 'concentrationRelativeUncertainty'>): void {
  for (const c of analysis.couples) {
    const d = c.diffusion;
    if (!d) continue;
    d.combinedIntervalCm2PerS = combinedDiffusionInterval({
      diffusionCm2PerS: d.diffusionCm2PerS, slopeRelativeStdError: d.slopeRelativeStdError, slopeDegreesOfFreedom: d.slopeDegreesOfFreedom,
      areaRelativeUncertainty: cell.areaRelativeUncertainty, concentrationRelativeUncertainty: cell.concentrationRelativeUncertainty,
    });
  }
}

/**
 * E°′ on the reported scale. One stated on the recording scale moves by the files' own offset
 * (the one their potentials moved by), which must then be the same for every file of the series;
 * when it is not, E°′ is left unused and the run says why.
 */
function reportedFormalPotential(key: string, cell: Pick<ResolvedCell, 'formalPotentialV' | 'formalPotentialScale'>, members: RunFileResult[], warnings: RunWarning[]): number | null {
  if (cell.formalPotentialV === null || cell.formalPotentialScale === 'reported') return cell.formalPotentialV;
  const offsets = members.map((f) => f.reference.offsetV);
  const first = offsets[0] ?? 0;
  if (offsets.some((o) => Math.abs(o - first) > 1e-9)) {
    warnings.push({ code: 'SERIES', series: key, message: 'E°′ was given on the recording scale, but the files of this series were recorded on different scales: E°′ is not used; give it on the reported scale instead' });
    return null;
  }
  return cell.formalPotentialV + first;
}

/**
 * The cell the series' numbers use. Files of current densities (A/cm², no area stated) make the
 * series per cm² of electrode: area 1 cm² in Randles–Ševčík, Γ and Cd, so the cell's area drops out.
 * A series that mixes currents and densities cannot be given one area, and is refused.
 */
function perAreaCell(key: string, cell: ResolvedCell, members: RunFileResult[], warnings: RunWarning[]): { cell: ResolvedCell; kind: CurrentKind } {
  const densities = members.filter((f) => f.currentKind === 'density');
  if (!densities.length) return { cell, kind: 'current' };
  if (densities.length < members.length) {
    const currents = members.filter((f) => f.currentKind !== 'density').map((f) => f.fileName);
    throw new AnalysisError('BAD_OPTION', `series "${key}" mixes current densities (A/cm²: ${densities.map((f) => f.fileName).join(', ')}) with currents (A: ${currents.join(', ')}); put them in separate series`);
  }
  warnings.push({ code: 'SERIES', series: key, message: 'the files hold current densities (A/cm²) and state no electrode area: D, Γ and Cd are per cm² of electrode, peak currents are in A/cm², and the cell\'s area is not used' });
  return { cell: { ...cell, areaCm2: 1, origins: { ...cell.origins, areaCm2: 'header' } }, kind: 'density' };
}

/**
 * The series' Ru against its currents: in Ω for currents; for densities (A/cm²) Ru·A (Ω·cm², as
 * analyzeRunFile corrects those files' potentials), or 0 when no area is known (no drop then).
 */
function seriesRuOhm(kind: CurrentKind, given: ResolvedCell): number {
  if (kind !== 'density') return given.ruOhm;
  return given.areaCm2 !== null ? given.ruOhm * given.areaCm2 : 0;
}

/** `files`: the results of the series' files (internal-standard files are left out here). */
export function analyzeRunSeries(key: string, given: ResolvedCell, method: ResolvedMethod, output: ReferenceId | null, files: RunFileResult[]): RunSeriesResult {
  const members = files.filter((f) => f.role === 'series');
  if (!members.length) throw new AnalysisError('EMPTY_INPUT', `series "${key}": every file is an internal standard or a blank; nothing is left for the series`);
  const early: RunWarning[] = [];
  const perArea = perAreaCell(key, given, members, early);
  const cell = perArea.cell;
  const analysis = analyzeResolvedSeries(
    members.map((f) => ({ fileName: f.fileName, scanRateVPerS: f.scanRateVPerS, analysis: f.analysis })),
    {
      electronCount: cell.electronCount, areaCm2: cell.areaCm2, concentrationMolPerCm3: cell.concentrationMolPerCm3, temperatureK: cell.temperatureK,
      alpha: cell.alpha, transferElectronCount: cell.transferElectronCount, transferElectronCountGiven: cell.transferElectronCountGiven, diffusionRatio: cell.diffusionRatio, diffusionCm2PerS: cell.diffusionCm2PerS,
      formalPotentialV: reportedFormalPotential(key, cell, members, early), ruOhm: seriesRuOhm(perArea.kind, given), cycle: method.seriesCycle, matchToleranceV: method.matchToleranceV, psiMethod: method.psiMethod,
    },
  );
  // An area from a density's slope would be a ratio to 1 cm², not an area.
  if (perArea.kind === 'density') for (const c of analysis.couples) c.electroactiveAreaCm2 = null;
  withCombinedIntervals(analysis, cell);
  const warnings: RunWarning[] = [...early, ...analysis.warnings.map((w) => ({ code: 'SERIES' as const, series: key, message: w.message }))];
  const refs = describeSeriesReferences(members, output, cell.temperatureK);
  warnings.push(...refs.warnings.map((w) => ({ ...w, series: key })));
  const capacitance = seriesCapacitance(members, cell, analysis, warnings, key);
  const defaults = defaultsUsed(key, cell, analysis);
  warnings.push(...defaults.warnings);
  return { key, fileNames: members.map((f) => f.fileName), cell: given, currentKind: perArea.kind, analysis, capacitance, referenceBasis: refs.basis, defaultsUsed: defaults.used, warnings };
}
