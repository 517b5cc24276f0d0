/**
 * Turns the parsed table and the column roles into core columns: keeps rows whose potential,
 * current (and time, cycle) are finite, converts to V, A and s, stores currents in the IUPAC
 * convention, and splits sweeps and cycles with the core's findSweepSegments.
 * Unit factors: BIPM SI Brochure, 9th ed. (2019), Table 7 (prefixes).
 */
import { findSweepSegments } from '../core/sweeps/findSweepSegments';
import type { SweepSplit } from '../core/sweeps/findSweepSegments';
import type { RoleAssignment } from './assignColumns';
import { reportDroppedRows } from './droppedRows';
import { ImportError, makeWarning } from './errors';
import type { ImportWarning } from './errors';
import type { ParsedTable } from './parseTable';
import type { CurrentConvention, CurrentUnit, Guess, ImportOverrides, PotentialUnit, PreambleValue, TimeUnit } from './types';
import { CURRENT_FACTORS, POTENTIAL_FACTORS, TIME_FACTORS } from './units';

export interface UnitChoice {
  potential: Guess<PotentialUnit>;
  current: Guess<CurrentUnit>;
  /** Current column holds a density (A/cm² after the factor). */
  currentDensity: boolean;
  /** The density's unit as read ("mA/cm²"), '' for a current. */
  densitySymbol: string;
  /** Factor from file values to A (or A/cm² for a density). */
  currentFactor: number;
  time: Guess<TimeUnit> | null;
}

export interface CoreColumns {
  potentialV: Float64Array;
  currentA: Float64Array;
  timeS: Float64Array | null;
  cycleColumn: Float64Array | null;
  extraColumns: Record<string, Float64Array>;
  split: SweepSplit;
  rowsKept: number;
  rowsDropped: number;
}

/** Picks units for potential, current and time from overrides, header units or magnitudes. */
export function chooseUnits(fileName: string, a: RoleAssignment, o: ImportOverrides, warnings: ImportWarning[]): UnitChoice {
  const pHead = a.headers[a.potentialColumn]?.unit;
  const pStats = a.stats[a.potentialColumn];
  let potential: Guess<PotentialUnit>;
  if (o.potentialUnit) potential = { value: o.potentialUnit, overridden: true, explanation: `potential unit ${o.potentialUnit} (set by the user)` };
  else if (pHead?.kind === 'potential' && pHead.symbol in POTENTIAL_FACTORS) potential = { value: pHead.symbol as PotentialUnit, overridden: false, explanation: `potential unit ${pHead.symbol} — from ${unitSource(a, a.potentialColumn)}` };
  else {
    const mv = (pStats?.maxAbs ?? 0) > 20;
    potential = { value: mv ? 'mV' : 'V', overridden: false, explanation: mv ? `potential unit mV — no unit in the file and values reach ${pStats?.maxAbs}, too large for volts` : 'potential unit V — no unit in the file; values lie within ±20, as volts do' };
    warnings.push(makeWarning('UNIT_ASSUMED', `${fileName}: no potential unit found; read as ${potential.value}`));
  }
  const cHead = a.headers[a.currentColumn]?.unit;
  let current: Guess<CurrentUnit>;
  let density = false;
  let currentFactor: number;
  if (o.currentUnit) {
    current = { value: o.currentUnit, overridden: true, explanation: `current unit ${o.currentUnit} (set by the user)` };
    currentFactor = CURRENT_FACTORS[o.currentUnit];
  } else if (cHead && (cHead.kind === 'current' || cHead.kind === 'currentDensity')) {
    density = cHead.kind === 'currentDensity';
    const base = cHead.symbol.replace(/\/.*$/, '') as CurrentUnit;
    current = { value: base, overridden: false, explanation: `current unit ${cHead.symbol} — from ${unitSource(a, a.currentColumn)}${density ? ' (a current density)' : ''}` };
    currentFactor = cHead.factor;
  } else if (a.headers[a.currentColumn]?.density) {
    density = true;
    current = { value: 'A', overridden: false, explanation: `current unit A/cm² — the column's name "${a.headers[a.currentColumn]?.label ?? ''}" marks a current density, but no unit is written; A/cm² assumed` };
    currentFactor = 1;
    warnings.push(makeWarning('UNIT_ASSUMED', `${fileName}: the current density column states no unit; read as A/cm² — set the current unit if it is mA/cm² or µA/cm²`));
  } else {
    const max = a.stats[a.currentColumn]?.maxAbs ?? 0;
    current = { value: 'A', overridden: false, explanation: 'current unit A — no unit in the file, amperes assumed' };
    currentFactor = 1;
    const odd = max > 1 ? ` — values reach ${max}, which would be ${max} A: probably µA or mA, set the unit` : '';
    warnings.push(makeWarning('UNIT_ASSUMED', `${fileName}: no current unit found; read as A${odd}`));
  }
  const densitySymbol = density ? (cHead?.kind === 'currentDensity' ? cHead.symbol : 'A/cm², assumed') : '';
  return { potential, current, currentDensity: density, densitySymbol, currentFactor, time: chooseTimeUnit(a, o) };
}

