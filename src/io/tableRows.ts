/**
 * Where the table's rows go while they are read: one growing Float64Array per column, the file
 * line of each row, and the text lines between data rows (skipped rows, or the seam of exports
 * joined together with their header repeated). Both row readers (the papaparse one and the
 * plain-table fast path) feed the same store, so they count and locate lines the same way.
 * Memory stays proportional to the text: short rows are padded with NaN only up to a budget.
 */
import { ImportError } from './errors';
import type { ParsedTable, TableSpec } from './parseTable';
import { isNonFiniteToken } from './textLines';
import { readUnusualNumber } from './unusualNumber';
import type { UnusualKind } from './unusualNumber';

/** Fields of one column read through readUnusualNumber (grouped digits, D exponents). */
export interface UnusualCells {
  /** 0-based column. */
  column: number;
  kind: UnusualKind;
  mark: string;
  count: number;
  firstLine: number;
}

/** Fields of one column that no reader could read, in data rows. */
export interface UnreadableCells {
  column: number;
  count: number;
  firstLine: number;
  /** The first such field as written (at most 40 characters). */
  text: string;
}

/** Padded cells allowed beyond four per cell actually read (common practice, no source). */
const PADDING_ALLOWANCE = 1 << 20;

/** Repeated headers remembered (with the row they stand before); the count goes on beyond. */
const MAX_SEAMS = 10000;

/**
 * Row buffers handed on from one table to the next, to spare new memory (why: core/scratch.ts):
 * every file of a batch needed about 60 KB of row buffers for a moment (a 120-file batch: 1,500
 * fewer page faults, the worker's CPU time 8 % less). Unlike a kept scratch array, a table's
 * buffers live across yields, so they are lent from a pool. A table takes buffers when it starts
 * and gives them back once its columns are copied out (`finish`); a table that fails keeps them,
 * and they go with it. Two tables read at the same time (an import yields between chunks) never
 * share one: a buffer is in the pool or in one table. Only buffers up to SPARE_MAX_LENGTH are
 * kept, at most SPARE_COUNT of each kind.
 */
const SPARE_MAX_LENGTH = 1 << 17;
const SPARE_COUNT = 8;
const spareColumns: Float64Array[] = [];
const spareLines: Int32Array[] = [];

function take<T extends Float64Array | Int32Array>(spares: T[], length: number, make: (n: number) => T): T {
  const k = spares.findIndex((b) => b.length >= length && b.length <= 4 * length);
  return k >= 0 ? (spares.splice(k, 1)[0] as T) : make(length);
}

function giveBack<T extends Float64Array | Int32Array>(spares: T[], buffer: T): void {
  if (buffer.length <= SPARE_MAX_LENGTH && spares.length < SPARE_COUNT && !spares.includes(buffer)) spares.push(buffer);
}

interface Pending {
  line: number;
  header: boolean;
  names: string[] | null;
  /** Fields of the line no reader could read, kept if the line turns out to be a skipped row. */
  unreadable: UnreadableCells[] | null;
}

export class TableRows {
  private columns: Float64Array[];
  private lines: Int32Array;
  /** Rows the buffers hold before they must grow. */
  private capacity: number;
  private n = 0;
  private pending: Pending[] = [];
  private readCells = 0;
  private paddedCells = 0;
  /** Notes on the fields of the row being read, kept only if it turns out to be a data row. */
  private rowUnusual: UnusualCells[] = [];
  private rowUnreadable: UnreadableCells[] = [];
  /** A blank or non-data line since the last data row. */
  private gap = false;
  readonly out: ParsedTable = { columns: [], lineOfRow: new Int32Array(0), rowCount: 0, skippedLines: [], skippedCount: 0, repeatedHeaderCount: 0, seamLines: 0, footerLines: 0, firstFooterLine: null, lastDataLine: 0, unusual: [], unreadable: [], lastBlockRow: 0, headerSeams: [], lineCount: 0, cutLastLine: null };

  constructor(private readonly k: number, textChars: number, private readonly fileName: string) {
    // A row of k fields takes at least 2k − 1 characters; start near the likely row count.
    const capacity = Math.min(1 << 20, Math.max(64, Math.ceil(textChars / Math.max(16, 4 * k))));
    this.columns = Array.from({ length: k }, () => take(spareColumns, capacity, (n) => new Float64Array(n)));
    this.lines = take(spareLines, capacity, (n) => new Int32Array(n));
    this.capacity = this.fittingRows();
  }

  /**
   * The value of field `j` (text `field`) that the strict reader refused: a grouped or
   * D-exponent number, or NaN, noted either way for the row being read.
   */
  readOther(field: string, j: number, decimalComma: boolean): number {
    const r = readUnusualNumber(field, decimalComma);
    if (r) {
      this.rowUnusual.push({ column: j, kind: r.kind, mark: r.mark, count: 1, firstLine: 0 });
      return r.value;
    }
    const t = field.trim();
    if (t !== '' && !isNonFiniteToken(t)) this.rowUnreadable.push({ column: j, count: 1, firstLine: 0, text: t.slice(0, 40) });
    return NaN;
  }

