/**
 * The results sheet of a run: core/analysis/analyzeRun over the run input the store built
 * (state/runInput.ts, the same input the screen analyses file by file), then io/exportResults
 * writes it as CSV or JSON, with the series' whole-curve fits beside. Nothing is recomputed
 * differently here.
 */
import { analyzeRun } from '../core/analysis/analyzeRun';
import type { RunInput } from '../core/analysis/runTypes';
import { resultsSheetCsv, resultsSheetJson, type ResultsSheetMeta } from '../io/exportResults';
import type { SeriesFit } from '../io/fitSheet';

export interface ExportRunInput {
  run: RunInput;
  format: 'csv' | 'json';
  meta: ResultsSheetMeta;
  /** Whole-curve fits of the exported series, as the fit panel made them (already computed: written, not redone). */
  fits?: SeriesFit[];
}

export function exportRun(input: ExportRunInput): string {
  const result = analyzeRun(input.run);
  const fits = input.fits ?? [];
  return input.format === 'csv' ? resultsSheetCsv(result, input.meta, fits) : resultsSheetJson(result, input.meta, fits);
}
