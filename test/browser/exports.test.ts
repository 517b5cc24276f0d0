/**
 * Exports made in the page, with no request off the machine: the XLSX workbook (a sheet per
 * series, the files with SHA-256 and layout, the method and parameters: the CSV results sheet's
 * own cells), PNG and SVG of the trace and of a series plot at publication size, and the printable
 * notebook report with its print stylesheet.
 */
import { readFile } from 'node:fs/promises';
import { unzipSync, strFromU8 } from 'fflate';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoFileCount, waitForFiles, showView } from './appHelpers';
import { openApp, type OpenedApp } from './harness';

async function download(page: Page, testId: string): Promise<{ name: string; bytes: Buffer }> {
  const [d] = await Promise.all([page.waitForEvent('download', { timeout: 60_000 }), page.getByTestId(testId).click()]);
  return { name: d.suggestedFilename(), bytes: await readFile(await d.path()) };
}

describe('exports', () => {
  let app: OpenedApp;
  beforeAll(async () => {
    app = await openApp();
    await waitForFiles(app.page, demoFileCount());
  });
  afterAll(async () => app?.close());

  it('the XLSX workbook has a sheet per series, the files with SHA-256 and layout, and the method', async () => {
    const { name, bytes } = await download(app.page, 'export-xlsx');
    expect(name).toMatch(/^halfwave-results-.+\.xlsx$/);
    const zip = unzipSync(new Uint8Array(bytes));
    const workbook = strFromU8(zip['xl/workbook.xml'] as Uint8Array);
    const sheets = [...workbook.matchAll(/<sheet [^>]*name="([^"]+)"/g)].map((m) => m[1]);
    expect(sheets).toEqual(expect.arrayContaining(['probe RuHex', 'quasi FcAmide', 'ec aminophenol', 'film FcSAM', 'files', 'method and parameters']));
    const text = Object.entries(zip).filter(([k]) => k.endsWith('.xml')).map(([, v]) => strFromU8(v)).join('\n');
    expect(text).toMatch(/[0-9a-f]{64}/);
    expect(text).toContain('minSignalToNoise');
    expect(text).toContain('probe_RuHex_100mVs.csv');
  });

  // PNG signature and IHDR (W3C/ISO 15948, Portable Network Graphics, §5.2 and §11.2.2): the
  // picture is 1890 × 1417 px, 160 × 120 mm at 300 dpi.
  it('the trace as PNG at publication size and as SVG with its axis titles in units', async () => {
    const png = await download(app.page, 'trace-png');
    expect([...png.bytes.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    expect(png.bytes.readUInt32BE(16)).toBe(1890);
    expect(png.bytes.readUInt32BE(20)).toBe(1416);
    const svg = (await download(app.page, 'trace-svg')).bytes.toString('utf8');
    expect(svg).toMatch(/^<svg/);
    expect(svg).toContain('E vs Ag/AgCl, 3 M KCl / V');
    expect(svg).toMatch(/i \/ .A \(anodic up\)/);
  });

  it('a series plot as SVG', async () => {
    const page = app.page;
    await showView(page, 'series');
    await page.getByTestId('series-table').waitFor({ timeout: 60_000 });
    await page.getByTestId('series-figure').selectOption('current');
    const svg = (await download(page, 'series-figure-svg')).bytes.toString('utf8');
    expect(svg).toContain('v½ / (V s⁻¹)½');
    expect(svg).toContain('95 % band');
  });

  it('the notebook report shows formulas with sources, the parameters, the version and the checksums, and prints alone', async () => {
    const page = app.page;
    await showView(page, 'report');
    await page.getByTestId('report-files').waitFor({ timeout: 60_000 });
    expect(await page.getByTestId('report-files').textContent()).toMatch(/[0-9a-f]{64}/);
    expect(await page.getByTestId('report-formulas').textContent()).toContain('Randles–Ševčík');
    expect(await page.getByTestId('report-view').textContent()).toMatch(/Halfwave \d+\.\d+\.\d+/);
    await page.waitForFunction(() => document.querySelectorAll('.report-figures img').length === 3, null, { timeout: 60_000 });
    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('.topbar').isVisible()).toBe(false);
    expect(await page.locator('.column.left').isVisible()).toBe(false);
    expect(await page.getByTestId('report-view').isVisible()).toBe(true);
    await page.emulateMedia({ media: 'screen' });
    await showView(page, 'trace');
  });

  it('stayed free of console errors, page errors and outside requests', () => {
    expect(app.consoleErrors).toEqual([]);
    expect(app.pageErrors).toEqual([]);
    expect(app.outsideRequests).toEqual([]);
  });
});
