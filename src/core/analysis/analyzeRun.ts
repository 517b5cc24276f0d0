/**
 * One analysis run over files grouped into scan-rate series: every file through the per-trace
 * analysis on the reported reference scale (analyzeRunFile.ts), then each series over its files
 * (analyzeRunSeries.ts), with a record of how the numbers were made.
 * The screen runs the same two pieces, file by file and series by series, through
 * `analyzeRunFiles` and `analyzeRunSeriesStep` below; the results sheet and the command line run
 * `analyzeRun`. All three read the same RunInput, resolved once (resolveRun.ts).
 * In: RunInput (runTypes.ts). Out: AnalyzeRunResult.
 * Order of operations (design): iR correction on the recording scale, then a constant shift to the
 * reported scale, then peak analysis; so every potential of the result is on the reported scale.
 */
import { analyzeRunFile } from './analyzeRunFile';
import { analyzeRunSeries } from './analyzeRunSeries';
import { resolveCell, resolveMethod, resolveReport, resolveRun, type ResolvedRun } from './resolveRun';
import { conversionContextOf, fileReference, seriesReferenceFacts } from './runReference';
import { settleInternalStandard } from './runInternalStandard';
import { RUN_METHODS } from './runMethods';
import type { AnalyzeRunResult, CellValues, MethodOptions, ReportOptions, RunFileResult, RunInput, RunSeriesResult } from './runTypes';

/** Every file's result, or only those named in `only` (the others serve as internal standards at most). */
function analyzeResolvedFiles(run: ResolvedRun, only?: ReadonlySet<string>): RunFileResult[] {
  const results: RunFileResult[] = [];
  const cellOf = new Map(run.series.flatMap((s) => s.fileIndices.map((i) => [i, s.cell] as const)));
  const recorded = { input: null, output: null, offsetV: 0, basis: [], typical: false, note: null };
  const firstPass = (i: number) => analyzeRunFile(run.files[i]!, cellOf.get(i)!, run.method, recorded).analysis;
  for (const s of run.series) {
    const context = conversionContextOf(s.cell, run.report);
    const facts = seriesReferenceFacts(run.files, s.fileIndices);
    settleInternalStandard(context, s.cell, run.files, s.fileIndices, firstPass, facts);
    for (const i of s.fileIndices) {
      const file = run.files[i]!;
      if (only && !only.has(file.input.fileName)) continue;
      results[i] = analyzeRunFile(file, s.cell, run.method, fileReference(file, s.cell, run.report, context, facts));
    }
  }
  return results.filter((r) => r !== undefined);
}

/**
 * The per-file part of a run: each file's result (or only the files named in `only`, in run
 * order), as analyzeRun computes it for the same input. The other files of the input are read
 * only when an internal standard is measured in them.
 */
export function analyzeRunFiles(input: RunInput, only?: string[]): RunFileResult[] {
  return analyzeResolvedFiles(resolveRun(input), only ? new Set(only) : undefined);
}

/** What the series step needs: the series' cell, the method, the report and its files' results. */
export interface RunSeriesStepInput {
  key: string;
  cell?: CellValues;
  method?: MethodOptions;
  report?: ReportOptions;
  files: RunFileResult[];
}

/** The per-series part of a run, over results from analyzeRunFiles with the same input. */
export function analyzeRunSeriesStep(input: RunSeriesStepInput): RunSeriesResult {
  const report = resolveReport(input.report);
  return analyzeRunSeries(input.key, resolveCell(input.cell), resolveMethod(input.method), report.outputReference, input.files);
}

export function analyzeRun(input: RunInput): AnalyzeRunResult {
  const run = resolveRun(input);
  const files = analyzeResolvedFiles(run);
  const series = run.series.map((s) => analyzeRunSeries(s.key, s.cell, run.method, run.report.outputReference, s.fileIndices.map((i) => files[i]!)));
  return {
    files,
    series,
    reference: { output: run.report.outputReference, basis: [...new Set(series.flatMap((s) => s.referenceBasis))] },
    convention: run.report.outputConvention,
    warnings: [...files.flatMap((f) => f.warnings), ...series.flatMap((s) => s.warnings)],
    provenance: { software: run.software, methods: RUN_METHODS, method: run.method, report: run.report },
  };
}

