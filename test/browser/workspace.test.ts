/**
 * The workspace survives what happens to a browser tab, and sessions round-trip: uploads come back
 * after a reload (autosave in IndexedDB) with their numbers; analysis workers that stop mid-run are
 * started again and the work completes; a full storage says what was not kept; a session saved
 * with data opens in a fresh page as the identical workspace, replacing what was there (undoable);
 * a new workspace and the sign convention are undoable. The comparisons are exact because the same
 * code computes the same inputs (no published value is involved); the input is our simulator's
 * reversible couple (src/state/testSupport.ts).
 */
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { coupleCells, demoFileCount, simulatedCsv, waitForAnalysis, waitForFiles } from './appHelpers';
import { openApp, type OpenedApp } from './harness';

let dir: string;
beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'halfwave-workspace-'));
});
afterAll(async () => {
  if (dir) await rm(dir, { recursive: true });
});

async function writeRun(names: Array<[string, number]>): Promise<string[]> {
  return Promise.all(names.map(async ([name, v]) => {
    const path = join(dir, name);
    await writeFile(path, simulatedCsv(v));
    return path;
  }));
}

/** The file rows' names in order, and the shown couple numbers of the selected file. */
async function fileNames(page: Page): Promise<string[]> {
  return page.locator('[data-testid=file-row]').evaluateAll((rows) => rows.map((r) => r.getAttribute('data-file-name') ?? ''));
}

async function noticeMatching(page: Page, re: RegExp): Promise<string> {
  await page.waitForFunction((src) => new RegExp(src).test(document.querySelector('[data-testid=notice]')?.textContent ?? ''), re.source, { timeout: 60_000, polling: 100 });
  return (await page.getByTestId('notice').textContent()) ?? '';
}

describe('uploads survive a reload, and stopped workers', () => {
  let app: OpenedApp;
  beforeAll(async () => {
    app = await openApp('?test-hooks');
    await waitForFiles(app.page, demoFileCount());
  });
  afterAll(async () => app?.close());

  it('a new workspace, then an upload: after a reload the same files and numbers are back, not the demo', async () => {
    const page = app.page;
    await page.getByTestId('new-workspace').click();
    await page.waitForFunction(() => document.querySelectorAll('[data-testid=file-row]').length === 0);
    await page.getByTestId('file-input').setInputFiles(await writeRun([['kept_50mVs.csv', 0.05], ['kept_200mVs.csv', 0.2]]));
    await waitForFiles(page, 2);
    const before = { names: await fileNames(page), eHalf: await coupleCells(page, 'cell-ehalf') };
    // Autosave runs shortly after the last change; wait until the stored session lists just these
    // files and their bytes are stored beside it (page.evaluate awaits the check; polled from here).
    const stored = () => page.evaluate(async (names) => {
      // Never create the app's database from here: only look once the app has made it.
      if (!(await indexedDB.databases()).some((d) => d.name === 'halfwave')) return false;
      const open = indexedDB.open('halfwave');
      const db: IDBDatabase = await new Promise((res, rej) => ((open.onsuccess = () => res(open.result)), (open.onerror = rej)));
      if (!db.objectStoreNames.contains('workspace')) return (db.close(), false);
      const store = db.transaction('workspace').objectStore('workspace');
      const [keys, text] = await Promise.all([
        new Promise<IDBValidKey[]>((res) => { const r = store.getAllKeys(); r.onsuccess = () => res(r.result); }),
        new Promise<unknown>((res) => { const r = store.get('halfwave.autosave.v2'); r.onsuccess = () => res(r.result); }),
      ]);
      db.close();
      const saved = typeof text === 'string' ? (JSON.parse(text) as { files: Array<{ fileName: string }> }).files.map((f) => f.fileName) : [];
      return JSON.stringify(saved) === JSON.stringify(names) && keys.filter((k) => String(k).startsWith('bytes:')).length === names.length;
    }, before.names);
    await expect.poll(stored, { timeout: 30_000, interval: 250 }).toBe(true);
    await page.reload();
    await waitForFiles(page, 2);
    expect(await fileNames(page)).toEqual(before.names);
    expect(await coupleCells(page, 'cell-ehalf')).toEqual(before.eHalf);
  });

  it('analysis workers stopped mid-run are started again and the work completes', async () => {
    const page = app.page;
    const dep0 = (await coupleCells(page, 'cell-dep'))[0] as number;
    const input = page.getByTestId('resistance');
    await input.fill('400');
    await input.press('Enter');
    // Stop every worker while the files are being analysed again with the new Ru.
    await page.evaluate(() => (window as unknown as { halfwaveTestHooks: { crashAnalysisWorkers: () => void } }).halfwaveTestHooks.crashAnalysisWorkers());
    await page.waitForFunction((d) => Number(document.querySelector('[data-testid=cell-dep]')?.textContent) < Number(d) - 0.5, dep0, { timeout: 60_000 });
    await waitForAnalysis(page);
    // And a file read while the workers stop is read once more.
    await page.getByTestId('file-input').setInputFiles(await writeRun([['late_100mVs.csv', 0.1]]));
    await page.evaluate(() => (window as unknown as { halfwaveTestHooks: { crashAnalysisWorkers: () => void } }).halfwaveTestHooks.crashAnalysisWorkers());
    await waitForFiles(page, 3);
    expect(await page.locator('[data-testid=file-row][data-status=error]').count()).toBe(0);
  });

  it('the sign convention is undoable, and so is clearing the workspace', async () => {
    const page = app.page;
    await page.getByTestId('convention-polarographic').click();
    await page.getByTestId('undo').click();
    await page.waitForFunction(() => document.querySelector('[data-testid=convention-iupac]')?.getAttribute('aria-checked') === 'true');
    const names = await fileNames(page);
    await page.getByTestId('new-workspace').click();
    await page.waitForFunction(() => document.querySelectorAll('[data-testid=file-row]').length === 0);
    await page.getByTestId('undo').click();
    await page.waitForFunction((n) => document.querySelectorAll('[data-testid=file-row]').length === n, names.length);
    expect(await fileNames(page)).toEqual(names);
  });

  it('stayed free of console errors, page errors and outside requests', () => {
    expect(app.pageErrors).toEqual([]);
    expect(app.outsideRequests).toEqual([]);
  });
});

