/**
 * Whole-curve fits in the results sheet. JSON: the `fits` key of the run contract, one entry per
 * fitted series: the series, the potential scale, the free parameters, the comparison asked for,
 * the cell, then the fields of `fit --json` (fitContract.ts: mechanism, params, stderr, bounds,
 * status, couples, correlation, rms, iterations, converged, notes, window, criteria AIC/BIC,
 * files, modelChoice with the recommendation). CSV: a readable
 * 'fit' table (one row per series × parameter, fitTables.ts, as the fit panel shows it) and a
 * readable 'fit models' table (one row per fit: model, window, residual, criteria, advice), then
 * raw tables in SI units at full precision: 'raw fit', 'raw fit models', 'raw fit correlations'.
 * Potentials (E°′, window) are on the scale each fit names, which is the sheet's display scale.
 */
import type { FitCell, FitComparisonChoice, FitMechanism, FitParameter, FitResult } from '../core/fit';
import { fitContract, shortLabel, shortName, type ComparisonSummary } from './fitContract';
import { fitParameterRows, strongestCorrelations } from './fitTables';
import type { TextTable } from './notebookTables';

/** One finished fit of a series, as the store hands it to the results sheet. */
export interface SeriesFit {
  series: string;
  fileNames: string[];
  /** The scale E°′ and the window are on, and its offset from the files' recording scale (V). */
  scale: { name: string; offsetV: number };
  setup: { mechanism: FitMechanism; coupleCount: number; free: FitParameter[]; compare: FitComparisonChoice; cycle?: number };
  cell: FitCell;
  result: FitResult;
  comparison: ComparisonSummary | null;
}

/** The series, the scale, what was free and compared, the cell (cm², mol/cm³, n, K), then the `fit --json` fields. */
export function fitSheetEntry(f: SeriesFit) {
  return {
    series: f.series,
    potentialScale: f.scale.name,
    free: f.setup.free.map(shortName),
    compared: f.setup.compare,
    cycle: f.setup.cycle ?? 1,
    cell: { area: f.cell.areaCm2, conc: f.cell.concentrationMolPerCm3, n: f.cell.electronCount, T: f.cell.temperatureK },
    ...fitContract(f.result, f.fileNames, f.comparison),
  };
}

const modelName = (f: SeriesFit) => `${f.setup.mechanism}, ${f.setup.coupleCount} couple${f.setup.coupleCount > 1 ? 's' : ''}${(f.setup.cycle ?? 1) > 1 ? `, cycle ${f.setup.cycle}` : ''}`;
const windowText = (r: FitResult) => `${Math.min(...r.windowV).toFixed(3)} … ${Math.max(...r.windowV).toFixed(3)}`;

export function fitTable(fits: readonly SeriesFit[]): TextTable {
  return {
    name: 'fit',
    header: ['series', 'model', 'couple', 'parameter', 'value', 'unit', 'standard error', '95 % interval', 'reading', 'start'],
    rows: fits.flatMap((f) => fitParameterRows(f.result, f.scale.name).map((p) => [
      f.series, modelName(f), p.couple === null ? 'all' : String(p.couple + 1), p.symbol, p.value, p.unit, p.error, p.interval, p.reading, p.start,
    ])),
  };
}

export function fitModelsTable(fits: readonly SeriesFit[]): TextTable {
  return {
    name: 'fit models',
    header: ['series', 'model', 'files', 'window / V', 'scale', 'points', 'rms residual / nA', 'iterations', 'converged', 'AIC', 'BIC', 'parameters fitted',
      'strongest correlations', 'model choice'],
    rows: fits.map((f) => {
      const r = f.result;
      const pairs = strongestCorrelations(r, 2).map((c) => `${c.a}–${c.b} ${c.rho.toFixed(2)}`).join('; ');
      return [f.series, modelName(f), String(f.fileNames.length), windowText(r), f.scale.name, String(r.pointCount), (r.rmsA * 1e9).toPrecision(3),
        String(r.iterations), r.converged ? 'yes' : `no (${r.stopReason})`, r.criteria.aic.toFixed(1), r.criteria.bic.toFixed(1), String(r.criteria.parameterCount),
        pairs, f.comparison?.recommendation ?? 'not compared'];
    }),
  };
}

type Cell = string | number | boolean | null | undefined;

/** Raw tables: header row then rows of cells, for exportResults' CSV writer. */
export function rawFitTables(fits: readonly SeriesFit[]): { name: string; rows: Cell[][] }[] {
  const params: Cell[][] = [['series', 'mechanism', 'couple', 'parameter', 'unit', 'value', 'standard_error', 'ci95_low', 'ci95_high', 'interval_method', 'status', 'free', 'at_search_limit', 'start']];
  const models: Cell[][] = [['series', 'mechanism', 'couples', 'files', 'scale', 'scale_offset_V', 'window_low_V', 'window_high_V', 'points', 'rms_A', 'residual_std_A', 'degrees_of_freedom',
    'iterations', 'evaluations', 'converged', 'stop_reason', 'aic', 'bic', 'parameter_count', 'compared', 'preferred', 'evidence', 'recommendation', 'alternatives']];
  const correlations: Cell[][] = [['series', 'parameter_a', 'parameter_b', 'correlation']];
  for (const f of fits) {
    const r = f.result;
    for (const e of r.parameters) {
      const start = e.couple === null ? r.start.shared : r.start.couples[e.couple];
      params.push([f.series, r.mechanism, e.couple === null ? 'all' : e.couple + 1, shortName(e.parameter), UNIT_SI[e.parameter], e.value, e.standardError, e.interval?.[0], e.interval?.[1],
        e.intervalMethod, e.status, e.free, e.atSearchLimit, start ? (start as unknown as Record<string, number>)[e.parameter] : null]);
    }
    const c = f.comparison;
    models.push([f.series, r.mechanism, r.values.couples.length, f.fileNames.join('; '), f.scale.name, f.scale.offsetV, Math.min(...r.windowV), Math.max(...r.windowV), r.pointCount, r.rmsA,
      r.residualStdA, r.degreesOfFreedom, r.iterations, r.evaluations, r.converged, r.stopReason, r.criteria.aic, r.criteria.bic, r.criteria.parameterCount, f.setup.compare,
      c?.preferred, c?.evidence, c?.recommendation, c?.candidates.map((k) => `${k.label}: BIC ${k.bic} (Δ ${k.deltaBic}), AIC ${k.aic} (Δ ${k.deltaAic})`).join('; ')]);
    const { labels, matrix } = r.correlation;
    labels.forEach((a, i) => labels.forEach((b, j) => j < i && correlations.push([f.series, shortLabel(b), shortLabel(a), matrix[i]?.[j]])));
  }
  return [{ name: 'raw fit', rows: params }, { name: 'raw fit models', rows: models }, { name: 'raw fit correlations', rows: correlations }];
}

const UNIT_SI: Record<string, string> = {
  formalPotentialV: 'V', k0CmPerS: 'cm/s', alpha: '1', diffusionOCm2PerS: 'cm2/s', diffusionRatio: '1', followUpRatePerS: '1/s',
  coverageMolPerCm2: 'mol/cm2', surfaceRatePerS: '1/s', uncompensatedOhm: 'ohm', doubleLayerFPerCm2: 'F/cm2',
};
