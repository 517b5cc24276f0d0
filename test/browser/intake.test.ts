/**
 * Intake flow: pick files through the file input (a good simulated export and two bad files),
 * see each bad file's error beside it while everything already loaded stays, check the numbers of
 * the new file against Randles–Ševčík, then override a detected unit and read the file again.
 */
import { mkdir, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { coupleCells, demoFileCount, selectFileRow, simulatedCsv, waitForAnalysis, waitForFiles, showView } from './appHelpers';
import { openApp, type OpenedApp } from './harness';

const PNG_HEADER = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52, 0, 0, 0, 1, 0, 0, 0, 1]);

describe('picking files', () => {
  let app: OpenedApp;
  const demo = demoFileCount();
  beforeAll(async () => {
    app = await openApp();
    await waitForFiles(app.page, demo);
    await app.page.getByTestId('file-input').setInputFiles([
      { name: 'sim-reversible-100mVs.csv', mimeType: 'text/csv', buffer: Buffer.from(simulatedCsv(0.1)) },
      { name: 'bench-photo.png', mimeType: 'image/png', buffer: PNG_HEADER },
      { name: 'lab-notes.txt', mimeType: 'text/plain', buffer: Buffer.from('Electrode polished with alumina.\nNo data in this file.\n') },
    ]);
    await waitForFiles(app.page, demo + 3);
  });
  afterAll(async () => app?.close());

  it('shows a clear error beside each bad file and keeps every loaded file', async () => {
    const page = app.page;
    for (const name of ['bench-photo.png', 'lab-notes.txt']) {
      const row = page.locator(`[data-testid=file-row][data-file-name="${name}"]`);
      expect(await row.getAttribute('data-status')).toBe('error');
      expect(await row.getByTestId('file-error').textContent()).toContain(name);
    }
    expect(await page.locator('[data-testid=file-row][data-status=ready]').count()).toBe(demo + 1);
  });

  // Simulated Nernstian couple, E°′ = 0 V, 1 mM, 0.0707 cm², D = 1e-5 cm²/s, 0.1 V/s, 25 °C.
  // E½ = E°′ for equal D (Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001), §6.2.1, from
  // memory); ip = 2.6865e5·n^3/2·A·C·D^½·v^½ = 18.99 µA (Randles–Ševčík, same book §6.2);
  // ΔEp ≈ 2.22·RT/nF = 57 mV for a large switching offset (Nicholson 1965, from memory) ± 4 mV.
  it('analyses the picked file: E½, ipc and ΔEp match the published reversible values', async () => {
    const page = app.page;
    await page.locator('[data-testid=file-row][data-file-name="sim-reversible-100mVs.csv"] .file-name').click();
    await waitForAnalysis(page);
    const [eHalf] = await coupleCells(page, 'cell-ehalf');
    const [ipc] = await coupleCells(page, 'cell-ipc');
    const [dep] = await coupleCells(page, 'cell-dep');
    expect(Math.abs(eHalf as number)).toBeLessThan(0.003);
    expect(await page.getByTestId('couples-table').locator('th', { hasText: 'ipc /' }).textContent()).toBe('ipc / µA');
    expect(Math.abs((ipc as number) / 18.99 - 1)).toBeLessThan(0.03);
    expect(Math.abs((dep as number) - 57)).toBeLessThan(4);
  });

  it('shows each importer decision and reads the file again with an overridden current unit', async () => {
    const page = app.page;
    await page.getByTestId('tab-import').click();
    const unitRow = page.getByTestId('guess-current-unit');
    expect(await unitRow.locator('td').nth(0).textContent()).toBe('A');
    expect(await unitRow.locator('td').nth(1).textContent()).toBe('detected');
    expect(await page.getByTestId('column-roles').textContent()).toMatch(/potential/);
    await page.getByTestId('override-current-unit').selectOption('mA');
    await page.getByTestId('reimport').click();
    await page.waitForFunction(() => document.querySelector('[data-testid=guess-current-unit] td:nth-of-type(2)')?.textContent === 'you', null, { timeout: 30_000 });
    expect(await unitRow.locator('td').nth(0).textContent()).toBe('mA');
    await waitForAnalysis(page);
    await page.getByTestId('tab-couples').click();
    // Same numbers read as mA instead of A: the peak current is now 1000× smaller, 18.99 nA.
    expect(await page.getByTestId('couples-table').locator('th', { hasText: 'ipc /' }).textContent()).toBe('ipc / nA');
    const [ipc] = await coupleCells(page, 'cell-ipc');
    expect(Math.abs((ipc as number) / 18.99 - 1)).toBeLessThan(0.03);
  });

  it('a baseline chosen for one peak is the one the analysis uses for it', async () => {
    const page = app.page;
    await page.getByTestId('tab-peaks').click();
    const row = page.getByTestId('peaks-table').locator('tbody tr').first();
    await row.getByTestId('peak-baseline').selectOption('polynomial');
    await page.waitForFunction(() => document.querySelector('[data-testid=peaks-table] tbody tr td:last-child')?.textContent?.startsWith('least-squares polynomial'), null, { timeout: 30_000 });
    expect(await row.getByTestId('peak-baseline').inputValue()).toBe('polynomial');
    await page.getByTestId('tab-couples').click();
  });

  it('a picked folder becomes a scan-rate series named after it', async () => {
    const page = app.page;
    const root = await mkdtemp(join(tmpdir(), 'halfwave-'));
    const dir = join(root, 'mini series');
    await mkdir(dir);
    for (const v of [0.05, 0.2]) await writeFile(join(dir, `sim-${v * 1000}mVs.csv`), simulatedCsv(v));
    await writeFile(join(dir, 'readme.md'), 'not a table');
    await page.getByTestId('folder-input').setInputFiles(dir);
    await waitForFiles(page, demo + 5);
    await showView(page, 'series');
    await page.getByTestId('series-group').selectOption('mini series');
    await page.getByTestId('series-table').waitFor({ timeout: 30_000 });
    expect(await page.getByTestId('series-table').textContent()).toContain('2 scan rates');
    await showView(page, 'trace');
    await rm(root, { recursive: true });
  });

  // Our own fixture in the layout of a plotting program's export (test/fixtures/README.md): names
  // E, j, j; a units row "V RHE", (blank), "mA cm-2"; a sample code as a comment line.
  it('"How the file was read" says which column is a density and why, the scale named in the units row, and the header block', async () => {
    const page = app.page;
    const name = 'oer_film_10mVs-1.txt';
    await page.getByTestId('file-input').setInputFiles([{ name, mimeType: 'text/plain', buffer: await readFile(join('test', 'fixtures', 'exports', name)) }]);
    await page.locator(`[data-testid=file-row][data-file-name="${name}"][data-status=ready]`).waitFor({ timeout: 60_000 });
    await selectFileRow(page, name);
    await page.getByTestId('tab-import').click();
    await page.waitForFunction(() => document.querySelector('[data-testid=header-block]')?.textContent?.includes('units on line 2'), null, { timeout: 30_000 });
    expect(await page.getByTestId('header-block').textContent()).toBe('Header block: names on line 1; units on line 2; comment line 3 left out.');
    const kind = page.getByTestId('guess-current-or-density');
    expect(await kind.locator('td').nth(0).textContent()).toBe('current density');
    expect(await kind.locator('td').nth(2).textContent()).toMatch(/cm/);
    expect(await page.getByTestId('guess-recording-scale-named-in-the-file').locator('td').nth(0).textContent()).toBe('RHE');
    await page.getByTestId('tab-couples').click();
  });

  // In the IUPAC convention the i–E loop encloses a positive area (the charging current has the
  // sign of the sweep: Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001), §1.2.2, from
  // memory). This file writes cathodic current as positive and does not say so.
  it('questions a file whose currents run the loop the polarographic way, and reads it right once told', async () => {
    const page = app.page;
    const name = 'cathodic-positive-100mVs.csv';
    const flipped = simulatedCsv(0.1).trim().split('\n').map((line, k) => (k === 0 ? line : line.replace(/,([^,]+)$/, (_m, i: string) => `,${-Number(i)}`))).join('\n');
    await page.getByTestId('file-input').setInputFiles([{ name, mimeType: 'text/csv', buffer: Buffer.from(flipped) }]);
    await page.locator(`[data-testid=file-row][data-file-name="${name}"][data-status=ready]`).waitFor({ timeout: 60_000 });
    await selectFileRow(page, name);
    await page.getByTestId('tab-notes').click();
    await page.waitForFunction((n) => document.querySelector('[data-testid=notes-list]')?.textContent?.includes(`${n}: the current runs round the loop the wrong way`), name, { timeout: 30_000 });
    await page.getByTestId('tab-import').click();
    await page.getByTestId('override-current-convention').selectOption('polarographic');
    await page.getByTestId('reimport').click();
    await page.waitForFunction(() => document.querySelector('[data-testid=guess-current-sign-convention] td:nth-of-type(2)')?.textContent === 'you', null, { timeout: 30_000 });
    await waitForAnalysis(page);
    await page.getByTestId('tab-couples').click();
    // Read as cathodic-positive, it is the reversible couple again (values as in the test above).
    await page.getByTestId('couples-table').waitFor({ timeout: 30_000 });
    const [eHalf] = await coupleCells(page, 'cell-ehalf');
    const [ipc] = await coupleCells(page, 'cell-ipc');
    expect(Math.abs(eHalf as number)).toBeLessThan(0.003);
    expect(Math.abs((ipc as number) / 18.99 - 1)).toBeLessThan(0.03);
    await page.getByTestId('tab-notes').click();
    expect(await page.evaluate(() => document.querySelector('[data-testid=notes-list]')?.textContent ?? '')).not.toContain('the wrong way');
  });

  it('stayed free of console errors, page errors and outside requests', () => {
    expect(app.consoleErrors).toEqual([]);
    expect(app.pageErrors).toEqual([]);
    expect(app.outsideRequests).toEqual([]);
  });
});
