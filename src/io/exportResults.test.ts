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
  return analyzeRun({
    files: inputs, cells: { 'series 1': { areaCm2: 0.0707, concentrationMolPerCm3: 1e-6 } }, report: { outputConvention: convention }, software: { name: 'halfwave', version: '9.9.9' },
  });
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
    expect(csv).toContain('# cell,series 1,areaCm2,0.0707');
    expect(csv).toMatch(/# method,.*Randles–Ševčík/);
    expect(csv).toContain(`sha256,${'ab'.repeat(32)}`);
    expect(csv).toContain('size_bytes,1234');
  });
  it('has one couple row per file × cycle × couple, with units in the column names', () => {
    const rows = table(csv, 'raw couples');
    expect(rows).toHaveLength(3);
    expect(Object.keys(rows[0] ?? {})).toEqual(expect.arrayContaining(['Epa_V', 'Epc_V', 'E_half_V', 'dEp_V', 'ipa_A', 'ipc_A']));
    expect(rows[0]?.file).toBe('run, 0.1 V/s.csv');
    expect(Number(rows[0]?.ipa_A)).toBeGreaterThan(0);
  });
  // The return/forward ratio of a reduction-first trace is ipa/ipc (Nicholson, Anal. Chem. 38 (1966) 1406, by definition):
  // its column is named by what it holds, return over forward, and holds that for this trace.
  it('names the ratio column return/forward, and holds ipa/ipc for a reduction-first trace', () => {
    const row = table(csv, 'couples')[0]!;
    expect(Object.keys(row)).toContain('ip return / ip forward');
    expect(Object.keys(row).some((k) => k.includes('ipc/ipa'))).toBe(false);
    expect(Number(row['ip return / ip forward'])).toBeCloseTo(Number(row['ipa / µA']) / Number(row['ipc / µA']), 3);
  });
  it('writes the series with D and its interval', () => {
    const s = table(csv, 'raw series');
    expect(s).toHaveLength(1);
    const d = Number(s[0]?.D_cm2_per_s);
    expect(d).toBeGreaterThan(0);
    expect(Number(s[0]?.D_ci95_low)).toBeLessThanOrEqual(d);
  });
  // IUPAC Gold Book; ASDL "Plotting Conventions for Voltammetry": the polarographic convention flips signed currents only.
  it('flips signed currents, not magnitudes, in the polarographic convention', () => {
    const polar = table(resultsSheetCsv(makeRun('polarographic')), 'raw peaks');
    const iupac = table(csv, 'raw peaks');
    expect(Number(polar[0]?.i_at_Ep_A)).toBeCloseTo(-Number(iupac[0]?.i_at_Ep_A), 18);
    expect(polar[0]?.ip_A).toBe(iupac[0]?.ip_A);
  });
});

describe('resultsSheetJson', () => {
  it('carries the same keys as the analyze contract, with provenance, and no point arrays', () => {
    const text = resultsSheetJson(makeRun('iupac'));
    const doc = JSON.parse(text) as { sheet: string; files: Array<{ file: string; sha256: string }>; series: Array<{ couple: number; D: number }>; provenance: { cells: Record<string, { areaCm2: number }> } };
    expect(doc.sheet).toBe('halfwave-results');
    expect(doc.series).toHaveLength(1);
    expect(doc.series[0]?.D).toBeGreaterThan(0);
    expect(doc.files[0]?.sha256).toBe('ab'.repeat(32));
    expect(doc.provenance.cells['series 1']?.areaCm2).toBe(0.0707);
    expect(text).not.toMatch(/"smoothed"|"potentialV"/);
  });
});
