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
