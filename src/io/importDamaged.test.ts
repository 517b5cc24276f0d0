/**
 * Damaged or ambiguous layouts: each is refused with the line and what to do, or read with a
 * warning that names the lines left out. The files are triangle sweeps of our own invention
 * (-0.2 → 0.6 V and back in 5 mV steps, a current bump of a few µA), written in each layout.
 * Rules: common practice, no source.
 */
import { describe, expect, it } from 'vitest';
import { ImportError } from './errors';
import { importVoltammogram } from './importVoltammogram';

const N = 321;
function point(i: number): { t: number; e: number; iUa: number } {
  const e = i <= 160 ? -0.2 + 0.005 * i : 0.6 - 0.005 * (i - 160);
  return { t: 0.1 * i, e, iUa: 4 * Math.exp(-(((e - 0.2) / 0.12) ** 2)) + (i <= 160 ? 0.05 : -0.05) };
}

function refusal(name: string, data: string): ImportError {
  try {
    importVoltammogram(name, data);
  } catch (err) {
    expect(err).toBeInstanceOf(ImportError);
    return err as ImportError;
  }
  throw new Error('expected an ImportError');
}

describe('comma delimiter with an unquoted decimal comma', () => {
  const rows = ['Time (s),Potential (V),Current (µA)'];
  for (let i = 0; i < N; i++) {
    const p = point(i);
    rows.push([p.t.toFixed(2), p.e.toFixed(4), p.iUa.toFixed(4)].map((x) => x.replace('.', ',')).join(','));
  }
  it('3 names over rows of 6 fields → AMBIGUOUS_DECIMAL_COMMA on the first data line, saying what to do', () => {
    const e = refusal('split.csv', rows.join('\n'));
    expect(e.code).toBe('AMBIGUOUS_DECIMAL_COMMA');
    expect(e.line).toBe(2);
    expect(e.message).toMatch(/names 3 columns, but the rows split at ',' into 6 fields/);
    expect(e.message).toMatch(/';' or tab/);
  });
  it('the same rows with no names above them: refused all the same, from the fixed decimals', () => {
    const e = refusal('bare.csv', rows.slice(1).join('\n'));
    expect(e.code).toBe('AMBIGUOUS_DECIMAL_COMMA');
    expect(e.message).toMatch(/split at ',' into 6 fields .*always as many digits/);
  });
  it('whole numbers of changing width with no names (an index and a potential in mV) are read', () => {
    const ints = Array.from({ length: N }, (_, i) => `${i},${Math.round(point(i).e * 1000)},${i % 7},${Math.round(point(i).iUa * 1000)}`);
    expect(importVoltammogram('ints.csv', ints.join('\n')).measurement.potentialV.length).toBe(N);
  });
  it('the same numbers quoted ("0,12") are read', () => {
    const quoted = rows.map((r, i) => (i === 0 ? r : r.replace(/(-?\d+,\d+)(?=,|$)/g, '"$1"')));
    const r = importVoltammogram('quoted.csv', quoted.join('\n'));
    expect(r.measurement.potentialV[2]).toBeCloseTo(-0.19, 12);
  });
});

