/**
 * TableRows hands its row buffers on to the next table (fewer page faults in a batch). Whatever
 * the buffers held before, and whatever their length, each table must give exactly its own rows:
 * checked on tables read one after another with different widths, lengths and growth, against
 * the values written. A property of the code; no published value is involved.
 */
import { describe, expect, it } from 'vitest';
import { TableRows } from './tableRows';

/** A table of `rows` rows and `k` columns, value = seed + row + column/10, read through TableRows. */
function readTable(k: number, rows: number, textChars: number, seed: number) {
  const t = new TableRows(k, textChars, 'table.csv');
  const values = new Float64Array(k);
  for (let r = 0; r < rows; r++) {
    for (let j = 0; j < k; j++) values[j] = seed + r + j / 10;
    t.data(values, k, 10 + r);
    if (r % 97 === 50) t.bad(10 + r, false);
  }
  return t.finish();
}

describe('TableRows', () => {
  it('gives each table its own rows, with buffers handed on from tables of other sizes', () => {
    // Long then short then long again, wide then narrow, a size hint far too small (growth) and too large.
    const plan: Array<[number, number, number]> = [[3, 5000, 200], [2, 30, 100000], [4, 1201, 36000], [3, 7000, 50], [2, 3, 10], [3, 2500, 36000]];
    plan.forEach(([k, rows, chars], n) => {
      const seed = 1000 * (n + 1);
      const out = readTable(k, rows, chars, seed);
      expect(out.rowCount).toBe(rows);
      expect(out.columns).toHaveLength(k);
      for (let j = 0; j < k; j++) {
        const c = out.columns[j]!;
        expect(c.length).toBe(rows);
        for (let r = 0; r < rows; r++) if (c[r] !== seed + r + j / 10) throw new Error(`table ${n}, column ${j}, row ${r}: ${c[r]}`);
      }
      expect(Array.from(out.lineOfRow.slice(0, 3))).toEqual([10, 11, 12].slice(0, Math.min(3, rows)));
      expect(out.lineOfRow[rows - 1]).toBe(10 + rows - 1);
    });
  });

  it('keeps a finished table\'s columns its own when the next table reuses the buffers', () => {
    const first = readTable(3, 800, 20000, 1);
    const copy = first.columns.map((c) => Array.from(c));
    readTable(3, 900, 20000, 5000);
    expect(first.columns.map((c) => Array.from(c))).toEqual(copy);
  });
});
