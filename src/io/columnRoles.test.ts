/**
 * Which column is the potential, in scenarios of our own invention read back through
 * importVoltammogram: a measured potential beside the one the instrument applied (in either order),
 * and tables with no names whose current comes first. The trace is a triangle wave of our own,
 * 0.3 → −0.3 V and back in 2 mV steps, twice; the current is an invented pair of bumps on a charging
 * step. The applied potential runs 40 mV above the measured one (an invented offset), so taking it
 * would shift every potential by 40 mV. Unit factors: BIPM SI Brochure, 9th ed. (2019), Table 7
 * (m = 1e-3, µ = 1e-6). That a swept potential has nearly constant steps and few turns while a
 * current does not: common practice, no source.
 */
import { describe, expect, it } from 'vitest';
import { importVoltammogram } from './importVoltammogram';

const STEP = 0.002;
const HALF = 300;
const OFFSET = 0.04;

/** [t (s), measured E (V), I (A)] over two cycles, starting at the upper vertex. */
function sweep(): [number, number, number][] {
  const out: [number, number, number][] = [];
  for (let i = 0; i <= 4 * HALF; i++) {
    const leg = Math.min(Math.floor(i / HALF), 3);
    const k = i - leg * HALF;
    const down = leg % 2 === 0;
    const e = down ? 0.3 - k * STEP : -0.3 + k * STEP;
    const faradaic = down ? -8e-6 / Math.cosh((e + 0.05) / 0.03) : 7e-6 / Math.cosh((e - 0.01) / 0.03);
    out.push([i * 0.02, +e.toFixed(4), (down ? -5e-7 : 5e-7) + faradaic]);
  }
  return out;
}

const read = (name: string, text: string) => importVoltammogram(name, new TextEncoder().encode(text), {});
const rowsOf = (f: (r: [number, number, number]) => (string | number)[]) => sweep().map((r) => f(r).join(',')).join('\n') + '\n';
const applied = (e: number) => (e + OFFSET).toFixed(4);

describe('a measured potential beside the applied one', () => {
  it.each([
    ['applied first', 'Time (s),Set potential (V),Potential (V),Current (A)', (r: [number, number, number]) => [r[0].toFixed(2), applied(r[1]), r[1], r[2].toExponential(5)], 3, 2],
    ['applied last', 'Time (s),Potential (V),Current (A),Set potential (V)', (r: [number, number, number]) => [r[0].toFixed(2), r[1], r[2].toExponential(5), applied(r[1])], 2, 4],
    ['named "applied" and "measured"', 'Time (s),Potential applied (V),Potential measured (V),Current (A)', (r: [number, number, number]) => [r[0].toFixed(2), applied(r[1]), r[1], r[2].toExponential(5)], 3, 2],
    ['named "E programmed" in mV', 't (s),E programmed (mV),E (mV),I (A)', (r: [number, number, number]) => [r[0].toFixed(2), (1000 * (r[1] + OFFSET)).toFixed(1), (1000 * r[1]).toFixed(1), r[2].toExponential(5)], 3, 2],
  ])('%s: the measured potential is used and the warning names both columns', (_, header, row, used, kept) => {
    const r = read('pair.csv', `${header}\n${rowsOf(row)}`);
    const truth = sweep();
    const m = r.measurement;
    expect(m.potentialV.length).toBe(truth.length);
    truth.forEach((x, i) => expect(m.potentialV[i]).toBeCloseTo(x[1], 9));
    const d = m.detection.columns;
    expect(d[used - 1]?.role).toBe('potential');
    expect(d[kept - 1]?.role).toBe('other');
    const w = r.warnings.find((x) => x.code === 'POTENTIAL_CHOSEN');
    expect(w?.message).toContain(`column ${used} "${d[used - 1]?.name.replace(/\s*\(.*$/, '')}" is used as the potential`);
    expect(w?.message).toContain(`column ${kept} "`);
    expect(w?.message).toMatch(/kept as an extra column/);
    // 40 mV above, in the column's own unit (V, or mV × 1e-3 V/mV).
    expect(w?.message).toMatch(header.includes('mV') ? /\+40 mV/ : /\+0\.04 V/);
  });

  it('a file whose only potential is the applied one is read with it, and says so', () => {
    const r = read('applied.csv', `Applied potential (V),Current (A)\n${rowsOf((x) => [applied(x[1]), x[2].toExponential(5)])}`);
    sweep().forEach((x, i) => expect(r.measurement.potentialV[i]).toBeCloseTo(x[1] + OFFSET, 9));
    expect(r.warnings.find((x) => x.code === 'POTENTIAL_CHOSEN')?.message).toMatch(/column 1 "Applied potential" its name marks the potential the instrument applied.*no other potential column/);
  });

  it('a column override still wins over the choice, and then no choice is reported', () => {
    const text = `Set potential (V),Potential (V),Current (A)\n${rowsOf((x) => [applied(x[1]), x[1], x[2].toExponential(5)])}`;
    const r = importVoltammogram('pair.csv', new TextEncoder().encode(text), { overrides: { potentialColumn: 0 } });
    sweep().forEach((x, i) => expect(r.measurement.potentialV[i]).toBeCloseTo(x[1] + OFFSET, 9));
    expect(r.warnings.map((x) => x.code)).not.toContain('POTENTIAL_CHOSEN');
  });
});

