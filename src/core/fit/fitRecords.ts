/**
 * Prepares measured voltammograms for a fit: the simulated waveform that reproduces each one
 * (start, vertex, scan rate, cycles up to the fitted one), the points inside the potential
 * window, and where each of them falls on the simulated output grid (a fractional index,
 * interpolated linearly).
 * In: Voltammograms (IUPAC currents, sweeps and cycles split), the fitted cycle, an optional
 *   window (V). Out: PreparedRecord per voltammogram and the window used.
 * Method (common practice, no source): every cycle must run start → vertex → start, as the
 *   simulator's waveform does. The simulated output step is the measured step divided so that
 *   it is at most 1 mV/n (measured points then fall on simulated points); below 0.5 mV/n the
 *   simulation runs at 1 mV/n and is interpolated (error ~1e-4 of a peak current). The time
 *   step inside the simulation is set by the simulator's own accuracy rule.
 */
import { AnalysisError } from '../errors';
import type { SweepSegment, Voltammogram } from '../types';

export interface PreparedRecord {
  scanRateVPerS: number;
  startV: number;
  switchV: number;
  /** Simulated output step, V. */
  stepV: number;
  /** Cycles to simulate (the fitted one is the last). */
  cycles: number;
  /** Indices of the fitted points in the voltammogram. */
  indices: Int32Array;
  potentialV: Float64Array;
  currentA: Float64Array;
  /** Fractional index of each fitted point in the simulated columns. */
  position: Float64Array;
  /** First residual of this record in the concatenated residual vector. */
  offset: number;
}

export interface PrepareRecordsOptions {
  /** 1-based cycle. */
  cycle: number;
  windowV?: [number, number] | undefined;
  /** Largest n among the couples (sets the 1 mV/n output step). */
  electronCount: number;
}

export function prepareRecords(records: readonly Voltammogram[], o: PrepareRecordsOptions): { records: PreparedRecord[]; windowV: [number, number] } {
  if (records.length === 0) throw new AnalysisError('EMPTY_INPUT', 'a fit needs at least one voltammogram');
  const sweeps = records.map((v, k) => cycleSweeps(v, k, o.cycle));
  const windowV = o.windowV ? ([Math.min(...o.windowV), Math.max(...o.windowV)] as [number, number]) : commonSpan(records, sweeps);
  let offset = 0;
  const prepared = records.map((v, k) => {
    const r = prepareOne(v, k, sweeps[k] as SweepSegment[], windowV, o);
    r.offset = offset;
    offset += r.indices.length;
    return r;
  });
  return { records: prepared, windowV };
}

/** The sweeps of cycle `cycle`, checked to run start → vertex (→ start) like the first cycle. */
function cycleSweeps(v: Voltammogram, k: number, cycle: number): SweepSegment[] {
  const where = `voltammogram ${k + 1}`;
  if (!v.scanRateVPerS || !(v.scanRateVPerS > 0)) throw new AnalysisError('BAD_OPTION', `${where} has no scan rate`);
  const first = v.segments.filter((s) => s.cycle === 1);
  const chosen = v.segments.filter((s) => s.cycle === cycle);
  if (chosen.length === 0) throw new AnalysisError('OUT_OF_RANGE', `${where} has no cycle ${cycle} (it has ${v.cycles.length})`);
  for (const [c, sweeps] of [[1, first], [cycle, chosen]] as const) {
    if (sweeps.length > 2) {
      throw new AnalysisError('BAD_OPTION', `${where}, cycle ${c} has ${sweeps.length} sweeps: a fit needs cycles that run start → vertex → start (does the scan start inside the window?)`);
    }
  }
  const startV = v.potentialV[first[0]!.start]!;
  const switchV = v.potentialV[first[0]!.end - 1]!;
  const tolerance = 0.02 * Math.abs(switchV - startV);
  const startGap = Math.abs(v.potentialV[chosen[0]!.start]! - startV);
  if (startGap > tolerance) throw new AnalysisError('BAD_OPTION', `${where}: cycle ${cycle} starts ${(startGap * 1e3).toFixed(1)} mV away from cycle 1; the simulated waveform repeats the first cycle`);
  const [lo, hi] = [Math.min(startV, switchV) - tolerance, Math.max(startV, switchV) + tolerance];
  for (const s of chosen) {
    for (let i = s.start; i < s.end; i++) {
      const e = v.potentialV[i]!;
      if (e < lo || e > hi) throw new AnalysisError('BAD_OPTION', `${where}: point ${i} (${e} V) lies outside the start–vertex range ${startV} … ${switchV} V: a fit needs cycles that run start → vertex → start`);
    }
  }
  return chosen;
}

