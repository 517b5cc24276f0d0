/**
 * One analysis run: every file of a scan-rate series through the per-trace analysis, then the
 * series analysis, with the potentials put on the requested reference scale and corrected for
 * iR drop, and a record of how the numbers were made.
 * In: RunInput per file (a Voltammogram in IUPAC convention with its name, scan rate, metadata
 *   reference and provenance) and AnalyzeRunOptions (units in the names). Out: AnalyzeRunResult.
 * Order of operations (design): iR correction E − i·Ru on the measured scale, then a constant
 *   shift to the output scale, then peak analysis; so every potential of the result (Ep, E½)
 *   is on the output scale and ΔEp is free of the ohmic contribution.
 * Sources are named in the methods called; this file only arranges them.
 */
import { STANDARD_TEMPERATURE_K } from '../constants';
import { iRCorrect } from '../conventions';
import { AnalysisError, assertFiniteInRange } from '../errors';
import { chargingCurrentGap, doubleLayerCapacitance } from '../series';
import type { DoubleLayerCapacitanceResult } from '../series';
import type { Voltammogram } from '../types';
import { analyzeSeries } from './analyzeSeries';
import { analyzeVoltammogram } from './analyzeVoltammogram';
import { RUN_METHODS } from './runMethods';
import { describeReferences, offsetFor, planReferences, settleInternalStandard } from './runReference';
import type { AnalyzeRunOptions, AnalyzeRunResult, RunFileResult, RunInput, RunWarning } from './runTypes';

interface Prepared {
  input: RunInput;
  scanRateVPerS: number;
  /** Potential after iR correction, on the measured scale. */
  potentialV: Float64Array;
}

function prepare(input: RunInput, options: AnalyzeRunOptions): Prepared {
  const v = input.voltammogram;
  const scanRateVPerS = options.scanRateVPerS ?? v.scanRateVPerS;
  if (scanRateVPerS === null || scanRateVPerS === undefined) {
    throw new AnalysisError('BAD_OPTION', `${input.fileName}: no scan rate (no time column, none in the metadata or file name); give it (--scan-rate)`);
  }
  assertFiniteInRange(`scan rate of ${input.fileName}`, scanRateVPerS, 1e-9);
  const ru = options.ruOhm ?? 0;
  return { input, scanRateVPerS, potentialV: ru > 0 ? iRCorrect(v.potentialV, v.currentA, ru) : v.potentialV };
}

function analyzeShifted(p: Prepared, offsetV: number, options: AnalyzeRunOptions) {
  const potentialV = offsetV === 0 ? p.potentialV : p.potentialV.map((e) => e + offsetV);
  const voltammogram: Voltammogram = { ...p.input.voltammogram, potentialV };
  try {
    const analysis = analyzeVoltammogram(voltammogram, {
      ...options.perTrace,
      electronCount: options.electronCount ?? 1,
      temperatureK: options.temperatureK ?? STANDARD_TEMPERATURE_K,
      scanRateVPerS: p.scanRateVPerS,
    });
    return { voltammogram, analysis };
  } catch (err) {
    // Name the file: the per-trace message alone does not say which of the series failed.
    if (err instanceof AnalysisError) throw new AnalysisError(err.code, `${p.input.fileName}: ${err.message}`);
    throw err;
  }
}

function capacitanceOf(files: RunFileResult[], options: AnalyzeRunOptions, warnings: RunWarning[]): DoubleLayerCapacitanceResult | null {
  const series = files.filter((f) => f.role === 'series' && f.chargingGapA !== null);
  if (options.capacitancePotentialV == null || !series.length) return null;
  if (options.areaCm2 == null) {
    warnings.push({ code: 'CAPACITANCE', message: 'double-layer capacitance needs the electrode area (--area)' });
    return null;
  }
  const gaps = series.map((f) => Math.max(0, f.chargingGapA as number));
  return doubleLayerCapacitance({ scanRatesVPerS: series.map((f) => f.scanRateVPerS), gapCurrentsA: gaps, areaCm2: options.areaCm2 });
}

function gapOf(v: Voltammogram, options: AnalyzeRunOptions, fileName: string, warnings: RunWarning[]): number | null {
  if (options.capacitancePotentialV == null) return null;
  try {
    return chargingCurrentGap(v, options.capacitancePotentialV, options.cycle ?? 1);
  } catch (err) {
    if (!(err instanceof AnalysisError)) throw err;
    warnings.push({ code: 'CAPACITANCE', fileName, message: err.message });
    return null;
  }
}

