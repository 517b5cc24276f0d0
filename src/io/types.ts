/**
 * The importer's data model: what a file became (Measurement), what was guessed on the way
 * (ImportDetection, each guess with a plain-language explanation) and what the user may force
 * (ImportOverrides). Arrays are always in SI/core units and the IUPAC current convention.
 */
import type { CurrentConvention, CurrentKind, Voltammogram } from '../core/types';
import type { ImportWarning } from './errors';

export type Delimiter = ',' | ';' | '\t' | 'whitespace';
export type DecimalMark = '.' | ',';
export type { CurrentConvention } from '../core/types';
export type TextEncoding = 'utf-8' | 'utf-16le' | 'utf-16be' | 'latin1';
export type PotentialUnit = 'V' | 'mV' | 'µV';
export type CurrentUnit = 'A' | 'mA' | 'µA' | 'nA' | 'pA';
export type TimeUnit = 's' | 'ms' | 'µs' | 'min' | 'h';
export type { CurrentKind } from '../core/types';
export type ColumnRole = 'potential' | 'current' | 'time' | 'cycle' | 'index' | 'other';

/** What the user may force. Column indices are 0-based here (the CLI takes 1-based ones). */
export interface ImportOverrides {
  delimiter?: Delimiter;
  decimalMark?: DecimalMark;
  /** 1-based line number of the header line; 0 means "the file has no header line". */
  headerLine?: number;
  potentialColumn?: number;
  currentColumn?: number;
  timeColumn?: number;
  /** -1 means "ignore any cycle column and split cycles from the potential trace". */
  cycleColumn?: number;
  potentialUnit?: PotentialUnit;
  currentUnit?: CurrentUnit;
  timeUnit?: TimeUnit;
  /** Scan rate in V/s; beats every other source. */
  scanRateVPerS?: number;
  currentConvention?: CurrentConvention;
  encoding?: TextEncoding;
}

/** One guess: the value chosen, whether the user forced it, and why. */
export interface Guess<T> {
  value: T;
  overridden: boolean;
  explanation: string;
}

export interface DetectedColumn {
  /** 0-based index in the table. */
  index: number;
  /** Header text, or "column N" when the file has no header. */
  name: string;
  role: ColumnRole;
  /** Unit as read or assumed ('' for counts and unknown columns). */
  unit: string;
  explanation: string;
}

export interface ImportDetection {
  encoding: Guess<TextEncoding>;
  lineEnding: Guess<'LF' | 'CRLF' | 'CR' | 'mixed' | 'none'>;
  delimiter: Guess<Delimiter>;
  decimalMark: Guess<DecimalMark>;
  /** 1-based header line, or null when there is none. */
  headerLine: Guess<number | null>;
  columns: DetectedColumn[];
  potentialUnit: Guess<PotentialUnit>;
  currentUnit: Guess<CurrentUnit>;
  timeUnit: Guess<TimeUnit> | null;
  currentConvention: Guess<CurrentConvention>;
  /** Whether the chosen current column holds a current or a current density, and why. */
  currentKind: Guess<CurrentKind>;
  /** The scale the potentials were recorded against, as the file names it (preamble, column name or units row), and where. */
  reference: Guess<string | null>;
  /** 1-based lines of the header block: names, units row, comment lines among them. */
  headerBlock: { namesLine: number | null; unitsLine: number | null; commentLines: number[] };
  scanRate: Guess<number | null>;
  /** 1-based first and last line of the numeric table. */
  tableLines: { first: number; last: number };
  rowsRead: number;
  rowsSkipped: number;
  /** The file's first lines as decoded (at most 40, each cut at 240 characters), so a user can
   * see the raw text next to the guesses and pick another header line. */
  headLines: string[];
  /** Non-numeric lines after the last data row (left out, not counted as skipped). */
  footer: { lines: number; firstLine: number | null };
  cycleCount: number;
}

/** A value read from the preamble, in core units, with the line it came from. */
export interface PreambleValue {
  value: number;
  /** 1-based line of the preamble. */
  line: number;
  text: string;
}

export interface Measurement extends Voltammogram {
  id: string;
  fileName: string;
  metadata: Record<string, string>;
  preamble: string[];
  detection: ImportDetection;
  currentConvention: CurrentConvention;
  /**
   * What `currentA` holds: 'current' (A), or 'density' (A/cm²) when the file gave only a current
   * density and stated no electrode area. Results built from a 'density' file are per cm².
   */
  currentKind: CurrentKind;
  /** When the file's current column was a density: the area (cm², from the preamble) it was multiplied by to give `currentA` in A; null otherwise. */
  densityAreaCm2: PreambleValue | null;
  /** The recording scale named in the file (preamble, else the potential column's name or units row), e.g. "RHE", "Ag/AgCl". */
  referenceElectrode: string | null;
  temperatureK: PreambleValue | null;
  areaCm2: PreambleValue | null;
  concentrationMolPerCm3: PreambleValue | null;
  /** Per-point cycle number from the file's cycle column, when it had one. */
  cycleColumn: Float64Array | null;
  /** Extra numeric columns (charge, second electrode...), by header name, unconverted. */
  extraColumns: Record<string, Float64Array>;
}

export interface ImportResult {
  measurement: Measurement;
  warnings: ImportWarning[];
}

export interface ImportOptions {
  overrides?: ImportOverrides;
  /**
   * How the table is tokenised: 'auto' reads quote-free chunks in place and quoted ones with
   * papaparse; 'papaparse' sends every chunk through papaparse (the reference the fuzz suite
   * compares the fast path with). @default 'auto'
   */
  tableReader?: 'auto' | 'papaparse';
  /** Called with the fraction done, 0..1, a few dozen times per file at most. */
  onProgress?: (fraction: number) => void;
}
