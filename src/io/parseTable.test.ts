/**
 * The table reader's two paths (plain lines read in place, papaparse for quoted text) must turn
 * the same lines into the same rows, values, skipped lines, seams and footer. Cases: a small
 * table worked by hand, then seeded random tables (fast-check), then the memory guard for rows far
 * narrower than the table. Row rules: common practice, no source.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ImportError } from './errors';
import { parseTable } from './parseTable';
import type { ParsedTable, TableSpec } from './parseTable';
import type { Delimiter } from './types';

function run(text: string, spec: TableSpec): ParsedTable {
  const steps = parseTable(text, spec);
  for (;;) {
    const r = steps.next();
    if (r.done) return r.value;
  }
}

const spec = (delimiter: Delimiter, fieldCount: number, extra: Partial<TableSpec> = {}): TableSpec => ({ delimiter, decimalComma: false, fieldCount, startOffset: 0, startLine: 1, headerText: null, ...extra });

/** Both readers on the same text; NaN compared as NaN. */
function expectSameTables(text: string, s: TableSpec): void {
  const fast = run(text, s);
  const papa = run(text, { ...s, reader: 'papaparse' });
  expect(JSON.stringify({ ...fast, columns: fast.columns.map((c) => Array.from(c, String)), lineOfRow: Array.from(fast.lineOfRow) }))
    .toBe(JSON.stringify({ ...papa, columns: papa.columns.map((c) => Array.from(c, String)), lineOfRow: Array.from(papa.lineOfRow) }));
}

describe('parseTable', () => {
  it('reads a small table by hand: a header copy is a seam, a text line is skipped, the tail is a footer', () => {
    const text = '1,2\n3,4\nE,I\n5,6\nbad line\n7,8\n\nend of data';
    const t = run(text, spec(',', 2, { headerText: 'E|I' }));
    expect(Array.from(t.columns[0] as Float64Array)).toEqual([1, 3, 5, 7]);
    expect(Array.from(t.lineOfRow)).toEqual([1, 2, 4, 6]);
    expect([t.repeatedHeaderCount, t.seamLines, t.skippedCount, t.skippedLines, t.footerLines, t.firstFooterLine]).toEqual([1, 1, 1, [5], 1, 8]);
    expectSameTables(text, spec(',', 2, { headerText: 'E|I' }));
  });

  it('a short row keeps its leading fields and NaN for the rest; extra non-empty fields make a row bad', () => {
    const t = run('1;2;3\n4;5\n6;7;8;9\n1;2;3;\n', spec(';', 3));
    expect(Array.from(t.columns[2] as Float64Array, String)).toEqual(['3', 'NaN', '3']);
    expect(t.skippedLines).toEqual([3]);
  });

  const cell = fc.constantFrom('1', '-2.5', '3e-4', '1,5', '0', '', ' ', 'x', 'NaN', 'Inf', '1.', '.5', '12345678901234567', '\u00a07', 'E', 'I', 'e1', '1e999');
  const sep = fc.constantFrom<Delimiter>(',', ';', '\t', 'whitespace');
  const tableArb = fc.tuple(sep, fc.array(fc.array(cell, { maxLength: 6 }), { maxLength: 40 }), fc.integer({ min: 2, max: 5 }), fc.boolean(), fc.boolean());

  it('both readers agree on 3,000 seeded random tables without quotes', () => {
    fc.assert(fc.property(tableArb, ([d, rows, k, dc, joinWithTab]) => {
      const glue = d === 'whitespace' ? (joinWithTab ? ' \t' : '  ') : d;
      const text = rows.map((r) => r.join(glue)).join('\n');
      expectSameTables(text, spec(d, k, { decimalComma: dc, headerText: 'E|I' }));
    }), { seed: 20261204, numRuns: 3000 });
  });

  it('both readers agree across chunk seams and from an offset inside the text', () => {
    const rows = Array.from({ length: 300_000 }, (_, i) => (i % 1000 === 7 ? 'note' : `${i * 0.001},${Math.sin(i)}`));
    const text = `preamble\n${rows.join('\n')}\n`;
    const s = spec(',', 2, { startOffset: 9, startLine: 2 });
    expectSameTables(text, s);
    expect(run(text, s).rowCount).toBe(299_700);
  });

  it('rows far narrower than the table stop the read with RAGGED_TABLE (memory stays proportional to the text)', () => {
    const wide = Array.from({ length: 10 }, () => Array.from({ length: 500 }, (_, j) => j).join(',')).join('\n');
    const text = `${wide}\n${'1,2\n'.repeat(50_000)}`;
    let err: unknown;
    try {
      run(text, spec(',', 500, { fileName: 'wide.csv' }));
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(ImportError);
    expect((err as ImportError).code).toBe('RAGGED_TABLE');
    expect((err as ImportError).message).toMatch(/^wide\.csv \(line \d+\)/);
  });
});
