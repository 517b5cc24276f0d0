/**
 * Layouts an import audit found misread, written here in scenarios of our own invention and read
 * back through importVoltammogram: an area with its unit in the key, "vs" (versus) in a file name,
 * an instrument-setting column beside the current, a column that numbers sweeps, a scan-rate line
 * without a unit. The trace is our own triangle wave: −0.2 → 0.4 V and back, 5 mV steps every
 * 50 ms, so dE/dt = 0.1 V/s by construction; its current is an invented bump on a charging step.
 * Unit factors: BIPM SI Brochure, 9th ed. (2019), Table 7 (m = 1e-3); 1 mm² = 0.01 cm².
 */
import { describe, expect, it } from 'vitest';
import { importVoltammogram } from './importVoltammogram';
import type { ImportOverrides } from './types';

const STEP_V = 0.005;
const PER_SWEEP = 120;

/** Rows of [t (s), E (V), I (A), sweep number, cycle number] for `cycles` cycles. */
function triangleRows(cycles: number): number[][] {
  const rows: number[][] = [];
  for (let i = 0; i <= 2 * cycles * PER_SWEEP; i++) {
    const sweep = Math.floor(i / PER_SWEEP);
    const k = i - sweep * PER_SWEEP;
    const up = sweep % 2 === 0;
    const e = up ? -0.2 + k * STEP_V : 0.4 - k * STEP_V;
    const current = (up ? 1 : -1) * 1e-6 + 1e-5 * Math.exp(-(((e - 0.1) / 0.05) ** 2)) * (up ? 1 : -0.8);
    rows.push([i * 0.05, +e.toFixed(4), current, Math.min(sweep, 2 * cycles - 1) + 1, Math.floor(Math.min(i, 2 * cycles * PER_SWEEP - 1) / (2 * PER_SWEEP)) + 1]);
  }
  return rows;
}

const read = (name: string, text: string, overrides: ImportOverrides = {}) => importVoltammogram(name, new TextEncoder().encode(text), { overrides });
const codes = (r: ReturnType<typeof read>) => r.warnings.map((w) => w.code);

function table(header: string, pick: (r: number[]) => (number | string)[], cycles = 2, sep = ','): string {
  return `${header}\n${triangleRows(cycles).map((r) => pick(r).join(sep)).join('\n')}\n`;
}
const EI = (r: number[]) => [r[1] as number, (r[2] as number).toExponential(6)];

describe('a preamble key that carries its unit', () => {
  // 0.0707 cm² written as cm² in the key, and as 7.07 mm² (× 0.01 cm²/mm², SI Brochure Table 7).
  it.each([
    ['Area (cm2): 0.0707', 0.0707],
    ['Area (mm2): 7.07', 0.0707],
    ['Electrode area [mm²] = 7.07', 0.0707],
    ['"Fläche";"0,0707 cm²"', 0.0707],
  ])('"%s" gives %f cm², not the unit\'s exponent', (line, area) => {
    const m = read('cell.txt', `${line}\n${table('E (V),I (A)', EI)}`).measurement;
    expect(m.areaCm2?.value).toBeCloseTo(area, 12);
    expect(m.areaCm2?.line).toBe(1);
  });
  // Area of a disk π d²/4 (elementary geometry): d = 3 mm → 0.0706858 cm².
  it.each(['Diameter: 3 mm', 'Electrode diameter: 3 mm', 'Diameter (mm) = 3'])('"%s" gives the disk\'s area π d²/4', (line) => {
    const m = read('disk.txt', `${line}\n${table('E (V),I (A)', EI)}`).measurement;
    expect(m.areaCm2?.value).toBeCloseTo((Math.PI * 0.3 ** 2) / 4, 12);
    expect(m.areaCm2?.text).toMatch(/π d²\/4/);
  });
  it('a counter electrode\'s diameter and an area in a unit it does not know are not taken', () => {
    expect(read('a.txt', `Counter electrode diameter: 5 mm\n${table('E (V),I (A)', EI)}`).measurement.areaCm2).toBeNull();
    expect(read('a.txt', `Area (in2): 0.011\n${table('E (V),I (A)', EI)}`).measurement.areaCm2).toBeNull();
  });
  // T/K = t/°C + 273.15 (SI Brochure sect. 2.3.1); 1 mM = 1e-6 mol/cm³ (1 L = 1000 cm³, Table 8).
  it('temperature, concentration and scan rate with the unit in the key', () => {
    const pre = 'Scan Rate (V/s) = 0.05\nTemperature (K): 298.15\nConcentration (mM): 2.5\n';
    const m = read('k.txt', `${pre}${table('E (V),I (A)', EI)}`).measurement;
    expect(m.scanRateVPerS).toBeCloseTo(0.05, 12);
    expect(m.temperatureK?.value).toBeCloseTo(298.15, 9);
    expect(m.concentrationMolPerCm3?.value).toBeCloseTo(2.5e-6, 18);
    const c = read('c.txt', `Scan rate (mV/s): 50\nTemperature (°C): 25\n${table('E (V),I (A)', EI)}`).measurement;
    expect(c.scanRateVPerS).toBeCloseTo(0.05, 12);
    expect(c.temperatureK?.value).toBeCloseTo(298.15, 9);
  });
});

