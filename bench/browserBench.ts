/**
 * `npm run bench:browser`: the workbench in headless Chromium against the production build
 * (dist/, served by Vite's preview server on 127.0.0.1), timed from inside the page. It prints
 * figures and ratios measured in one run; nothing here passes or fails on a time.
 *
 * 1. Page load → demo fully shown: every demo file read and analysed, the first trace drawn and
 *    its couples table on screen (the first-plot time is printed too), counted both from
 *    navigation (the stricter start) and from the page's load event. Beside it, the same files
 *    read and analysed in Node on one thread, as a yardstick of the machine's speed at the time:
 *    on a shared machine the same page can take half as long again from one hour to the next.
 * 2. The 120-file batch of bench/scaleData.ts picked at once, once the demo's series are fitted,
 *    read and analysed in the page, against the same work in Node through the worker's own
 *    handlers (one thread). Node runs just before and just after the page's batch, each time once
 *    the browser is quiet (threadTime.ts chromiumQuiet): after a batch the page fits the new
 *    series and autosaves the files, about 0.2 s of its thread, and a Node run beside that read
 *    up to 0.4 s long, which flattered the ratio.
 * 3. With those files loaded, a click on another file until its trace is drawn again (median).
 * 4. The floor under 2: a fresh analysis worker of the same build, in the same page, given the
 *    demo files and then the 120 files as bytes already in memory (with the run snapshot the app
 *    sent with its own first file), nothing else running: the engine's own start-up, without
 *    the page's reading, drawing and bookkeeping.
 * 5. On Linux, the CPU time of Chromium's threads over the batch, by role (bench/threadTime.ts):
 *    who took the two cores.
 * All of it runs in three rounds, each in a fresh browser context; each figure is the median of
 * the rounds, printed with their range, and each ratio is taken within one round.
 */
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { existsSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { preview } from 'vite';
import { spawnSync } from 'node:child_process';
import { nodeBatchMs } from './nodeBatch';
import { demoFileNames } from '../scripts/demoBundle';
import { smallCvFiles } from './scaleData';
import type { BenchRow } from './types';
import { chromiumQuiet, chromiumThreads, threadTimeBetween } from './threadTime';

const CHROMIUM = process.env.HALFWAVE_CHROMIUM ?? '/usr/bin/chromium';
/** The build to time: dist/, or another build folder named in HALFWAVE_BENCH_DIST (to compare two builds at the same hour). */
const DIST = process.env.HALFWAVE_BENCH_DIST ?? 'dist';
const SMALL_FILES = 120;
const SWITCHES = 7;

/**
 * In-page probe: the first frame (performance.now(), ms since navigation) at which each condition
 * held. Every condition reads the DOM, so it is looked at once in the first frame after the DOM
 * changed (a MutationObserver asks for that frame), and never otherwise. The bench itself must not
 * take the cores it measures: a probe run on every frame kept the browser drawing 60 frames a
 * second (about 45 ms of CPU a second on this machine), and Playwright's polled waits
 * (`waitForFunction` every 50 ms) took about 180 ms a second between the test runner and the
 * browser. `benchWaitMark(name)` resolves once, when the mark is set: one call, no polling.
 * Plain text, not a function: the TypeScript runner would wrap a function in helpers the page lacks.
 */
const PROBE = `(() => {
  const marks = {};
  const waiters = [];
  window.benchMarks = marks;
  window.benchWaitMark = (name) => marks[name] !== undefined ? Promise.resolve(marks[name]) : new Promise((resolve) => waiters.push({ name, resolve }));
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
    for (let k = waiters.length - 1; k >= 0; k--) {
      const w = waiters[k];
      if (marks[w.name] !== undefined) {
        waiters.splice(k, 1);
        w.resolve(marks[w.name]);
      }
    }
  };
  let asked = false;
  const ask = () => {
    if (asked) return;
    asked = true;
    requestAnimationFrame(() => {
      asked = false;
      check();
    });
  };
  new MutationObserver(ask).observe(document, { subtree: true, childList: true, attributes: true, attributeFilter: ['data-status', 'data-analysis', 'data-renders'] });
  ask();
})();`;

/** Keeps the run snapshot (`ahead`) the app sends with its first import, for the worker-alone run. */
const CAPTURE_AHEAD = `(() => {
  const send = Worker.prototype.postMessage;
  Worker.prototype.postMessage = function (message, transfer) {
    if (message && message.type === 'import' && message.input && message.input.ahead && !window.benchAhead) window.benchAhead = message.input.ahead;
    return send.call(this, message, transfer);
  };
})();`;

/**
 * A fresh worker of the page's own build fed the demo, then the batch, all at once from memory;
 * resolves with the batch's time (ms). Text, not a function, for the reason PROBE is.
 */
const WORKER_ALONE = `(async () => {
  const { demo, batch } = window.benchWorkerFiles;
  const url = performance.getEntriesByType('resource').map((e) => e.name).find((n) => n.includes('analysis.worker'));
  if (!url || !window.benchAhead) throw new Error('no analysis worker script or run snapshot seen');
  const worker = new Worker(url, { type: 'module' });
  let id = 1e6;
  const run = (list) => new Promise((resolve, reject) => {
    let left = list.length;
    const t0 = performance.now();
    worker.onmessage = (e) => {
      if (e.data.type === 'error') reject(new Error(e.data.message));
      else if (e.data.type === 'result' && --left === 0) resolve(performance.now() - t0);
    };
    for (const f of list) {
      const data = new TextEncoder().encode(f.text).buffer;
      worker.postMessage({ type: 'import', requestId: id++, input: { fileName: f.name, data, overrides: {}, ahead: { ...window.benchAhead, fileId: 'bench-' + id } } }, [data]);
    }
  });
  await run(demo);
  await new Promise((r) => setTimeout(r, 500));
  const ms = await run(batch);
  worker.terminate();
  return ms;
})()`;

/**
 * Waits until no series has been fitting for half a second (a series is fitted 150 ms after its
 * last file is analysed). Looked at in the page, every 50 ms, before anything is timed.
 */
async function waitSeriesFitted(page: Page): Promise<void> {
  await page.evaluate(`new Promise((resolve) => {
    let seen = window.benchMarks['shown' + window.benchWant] ?? performance.now();
    const look = () => {
      const now = performance.now();
      if (document.querySelector('[data-testid=series-progress]')) seen = now;
      if (now - seen > 500) resolve();
      else setTimeout(look, 50);
    };
    look();
  })`);
}

/** The time of a probe mark, once it is set (one call that waits in the page). */
async function waitMark(page: Page, name: string): Promise<number> {
  return page.evaluate<number, string>((n) => (window as unknown as { benchWaitMark: (m: string) => Promise<number> }).benchWaitMark(n), name);
}

/** The same batch in a fresh Node process, first pass: the engine compiles as it goes (bench/nodeBatch.ts). */
function coldNodeBatchMs(count: number): number {
  const run = spawnSync(process.execPath, [...process.execArgv, 'bench/nodeBatch.ts', String(count)], { encoding: 'utf8' });
  if (run.status !== 0) throw new Error(`bench/nodeBatch.ts failed: ${run.stderr}`);
  return (JSON.parse(run.stdout.trim().split('\n').pop() ?? '{}') as { coldMs: number }).coldMs;
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

/** Rounds, each in a fresh browser context; the figures are their medians, printed with the range. */
const ROUNDS = 3;

interface Round {
  loadEventMs: number;
  firstPlotMs: number;
  shownMs: number;
  demoNodeMs: number;
  batchPageMs: number;
  batchNodeMs: number;
  /** The same batch in a fresh Node process, first pass. */
  coldNodeMs: number;
  /** The batch in a fresh worker of the same build, demo first, nothing else running (WORKER_ALONE). */
  workerAloneMs: number;
  switchMs: number[];
  /** CPU time over the batch by thread role (bench/threadTime.ts); null off Linux. */
  batchCpu: ReturnType<typeof threadTimeBetween>;
}

/**
 * One round: the demo files in Node (the yardstick), the page loaded in a fresh context until
 * the demo is shown, then the 120 files picked, with Node's time for them taken just before and
 * just after; then file switches.
 */
async function oneRound(browser: Browser, port: number, demoFiles: { name: string; text: string }[], files: { name: string; text: string }[], paths: string[]): Promise<Round> {
  const demoNodeMs = await nodeBatchMs(demoFiles);
  const context = await browser.newContext({ viewport: { width: 1366, height: 768 } });
  try {
    const page = await context.newPage();
    await page.addInitScript({ content: PROBE });
    await page.addInitScript({ content: CAPTURE_AHEAD });
    const demoCount = demoFiles.length;
    await page.addInitScript({ content: `window.benchWant = ${demoCount};` });
    await page.goto(`http://127.0.0.1:${port}/`);
    const shownMs = await waitMark(page, `shown${demoCount}`);
    const firstPlotMs = await waitMark(page, 'firstPlot');
    const loadEventMs = await page.evaluate<number>("performance.getEntriesByType('navigation')[0]?.loadEventEnd ?? NaN");
    // The demo's series are fitted once its files are read (about a second of a fresh worker):
    // the batch is picked when that is done, so that it is timed alone, as in Node.
    await waitSeriesFitted(page);
    await chromiumQuiet();
    // Node's time is taken before and after the page's, and averaged: the machine's load drifts.
    const nodeBeforeMs = await nodeBatchMs(files);
    const want = demoCount + files.length;
    await page.evaluate((n) => {
      const w = window as unknown as { benchWant: number; benchMarks: Record<string, number> };
      w.benchWant = n;
      document.querySelector('[data-testid=file-input]')?.addEventListener('change', () => { w.benchMarks.picked = performance.now(); }, { capture: true, once: true });
    }, want);
    const threadsBefore = chromiumThreads();
    await page.getByTestId('file-input').setInputFiles(paths);
    const batchPageMs = (await waitMark(page, `shown${want}`)) - (await waitMark(page, 'picked'));
    const batchCpu = threadTimeBetween(threadsBefore, chromiumThreads());
    // After the batch the page still works (the new series is fitted, the files are autosaved):
    // Node's second run, the yardstick, waits until the browser is quiet, or the two share the cores.
    await waitSeriesFitted(page);
    await chromiumQuiet();
    const batchNodeMs = (nodeBeforeMs + (await nodeBatchMs(files))) / 2;
    const coldNodeMs = coldNodeBatchMs(files.length);
    const switches: number[] = [];
    // Never the file already selected (the upload opens its series on the first file).
    for (let k = 0; k < SWITCHES; k++) switches.push(await switchMs(page, files[(k * 17 + 7) % files.length]!.name));
    await page.evaluate((f) => { (window as unknown as { benchWorkerFiles: unknown }).benchWorkerFiles = f; }, { demo: demoFiles, batch: files });
    const workerAloneMs = await page.evaluate<number>(WORKER_ALONE);
    return { loadEventMs, firstPlotMs, shownMs, demoNodeMs, batchPageMs, batchNodeMs, coldNodeMs, workerAloneMs, switchMs: switches, batchCpu };
  } finally {
    await context.close();
  }
}

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
}

/** "1,930–2,210 over 3 rounds" (digits as the unit needs). */
function range(values: number[], unit: string): string {
  const f = (v: number) => (unit === '×' ? v.toFixed(2) : Math.round(v).toLocaleString('en-US'));
  return `${f(Math.min(...values))}–${f(Math.max(...values))} over ${values.length} rounds`;
}

/** CPU time over the batch by thread role, when it could be read (Linux): where the two cores went. */
function cpuRows(rounds: Round[]): BenchRow[] {
  const cpu = rounds.map((r) => r.batchCpu).filter((c) => c !== null);
  if (cpu.length !== rounds.length) return [];
  const row = (name: string, values: number[], note: string): BenchRow => ({ name, value: median(values), unit: 'ms', note: `${range(values, 'ms')}; ${note}` });
  return [
    row('batch CPU: the workers', cpu.map((c) => c.workers), 'thread CPU time from /proc schedstat over the batch: the analysis workers'),
    row('batch CPU: the page\'s thread', cpu.map((c) => c.page), 'store, React, Plotly, layout, the answers taken in'),
    row('batch CPU: the renderer\'s pool', cpu.map((c) => c.pool), 'the engine\'s optimising compilers, raster, garbage collection'),
    row('batch: the workers waited for a core', cpu.map((c) => c.workersWaited), 'time runnable but not running'),
  ];
}

export async function runBrowserBench(): Promise<BenchRow[]> {
  if (!existsSync(join(DIST, 'index.html'))) throw new Error(`${DIST}/index.html is missing: run \`npm run build\` first`);
  if (!existsSync(CHROMIUM)) throw new Error(`no Chromium at ${CHROMIUM}: install it (apt-get install -y chromium) or name it in HALFWAVE_CHROMIUM`);
  const server = await preview({ build: { outDir: DIST }, preview: { host: '127.0.0.1', port: 0, strictPort: false, open: false }, logLevel: 'warn' });
  const address = server.httpServer.address();
  if (!address || typeof address === 'string') throw new Error('preview server has no TCP address');
  const browser = await chromium.launch({ executablePath: CHROMIUM, headless: true, args: ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run'] });
  const dir = await mkdtemp(join(tmpdir(), 'halfwave-bench-'));
  try {
    const demoFiles = demoFileNames('demo-data').map((f) => ({ name: f, text: readFileSync(join('demo-data', f), 'utf8') }));
    const files = smallCvFiles(SMALL_FILES);
    const paths = await Promise.all(files.map(async (f) => {
      const path = join(dir, f.name);
      await writeFile(path, f.text);
      return path;
    }));
    const rounds: Round[] = [];
    for (let r = 0; r < ROUNDS; r++) rounds.push(await oneRound(browser, address.port, demoFiles, files, paths));
    const row = (name: string, values: number[], unit: string, goal?: string): BenchRow => ({
      name, value: median(values), unit, note: [range(values, unit), goal].filter(Boolean).join('; '),
    });
    const pick = (f: (r: Round) => number) => rounds.map(f);
    const want = demoFiles.length + SMALL_FILES;
    return [
      row('navigation → the page\'s load event', pick((r) => r.loadEventMs), 'ms'),
      row('navigation → first trace drawn', pick((r) => r.firstPlotMs), 'ms'),
      row(`navigation → demo fully shown (${demoFiles.length} files)`, pick((r) => r.shownMs), 'ms', 'read, analysed, trace and couples table on screen; goal ≤ 2,000 ms from navigation, the stricter start'),
      row('load event → demo fully shown', pick((r) => r.shownMs - r.loadEventMs), 'ms', 'the same goal counted from the page\'s load event'),
      row('the demo files read + analysed in Node', pick((r) => r.demoNodeMs), 'ms', 'one thread, warm, just before each round: the machine\'s speed at the time'),
      row('demo shown / its Node time', pick((r) => r.shownMs / r.demoNodeMs), '×'),
      row(`${SMALL_FILES} files read + analysed in the page`, pick((r) => r.batchPageMs), 'ms', 'from the pick to every file analysed'),
      row('the same work in Node (one thread)', pick((r) => r.batchNodeMs), 'ms', 'worker handlers in-thread; mean of a run just before and just after the page\'s, the browser quiet'),
      row('page / Node', pick((r) => r.batchPageMs / r.batchNodeMs), '×', 'each round\'s own ratio; goal ≤ 2'),
      row('the same work in a fresh Node process', pick((r) => r.coldNodeMs), 'ms', 'first pass, the engine compiling as it goes (as a page\'s worker must); for comparison, no goal'),
      row('page / fresh Node', pick((r) => r.batchPageMs / r.coldNodeMs), '×'),
      row('the same work in a fresh worker alone', pick((r) => r.workerAloneMs), 'ms', 'same build and page, demo first, bytes from memory, no page work: what the engine alone costs'),
      row('worker alone / Node', pick((r) => r.workerAloneMs / r.batchNodeMs), '×', 'the floor under page / Node; the rest is the page\'s own share'),
      row(`switch file with ${want} loaded (median of ${SWITCHES} per round)`, pick((r) => median(r.switchMs)), 'ms', 'click → trace drawn again; goal < 100 ms'),
      ...cpuRows(rounds),
    ];
  } finally {
    await browser.close();
    await new Promise<void>((resolve) => server.httpServer.close(() => resolve()));
    await rm(dir, { recursive: true });
  }
}

async function main(): Promise<void> {
  const rows = await runBrowserBench();
  console.log(`\n## browser (headless Chromium, ${CHROMIUM}, ${DIST}/)`);
  const width = Math.max(...rows.map((r) => r.name.length));
  for (const r of rows) console.log(`${r.name.padEnd(width)}  ${r.value.toFixed(r.unit === '×' ? 2 : 0).padStart(9)} ${r.unit.padEnd(3)}${r.note ? `  ${r.note}` : ''}`);
}

if (process.argv[1]?.endsWith('browserBench.ts')) {
  main().catch((err: unknown) => {
    console.error(err instanceof Error ? err.message : String(err));
    process.exitCode = 1;
  });
}
