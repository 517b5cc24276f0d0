/**
 * Checks a RunInput once, where the run starts, and completes it with the defaults: every option
 * is read here and nowhere else, so the functions the run calls take finished values.
 * Defaults are the ones documented on CellValues, MethodOptions and ReportOptions (runTypes.ts).
 */
import { STANDARD_TEMPERATURE_K } from '../constants';
import { AnalysisError, assertFiniteInRange } from '../errors';
import type { BaselineSpec } from '../baseline/baselineTypes';
import type { PeakWindow } from '../peaks/peakTypes';
import { resolveReferenceId } from '../reference';
import type { ReferenceId } from '../reference';
import type { ScanRateSource } from '../types';
import type { CellValues, MethodOptions, ReportOptions, ResolvedCell, ResolvedMethod, ResolvedReport, RunBlank, RunFile, RunFileRole, RunInput } from './runTypes';

/** Series key of files that name none. */
export const DEFAULT_SERIES_KEY = 'series 1';

export interface ResolvedRunFile {
  input: RunFile;
  series: string;
  role: RunFileRole;
  /** The blank this file subtracts, or null. */
  blank: RunBlank | null;
  scanRateVPerS: number;
  scanRateSource: ScanRateSource | null;
  peakWindows: PeakWindow[];
  baselines: BaselineSpec[];
}

export interface ResolvedRun {
  files: ResolvedRunFile[];
  /** Series in the order their first file appears. */
  series: Array<{ key: string; cell: ResolvedCell; fileIndices: number[] }>;
  method: ResolvedMethod;
  report: ResolvedReport;
  software: { name: string; version: string };
}

const optional = (name: string, v: number | null | undefined, min: number, max = Infinity): number | null => {
  if (v === null || v === undefined) return null;
  assertFiniteInRange(name, v, min, max);
  return v;
};

/** A relative standard uncertainty, 0…0.5; 2 % when not given (common practice, no source). */
const relative = (name: string, v: number | undefined): number => {
  const r = v ?? 0.02;
  assertFiniteInRange(name, r, 0, 0.5);
  return r;
};

export function resolveCell(c: CellValues = {}): ResolvedCell {
  const electronCount = c.electronCount ?? 1;
  if (!Number.isInteger(electronCount) || electronCount < 1 || electronCount > 12) {
    throw new AnalysisError('BAD_OPTION', `electron count n must be a whole number from 1 to 12, got ${electronCount}`);
  }
  const temperatureK = c.temperatureK ?? STANDARD_TEMPERATURE_K;
  assertFiniteInRange('temperature (K)', temperatureK, 200, 500);
  const std = c.internalStandard ?? null;
  if (std?.kind === 'value') assertFiniteInRange('internal-standard E½ (V)', std.eHalfV, -10, 10);
  if (std?.kind === 'value') resolveReferenceId(std.reference);
  if (std?.kind === 'measured') assertFiniteInRange('internal-standard search potential (V)', std.nearV, -10, 10);
  const ruOhm = c.ruOhm ?? 0;
  assertFiniteInRange('uncompensated resistance Ru (Ω)', ruOhm, 0);
  const transferElectronCount = c.transferElectronCount ?? 1;
  assertFiniteInRange('electrons in the rate-determining step nₐ', transferElectronCount, 0.5, 10);
  const diffusionRatio = c.diffusionRatio ?? 1;
  assertFiniteInRange('D_O/D_R', diffusionRatio, 1e-3, 1e3);
  return {
    electronCount,
    areaCm2: optional('electrode area (cm²)', c.areaCm2, Number.MIN_VALUE),
    concentrationMolPerCm3: optional('concentration (mol/cm³)', c.concentrationMolPerCm3, Number.MIN_VALUE),
    temperatureK,
    alpha: optional('cathodic transfer coefficient αc', c.alpha, 0.05, 0.95),
    transferElectronCount,
    transferElectronCountGiven: c.transferElectronCount != null,
    formalPotentialV: optional('formal potential E°′ (V)', c.formalPotentialV, -10, 10),
    formalPotentialScale: c.formalPotentialScale === 'recording' ? 'recording' : 'reported',
    diffusionRatio,
    diffusionCm2PerS: optional('diffusion coefficient D (cm²/s)', c.diffusionCm2PerS, Number.MIN_VALUE),
    ruOhm,
    inputReference: c.inputReference ? resolveReferenceId(c.inputReference) : null,
    pH: optional('pH', c.pH, -2, 16),
    internalStandard: std,
    capacitancePotentialV: optional('capacitance potential (V)', c.capacitancePotentialV, -10, 10),
    areaRelativeUncertainty: relative('relative uncertainty of the area', c.areaRelativeUncertainty),
    concentrationRelativeUncertainty: relative('relative uncertainty of the concentration', c.concentrationRelativeUncertainty),
    origins: { ...c.origins },
  };
}