describe('"vs" (versus) in a file name is no scan rate', () => {
  it.each(['Fc_5_vs_AgCl.csv', 'sample_2_vs_SCE.csv', 'run3_vs_Ag.csv', 'ferrocene_0.1_vs_AgAgCl.csv'])('%s: no rate from the name', (name) => {
    const r = read(name, table('E (V),I (A)', EI));
    expect(r.measurement.scanRateVPerS).toBeNull();
    expect(codes(r)).toContain('NO_SCAN_RATE');
  });
  // 0.1 V/s by construction of the time column (5 mV per 50 ms): no disagreement with "28_vs".
  it('with a time column, "28_vs" raises no disagreement', () => {
    const r = read('couple_28_vs_Fc.csv', table('t (s),E (V),I (A)', (x) => [x[0] as number, ...EI(x)]));
    expect(r.measurement.scanRateVPerS).toBeCloseTo(0.1, 6);
    expect(codes(r)).not.toContain('SCAN_RATE_DISAGREES');
  });
});

describe('an instrument-setting column beside the current', () => {
  // The current read must be the measured column's numbers, unchanged (identity, no source needed).
  it.each(['Current range (A)', 'Gain', 'I set (A)', 'Sensitivity (A/V)'])('"%s" before "Current (A)" does not win', (setting) => {
    const r = read('set.csv', table(`Time (s),${setting},Potential (V),Current (A)`, (x) => [x[0] as number, 1e-4, ...EI(x)]));
    const m = r.measurement;
    expect(m.detection.columns[3]?.role).toBe('current');
    expect(m.detection.columns[1]?.role).toBe('other');
    expect(m.currentA[0]).toBeCloseTo(triangleRows(2)[0]?.[2] as number, 12);
    expect(m.detection.columns[3]?.explanation).not.toMatch(/density/);
  });
  it('a current named by its word is preferred to one named only by its unit, and says so', () => {
    const r = read('two.csv', table('Ic (A),E (V),Current (A)', (x) => [2e-7, ...EI(x)]));
    expect(r.measurement.detection.columns[2]?.role).toBe('current');
    expect(r.measurement.detection.columns[0]?.explanation).toMatch(/its name says current/);
  });
});

describe('a column that numbers sweeps is not a cycle column', () => {
  // Two cycles of two sweeps each (construction): a segment counter steps at all 3 vertices.
  it('"Segment" stepping at every vertex is kept as an extra column, and 2 cycles are found', () => {
    const r = read('seg.csv', table('Segment,E (V),I (A)', (x) => [x[3] as number, ...EI(x)]));
    expect(r.measurement.cycles.length).toBe(2);
    expect(r.measurement.cycleColumn).toBeNull();
    expect(r.measurement.detection.columns[0]?.role).toBe('other');
    expect(codes(r)).toContain('CYCLE_COLUMN_IGNORED');
  });
  it('a true cycle counter (one step per two sweeps) is still used', () => {
    const r = read('cyc.csv', table('Cycle,E (V),I (A)', (x) => [x[4] as number, ...EI(x)], 3));
    expect(r.measurement.cycles.length).toBe(3);
    expect(r.measurement.detection.columns[0]?.role).toBe('cycle');
    expect(codes(r)).not.toContain('CYCLE_COLUMN_IGNORED');
  });
  it('"no cycle column" (cycleColumn −1) also stops a guessed cycle column; choosing it by hand keeps it', () => {
    const text = table('Segment,E (V),I (A)', (x) => [x[4] as number, ...EI(x)], 3);
    expect(read('n.csv', text).measurement.detection.columns[0]?.role).toBe('cycle');
    const none = read('n.csv', text, { cycleColumn: -1 }).measurement;
    expect(none.detection.columns[0]?.role).toBe('other');
    expect(none.cycleColumn).toBeNull();
    const seg = read('s.csv', table('Segment,E (V),I (A)', (x) => [x[3] as number, ...EI(x)]), { cycleColumn: 0 }).measurement;
    expect(seg.cycles.length).toBe(4);
  });
});

