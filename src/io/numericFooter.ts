/**
 * A short block of numeric rows after a blank or text line at the end of a table (a results
 * summary such as "0.2000,1.35e-5,-1.10e-5") is not part of the sweep when its potential does not
 * continue from where the sweep stopped: it is left out with a warning naming its lines. Limits:
 * at most MAX_FOOTER_ROWS rows, after at least MIN_TABLE_FACTOR times as many; "does not continue"
 * is a potential step above JUMP_FACTOR times the median step of the rows before. Common
 * practice, no source.
 */
import { makeWarning } from './errors';
import type { ImportWarning } from './errors';
import type { ParsedTable } from './parseTable';

const MAX_FOOTER_ROWS = 3;
const MIN_TABLE_FACTOR = 20;
const JUMP_FACTOR = 20;
const STEPS_COMPARED = 50;

/** Leaves out a trailing numeric block that does not continue the sweep in column `potential`. */
export function leaveOutNumericFooter(fileName: string, t: ParsedTable, potential: number, warnings: ImportWarning[]): void {
  const b = t.lastBlockRow;
  const n = t.rowCount;
  if (b <= 0 || n - b > MAX_FOOTER_ROWS || n - b < 1 || b < MIN_TABLE_FACTOR * (n - b)) return;
  const e = t.columns[potential] as Float64Array;
  const step = medianStep(e, Math.max(0, b - STEPS_COMPARED), b);
  const jump = Math.abs((e[b] as number) - (e[b - 1] as number));
  if (!(step > 0) || !(jump > JUMP_FACTOR * step)) return;
  const lines = Array.from(t.lineOfRow.subarray(b, n));
  t.rowCount = b;
  t.columns = t.columns.map((c) => c.subarray(0, b));
  t.lineOfRow = t.lineOfRow.subarray(0, b);
  t.lastDataLine = t.lineOfRow[b - 1] as number;
  // Text lines between the sweep and the block (a "Summary" title) belong to the footer too.
  const moved = t.skippedLines.filter((l) => l > t.lastDataLine);
  t.skippedLines = t.skippedLines.filter((l) => l <= t.lastDataLine);
  t.skippedCount -= moved.length;
  t.footerLines += moved.length + lines.length;
  t.firstFooterLine = moved[0] ?? lines[0] ?? null;
  const rows = lines.length > 1 ? `${lines.length} numeric rows` : 'numeric row';
  warnings.push(makeWarning('NUMERIC_FOOTER', `${fileName}: the ${rows} after the table's last break (line${lines.length > 1 ? 's' : ''} ${lines.join(', ')}) ${lines.length > 1 ? 'do' : 'does'} not continue the sweep (the potential jumps by ${jump.toPrecision(3)} where the steps before were about ${step.toPrecision(3)}): read as a footer such as a results summary and left out`, lines, lines.length));
}

function medianStep(e: Float64Array, from: number, to: number): number {
  const steps: number[] = [];
  for (let i = from + 1; i < to; i++) {
    const d = Math.abs((e[i] as number) - (e[i - 1] as number));
    if (Number.isFinite(d)) steps.push(d);
  }
  steps.sort((x, y) => x - y);
  return steps.length ? (steps[steps.length >> 1] as number) : NaN;
}