export function resolveMethod(m: MethodOptions = {}): ResolvedMethod {
  const smoothing = m.smoothing ?? { window: 5, order: 2 };
  if (smoothing !== 'off') {
    const { window: points, order } = smoothing;
    if (!Number.isInteger(points) || points < 3 || points % 2 === 0 || !Number.isInteger(order) || order < 0 || order >= points) {
      throw new AnalysisError('BAD_OPTION', `smoothing needs an odd window ≥ 3 and an order in [0, window − 1], got window ${points}, order ${order}`);
    }
  }
  const r: ResolvedMethod = {
    smoothing,
    forwardBaseline: m.forwardBaseline ?? 'linear',
    returnBaseline: m.returnBaseline ?? 'nicholson',
    minSignalToNoise: m.minSignalToNoise ?? 8,
    minProminenceA: m.minProminenceA ?? 0,
    minRelativeProminence: m.minRelativeProminence ?? 0.01,
    maxDeltaEpV: m.maxDeltaEpV ?? 0.6,
    seriesCycle: m.seriesCycle ?? 1,
    matchToleranceV: m.matchToleranceV ?? 0.12,
    psiMethod: m.psiMethod ?? 'table',
    spikeFilter: m.spikeFilter ?? 'hampel',
  };
  if (r.spikeFilter !== 'hampel' && r.spikeFilter !== 'off') throw new AnalysisError('BAD_OPTION', `spike filter must be hampel or off, got ${String(r.spikeFilter)}`);
  if (r.psiMethod !== 'table' && r.psiMethod !== 'lavagnini') throw new AnalysisError('BAD_OPTION', `ψ method must be table or lavagnini, got ${String(r.psiMethod)}`);
  if (!['linear', 'polynomial'].includes(r.forwardBaseline)) throw new AnalysisError('BAD_OPTION', `forward baseline must be linear or polynomial, got ${r.forwardBaseline}`);
  if (!['linear', 'polynomial', 'nicholson'].includes(r.returnBaseline)) throw new AnalysisError('BAD_OPTION', `return baseline must be linear, polynomial or nicholson, got ${r.returnBaseline}`);
  assertFiniteInRange('minimum signal-to-noise', r.minSignalToNoise, 0);
  assertFiniteInRange('minimum prominence (A)', r.minProminenceA, 0);
  assertFiniteInRange('minimum relative prominence', r.minRelativeProminence, 0, 1);
  assertFiniteInRange('largest ΔEp of a couple (V)', r.maxDeltaEpV, 1e-6);
  if (!Number.isInteger(r.seriesCycle) || r.seriesCycle < 1) throw new AnalysisError('BAD_OPTION', `series cycle must be a whole number ≥ 1, got ${r.seriesCycle}`);
  assertFiniteInRange('couple matching tolerance (V)', r.matchToleranceV, 0, 2);
  return r;
}

export function resolveReport(r: ReportOptions = {}): ResolvedReport {
  const overrides: Partial<Record<ReferenceId, number>> = {};
  for (const [id, v] of Object.entries(r.referenceOverridesVsSheV ?? {})) {
    assertFiniteInRange(`value of ${id} vs SHE (V)`, v, -10, 10);
    overrides[resolveReferenceId(id)] = v;
  }
  const convention = r.outputConvention ?? 'iupac';
  if (convention !== 'iupac' && convention !== 'polarographic') throw new AnalysisError('BAD_OPTION', `output sign convention must be iupac or polarographic, got ${String(convention)}`);
  const unconvertible = r.unconvertible ?? 'error';
  if (unconvertible !== 'error' && unconvertible !== 'keep-recording-scale') throw new AnalysisError('BAD_OPTION', `unconvertible must be error or keep-recording-scale, got ${String(unconvertible)}`);
  return { outputReference: r.outputReference ? resolveReferenceId(r.outputReference) : null, outputConvention: convention, referenceOverridesVsSheV: overrides, unconvertible };
}

function resolveFile(f: RunFile, blanks: RunBlank[]): ResolvedRunFile {
  const v = f.voltammogram;
  if (v.scanRateVPerS === null || v.scanRateVPerS === undefined) {
    throw new AnalysisError('BAD_OPTION', `${f.fileName}: no scan rate the import could use (its warnings say what it found); give the scan rate`);
  }
  assertFiniteInRange(`scan rate of ${f.fileName} (V/s)`, v.scanRateVPerS, 1e-9);
  const peakWindows = f.trace?.peakWindows ?? [];
  for (const w of peakWindows) {
    if (!Number.isFinite(w.fromV) || !Number.isFinite(w.toV) || w.fromV === w.toV) {
      throw new AnalysisError('BAD_OPTION', `${f.fileName}: peak window ${w.direction} [${w.fromV}, ${w.toV}] V must have two different finite ends`);
    }
  }
  const baselines = f.trace?.baselines ?? [];
  for (const b of baselines) {
    const ends = [b.fromV, b.toV, ...(b.anchorsV ?? [])];
    if (!ends.every(Number.isFinite)) throw new AnalysisError('BAD_OPTION', `${f.fileName}: baseline choice ${b.direction} [${b.fromV}, ${b.toV}] V has a non-finite potential`);
  }
  let blank: RunBlank | null = null;
  if (f.blankFile) {
    blank = blanks.find((b) => b.fileName === f.blankFile) ?? null;
    if (!blank) throw new AnalysisError('BAD_OPTION', `${f.fileName}: its blank "${f.blankFile}" is not among the blanks given`);
  }
  return {
    input: f, series: f.series ?? DEFAULT_SERIES_KEY, role: f.role ?? 'series', blank,
    scanRateVPerS: v.scanRateVPerS, scanRateSource: v.scanRateSource, peakWindows, baselines,
  };
}

export function resolveRun(input: RunInput): ResolvedRun {
  if (!input.files.length) throw new AnalysisError('EMPTY_INPUT', 'an analysis run needs at least one file');
  const files = input.files.map((f) => resolveFile(f, input.blanks ?? []));
  const keys = [...new Set(files.map((f) => f.series))];
  const series = keys.map((key) => {
    try {
      return { key, cell: resolveCell(input.cells?.[key]), fileIndices: files.flatMap((f, i) => (f.series === key ? [i] : [])) };
    } catch (err) {
      if (err instanceof AnalysisError && keys.length > 1) throw new AnalysisError(err.code, `series "${key}": ${err.message}`);
      throw err;
    }
  });
  return {
    files, series, method: resolveMethod(input.method), report: resolveReport(input.report),
    software: input.software ?? { name: 'halfwave', version: 'unknown' },
  };
}
