/**
 * Layout table: one synthetic voltammogram (test/fixtures/layoutWriter.ts, our own invention)
 * written in every layout the issue lists, read back and compared in SI units.
 * Unit factors checked: BIPM, SI Brochure 9th ed. (2019), Table 7 (m = 1e-3, µ = 1e-6, n = 1e-9).
 * Numbers are written with 10 significant digits, so a relative tolerance of 1e-9 of the
 * column's largest magnitude is the rounding of the writer, not a property of the importer.
 * Encodings: The Unicode Standard, ch. 23.8 (U+FEFF byte-order mark); ISO/IEC 8859-1 (0xB5 = µ).
 */
import { describe, expect, it } from 'vitest';
import { encodeLatin1, encodeUtf16, encodeUtf8, makeSyntheticCv, writeLayout } from '../../test/fixtures/layoutWriter';
import type { Layout, SyntheticCv } from '../../test/fixtures/layoutWriter';
import { importVoltammogram } from './importVoltammogram';
import type { ImportResult } from './types';

const cv = makeSyntheticCv({ cycles: 2, stepV: 0.005 });
const REL = 1e-9;

function expectClose(actual: Float64Array, expected: ArrayLike<number>, rel = REL): void {
  expect(actual.length).toBe(expected.length);
  let scale = 0;
  for (let i = 0; i < expected.length; i++) scale = Math.max(scale, Math.abs(expected[i] as number));
  let worst = 0;
  for (let i = 0; i < expected.length; i++) worst = Math.max(worst, Math.abs((actual[i] as number) - (expected[i] as number)));
  expect(worst / scale).toBeLessThan(rel);
}

function expectSameCv(r: ImportResult, ref: SyntheticCv = cv, rel = REL): void {
  expectClose(r.measurement.potentialV, ref.potentialV, rel);
  expectClose(r.measurement.currentA, ref.currentA, rel);
}

const H = { time: 'Time (s)', potential: 'Potential/V', current: 'Current/A', cycle: 'Cycle' };

interface Row {
  name: string;
  layout: Layout;
  fileName?: string;
  bytes?: (text: string) => Uint8Array;
  check?: (r: ImportResult) => void;
}

