/**
 * Scale flow: 120 small exports picked at once, then one 1,000,000-row export. Both are read and
 * analysed in the workers while the page keeps answering. What is checked is what happened, never
 * how long it took (timings live in `npm run bench`): a probe inside the page records every
 * progress text the app shows, and while the big file is still being read a click on the page
 * takes effect. All input is simulated here with seeds (bench/scaleData.ts).
 */
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bigCvTrace, smallCvFiles, traceCsv } from '../../bench/scaleData';
import { coupleCells, demoFileCount, seriousViolations, waitForAnalysis, waitForFiles } from './appHelpers';
import { openApp, type OpenedApp } from './harness';

const SMALL_FILES = 120;
const BIG_ROWS = 1_000_000;
const BIG_NAME = 'long_run_10cycles_100mVs.csv';
interface ProbeReport {
  /** Every distinct text of the batch indicator ("Reading k of N"). */
  batchTexts: string[];
  /** Every distinct status text of rows being read ("reading 37 %"), by file name. */
  rowTexts: Record<string, string[]>;
  /** Largest number of per-file progress bars shown at once. */
  maxRowBars: number;
  /** Every distinct text of the series indicator ("Fitting 2 series across scan rates…"). */
  seriesTexts: string[];
}

/** Starts the in-page probe: a MutationObserver that records progress texts. */
async function startProbe(page: Page): Promise<void> {
  await page.evaluate(() => {
    const report = { batchTexts: [] as string[], rowTexts: {} as Record<string, string[]>, maxRowBars: 0, seriesTexts: [] as string[] };
    const note = (list: string[], text: string) => {
      if (!list.includes(text)) list.push(text);
    };
    const observer = new MutationObserver(() => {
      const batch = document.querySelector('[data-testid=import-progress]')?.textContent;
      if (batch) note(report.batchTexts, batch.trim());
      const fitting = document.querySelector('[data-testid=series-progress]')?.textContent;
      if (fitting) note(report.seriesTexts, fitting.trim());
      const reading = document.querySelectorAll('[data-testid=file-row][data-status=importing]');
      report.maxRowBars = Math.max(report.maxRowBars, document.querySelectorAll('[data-testid=file-row] progress').length);
      for (const row of reading) {
        const name = row.getAttribute('data-file-name') ?? '';
        const text = row.querySelector('.file-meta span')?.textContent ?? '';
        note((report.rowTexts[name] ??= []), text);
      }
    });
    observer.observe(document.body, { subtree: true, childList: true, characterData: true, attributes: true, attributeFilter: ['data-status'] });
    (window as unknown as { scaleProbe: unknown }).scaleProbe = { report, stop: () => observer.disconnect() };
  });
}

async function stopProbe(page: Page): Promise<ProbeReport> {
  return page.evaluate(() => {
    const probe = (window as unknown as { scaleProbe: { report: ProbeReport; stop: () => void } }).scaleProbe;
    probe.stop();
    return probe.report;
  });
}

/** "Reading k of N" texts → the k values seen for that N. */
function readingCounts(texts: string[], total: number): number[] {
  return texts.flatMap((t) => {
    const m = /^Reading (\d+) of (\d+)/.exec(t);
    return m && Number(m[2]) === total ? [Number(m[1])] : [];
  });
}

