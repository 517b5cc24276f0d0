/**
 * From what is on screen to the worker's `fit` request, and back: the series' files (its own
 * voltammograms, not its blanks, each with the blank the analysis subtracts taken off first, as
 * the analysis does: core/background), its resolved cell in core units (through runInput's
 * seriesCellValues, as the analysis gets it), the values the fit holds (R_u and α from the cell
 * unless they are fitted), the display scale the result is shown on, and the values a fit can
 * carry back into the cell. Pure functions of the store's state.
 */
import type { FitCell, FitComparisonChoice, FitMechanism, FitModelValues, FitParameter, FitResult } from '../core/fit';
import { COUPLE_PARAMETERS, DEFAULT_FREE } from '../core/fit/fitParameters';
import { perAreaFit } from '../core/fit/perAreaFit';
import { roundToUncertainty } from '../core/statistics/roundToUncertainty';
import type { SeriesFit } from '../io/fitSheet';
import type { FitRequest } from '../worker/fitRun';
import { displayScale, runScaleKey, scaleFromRunKey } from './display';
import { analysedCurrentOf, blankNames, blankOf, measurementNamed, seriesCellValues } from '../run/runInput';
import { resolveCell } from '../run/seriesCell';
import type { HalfwaveState } from './types';

export interface FitSetup {
  mechanism: FitMechanism;
  /** Independent couples in the record, 1–4. */
  coupleCount: number;
  free: FitParameter[];
  /** Potential window fitted, on the series' recording scale (V); null: the whole cycle. */
  windowV: [number, number] | null;
  /** 1-based cycle fitted (earlier cycles are simulated too). */
  cycle: number;
  /** Also fit the alternative model and say which the data favour. */
  compare: FitComparisonChoice;
}

export type FitSources = Pick<HalfwaveState, 'files' | 'fileOrder' | 'fileSettings' | 'settings' | 'seriesCells' | 'convention' | 'results' | 'series'>;

const MECHANISMS: FitMechanism[] = ['E', 'EC', 'surface'];
const COMPARISONS: FitComparisonChoice[] = ['none', 'mechanism', 'ru'];

/**
 * Fit setups read back from a session or the autosave: each field checked, anything unknown left
 * out, so a setup from another version or a hand-edited file never reaches the fit unchecked.
 */
export function mergeFitSetups(stored: unknown): Record<string, FitSetup> {
  const out: Record<string, FitSetup> = {};
  if (typeof stored !== 'object' || stored === null || Array.isArray(stored)) return out;
  for (const [group, value] of Object.entries(stored as Record<string, unknown>)) {
    if (typeof value !== 'object' || value === null) continue;
    const v = value as Record<string, unknown>;
    const mechanism = MECHANISMS.find((m) => m === v.mechanism);
    const compare = COMPARISONS.find((c) => c === v.compare);
    if (!mechanism || !compare || (mechanism === 'surface' && compare === 'mechanism')) continue;
    const known: FitParameter[] = [...COUPLE_PARAMETERS[mechanism], 'uncompensatedOhm', 'doubleLayerFPerCm2', 'background'];
    const free = Array.isArray(v.free) ? known.filter((p) => (v.free as unknown[]).includes(p)) : [];
    const coupleCount = Number.isInteger(v.coupleCount) && (v.coupleCount as number) >= 1 && (v.coupleCount as number) <= 4 ? (v.coupleCount as number) : 1;
    const w = v.windowV;
    const windowV = Array.isArray(w) && w.length === 2 && w.every((x) => typeof x === 'number' && Number.isFinite(x) && Math.abs(x) <= 10) && (w[0] as number) < (w[1] as number) ? [w[0], w[1]] as [number, number] : null;
    const cycle = Number.isInteger(v.cycle) && (v.cycle as number) >= 1 && (v.cycle as number) <= 1000 ? (v.cycle as number) : 1;
    if (!free.length) continue;
    out[group] = { mechanism, coupleCount, free, windowV, cycle, compare };
  }
  return out;
}

/** The starting setup of a series: a surface film when the analysis found only adsorbed couples, else E; E against EC when there are two or more files. */
export function defaultFitSetup(state: FitSources, group: string): FitSetup {
  const couples = state.series[group]?.result?.analysis.couples ?? [];
  const mechanism: FitMechanism = couples.length > 0 && couples.every((c) => c.regime === 'surface') ? 'surface' : 'E';
  const compare: FitComparisonChoice = mechanism !== 'surface' && fitFilesOf(state, group).ids.length > 1 ? 'mechanism' : 'none';
  return { mechanism, coupleCount: 1, free: [...DEFAULT_FREE[mechanism]], windowV: null, cycle: 1, compare };
}