const rows: Row[] = [
  { name: 'comma, header Potential/V Current/A', layout: { delimiter: ',', header: H, columns: ['potential', 'current'] } },
  { name: 'tab, E (mV) and I (uA)', layout: { delimiter: '\t', header: { potential: 'E (mV)', current: 'I (uA)' }, columns: ['potential', 'current'], potentialScale: 1e3, currentScale: 1e6 },
    check: (r) => expect([r.measurement.detection.potentialUnit.value, r.measurement.detection.currentUnit.value]).toEqual(['mV', 'µA']) },
  { name: 'semicolon with decimal comma, WE potential [V] and current (nA)', layout: { delimiter: ';', decimalComma: true, header: { potential: 'WE potential [V]', current: 'current (nA)' }, columns: ['potential', 'current'], currentScale: 1e9 },
    check: (r) => expect(r.measurement.detection.decimalMark.value).toBe(',') },
  { name: 'tab with decimal comma, i / µA', layout: { delimiter: '\t', decimalComma: true, header: { potential: 'E / V', current: 'i / µA' }, columns: ['potential', 'current'], currentScale: 1e6 } },
  { name: 'runs of spaces, no header', layout: { delimiter: 'spaces', columns: ['potential', 'current'] },
    check: (r) => expect(r.measurement.detection.headerLine.value).toBeNull() },
  { name: 'no header: time, potential in mV, current — roles and mV read from the numbers', layout: { delimiter: '\t', columns: ['time', 'potential', 'current'], potentialScale: 1e3 },
    check: (r) => {
      expect(r.measurement.detection.columns.map((c) => c.role)).toEqual(['time', 'potential', 'current']);
      expect(r.measurement.detection.potentialUnit.value).toBe('mV');
      expect(r.warnings.map((w) => w.code)).toContain('ROLE_GUESSED');
    } },
  { name: 'no header: index, time, potential, current, cycle', layout: { delimiter: ',', columns: ['index', 'time', 'potential', 'current', 'cycle'] },
    check: (r) => expect(r.measurement.detection.columns.map((c) => c.role)).toEqual(['index', 'time', 'potential', 'current', 'cycle']) },
  { name: 'no header: current (A) before potential', layout: { delimiter: ';', columns: ['current', 'potential'] },
    check: (r) => expect(r.measurement.detection.columns.map((c) => c.role)).toEqual(['current', 'potential']) },
  { name: 'scientific notation 1.23E-05', layout: { delimiter: ',', header: H, columns: ['potential', 'current'], exponent: true } },
  { name: 'scientific notation with decimal comma 1,23E-05', layout: { delimiter: ';', decimalComma: true, header: H, columns: ['potential', 'current'], exponent: true } },
  { name: 'preamble, footer and trailing blank lines', layout: { delimiter: ',', header: H, columns: ['potential', 'current'], preamble: ['Operator: A. Tester', 'Sample: ferrocene in MeCN', 'Electrode: glassy carbon, 3 mm', 'scan rate = 100 mV/s', 'Date: 2026-03-04 10:15'], footer: ['', 'End of measurement', '', ''] },
    check: (r) => {
      expect(r.measurement.scanRateSource).toBe('metadata');
      expect(r.measurement.scanRateVPerS).toBeCloseTo(0.1, 12);
      expect(r.measurement.metadata['Operator']).toBe('A. Tester');
      expect(r.measurement.detection.footer).toEqual({ lines: 1, firstLine: 5 + 1 + cv.potentialV.length + 2 });
      expect(r.measurement.detection.rowsSkipped).toBe(0);
      expect(r.measurement.detection.headLines.slice(0, 2)).toEqual(['Operator: A. Tester', 'Sample: ferrocene in MeCN']);
    } },
  { name: 'any column order: time, current, potential in ms, µA, mV', layout: { delimiter: ',', header: { time: 't/ms', current: 'i / µA', potential: 'E (mV)' }, columns: ['time', 'current', 'potential'], timeScale: 1e3, potentialScale: 1e3, currentScale: 1e6 },
    check: (r) => {
      expectClose(r.measurement.timeS as Float64Array, cv.timeS);
      expect(r.measurement.scanRateSource).toBe('time');
      expect(Math.abs((r.measurement.scanRateVPerS as number) - 0.1) / 0.1).toBeLessThan(1e-6);
    } },
  { name: 'extra columns: index, time, cycle, charge, second electrode', layout: { delimiter: '\t', header: { index: 'Point', time: 'Time (s)', cycle: 'Scan', potential: 'E/V', current: 'I/A', charge: 'Charge/C', current2: 'I2/A' }, columns: ['index', 'time', 'cycle', 'potential', 'current', 'charge', 'current2'] },
    check: (r) => {
      expect(r.measurement.cycles.length).toBe(2);
      expect(Object.keys(r.measurement.extraColumns).sort()).toEqual(['Charge/C', 'I2/A', 'Point']);
    } },
  { name: 'every field quoted, comma delimiter', layout: { delimiter: ',', header: { potential: 'Potential, measured (V)', current: 'Current (A)' }, columns: ['potential', 'current'], quoted: true } },
  { name: 'every field quoted, comma delimiter and decimal comma', layout: { delimiter: ',', decimalComma: true, header: H, columns: ['potential', 'current'], quoted: true },
    check: (r) => expect(r.measurement.detection.decimalMark.value).toBe(',') },
  { name: 'UTF-8 with BOM', layout: { delimiter: ',', header: H, columns: ['potential', 'current'] }, bytes: (t) => encodeUtf8(t, true) },
  { name: 'UTF-16 LE with BOM', layout: { delimiter: '\t', header: H, columns: ['potential', 'current'], lineEnd: '\r\n' }, bytes: (t) => encodeUtf16(t, true),
    check: (r) => expect(r.measurement.detection.encoding.value).toBe('utf-16le') },
  { name: 'UTF-16 BE with BOM', layout: { delimiter: ';', decimalComma: true, header: H, columns: ['potential', 'current'] }, bytes: (t) => encodeUtf16(t, false),
    check: (r) => expect(r.measurement.detection.encoding.value).toBe('utf-16be') },
  { name: 'Latin-1 µ in the header', layout: { delimiter: ';', header: { potential: 'E (V)', current: 'I (µA)' }, columns: ['potential', 'current'], currentScale: 1e6 }, bytes: encodeLatin1,
    check: (r) => {
      expect(r.measurement.detection.encoding.value).toBe('latin1');
      expect(r.measurement.detection.currentUnit.value).toBe('µA');
    } },
  { name: 'CRLF line ends', layout: { delimiter: ',', header: H, columns: ['potential', 'current'], lineEnd: '\r\n' } },
  { name: 'CR line ends', layout: { delimiter: ',', header: H, columns: ['potential', 'current'], lineEnd: '\r' },
    check: (r) => expect(r.measurement.detection.lineEnding.value).toBe('CR') },
  { name: 'cycles concatenated with a cycle column', layout: { delimiter: ',', header: H, columns: ['cycle', 'potential', 'current'] },
    check: (r) => expect(r.measurement.cycles.map((c) => c.start)).toEqual([0, 320]) },
  { name: 'cycles concatenated without a cycle column, header repeated', layout: { delimiter: ',', header: H, columns: ['potential', 'current'], headerPerCycle: true },
    check: (r) => {
      expect(r.measurement.cycles.length).toBe(2);
      expect(r.warnings.map((w) => w.code)).toContain('REPEATED_HEADER');
    } },
  { name: 'polarographic file named in the preamble', layout: { delimiter: ',', header: H, columns: ['potential', 'current'], polarographic: true, preamble: ['Sign convention: cathodic current positive'] },
    check: (r) => expect(r.measurement.currentConvention).toBe('polarographic') },
  // Layout detection skips a delimiter no line holds; these two make the remaining candidates decide.
  { name: 'tab table under a preamble holding commas and semicolons', layout: { delimiter: '\t', header: H, columns: ['potential', 'current'], preamble: ['Operator: A. N. Other; bench 3', 'Electrolyte: 0.1 M KCl, degassed'] } },
  { name: 'spaces only: no comma, semicolon or tab anywhere in the file', layout: { delimiter: 'spaces', columns: ['potential', 'current'] } },
  { name: 'scan rate from the file name only', fileName: 'series2_50mVs.csv', layout: { delimiter: ',', header: H, columns: ['potential', 'current'] },
    check: (r) => {
      expect(r.measurement.scanRateSource).toBe('filename');
      expect(r.measurement.scanRateVPerS).toBeCloseTo(0.05, 12);
    } },
];