describe('a last row cut off', () => {
  const rows = ['t/s,E/V,I/A'];
  for (let i = 0; i < N; i++) {
    const p = point(i);
    rows.push(`${p.t.toFixed(2)},${p.e.toFixed(4)},${(p.iUa * 1e-6).toExponential(6)}`);
  }
  const whole = rows.join('\n');
  it('"…,-2.5" under rows of "-2.570897e-06", no final line break → left out with LAST_ROW_CUT naming the line', () => {
    const cut = whole.slice(0, whole.lastIndexOf(',') + 5);
    const r = importVoltammogram('cut.csv', cut);
    expect(r.measurement.potentialV.length).toBe(N - 1);
    const w = r.warnings.find((x) => x.code === 'LAST_ROW_CUT');
    expect(w?.lines).toEqual([N + 1]);
    expect(w?.message).toContain('ends without a line break');
  });
  it('the same cut with a line break after it is still left out', () => {
    const cut = `${whole.slice(0, whole.lastIndexOf(',') + 4)}\n`;
    expect(importVoltammogram('cut2.csv', cut).measurement.potentialV.length).toBe(N - 1);
  });
  it('a short table that starts on the file\'s second line (a blank first line) is read, not looked at forever', () => {
    // The look back for the rows above the last one must stop at the file's start (seen with a
    // fuzzed input that began with a line break: the search never got past index 0).
    const short = `\n${rows.slice(1, 9).join('\n')}`;
    expect(importVoltammogram('short.csv', short).measurement.potentialV.length).toBe(8);
  });
  it('an intact file keeps every row; a file of varying shapes (shortest form of each number) is not judged', () => {
    expect(importVoltammogram('whole.csv', whole).measurement.potentialV.length).toBe(N);
    const varying = ['t/s,E/V,I/A', ...Array.from({ length: N }, (_, i) => { const p = point(i); return `${+p.t.toFixed(2)},${+p.e.toFixed(4)},${+(p.iUa * 1e-6).toPrecision(4)}`; })].join('\n');
    const r = importVoltammogram('varying.csv', varying);
    expect(r.measurement.potentialV.length).toBe(N);
    expect(r.warnings.map((w) => w.code)).not.toContain('LAST_ROW_CUT');
  });
});

describe('exports joined with a header that changes units', () => {
  /** First half in V and A under "Potential (V)", second half under `secondHeader` in mV. */
  function joined(secondHeader: string): string {
    const rows = ['Time (s),Potential (V),Current (A)'];
    for (let i = 0; i < N; i++) {
      const p = point(i);
      if (i === 161) rows.push(secondHeader);
      const e = i <= 160 ? p.e.toFixed(4) : (p.e * 1000).toFixed(1);
      rows.push(`${p.t.toFixed(2)},${e},${(p.iUa * 1e-6).toExponential(6)}`);
    }
    return rows.join('\n');
  }
  // 1 mV = 1e-3 V: BIPM, SI Brochure, 9th ed. (2019), Table 7.
  it('the block under "Potential (mV)" is converted to V, and the warning names the line', () => {
    const r = importVoltammogram('joined.csv', joined('Time (s),Potential (mV),Current (A)'));
    expect(r.measurement.potentialV.length).toBe(N);
    expect(r.measurement.potentialV[200]).toBeCloseTo(point(200).e, 12);
    expect(r.measurement.cycles.length).toBe(1);
    expect(r.warnings.find((w) => w.code === 'REPEATED_HEADER' && w.message.includes('from line 163'))).toBeDefined();
  });
  it('a repeat whose unit cannot be converted (mV → a charge in C) → UNITS_CHANGE with the line', () => {
    const e = refusal('joined2.csv', joined('Time (s),Potential (C),Current (A)'));
    expect([e.code, e.line, e.column]).toEqual(['UNITS_CHANGE', 163, 2]);
  });
});

describe('a short numeric block after the table', () => {
  const rows = ['t/s;E/V;I/A'];
  for (let i = 0; i < N; i++) {
    const p = point(i);
    rows.push(`${p.t.toFixed(2)};${p.e.toFixed(4)};${(p.iUa * 1e-6).toExponential(6)}`);
  }
  it('a summary row after a blank line that does not continue the sweep → left out with NUMERIC_FOOTER naming its line', () => {
    const text = `${rows.join('\n')}\n\nSummary (E/V; ipa/A; ipc/A)\n0.2000;4.0e-6;-3.1e-6\n`;
    const r = importVoltammogram('footer.csv', text);
    expect(r.measurement.potentialV.length).toBe(N);
    expect(r.measurement.cycles.length).toBe(1);
    const w = r.warnings.find((x) => x.code === 'NUMERIC_FOOTER');
    expect(w?.lines).toEqual([N + 4]);
    expect(r.measurement.detection.footer).toEqual({ lines: 2, firstLine: N + 3 });
  });
  it('the last rows after a blank line that continue the sweep are kept', () => {
    const text = [...rows.slice(0, -2), '', ...rows.slice(-2)].join('\n');
    const r = importVoltammogram('gap.csv', text);
    expect(r.measurement.potentialV.length).toBe(N);
    expect(r.warnings.map((w) => w.code)).not.toContain('NUMERIC_FOOTER');
  });
});