describe('a scan-rate line without a unit', () => {
  it('is not used, and the warning names it instead of saying there is none', () => {
    const r = read('bare.txt', `Scan rate: 50\n${table('Potential (V),Current (A)', EI)}`);
    expect(r.measurement.scanRateVPerS).toBeNull();
    const w = r.warnings.find((x) => x.code === 'NO_SCAN_RATE');
    expect(w?.message).toMatch(/line 1 \("Scan rate: 50"\) names a scan rate but gives no unit/);
    expect(w?.lines).toEqual([1]);
    expect(r.measurement.detection.scanRate.explanation).not.toMatch(/no scan-rate line/);
  });
  // 0.1 V/s from the time column (construction); "100" read as mV/s is 0.1 V/s (SI Table 7).
  it('beside a time column, it is compared with the rate used', () => {
    const r = read('bare.txt', `Scan rate: 100\n${table('t (s),E (V),I (A)', (x) => [x[0] as number, ...EI(x)])}`);
    expect(r.measurement.scanRateVPerS).toBeCloseTo(0.1, 6);
    expect(r.warnings.find((x) => x.code === 'SCAN_RATE_NO_UNIT')?.message).toMatch(/read as mV\/s it agrees/);
  });
});

describe('names that say what the columns are', () => {
  // Unit words: volt, ampere and the SI prefixes milli, micro (SI Brochure, Table 7).
  it('unit words "(Volts)", "(millivolts)", "(microamps)" are units, not lost', () => {
    const r = read('words.csv', table('Potential (millivolts),Current (microamps)', (x) => [((x[1] as number) * 1000).toFixed(1), ((x[2] as number) * 1e6).toFixed(6)]));
    expect(r.measurement.detection.potentialUnit.value).toBe('mV');
    expect(r.measurement.detection.currentUnit.value).toBe('µA');
    expect(r.measurement.currentA[0]).toBeCloseTo(triangleRows(2)[0]?.[2] as number, 12);
    expect(codes(r)).not.toContain('ROLE_GUESSED');
    const v = read('volts.csv', table('Potential (Volts),Current (Amps)', EI)).measurement.detection;
    expect([v.potentialUnit.value, v.currentUnit.value]).toEqual(['V', 'A']);
  });
  it('a table whose names name no potential and no current (an impedance spectrum) is refused', () => {
    const rows = Array.from({ length: 30 }, (_, k) => {
      const f = 1e5 / 10 ** (k / 5);
      return [f.toExponential(4), (50 + 1000 / (1 + (f / 100) ** 2)).toFixed(3), ((1000 * f) / 100 / (1 + (f / 100) ** 2)).toFixed(3), (-k * 2).toFixed(2)].join(',');
    });
    const text = `Freq (Hz),Z' (Ohm),-Z'' (Ohm),Phase (deg)\n${rows.join('\n')}\n`;
    expect(() => read('spectrum.csv', text)).toThrow(/name no potential and no current/);
    // Impedance named in words or as Z parts, without units, is refused the same way.
    for (const names of ['Frequency,Real,Imag,Phase', 'Freq,Zre,Zim,Phase', 'freq,Re(Z),Im(Z),|Z|']) {
      expect(() => read('spectrum_words.csv', `${names}\n${rows.join('\n')}\n`), names).toThrow(/name no potential and no current/);
    }
    // Primed names are refused too (no current column can be told).
    expect(() => read('spectrum_primes.csv', `Freq,Z',Z'',phase\n${rows.join('\n')}\n`)).toThrow(/could not tell which column is the current/);
    // Names that say nothing ("x", "y") still leave the roles to the numbers.
    expect(read('xy.csv', table('x,y', EI)).measurement.detection.columns.map((c) => c.role)).toEqual(['potential', 'current']);
  });
});

