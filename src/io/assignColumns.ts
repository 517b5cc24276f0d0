/**
 * Gives every table column a role (potential, current, time, cycle, index, other) and a unit:
 * the user's override first, then the header text, then the shape of the numbers. Each choice
 * carries a sentence saying why, so the user can see and correct it.
 */
import { columnStats, looksLikeCycle, looksLikeIndex, looksLikeSweep, looksLikeTime, sweepShape } from './columnStats';
import type { ColumnStats } from './columnStats';
import { ImportError, listSome, makeWarning } from './errors';
import type { ImportWarning } from './errors';
import { readHeader } from './headerNames';
import { sweepCounterOf } from './sweepCounter';
import type { HeaderReading } from './headerNames';
import type { ColumnRole, DetectedColumn, ImportOverrides } from './types';

export interface RoleAssignment {
  columns: DetectedColumn[];
  /** Index (0-based) of the potential column in `columns`. */
  potentialColumn: number;
  /** Index of the current column. */
  currentColumn: number;
  /** Index of the time column, or null when there is none. */
  timeColumn: number | null;
  /** Index of the cycle-number column, or null when there is none. */
  cycleColumn: number | null;
  headers: (HeaderReading | null)[];
  stats: ColumnStats[];
  warnings: ImportWarning[];
}

type Slot = { role: ColumnRole | null; why: string };
const OVERRIDE_KEYS = [['potential', 'potentialColumn'], ['current', 'currentColumn'], ['time', 'timeColumn'], ['cycle', 'cycleColumn']] as const;

/** `units`: the entries of a units row under or over the names, when the file has one. */
export function assignColumns(fileName: string, names: string[] | null, columns: Float64Array[], overrides: ImportOverrides, units: string[] | null = null): RoleAssignment {
  const k = columns.length;
  const headers = Array.from({ length: k }, (_, j) => (names?.[j] || units?.[j] ? readHeader(names?.[j] ?? '', units?.[j] ?? '') : null));
  const stats = columns.map((c) => columnStats(c));
  const slots: Slot[] = headers.map((h, j) => slotFromHeader(h, stats[j] as ColumnStats));
  pickCurrentColumn(slots, headers);
  const potentialNote = pickPotentialColumn(slots, headers, columns);
  dedupeRoles(slots, headers);
  applyOverrides(fileName, slots, stats, overrides);
  if (overrides.potentialColumn === undefined && overrides.currentColumn === undefined) refuseForeignNames(fileName, names, headers, slots, stats);
  const warnings: ImportWarning[] = [];
  if (potentialNote && overrides.potentialColumn === undefined) warnings.push(makeWarning('POTENTIAL_CHOSEN', `${fileName}: ${potentialNote}`));
  inferMissing(slots, stats, columns, warnings, fileName, overrides.cycleColumn === -1);
  const find = (r: ColumnRole) => slots.findIndex((s) => s.role === r);
  const potential = find('potential');
  const current = find('current');
  if (overrides.cycleColumn === undefined && potential >= 0) dropSweepCounter(fileName, slots, columns, potential, find('cycle'), warnings);
  if (potential < 0 || current < 0) {
    const numeric = stats.filter((s) => s.finite > 0).length;
    const list = listSome(slots.slice(0, 8).map((s, j) => `${j + 1}: ${names?.[j] ?? 'unnamed'} (${s.role ?? 'unknown'})`), slots.length, '; ');
    throw new ImportError(numeric < 2 ? 'ONE_COLUMN' : 'NO_TABLE', fileName, `could not tell which column is the ${potential < 0 ? 'potential' : 'current'} (columns ${list}); choose it with a column override`);
  }
  const time = find('time');
  const cycle = find('cycle');
  const detected: DetectedColumn[] = slots.map((s, j) => ({
    index: j,
    name: names?.[j]?.trim() || `column ${j + 1}`,
    role: s.role ?? 'other',
    unit: headers[j]?.unit?.symbol ?? '',
    explanation: s.why,
  }));
  return { columns: detected, potentialColumn: potential, currentColumn: current, timeColumn: time < 0 ? null : time, cycleColumn: cycle < 0 ? null : cycle, headers, stats, warnings };
}

