/**
 * The results sheet of a run: core/analysis/analyzeRun over the run input the store built
 * (state/runInput.ts, the same input the screen analyses file by file), then io/exportResults
 * writes it as CSV or JSON. Nothing is recomputed differently here.
 */
import { analyzeRun } from '../core/analysis/analyzeRun';
import type { RunInput } from '../core/analysis/runTypes';
import { resultsSheetCsv, resultsSheetJson, type ResultsSheetMeta } from '../io/exportResults';

export interface ExportRunInput {
  run: RunInput;
  format: 'csv' | 'json';
  meta: ResultsSheetMeta;
}

export function exportRun(input: ExportRunInput): string {
  const result = analyzeRun(input.run);
  return input.format === 'csv' ? resultsSheetCsv(result, input.meta) : resultsSheetJson(result, input.meta);
}
