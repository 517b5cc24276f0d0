/**
 * The fit view on the demo's quasi-reversible series (demo-data/README.md, "Ferrocenyl amide
 * FcAm-2": simulated by Halfwave's own simulator with E°′ = 0.31 V vs Ag/AgCl, k° = 0.008 cm/s,
 * α = 0.48, D = 5.5e-6 cm²/s, R_u = 120 Ω, six scan rates). The fit must recover the truth within
 * the tolerances of the fit issue (E°′ 2 mV, k° 25 %, D 5 %, α 0.05; common practice for a
 * simulated-data check, no source) with R_u held at the cell's 0 Ω, as a user who gave none would
 * run it. Then: progress while it runs, "use these values" with its undo, the results sheet with
 * the fit, the page answering while a fit runs, cancel, and a window dragged on the plot.
 */
import { readFile } from 'node:fs/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoFileCount, dragAcrossPlot, seriousViolations, waitForFiles, showView } from './appHelpers';
import { openApp, type OpenedApp } from './harness';

async function cell(app: OpenedApp, key: string, column: 'value' | 'error'): Promise<string> {
  return (await app.page.getByTestId(`fit-row-${key}`).getByTestId(column).textContent()) ?? '';
}

/** Waits until the running fit has reported at least `n` iterations; returns the progress text of that moment. */
async function waitForIteration(app: OpenedApp, n: number): Promise<string> {
  const handle = await app.page.waitForFunction((k) => {
    const el = document.querySelector('[data-testid=fit-progress-text]');
    return Number(el?.getAttribute('data-iteration') ?? 0) >= k ? el?.textContent : null;
  }, n, { timeout: 90_000, polling: 50 });
  return String(await handle.jsonValue());
}