function slotFromHeader(h: HeaderReading | null, s: ColumnStats): Slot {
  if (s.finite === 0) return { role: 'other', why: 'holds no numbers, ignored' };
  if (!h) return { role: null, why: '' };
  if (h.secondary) return { role: 'other', why: `header "${h.label}" names a second electrode or copy; kept as an extra column` };
  if (h.setting) return { role: 'other', why: `header "${h.label}" names an instrument setting (range, gain, set value…), not a measured value; kept as an extra column` };
  if (!h.role) return { role: null, why: '' };
  const unit = h.unitText ? ` with unit ${h.unit?.symbol ?? h.unitText}${h.unitFrom === 'units row' ? ' from the units row' : ''}` : '';
  const kind = h.density ? ' (a current density)' : '';
  return { role: h.role, why: `${h.role} — header "${h.label || h.unitText}"${unit}${kind}` };
}

/**
 * Of several current columns, the plain measured current is used: a column its name calls a
 * current ("Current (A)") before one named only by its unit ("Ic (A)"), a current before a density,
 * a density that states its unit before one that does not, else the first. The others are kept as
 * extra columns, and both sides say why.
 */
function pickCurrentColumn(slots: Slot[], headers: (HeaderReading | null)[]): void {
  const rank = (j: number) => (headers[j]?.density ? (headers[j]?.unit ? 2 : 3) : headers[j]?.roleFromName ? 0 : 1);
  const cands = slots.map((s, j) => (s.role === 'current' ? j : -1)).filter((j) => j >= 0);
  if (cands.length < 2) return;
  const best = cands.reduce((a, b) => (rank(b) < rank(a) ? b : a));
  const what = (j: number) => `column ${j + 1} "${headers[j]?.label ?? ''}"${headers[j]?.density ? ` (a current density${headers[j]?.unit ? '' : ' with no unit'})` : ' (a current)'}`;
  const REASONS = ['its name says current, the other is named only by its unit', 'a current is preferred to a density', 'it states its unit'];
  const reason = (j: number) => (rank(best) === rank(j) ? 'it comes first' : rank(j) >= 2 && rank(best) < 2 ? REASONS[1] : (REASONS[rank(best)] as string));
  for (const j of cands) {
    if (j === best) continue;
    slots[j] = { role: 'other', why: `${what(j)}: ${what(best)} is used as the current (${reason(j)}); this one is kept as an extra column` };
  }
  const chosen = slots[best] as Slot;
  slots[best] = { role: 'current', why: `${chosen.why}; chosen over ${cands.filter((j) => j !== best).map((j) => `${what(j)}: ${reason(j)}`).join(', ')}` };
}

/**
 * Of several potential columns, the measured one is used: a column whose name marks the value the
 * instrument was told to apply ("Set potential", "Potential applied") differs from the measured
 * potential by the cell's response (an offset, the ohmic drop), so it is kept as an extra column
 * whatever the order. A file whose only potential is a set value is read with it. Returns the note
 * for the warnings, or null when there was nothing to choose or say.
 */
