/**
 * Typed errors and warnings of the importer. An ImportError is thrown only when nothing usable
 * is left in a file; everything the importer can work around becomes an ImportWarning instead.
 * The CLI maps `name === 'ImportError'` to exit code 2; the worker forwards `code`.
 */

/**
 * EMPTY: no bytes or only blank lines. BINARY: not text (zero bytes, control characters, PDF).
 * SPREADSHEET_BINARY: an .xlsx/.ods (ZIP) or .xls (OLE2) file. IMAGE: PNG, JPEG, GIF, TIFF, BMP,
 * WebP. ENCODING: bytes invalid in the chosen encoding. NO_TABLE: no run of lines with two or
 * more numeric fields, or no column could be made the potential/current. ONE_COLUMN: numbers,
 * but one per line. TOO_FEW_POINTS: fewer than 3 usable rows. CONSTANT_POTENTIAL: the potential
 * never changes. NOT_A_SWEEP: the potential turns back at nearly every point. BAD_OVERRIDE: a
 * user override that cannot apply. TOO_MANY_COLUMNS: rows wider than any export of one
 * voltammogram. RAGGED_TABLE: most rows far narrower than the table's first rows (padding them
 * would take memory out of all proportion to the file). UNREADABLE_VALUES: more than half the
 * rows lack a needed value (cells that are not numbers, such as ambiguous thousands separators or
 * units in every cell). AMBIGUOUS_DECIMAL_COMMA: a comma-delimited table whose unquoted decimal
 * commas split each number in two (the header names fewer columns than the rows hold).
 * UNITS_CHANGE: a repeated header inside the table names a unit that cannot be converted to the
 * first header's. UNREADABLE: the browser could not hand
 * over the bytes of a picked file (moved, deleted or changed since the pick). INTERNAL: a fault in the importer
 * itself, still typed so that nothing untyped escapes (callers may treat it as exit 1).
 */
export type ImportErrorCode =
  | 'EMPTY'
  | 'BINARY'
  | 'SPREADSHEET_BINARY'
  | 'IMAGE'
  | 'ENCODING'
  | 'NO_TABLE'
  | 'ONE_COLUMN'
  | 'TOO_FEW_POINTS'
  | 'CONSTANT_POTENTIAL'
  | 'NOT_A_SWEEP'
  | 'BAD_OVERRIDE'
  | 'TOO_MANY_COLUMNS'
  | 'RAGGED_TABLE'
  | 'UNREADABLE_VALUES'
  | 'AMBIGUOUS_DECIMAL_COMMA'
  | 'UNITS_CHANGE'
  | 'UNREADABLE'
  | 'INTERNAL';

export class ImportError extends Error {
  readonly code: ImportErrorCode;
  readonly fileName: string;
  /** 1-based line of the file the error points at, when there is one. */
  readonly line: number | undefined;
  /** 1-based column (field) of the table the error points at, when there is one. */
  readonly column: number | undefined;
  constructor(code: ImportErrorCode, fileName: string, message: string, where: { line?: number; column?: number } = {}) {
    const at = [where.line !== undefined ? `line ${where.line}` : '', where.column !== undefined ? `column ${where.column}` : '']
      .filter(Boolean)
      .join(', ');
    super(`${fileName}${at ? ` (${at})` : ''}: ${message}`);
    this.name = 'ImportError';
    this.code = code;
    this.fileName = fileName;
    this.line = where.line;
    this.column = where.column;
  }
}

export type ImportWarningCode =
  | 'SKIPPED_ROWS'
  | 'MANY_ROWS_DROPPED'
  | 'LAST_ROW_CUT'
  | 'NUMERIC_FOOTER'
  | 'REPEATED_HEADER'
  | 'ENCODING_GUESSED'
  | 'UNIT_ASSUMED'
  | 'ROLE_GUESSED'
  | 'POTENTIAL_CHOSEN'
  | 'CURRENT_DENSITY'
  | 'REFERENCE_DISAGREES'
  | 'NO_SCAN_RATE'
  | 'SCAN_RATE_DISAGREES'
  | 'SCAN_RATE_UNEVEN'
  | 'SCAN_RATE_NO_UNIT'
  | 'TIME_NOT_MONOTONIC'
  | 'CYCLE_COLUMN_IGNORED'
  | 'CONVENTION_DOUBTED'
  | 'MINUS_SIGNS_READ';

export interface ImportWarning {
  code: ImportWarningCode;
  /** Plain-language sentence, naming the file. */
  message: string;
  /** 1-based lines concerned (at most the first 20 are listed). */
  lines?: number[];
  /** How many rows or lines the warning covers, when it counts something. */
  count?: number;
}

/** Builds a warning; keeps the line list short so that a million bad rows stay cheap. */
export function makeWarning(code: ImportWarningCode, message: string, lines?: number[], count?: number): ImportWarning {
  const w: ImportWarning = { code, message };
  if (lines && lines.length) w.lines = lines.slice(0, 20);
  if (count !== undefined) w.count = count;
  return w;
}

/** Formats a list of line numbers for a message: "12, 13, 40 and 7 more". */
export function describeLines(lines: number[], total: number): string {
  return listSome(lines.map(String), total, ', ', 5);
}

/** "a, b, c and 12 more": long lists (a file with thousands of columns) stay short in messages. */
export function listSome(items: string[], total = items.length, separator = ', ', shown = 8): string {
  const head = items.slice(0, shown).join(separator);
  return total > shown ? `${head} and ${total - shown} more` : head;
}
