/**
 * The one table of the importer's choices a person can force: delimiters, decimal marks, text
 * encodings, units and the current sign. The command line reads its flags through it, the
 * override form lists it, and the layout description in the results sheet names values with it.
 */
import type { CurrentConvention, CurrentUnit, DecimalMark, Delimiter, PotentialUnit, TextEncoding, TimeUnit } from './types';

export interface Choice<T> {
  value: T;
  /** Plain words, as the form and the results sheet show them. */
  label: string;
  /** What the command line accepts for it (lower case), the first being the name it prints. */
  names: string[];
}

export const DELIMITER_CHOICES: readonly Choice<Delimiter>[] = [
  { value: ',', label: 'comma', names: ['comma', ','] },
  { value: ';', label: 'semicolon', names: ['semicolon', ';'] },
  { value: '\t', label: 'tab', names: ['tab', '\\t'] },
  { value: 'whitespace', label: 'spaces', names: ['space', 'spaces', 'whitespace'] },
];

export const DECIMAL_CHOICES: readonly Choice<DecimalMark>[] = [
  { value: '.', label: 'point', names: ['point', 'dot', '.'] },
  { value: ',', label: 'comma', names: ['comma', ','] },
];

export const ENCODING_CHOICES: readonly Choice<TextEncoding>[] = [
  { value: 'utf-8', label: 'UTF-8', names: ['utf-8', 'utf8'] },
  { value: 'utf-16le', label: 'UTF-16 LE', names: ['utf-16le'] },
  { value: 'utf-16be', label: 'UTF-16 BE', names: ['utf-16be'] },
  { value: 'latin1', label: 'Latin-1', names: ['latin1', 'latin-1', 'iso-8859-1'] },
];

export const CONVENTION_CHOICES: readonly Choice<CurrentConvention>[] = [
  { value: 'iupac', label: 'anodic positive (IUPAC)', names: ['iupac'] },
  { value: 'polarographic', label: 'cathodic positive (polarographic)', names: ['polarographic'] },
];

const units = <T extends string>(list: readonly T[], extra: Partial<Record<T, string[]>> = {}): Choice<T>[] =>
  list.map((u) => ({ value: u, label: u, names: [u.toLowerCase(), ...(extra[u] ?? [])] }));

export const POTENTIAL_UNIT_CHOICES: readonly Choice<PotentialUnit>[] = units<PotentialUnit>(['V', 'mV', 'µV'], { 'µV': ['uv'] });
export const CURRENT_UNIT_CHOICES: readonly Choice<CurrentUnit>[] = units<CurrentUnit>(['A', 'mA', 'µA', 'nA', 'pA'], { 'µA': ['ua'] });
export const TIME_UNIT_CHOICES: readonly Choice<TimeUnit>[] = units<TimeUnit>(['s', 'ms', 'µs', 'min', 'h'], { 'µs': ['us'] });

/** The choice a typed name stands for (case-insensitive), or undefined. */
export function choiceNamed<T>(choices: readonly Choice<T>[], raw: string): Choice<T> | undefined {
  const key = raw.trim().toLowerCase();
  return choices.find((c) => c.names.includes(key) || c.names.includes(raw));
}

/** The label of a value, or the value itself when it is not in the table. */
export function labelOf<T>(choices: readonly Choice<T>[], value: T): string {
  return choices.find((c) => c.value === value)?.label ?? String(value);
}

/** "comma, semicolon, tab, space": the names the command line prints for a table. */
export function choiceNames<T>(choices: readonly Choice<T>[]): string {
  return choices.map((c) => c.names[0]).join(', ');
}
