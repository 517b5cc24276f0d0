/**
 * Results across files: a picked folder of six exports opens as its own series with its table;
 * the table sorts, a click shows that trace, Copy gives tab-separated text with units in the
 * header; scan rates read without float tails; D explains itself on focus (formula, source,
 * inputs with values).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoFileCount, waitForFiles } from './appHelpers';
import { SIX_RATES_V_PER_S, sixExportFolder } from './folderFixture';
import { openApp, type OpenedApp } from './harness';

describe('results table across files', () => {
  let app: OpenedApp;
  let folder: Awaited<ReturnType<typeof sixExportFolder>>;
  const demo = demoFileCount();
  beforeAll(async () => {
    folder = await sixExportFolder();
    app = await openApp();
    await app.page.context().grantPermissions(['clipboard-read', 'clipboard-write']);
    await waitForFiles(app.page, demo);
    await app.page.getByTestId('folder-input').setInputFiles(folder.dir);
    await waitForFiles(app.page, demo + 6);
    await app.page.getByTestId('results-table').waitFor({ timeout: 30_000 });
  });
  afterAll(async () => {
    await app?.close();
    await folder?.remove();
  });

  it('the new series and its table open by themselves: one row per file, scan rates without float tails', async () => {
    const page = app.page;
    expect(await page.getByTestId('tab-files').getAttribute('aria-selected')).toBe('true');
    expect(await page.getByTestId('results-scope').inputValue()).toBe('series');
    await page.waitForFunction(() => document.querySelectorAll('[data-testid=results-row]').length === 6, null, { timeout: 30_000 });
    const v = await page.getByTestId('results-v').allTextContents();
    expect(v).toEqual(SIX_RATES_V_PER_S.map(String));
    const selected = await page.locator('[data-testid=file-row][aria-selected=true]').getAttribute('data-file-name');
    expect(selected).toBe('cv_020mVs.csv');
    // The file list shows the new file, below the demo's, without the user scrolling to it.
    await page.waitForFunction(() => {
      const row = document.querySelector('[data-testid=file-row][aria-selected=true]')?.getBoundingClientRect();
      const list = document.querySelector('[data-testid=file-list]')?.getBoundingClientRect();
      return !!row && !!list && row.top >= list.top - 1 && row.bottom <= list.bottom + 1;
    }, null, { timeout: 10_000 });
    for (const head of ['v / (V s⁻¹)', 'E½ / V', 'ΔEp / mV', 'ipa / µA', '|Ep − Ep/2| / mV']) {
      expect(await page.getByTestId('results-table').locator('th', { hasText: head }).count()).toBeGreaterThan(0);
    }
  });

  it('sorts by scan rate, and a click on a row shows that trace', async () => {
    const page = app.page;
    await page.getByTestId('sort-scanRate').click();
    await page.getByTestId('sort-scanRate').click();
    await page.waitForFunction(() => document.querySelector('[data-testid=results-v]')?.textContent === '0.5', null, { timeout: 10_000 });
    expect(await page.locator('th[aria-sort=descending]').count()).toBe(1);
    await page.getByTestId('results-row').first().click();
    await page.waitForFunction(() => document.querySelector('[data-testid=file-row][aria-selected=true]')?.getAttribute('data-file-name') === 'cv_500mVs.csv', null, { timeout: 10_000 });
    await page.waitForFunction(() => (document.querySelector('[data-testid=trace-plot]') as unknown as { layout?: { uirevision?: string } })?.layout?.uirevision?.startsWith('cv_500mVs.csv'), null, { timeout: 30_000 });
  });

  // Nernstian couple: ΔEp ≈ 2.22·RT/nF = 57 mV at 25 °C (Nicholson, Anal. Chem. 36 (1964) 706,
  // from memory) ± 4 mV, in every copied row, with the unit in the header.
  it('Copy puts tab-separated rows with units in the header on the clipboard', async () => {
    const page = app.page;
    await page.getByTestId('results-copy').click();
    await page.waitForFunction(() => document.querySelector('.results-bar [role=status]')?.textContent?.includes('copied'), null, { timeout: 10_000 });
    const text = await page.evaluate(() => navigator.clipboard.readText());
    const lines = text.trim().split('\n').map((l) => l.split('\t'));
    expect(lines[0]).toContain('ΔEp / mV');
    expect(lines[0]?.[5]).toMatch(/^Epa \/ V vs /);
    expect(lines).toHaveLength(7);
    const dep = (lines[0] as string[]).indexOf('ΔEp / mV');
    for (const row of lines.slice(1)) expect(Math.abs(Number(row[dep]) - 57)).toBeLessThan(4);
  });

  it('D of the new series shows on screen and explains itself on focus', async () => {
    const page = app.page;
    const d = page.getByTestId('series-headline').getByTestId('explain-D');
    await d.waitFor({ timeout: 30_000 });
    await d.focus();
    const tip = page.getByTestId('series-headline').getByTestId('explain-tip-D');
    expect(await tip.isVisible()).toBe(true);
    const text = (await tip.textContent()) ?? '';
    expect(text).toContain('0.4463');
    expect(text).toContain('Bard & Faulkner');
    expect(text).toContain('A (electrode area) = 0.0707 cm²');
    expect(text).toMatch(/slope = [\d.]+ µA/);
    await d.press('Escape');
    expect(await tip.isVisible()).toBe(false);
  });

  it('shows every file when asked', async () => {
    const page = app.page;
    await page.getByTestId('results-scope').selectOption('all');
    await page.waitForFunction((n) => document.querySelectorAll('[data-testid=results-row]').length > n, 6, { timeout: 10_000 });
    await page.getByTestId('results-scope').selectOption('series');
  });

  it('stayed free of console errors, page errors and outside requests', () => {
    expect(app.consoleErrors).toEqual([]);
    expect(app.pageErrors).toEqual([]);
    expect(app.outsideRequests).toEqual([]);
  });
});