describe('header lines written unlike the numbers below them', () => {
  // Header layouts (common practice, no source); unit factors as above (SI Brochure, Table 7).
  // The current comes first in these files, so a header left unread would swap the roles.
  const IE = (x: number[]) => [((x[2] as number) * 1e6).toFixed(5), x[1] as number];
  const rolesAndUnits = (r: ReturnType<typeof read>) => {
    const d = r.measurement.detection;
    return [d.columns.map((c) => c.role), d.potentialUnit.value, d.currentUnit.value];
  };
  it('a note beside the unit in the brackets holds the delimiter: "I (µA, cathodic positive),E (V)"', () => {
    const text = table('I (µA, cathodic positive),E (V)', (x) => [(-(x[2] as number) * 1e6).toFixed(5), x[1] as number]);
    const r = read('pol.csv', text);
    expect(rolesAndUnits(r)).toEqual([['current', 'potential'], 'V', 'µA']);
    // Cathodic positive: the file's numbers are −i (IUPAC), read back as i.
    expect(r.measurement.detection.currentConvention.value).toBe('polarographic');
    expect(r.measurement.currentA[0]).toBeCloseTo(triangleRows(2)[0]?.[2] as number, 11);
  });
  it('names by commas above tab-separated numbers', () => {
    const r = read('mixed.txt', table('I/µA,E/V', IE, 2, '\t'));
    expect(rolesAndUnits(r)).toEqual([['current', 'potential'], 'V', 'µA']);
  });
  it('single spaces between names that carry their units in brackets', () => {
    const r = read('spaced.txt', table('Current (µA) Potential (V)', IE, 2, ' '));
    expect(rolesAndUnits(r)).toEqual([['current', 'potential'], 'V', 'µA']);
    expect(r.measurement.detection.columns.map((c) => c.name)).toEqual(['Current (µA)', 'Potential (V)']);
  });
  it('a comment mark before the names', () => {
    const r = read('marked.csv', table('# I/µA; E/V', IE, 2, ','));
    expect(rolesAndUnits(r)).toEqual([['current', 'potential'], 'V', 'µA']);
  });
  it('a line that no reading splits into as many names as the table stays a preamble line', () => {
    const r = read('odd.csv', `Run (3) of series (A)\n${table('', IE).trimStart()}`);
    expect(r.measurement.detection.headerLine.value).toBeNull();
  });
});

describe('numbers written with the typographic minus sign', () => {
  // Unicode 15, U+2212 MINUS SIGN: text copied from a report carries it where an export writes "-".
  it('are read as negative numbers, the same as with "-", and said once with the line', () => {
    const plain = table('E (V),I (A)', EI);
    const typographic = plain.replace(/-/g, '\u2212');
    const a = read('plain.csv', plain);
    const b = read('typographic.csv', typographic);
    expect(Array.from(b.measurement.potentialV)).toEqual(Array.from(a.measurement.potentialV));
    expect(Array.from(b.measurement.currentA)).toEqual(Array.from(a.measurement.currentA));
    const w = b.warnings.find((x) => x.code === 'MINUS_SIGNS_READ');
    expect(w?.lines).toEqual([2]);
    expect(codes(a)).not.toContain('MINUS_SIGNS_READ');
  });
});

describe('a time column without a unit', () => {
  // The trace steps 5 mV every 50 ms: 0.1 V/s by construction. Written in ms under a bare "t",
  // read as seconds it gives 0.1 mV/s, so the assumption is said with both readings.
  const ms = (r: number[]) => [(r[0] as number) * 1000, r[1] as number, (r[2] as number).toExponential(6)];
  it('is read as seconds and says what milliseconds would give', () => {
    const r = read('bare_t.csv', table('t,E,I', ms));
    expect(r.measurement.scanRateVPerS).toBeCloseTo(1e-4, 8);
    const w = r.warnings.find((x) => x.code === 'UNIT_ASSUMED' && /time unit/.test(x.message));
    expect(w?.message).toMatch(/0\.1 mV\/s.*100 mV\/s/);
  });
  it('says nothing when the unit is written, or when another source agrees', () => {
    const s = (r: number[]) => [r[0] as number, r[1] as number, (r[2] as number).toExponential(6)];
    expect(read('t_s.csv', table('t (s),E (V),I (A)', s)).warnings.some((x) => /time unit/.test(x.message))).toBe(false);
    expect(read('bare_t.csv', `Scan rate: 100 mV/s\n${table('t,E,I', s)}`).warnings.some((x) => /time unit/.test(x.message))).toBe(false);
  });
});

describe('a cycle column that never changes', () => {
  // Our triangle runs two cycles (−0.2 → 0.4 → −0.2 V twice); a "Cycle" column of 1 on every row
  // numbers none of them, so the cycles come from the potential's turns, with a warning.
  it('is set aside and the two cycles are found from the potential', () => {
    const r = read('one_cycle_number.csv', table('Time (s),Potential (V),Current (A),Cycle', (row) => [row[0] as number, row[1] as number, (row[2] as number).toExponential(6), 1]));
    expect(r.measurement.cycles).toHaveLength(2);
    expect(r.warnings.find((w) => w.code === 'CYCLE_COLUMN_IGNORED')?.message).toMatch(/holds 1 on every row/);
  });
});
