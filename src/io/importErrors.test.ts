/**
 * Bad input: each case must end in a typed ImportError naming the file (and line/column where
 * it applies), or, for damaged rows, in a warning that counts and locates them.
 * File signatures: PKWARE APPNOTE.TXT sect. 4.3.7 (ZIP "PK\3\4"); Microsoft [MS-CFB] sect. 2.2
 * (OLE2 D0 CF 11 E0 A1 B1 1A E1); PNG spec. (RFC 2083) sect. 3.1; JPEG (ITU-T T.81) SOI FF D8.
 */
import { describe, expect, it } from 'vitest';
import { importVoltammogram } from './importVoltammogram';
import { ImportError } from './errors';
import type { ImportErrorCode } from './errors';

function failure(data: string | Uint8Array, overrides = {}): ImportError {
  try {
    importVoltammogram('bad.txt', data, { overrides });
  } catch (err) {
    expect(err).toBeInstanceOf(ImportError);
    const e = err as ImportError;
    expect(e.name).toBe('ImportError');
    expect(e.message).toContain('bad.txt');
    return e;
  }
  throw new Error('expected an ImportError');
}

const GOOD = ['E/V,I/A', ...Array.from({ length: 40 }, (_, i) => `${(i < 20 ? i : 40 - i) * 0.05},${Math.sin(i) * 1e-6}`)].join('\n');

describe('importVoltammogram: typed errors', () => {
  const cases: [string, string | Uint8Array, ImportErrorCode][] = [
    ['an empty file', new Uint8Array(0), 'EMPTY'],
    ['only blank lines', '\n\n  \r\n\t\n', 'EMPTY'],
    ['binary data with zero bytes', Uint8Array.from({ length: 300 }, (_, i) => (i * 37) % 256), 'BINARY'],
    ['an .xlsx (ZIP) spreadsheet', Uint8Array.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00, 0x06, 0x00, 1, 2, 3]), 'SPREADSHEET_BINARY'],
    ['an .xls (OLE2) spreadsheet', Uint8Array.from([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1, 0, 0, 0]), 'SPREADSHEET_BINARY'],
    ['a PNG image', Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]), 'IMAGE'],
    ['a JPEG image', Uint8Array.from([0xff, 0xd8, 0xff, 0xe0, 0, 16, 0x4a, 0x46]), 'IMAGE'],
    ['prose with no numbers', 'This folder holds our notes.\nNothing to measure here.\n', 'NO_TABLE'],
    ['one numeric column', 'Potential/V\n0.1\n0.2\n0.3\n0.4\n', 'ONE_COLUMN'],
    ['two rows only', 'E/V,I/A\n0.1,1e-6\n0.2,2e-6\n', 'TOO_FEW_POINTS'],
  ];
  for (const [what, data, code] of cases) {
    it(`${what} → ${code}`, () => expect(failure(data).code).toBe(code));
  }

  it('a potential column that never changes → CONSTANT_POTENTIAL with line and column', () => {
    const e = failure('E/V;I/A\n0,5;1e-6\n0,5;2e-6\n0,5;3e-6\n0,5;4e-6\n');
    expect(e.code).toBe('CONSTANT_POTENTIAL');
    expect(e.line).toBe(2);
    expect(e.column).toBe(1);
  });

  it('bytes that are not valid in a forced encoding → ENCODING', () => {
    const oddUtf16 = Uint8Array.from([0x45, 0x00, 0x2c, 0x00, 0x49]);
    expect(failure(oddUtf16, { encoding: 'utf-16le' }).code).toBe('ENCODING');
  });

  it('a table wider than any voltammogram export (one line of 300,000 numbers, 1.2 MB) → TOO_MANY_COLUMNS on line 1', () => {
    const e = failure('1.0,'.repeat(300_000));
    expect([e.code, e.line]).toEqual(['TOO_MANY_COLUMNS', 1]);
    expect(e.message).toContain('300001 columns');
  });

  it('a potential that turns back at every point (0, 1, 0, 1, …: 75,000 turns) → NOT_A_SWEEP naming its column', () => {
    const e = failure(Array.from({ length: 75_000 }, (_, i) => `${i % 2},${i % 3}`).join('\n'));
    expect([e.code, e.column]).toEqual(['NOT_A_SWEEP', 1]);
  });

  it('a column override outside the table → BAD_OVERRIDE', () => {
    expect(failure(GOOD, { potentialColumn: 5 }).code).toBe('BAD_OVERRIDE');
    expect(failure(GOOD, { headerLine: 999 }).code).toBe('BAD_OVERRIDE');
    expect(failure(GOOD, { scanRateVPerS: -1 }).code).toBe('BAD_OVERRIDE');
  });
});

describe('importVoltammogram: damaged rows are skipped, counted and located', () => {
  it('NaN, Inf and a ragged row in the table give warnings with their lines', () => {
    const lines = GOOD.split('\n');
    lines[5] = '0.2,NaN';
    lines[9] = '0.4,Inf';
    lines[12] = '0.55';
    const r = importVoltammogram('rows.csv', lines.join('\n'));
    expect(r.measurement.potentialV.length).toBe(37);
    const skipped = r.warnings.filter((w) => w.code === 'SKIPPED_ROWS');
    expect(skipped.reduce((s, w) => s + (w.count ?? 0), 0)).toBe(3);
    expect(skipped.flatMap((w) => w.lines ?? []).sort((a, b) => a - b)).toEqual([6, 10, 13]);
    expect(r.measurement.detection.rowsSkipped).toBe(3);
  });

  it('a failed file leaves an earlier result untouched', () => {
    const first = importVoltammogram('good.csv', GOOD);
    const copy = Float64Array.from(first.measurement.potentialV);
    expect(() => importVoltammogram('bad.csv', new Uint8Array(0))).toThrow(ImportError);
    expect(first.measurement.potentialV).toEqual(copy);
  });

  it('the user overrides delimiter, decimal mark, columns and units', () => {
    const text = 'a;b;c\n' + Array.from({ length: 30 }, (_, i) => `${i};${((i < 15 ? i : 30 - i) * 10).toString()};${i % 7}`).join('\n');
    const r = importVoltammogram('x.txt', text, { overrides: { delimiter: ';', decimalMark: ',', potentialColumn: 1, currentColumn: 2, potentialUnit: 'mV', currentUnit: 'nA' } });
    expect(r.measurement.potentialV[3]).toBeCloseTo(0.03, 12);
    expect(r.measurement.currentA[3]).toBeCloseTo(3e-9, 18);
    expect(r.measurement.detection.potentialUnit.overridden).toBe(true);
  });
});
