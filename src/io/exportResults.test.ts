import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { analyzeRun } from '../core/analysis/analyzeRun';
import { simulatedVoltammogram } from '../core/peaks/simulatedVoltammogram';
import { resultsSheetCsv, resultsSheetJson } from './exportResults';

function makeRun(convention: 'iupac' | 'polarographic') {
  const inputs = [0.1, 0.2, 0.4].map((v) => ({
    fileName: `run, ${v} V/s.csv`,
    voltammogram: simulatedVoltammogram({ scanRateVPerS: v, k0CmPerS: Infinity }),
    provenance: { sizeBytes: 1234, sha256: 'ab'.repeat(32), layout: 'comma-separated, E/V, I/A, t/s' },
  }));
  return analyzeRun(inputs, { areaCm2: 0.0707, concentrationMolPerCm3: 1e-6, outputConvention: convention, software: { name: 'halfwave', version: '9.9.9' } });
}

/** The rows of one '# table: name' block, parsed as CSV with a header line. */
function table(csv: string, name: string): Record<string, string>[] {
  const block = csv.split('\n\n').find((b) => b.startsWith(`# table: ${name}\n`));
  if (!block) throw new Error(`no table ${name}`);
  return Papa.parse<Record<string, string>>(block.slice(block.indexOf('\n') + 1).trim(), { header: true }).data;
}

describe('resultsSheetCsv', () => {
  const run = makeRun('iupac');
  const csv = resultsSheetCsv(run, { createdAt: '2026-01-01T00:00:00Z', command: 'analyze a b c' });
  it('opens with provenance: software version, parameters, methods, files with hash and size', () => {
    expect(csv).toMatch(/^# results sheet,halfwave,9\.9\.9/);
    expect(csv).toContain('# parameter,areaCm2,0.0707');
    expect(csv).toMatch(/# method,.*Randles–Ševčík/);
    expect(csv).toContain(`sha256,${'ab'.repeat(32)}`);
    expect(csv).toContain('size_bytes,1234');
  });
  it('has one couple row per file × cycle × couple, with units in the column names', () => {
    const rows = table(csv, 'couples');
    expect(rows).toHaveLength(3);
    expect(Object.keys(rows[0] ?? {})).toEqual(expect.arrayContaining(['Epa_V', 'Epc_V', 'E_half_V', 'dEp_V', 'ipa_A', 'ipc_A']));
    expect(rows[0]?.file).toBe('run, 0.1 V/s.csv');
    expect(Number(rows[0]?.ipa_A)).toBeGreaterThan(0);
  });
  it('writes the series with D and its interval', () => {
    const s = table(csv, 'series');
    expect(s).toHaveLength(1);
    const d = Number(s[0]?.D_cm2_per_s);
    expect(d).toBeGreaterThan(0);
    expect(Number(s[0]?.D_ci95_low)).toBeLessThanOrEqual(d);
  });
  // check-values.md §14: the polarographic convention flips signed currents only.
  it('flips signed currents, not magnitudes, in the polarographic convention', () => {
    const polar = table(resultsSheetCsv(makeRun('polarographic')), 'peaks');
    const iupac = table(csv, 'peaks');
    expect(Number(polar[0]?.i_at_Ep_A)).toBeCloseTo(-Number(iupac[0]?.i_at_Ep_A), 18);
    expect(polar[0]?.ip_A).toBe(iupac[0]?.ip_A);
  });
});

describe('resultsSheetJson', () => {
  it('is parseable and leaves out point arrays', () => {
    const doc = JSON.parse(resultsSheetJson(makeRun('iupac'))) as { sheet: string; files: Array<{ analysis: { smoothed: unknown } }>; series: { couples: unknown[] } };
    expect(doc.sheet).toBe('halfwave-results');
    expect(doc.series.couples).toHaveLength(1);
    expect(JSON.stringify(doc.files[0]?.analysis.smoothed ?? {})).toBe('{}');
  });
});
