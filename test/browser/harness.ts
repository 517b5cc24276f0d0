/**
 * Opens the built app in Debian's headless Chromium through playwright-core and records what a
 * spec must assert on: console errors, uncaught page errors, Content-Security-Policy violations,
 * and any request to a host other than this machine (such requests are also blocked, so a leak
 * fails loudly instead of hanging).
 */
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { inject } from 'vitest';

export const CHROMIUM = process.env.HALFWAVE_CHROMIUM ?? '/usr/bin/chromium';
const FLAGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export interface OpenedApp {
  page: Page;
  browser: Browser;
  baseUrl: string;
  consoleErrors: string[];
  pageErrors: string[];
  outsideRequests: string[];
  /** Content-Security-Policy violations the page reported (directive, blocked URI, source), from the first byte on. */
  cspViolations: string[];
  close: () => Promise<void>;
}

let announced = false;

/** True for URLs served by this machine (or in-page data/blob URLs). */
export function isLocalUrl(url: string): boolean {
  if (url.startsWith('data:') || url.startsWith('blob:') || url === 'about:blank') return true;
  try {
    const host = new URL(url).hostname;
    return host === '127.0.0.1' || host === 'localhost' || host === '[::1]' || host === '::1';
  } catch {
    return false;
  }
}

/** `prepare`: called before the page loads (to answer some of its requests differently, say). */
export async function openApp(path = '', viewport = { width: 1366, height: 768 }, colorScheme: 'light' | 'dark' = 'light', prepare?: (context: BrowserContext) => Promise<void>): Promise<OpenedApp> {
  const baseUrl = inject('baseUrl');
  const browser = await chromium.launch({ executablePath: CHROMIUM, headless: true, args: FLAGS });
  if (!announced) {
    console.log(`[browser] running in Chromium ${browser.version()} (${CHROMIUM}, headless) against ${baseUrl}`);
    announced = true;
  }
  const context = await browser.newContext({ viewport, acceptDownloads: true, colorScheme });
  const page = await context.newPage();
  const consoleErrors: string[] = [];
  const pageErrors: string[] = [];
  const outsideRequests: string[] = [];
  page.on('console', (msg) => {
    if (msg.type() === 'error') consoleErrors.push(msg.text());
  });
  page.on('pageerror', (err) => pageErrors.push(err.message));
  // The listener is installed through the DevTools protocol, which the page's own policy does not govern.
  const cspViolations: string[] = [];
  await page.exposeBinding('__halfwaveCspViolation', (_source, text: string) => cspViolations.push(text));
  await page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (e) => {
      (window as unknown as { __halfwaveCspViolation: (t: string) => void }).__halfwaveCspViolation(`${e.effectiveDirective} blocked ${e.blockedURI || 'inline'} at ${e.sourceFile}:${e.lineNumber}`);
    });
  });
  await context.route('**/*', async (route) => {
    const url = route.request().url();
    if (isLocalUrl(url)) return route.continue();
    outsideRequests.push(url);
    return route.abort('blockedbyclient');
  });
  await prepare?.(context);
  await page.goto(new URL(path, baseUrl).toString(), { waitUntil: 'load' });
  return {
    page,
    browser,
    baseUrl,
    consoleErrors,
    pageErrors,
    outsideRequests,
    cspViolations,
    close: () => browser.close(),
  };
}
