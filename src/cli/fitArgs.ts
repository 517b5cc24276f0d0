/**
 * Arguments of `halfwave fit`, converted to core units at this edge: --conc mM → mol/cm³,
 * --temp °C → K; --window and --start values are in the units of each parameter (V, cm/s, cm²/s,
 * 1/s, mol/cm², Ω, F/cm²).
 */
import { ZERO_CELSIUS_K } from '../core/constants';
import type { CoupleValues, FitMechanism, FitParameter, FitVoltammogramsOptions, SharedValues } from '../core/fit';
import { optionNumberOrUndefined, optionString, type ParsedArgs } from './args';
import { UsageError } from './errors';
import { PARAMETER_NAMES } from '../io';

export type CompareChoice = 'auto' | 'none' | 'mechanism' | 'ru';

export interface FitArgs {
  files: string[];
  mechanism: FitMechanism;
  coupleCount: number;
  free?: FitParameter[];
  windowV?: [number, number];
  areaCm2?: number;
  concentrationMolPerCm3?: number;
  electronCount?: number;
  temperatureK?: number;
  /** Known R_u (held) or the start of a fitted one, Ω; the core's default (0 Ω held, estimated when fitted) when absent. */
  ruOhm?: number;
  cycle: number;
  maxIterations: number;
  compare: CompareChoice;
  start: NonNullable<FitVoltammogramsOptions['start']>;
  json: boolean;
}

const SHARED = new Set(['uncompensatedOhm', 'doubleLayerFPerCm2']);

export function parseFitArgs(a: ParsedArgs): FitArgs {
  const mechanism = optionString(a, 'mechanism') ?? 'E';
  if (mechanism !== 'E' && mechanism !== 'EC' && mechanism !== 'surface') throw new UsageError(`--mechanism must be E, EC or surface, got "${mechanism}"`);
  const couples = optionNumberOrUndefined(a, 'couples', 1, 4) ?? 1;
  if (!Number.isInteger(couples)) throw new UsageError(`--couples must be a whole number from 1 to 4, got ${couples}`);
  const out: FitArgs = {
    files: a.positionals, mechanism, coupleCount: couples,
    cycle: wholeNumber(a, 'cycle', 1), maxIterations: wholeNumber(a, 'max-iterations', 60), compare: compareOf(a), start: parseStart(optionString(a, 'start'), couples), json: a.flags.has('json'),
  };
  const free = optionString(a, 'free');
  if (free !== undefined) out.free = parseFree(free, mechanism);
  const windowV = optionString(a, 'window');
  if (windowV !== undefined) out.windowV = parseWindow(windowV);
  const area = optionNumberOrUndefined(a, 'area', 1e-12, 1e6);
  if (area !== undefined) out.areaCm2 = area;
  const conc = optionNumberOrUndefined(a, 'conc', 1e-9, 1e5);
  if (conc !== undefined) out.concentrationMolPerCm3 = conc * 1e-6;
  const n = optionNumberOrUndefined(a, 'n', 1, 6);
  if (n !== undefined) {
    if (!Number.isInteger(n)) throw new UsageError(`--n must be a whole number of electrons, got ${n}`);
    out.electronCount = n;
  }
  const temp = optionNumberOrUndefined(a, 'temp', -100, 400);
  if (temp !== undefined) out.temperatureK = temp + ZERO_CELSIUS_K;
  const ru = optionNumberOrUndefined(a, 'ru', 0, 1e9);
  if (ru !== undefined) {
    out.ruOhm = ru;
    out.start.shared = { uncompensatedOhm: ru, ...out.start.shared };
  }
  return out;
}

function wholeNumber(a: ParsedArgs, name: string, fallback: number): number {
  const v = optionNumberOrUndefined(a, name, 1, 1e6) ?? fallback;
  if (!Number.isInteger(v)) throw new UsageError(`--${name} must be a whole number, got ${v}`);
  return v;
}

function compareOf(a: ParsedArgs): CompareChoice {
  const raw = optionString(a, 'compare') ?? 'auto';
  if (raw !== 'auto' && raw !== 'none' && raw !== 'mechanism' && raw !== 'ru') throw new UsageError(`--compare must be auto, none, mechanism or ru, got "${raw}"`);
  return raw;
}

function coreName(name: string, option: string): FitParameter {
  const p = PARAMETER_NAMES[name];
  if (!p) throw new UsageError(`${option}: unknown parameter "${name}" (use ${Object.keys(PARAMETER_NAMES).join(', ')})`);
  return p;
}

const MECHANISM_NAMES: Record<FitMechanism, string[]> = {
  E: ['E0', 'k0', 'alpha', 'D', 'Dratio', 'Ru', 'Cdl', 'background'],
  EC: ['E0', 'k0', 'alpha', 'D', 'Dratio', 'kf', 'Ru', 'Cdl', 'background'],
  surface: ['E0', 'alpha', 'gamma', 'ks', 'Ru', 'Cdl', 'background'],
};

export function parseFree(raw: string, mechanism: FitMechanism): FitParameter[] {
  const names = raw.split(',').map((s) => s.trim()).filter(Boolean);
  if (!names.length) throw new UsageError('--free needs at least one parameter, e.g. E0,k0,alpha,D');
  const core = names.map((n) => coreName(n, '--free'));
  const foreign = names.filter((n) => !MECHANISM_NAMES[mechanism].includes(n));
  if (foreign.length) throw new UsageError(`--free: ${foreign.join(', ')} not in the ${mechanism} mechanism (it has ${MECHANISM_NAMES[mechanism].join(', ')})`);
  return core;
}

/** "LO:HI" in V, either order. */
export function parseWindow(raw: string): [number, number] {
  const parts = raw.split(':').map((s) => s.trim());
  const [lo, hi] = parts.map(Number);
  if (parts.length !== 2 || parts.some((p) => p === '') || !Number.isFinite(lo) || !Number.isFinite(hi) || lo === hi) {
    throw new UsageError(`--window takes LO:HI in V, e.g. -0.4:0.5, got "${raw}"`);
  }
  return [lo as number, hi as number];
}

/** "k0=0.01,alpha=0.5,E0[2]=-0.1,Cdl=2e-5": starting values of free and values of held parameters. */
export function parseStart(raw: string | undefined, coupleCount: number): NonNullable<FitVoltammogramsOptions['start']> {
  const couples: Partial<CoupleValues>[] = Array.from({ length: coupleCount }, () => ({}));
  const shared: Partial<SharedValues> = {};
  for (const part of (raw ?? '').split(',').map((s) => s.trim()).filter(Boolean)) {
    const m = /^(\w+)(?:\[(\d+)\])?=(.+)$/.exec(part);
    const value = m ? Number(m[3]) : Number.NaN;
    if (!m || !Number.isFinite(value)) throw new UsageError(`--start takes NAME=VALUE pairs, e.g. k0=0.01,E0[2]=-0.1; could not read "${part}"`);
    const p = coreName(m[1] as string, '--start');
    if (p === 'background') throw new UsageError('--start: the background has no starting value (it is solved exactly)');
    if (SHARED.has(p)) {
      shared[p as keyof SharedValues] = value;
      continue;
    }
    const index = m[2] === undefined ? null : Number(m[2]) - 1;
    if (index !== null && !(index >= 0 && index < coupleCount)) throw new UsageError(`--start: ${part} names couple ${index + 1}, but --couples is ${coupleCount}`);
    for (const [j, c] of couples.entries()) if (index === null || index === j) c[p as keyof CoupleValues] = value;
  }
  return { couples, shared };
}
