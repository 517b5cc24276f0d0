/**
 * `analyze` and reference scales end to end: files written here from the project's simulator
 * (reversible couples; E½ = E°′ within 1 mV for equal D, Bard & Faulkner, Electrochemical Methods
 * 2nd ed. (2001) §6.2.1), each with its own reference line in the header.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';
import { simulatedVoltammogram } from '../core/peaks/simulatedVoltammogram';
import { runCli } from './main';

const dir = mkdtempSync(join(tmpdir(), 'halfwave-refs-'));

function write(name: string, header: string[], formalPotentialV: number, scanRateVPerS: number, columns = 'Time (s),Potential (V),Current (A)'): string {
  const v = simulatedVoltammogram({ k0CmPerS: Infinity, formalPotentialV, startV: 0.8, switchV: -0.2, scanRateVPerS });
  const rows = Array.from(v.potentialV, (e, k) => `${(v.timeS as Float64Array)[k]!.toFixed(5)},${e.toFixed(5)},${v.currentA[k]!.toExponential(6)}`);
  const path = join(dir, name);
  writeFileSync(path, [...header, columns, ...rows].join('\n'));
  return path;
}

async function run(...argv: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await runCli(argv, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t) });
  return { code, stdout, stderr };
}

type Contract = { files: Array<{ cycles: Array<{ couples: Array<{ Ehalf: number }> }> }>; warnings: string[] };
const eHalves = (out: string) => (JSON.parse(out) as Contract).files.map((f) => f.cycles[0]?.couples[0]?.Ehalf ?? Number.NaN);

describe('analyze: reference scales per file', () => {
  // Bard & Faulkner 2001, inside back cover: SCE 0.2412 V vs SHE; Ag/AgCl (3 M KCl) 0.210 V (from memory). The same
  // couple at 0.300 V on each file's own scale reads 0.5412 V (SCE files) and 0.510 V (the Ag/AgCl file) vs SHE.
  it('converts a series that mixes references file by file, and warns in --json and text', async () => {
    const files = [
      write('mix_50mVs.csv', ['Reference electrode: SCE'], 0.3, 0.05),
      write('mix_100mVs.csv', ['Reference electrode: Ag/AgCl (3 M KCl)'], 0.3, 0.1),
      write('mix_200mVs.csv', ['Reference electrode: SCE'], 0.3, 0.2),
    ];
    const json = await run('analyze', ...files, '--ref', 'SHE', '--json');
    expect(json.code).toBe(0);
    const e = eHalves(json.stdout);
    expect(Math.abs((e[0] ?? 0) - 0.5412)).toBeLessThan(0.002);
    expect(Math.abs((e[1] ?? 0) - 0.51)).toBeLessThan(0.002);
    const warnings = (JSON.parse(json.stdout) as Contract).warnings.join('\n');
    expect(warnings).toMatch(/mixes reference electrodes \(mix_50mVs\.csv: SCE; mix_100mVs\.csv: AgCl-3M; mix_200mVs\.csv: SCE\)/);
    expect(warnings).toMatch(/contains mercury/);
    const text = await run('analyze', ...files, '--ref', 'SHE');
    expect(text.stdout).toMatch(/mixes reference electrodes/);
  });

  it('puts the import warnings the text report shows into --json warnings', async () => {
    const path = write('disagree.csv', ['Reference electrode: SCE'], 0.3, 0.1, 'Time (s),Potential (V vs Ag/AgCl),Current (A)');
    const text = await run('analyze', path);
    const json = await run('analyze', path, '--json');
    const line = /names the reference "SCE", but the potential column's name/;
    expect(text.stdout).toMatch(line);
    expect((JSON.parse(json.stdout) as Contract).warnings.join('\n')).toMatch(line);
  });

  // Companion ferrocene at 0.45 V vs Ag/AgCl (3 M KCl), analyte at 0 V vs SCE (table values as above):
  // 0.2412 − (0.45 + 0.210) = −0.4188 V vs Fc⁺/Fc.
  it('--fc-file: the companion by its path as given, on its own stated scale; a file not among the inputs is named', async () => {
    const an = write('an_100mVs.csv', ['Reference electrode: SCE'], 0, 0.1);
    const fc = write('fc_100mVs.csv', ['Reference electrode: Ag/AgCl (3 M KCl)'], 0.45, 0.1);
    const given = relative(process.cwd(), fc);
    const r = await run('analyze', an, given, '--fc-near', '0.45', '--fc-file', given, '--ref', 'Fc', '--json');
    expect(r.stderr).toBe('');
    expect(Math.abs((eHalves(r.stdout)[0] ?? 0) + 0.4188)).toBeLessThan(0.002);
    expect((JSON.parse(r.stdout) as Contract).warnings.join('\n')).toMatch(/recorded vs AgCl-3M, the series' files vs SCE/);
    const missing = await run('analyze', an, '--fc-near', '0.45', '--fc-file', 'fc_elsewhere.csv', '--ref', 'Fc');
    expect(missing.code).toBe(2);
    expect(missing.stderr).toMatch(/--fc-file "fc_elsewhere\.csv" is not among the input files/);
  });
});