/** A setup with a new mechanism: its default free parameters, and no E-against-EC comparison for a film. */
export function withMechanism(setup: FitSetup, mechanism: FitMechanism): FitSetup {
  return { ...setup, mechanism, free: [...DEFAULT_FREE[mechanism]], compare: mechanism === 'surface' && setup.compare === 'mechanism' ? 'none' : setup.compare };
}

/** The series' own files (blanks left out) that hold a measurement, in load order. */
export function fitFilesOf(state: FitSources, group: string): { ids: string[]; names: string[] } {
  const blanks = blankNames(state);
  const ids = state.fileOrder.filter((id) => state.files[id]?.group === group && state.files[id]?.measurement && !blanks.has(state.files[id]?.fileName ?? ''));
  return { ids, names: ids.map((id) => state.files[id]?.fileName ?? id) };
}

/** The scale results are shown on: the analysed files' own offset, else the conversion of the series' cell. */
export function fitScaleOf(state: FitSources, group: string): { name: string; offsetV: number } {
  const cell = resolveCell(state, group).cell;
  const key = runScaleKey(state, group);
  const scale = key ? scaleFromRunKey(key, cell) : displayScale(state.settings, cell);
  return { name: scale.name, offsetV: scale.offsetV };
}

/** The cell of a fit (A, C, n, T in core units) and the values it holds from the cell: R_u unless fitted, α unless fitted. */
function fitCellOf(state: FitSources, group: string, setup: FitSetup): { cell: FitCell; held: { uncompensatedOhm?: number; alpha?: number } } {
  const v = seriesCellValues(state, group);
  const cell: FitCell = { areaCm2: v.areaCm2 ?? Number.NaN, concentrationMolPerCm3: v.concentrationMolPerCm3 ?? Number.NaN, electronCount: v.electronCount ?? 1, temperatureK: v.temperatureK ?? 298.15 };
  const held: { uncompensatedOhm?: number; alpha?: number } = {};
  const ru = v.ruOhm ?? 0;
  // A fitted R_u starts from the cell's value when one was given; from ΔEp across the files otherwise.
  if (!setup.free.includes('uncompensatedOhm') || ru > 0) held.uncompensatedOhm = ru;
  if (typeof v.alpha === 'number') held.alpha = v.alpha;
  return { cell, held };
}

/** Everything the fit of a series depends on, as one text: the fit is current while this stays the same. */
export function fitInputKey(state: FitSources, group: string, setup: FitSetup): string {
  const { ids } = fitFilesOf(state, group);
  const { cell, held } = fitCellOf(state, group, setup);
  const heldNow = { ru: setup.free.includes('uncompensatedOhm') ? null : held.uncompensatedOhm, alpha: setup.free.includes('alpha') ? null : held.alpha ?? null };
  return JSON.stringify({ files: ids.map((id) => state.files[id]?.measurement?.id ?? id), blanks: fitBlanksOf(state, ids), cell, heldNow, scale: fitScaleOf(state, group), setup });
}

export interface BuiltFitRequest {
  request: FitRequest;
  ids: string[];
  names: string[];
  cell: FitCell;
  scale: { name: string; offsetV: number };
  key: string;
  /** What was done to the data before the fit (blanks subtracted, densities fitted per cm²), for the fit's notes. */
  notes: string[];
  /** True when the files gave current densities: the fit is per cm², its R_u in Ω·cm². */
  perArea: boolean;
}

/** The blank each fitted file subtracts (file name, or null), in the order of `ids`. */
function fitBlanksOf(state: FitSources, ids: string[]): (string | null)[] {
  return ids.map((id) => {
    const name = blankOf(state, id);
    return name && measurementNamed(state, name) ? name : null;
  });
}

