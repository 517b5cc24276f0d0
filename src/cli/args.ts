/**
 * Small argument parser for the CLI: `--name value`, `--name=value`, boolean `--flag`, and
 * positionals. Unknown options are an error (exit 2) so typos never pass silently.
 */
import { UsageError } from './errors';

export interface OptionSpec {
  /** Takes a value (true) or is a flag (false). */
  value: boolean;
  /** May be given more than once (values are collected). */
  repeat?: boolean;
}

export interface ParsedArgs {
  positionals: string[];
  options: Map<string, string[]>;
  flags: Set<string>;
}

export function parseArgs(argv: string[], spec: Record<string, OptionSpec>): ParsedArgs {
  const out: ParsedArgs = { positionals: [], options: new Map(), flags: new Set() };
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i] as string;
    if (arg === '--') {
      out.positionals.push(...argv.slice(i + 1));
      break;
    }
    if (!arg.startsWith('--') || arg === '-') {
      out.positionals.push(arg);
      continue;
    }
    const eq = arg.indexOf('=');
    const name = arg.slice(2, eq === -1 ? undefined : eq);
    const s = spec[name];
    if (!s) throw new UsageError(`unknown option --${name} (see --help)`);
    if (!s.value) {
      if (eq !== -1) throw new UsageError(`--${name} takes no value`);
      out.flags.add(name);
      continue;
    }
    const value = eq !== -1 ? arg.slice(eq + 1) : argv[++i];
    if (value === undefined) throw new UsageError(`--${name} needs a value`);
    const list = out.options.get(name) ?? [];
    if (list.length && !s.repeat) throw new UsageError(`--${name} given more than once`);
    list.push(value);
    out.options.set(name, list);
  }
  return out;
}

/** The single value of an option, or undefined. */
export function optionString(args: ParsedArgs, name: string): string | undefined {
  return args.options.get(name)?.[0];
}

/** A numeric option, checked for finiteness and range; `fallback` when absent. */
export function optionNumber(args: ParsedArgs, name: string, fallback: number, min = -Infinity, max = Infinity): number {
  const raw = optionString(args, name);
  if (raw === undefined) return fallback;
  const v = Number(raw.trim());
  if (raw.trim() === '' || !Number.isFinite(v)) throw new UsageError(`--${name} must be a number, got "${raw}"`);
  if (v < min || v > max) throw new UsageError(`--${name} must lie between ${min} and ${max}, got ${v}`);
  return v;
}

/** Like optionNumber, but undefined when absent. */
export function optionNumberOrUndefined(args: ParsedArgs, name: string, min = -Infinity, max = Infinity): number | undefined {
  return optionString(args, name) === undefined ? undefined : optionNumber(args, name, 0, min, max);
}
