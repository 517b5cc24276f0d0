/**
 * README screenshots (docs/screenshots/), taken with the same headless Chromium as the browser
 * tests, against the production build: `npm run build && npm run screenshots`. The demo data is
 * our own simulation.
 */
import { chromium } from 'playwright-core';
import { preview } from 'vite';
const server = await preview({ preview: { host: '127.0.0.1', port: 0, open: false }, logLevel: 'warn' });
const port = (server.httpServer.address() as { port: number }).port;
const browser = await chromium.launch({ executablePath: process.env.HALFWAVE_CHROMIUM ?? '/usr/bin/chromium', headless: true, args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'] });
for (const scheme of ['light', 'dark'] as const) {
  const page = await (await browser.newContext({ viewport: { width: 1440, height: 900 }, colorScheme: scheme })).newPage();
  await page.goto(`http://127.0.0.1:${port}/`);
  await page.waitForFunction(() => document.querySelectorAll('[data-testid=file-row][data-status=ready]').length >= 26 && !document.querySelector('[data-analysis=running]'), null, { timeout: 300000, polling: 200 });
  await page.getByTestId('notice').getByRole('button').click();
  await page.locator('[data-testid=file-row][data-file-name="probe_RuHex_100mVs.csv"]').click();
  await page.getByTestId('window-material').selectOption('glassy-carbon');
  await page.getByTestId('tab-files').click();
  await page.getByTestId('series-headline').getByTestId('explain-D').waitFor();
  await page.waitForTimeout(800);
  if (scheme === 'dark') {
    await page.screenshot({ path: 'docs/screenshots/trace-dark.png' });
    continue;
  }
  await page.getByTestId('series-headline').getByTestId('explain-D').focus();
  await page.waitForTimeout(300);
  await page.screenshot({ path: 'docs/screenshots/trace.png' });
  await page.getByTestId('view-series').click();
  await page.getByTestId('overlay-scaling').selectOption('diffusion');
  await page.waitForTimeout(2000);
  await page.screenshot({ path: 'docs/screenshots/series.png' });
  await page.getByTestId('view-report').click();
  await page.waitForFunction(() => document.querySelectorAll('.report-figures img').length === 3, null, { timeout: 60000 });
  await page.waitForTimeout(500);
  await page.screenshot({ path: 'docs/screenshots/report.png' });
  await page.getByTestId('view-fit').click();
  await page.getByTestId('fit-group').selectOption('quasi FcAmide');
  await page.getByTestId('fit-run').click();
  await page.getByTestId('fit-results').waitFor({ timeout: 300000 });
  await page.waitForTimeout(800);
  await page.screenshot({ path: 'docs/screenshots/fit.png' });
}
await browser.close();
server.httpServer.close();