export function fitRequestOf(state: FitSources, group: string, setup: FitSetup): BuiltFitRequest {
  const { ids, names } = fitFilesOf(state, group);
  const { cell: cellValues, held } = fitCellOf(state, group, setup);
  const measurements = ids.map((id) => {
    const m = state.files[id]?.measurement;
    if (!m) throw new Error(`file ${id} has no measurement`);
    return m;
  });
  // Current densities are fitted per cm², the cell's R_u held as R_u·A (core/fit/perAreaFit.ts).
  const perArea = perAreaFit(measurements, cellValues, held.uncompensatedOhm, Number.isFinite(cellValues.areaCm2) ? cellValues.areaCm2 : null);
  const { cell } = perArea;
  if (perArea.ruOhm !== undefined) held.uncompensatedOhm = perArea.ruOhm;
  const blanks = fitBlanksOf(state, ids);
  const records = measurements.map((m, k) => {
    const blank = blanks[k] ? measurementNamed(state, blanks[k] as string) : null;
    if (blank && (blank.currentKind ?? 'current') !== (m.currentKind ?? 'current')) throw new Error(`${m.fileName} and its blank ${blank.fileName} hold different kinds of current (density and current)`);
    // The current less its blank, as the analysis and the plots have it (runInput.ts, one subtraction kept per file).
    const currentA = analysedCurrentOf(state, ids[k] as string)?.currentA ?? m.currentA;
    return { potentialV: m.potentialV, currentA, timeS: m.timeS, segments: m.segments, cycles: m.cycles, scanRateVPerS: m.scanRateVPerS, scanRateSource: m.scanRateSource };
  });
  const start = { couples: held.alpha === undefined ? [] : Array.from({ length: setup.coupleCount }, () => ({ alpha: held.alpha as number })), shared: held.uncompensatedOhm === undefined ? {} : { uncompensatedOhm: held.uncompensatedOhm } };
  const options = { mechanism: setup.mechanism, coupleCount: setup.coupleCount, free: setup.free, start, cycle: setup.cycle ?? 1, ...(setup.windowV ? { windowV: setup.windowV } : {}) };
  const notes: string[] = [];
  const pairs = names.flatMap((n, k) => (blanks[k] ? [`${n} − ${blanks[k]}`] : []));
  if (pairs.length) notes.push(`blank subtracted before the fit, as in the analysis: ${pairs.join('; ')}`);
  notes.push(...perArea.notes);
  return { request: { records, fileNames: names, cell, options, compare: setup.compare }, ids, names, cell, scale: fitScaleOf(state, group), key: fitInputKey(state, group, setup), notes, perArea: perArea.perArea };
}

/** The fit's potentials (E°′ values and intervals, the window) moved onto the display scale. */
export function shiftFitResult(r: FitResult, offsetV: number): FitResult {
  if (offsetV === 0) return r;
  const move = (v: FitModelValues): FitModelValues => ({ shared: v.shared, couples: v.couples.map((c) => ({ ...c, formalPotentialV: c.formalPotentialV + offsetV })) });
  const parameters = r.parameters.map((e) => (e.parameter !== 'formalPotentialV' ? e : {
    ...e, value: e.value + offsetV, interval: e.interval ? [e.interval[0] === null ? null : e.interval[0] + offsetV, e.interval[1] === null ? null : e.interval[1] + offsetV] as [number | null, number | null] : null,
  }));
  return { ...r, values: move(r.values), start: move(r.start), parameters, windowV: [r.windowV[0] + offsetV, r.windowV[1] + offsetV] };
}

/** A value a fit can carry into the series' cell: the cell field, its label and unit, the value rounded to its error. */
export interface CarriedValue {
  field: 'alpha' | 'resistanceOhm';
  label: string;
  unit: string;
  value: number;
}

/** α (one couple) and R_u, where the fit estimated them (free, and determined by the data). */
export function carryableValues(r: FitResult): CarriedValue[] {
  const out: CarriedValue[] = [];
  for (const e of r.parameters) {
    if (!e.free || e.status !== 'estimate') continue;
    const value = e.standardError && e.standardError > 0 ? roundToUncertainty(e.value, e.standardError) : e.value;
    if (e.parameter === 'alpha' && r.values.couples.length === 1) out.push({ field: 'alpha', label: 'α', unit: '', value });
    if (e.parameter === 'uncompensatedOhm') out.push({ field: 'resistanceOhm', label: 'R_u', unit: 'Ω', value });
  }
  return out;
}

/** The results-sheet record of a finished fit. */
export function seriesFitOf(group: string, entry: { names: string[]; scale: { name: string; offsetV: number }; setup: FitSetup; cell: FitCell; result: FitResult; comparison: SeriesFit['comparison'] }): SeriesFit {
  const { setup } = entry;
  return {
    series: group, fileNames: entry.names, scale: entry.scale, cell: entry.cell, comparison: entry.comparison,
    setup: { mechanism: setup.mechanism, coupleCount: setup.coupleCount, free: setup.free, compare: setup.compare, cycle: setup.cycle ?? 1 },
    // The sheet needs no per-point model currents.
    result: { ...entry.result, records: entry.result.records.map((rec) => ({ ...rec, indices: new Int32Array(0), modelA: new Float64Array(0) })) },
  };
}
