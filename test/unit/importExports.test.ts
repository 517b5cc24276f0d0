/**
 * Real-world export layouts (test/fixtures/exports/, our own invention; see README.md there):
 * each file is read from disk and must give the roles, units, recording scale, current kind,
 * scan rate and header block its fixture states, and the same numbers in SI units as the
 * synthetic voltammogram it was written from. Numbers are written with 8–9 significant digits,
 * so a relative tolerance of 1e-7 of the column's largest magnitude is the writer's rounding.
 * Unit factors: BIPM, SI Brochure 9th ed. (2019), Table 7 (m = 1e-3, µ = 1e-6).
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { EXPORT_FIXTURES, exportFixtureBytes } from '../fixtures/exportLayouts';
import { importVoltammogram } from '../../src/io/importVoltammogram';

const DIR = join(import.meta.dirname, '..', 'fixtures', 'exports');
const REL = 1e-7;

function relativeError(actual: Float64Array, expected: ArrayLike<number>, factor = 1): number {
  let scale = 0;
  let worst = 0;
  for (let i = 0; i < expected.length; i++) {
    const e = (expected[i] as number) * factor;
    scale = Math.max(scale, Math.abs(e));
    worst = Math.max(worst, Math.abs((actual[i] as number) - e));
  }
  return worst / scale;
}

describe('real export layouts (test/fixtures/exports)', () => {
  for (const f of EXPORT_FIXTURES) {
    it(`${f.name}: ${f.what.slice(0, 90)}…`, () => {
      const bytes = readFileSync(join(DIR, f.name));
      expect(Buffer.compare(bytes, Buffer.from(exportFixtureBytes(f)))).toBe(0);
      const { measurement: m } = importVoltammogram(f.name, bytes);
      const d = m.detection;
      const x = f.expect;
      expect(d.columns.map((c) => c.role)).toEqual(x.roles);
      expect([d.potentialUnit.value, d.currentUnit.value]).toEqual([x.potentialUnit, x.currentUnit]);
      expect([m.referenceElectrode, d.reference.value]).toEqual([x.reference, x.reference]);
      expect([m.currentKind, d.currentKind.value]).toEqual([x.currentKind, x.currentKind]);
      expect(d.headerBlock).toEqual(x.headerBlock);
      expect(m.scanRateSource).toBe(x.scanRateSource);
      expect(Math.abs((m.scanRateVPerS as number) / x.scanRateVPerS - 1)).toBeLessThan(1e-6);
      expect(m.potentialV.length).toBe(f.cv.potentialV.length);
      expect(relativeError(m.potentialV, f.cv.potentialV)).toBeLessThan(REL);
      expect(relativeError(m.currentA, f.cv.currentA, x.currentFactor)).toBeLessThan(REL);
    });
  }

  it('the issue\'s layout explains its choices: density column with a unit over one without, RHE from the units row', () => {
    const f = EXPORT_FIXTURES[0]!;
    const r = importVoltammogram(f.name, readFileSync(join(DIR, f.name)));
    const d = r.measurement.detection;
    expect(d.columns[2]?.explanation).toContain('chosen over column 2');
    expect(d.columns[1]?.explanation).toContain('kept as an extra column');
    expect(d.reference.explanation).toContain('"V RHE" in the units row on line 2');
    expect(d.currentKind.explanation).toContain('no electrode area');
    expect(Object.keys(r.measurement.extraColumns)).toEqual(['j']);
    expect(r.warnings.map((w) => w.code)).toContain('CURRENT_DENSITY');
  });

  it('a density turned into a current records the area it was multiplied by', () => {
    const f = EXPORT_FIXTURES.find((x) => x.name.startsWith('density_area'))!;
    const m = importVoltammogram(f.name, readFileSync(join(DIR, f.name))).measurement;
    expect(m.densityAreaCm2?.value).toBe(0.196);
    expect(m.densityAreaCm2?.line).toBe(1);
  });

  const rows = Array.from({ length: 40 }, (_, i) => `${((i < 20 ? i : 40 - i) * 0.02).toFixed(2)},${(Math.sin(i / 3) * 1e-3).toFixed(6)}`).join('\n');

  it('a preamble reference that disagrees with the one in the column name is used, with a warning naming both', () => {
    const r = importVoltammogram('two_refs.csv', `Reference electrode: SCE\nE (V vs Ag/AgCl),I (A)\n${rows}`);
    expect(r.measurement.referenceElectrode).toBe('SCE');
    const w = r.warnings.find((x) => x.code === 'REFERENCE_DISAGREES');
    expect(w?.message).toContain('"SCE"');
    expect(w?.message).toContain('"Ag/AgCl"');
  });

  it('a density named "j" with no unit anywhere is read as A/cm², with a warning that the unit was assumed', () => {
    const r = importVoltammogram('bare_j.csv', `E (V),j\n${rows}`);
    expect(r.measurement.currentKind).toBe('density');
    expect(r.warnings.map((w) => w.code)).toEqual(expect.arrayContaining(['UNIT_ASSUMED', 'CURRENT_DENSITY']));
  });

  it('a units row alone right above the numbers names the columns by their units', () => {
    const r = importVoltammogram('units_only.csv', `V vs SCE,mA\n${rows}`);
    expect(r.measurement.detection.columns.map((c) => c.role)).toEqual(['potential', 'current']);
    expect([r.measurement.referenceElectrode, r.measurement.detection.currentUnit.value]).toEqual(['SCE', 'mA']);
  });

  it('a header line set by the user still finds the units row under it', () => {
    const r = importVoltammogram('forced.csv', `Operator: X\nE,I\nV RHE,µA\n${rows}`, { overrides: { headerLine: 2 } });
    expect(r.measurement.detection.headerBlock.unitsLine).toBe(3);
    expect([r.measurement.referenceElectrode, r.measurement.detection.currentUnit.value]).toEqual(['RHE', 'µA']);
  });

  it('a preamble line "Scan rate;100;mV/s" a few lines above a header-less table is not taken for column names', () => {
    const r = importVoltammogram('plain.txt', `Scan rate;100;mV/s\nOperator;A;B\n${rows.replaceAll(',', ';')}`);
    expect(r.measurement.detection.headerLine.value).toBeNull();
    expect(r.measurement.scanRateVPerS).toBeCloseTo(0.1, 12);
  });
});