function pickPotentialColumn(slots: Slot[], headers: (HeaderReading | null)[], columns: Float64Array[]): string | null {
  const cands = slots.map((s, j) => (s.role === 'potential' ? j : -1)).filter((j) => j >= 0);
  const set = cands.filter((j) => headers[j]?.setValue);
  if (!set.length) return null;
  const what = (j: number) => `column ${j + 1} "${headers[j]?.label ?? ''}"`;
  const measured = cands.filter((j) => !headers[j]?.setValue);
  if (!measured.length) {
    const only = set[0] as number;
    const chosen = slots[only] as Slot;
    const note = `its name marks the potential the instrument applied, not a measured one; no other potential column is there, so it is used as the potential`;
    slots[only] = { role: 'potential', why: `${chosen.why}; ${note}` };
    return `${what(only)} ${note}: a measured potential can differ from it (by the ohmic drop, or an offset of the instrument), so check the peak potentials`;
  }
  const best = measured[0] as number;
  for (const j of set) {
    slots[j] = { role: 'other', why: `its name marks the potential the instrument applied, not the measured one: ${what(best)} is used as the potential; this one is kept as an extra column` };
  }
  const chosen = slots[best] as Slot;
  slots[best] = { role: 'potential', why: `${chosen.why}; chosen over ${set.map(what).join(', ')}, whose name marks an applied (set) value` };
  const gap = medianGap(columns[best] as Float64Array, columns[set[0] as number] as Float64Array);
  const unitsAgree = (headers[best]?.unit?.symbol ?? '') === (headers[set[0] as number]?.unit?.symbol ?? '');
  const unit = headers[best]?.unit?.symbol ? ` ${headers[best]?.unit?.symbol}` : '';
  const differ = gap !== null && unitsAgree ? ` (applied minus measured: ${gap > 0 ? '+' : ''}${fmt(gap)}${unit}, median over the rows)` : '';
  return `${what(best)} is used as the potential; ${set.map(what).join(', ')} ${set.length > 1 ? 'name' : 'names'} the potential the instrument applied, not the measured one, and ${set.length > 1 ? 'are' : 'is'} kept as an extra column${differ}. If the applied potential is wanted, choose it with a column override`;
}

/** Median of b − a over the rows where both are numbers, or null when none are. */
function medianGap(a: Float64Array, b: Float64Array): number | null {
  const stride = Math.max(1, Math.floor(a.length / 20000));
  const gaps: number[] = [];
  for (let i = 0; i < a.length && i < b.length; i += stride) {
    const d = (b[i] as number) - (a[i] as number);
    if (Number.isFinite(d)) gaps.push(d);
  }
  if (!gaps.length) return null;
  gaps.sort((x, y) => x - y);
  return gaps[Math.floor(gaps.length / 2)] as number;
}

function dedupeRoles(slots: Slot[], headers: (HeaderReading | null)[]): void {
  const taken = new Set<ColumnRole>();
  slots.forEach((s, j) => {
    if (!s.role || s.role === 'other' || s.role === 'index') return;
    if (taken.has(s.role)) {
      slots[j] = { role: 'other', why: `a second ${s.role} column ("${headers[j]?.label ?? ''}"); the first one is used, this one is kept as an extra column` };
    } else taken.add(s.role);
  });
}

function applyOverrides(fileName: string, slots: Slot[], stats: ColumnStats[], o: ImportOverrides): void {
  for (const [role, key] of OVERRIDE_KEYS) {
    const idx = o[key];
    if (idx === undefined) continue;
    if (role === 'cycle' && idx === -1) {
      slots.forEach((s, j) => { if (s.role === 'cycle') slots[j] = { role: 'other', why: 'cycle column ignored (set by the user)' }; });
      continue;
    }
    if (!Number.isInteger(idx) || idx < 0 || idx >= slots.length) {
      throw new ImportError('BAD_OVERRIDE', fileName, `the ${role} column was set to ${Number.isInteger(idx) ? idx + 1 : idx}, but the table has ${slots.length} columns`);
    }
    if ((stats[idx] as ColumnStats).finite === 0) {
      throw new ImportError('BAD_OVERRIDE', fileName, `the ${role} column was set to column ${idx + 1}, which holds no numbers`, { column: idx + 1 });
    }
    slots.forEach((s, j) => { if (s.role === role && j !== idx) slots[j] = { role: 'other', why: `was taken for ${role}, but the user chose column ${idx + 1}` }; });
    slots[idx] = { role, why: `${role} (set by the user)` };
  }
}

/**
 * Names that all say something else: every named numeric column is another quantity by its word
 * ("Freq", "Phase"), its role (time, cycle, index) or a unit that is no potential or current
 * ("Z' (Ohm)"). Guessing roles from the numbers would then analyse a table that is not a
 * voltammogram (an impedance spectrum's Z′ as the potential), so it is refused instead. A name
 * that says nothing ("x", "Ch1") still leaves the roles to the numbers.
 */
