/**
 * `halfwave fit` end to end through runCli on files written from seeded, noisy simulations (the
 * simulator is validated against Nicholson & Shain, Anal. Chem. 36 (1964) 706 and Nicholson,
 * Anal. Chem. 37 (1965) 1351 in src/core/simulation). Checks the JSON contract of the issue, the
 * readable report, model choice, exit codes and one-line errors.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { noisyVoltammograms } from '../../core/fit/fitTestSupport';
import type { Voltammogram } from '../../core/types';
import { runCli } from '../main';

async function run(...argv: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await runCli(argv, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t) });
  return { code, stdout, stderr };
}

const toCsv = (v: Voltammogram) => `time_s,potential_V,current_A\n${Array.from(v.potentialV, (e, i) => `${v.timeS![i]},${e},${v.currentA[i]}`).join('\n')}\n`;

let dir = '';
const files: string[] = [];
const reversible: string[] = [];
const withLeak: string[] = [];
const densities: string[] = [];
const blanks: string[] = [];

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'halfwave-fit-'));
  const waveform = { startV: 0.45, switchV: -0.35, stepV: 0.002, uncompensatedOhm: 50, doubleLayerFPerCm2: 20e-6 };
  const quasi = noisyVoltammograms(waveform, [{ formalPotentialV: 0.05, k0CmPerS: 0.01, alpha: 0.45, diffusionOCm2PerS: 8e-6, diffusionRCm2PerS: 8e-6 }], [0.1, 0.5, 2]);
  quasi.forEach((v, k) => { files.push(join(dir, `quasi_${k}.csv`)); writeFileSync(files[k]!, toCsv(v)); });
  const nernst = noisyVoltammograms({ ...waveform, uncompensatedOhm: 120 }, [{ formalPotentialV: 0, k0CmPerS: Infinity, concentrationOMolPerCm3: 5e-6 }], [0.1, 0.5, 2]);
  nernst.forEach((v, k) => { reversible.push(join(dir, `nernst_${k}.csv`)); writeFileSync(reversible[k]!, toCsv(v)); });
  // A made-up background (demo only): 3 µA + 4 µA/V·E on top of the quasi-reversible files, and the same background alone as each rate's blank.
  const leak = (v: Voltammogram, withSignal: boolean): Voltammogram => ({ ...v, currentA: Float64Array.from(v.potentialV, (e, i) => (withSignal ? v.currentA[i]! : 0) + 3e-6 + 4e-6 * e) });
  // The same files written as current densities over their 0.0707 cm², with no area stated.
  quasi.forEach((v, k) => {
    densities.push(join(dir, `density_${k}.csv`));
    writeFileSync(densities[k]!, `Time (s),Potential (V),j (A/cm2)\n${Array.from(v.potentialV, (e, i) => `${v.timeS![i]},${e},${v.currentA[i]! / 0.0707}`).join('\n')}\n`);
  });
  quasi.forEach((v, k) => {
    withLeak.push(join(dir, `leaky_${k}.csv`)); writeFileSync(withLeak[k]!, toCsv(leak(v, true)));
    blanks.push(join(dir, `blank_${k}.csv`)); writeFileSync(blanks[k]!, toCsv(leak(v, false)));
  });
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

interface Contract {
  mechanism: string; params: Record<string, number | null>; stderr: Record<string, number | null>; bounds: Record<string, [number | null, number | null]>;
  couples: Record<string, unknown>[]; correlation: { labels: string[]; matrix: (number | null)[][] }; rms: number; iterations: number; converged: boolean; notes: string[];
  modelChoice: { preferred: string } | null;
}

describe('halfwave fit', () => {
  // Tolerances of the issue (E°′ 2 mV, k° 25 %, D 5 %, α 0.05); oracle: the validated simulator.
  it('fits three files jointly and prints the documented JSON contract, with E preferred over EC', async () => {
    const r = await run('fit', ...files, '--area', '0.0707', '--conc', '1', '--ru', '50', '--json');
    expect(r.code).toBe(0);
    expect(r.stderr).toBe('');
    const c = JSON.parse(r.stdout) as Contract;
    expect(Object.keys(c).slice(0, 11)).toEqual(['mechanism', 'params', 'stderr', 'bounds', 'couples', 'correlation', 'rms', 'iterations', 'converged', 'notes', 'window']);
    expect(c.mechanism).toBe('E');
    expect(c.converged).toBe(true);
    expect(Math.abs(c.params.E0! - 0.05)).toBeLessThan(0.002);
    expect(Math.abs(c.params.k0! / 0.01 - 1)).toBeLessThan(0.25);
    expect(Math.abs(c.params.D! / 8e-6 - 1)).toBeLessThan(0.05);
    expect(Math.abs(c.params.alpha! - 0.45)).toBeLessThan(0.05);
    expect(c.params.Ru).toBe(50);
    expect(c.stderr.Ru).toBeNull();
    expect(c.stderr.k0).toBeGreaterThan(0);
    expect(c.bounds.k0?.[0]).toBeLessThan(c.params.k0!);
    expect(c.couples).toHaveLength(1);
    expect(c.couples[0]).toMatchObject({ E0: c.params.E0, k0: c.params.k0 });
    expect(c.correlation.labels).toEqual(['E0[1]', 'k0[1]', 'alpha[1]', 'D[1]', 'Cdl']);
    expect(c.rms).toBeGreaterThan(0);
    expect(c.modelChoice?.preferred).toBe('E');
  });

  // Profile t (Bates & Watts, Nonlinear Regression Analysis, 1988, §6.1): k° of a reversible couple is a lower bound.
  it('a reversible series with Ru free: k0 is null, its bound [lo, null], Ru within 30 %', async () => {
    const r = await run('fit', ...reversible, '--area', '0.0707', '--conc', '5', '--free', 'E0,k0,alpha,D,Ru,Cdl', '--compare', 'none', '--json');
    expect(r.code).toBe(0);
    const c = JSON.parse(r.stdout) as Contract;
    expect(c.params.k0).toBeNull();
    expect(c.bounds.k0?.[0]).toBeGreaterThan(0.1);
    expect(c.bounds.k0?.[1]).toBeNull();
    expect(Math.abs(c.params.Ru! / 120 - 1)).toBeLessThan(0.3);
    expect(c.notes.some((n) => /^k° > [\d.]+ cm\/s at 95 %/.test(n))).toBe(true);
  });

  it('prints a readable report without --json, and says "converged": false (exit 0) when the iterations run out', async () => {
    const text = await run('fit', files[0]!, '--area', '0.0707', '--conc', '1', '--ru', '50', '--window', '-0.3:0.4');
    expect(text.code).toBe(0);
    for (const s of ['mechanism E, 1 couple(s), 1 voltammogram', 'window -0.300 … 0.400 V', 'couple 1 (in order of E°′)', '  E0', '  Ru     50 Ω (held)']) expect(text.stdout).toContain(s);
    const short = await run('fit', files[0]!, '--area', '0.0707', '--conc', '1', '--start', 'k0=0.2,E0=0.1', '--max-iterations', '1', '--json');
    expect(short.code).toBe(0);
    expect((JSON.parse(short.stdout) as Contract).converged).toBe(false);
  });

  it('bad input: one line on stderr and exit 2', async () => {
    const cases: string[][] = [
      [files[0]!, '--area', '0.0707', '--conc', '1', '--free', 'E0,bogus'],
      [files[0]!, '--area', '0.0707', '--conc', '1', '--window', '0.4'],
      [files[0]!, '--conc', '1'],
      [files[0]!, '--area', '0.0707'],
      [files[0]!, '--area', '0.0707', '--conc', '1', '--mechanism', 'ECE'],
      [files[0]!, '--area', '0.0707', '--conc', '1', '--free', 'kf'],
      [files[0]!, '--area', '0.0707', '--conc', '1', '--window', '1.0:1.2'],
      [join(dir, 'missing.csv'), '--area', '0.0707', '--conc', '1'],
    ];
    for (const argv of cases) {
      const r = await run('fit', ...argv);
      expect(r.code, argv.join(' ')).toBe(2);
      expect(r.stdout).toBe('');
      expect(r.stderr.trim().split('\n')).toHaveLength(1);
    }
    const window = await run('fit', files[0]!, '--area', '0.0707', '--conc', '1', '--window', '1.0:1.2');
    expect(window.stderr).toContain('quasi_0.csv');
  });

  // Tolerances of the fit issue (E°′ 2 mV, k° 25 %, D 5 %); oracle: the validated simulator.
  it('--blank subtracts each file\'s blank nearest in scan rate first, as analyze does: the same tolerances hold, and the notes name the pairs', async () => {
    const r = await run('fit', ...withLeak, '--area', '0.0707', '--conc', '1', '--ru', '50', '--compare', 'none', ...blanks.flatMap((b) => ['--blank', b]), '--json');
    expect(r.code).toBe(0);
    const c = JSON.parse(r.stdout) as Contract;
    expect(Math.abs(c.params.E0! - 0.05)).toBeLessThan(0.002);
    expect(Math.abs(c.params.k0! / 0.01 - 1)).toBeLessThan(0.25);
    expect(Math.abs(c.params.D! / 8e-6 - 1)).toBeLessThan(0.05);
    expect(c.notes[0]).toMatch(/^blank subtracted before the fit.*leaky_0\.csv − blank_0\.csv; .*leaky_2\.csv − blank_2\.csv$/);
  });

  // Same oracle and tolerances; j = i/A and R_u·A per cm² (common practice, no source).
  it('current densities are fitted per cm² (area 1, said in the notes): D and k° as from the currents; a mix with currents is refused', async () => {
    // Per cm², the resistance is R_u·A = 50 Ω × 0.0707 cm² = 3.535 Ω·cm².
    const r = await run('fit', ...densities, '--conc', '1', '--ru', '3.535', '--compare', 'none', '--json');
    expect(r.code).toBe(0);
    const c = JSON.parse(r.stdout) as Contract;
    expect(Math.abs(c.params.E0! - 0.05)).toBeLessThan(0.002);
    expect(Math.abs(c.params.k0! / 0.01 - 1)).toBeLessThan(0.25);
    expect(Math.abs(c.params.D! / 8e-6 - 1)).toBeLessThan(0.05);
    expect(c.notes.some((n) => /current densities.*A = 1 cm².*Ω·cm²/.test(n))).toBe(true);
    const mixed = await run('fit', densities[0]!, files[1]!, '--area', '0.0707', '--conc', '1');
    expect(mixed.code).toBe(2);
    expect(mixed.stderr).toMatch(/density_0\.csv.*current densities/);
  });

  it('--help lists every option with its unit and default', async () => {
    const r = await run('fit', '--help');
    expect(r.code).toBe(0);
    for (const s of ['--mechanism M', '[E]', '--couples N', '--free LIST', '--window LO:HI', '--area CM2', '--conc MM', '--n N', '--temp CELSIUS', '--scan-rate V_PER_S', '--ru OHM', '--blank FILE', '--json', '--start LIST', '--compare C', 'Exit codes']) {
      expect(r.stdout).toContain(s);
    }
  });
});
