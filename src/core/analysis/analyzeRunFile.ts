/**
 * One file of an analysis run: iR correction E − i·Ru on the recording scale, a constant shift to
 * the reported scale, then the per-trace analysis with the file's own peak windows and baselines
 * (stored on the recording scale, so shifted by the same offset). Every potential of the result
 * is on the reported scale, and ΔEp is free of the ohmic contribution the user gave.
 * Sources are named in the methods called (conventions/iRCorrect.ts, analyzeVoltammogram.ts).
 */
import { iRCorrect } from '../conventions';
import { hampelSpikes } from '../peaks/hampelSpikes';
import type { BaselineSpec } from '../baseline/baselineTypes';
import { AnalysisError } from '../errors';
import { subtractBlank } from '../background';
import { chargingGapWindow } from '../series';
import type { ChargingGapWindow } from '../series';
import type { Voltammogram } from '../types';
import { analyzeResolvedVoltammogram, type TraceOptions } from './analyzeVoltammogram';
import type { ResolvedRunFile } from './resolveRun';
import type { FileReference, ResolvedCell, ResolvedMethod, RunFileResult, RunWarning } from './runTypes';
import { CAPACITANCE_WINDOW_HALF_WIDTH_V } from './seriesCapacitance';

function shiftSpec(b: BaselineSpec, offsetV: number): BaselineSpec {
  const out: BaselineSpec = { ...b, fromV: b.fromV + offsetV, toV: b.toV + offsetV };
  if (b.anchorsV) out.anchorsV = [b.anchorsV[0] + offsetV, b.anchorsV[1] + offsetV];
  return out;
}

/** The trace options of one file: the method, its series' n and T, its own windows on the reported scale. */
export function traceOptionsOf(file: ResolvedRunFile, cell: ResolvedCell, method: ResolvedMethod, offsetV: number): TraceOptions {
  return {
    temperatureK: cell.temperatureK, electronCount: cell.electronCount, smoothing: method.smoothing, currentConvention: 'iupac',
    peakWindows: file.peakWindows.map((w) => ({ ...w, fromV: w.fromV + offsetV, toV: w.toV + offsetV })),
    baselines: file.baselines.map((b) => shiftSpec(b, offsetV)),
    forwardBaseline: method.forwardBaseline, returnBaseline: method.returnBaseline, minSignalToNoise: method.minSignalToNoise,
    minProminenceA: method.minProminenceA, minRelativeProminence: method.minRelativeProminence, maxDeltaEpV: method.maxDeltaEpV,
    scanRateVPerS: file.scanRateVPerS, cycles: file.input.voltammogram.cycles.map((c) => c.index), spikeFilter: method.spikeFilter,
  };
}

/**
 * The potential column as analysed: iR-corrected, then shifted; the recorded column when neither
 * applies. A spike's current is not the current through the cell, so the correction uses the
 * current with the spikes replaced (the same test the trace analysis runs).
 */
export function analysedPotential(v: Voltammogram, ruOhm: number, offsetV: number, spikeFilter: 'hampel' | 'off' = 'hampel'): Float64Array | null {
  if (!(ruOhm > 0) && offsetV === 0) return null;
  const current = ruOhm > 0 && spikeFilter === 'hampel' ? hampelSpikes(v.currentA, v.segments).cleanedA : v.currentA;
  const corrected = ruOhm > 0 ? iRCorrect(v.potentialV, current, ruOhm) : v.potentialV;
  return offsetV === 0 ? corrected : corrected.map((e) => e + offsetV);
}

/**
 * The resistance that multiplies this file's currentA to give the ohmic drop (V). A file of
 * current densities (A/cm²) needs the electrode area for it: Ru·A (Ω·cm²) when the cell has an
 * area, else no correction, with a warning.
 */
function ohmicFactor(file: ResolvedRunFile, cell: Pick<ResolvedCell, 'ruOhm' | 'areaCm2'>, warnings: RunWarning[]): number {
  if (!(cell.ruOhm > 0) || (file.input.voltammogram.currentKind ?? 'current') === 'current') return cell.ruOhm;
  const fileName = file.input.fileName;
  if (cell.areaCm2 === null) {
    warnings.push({ code: 'TRACE', fileName, message: `the file holds current densities and no electrode area is known: Ru = ${cell.ruOhm} Ω cannot give the ohmic drop, so the potentials are not iR-corrected` });
    return 0;
  }
  warnings.push({ code: 'OHMIC', fileName, message: `the file holds current densities: the ohmic drop is j·A·Ru with the cell's area A = ${cell.areaCm2} cm²` });
  return cell.ruOhm * cell.areaCm2;
}

