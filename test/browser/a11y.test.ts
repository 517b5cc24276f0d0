/**
 * Accessibility and comfort: axe-core (through @axe-core/playwright) finds no serious or critical
 * violation on the trace, series and report views (the fit view: test/browser/fit.test.ts), in the light and the dark theme; the plot
 * toolbar holds only view tools; a skip link leads to the plot; the file list is one tab stop
 * moved with the arrow keys; the safety drawer holds focus and gives it back on Escape.
 */
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoFileCount, seriousViolations, waitForFiles } from './appHelpers';
import { openApp, type OpenedApp } from './harness';

async function showView(page: Page, view: 'trace' | 'series' | 'report', ready: string): Promise<void> {
  await page.getByTestId(`view-${view}`).click();
  await page.getByTestId(ready).first().waitFor({ timeout: 60_000 });
}

describe('accessibility', () => {
  let app: OpenedApp;
  beforeAll(async () => {
    app = await openApp();
    await waitForFiles(app.page, demoFileCount());
  });
  afterAll(async () => app?.close());

  it('axe finds no serious or critical violation on the trace, series and report views', async () => {
    const page = app.page;
    await page.getByTestId('tab-files').click();
    await page.getByTestId('results-table').waitFor({ timeout: 30_000 });
    expect(await seriousViolations(page)).toEqual([]);
    await showView(page, 'series', 'series-table');
    expect(await seriousViolations(page)).toEqual([]);
    await showView(page, 'report', 'report-files');
    expect(await seriousViolations(page)).toEqual([]);
    await showView(page, 'trace', 'trace-plot');
  });

  it('the plot toolbar has only zoom, pan and reset tools: nothing to share, upload or save to a cloud', async () => {
    const titles = await app.page.locator('[data-testid=trace-plot] .modebar-btn').evaluateAll((els) => els.map((e) => e.getAttribute('data-title') ?? ''));
    expect(titles.length).toBeGreaterThan(0);
    for (const t of titles) expect(t).toMatch(/^(Zoom|Pan|Zoom in|Zoom out|Reset axes)$/);
    expect(await app.page.locator('[data-testid=trace-plot] [data-title*="Share"], [data-testid=trace-plot] .modebar-btn[data-attr*="cloud" i]').count()).toBe(0);
  });

  it('the first tab stop is a skip link that moves focus to the plot area', async () => {
    const page = app.page;
    const first = await page.evaluate(() => [...document.querySelectorAll<HTMLElement>('a[href], button:not([disabled]), input, select, [tabindex="0"]')]
      .find((e) => e.tabIndex >= 0)?.getAttribute('data-testid'));
    expect(first).toBe('skip-link');
    // Shift+Tab from the first control of the top bar lands on it (it shows when focused).
    await page.getByTestId('convention-iupac').focus();
    await page.keyboard.press('Shift+Tab');
    expect(await page.evaluate(() => document.activeElement?.getAttribute('data-testid'))).toBe('skip-link');
    expect(await page.getByTestId('skip-link').isVisible()).toBe(true);
    await page.keyboard.press('Enter');
    await page.waitForFunction(() => document.activeElement?.id === 'main-view' || location.hash === '#main-view', null, { timeout: 5000 });
    // From there the trace's own controls come first.
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => document.activeElement?.getAttribute('data-testid'))).toBe('cycle-select');
  });

  it('the file list is a single tab stop; the arrow keys move the selection', async () => {
    const page = app.page;
    const list = page.getByTestId('file-list');
    await list.focus();
    const before = await page.locator('[data-testid=file-row][aria-selected=true]').getAttribute('data-file-name');
    await page.keyboard.press('ArrowDown');
    await page.waitForFunction((b) => document.querySelector('[data-testid=file-row][aria-selected=true]')?.getAttribute('data-file-name') !== b, before, { timeout: 5000 });
    expect(await list.getAttribute('aria-activedescendant')).toMatch(/^file-option-/);
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => document.activeElement?.getAttribute('data-testid'))).toBe('file-series');
    expect(await page.locator('[data-testid=file-list] [tabindex], [data-testid=file-list] button, [data-testid=file-list] input').count()).toBe(0);
  });

  it('the safety drawer holds focus while open and gives it back on Escape', async () => {
    const page = app.page;
    await page.getByTestId('safety-open').focus();
    await page.keyboard.press('Enter');
    await page.getByTestId('safety-drawer').waitFor();
    expect(await page.evaluate(() => document.activeElement?.getAttribute('data-testid'))).toBe('safety-close');
    for (let k = 0; k < 3; k++) {
      await page.keyboard.press('Tab');
      expect(await page.evaluate(() => !!document.activeElement?.closest('[data-testid=safety-drawer]'))).toBe(true);
    }
    await page.keyboard.press('Escape');
    await page.getByTestId('safety-drawer').waitFor({ state: 'detached' });
    expect(await page.evaluate(() => document.activeElement?.getAttribute('data-testid'))).toBe('safety-open');
  });

  it('stayed free of console errors, page errors and outside requests', () => {
    expect(app.consoleErrors).toEqual([]);
    expect(app.pageErrors).toEqual([]);
    expect(app.outsideRequests).toEqual([]);
  });
});

describe('dark theme', () => {
  let app: OpenedApp;
  beforeAll(async () => {
    app = await openApp('', { width: 1366, height: 768 }, 'dark');
    await waitForFiles(app.page, demoFileCount());
  });
  afterAll(async () => app?.close());

  it('follows the system preference, with contrast axe accepts, plots included', async () => {
    const page = app.page;
    const bg = await page.evaluate(() => getComputedStyle(document.documentElement).getPropertyValue('--bg').trim());
    expect(bg).toBe('#12181c');
    await page.waitForFunction(() => (document.querySelector('[data-testid=trace-plot]') as unknown as { layout?: { paper_bgcolor?: string } })?.layout?.paper_bgcolor === '#1a2227', null, { timeout: 30_000 });
    expect(await seriousViolations(page)).toEqual([]);
  });
});