describe('a full storage', () => {
  it('says which files were not kept, and keeps working', async () => {
    const app = await openApp();
    try {
      const page = app.page;
      await waitForFiles(page, demoFileCount());
      const cdp = await page.context().newCDPSession(page);
      await cdp.send('Storage.overrideQuotaForOrigin', { origin: new URL(app.baseUrl).origin, quotaSize: 64 * 1024 });
      await page.getByTestId('file-input').setInputFiles(await writeRun([['full_100mVs.csv', 0.1]]));
      // The row keeps saying so (a notice may be replaced by a later one).
      const row = page.locator('[data-testid=file-row][data-file-name="full_100mVs.csv"]');
      await row.locator('[data-testid=not-kept]').waitFor({ timeout: 60_000 });
      expect(await row.getAttribute('data-status')).toBe('ready');
      expect(await page.locator('[data-testid=file-row][data-kept=no]').count()).toBeGreaterThanOrEqual(1);
    } finally {
      await app.close();
    }
  });
});

describe('sessions round-trip exactly', () => {
  it('save with data, open in a fresh page: the same files, series, windows, scale and numbers; opening replaces the workspace', async () => {
    const first = await openApp();
    const sessionPath = join(dir, 'session.json');
    let before: { names: string[]; eHalf: number[]; dep: number[] };
    try {
      const page = first.page;
      await waitForFiles(page, demoFileCount());
      await page.getByTestId('display-reference').selectOption('SCE');
      await waitForAnalysis(page);
      await page.getByTestId('add-cathodic-window').click();
      await waitForAnalysis(page);
      before = { names: await fileNames(page), eHalf: await coupleCells(page, 'cell-ehalf'), dep: await coupleCells(page, 'cell-dep') };
      const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('save-session-data').click()]);
      await writeFile(sessionPath, await readFile(await download.path()));
    } finally {
      await first.close();
    }
    const second = await openApp();
    try {
      const page = second.page;
      await waitForFiles(page, demoFileCount());
      await page.getByTestId('file-input').setInputFiles(await writeRun([['stray_100mVs.csv', 0.1]]));
      await waitForFiles(page, demoFileCount() + 1);
      await page.getByTestId('session-input').setInputFiles(sessionPath);
      await noticeMatching(page, /Session opened in place of the workspace/);
      await waitForFiles(page, demoFileCount());
      expect(await fileNames(page)).toEqual(before.names);
      expect(await page.getByTestId('display-reference').inputValue()).toBe('SCE');
      expect(await coupleCells(page, 'cell-ehalf')).toEqual(before.eHalf);
      expect(await coupleCells(page, 'cell-dep')).toEqual(before.dep);
      await page.getByTestId('undo').click();
      await page.waitForFunction(() => !!document.querySelector('[data-testid=file-row][data-file-name="stray_100mVs.csv"]'));
    } finally {
      await second.close();
    }
  });
});