  /** Forgets the notes on the row being read (a row papaparse's reader would refuse unread). */
  forgetRow(): void {
    this.rowUnusual.length = 0;
    this.rowUnreadable.length = 0;
  }

  /** A blank line. */
  blank(): void {
    this.gap = true;
  }

  /** A data row: `values[0..k)`, of which the first `fields` came from the line (the rest NaN). */
  data(values: Float64Array, fields: number, line: number): void {
    this.flushPending();
    if (this.gap) {
      this.gap = false;
      this.out.lastBlockRow = this.n;
    }
    if (this.rowUnusual.length || this.rowUnreadable.length) this.keepNotes(line);
    const k = this.k;
    this.readCells += Math.min(fields, k);
    if (fields < k) {
      this.paddedCells += k - fields;
      if (this.paddedCells > 4 * this.readCells + PADDING_ALLOWANCE) throw this.raggedError(fields, line);
    }
    if (this.n === this.capacity) this.grow();
    for (let j = 0; j < k; j++) (this.columns[j] as Float64Array)[this.n] = values[j] as number;
    this.lines[this.n++] = line;
    this.out.lastDataLine = line;
  }

  /**
   * A line that is not a data row; `header` when it repeats the header line, `names` its fields
   * when they name the same columns with other units.
   */
  bad(line: number, header: boolean, names: string[] | null = null): void {
    const unreadable = this.rowUnreadable.length ? this.rowUnreadable : null;
    this.pending.push({ line, header: header || names !== null, names, unreadable });
    this.gap = true;
    this.rowUnusual.length = 0;
    if (unreadable) this.rowUnreadable = [];
  }

  private keepNotes(line: number): void {
    const out = this.out;
    for (const u of this.rowUnusual) {
      const seen = out.unusual.find((x) => x.column === u.column && x.kind === u.kind && x.mark === u.mark);
      if (seen) seen.count++;
      else out.unusual.push({ ...u, firstLine: line });
    }
    this.keepUnreadable(this.rowUnreadable, line);
    this.rowUnusual.length = 0;
    this.rowUnreadable.length = 0;
  }

  private keepUnreadable(cells: UnreadableCells[], line: number): void {
    for (const u of cells) {
      const seen = this.out.unreadable.find((x) => x.column === u.column);
      if (seen) seen.count++;
      else this.out.unreadable.push({ ...u, firstLine: line });
    }
  }

  finish(): ParsedTable {
    const out = this.out;
    out.footerLines = this.pending.length;
    out.firstFooterLine = this.pending[0]?.line ?? null;
    out.columns = this.columns.map((c) => c.slice(0, this.n));
    out.lineOfRow = this.lines.slice(0, this.n);
    out.rowCount = this.n;
    for (const c of this.columns) giveBack(spareColumns, c);
    giveBack(spareLines, this.lines);
    this.columns = [];
    this.lines = new Int32Array(0);
    return out;
  }

  /** Rows every buffer holds (a buffer from the pool can be longer than asked for). */
  private fittingRows(): number {
    let rows = this.lines.length;
    for (const c of this.columns) rows = Math.min(rows, c.length);
    return rows;
  }

  private grow(): void {
    const cap = this.capacity * 2;
    this.columns = this.columns.map((c) => {
      const g = take(spareColumns, cap, (n) => new Float64Array(n));
      g.set(c.subarray(0, this.n));
      giveBack(spareColumns, c);
      return g;
    });
    const l = take(spareLines, cap, (n) => new Int32Array(n));
    l.set(this.lines.subarray(0, this.n));
    giveBack(spareLines, this.lines);
    this.lines = l;
    this.capacity = this.fittingRows();
  }

  /**
   * Text lines between two data rows. A group that holds a copy of the header line is the seam of
   * two joined exports (their preamble and header), not damaged data, so it is not counted as skipped.
   */
  private flushPending(): void {
    const pending = this.pending;
    if (!pending.length) return;
    this.pending = [];
    const out = this.out;
    const header = pending.find((p) => p.header);
    if (header) {
      out.repeatedHeaderCount++;
      out.seamLines += pending.length;
      if (out.headerSeams.length < MAX_SEAMS) out.headerSeams.push({ row: this.n, line: header.line, names: header.names });
      return;
    }
    for (const p of pending) {
      out.skippedCount++;
      if (out.skippedLines.length < 20) out.skippedLines.push(p.line);
      if (p.unreadable) this.keepUnreadable(p.unreadable, p.line);
    }
  }

  private raggedError(fields: number, line: number): ImportError {
    return new ImportError('RAGGED_TABLE', this.fileName, `the table's rows are ${this.k} fields wide where it starts, but most rows down to here have far fewer (this one has ${fields}); check the delimiter, or cut the file into its separate tables`, { line });
  }
}

/** Hands a line that is not a data row to `rows`, telling whether it repeats the header. */
export function badLine(fields: string[], line: number, spec: TableSpec, rows: TableRows): void {
  if (spec.headerText === null) return rows.bad(line, false);
  if (fields.join('|') === spec.headerText) return rows.bad(line, true);
  rows.bad(line, false, spec.sameNamesOtherUnits?.(fields) ? fields : null);
}