describe('a table with no names whose current comes first', () => {
  it('µA then mV: the triangle wave is the potential, and the warning says the roles came from the shape', () => {
    const r = read('swapped.csv', rowsOf((x) => [(x[2] * 1e6).toFixed(4), (x[1] * 1000).toFixed(1)]));
    const m = r.measurement;
    expect(m.detection.columns.map((c) => c.role)).toEqual(['current', 'potential']);
    expect(m.detection.potentialUnit.value).toBe('mV');
    sweep().forEach((x, i) => expect(m.potentialV[i]).toBeCloseTo(x[1], 9));
    const w = r.warnings.find((x) => x.code === 'ROLE_GUESSED')?.message ?? '';
    expect(w).toMatch(/column 2 → potential/);
    expect(w).toMatch(/told from the shape of the numbers: column 2 runs as a triangle wave/);
    expect(w).toMatch(/look swapped/);
  });

  it('A then V, and V then A, both come out right', () => {
    const ie = read('ie.csv', rowsOf((x) => [x[2].toExponential(5), x[1]]));
    expect(ie.measurement.detection.columns.map((c) => c.role)).toEqual(['current', 'potential']);
    const ei = read('ei.csv', rowsOf((x) => [x[1], x[2].toExponential(5)]));
    expect(ei.measurement.detection.columns.map((c) => c.role)).toEqual(['potential', 'current']);
    sweep().forEach((x, i) => {
      expect(ie.measurement.potentialV[i]).toBeCloseTo(x[1], 9);
      expect(ei.measurement.currentA[i]).toBeCloseTo(x[2], 10);
    });
    expect(ei.warnings.find((w) => w.code === 'ROLE_GUESSED')?.message).not.toMatch(/swapped/);
  });

  it('when both columns are triangle waves (a resistor: I = E / R), the shape cannot tell and the older rules decide', () => {
    // Ohm's law, I = E / R with R = 10 kΩ (an invented dummy cell).
    const ie = read('resistor.csv', rowsOf((x) => [(x[1] / 1e4).toExponential(5), x[1]]));
    expect(ie.measurement.detection.columns[1]?.explanation).toMatch(/stays below 0\.01 as currents in amperes do/);
    expect(ie.warnings.find((w) => w.code === 'ROLE_GUESSED')?.message).not.toMatch(/shape/);
    const ei = read('resistor.csv', rowsOf((x) => [x[1], (x[1] / 1e4).toExponential(5)]));
    expect(ei.measurement.detection.columns[0]?.explanation).toMatch(/the first unnamed numeric column/);
  });
});
