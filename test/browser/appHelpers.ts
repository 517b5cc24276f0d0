/**
 * Helpers for the workbench flow specs: how many demo files the build bundles, waiting until the
 * app has read and analysed them, and reading what Plotly drew (Plotly keeps the figure on its
 * host element as `data` and `layout`).
 */
import { AxeBuilder } from '@axe-core/playwright';
import { demoFileNames } from '../../scripts/demoBundle';
import { resolve } from 'node:path';
import type { Page } from 'playwright-core';

export function demoFileCount(): number {
  return demoFileNames(resolve(import.meta.dirname, '../../demo-data')).length;
}

/**
 * Waits until `count` file rows are ready and a results table is shown: the selected file's
 * couples, or (after an upload, which opens its series) the table across files.
 */
export async function waitForFiles(page: Page, count: number, timeout = 90_000): Promise<void> {
  await page.waitForFunction(
    (n) => document.querySelectorAll('[data-testid=file-row][data-status=ready], [data-testid=file-row][data-status=error]').length >= n
      && !document.querySelector('[data-testid=import-progress]'),
    count, { timeout, polling: 250 },
  );
  await page.locator('[data-testid=couples-table], [data-testid=results-table]').first().waitFor({ timeout });
  await waitForAnalysis(page);
}

/**
 * Opens a main view (trace, series, fit, report) and waits until it is the one shown. On a busy
 * machine a click can land while the layout still moves (a notice appears, a table grows) and
 * miss its button; it is then made again, up to three times.
 */
export async function showView(page: Page, view: 'trace' | 'series' | 'fit' | 'report'): Promise<void> {
  const button = page.getByTestId(`view-${view}`);
  for (let attempt = 1; ; attempt++) {
    await button.click();
    try {
      await page.waitForFunction((b) => document.querySelector(`[data-testid=view-${b}]`)?.getAttribute('aria-checked') === 'true', view, { timeout: 10_000, polling: 50 });
      return;
    } catch (err) {
      if (attempt >= 3) throw err;
    }
  }
}

/** Waits until the selected file's analysis is up to date. */
export async function waitForAnalysis(page: Page): Promise<void> {
  await page.waitForFunction(() => document.querySelector('[data-testid=analysis-status]')?.textContent === 'up to date', null, { timeout: 30_000, polling: 100 });
}

export interface DrawnTrace {
  name: string;
  x: (number | null)[];
  y: (number | null)[];
}

export interface DrawnPlot {
  traces: DrawnTrace[];
  /** Shown x range [left, right]: left > right when the potential axis runs right to left. */
  xRange: [number, number];
  yTitle: string;
  renders: number;
}

export async function readPlot(page: Page, testId = 'trace-plot'): Promise<DrawnPlot> {
  return page.evaluate((id) => {
    type Host = HTMLElement & {
      data?: { name: string; x: unknown; y: unknown }[];
      layout?: { xaxis?: { range?: [number, number] }; yaxis?: { title?: { text?: string } } };
    };
    const el = document.querySelector(`[data-testid=${id}]`) as Host | null;
    const traces = (el?.data ?? []).map((d) => ({ name: d.name, x: Array.from(d.x as ArrayLike<number | null>), y: Array.from(d.y as ArrayLike<number | null>) }));
    const range = el?.layout?.xaxis?.range ?? [Number.NaN, Number.NaN];
    return { traces, xRange: [Number(range[0]), Number(range[1])] as [number, number], yTitle: el?.layout?.yaxis?.title?.text ?? '', renders: Number(el?.dataset.renders ?? 0) };
  }, testId);
}

/** Waits for the plot to be drawn again after an action. */
export async function waitForRedraw(page: Page, before: number, testId = 'trace-plot'): Promise<void> {
  await page.waitForFunction(([id, n]) => Number((document.querySelector(`[data-testid=${id}]`) as HTMLElement | null)?.dataset.renders ?? 0) > Number(n), [testId, before] as const, { timeout: 30_000, polling: 100 });
}

/** A reversible one-electron couple from our own simulator, as a CSV export (time, E, I). */
export { simulatedCsv } from '../../src/state/testSupport';

/** Text of every cell with the test id in the couples table (its tab opened first), as numbers. */
export async function coupleCells(page: Page, testId: string): Promise<number[]> {
  if (await page.getByTestId('couples-table').count() === 0) {
    await page.getByTestId('tab-couples').click();
    await page.getByTestId('couples-table').waitFor({ timeout: 30_000 });
  }
  const texts = await page.getByTestId('couples-table').getByTestId(testId).allTextContents();
  return texts.map(Number);
}

/** Clicks the file's row in the file list (the list box's option). */
export async function selectFileRow(page: Page, fileName: string): Promise<void> {
  await page.locator(`[data-testid=file-row][data-file-name="${fileName}"]`).click();
}

/** Drags across the middle of a plot, from 30 % to 70 % of its width, in small steps as a hand would. */
export async function dragAcrossPlot(page: Page, testId: string): Promise<void> {
  const box = await page.locator(`[data-testid=${testId}] .nsewdrag`).first().boundingBox();
  if (!box) throw new Error(`drag layer of ${testId} not found`);
  const y = box.y + box.height / 2;
  await page.mouse.move(box.x + box.width * 0.3, y);
  await page.mouse.down();
  await page.mouse.move(box.x + box.width * 0.5, y, { steps: 8 });
  await page.mouse.move(box.x + box.width * 0.7, y, { steps: 8 });
  await page.mouse.up();
}

/**
 * axe-core's serious and critical violations on the page as it is, or only inside the element
 * `within` selects (rule id and the first nodes).
 */
export async function seriousViolations(page: Page, within?: string): Promise<string[]> {
  const builder = new AxeBuilder({ page: page as never });
  const result = await (within ? builder.include(within) : builder).analyze();
  return result.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id}: ${v.nodes.slice(0, 3).map((n) => n.target.join(' ')).join(' | ')}`);
}