const unitSource = (a: RoleAssignment, j: number) => (a.headers[j]?.unitFrom === 'units row' ? 'the units row' : 'the header');

function chooseTimeUnit(a: RoleAssignment, o: ImportOverrides): Guess<TimeUnit> | null {
  if (a.timeColumn === null) return null;
  if (o.timeUnit) return { value: o.timeUnit, overridden: true, explanation: `time unit ${o.timeUnit} (set by the user)` };
  const h = a.headers[a.timeColumn]?.unit;
  if (h?.kind === 'time') return { value: h.symbol as TimeUnit, overridden: false, explanation: `time unit ${h.symbol} — from ${unitSource(a, a.timeColumn)}` };
  return { value: 's', overridden: false, explanation: 'time unit s — no unit in the file, seconds assumed' };
}

/** Builds the core columns; throws TOO_FEW_POINTS or CONSTANT_POTENTIAL when nothing usable is left. */
export function buildColumns(fileName: string, t: ParsedTable, a: RoleAssignment, u: UnitChoice, convention: CurrentConvention, areaCm2: PreambleValue | null, decimalComma: boolean, warnings: ImportWarning[]): CoreColumns {
  const neededColumns = [a.potentialColumn, a.currentColumn, a.timeColumn, a.cycleColumn].filter((j): j is number => j !== null);
  const rows = finiteRows(neededColumns.map((j) => t.columns[j] as Float64Array), t.rowCount, t.lineOfRow);
  const { keep, kept, droppedCount, dropped } = rows;
  reportDroppedRows(fileName, t, a, neededColumns, decimalComma, { count: droppedCount, lines: dropped }, warnings);
  if (kept < 3) throw new ImportError('TOO_FEW_POINTS', fileName, `only ${kept} usable rows with a finite potential and current; a voltammogram needs at least 3`, { line: t.lineOfRow[0] ?? 1 });
  const pick = (j: number, factor: number) => keptValues(t.columns[j] as Float64Array, keep, kept, factor);
  const potentialV = pick(a.potentialColumn, POTENTIAL_FACTORS[u.potential.value]);
  assertPotentialChanges(fileName, potentialV, a.potentialColumn, t.lineOfRow[0] ?? 1);
  const sign = convention === 'polarographic' ? -1 : 1;
  let currentFactor = u.currentFactor * sign;
  if (u.currentDensity && areaCm2) currentFactor *= areaCm2.value;
  const currentA = pick(a.currentColumn, currentFactor);
  const timeS = a.timeColumn !== null && u.time ? pick(a.timeColumn, TIME_FACTORS[u.time.value]) : null;
  let cycleColumn = a.cycleColumn !== null ? pick(a.cycleColumn, 1) : null;
  const extraColumns: Record<string, Float64Array> = {};
  if (a.cycleColumn !== null && cycleColumn && isConstant(cycleColumn)) {
    // One number on every row numbers no cycles: the potential's own turns split them.
    const cycles = findSweepSegments(potentialV).cycles.length;
    if (cycles > 1) {
      warnings.push(makeWarning('CYCLE_COLUMN_IGNORED', `${fileName}: column ${a.cycleColumn + 1} holds ${cycleColumn[0]} on every row, but the potential runs ${cycles} cycles; cycles are found from the potential and the column is kept as an extra column`));
      extraColumns[a.columns[a.cycleColumn]?.name ?? `column ${a.cycleColumn + 1}`] = cycleColumn;
      cycleColumn = null;
    }
  }
  a.columns.forEach((c) => {
    if ((c.role === 'other' || c.role === 'index') && (a.stats[c.index]?.finite ?? 0) > 0) {
      let key = c.name;
      for (let n = 2; key in extraColumns; n++) key = `${c.name} (${n})`;
      extraColumns[key] = pick(c.index, 1);
    }
  });
  const split = findSweepSegments(potentialV, { cycleColumn });
  assertSwept(fileName, split, potentialV.length, a.potentialColumn);
  return { potentialV, currentA, timeS, cycleColumn, extraColumns, split, rowsKept: kept, rowsDropped: droppedCount };
}