describe('clearer refusals', () => {
  it('units written in every cell ("-0.1000 V") → NO_TABLE naming the line and column and saying so', () => {
    const text = ['E,I', ...Array.from({ length: 40 }, (_, i) => `${point(i).e.toFixed(4)} V,${(point(i).iUa * 1e-6).toExponential(3)} A`)].join('\n');
    const e = refusal('units.csv', text);
    expect([e.code, e.line, e.column]).toEqual(['NO_TABLE', 2, 1]);
    expect(e.message).toContain('the cells hold units');
  });
  it('a header and nothing under it → "a header but no data rows"', () => {
    const e = refusal('empty.csv', 'Time (s),Potential (V),Current (A)\n');
    expect(e.message).toContain('a header but no data rows');
    expect(e.line).toBe(1);
  });
  // Encodings: RFC 3629 (UTF-8) sect. 4; ISO/IEC 8859-1 0xE9 = é; The Unicode Standard ch. 23.8 (U+FEFF BOM).
  const latin1 = Uint8Array.from([...new TextEncoder().encode('Operator: Ren'), 0xe9, ...new TextEncoder().encode(['', 'E/V,I/A', ...Array.from({ length: 20 }, (_, i) => `${point(i).e.toFixed(3)},${point(i).iUa}`)].join('\n'))]);
  it('utf-8 set for Latin-1 bytes → ENCODING naming line, character and byte, and suggesting latin1', () => {
    let e: ImportError | null = null;
    try {
      importVoltammogram('latin.txt', latin1, { overrides: { encoding: 'utf-8' } });
    } catch (err) {
      e = err as ImportError;
    }
    expect(e?.code).toBe('ENCODING');
    expect(e?.line).toBe(1);
    expect(e?.message).toContain('0xE9 at line 1, character 14');
    expect(e?.message).toContain('latin1');
  });
  it('utf-16be or latin1 set for UTF-16 LE bytes → ENCODING suggesting utf-16le', () => {
    const text = 'E/V\tI/A\n0.1\t1e-6\n0.2\t2e-6\n0.3\t3e-6\n';
    const le = new Uint8Array(text.length * 2);
    for (let i = 0; i < text.length; i++) le[2 * i] = text.charCodeAt(i);
    for (const encoding of ['utf-16be', 'latin1'] as const) {
      try {
        importVoltammogram('wide.txt', le, { overrides: { encoding } });
        throw new Error('expected a refusal');
      } catch (err) {
        expect((err as ImportError).code).toBe('ENCODING');
        expect((err as ImportError).message).toContain('choose utf-16le');
      }
    }
  });
});

describe('a damaged line among the first rows', () => {
  // The sweep's first points stay in; the damaged line is left out and located.
  const rows = (bad: number, text: string) => {
    const out = ['Potential (V),Current (µA)'];
    for (let i = 0; i < N; i++) {
      const p = point(i);
      out.push(i === bad ? text : `${p.e.toFixed(4)},${p.iUa.toFixed(5)}`);
    }
    return `${out.join('\n')}\n`;
  };
  it.each([
    ['a mistyped number', 2, '0.49x0,1.2'],
    ['a missing-value row', 1, '--,--'],
  ])('%s on the table\'s line %i: the rows above it are read, the header found', (_label, bad, text) => {
    const r = importVoltammogram('early.csv', rows(bad, text));
    const d = r.measurement.detection;
    expect(d.headerLine.value).toBe(1);
    expect(d.columns.map((c) => c.role)).toEqual(['potential', 'current']);
    expect(r.measurement.potentialV.length).toBe(N - 1);
    expect(r.measurement.potentialV[0]).toBeCloseTo(point(0).e, 9);
    const skipped = r.warnings.find((w) => w.code === 'SKIPPED_ROWS');
    expect(skipped?.message).toMatch(new RegExp(`1 line inside the table skipped .* line ${bad + 2}$`));
  });
  it('a short numeric block above the names stays a preamble', () => {
    const r = importVoltammogram('pre.csv', `1,2\n3,4\n${rows(-1, '')}`);
    expect(r.measurement.detection.headerLine.value).toBe(3);
    expect(r.measurement.potentialV.length).toBe(N);
  });
});