function traceWarnings(file: ResolvedRunFile, result: RunFileResult['analysis'], ruOhm: number): RunWarning[] {
  const fileName = file.input.fileName;
  const out: RunWarning[] = result.warnings.map((w) => ({ code: 'TRACE', fileName, message: w.message }));
  for (const c of result.cycles) for (const w of c.warnings) out.push({ code: 'TRACE', fileName, message: `cycle ${c.index}: ${w.message}` });
  if (ruOhm > 0) {
    let maxDrop = 0;
    const currentA = file.input.voltammogram.currentA;
    for (let k = 0; k < currentA.length; k++) maxDrop = Math.max(maxDrop, Math.abs((currentA[k] as number) * ruOhm));
    out.push({ code: 'OHMIC', fileName, message: `iR correction moves potentials by up to ${(maxDrop * 1000).toFixed(1)} mV` });
  }
  return out;
}

/** The file's current less its blank (on the recorded potentials), with what to say about the match. */
function withoutBlank(file: ResolvedRunFile, warnings: RunWarning[]): { currentA: Float64Array; blank: RunFileResult['blank'] } {
  const v = file.input.voltammogram;
  const b = file.blank;
  if (!b) return { currentA: v.currentA, blank: null };
  const fileName = file.input.fileName;
  if ((v.currentKind ?? 'current') !== (b.voltammogram.currentKind ?? 'current')) {
    throw new AnalysisError('BAD_OPTION', `${fileName}: its currents are ${v.currentKind === 'density' ? 'densities (A/cm²)' : 'currents (A)'} but the blank ${b.fileName} holds ${b.voltammogram.currentKind === 'density' ? 'densities (A/cm²)' : 'currents (A)'}; one cannot be subtracted from the other`);
  }
  const r = subtractBlank(v, b.voltammogram);
  if (r.pointsOutsideBlank > 0) warnings.push({ code: 'BLANK', fileName, message: `${r.pointsOutsideBlank} of ${v.potentialV.length} points lie outside the potential range of the blank ${b.fileName}; its end value was used there` });
  // Charging current scales with v: a blank at another rate removes the wrong background (5 %: common practice, no source).
  if (Math.abs(r.scanRateRatio - 1) > 0.05) warnings.push({ code: 'BLANK', fileName, message: `the blank ${b.fileName} was recorded at ${(1 / r.scanRateRatio).toPrecision(3)}× this file's scan rate; its charging current does not match` });
  return { currentA: r.currentA, blank: { fileName: b.fileName, sha256: b.provenance?.sha256 ?? null, pointsOutside: r.pointsOutsideBlank, scanRateRatio: r.scanRateRatio } };
}

export function analyzeRunFile(file: ResolvedRunFile, cell: ResolvedCell, method: ResolvedMethod, reference: FileReference): RunFileResult {
  const v = file.input.voltammogram;
  const blankWarnings: RunWarning[] = [];
  const { currentA, blank } = withoutBlank(file, blankWarnings);
  const ruOhm = ohmicFactor(file, cell, blankWarnings);
  // The ohmic drop follows the whole current that flowed; the peaks are read on the current less the blank.
  const potentialV = analysedPotential(v, ruOhm, reference.offsetV, method.spikeFilter);
  const analysed: Voltammogram = { ...v, currentA, ...(potentialV ? { potentialV } : {}) };
  const fileName = file.input.fileName;
  let analysis;
  try {
    analysis = analyzeResolvedVoltammogram(analysed, traceOptionsOf(file, cell, method, reference.offsetV));
  } catch (err) {
    // Name the file: the per-trace message alone does not say which of the series failed.
    if (err instanceof AnalysisError) throw new AnalysisError(err.code, `${fileName}: ${err.message}`);
    throw err;
  }
  const warnings = [...blankWarnings, ...traceWarnings(file, analysis, ruOhm)];
  let chargingGapA: number | null = null;
  let chargingGapWindowRead: ChargingGapWindow | null = null;
  if (cell.capacitancePotentialV !== null) {
    try {
      chargingGapWindowRead = chargingGapWindow(analysed, cell.capacitancePotentialV, method.seriesCycle, CAPACITANCE_WINDOW_HALF_WIDTH_V);
      chargingGapA = chargingGapWindowRead.gapA[0]!;
    } catch (err) {
      if (!(err instanceof AnalysisError)) throw err;
      warnings.push({ code: 'CAPACITANCE', fileName, message: err.message });
    }
  }
  return {
    fileName, series: file.series, role: file.role, scanRateVPerS: file.scanRateVPerS, scanRateSource: file.scanRateSource,
    reference, analysis, analysedPotentialV: potentialV, chargingGapA, chargingGapWindow: chargingGapWindowRead, provenance: file.input.provenance ?? {}, pointCount: v.potentialV.length, currentKind: v.currentKind ?? 'current', blank, warnings,
  };
}
