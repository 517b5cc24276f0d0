/**
 * No silent assumptions, seen on screen: values stated in the files' headers (a disk diameter, a
 * pseudo-reference wire) are used and say where they came from; a default that decides a number is
 * named next to it (Ru unset while ΔEp grows with v); a scale that rests on a typical Fc⁺/Fc value
 * says so; a window over an empty stretch cannot destroy a result; and the screen and the command
 * line, given the same folder, give the same keys and numbers.
 * Inputs are our own simulator's couples (src/core/simulation). D is checked against the value
 * simulated through Randles–Ševčík, ip = 0.4463·nFAC(nFvD/RT)^½ (Bard & Faulkner, Electrochemical
 * Methods, 2nd ed. (2001), eq. 6.2.18): with the header's area D comes back within a few per cent;
 * with the default area it would be (0.0707/0.0314)² ≈ 5× off.
 */
import { mkdir, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../../src/cli/main';
import { simulateCv } from '../../src/core/simulation';
import type { CvSimulationInput } from '../../src/core/simulation';
import { coupleCells, demoFileCount, waitForAnalysis, waitForFiles, showView } from './appHelpers';
import { openApp, type OpenedApp } from './harness';

const D = 1e-5;

function csvOf(sim: Partial<CvSimulationInput>, preamble: string[] = []): string {
  const s = simulateCv({ k0CmPerS: Infinity, diffusionOCm2PerS: D, diffusionRCm2PerS: D, ...sim });
  const rows = [...preamble, 'Time (s),Potential (V),Current (A)'];
  for (let i = 0; i < s.potentialV.length; i++) rows.push(`${s.timeS[i]},${s.potentialV[i]},${s.currentA[i]}`);
  return `${rows.join('\n')}\n`;
}

/** Every number to 10 significant digits, for comparing results computed by two JavaScript engines. */
function roundDeep(v: unknown): unknown {
  if (typeof v === 'number') return Number.isFinite(v) ? Number(v.toPrecision(10)) : v;
  if (Array.isArray(v)) return v.map(roundDeep);
  if (v && typeof v === 'object') return Object.fromEntries(Object.entries(v).map(([k, x]) => [k, roundDeep(x)]));
  return v;
}

let root: string;
beforeAll(async () => {
  root = await mkdtemp(join(tmpdir(), 'halfwave-assumptions-'));
});
afterAll(async () => {
  if (root) await rm(root, { recursive: true });
});

async function folder(name: string, files: Record<string, string>): Promise<string> {
  const dir = join(root, name);
  await mkdir(dir);
  for (const [f, text] of Object.entries(files)) await writeFile(join(dir, f), text);
  return dir;
}

async function openSeries(page: Page, group: string): Promise<void> {
  await showView(page, 'series');
  await page.getByTestId('series-group').selectOption(group);
  await page.getByTestId('series-table').waitFor({ timeout: 30_000 });
}

describe('the headers, the defaults and the windows', () => {
  let app: OpenedApp;
  beforeAll(async () => {
    app = await openApp();
    await waitForFiles(app.page, demoFileCount());
  });
  afterAll(async () => app?.close());

  it('a 2 mm Pt disk and an Ag wire stated in the headers are used, and say they came from the files', async () => {
    const page = app.page;
    const header = ['WE: Pt disk 2 mm', 'RE: Ag wire pseudo-reference', 'Concentration: 1 mM'];
    const dir = await folder('pt wire', Object.fromEntries([0.05, 0.1, 0.2, 0.4].map((v) => [`pt_${v * 1000}mVs.csv`, csvOf({ scanRateVPerS: v, areaCm2: Math.PI * 0.01 }, header)])));
    await page.getByTestId('folder-input').setInputFiles(dir);
    await waitForFiles(page, demoFileCount() + 4);
    await page.locator('[data-testid=file-row][data-file-name="pt_50mVs.csv"] .file-name').click();
    await waitForAnalysis(page);
    expect(Number(await page.getByTestId('area').inputValue())).toBeCloseTo(Math.PI * 0.01, 5);
    expect(await page.getByTestId('origin-areaCm2').getAttribute('data-origin')).toBe('header');
    expect(await page.getByTestId('origin-areaCm2').getAttribute('title')).toMatch(/pt_\d+mVs\.csv, line 1: “WE: Pt disk 2 mm/);
    expect(await page.getByTestId('file-reference').inputValue()).toBe('pseudo');
    expect(await page.getByTestId('floating-reference').textContent()).toMatch(/no fixed potential/);
    await openSeries(page, 'pt wire');
    const d = Number(await page.getByTestId('series-table').getAttribute('data-d-first'));
    expect(Math.abs(d / D - 1)).toBeLessThan(0.05);
    await showView(page, 'trace');
  });

  it('Ru left unset while ΔEp grows with v is named as the default behind k°', async () => {
    const page = app.page;
    const header = ['Working electrode: 3 mm disk', 'Concentration: 1 mM', 'Reference electrode: SCE'];
    const dir = await folder('ohmic', Object.fromEntries([0.1, 0.5, 1, 2].map((v) => [`ohm_${v * 1000}mVs.csv`, csvOf({ scanRateVPerS: v, uncompensatedOhm: 300, startV: 0.4, switchV: -0.4 }, header)])));
    await page.getByTestId('folder-input').setInputFiles(dir);
    await waitForFiles(page, demoFileCount() + 8);
    await page.locator('[data-testid=file-row][data-file-name="ohm_100mVs.csv"] .file-name').click();
    await page.getByTestId('defaults-used').waitFor({ timeout: 60_000 });
    expect(await page.getByTestId('defaults-used').textContent()).toMatch(/k° rest on a default: Ru = 0 Ω \(not given\)/);
  });

  it('the Fc⁺/Fc scale without a measured ferrocene says it rests on a typical value', async () => {
    const page = app.page;
    await page.getByTestId('display-reference').selectOption('Fc');
    await waitForAnalysis(page);
    expect(await page.getByTestId('scale-basis').textContent()).toMatch(/typical Fc⁺\/Fc value, not one measured here/);
    await page.getByTestId('display-reference').selectOption('AgCl-3M');
    await waitForAnalysis(page);
  });

  it('a peak window over an empty stretch is kept as empty: the couple and its reading stay', async () => {
    const page = app.page;
    await page.locator('[data-testid=file-row]').first().locator('.file-name').click();
    await waitForAnalysis(page);
    const ipc0 = await coupleCells(page, 'cell-ipc');
    const verdict0 = await page.getByTestId('verdict').first().textContent();
    await page.getByTestId('add-cathodic-window').click();
    const inputs = page.getByTestId('windows-editor').locator('input');
    // A window 0.05–0.1 V on the recording scale: well before the demo probe's wave.
    await inputs.nth(0).fill('0.09');
    await inputs.nth(0).press('Enter');
    await inputs.nth(1).fill('0.1');
    await inputs.nth(1).press('Enter');
    await page.waitForFunction(() => /kept as empty/.test(document.querySelector('[data-testid=notice]')?.textContent ?? ''), null, { timeout: 60_000 });
    await waitForAnalysis(page);
    expect(await coupleCells(page, 'cell-ipc')).toEqual(ipc0);
    expect(await page.getByTestId('verdict').first().textContent()).toBe(verdict0);
  });

  it('stayed free of console errors, page errors and outside requests', () => {
    expect(app.pageErrors).toEqual([]);
    expect(app.outsideRequests).toEqual([]);
  });
});

describe('the screen and the command line over the same folder', () => {
  it('give the same keys and the same numbers (the JSON results sheet against analyze --json)', async () => {
    const header = ['Working electrode: glassy carbon, 3 mm disk (0.0707 cm2)', 'Sample: 1.0 mM test couple in 0.1 M KCl', 'Reference electrode: Ag/AgCl (3 M KCl)', 'Temperature = 25 °C'];
    const dir = await folder('same folder', Object.fromEntries([0.02, 0.05, 0.1, 0.2, 0.5].map((v) => [`gc_${v * 1000}mVs.csv`, csvOf({ scanRateVPerS: v, k0CmPerS: 0.02 }, header)])));
    let out = '';
    expect(await runCli(['analyze', dir, '--json'], { stdout: (t) => { out += t; }, stderr: () => undefined })).toBe(0);
    const cli = JSON.parse(out) as { files: Array<Record<string, unknown>>; series: Array<Record<string, unknown>>; warnings: string[] };
    const app = await openApp();
    try {
      const page = app.page;
      await waitForFiles(page, demoFileCount());
      await page.getByTestId('new-workspace').click();
      await page.getByTestId('folder-input').setInputFiles(dir);
      await waitForFiles(page, 5);
      await page.getByTestId('export-scope').selectOption('all');
      const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('export-json').click()]);
      const screen = JSON.parse(await readFile(await download.path(), 'utf8')) as typeof cli;
      const strip = (f: Record<string, unknown>) => ({ ...f, file: String(f.file).slice(String(f.file).lastIndexOf('/') + 1) });
      expect(screen.files.map(strip)).toEqual(cli.files.map(strip));
      // Chromium's and Node's engines may differ in the last bits of a transcendental function
      // (the Student-t quantile behind the intervals): numbers agree to 1e-9, keys exactly.
      expect(roundDeep(screen.series)).toEqual(roundDeep(cli.series));
      expect(Object.keys(screen.series[0] ?? {}).sort()).toEqual(Object.keys(cli.series[0] ?? {}).sort());
      expect([...screen.warnings].sort()).toEqual([...cli.warnings].sort());
      expect(cli.series[0]?.D).toBeGreaterThan(0);
    } finally {
      await app.close();
    }
  });
});