function commonSpan(records: readonly Voltammogram[], sweeps: SweepSegment[][]): [number, number] {
  let lo = -Infinity;
  let hi = Infinity;
  records.forEach((v, k) => {
    const s = sweeps[k] as SweepSegment[];
    let a = Infinity;
    let b = -Infinity;
    for (let i = s[0]!.start; i < s[s.length - 1]!.end; i++) {
      a = Math.min(a, v.potentialV[i]!);
      b = Math.max(b, v.potentialV[i]!);
    }
    lo = Math.max(lo, a);
    hi = Math.min(hi, b);
  });
  return [lo, hi];
}

function medianStep(e: Float64Array, start: number, end: number): number {
  const steps = new Float64Array(end - start - 1);
  for (let i = start + 1; i < end; i++) steps[i - start - 1] = Math.abs(e[i]! - e[i - 1]!);
  steps.sort();
  return steps[Math.floor(steps.length / 2)] ?? 0;
}

function simulationStep(span: number, measuredStepV: number, electronCount: number): number {
  const target = 1e-3 / electronCount;
  const snapped = span / Math.max(1, Math.round(span / Math.max(measuredStepV, 1e-9)));
  const step = snapped >= target / 2 ? snapped / Math.ceil(snapped / target - 1e-9) : target;
  return span / Math.max(1, Math.round(span / step));
}

function prepareOne(v: Voltammogram, k: number, sweeps: SweepSegment[], windowV: [number, number], o: PrepareRecordsOptions): PreparedRecord {
  const first = v.segments.find((s) => s.cycle === 1) as SweepSegment;
  const startV = v.potentialV[first.start]!;
  const switchV = v.potentialV[first.end - 1]!;
  const span = Math.abs(switchV - startV);
  const stepV = simulationStep(span, medianStep(v.potentialV, sweeps[0]!.start, sweeps[0]!.end), o.electronCount);
  const perSweep = Math.round(span / stepV);
  const idx: number[] = [];
  const pos: number[] = [];
  sweeps.forEach((s, j) => {
    const sweep = 2 * (o.cycle - 1) + j;
    const from = j === 0 ? startV : switchV;
    const to = j === 0 ? switchV : startV;
    // The vertex point is shared by both sweeps; it is fitted once.
    for (let i = j === 0 ? s.start : s.start + 1; i < s.end; i++) {
      const e = v.potentialV[i]!;
      if (e < windowV[0] || e > windowV[1]) continue;
      const t = Math.min(Math.max((e - from) / (to - from), 0), 1);
      idx.push(i);
      pos.push((sweep + t) * perSweep);
    }
  });
  if (idx.length < 10) throw new AnalysisError('TOO_FEW_POINTS', `voltammogram ${k + 1} has ${idx.length} points inside the window ${windowV[0]} … ${windowV[1]} V`);
  const indices = Int32Array.from(idx);
  return {
    scanRateVPerS: v.scanRateVPerS as number, startV, switchV, stepV, cycles: o.cycle, indices,
    potentialV: Float64Array.from(indices, (i) => v.potentialV[i]!), currentA: Float64Array.from(indices, (i) => v.currentA[i]!),
    position: Float64Array.from(pos), offset: 0,
  };
}