// The loops over every row live in the two small functions below, not in buildColumns: the engine
// optimises a function whose loop runs long, and buildColumns with its loops inside (and the
// sweep split inlined into it) was compiled up to three times per page, 50–100 ms of compiling
// each (--trace-opt), while the files of a first batch were read.

/** Rows whose needed values are all finite: a mask, their count, and the first 20 lines left out. */
function finiteRows(needed: Float64Array[], rowCount: number, lineOfRow: ArrayLike<number>): { keep: Uint8Array; kept: number; droppedCount: number; dropped: number[] } {
  const keep = new Uint8Array(rowCount);
  let kept = 0;
  const dropped: number[] = [];
  let droppedCount = 0;
  for (let i = 0; i < rowCount; i++) {
    let ok = true;
    // Index loops: this runs once per row, and a first file is read before the engine optimises it.
    for (let n = 0; n < needed.length; n++) if (!Number.isFinite((needed[n] as Float64Array)[i] as number)) ok = false;
    if (ok) {
      keep[i] = 1;
      kept++;
    } else {
      droppedCount++;
      if (dropped.length < 20) dropped.push(lineOfRow[i] as number);
    }
  }
  return { keep, kept, droppedCount, dropped };
}

/** The values of the rows kept, times `factor`. */
function keptValues(src: Float64Array, keep: Uint8Array, kept: number, factor: number): Float64Array {
  const out = new Float64Array(kept);
  for (let i = 0, n = 0; i < keep.length; i++) if (keep[i]) out[n++] = (src[i] as number) * factor;
  return out;
}

/**
 * A potential that turns at nearly every point (thousands of sweeps of two or three points) is not
 * swept: it is another quantity, or noise. Caught here, before the analysis would treat each
 * turn as a cycle. Thresholds: common practice, no source.
 */
function assertSwept(fileName: string, split: SweepSplit, points: number, column: number): void {
  const sweeps = split.segments.length;
  if (sweeps >= 100 && points / sweeps < 4) {
    throw new ImportError('NOT_A_SWEEP', fileName, `the potential column turns back ${sweeps} times in ${points} points (every ${(points / sweeps).toFixed(1)} points), so it is not a potential sweep — is another column the potential?`, { column: column + 1 });
  }
}

function assertPotentialChanges(fileName: string, e: Float64Array, column: number, line: number): void {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < e.length; i++) {
    const v = e[i] as number;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  if (!(hi > lo)) {
    throw new ImportError('CONSTANT_POTENTIAL', fileName, `the potential column never changes (always ${lo} V), so this is not a voltammogram — is another column the potential?`, { line, column: column + 1 });
  }
}

/** Whether every value of a column is the same. */
function isConstant(c: Float64Array): boolean {
  const first = c[0];
  for (let i = 1; i < c.length; i++) if (c[i] !== first) return false;
  return true;
}