function refuseForeignNames(fileName: string, names: string[] | null, headers: (HeaderReading | null)[], slots: Slot[], stats: ColumnStats[]): void {
  if (!names || names.length !== slots.length) return;
  const foreignUnit = (j: number) => !headers[j]?.unit && /[([][^)\]]*[a-zΩ°][^)\]]*[)\]]\s*$/i.test(names[j] ?? '');
  const named = names.map((_, j) => j).filter((j) => (stats[j] as ColumnStats).finite > 0);
  const sayElse = (j: number) => (headers[j]?.role && headers[j]?.role !== 'potential' && headers[j]?.role !== 'current') || foreignUnit(j);
  if (named.length < 2 || slots.some((s) => s.role === 'potential' || s.role === 'current') || !named.every(sayElse)) return;
  const list = listSome(named.map((j) => `"${(names[j] as string).trim()}"`), named.length);
  throw new ImportError('NO_TABLE', fileName, `the column names (${list}) name no potential and no current, so this does not look like a voltammogram; if it is one, choose its potential and current columns with a column override`);
}

/**
 * A cycle column (named or guessed) that steps at every vertex counts sweeps, not cycles
 * (sweepCounter.ts): it is kept as an extra column and the cycles are found from the potential.
 */
function dropSweepCounter(fileName: string, slots: Slot[], columns: Float64Array[], potential: number, cycle: number, warnings: ImportWarning[]): void {
  if (cycle < 0) return;
  const count = sweepCounterOf(columns[potential] as Float64Array, columns[cycle] as Float64Array);
  if (!count) return;
  const why = `steps at every turn of the potential (${count.steps} steps at its ${count.vertices} vertices), so it counts sweeps, not cycles (a cycle holds two sweeps); cycles are found from the potential and this column is kept as an extra column`;
  slots[cycle] = { role: 'other', why };
  warnings.push(makeWarning('CYCLE_COLUMN_IGNORED', `${fileName}: column ${cycle + 1} ${why}. If it does number cycles, choose it as the cycle column`));
}

/** `noCycle`: the user said the file has no cycle column, so none is guessed. */
function inferMissing(slots: Slot[], stats: ColumnStats[], columns: Float64Array[], warnings: ImportWarning[], fileName: string, noCycle: boolean): void {
  // Kept incrementally (not recounted per column), so a file with 10⁶ columns stays linear.
  const roles = new Set<ColumnRole | null>(slots.map((s) => s.role));
  let freeCount = slots.reduce((n, s) => n + (s.role === null ? 1 : 0), 0);
  const isFree = (j: number) => (slots[j] as Slot).role === null;
  const free = () => slots.map((s, j) => (s.role === null ? j : -1)).filter((j) => j >= 0);
  let rows = 0;
  for (const s of stats) rows = Math.max(rows, s.finite);
  const guessed: string[] = [];
  const set = (j: number, role: ColumnRole, why: string) => {
    slots[j] = { role, why };
    roles.add(role);
    freeCount--;
    guessed.push(`column ${j + 1} → ${role}`);
  };
  // Counters, cycle numbers and time only when enough columns remain for potential and current.
  const spare = () => freeCount - (roles.has('potential') ? 0 : 1) - (roles.has('current') ? 0 : 1);
  const st = (j: number) => stats[j] as ColumnStats;
  for (let j = 0; j < slots.length; j++) if (isFree(j) && spare() > 0 && looksLikeIndex(st(j))) set(j, 'index', 'index — counts 0, 1, 2… (or 1, 2, 3…) row by row');
  for (let j = 0; j < slots.length; j++) {
    if (!isFree(j) || spare() <= 0 || roles.has('cycle') || !looksLikeCycle(st(j), rows)) continue;
    if (!noCycle) set(j, 'cycle', `cycle — small whole numbers that only rise (${st(j).distinct} values)`);
    else {
      slots[j] = { role: 'other', why: 'small whole numbers that only rise, as cycle numbers do, but the user set no cycle column; kept as an extra column' };
      freeCount--;
    }
  }
  // Of several rising columns (a single forward sweep rises too), time is the one starting nearest 0.
  const offset = (j: number) => Math.abs(st(j).min) / (st(j).max - st(j).min);
  let t: number | undefined;
  for (let j = 0; j < slots.length; j++) if (isFree(j) && looksLikeTime(st(j)) && (t === undefined || offset(j) < offset(t))) t = j;
  if (t !== undefined && spare() > 0 && !roles.has('time')) set(t, 'time', 'time — rises steadily from row to row, starting nearest 0');
  let shapeNote = '';
  if (!roles.has('potential') && freeCount > 0) {
    const [j, why, note] = guessPotential(free(), stats, columns);
    set(j, 'potential', why);
    shapeNote = note;
  }
  if (!roles.has('current') && freeCount > 0) set(slots.findIndex((s) => s.role === null), 'current', 'current — the first unnamed numeric column left beside the potential');
  slots.forEach((s, j) => { if (s.role === null) slots[j] = { role: 'other', why: 'not recognised; kept as an extra column' }; });
  if (guessed.length) {
    warnings.push(makeWarning('ROLE_GUESSED', `${fileName}: column roles guessed from the numbers, not from a header (${listSome(guessed)})${shapeNote}; check them and override if wrong`));
  }
}

