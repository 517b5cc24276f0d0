/**
 * Results sheet of one scan-rate group, exactly as the workbench shows it: each file is run
 * through core/analysis/analyzeRun with its own peak windows and baseline choices (analyzeRun
 * takes one set of per-trace options, so each file gets its own run), then the group's series is
 * fitted over those per-file analyses, and io/exportResults writes CSV or JSON.
 * Windows are stored on the files' own scale; analyzeRun analyses on the output scale, so they
 * are shifted by the same offset first.
 */
import { analyzeRun } from '../core/analysis/analyzeRun';
import { analyzeSeries } from '../core/analysis/analyzeSeries';
import type { AnalyzeRunOptions, AnalyzeRunResult, RunInput } from '../core/analysis/runTypes';
import type { BaselineSpec } from '../core/baseline/baselineTypes';
import type { PeakWindow } from '../core/peaks/peakTypes';
import { resultsSheetCsv, resultsSheetJson, type ResultsSheetMeta } from '../io/exportResults';

export interface ExportFileSettings {
  peakWindows: PeakWindow[];
  baselines: BaselineSpec[];
}

export interface ExportRunInput {
  files: RunInput[];
  /** Per-file windows and baselines, on the files' own scale, parallel to `files`. */
  perFile: ExportFileSettings[];
  options: AnalyzeRunOptions;
  /** Files' scale → output scale (V), the same conversion analyzeRun applies. */
  offsetV: number;
  format: 'csv' | 'json';
  meta: ResultsSheetMeta;
}

function shiftWindows(s: ExportFileSettings, offsetV: number): ExportFileSettings {
  return {
    peakWindows: s.peakWindows.map((w) => ({ ...w, fromV: w.fromV + offsetV, toV: w.toV + offsetV })),
    baselines: s.baselines.map((b) => {
      const out: BaselineSpec = { ...b, fromV: b.fromV + offsetV, toV: b.toV + offsetV };
      if (b.anchorsV) out.anchorsV = [b.anchorsV[0] + offsetV, b.anchorsV[1] + offsetV];
      return out;
    }),
  };
}

export function buildRunResult(input: ExportRunInput): AnalyzeRunResult {
  const runs = input.files.map((file, i) => {
    const own = shiftWindows(input.perFile[i] ?? { peakWindows: [], baselines: [] }, input.offsetV);
    return analyzeRun([file], { ...input.options, perTrace: { ...input.options.perTrace, ...own } });
  });
  const files = runs.flatMap((r) => r.files);
  const first = runs[0];
  if (!first) throw new Error('nothing to export: the group has no analysed file');
  const series = analyzeSeries(files.map((f) => ({ fileName: f.fileName, scanRateVPerS: f.scanRateVPerS, analysis: f.analysis })), { ...input.options, cycle: input.options.cycle ?? 1 });
  const perFileWindows = Object.fromEntries(input.files.map((f, i) => [f.fileName, input.perFile[i] ?? null]));
  return {
    files,
    series,
    capacitance: null,
    reference: first.reference,
    convention: first.convention,
    // Each one-file run warns that it has a single scan rate; the group's own series replaces those.
    warnings: [...runs.flatMap((r) => r.warnings.filter((w) => w.code !== 'SERIES')), ...series.warnings.map((w) => ({ code: 'SERIES' as const, message: w.message }))],
    provenance: { ...first.provenance, options: { ...first.provenance.options, perFileWindowsOnFileScale: perFileWindows } },
  };
}

export function exportRun(input: ExportRunInput): string {
  const result = buildRunResult(input);
  return input.format === 'csv' ? resultsSheetCsv(result, input.meta) : resultsSheetJson(result, input.meta);
}