function ohmicWarnings(prepared: Prepared[], ruOhm: number): RunWarning[] {
  if (!(ruOhm > 0)) return [];
  return prepared.flatMap((p) => {
    let maxDrop = 0;
    for (const i of p.input.voltammogram.currentA) maxDrop = Math.max(maxDrop, Math.abs(i * ruOhm));
    return [{ code: 'OHMIC' as const, fileName: p.input.fileName, message: `iR correction with Ru = ${ruOhm} Ω moves potentials by up to ${(maxDrop * 1000).toFixed(1)} mV` }];
  });
}

export function analyzeRun(inputs: RunInput[], options: AnalyzeRunOptions = {}): AnalyzeRunResult {
  if (!inputs.length) throw new AnalysisError('EMPTY_INPUT', 'an analysis run needs at least one file');
  if (options.ruOhm !== undefined) assertFiniteInRange('ruOhm', options.ruOhm, 0);
  const prepared = inputs.map((f) => prepare(f, options));
  const plan = planReferences(inputs, options);
  settleInternalStandard(plan, inputs, options, () => prepared.map((p) => analyzeShifted(p, 0, options).analysis));
  const warnings: RunWarning[] = [];
  const files: RunFileResult[] = prepared.map((p, i) => {
    const offsetV = offsetFor(plan, i);
    const { voltammogram, analysis } = analyzeShifted(p, offsetV, options);
    for (const w of analysis.warnings) warnings.push({ code: 'TRACE', fileName: p.input.fileName, message: w.message });
    for (const c of analysis.cycles) for (const w of c.warnings) warnings.push({ code: 'TRACE', fileName: p.input.fileName, message: `cycle ${c.index}: ${w.message}` });
    return {
      fileName: p.input.fileName, role: p.input.role ?? 'series', scanRateVPerS: p.scanRateVPerS,
      scanRateSource: options.scanRateVPerS != null ? 'option' : p.input.voltammogram.scanRateSource,
      inputReference: plan.inputs[i] ?? null, offsetV, analysis, chargingGapA: gapOf(voltammogram, options, p.input.fileName, warnings),
      provenance: p.input.provenance ?? {}, pointCount: voltammogram.potentialV.length,
    };
  });
  const seriesInputs = files.filter((f) => f.role === 'series').map((f) => ({ fileName: f.fileName, scanRateVPerS: f.scanRateVPerS, analysis: f.analysis }));
  if (!seriesInputs.length) throw new AnalysisError('EMPTY_INPUT', 'every file is marked as internal standard; nothing is left for the series');
  const series = analyzeSeries(seriesInputs, { ...options, cycle: options.cycle ?? 1 });
  for (const w of series.warnings) warnings.push({ code: 'SERIES', message: w.message });
  const refs = describeReferences(plan);
  warnings.push(...refs.warnings, ...ohmicWarnings(prepared, options.ruOhm ?? 0));
  return {
    files,
    series,
    capacitance: capacitanceOf(files, options, warnings),
    reference: { output: plan.output, basis: refs.basis },
    convention: options.outputConvention ?? 'iupac',
    warnings,
    provenance: {
      software: options.software ?? { name: 'halfwave', version: 'unknown' },
      methods: RUN_METHODS,
      options: resolvedOptionRecord(options),
    },
  };
}

function resolvedOptionRecord(o: AnalyzeRunOptions): Record<string, unknown> {
  return {
    electronCount: o.electronCount ?? 1, areaCm2: o.areaCm2 ?? null, concentrationMolPerCm3: o.concentrationMolPerCm3 ?? null,
    temperatureK: o.temperatureK ?? STANDARD_TEMPERATURE_K, alpha: o.alpha ?? null, transferElectronCount: o.transferElectronCount ?? 1,
    diffusionRatio: o.diffusionRatio ?? 1, diffusionCm2PerS: o.diffusionCm2PerS ?? null, scanRateVPerS: o.scanRateVPerS ?? null,
    inputReference: o.inputReference ?? null, outputReference: o.outputReference ?? null, pH: o.pH ?? null,
    internalStandard: o.internalStandard ?? null, ruOhm: o.ruOhm ?? 0, outputConvention: o.outputConvention ?? 'iupac',
    capacitancePotentialV: o.capacitancePotentialV ?? null, cycle: o.cycle ?? 1, matchToleranceV: o.matchToleranceV ?? 0.12,
    perTrace: o.perTrace ?? {},
  };
}