/**
 * The potential among unnamed columns, told by its shape: a swept potential runs as a triangle
 * wave (nearly constant steps, few turns) and a current does not, whatever the column order or the
 * size of the numbers. When the shape does not single out one column (a resistor's current is a
 * triangle too; a noisy potential is none), the first one is taken (potential-then-current is the
 * usual order), unless the first is tiny (below 0.01, as currents in amperes are) while another is
 * not, or another rises and falls far more smoothly. The third value is the note for the warning.
 */
function guessPotential(cands: number[], stats: ColumnStats[], columns: Float64Array[]): [number, string, string] {
  const first = cands[0] as number;
  const s0 = stats[first] as ColumnStats;
  if (cands.length > 1) {
    const shapes = new Map(cands.map((j) => [j, sweepShape(columns[j] as Float64Array)]));
    const sweeps = cands.filter((j) => looksLikeSweep(shapes.get(j) as ReturnType<typeof sweepShape>));
    if (sweeps.length === 1) {
      const j = sweeps[0] as number;
      const sh = shapes.get(j) as ReturnType<typeof sweepShape>;
      const shape = `runs as a triangle wave (${sh.turns} turns, ${Math.round(sh.steady * 100)} % of its steps within 25 % of ${fmt(sh.usualStep)})`;
      const others = cands.filter((c) => c !== j).map((c) => `column ${c + 1}`).join(', ');
      const swapped = j !== first ? ` (column ${first + 1} comes first, so the columns look swapped against the usual order, potential first)` : '';
      const verdict = `${shape}, ${others} ${cands.length > 2 ? 'do' : 'does'} not${swapped}`;
      return [j, `potential — told from the shape of the numbers: it ${verdict}`, `; the potential was told from the shape of the numbers: column ${j + 1} ${verdict}`];
    }
  }
  const larger = cands.find((j) => j !== first && s0.maxAbs < 0.01 && (stats[j] as ColumnStats).maxAbs >= 0.05);
  if (larger !== undefined) {
    return [larger, `potential — values reach ${fmt((stats[larger] as ColumnStats).maxAbs)}, while column ${first + 1} stays below 0.01 as currents in amperes do`, ''];
  }
  const smoother = cands.find((j) => j !== first && (stats[j] as ColumnStats).wander * 3 < s0.wander);
  if (smoother !== undefined) {
    return [smoother, `potential — it rises and falls smoothly (${fmt((stats[smoother] as ColumnStats).wander)} spans of travel against ${fmt(s0.wander)} for column ${first + 1})`, ''];
  }
  return [first, 'potential — the first unnamed numeric column (the usual order is potential, then current)', ''];
}

function fmt(x: number): string {
  return Number.isFinite(x) ? String(+x.toPrecision(3)) : '∞';
}
