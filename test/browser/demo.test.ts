/**
 * Start-up flow: the bundled demo voltammograms are read and analysed in the worker, the trace
 * shows peaks and baselines, the couples table has numbers, the scan-rate series view fits the
 * demo series, and the polarographic switch flips the plot.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoFileCount, readPlot, simulatedCsv, waitForFiles, waitForRedraw, showView } from './appHelpers';
import { openApp, type OpenedApp } from './harness';

describe('demo data at start', () => {
  let app: OpenedApp;
  const count = demoFileCount();
  beforeAll(async () => {
    app = await openApp();
    await waitForFiles(app.page, count);
  });
  afterAll(async () => app?.close());

  it('lists every demo file as read, each with points and cycles', async () => {
    const rows = app.page.getByTestId('file-row');
    expect(count).toBeGreaterThan(0);
    expect(await rows.count()).toBe(count);
    expect(await app.page.locator('[data-testid=file-row][data-status=ready]').count()).toBe(count);
    expect(await rows.first().textContent()).toMatch(/[\d,]+ pts, \d+ cycles?/);
  });

  it('shows a couples table with finite potentials and currents for the selected file', async () => {
    const table = app.page.getByTestId('couples-table');
    const rows = table.getByTestId('couple-row');
    expect(await rows.count()).toBeGreaterThan(0);
    const epa = Number(await rows.first().getByTestId('cell-epa').textContent());
    const ipa = Number(await rows.first().getByTestId('cell-ipa').textContent());
    expect(Number.isFinite(epa)).toBe(true);
    expect(ipa).toBeGreaterThan(0);
    expect(await rows.first().getByTestId('verdict').textContent()).not.toBe('');
  });

  it('draws the trace with peak markers and the baselines as subtracted', async () => {
    const plot = await readPlot(app.page);
    const names = plot.traces.map((t) => t.name);
    expect(names[0]).toBe('cycle 1');
    expect(names).toContain('baseline (as subtracted)');
    const anodic = plot.traces.find((t) => t.name.startsWith('anodic peaks'));
    expect(anodic?.x.filter((v) => v !== null).length).toBeGreaterThan(0);
    expect(plot.xRange[0]).toBeLessThan(plot.xRange[1]);
    expect(plot.yTitle).toMatch(/^i \/ .A \(anodic up\)$/);
  });

  it('the polarographic switch flips the current sign and reverses the potential axis', async () => {
    const before = await readPlot(app.page);
    await app.page.getByTestId('convention-polarographic').click();
    await waitForRedraw(app.page, before.renders);
    const after = await readPlot(app.page);
    expect(after.xRange[0]).toBeGreaterThan(after.xRange[1]);
    expect(after.yTitle).toMatch(/cathodic up/);
    const y0 = before.traces[0]?.y ?? [];
    const y1 = after.traces[0]?.y ?? [];
    expect(y1.length).toBe(y0.length);
    for (let i = 0; i < y0.length; i += 97) expect(y1[i]).toBeCloseTo(-(y0[i] as number), 9);
    expect(after.traces[0]?.x).toEqual(before.traces[0]?.x);
    await app.page.getByTestId('convention-iupac').click();
  });

  it('fits a scan-rate series from the demo files', async () => {
    await showView(app.page, 'series');
    await app.page.getByTestId('series-table').waitFor({ timeout: 30_000 });
    expect(await app.page.getByTestId('series-table').textContent()).toMatch(/log\|ip\| vs log v slope\s*0\.\d{3}/);
    const plot = await readPlot(app.page, 'series-current-plot');
    expect(plot.traces.some((t) => t.name.includes('fit'))).toBe(true);
    await showView(app.page, 'trace');
  });

  it('opens the bench-safety note with the mercury and hydrogen cautions', async () => {
    await app.page.getByTestId('safety-open').click();
    const text = await app.page.getByTestId('safety-drawer').textContent();
    expect(text).toMatch(/mercury/i);
    expect(text).toMatch(/hydrogen/i);
    expect(text).toMatch(/safety officer/);
    await app.page.keyboard.press('Escape');
    await app.page.getByTestId('safety-drawer').waitFor({ state: 'detached', timeout: 10_000 });
  });

  it('stayed free of console errors, page errors and outside requests', () => {
    expect(app.consoleErrors).toEqual([]);
    expect(app.pageErrors).toEqual([]);
    expect(app.outsideRequests).toEqual([]);
  });
});

describe('a demo file that cannot be loaded', () => {
  for (const [what, answer] of [
    ['is missing on the server', { status: 404, body: 'not here' }],
    ['is damaged (cut short)', { status: 200, body: '{"files":[{"name":"cut.csv","bytes":4000}]}\nE,I\n0.1,' }],
  ] as const) {
    it(`${what}: the page says so, starts empty and still reads the user's own files`, async () => {
      const app = await openApp('', undefined, undefined, async (context) => {
        await context.route('**/demo-voltammograms-*.bin', (route) => route.fulfill({ ...answer, contentType: 'application/octet-stream' }));
      });
      try {
        await app.page.waitForFunction(() => /demo voltammograms could not be loaded/.test(document.querySelector('[data-testid=notice]')?.textContent ?? ''), null, { timeout: 60_000 });
        expect(await app.page.getByTestId('file-row').count()).toBe(0);
        await app.page.getByTestId('file-input').setInputFiles([{ name: 'own_100mVs.csv', mimeType: 'text/csv', buffer: Buffer.from(simulatedCsv(0.1)) }]);
        await waitForFiles(app.page, 1);
        expect(app.pageErrors).toEqual([]);
      } finally {
        await app.close();
      }
    });
  }
});
