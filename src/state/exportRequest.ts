/**
 * Builds the worker's export request for one scan-rate group from the store: each file's columns,
 * provenance (size, SHA-256, detected layout, import warnings) and own windows, plus the run
 * options from the series' cell and the Method settings and the display choices (scale, sign convention).
 */
import type { AnalyzeRunOptions, RunInput } from '../core/analysis/runTypes';
import type { ImportDetection } from '../io/types';
import type { ExportRunInput } from '../worker/exportRun';
import { displayScale } from './display';
import { resolveCell } from './seriesCell';
import { celsiusToKelvin, emptyFileSettings, millimolarToMolPerCm3 } from './settings';
import type { HalfwaveState } from './types';

export const SOFTWARE = { name: 'Halfwave', version: '0.1.0' } as const;

const DELIMITER_WORDS: Record<string, string> = { ',': 'comma', ';': 'semicolon', '\t': 'tab', whitespace: 'whitespace' };

/** "comma-separated, decimal point, header on line 3, rows 4–2204, E in V, I in µA". */
export function describeLayout(d: ImportDetection): string {
  return [
    `${DELIMITER_WORDS[d.delimiter.value] ?? d.delimiter.value}-separated`,
    `decimal ${d.decimalMark.value === '.' ? 'point' : 'comma'}`,
    d.headerLine.value === null ? 'no header' : `header on line ${d.headerLine.value}`,
    `rows ${d.tableLines.first}–${d.tableLines.last}`,
    `E in ${d.potentialUnit.value}`,
    `I in ${d.currentUnit.value}`,
    `current sign ${d.currentConvention.value}`,
  ].join(', ');
}

/** Run options of one group: its own cell (n, A, C, T, α, Ru, recording scale), the global display scale. */
export function runOptions(state: HalfwaveState, group: string): AnalyzeRunOptions {
  const c = resolveCell(state, group).cell;
  const r = { ...c, displayReference: state.settings.reference.displayReference };
  const options: AnalyzeRunOptions = {
    electronCount: c.electronCount, areaCm2: c.areaCm2, concentrationMolPerCm3: millimolarToMolPerCm3(c.concentrationMM),
    temperatureK: celsiusToKelvin(c.temperatureC), alpha: c.alpha, ruOhm: c.resistanceOhm, cycle: 1,
    inputReference: r.fileReference, outputReference: r.displayReference, pH: r.pH, outputConvention: state.convention,
    perTrace: {
      smoothing: state.settings.smoothing, forwardBaseline: state.settings.forwardBaseline,
      returnBaseline: state.settings.returnBaseline, minSignalToNoise: state.settings.minSignalToNoise, currentConvention: 'iupac',
    },
    software: { ...SOFTWARE },
  };
  if (r.ferroceneHalfWaveV !== null && r.fileReference !== 'Fc') {
    options.internalStandard = { kind: 'value', eHalfV: r.ferroceneHalfWaveV, reference: r.fileReference, origin: 'entered by the user' };
  }
  return options;
}

export function exportRequest(state: HalfwaveState, group: string, format: 'csv' | 'json', createdAt: string): ExportRunInput {
  const ids = state.fileOrder.filter((id) => state.files[id]?.group === group && state.files[id]?.measurement);
  const files: RunInput[] = [];
  for (const id of ids) {
    const f = state.files[id];
    const m = f?.measurement;
    if (!f || !m) continue;
    files.push({
      fileName: f.fileName,
      voltammogram: { potentialV: m.potentialV, currentA: m.currentA, timeS: m.timeS, segments: m.segments, cycles: m.cycles, scanRateVPerS: m.scanRateVPerS, scanRateSource: m.scanRateSource },
      referenceElectrode: m.referenceElectrode,
      provenance: { sizeBytes: f.sizeBytes, sha256: f.sha256, layout: describeLayout(m.detection), importWarnings: f.warnings.map((w) => w.message) },
    });
  }
  return {
    files,
    perFile: ids.map((id) => state.fileSettings[id] ?? emptyFileSettings),
    options: runOptions(state, group),
    offsetV: displayScale(state.settings, resolveCell(state, group).cell).offsetV,
    format,
    meta: { createdAt, command: `Halfwave workbench export of series "${group}"` },
  };
}
