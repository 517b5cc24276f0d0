/**
 * Numbers written with grouped digits or D exponents, read through the whole importer, and rows
 * left out said loudly. The files are triangle sweeps of our own invention (-200 → 600 mV and
 * back, 5 mV steps, a current that reaches 4,000 nA), written in each layout. Grouping and decimal
 * marks: BIPM, SI Brochure, 9th ed. (2019), sect. 5.4.4 (space groups of three; point or comma as
 * decimal mark); comma/point grouping opposite the decimal mark: common practice, no source.
 * Thresholds for rows left out: common practice, no source (droppedRows.ts).
 */
import { describe, expect, it } from 'vitest';
import { ImportError } from './errors';
import { importVoltammogram } from './importVoltammogram';

/** Potential in mV and current in nA of point i of the sweep (the current is a smooth bump). */
function point(i: number, offsetNa = 0): { eMv: number; iNa: number } {
  const eMv = i <= 160 ? -200 + 5 * i : 600 - 5 * (i - 160);
  const iNa = offsetNa + 4000 * Math.exp(-(((eMv - 200) / 120) ** 2)) + (i <= 160 ? 50 : -50);
  return { eMv, iNa };
}
const N = 321;

/** "1,234.56" / "1.234,56" / "1 234,56": the current written with `group`, two decimals, `mark` as decimal mark. */
function grouped(x: number, group: string, mark: string): string {
  const [int, frac] = Math.abs(x).toFixed(2).split('.') as [string, string];
  const withGroups = int.replace(/\B(?=(\d{3})+$)/g, group);
  return `${x < 0 ? '-' : ''}${withGroups}${mark}${frac}`;
}

function file(delimiter: string, group: string, mark: string, offsetNa = 0): string {
  const rows = [`E (mV)${delimiter}I (nA)`];
  for (let i = 0; i < N; i++) {
    const { eMv, iNa } = point(i, offsetNa);
    rows.push(`${eMv.toFixed(1).replace('.', mark)}${delimiter}${grouped(iNa, group, mark)}`);
  }
  return `${rows.join('\n')}\n`;
}

function expectCurrents(text: string): string {
  const r = importVoltammogram('grouped.txt', text);
  expect(r.measurement.currentA.length).toBe(N);
  for (let i = 0; i < N; i += 40) expect(r.measurement.currentA[i]).toBeCloseTo(Number(point(i).iNa.toFixed(2)) * 1e-9, 15);
  return r.measurement.detection.decimalMark.explanation;
}

describe('grouped digits', () => {
  it('tab, decimal point, comma groups: "3,999.87" is 3999.87 nA in every row, and the reading says so', () => {
    expect(expectCurrents(file('\t', ',', '.'))).toMatch(/digits grouped by ',' \(comma\) in column 2/);
  });
  it('semicolon, decimal comma, point groups: "3.999,87" is 3999.87 nA', () => {
    expect(expectCurrents(file(';', '.', ','))).toMatch(/grouped by '\.' \(point\)/);
  });
  it('tab, decimal comma, space groups: "3 999,87" is 3999.87 nA', () => {
    expect(expectCurrents(file('\t', ' ', ','))).toMatch(/grouped by ' ' \(space\)/);
  });
  it('quoted comma groups in a comma file: "3,999.87"', () => {
    const text = file(',', ',', '.').split('\n').map((l, i) => (i === 0 || l === '' ? l : l.replace(/,(.*)$/, ',"$1"'))).join('\n');
    expectCurrents(text);
  });
  it('a decimal-comma table with three decimals ("0,123") stays decimal: no grouping is read into it', () => {
    const text = ['E/V\tI/mA', ...Array.from({ length: 60 }, (_, i) => `${((i < 30 ? i : 60 - i) * 0.01).toFixed(3).replace('.', ',')}\t${(1 + 0.005 * i).toFixed(3).replace('.', ',')}`)].join('\n');
    const r = importVoltammogram('threeDecimals.txt', text);
    expect(r.measurement.currentA[10]).toBeCloseTo(1.05e-3, 15);
  });
});

describe('D exponents', () => {
  it('"1.000000D-03" columns are read as powers of ten', () => {
    const text = ['E/V I/A', ...Array.from({ length: N }, (_, i) => `${(point(i).eMv / 1000).toExponential(6).replace('e', 'D')}  ${(point(i).iNa * 1e-9).toExponential(6).replace('e', 'D')}`)].join('\n');
    const r = importVoltammogram('fortran.txt', text);
    expect(r.measurement.potentialV[1]).toBeCloseTo(-0.195, 12);
    expect(r.measurement.currentA[160]).toBeCloseTo(Number((point(160).iNa * 1e-9).toExponential(6)), 18);
    expect(r.measurement.detection.decimalMark.explanation).toContain('D exponents');
  });
});

describe('rows left out', () => {
  it('a number that is not one either way ("3.999.87" under a decimal point) in most rows → UNREADABLE_VALUES naming line, column and the cell', () => {
    // 1,500 nA added: every current is above 1,000, so every row is written with two points.
    const text = file('\t', '.', '.', 1500).split('\n').map((l, i) => (l === '' ? l : `${i === 0 ? 't (s)' : (0.1 * i).toFixed(1)}\t${l}`)).join('\n');
    try {
      importVoltammogram('twice.csv', text);
      throw new Error('expected a refusal');
    } catch (err) {
      expect(err).toBeInstanceOf(ImportError);
      const e = err as ImportError;
      expect(e.code).toBe('UNREADABLE_VALUES');
      expect(e.column).toBe(3);
      expect(e.line).toBe(2);
      expect(e.message).toMatch(/more than once/);
      expect(e.message).toMatch(/rows \(\d+ %\)/);
    }
  });
  it('a third of the rows with "3,999,87" under a decimal comma → a loud MANY_ROWS_DROPPED warning naming the cell', () => {
    const r = importVoltammogram('third.csv', file(';', ',', ','));
    const w = r.warnings.find((x) => x.code === 'MANY_ROWS_DROPPED');
    expect(w?.message).toMatch(/column 2 \("I \(nA\)"\) holds \d+ cells such as "\d,\d{3},\d\d"/);
    expect(w?.message).toContain('more than once');
  });
  it('a tenth of the rows with an empty current → a loud MANY_ROWS_DROPPED warning with the count', () => {
    const text = file('\t', '', '.').split('\n').map((l, i) => (i > 0 && i % 10 === 0 ? l.replace(/\t.*$/, '\t') : l)).join('\n');
    const r = importVoltammogram('gaps.txt', text);
    const w = r.warnings.find((x) => x.code === 'MANY_ROWS_DROPPED');
    expect(w?.count).toBe(32);
    expect(w?.message).toContain(`32 of ${N} rows`);
  });
  it('one damaged row stays an ordinary SKIPPED_ROWS warning', () => {
    const text = file('\t', '', '.').replace(/\n(600\.0)\t[^\n]*/, '\n$1\tx');
    const r = importVoltammogram('one.txt', text);
    expect(r.warnings.map((w) => w.code)).toEqual(['SKIPPED_ROWS', 'NO_SCAN_RATE']);
  });
});
