/**
 * Rows left out because a value the analysis needs (potential, current, time, cycle) is not a
 * finite number: counted, located and explained. A few such rows (NaN cells, a damaged line) are
 * a warning; more than LOUD_DROP_FRACTION of the table is a loud warning that says how many and
 * why; more than REFUSE_DROP_FRACTION refuses the file, since what would be analysed is no longer
 * the measurement (grouped digits the reader could not read, units in the cells, a column that is
 * mostly empty). Thresholds: common practice, no source.
 */
import type { RoleAssignment } from './assignColumns';
import { describeLines, ImportError, makeWarning } from './errors';
import type { ImportWarning } from './errors';
import type { ParsedTable } from './parseTable';
import { whyNotANumber } from './unusualNumber';

/** Above this fraction of the table's rows (and more than LOUD_DROP_ROWS rows), leaving rows out is said loudly. */
export const LOUD_DROP_FRACTION = 0.02;
export const LOUD_DROP_ROWS = 3;
/** Above this fraction, the file is refused. */
export const REFUSE_DROP_FRACTION = 0.5;

export interface DroppedRows {
  count: number;
  /** The first 20 lines left out. */
  lines: number[];
}

/**
 * Warns about (or refuses) the lines skipped inside the table (t.skippedCount: too few numbers)
 * and the rows left out for a needed value (`dropped`); `needed` are the 0-based columns the rows need.
 */
export function reportDroppedRows(fileName: string, t: ParsedTable, a: RoleAssignment, needed: number[], decimalComma: boolean, dropped: DroppedRows, warnings: ImportWarning[]): void {
  const count = dropped.count + t.skippedCount;
  if (!count) return;
  const total = t.rowCount + t.skippedCount;
  const fraction = count / Math.max(1, total);
  if (fraction <= LOUD_DROP_FRACTION || count <= LOUD_DROP_ROWS) {
    if (t.skippedCount) warnings.push(makeWarning('SKIPPED_ROWS', `${fileName}: ${t.skippedCount} line${t.skippedCount === 1 ? '' : 's'} inside the table skipped (too few fields or not numbers) — line${t.skippedCount === 1 ? '' : 's'} ${describeLines(t.skippedLines, t.skippedCount)}`, t.skippedLines, t.skippedCount));
    if (dropped.count) warnings.push(makeWarning('SKIPPED_ROWS', `${fileName}: ${dropped.count} rows skipped because a needed value was not a finite number (NaN, Inf or empty) — lines ${describeLines(dropped.lines, dropped.count)}`, dropped.lines, dropped.count));
    return;
  }
  const lines = [...t.skippedLines, ...dropped.lines].sort((x, y) => x - y).slice(0, 20);
  const cause = causeOf(t, a, needed, decimalComma);
  const share = `${count} of ${total} rows (${(100 * fraction).toFixed(fraction < 0.1 ? 1 : 0)} %)`;
  if (fraction > REFUSE_DROP_FRACTION) {
    throw new ImportError('UNREADABLE_VALUES', fileName, `${share} have no usable value in a column the analysis needs, so what is left is not the measurement: ${cause.text}. Fix the export (or set the delimiter, decimal mark or columns) and read it again`, cause.where);
  }
  warnings.push(makeWarning('MANY_ROWS_DROPPED', `${fileName}: ⚠ ${share} LEFT OUT, lines ${describeLines(lines, count)}: ${cause.text}. The analysis sees only the rest of the trace; check the file`, lines, count));
}

/**
 * Refuses a table in which a column's cells are mostly numbers written in a way no reader takes
 * (the decimal mark twice, units in every cell), before its columns are given roles: such a
 * column would otherwise be set aside as text and the file misread or refused without the cause.
 * A column of text (a comment, a time stamp) is not concerned: whyNotANumber finds no reason.
 */
export function refuseNumberLikeColumns(fileName: string, t: ParsedTable, names: string[] | null, decimalComma: boolean): void {
  const total = t.rowCount + t.skippedCount;
  for (const u of t.unreadable) {
    if (u.count <= REFUSE_DROP_FRACTION * total) continue;
    const why = whyNotANumber(u.text, decimalComma);
    if (!why) continue;
    const name = names?.[u.column] ? ` ("${names[u.column]}")` : '';
    throw new ImportError('UNREADABLE_VALUES', fileName, `${u.count} of ${total} rows (${Math.round((100 * u.count) / total)} %) cannot be read: column ${u.column + 1}${name} holds cells such as "${u.text}" (line ${u.firstLine}) that are not numbers — ${why}. Fix the export and read it again`, { line: u.firstLine, column: u.column + 1 });
  }
}

/** The needed column with the most cells no reader could read, and why; or empty cells. */
function causeOf(t: ParsedTable, a: RoleAssignment, needed: number[], decimalComma: boolean): { text: string; where: { line?: number; column?: number } } {
  let worst = null as ParsedTable['unreadable'][number] | null;
  // A needed column first; a line skipped for too few numbers may have its bad cell in any column.
  for (const u of t.unreadable) if ((!worst || u.count > worst.count) && (needed.includes(u.column) || t.skippedCount)) worst = u;
  if (!worst) return { text: 'the cells are empty or hold NaN/Inf', where: {} };
  const name = a.columns[worst.column]?.name ?? `column ${worst.column + 1}`;
  const why = whyNotANumber(worst.text, decimalComma);
  return {
    text: `column ${worst.column + 1} ("${name}") holds ${worst.count} cells such as "${worst.text}" (line ${worst.firstLine}) that are not numbers${why ? ` — ${why}` : ''}`,
    where: { line: worst.firstLine, column: worst.column + 1 },
  };
}