describe('fit view on the demo', () => {
  let app: OpenedApp;
  beforeAll(async () => {
    app = await openApp();
    await waitForFiles(app.page, demoFileCount());
    await showView(app.page, 'fit');
    await app.page.getByTestId('fit-group').selectOption('quasi FcAmide');
  });
  afterAll(async () => app?.close());

  it('fits the quasi-reversible series with progress shown, and recovers E°′, k°, D and α', async () => {
    const page = app.page;
    expect(await page.getByTestId('fit-status').textContent()).toBe('not fitted yet');
    await page.getByTestId('fit-run').click();
    const progress = await waitForIteration(app, 1);
    expect(progress).toMatch(/^fitting (E|EC): iteration \d+ · model [12] of 2 · Σ residual² [\d.]+ × 10⁻[¹²³⁴⁵⁶⁷⁸⁹⁰]+ A² · \d+ simulations$/);
    await page.getByTestId('fit-results').waitFor({ timeout: 120_000 });
    expect(await page.getByTestId('fit-status').textContent()).toBe('fitted');
    const e0 = Number(await cell(app, 'E0', 'value'));
    const k0 = Number(await cell(app, 'k0', 'value'));
    const d = Number(await cell(app, 'D', 'value'));
    const alpha = Number(await cell(app, 'alpha', 'value'));
    expect(Math.abs(e0 - 0.31)).toBeLessThan(0.002);
    expect(Math.abs(k0 / 0.008 - 1)).toBeLessThan(0.25);
    expect(Math.abs(d / 5.5e-6 - 1)).toBeLessThan(0.05);
    expect(Math.abs(alpha - 0.48)).toBeLessThan(0.05);
    expect(Number(await cell(app, 'k0', 'error'))).toBeGreaterThan(0);
    // Every file of the series is drawn with its fitted curve and residuals.
    const traces = await page.evaluate(() => ((document.querySelector('[data-testid=fit-plot]') as HTMLElement & { data?: { yaxis?: string }[] }).data ?? []).map((t) => t.yaxis ?? 'y'));
    expect(traces.filter((a) => a === 'y')).toHaveLength(12);
    expect(traces.filter((a) => a === 'y2')).toHaveLength(6);
    expect(await page.getByTestId('fit-recommendation').textContent()).toMatch(/ΔBIC/);
    expect(await page.getByTestId('fit-correlations').locator('li').count()).toBeGreaterThan(0);
    // The fit view with its results passes axe-core (no serious or critical violation), as the other views do.
    expect(await seriousViolations(page)).toEqual([]);
  });

  it('the notebook report carries the current fit: model, window and the parameter table', async () => {
    const page = app.page;
    await showView(page, 'report');
    await page.getByTestId('report-fit').waitFor({ timeout: 30_000 });
    expect(await page.getByTestId('report-fit-model').textContent()).toMatch(/Model (E|EC), 1 couple, cycle 1; 6 files fitted together/);
    expect(await page.getByTestId('report-fit').locator('th', { hasText: 'E°′' }).count()).toBe(1);
    await showView(page, 'fit');
    await page.getByTestId('fit-results').waitFor();
  });

  it('"use these values" puts the fitted α into the series’ cell, and undo takes it back', async () => {
    const page = app.page;
    expect(await page.getByTestId('alpha').inputValue()).toBe('');
    await page.getByTestId('fit-use').click();
    await page.getByTestId('fit-carried').waitFor();
    const carried = Number(await page.getByTestId('alpha').inputValue());
    expect(Math.abs(carried - Number(await cell(app, 'alpha', 'value')))).toBeLessThan(1e-9);
    await page.getByTestId('fit-undo').click();
    await page.waitForFunction(() => (document.querySelector('[data-testid=alpha]') as HTMLInputElement | null)?.value === '', null, { timeout: 10_000 });
    await page.getByTestId('fit-use').waitFor();
  });

  it('the results sheet of the series carries the fit (JSON key fits, CSV fit tables)', async () => {
    const page = app.page;
    const [json] = await Promise.all([page.waitForEvent('download'), page.getByTestId('export-json').click()]);
    const doc = JSON.parse(await readFile(await json.path(), 'utf8')) as { fits: { series: string; mechanism: string; params: { E0: number }; criteria: { bic: number }; modelChoice: { recommendation: string } | null }[] };
    expect(doc.fits).toHaveLength(1);
    expect(doc.fits[0]).toMatchObject({ series: 'quasi FcAmide', mechanism: 'E' });
    expect(Math.abs((doc.fits[0]?.params.E0 ?? 0) - 0.31)).toBeLessThan(0.002);
    expect(doc.fits[0]?.modelChoice?.recommendation).toMatch(/ΔBIC/);
    const [csv] = await Promise.all([page.waitForEvent('download'), page.getByTestId('export-csv').click()]);
    const text = await readFile(await csv.path(), 'utf8');
    for (const table of ['fit', 'fit models', 'raw fit', 'raw fit models', 'raw fit correlations']) expect(text).toContain(`# table: ${table}\n`);
  });

  it('the page answers while a fit runs, and Cancel stops it without a result', async () => {
    const page = app.page;
    await page.getByTestId('fit-run').click();
    await waitForIteration(app, 1);
    // Another view opens and shows its plot while the fit runs in its worker.
    await showView(page, 'trace');
    await page.getByTestId('trace-plot').waitFor();
    await showView(page, 'fit');
    await page.getByTestId('fit-progress').waitFor();
    await page.getByTestId('fit-cancel').click();
    await page.waitForFunction(() => document.querySelector('[data-testid=fit-status]')?.textContent === 'cancelled', null, { timeout: 10_000 });
    expect(await page.getByTestId('fit-results').count()).toBe(0);
    expect(await page.getByTestId('fit-progress').count()).toBe(0);
    expect(await page.getByTestId('fit-run').isEnabled()).toBe(true);
  });

  it('a drag across the plot in window mode sets the window; "Whole cycle" clears it', async () => {
    const page = app.page;
    const renders = async () => Number(await page.getByTestId('fit-plot').getAttribute('data-renders'));
    const before = await renders();
    await page.getByTestId('fit-drag-window').click();
    await page.waitForFunction((n) => Number(document.querySelector('[data-testid=fit-plot]')?.getAttribute('data-renders')) > n, before, { timeout: 30_000 });
    await dragAcrossPlot(page, 'fit-plot');
    await page.waitForFunction(() => (document.querySelector('[data-testid=fit-window-from]') as HTMLInputElement | null)?.value !== '', null, { timeout: 10_000 });
    const from = Number(await page.getByTestId('fit-window-from').inputValue());
    const to = Number(await page.getByTestId('fit-window-to').inputValue());
    // The quasi series sweeps 0 → 0.65 V (demo-data/README.md); the drag covered its middle.
    expect(from).toBeGreaterThan(0);
    expect(to).toBeLessThan(0.65);
    expect(to - from).toBeGreaterThan(0.1);
    await page.waitForFunction(() => ((document.querySelector('[data-testid=fit-plot]') as unknown as { layout?: { shapes?: unknown[] } })?.layout?.shapes ?? []).length === 1, null, { timeout: 10_000 });
    await page.getByTestId('fit-window-clear').click();
    await page.waitForFunction(() => (document.querySelector('[data-testid=fit-window-from]') as HTMLInputElement | null)?.value === '', null, { timeout: 10_000 });
    expect(await page.getByTestId('fit-window-to').inputValue()).toBe('');
  });

  it('stayed free of console errors, page errors and outside requests', () => {
    expect(app.consoleErrors).toEqual([]);
    expect(app.pageErrors).toEqual([]);
    expect(app.outsideRequests).toEqual([]);
  });
});
