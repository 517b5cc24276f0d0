/**
 * Where the table's rows go while they are read: one growing Float64Array per column, the file
 * line of each row, and the text lines between data rows (skipped rows, or the seam of exports
 * joined together with their header repeated). Both row readers (the papaparse one and the
 * plain-table fast path) feed the same store, so they count and locate lines the same way.
 * Memory stays proportional to the text: short rows are padded with NaN only up to a budget.
 */
import { ImportError } from './errors';
import type { ParsedTable } from './parseTable';

/** Padded cells allowed beyond four per cell actually read (common practice, no source). */
const PADDING_ALLOWANCE = 1 << 20;

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
  readonly out: ParsedTable = { columns: [], lineOfRow: new Int32Array(0), rowCount: 0, skippedLines: [], skippedCount: 0, repeatedHeaderCount: 0, seamLines: 0, footerLines: 0, firstFooterLine: null, lastDataLine: 0 };

  constructor(private readonly k: number, textChars: number, private readonly fileName: string) {
    // A row of k fields takes at least 2k − 1 characters; start near the likely row count.
    const capacity = Math.min(1 << 20, Math.max(64, Math.ceil(textChars / Math.max(16, 4 * k))));
    this.columns = Array.from({ length: k }, () => take(spareColumns, capacity, (n) => new Float64Array(n)));
    this.lines = take(spareLines, capacity, (n) => new Int32Array(n));
    this.capacity = this.fittingRows();
  }

  /** A data row: `values[0..k)`, of which the first `fields` came from the line (the rest NaN). */
  data(values: Float64Array, fields: number, line: number): void {
    this.flushPending();
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

  /** A line that is not a data row; `header` when it repeats the header line. */
  bad(line: number, header: boolean): void {
    this.pending.push({ line, header });
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
    if (pending.some((p) => p.header)) {
      out.repeatedHeaderCount++;
      out.seamLines += pending.length;
      return;
    }
    for (const p of pending) {
      out.skippedCount++;
      if (out.skippedLines.length < 20) out.skippedLines.push(p.line);
    }
  }

  private raggedError(fields: number, line: number): ImportError {
    return new ImportError('RAGGED_TABLE', this.fileName, `the table's rows are ${this.k} fields wide where it starts, but most rows down to here have far fewer (this one has ${fields}); check the delimiter, or cut the file into its separate tables`, { line });
  }
}
