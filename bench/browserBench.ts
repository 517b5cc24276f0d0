/**
 * `npm run bench:browser`: the workbench in headless Chromium against the production build
 * (dist/, served by Vite's preview server on 127.0.0.1), timed from inside the page. It prints
 * figures and ratios measured in one run; nothing here passes or fails on a time.
 *
 * 1. Page load → demo fully shown: every demo file read and analysed, the first trace drawn and
 *    its couples table on screen (the first-plot time is printed too). Beside it, the same files
 *    read and analysed in Node on one thread, as a yardstick of the machine's speed at the time:
 *    on a shared machine the same page can take half as long again from one hour to the next.
 * 2. The 120-file batch of bench/scaleData.ts picked at once, read and analysed in the page,
 *    against the same work in Node through the worker's own handlers (one thread).
 * 3. With those files loaded, a click on another file until its trace is drawn again (median).
 */
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { existsSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { chromium, type Page } from 'playwright-core';
import { preview } from 'vite';
import { handlers, type HandlerContext } from '../src/worker/handlers';
import { cellValuesOf, methodOptionsOf } from '../src/run/runInput';
import { defaultCell } from '../src/run/seriesCell';
import { defaultSettings } from '../src/run/settings';
import { demoFileNames } from '../scripts/demoBundle';
import { smallCvFiles } from './scaleData';
import type { BenchRow } from './types';

const CHROMIUM = process.env.HALFWAVE_CHROMIUM ?? '/usr/bin/chromium';
const SMALL_FILES = 120;
const SWITCHES = 7;

/**
 * In-page probe: the first frame (performance.now(), ms since navigation) at which each condition
 * held. It looks once per animation frame, when the browser would show a change anyway: a probe
 * run on every DOM change would itself take the page's thread while the demo loads.
 * Plain text, not a function: the TypeScript runner would wrap a function in helpers the page lacks.
 */
const PROBE = `(() => {
  const marks = {};
  window.benchMarks = marks;
  const ready = () => document.querySelectorAll('[data-testid=file-row][data-status=ready]').length;
  const busy = () => document.querySelector('[data-testid=import-progress]') !== null
    || document.querySelector('[data-testid=file-row][data-analysis=running], [data-testid=file-row][data-status=importing], [data-testid=file-row][data-status=queued]') !== null;
  const plotRenders = () => Number(document.querySelector('[data-testid=trace-plot]')?.dataset.renders ?? 0);
  const check = () => {
    const now = performance.now();
    const want = Number(window.benchWant ?? 0);
    if (marks.firstPlot === undefined && plotRenders() > 0) marks.firstPlot = now;
    if (want > 0 && ready() >= want && !busy() && plotRenders() > 0 && document.querySelector('[data-testid=couples-table], [data-testid=results-table]')) {
      marks['shown' + want] ??= now;
    }
  };
  const frame = () => {
    check();
    requestAnimationFrame(frame);
  };
  requestAnimationFrame(frame);
})();`;

async function waitMark(page: Page, name: string): Promise<number> {
  await page.waitForFunction((n) => (window as unknown as { benchMarks: Record<string, number> }).benchMarks[n] !== undefined, name, { timeout: 600_000, polling: 50 });
  return page.evaluate((n) => (window as unknown as { benchMarks: Record<string, number> }).benchMarks[n] as number, name);
}

/** The same work in Node, one thread: read each file, then analyse it, through the worker's handlers. */
async function nodeBatchMs(files: { name: string; text: string }[]): Promise<number> {
  const ctx: HandlerContext = { progress: () => undefined, signal: new AbortController().signal };
  const one = async (f: { name: string; text: string }) => {
    const read = await handlers.import({ fileName: f.name, data: new TextEncoder().encode(f.text).buffer as ArrayBuffer, overrides: {} }, ctx);
    handlers.runFiles({ run: { files: [{ fileName: f.name, voltammogram: read.measurement }], cells: { 'series 1': cellValuesOf(defaultCell(defaultSettings)) }, method: methodOptionsOf(defaultSettings) } }, ctx);
  };
  await one(files[0]!);
  const t0 = performance.now();
  for (const f of files) await one(f);
  return performance.now() - t0;
}

/** Click another file and time (in the page) until the trace has been drawn again. */
async function switchMs(page: Page, name: string): Promise<number> {
  return page.evaluate(async (fileName) => {
    const plot = document.querySelector('[data-testid=trace-plot]') as HTMLElement;
    const before = Number(plot.dataset.renders ?? 0);
    const row = [...document.querySelectorAll('[data-testid=file-row]')].find((r) => r.getAttribute('data-file-name') === fileName) as HTMLElement;
    // The row itself is the option to click; older builds had a button inside it.
    const target = (row.querySelector('.file-name') as HTMLElement | null) ?? row;
    const t0 = performance.now();
    await new Promise<void>((resolve, reject) => {
      setTimeout(() => reject(new Error(`no redraw after selecting ${fileName}`)), 60_000);
      const obs = new MutationObserver(() => {
        if (Number((document.querySelector('[data-testid=trace-plot]') as HTMLElement).dataset.renders ?? 0) > before) {
          obs.disconnect();
          resolve();
        }
      });
      obs.observe(document.body, { subtree: true, attributes: true, attributeFilter: ['data-renders'] });
      target.click();
    });
    return performance.now() - t0;
  }, name);
}

export async function runBrowserBench(): Promise<BenchRow[]> {
  if (!existsSync('dist/index.html')) throw new Error('dist/index.html is missing: run `npm run build` first');
  if (!existsSync(CHROMIUM)) throw new Error(`no Chromium at ${CHROMIUM}: install it (apt-get install -y chromium) or name it in HALFWAVE_CHROMIUM`);
  const server = await preview({ preview: { host: '127.0.0.1', port: 0, strictPort: false, open: false }, logLevel: 'warn' });
  const address = server.httpServer.address();
  if (!address || typeof address === 'string') throw new Error('preview server has no TCP address');
  const browser = await chromium.launch({ executablePath: CHROMIUM, headless: true, args: ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run'] });
  const dir = await mkdtemp(join(tmpdir(), 'halfwave-bench-'));
  try {
    // The yardstick first, while nothing else runs.
    const demoFiles = demoFileNames('demo-data').map((f) => ({ name: f, text: readFileSync(join('demo-data', f), 'utf8') }));
    const demoNodeMs = await nodeBatchMs(demoFiles);
    const page = await (await browser.newContext({ viewport: { width: 1366, height: 768 } })).newPage();
    await page.addInitScript({ content: PROBE });
    const demoCount = demoFiles.length;
    await page.addInitScript({ content: `window.benchWant = ${demoCount};` });
    await page.goto(`http://127.0.0.1:${address.port}/`);
    const shownMs = await waitMark(page, `shown${demoCount}`);
    const firstPlotMs = await waitMark(page, 'firstPlot');
    const loadEventMs = await page.evaluate<number>("performance.getEntriesByType('navigation')[0]?.loadEventEnd ?? NaN");

    const files = smallCvFiles(SMALL_FILES);
    const paths = await Promise.all(files.map(async (f) => {
      const path = join(dir, f.name);
      await writeFile(path, f.text);
      return path;
    }));
    // Node's time is taken before and after the page's, and averaged: the machine's load drifts.
    const nodeBeforeMs = await nodeBatchMs(files);
    const want = demoCount + SMALL_FILES;
    await page.evaluate((n) => {
      const w = window as unknown as { benchWant: number; benchMarks: Record<string, number> };
      w.benchWant = n;
      document.querySelector('[data-testid=file-input]')?.addEventListener('change', () => { w.benchMarks.picked = performance.now(); }, { capture: true, once: true });
    }, want);
    await page.getByTestId('file-input').setInputFiles(paths);
    const batchPageMs = (await waitMark(page, `shown${want}`)) - (await waitMark(page, 'picked'));
    const batchNodeMs = (nodeBeforeMs + (await nodeBatchMs(files))) / 2;

    const times: number[] = [];
    // Never the file already selected (the upload opens its series on the first file).
    for (let k = 0; k < SWITCHES; k++) times.push(await switchMs(page, files[(k * 17 + 7) % SMALL_FILES]!.name));
    times.sort((a, b) => a - b);
    const switchMedian = times[Math.floor(times.length / 2)]!;
    return [
      { name: 'navigation → the page\'s load event', value: loadEventMs, unit: 'ms', note: 'the times below count from navigation, the stricter start' },
      { name: 'page load → first trace drawn', value: firstPlotMs, unit: 'ms' },
      { name: `page load → demo fully shown (${demoCount} files)`, value: shownMs, unit: 'ms', note: 'read, analysed, trace and couples table on screen; goal ≤ 2,000 ms' },
      { name: 'the demo files read + analysed in Node', value: demoNodeMs, unit: 'ms', note: 'one thread, warm: the machine\'s speed at the time' },
      { name: 'demo shown / its Node time', value: shownMs / demoNodeMs, unit: '×' },
      { name: `${SMALL_FILES} files read + analysed in the page`, value: batchPageMs, unit: 'ms', note: 'from the pick to every file analysed' },
      { name: 'the same work in Node (one thread)', value: batchNodeMs, unit: 'ms', note: 'worker handlers in-thread; mean of a run before and after' },
      { name: 'page / Node', value: batchPageMs / batchNodeMs, unit: '×', note: 'goal ≤ 2' },
      { name: `switch file with ${want} loaded (median of ${SWITCHES})`, value: switchMedian, unit: 'ms', note: 'click → trace drawn again; goal < 100 ms' },
    ];
  } finally {
    await browser.close();
    await new Promise<void>((resolve) => server.httpServer.close(() => resolve()));
    await rm(dir, { recursive: true });
  }
}

async function main(): Promise<void> {
  const rows = await runBrowserBench();
  console.log(`\n## browser (headless Chromium, ${CHROMIUM})`);
  const width = Math.max(...rows.map((r) => r.name.length));
  for (const r of rows) console.log(`${r.name.padEnd(width)}  ${r.value.toFixed(r.unit === '×' ? 2 : 0).padStart(9)} ${r.unit.padEnd(3)}${r.note ? `  ${r.note}` : ''}`);
}

if (process.argv[1]?.endsWith('browserBench.ts')) {
  main().catch((err: unknown) => {
    console.error(err instanceof Error ? err.message : String(err));
    process.exitCode = 1;
  });
}