describe('importVoltammogram: layout table (SI units back within 1e-9 relative)', () => {
  for (const row of rows) {
    it(row.name, () => {
      const text = writeLayout(cv, row.layout);
      const r = importVoltammogram(row.fileName ?? 'layout.txt', row.bytes ? row.bytes(text) : text);
      expectSameCv(r);
      expect(r.measurement.cycles.length).toBeGreaterThanOrEqual(1);
      row.check?.(r);
    });
  }

  it('two whole exports joined, each with its own preamble and header: one measurement, two cycles', () => {
    const one = makeSyntheticCv({ cycles: 1, stepV: 0.005 });
    const part = writeLayout(one, { delimiter: ';', decimalComma: true, header: { potential: 'E (V)', current: 'I (A)' }, columns: ['potential', 'current'], preamble: ['Lab export', 'scan rate = 50 mV/s'] });
    const r = importVoltammogram('joined.txt', `${part}\n${part}\n`);
    expect(r.measurement.potentialV.length).toBe(2 * one.potentialV.length);
    expectClose(r.measurement.currentA.subarray(one.currentA.length), one.currentA);
    expect(r.measurement.cycles.length).toBe(2);
    expect(r.warnings.map((w) => w.code)).toEqual(['REPEATED_HEADER']);
  });

  it('a short block of numbers in the preamble (a settings table) is not taken for the data', () => {
    const settings = ['Vertex;Potential (V)', '1;0,6', '2;-0,2', '3;0,6', '4;-0,2', ''];
    const layout: Layout = { delimiter: ';', decimalComma: true, header: H, columns: ['potential', 'current'], preamble: settings };
    const r = importVoltammogram('settings.txt', writeLayout(cv, layout));
    expectSameCv(r);
    expect(r.measurement.detection.headerLine.value).toBe(7);
    expect(r.warnings.filter((w) => w.code === 'SKIPPED_ROWS')).toEqual([]);
  });

  it('a time column in ms without a unit: the scan rate disagrees with the file name by 1000 and says so', () => {
    const r = importVoltammogram('cv_100mVs.csv', writeLayout(cv, { delimiter: ',', header: { time: 'Time', potential: 'E/V', current: 'I/A' }, columns: ['time', 'potential', 'current'], timeScale: 1e3 }));
    expect(r.measurement.scanRateSource).toBe('time');
    const w = r.warnings.find((x) => x.code === 'SCAN_RATE_DISAGREES');
    expect(w?.message).toMatch(/factor of 1000/);
    const fixed = importVoltammogram('cv_100mVs.csv', writeLayout(cv, { delimiter: ',', header: { time: 'Time', potential: 'E/V', current: 'I/A' }, columns: ['time', 'potential', 'current'], timeScale: 1e3 }), { overrides: { timeUnit: 'ms' } });
    expect(Math.abs((fixed.measurement.scanRateVPerS as number) - 0.1) / 0.1).toBeLessThan(1e-6);
  });

  it('a trailing delimiter on some rows only: every row is kept', () => {
    const text = writeLayout(cv, { delimiter: ';', header: H, columns: ['potential', 'current'] })
      .split('\n')
      .map((l, i) => (i % 3 === 0 ? l : `${l};`))
      .join('\n');
    const r = importVoltammogram('ragged_100mVs.txt', text);
    expectSameCv(r);
    expect(r.warnings).toEqual([]);
  });

  it('one file per sweep: a single forward sweep is one segment in one cycle', () => {
    const one = makeSyntheticCv({ cycles: 1, stepV: 0.005 });
    const n = 161;
    const sweep: SyntheticCv = { ...one, potentialV: one.potentialV.slice(0, n), currentA: one.currentA.slice(0, n), timeS: one.timeS.slice(0, n), cycle: one.cycle.slice(0, n) };
    const r = importVoltammogram('sweep1.csv', writeLayout(sweep, { delimiter: ',', header: H, columns: ['time', 'potential', 'current'] }));
    expectSameCv(r, sweep);
    expect(r.measurement.segments.length).toBe(1);
    expect(r.measurement.segments[0]?.direction).toBe('positive');
    // Without a header the rising potential of one sweep must not be taken for the time.
    const shifted: SyntheticCv = { ...sweep, potentialV: sweep.potentialV.map((e) => e + 0.3) };
    const bare = importVoltammogram('sweep1.txt', writeLayout(shifted, { delimiter: '\t', columns: ['potential', 'current', 'time'] }));
    expect(bare.measurement.detection.columns.map((c) => c.role)).toEqual(['potential', 'current', 'time']);
  });
});
