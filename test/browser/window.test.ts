/**
 * The working window behind the trace and the series overlays. Window limits come from the
 * app's table (core/potentialWindow, each limit "common practice, from memory"); SHE → Ag/AgCl
 * (3 M KCl) is −0.210 V through the app's reference table (its stated source). Overlays: the demo
 * probe series (demo-data/README.md) at six scan rates, coloured and named in order of v.
 */
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoFileCount, selectFileRow, waitForFiles, waitForRedraw, readPlot, showView } from './appHelpers';
import { openApp, type OpenedApp } from './harness';

type Host = HTMLElement & { layout?: { shapes?: { type: string; x0: number; x1: number; fillcolor?: string }[]; annotations?: { text: string }[]; yaxis?: { title?: { text?: string } } }; data?: { name: string; fill?: string }[] };

async function shapesOf(page: Page, testId = 'trace-plot') {
  return page.evaluate((id) => {
    const el = document.querySelector(`[data-testid=${id}]`) as Host | null;
    return { shapes: el?.layout?.shapes ?? [], labels: (el?.layout?.annotations ?? []).map((a) => a.text), data: (el?.data ?? []).map((d) => ({ name: d.name, fill: d.fill ?? null })), yTitle: el?.layout?.yaxis?.title?.text ?? '' };
  }, testId);
}

describe('working window and series overlays', () => {
  let app: OpenedApp;
  beforeAll(async () => {
    app = await openApp();
    await waitForFiles(app.page, demoFileCount());
    await selectFileRow(app.page, 'probe_RuHex_100mVs.csv');
  });
  afterAll(async () => app?.close());

  it('glassy carbon in aqueous neutral medium: the band sits behind the trace and each limit names its process and source', async () => {
    const page = app.page;
    const before = await readPlot(page);
    await page.getByTestId('window-material').selectOption('glassy-carbon');
    await page.getByTestId('window-medium').selectOption('aqueous-neutral');
    await waitForRedraw(page, before.renders);
    // Table: −1.15 and +1.3 V vs SHE; on Ag/AgCl (3 M KCl): −1.36 and +1.09 V.
    expect(Number(await page.getByTestId('window-lower').inputValue())).toBeCloseTo(-1.36, 3);
    expect(Number(await page.getByTestId('window-upper').inputValue())).toBeCloseTo(1.09, 3);
    expect(await page.getByTestId('window-sources').textContent()).toMatch(/hydrogen evolution \(common practice, from memory/);
    await page.waitForFunction(() => ((document.querySelector('[data-testid=trace-plot]') as Host | null)?.layout?.shapes ?? []).some((s) => s.type === 'rect'), null, { timeout: 10_000 });
    const { shapes } = await shapesOf(page);
    const band = shapes.find((s) => s.type === 'rect');
    expect(band?.fillcolor).toBe('rgba(0, 158, 115, 0.07)');
    expect(band!.x1).toBeGreaterThan(band!.x0);
  });

  it('a limit the user enters moves the band edge into view and is marked as entered', async () => {
    const page = app.page;
    const before = await readPlot(page);
    await page.getByTestId('window-upper').fill('0.05');
    await page.getByTestId('window-upper').press('Enter');
    await waitForRedraw(page, before.renders);
    expect(await page.getByTestId('window-sources').textContent()).toContain('entered by the user');
    const { shapes, labels } = await shapesOf(page);
    expect(shapes.find((s) => s.type === 'line')?.x0).toBeCloseTo(0.05, 6);
    expect(labels).toContain('carbon and water oxidation');
  });

  it('a peak at or beyond a window limit is flagged as possible breakdown in the peaks table', async () => {
    const page = app.page;
    await page.getByTestId('tab-peaks').click();
    expect(await page.getByTestId('peak-at-edge').count()).toBe(0);
    // The probe's anodic peak is near −0.13 V vs Ag/AgCl (demo-data/README.md): a limit at −0.15 V puts it beyond.
    await page.getByTestId('window-upper').fill('-0.15');
    await page.getByTestId('window-upper').press('Enter');
    await page.getByTestId('peak-at-edge').first().waitFor({ timeout: 10_000 });
    await page.getByTestId('tab-couples').click();
  });

  it('carbon paste in the organic medium says it is not usable instead of drawing a band', async () => {
    const page = app.page;
    await page.getByTestId('window-material').selectOption('carbon-paste');
    await page.getByTestId('window-medium').selectOption('acetonitrile-tetraalkylammonium');
    expect(await page.getByTestId('window-problem').textContent()).toMatch(/not usable/);
    await page.getByTestId('window-material').selectOption('');
  });

  it('the series overlay draws every file in order of scan rate, in the chosen scaling, with the fit bands', async () => {
    const page = app.page;
    await showView(page, 'series');
    await page.getByTestId('series-group').selectOption('probe RuHex');
    await page.getByTestId('series-table').waitFor({ timeout: 60_000 });
    await page.waitForFunction(() => ((document.querySelector('[data-testid=series-overlay-plot]') as Host | null)?.data ?? []).length === 6, null, { timeout: 30_000 });
    const overlay = await shapesOf(page, 'series-overlay-plot');
    expect(overlay.data.map((d) => d.name)).toEqual(['0.01 V/s', '0.025 V/s', '0.05 V/s', '0.1 V/s', '0.25 V/s', '0.5 V/s']);
    expect(overlay.yTitle).toBe('i / µA');
    const renders = (await readPlot(page, 'series-overlay-plot')).renders;
    await page.getByTestId('overlay-scaling').selectOption('diffusion');
    await waitForRedraw(page, renders, 'series-overlay-plot');
    expect((await shapesOf(page, 'series-overlay-plot')).yTitle).toMatch(/^i\/v½ \/ \(.A s½ V⁻½\)$/);
    await page.getByTestId('overlay-cycle').selectOption('2');
    const current = await shapesOf(page, 'series-current-plot');
    expect(current.data.some((d) => d.name === 'fit, 95 % band' && d.fill === 'tonexty')).toBe(true);
    await showView(page, 'trace');
  });

  it('stayed free of console errors, page errors and outside requests', () => {
    expect(app.consoleErrors).toEqual([]);
    expect(app.pageErrors).toEqual([]);
    expect(app.outsideRequests).toEqual([]);
  });
});
