import { chromium } from 'playwright-core';
import { spawn } from 'node:child_process';
const port = 4990 + Math.floor(Math.random() * 9);
const srv = spawn('npx', ['vite', 'preview', '--port', String(port), '--strictPort', '--host', '127.0.0.1'], { cwd: '/work/main', stdio: 'ignore' });
await new Promise((r) => setTimeout(r, 2500));
const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'] });
const page = await browser.newPage({ viewport: { width: 1440, height: 900 } });
page.on('pageerror', (e) => console.log('pageerror', e.message));
page.on('console', (m) => m.type() === 'error' && console.log('console', m.text()));
await page.goto(`http://127.0.0.1:${port}/`);
await page.waitForSelector('[data-testid=couples-table]', { timeout: 60000 });
await page.waitForTimeout(3000);
const actions = process.argv.slice(3);
for (const a of actions) { const [kind, arg] = a.split(':'); if (kind === 'click') await page.click(arg); if (kind === 'wait') await page.waitForTimeout(Number(arg)); }
await page.screenshot({ path: process.argv[2], fullPage: false });
await browser.close(); srv.kill();
