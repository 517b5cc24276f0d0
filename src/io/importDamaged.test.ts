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
  it('the same numbers quoted ("0,12") are read', () => {
    const quoted = rows.map((r, i) => (i === 0 ? r : r.replace(/(-?\d+,\d+)(?=,|$)/g, '"$1"')));
    const r = importVoltammogram('quoted.csv', quoted.join('\n'));
    expect(r.measurement.potentialV[2]).toBeCloseTo(-0.19, 12);
  });
});
