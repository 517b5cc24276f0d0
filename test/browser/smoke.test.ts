/**
 * First browser check: the production build loads in headless Chromium with no console error,
 * no uncaught page error, and no request to any host other than this machine.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { isLocalUrl, openApp, type OpenedApp } from './harness';

describe('app loads cleanly in Chromium', () => {
  let app: OpenedApp;
  beforeAll(async () => {
    app = await openApp();
    // Let the worker, lazy chunks and demo data settle.
    await app.page.waitForLoadState('networkidle');
  });
  afterAll(async () => app?.close());

  it('the page is titled Halfwave', async () => {
    expect(await app.page.title()).toBe('Halfwave');
  });

  it('logs no console error and throws no page error', () => {
    expect(app.consoleErrors).toEqual([]);
    expect(app.pageErrors).toEqual([]);
  });

  it('requests nothing from any host other than localhost', () => {
    expect(app.outsideRequests).toEqual([]);
  });

  it('the request guard itself tells local from outside hosts', async () => {
    expect(isLocalUrl('http://127.0.0.1:4173/assets/a.js')).toBe(true);
    expect(isLocalUrl('https://example.org/x.js')).toBe(false);
    // A page without the app's CSP that reaches for an outside host is caught by the guard.
    const probe = await app.page.context().newPage();
    await probe.setContent('<img src="https://example.org/pixel.png">');
    // Wait for the guard to see the request (an event, not a fixed sleep).
    await expect.poll(() => app.outsideRequests, { timeout: 20_000 }).toContain('https://example.org/pixel.png');
    await probe.close();
    app.outsideRequests.length = 0;
  });
});