describe('many files and a million-row file', () => {
  let app: OpenedApp;
  let dir: string;
  const demo = demoFileCount();
  beforeAll(async () => {
    dir = await mkdtemp(join(tmpdir(), 'halfwave-scale-'));
    app = await openApp();
    await waitForFiles(app.page, demo);
  });
  afterAll(async () => {
    await app?.close();
    if (dir) await rm(dir, { recursive: true });
  });

  it(`reads ${SMALL_FILES} files picked at once, with progress for the batch and for files`, async () => {
    const page = app.page;
    const files = smallCvFiles(SMALL_FILES);
    // Files on disk, not in-memory buffers: Playwright would decode buffers inside the page.
    const paths = await Promise.all(files.map(async (f) => {
      const path = join(dir, f.name);
      await writeFile(path, f.text);
      return path;
    }));
    await startProbe(page);
    await page.getByTestId('file-input').setInputFiles(paths);
    await waitForFiles(page, demo + SMALL_FILES);
    // Once every file is read, the new series are fitted, and the intake says so until they are.
    await page.waitForFunction(() => (window as unknown as { scaleProbe: { report: ProbeReport } }).scaleProbe.report.seriesTexts.length > 0
      && !document.querySelector('[data-testid=series-progress]'), undefined, { timeout: 60_000 });
    const probe = await stopProbe(page);
    expect(probe.seriesTexts.every((t) => /^Fitting \d+ series across scan rates…$/.test(t))).toBe(true);
    expect(await page.locator('[data-testid=file-row][data-status=ready]').count()).toBe(demo + SMALL_FILES);
    for (const f of [files[0]!, files[SMALL_FILES - 1]!]) {
      const meta = await page.locator(`[data-testid=file-row][data-file-name="${f.name}"] .file-meta`).textContent();
      expect(meta).toMatch(/^1,201 pts, 1 cycle/);
    }
    const counts = readingCounts(probe.batchTexts, SMALL_FILES);
    expect(counts.length).toBeGreaterThan(2);
    expect(Math.min(...counts)).toBeLessThan(SMALL_FILES / 2);
    expect(Math.max(...counts)).toBeGreaterThan(SMALL_FILES / 2);
    expect(probe.maxRowBars).toBeGreaterThan(0);
  });

  it(`the results table of the ${SMALL_FILES} files draws the rows in view, and the last when scrolled to, its columns keeping their widths`, async () => {
    const page = app.page;
    await page.getByTestId('tab-files').click();
    const table = page.getByTestId('results-table');
    await page.waitForFunction((n) => document.querySelector('[data-testid=results-table]')?.getAttribute('aria-rowcount') === String(n + 1), SMALL_FILES, { timeout: 30_000 });
    expect(await page.getByTestId('results-row').count()).toBeLessThan(SMALL_FILES / 2);
    expect(await page.getByTestId('results-row').first().getAttribute('aria-rowindex')).toBe('2');
    const widths = () => table.locator('thead th').evaluateAll((ths) => ths.map((t) => Math.round(t.getBoundingClientRect().width)));
    const before = await widths();
    await page.evaluate(() => document.querySelector('[data-testid=results-table]')?.closest('.tab-body')?.scrollTo(0, 1e6));
    await page.waitForFunction((n) => [...document.querySelectorAll('[data-testid=results-row]')].at(-1)?.getAttribute('aria-rowindex') === String(n + 1), SMALL_FILES, { timeout: 10_000 });
    expect(await page.getByTestId('results-row').last().getAttribute('data-file-name')).toBe(smallCvFiles(SMALL_FILES).at(-1)?.name);
    expect(await widths()).toEqual(before);
    // Rows stood in for are hidden from assistive technology; the table says how many there are.
    expect(await seriousViolations(page, '[data-testid=results-across-files]')).toEqual([]);
  });

  it(`reads and analyses a ${BIG_ROWS.toLocaleString('en')}-row file with progress, the page answering a click while it reads`, async () => {
    const page = app.page;
    // On disk as well (31 MB is also close to Playwright's 50 MB limit for buffers).
    const path = join(dir, BIG_NAME);
    await writeFile(path, traceCsv(bigCvTrace(BIG_ROWS, 10)));
    await startProbe(page);
    await page.getByTestId('file-input').setInputFiles(path);
    const row = page.locator(`[data-testid=file-row][data-file-name="${BIG_NAME}"]`);
    // While the file is being read, a click on the page takes effect: the page is not frozen.
    await row.and(page.locator('[data-status=importing]')).waitFor();
    const toggle = page.getByTestId('show-smoothed');
    const before = await toggle.isChecked();
    await toggle.click();
    expect(await toggle.isChecked()).toBe(!before);
    expect(await row.getAttribute('data-status')).toBe('importing');
    await toggle.click();
    await waitForFiles(page, demo + SMALL_FILES + 1, 100_000);
    const probe = await stopProbe(page);
    const steps = probe.rowTexts[BIG_NAME] ?? [];
    expect(await row.getAttribute('data-status')).toBe('ready');
    expect(await row.locator('.file-meta').textContent()).toMatch(/^1,000,000 pts, 10 cycles/);
    const percents = steps.flatMap((t) => (/^reading (\d+) %$/.exec(t)?.slice(1) ?? []).map(Number));
    expect(percents.filter((p) => p > 0 && p < 100).length).toBeGreaterThan(1);
    expect(readingCounts(probe.batchTexts, 1)).toEqual([1]);
  });

  // Nernstian couple, E°′ = 0 V, 0.1 V/s: E½ = E°′ for equal D (Bard & Faulkner, Electrochemical
  // Methods, 2nd ed. (2001), §6.2.1, from memory) ± 3 mV; ΔEp ≈ 2.22·RT/nF = 57 mV (Nicholson
  // 1965, from memory) ± 4 mV, as in intake.test.ts. The million-row trace resamples the same
  // simulated couple, so its numbers must be these.
  it('the million-row file opens on the plot and its couple has the reversible E½ and ΔEp', async () => {
    const page = app.page;
    await page.locator(`[data-testid=file-row][data-file-name="${BIG_NAME}"] .file-name`).click();
    await waitForAnalysis(page);
    await page.getByTestId('tab-couples').click();
    await page.getByTestId('couples-table').waitFor();
    const [eHalf] = await coupleCells(page, 'cell-ehalf');
    const [dep] = await coupleCells(page, 'cell-dep');
    expect(Math.abs(eHalf as number)).toBeLessThan(0.003);
    expect(Math.abs((dep as number) - 57)).toBeLessThan(4);
  });

  it('stayed free of console errors, page errors and outside requests', () => {
    expect(app.consoleErrors).toEqual([]);
    expect(app.pageErrors).toEqual([]);
    expect(app.outsideRequests).toEqual([]);
  });
});
