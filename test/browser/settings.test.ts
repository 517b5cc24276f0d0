/**
 * Settings flow: changing a setting re-runs the analysis and the numbers on screen follow (iR
 * correction narrows ΔEp; undo brings the numbers back; a new display scale shifts every
 * potential by the tabulated offset), then the results sheet and the session are downloaded.
 * Offsets: Ag/AgCl (3 M KCl) 0.210 V and SCE 0.2412 V vs SHE, as in the app's reference table
 * (Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001), inside back cover).
 */
import { readFile } from 'node:fs/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { coupleCells, demoFileCount, readPlot, waitForAnalysis, waitForFiles, waitForRedraw, dragAcrossPlot } from './appHelpers';
import { openApp, type OpenedApp } from './harness';

async function commitNumber(app: OpenedApp, testId: string, value: string): Promise<void> {
  const input = app.page.getByTestId(testId);
  await input.fill(value);
  await input.press('Enter');
}

describe('changing settings, exporting, saving', () => {
  let app: OpenedApp;
  beforeAll(async () => {
    app = await openApp();
    await waitForFiles(app.page, demoFileCount());
  });
  afterAll(async () => app?.close());

  it('iR correction narrows ΔEp, and undo restores the original numbers', async () => {
    const page = app.page;
    const [dep0] = await coupleCells(page, 'cell-dep');
    await commitNumber(app, 'resistance', '2000');
    await page.waitForFunction((d) => Number(document.querySelector('[data-testid=cell-dep]')?.textContent) < Number(d) - 0.5, dep0, { timeout: 30_000 });
    await waitForAnalysis(page);
    const [dep1] = await coupleCells(page, 'cell-dep');
    expect(dep1).toBeLessThan(dep0 as number);
    expect((await readPlot(page)).traces.length).toBeGreaterThan(0);
    await page.getByTestId('undo').click();
    await page.waitForFunction((d) => document.querySelector('[data-testid=cell-dep]')?.textContent === Number(d).toFixed(1), dep0, { timeout: 30_000 });
    expect(await page.getByTestId('resistance').inputValue()).toBe('0');
  });

  it('a new display scale shifts Epa by 0.210 − 0.2412 = −0.0312 V and relabels the axis', async () => {
    const page = app.page;
    const [epa0] = await coupleCells(page, 'cell-epa');
    const before = await readPlot(page);
    await page.getByTestId('display-reference').selectOption('SCE');
    await waitForRedraw(page, before.renders);
    await waitForAnalysis(page);
    const [epa1] = await coupleCells(page, 'cell-epa');
    // Table cells have 4 decimals: allow 1e-4 for rounding.
    expect(Math.abs((epa1 as number) - ((epa0 as number) - 0.0312))).toBeLessThanOrEqual(1.01e-4);
    // The basis comes from the series' first file, which may be re-analysed after the selected one.
    await page.waitForFunction(() => document.querySelector('[data-testid=scale-basis]')?.textContent?.includes('-0.0312 V'), null, { timeout: 30_000 });
    await page.waitForFunction(() => (document.querySelector('[data-testid=trace-plot]') as unknown as { layout?: { xaxis?: { title?: { text?: string } } } })?.layout?.xaxis?.title?.text === 'E vs SCE / V', null, { timeout: 10_000 });
  });

  it('a new smoothing window re-runs the analysis and the smoothed curve can be drawn', async () => {
    const page = app.page;
    // A click, then a wait: the box is drawn from the store at the next frame (check() reads it at once).
    await page.getByTestId('show-smoothed').click();
    await page.waitForFunction(() => (document.querySelector('[data-testid=show-smoothed]') as HTMLInputElement | null)?.checked === true, null, { timeout: 10_000 });
    await commitNumber(app, 'smoothing-window', '11');
    await waitForAnalysis(page);
    await page.waitForFunction(() => ((document.querySelector('[data-testid=trace-plot]') as unknown as { data?: { name: string }[] })?.data ?? []).some((d) => d.name.startsWith('smoothed')), null, { timeout: 30_000 });
    expect(await page.getByTestId('smoothing-window').inputValue()).toBe('11');
  });

  it('downloads the results sheet of the selected series as CSV, on the chosen scale', async () => {
    const page = app.page;
    await page.getByTestId('export-scope').selectOption('this');
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('export-csv').click()]);
    expect(download.suggestedFilename()).toMatch(/^halfwave-results-.+\.csv$/);
    const text = await readFile(await download.path(), 'utf8');
    expect(text).toMatch(/^# results sheet,Halfwave,/);
    expect(text).toContain('# potential scale,SCE');
    expect(text).toMatch(/# file,[^,]+,series,[^,]+,role,series,size_bytes,\d+,sha256,[0-9a-f]{64}/);
    expect(text).toContain('# table: couples');
    expect(text).toContain('# table: series');
  });

  it('saves the session with settings, file names and checksums', async () => {
    const page = app.page;
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('save-session').click()]);
    const doc = JSON.parse(await readFile(await download.path(), 'utf8'));
    expect(doc.format).toBe('halfwave-session');
    expect(doc.settings.reference.displayReference).toBe('SCE');
    expect(doc.settings.smoothing).toEqual({ window: 11, order: 2 });
    expect(doc.files).toHaveLength(demoFileCount());
    expect(doc.files[0].sha256).toMatch(/^[0-9a-f]{64}$/);
    expect(doc.files[0].dataBase64).toBeUndefined();

    // Change a setting, then open the saved session: the saved setting comes back.
    await commitNumber(app, 'smoothing-window', '7');
    await waitForAnalysis(page);
    await page.getByTestId('session-input').setInputFiles(await download.path());
    await page.waitForFunction(() => document.querySelector('[data-testid=notice]')?.textContent?.startsWith('Session opened in place of the workspace'), null, { timeout: 30_000 });
    expect(await page.getByTestId('smoothing-window').inputValue()).toBe('11');
  });

  it('dragging across the plot in window mode adds a peak window of that file and re-analyses', async () => {
    const page = app.page;
    const before = await readPlot(page);
    await page.getByTestId('drag-mode').selectOption('anodic');
    await waitForRedraw(page, before.renders);
    await dragAcrossPlot(page, 'trace-plot');
    await page.getByTestId('peak-window').first().waitFor({ timeout: 10_000 });
    expect(await page.getByTestId('peak-window').count()).toBe(1);
    await waitForAnalysis(page);
    await page.waitForFunction(() => ((document.querySelector('[data-testid=trace-plot]') as unknown as { layout?: { shapes?: unknown[] } })?.layout?.shapes ?? []).length === 1, null, { timeout: 10_000 });
    await page.getByTestId('drag-mode').selectOption('zoom');
  });

  it('stayed free of console errors, page errors and outside requests', () => {
    expect(app.consoleErrors).toEqual([]);
    expect(app.pageErrors).toEqual([]);
    expect(app.outsideRequests).toEqual([]);
  });
});
