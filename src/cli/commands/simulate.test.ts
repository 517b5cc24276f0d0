import { describe, expect, it } from 'vitest';
import { parseArgs } from '../args';
import { runCli } from '../main';
import { simulationInputFromArgs } from './simulate';

async function run(argv: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = '';
  let err = '';
  const code = await runCli(argv, { stdout: (t) => (out += t), stderr: (t) => (err += t) });
  return { code, out, err };
}

const spec = Object.fromEntries(['conc', 'start', 'switch', 'initial', 'temp', 'E0', 'k0'].map((k) => [k, { value: true }]));

describe('halfwave simulate', () => {
  it('writes the documented header and one row per point (0.3 → −0.3 → 0.3 V in 1 mV steps)', async () => {
    const { code, out } = await run(['simulate']);
    expect(code).toBe(0);
    const lines = out.trim().split('\n');
    expect(lines[0]).toBe('time_s,potential_V,current_A');
    expect(lines).toHaveLength(1202);
    expect(lines[601]).toMatch(/^6,-0\.3,/);
  });

  it('converts mM and °C, and picks the species present from the first sweep direction', () => {
    const neg = simulationInputFromArgs(parseArgs(['--conc', '2', '--temp', '37'], spec));
    expect(neg.concentrationOMolPerCm3).toBeCloseTo(2e-6, 15);
    expect(neg.concentrationRMolPerCm3).toBe(0);
    expect(neg.temperatureK).toBeCloseTo(310.15, 10);
    const pos = simulationInputFromArgs(parseArgs(['--start', '-0.3', '--switch', '0.3'], spec));
    expect(pos.concentrationRMolPerCm3).toBeCloseTo(1e-6, 15);
    expect(pos.concentrationOMolPerCm3).toBe(0);
    const forced = simulationInputFromArgs(parseArgs(['--start', '-0.3', '--switch', '0.3', '--initial', 'O'], spec));
    expect(forced.concentrationOMolPerCm3).toBeCloseTo(1e-6, 15);
    const window = simulationInputFromArgs(parseArgs(['--E0', '0.45'], spec));
    expect([window.startV, window.switchV]).toEqual([expect.closeTo(0.75, 12), expect.closeTo(0.15, 12)]);
    expect(simulationInputFromArgs(parseArgs(['--k0', 'inf'], spec)).k0CmPerS).toBe(Infinity);
  });

  it('bad values exit with code 2 and one line naming the option', async () => {
    for (const argv of [['simulate', '--conc', 'abc'], ['simulate', '--initial', 'X'], ['simulate', '--alpha', '3'], ['simulate', '--mechanism', 'CE']]) {
      const { code, err } = await run(argv);
      expect(code).toBe(2);
      expect(err.trim().split('\n')).toHaveLength(1);
    }
  });

  it('--help states the defaults', async () => {
    const { out } = await run(['simulate', '--help']);
    expect(out).toMatch(/--k0 CM_PER_S.*\[1\]/);
    expect(out).toMatch(/--scan-rate V_PER_S.*\[0\.1\]/);
  });
});
