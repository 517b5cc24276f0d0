/**
 * The built page carries its Content-Security-Policy (scripts/contentSecurityPolicy.ts; W3C CSP
 * Level 3) and works under it: the demo is read in the workers, Plotly draws the trace and the
 * series plots and saves an SVG, and the page reports no violation. Probes show the policy is
 * enforced: an inline script, eval and new Function are refused.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoFileCount, readPlot, waitForFiles, showView } from './appHelpers';
import { openApp, type OpenedApp } from './harness';

function directives(policy: string): Map<string, string[]> {
  return new Map(policy.split(';').map((d) => d.trim().split(/\s+/)).filter((p) => p[0]).map((p) => [p[0] as string, p.slice(1)]));
}

describe('Content-Security-Policy of the built page', () => {
  let app: OpenedApp;
  beforeAll(async () => {
    app = await openApp();
    await waitForFiles(app.page, demoFileCount());
  });
  afterAll(async () => app?.close());

  it('is set in index.html: everything from the page itself, no inline script, no eval', async () => {
    const policy = await app.page.locator('meta[http-equiv="Content-Security-Policy"]').getAttribute('content');
    const d = directives(policy ?? '');
    expect(d.get('default-src')).toEqual(["'self'"]);
    expect(d.get('script-src')).toEqual(["'self'"]);
    expect(d.get('connect-src')).toEqual(["'self'"]);
    expect(d.get('worker-src')).toEqual(["'self'"]);
    expect(d.get('object-src')).toEqual(["'none'"]);
    expect(policy).not.toMatch(/unsafe-eval|unsafe-inline|\*/);
    // blob: and data: only for images (the figure export draws through them), never for scripts, workers or connections.
    expect(d.get('img-src')).toEqual(["'self'", 'blob:', 'data:']);
    // The policy must come before the first script or stylesheet of the page to govern it.
    const order = await app.page.evaluate(() => Array.from(document.head.children).map((e) => e.tagName + (e.getAttribute('http-equiv') ?? '')));
    expect(order.indexOf('METAContent-Security-Policy')).toBeLessThan(order.indexOf('SCRIPT'));
  });

  it('the app works under it: workers read the demo, Plotly draws the trace and series plots and saves an SVG through the figure export', async () => {
    expect((await readPlot(app.page)).traces.length).toBeGreaterThan(0);
    await showView(app.page, 'series');
    await app.page.getByTestId('series-table').waitFor({ timeout: 30_000 });
    expect((await readPlot(app.page, 'series-current-plot')).traces.length).toBeGreaterThan(0);
    await showView(app.page, 'trace');
    const plot = app.page.getByTestId('trace-plot');
    await plot.hover();
    const [download] = await Promise.all([app.page.waitForEvent('download', { timeout: 60_000 }), app.page.getByTestId('trace-svg').click()]);
    expect(download.suggestedFilename()).toMatch(/\.svg$/);
    // Plotly's own stylesheet is in place (filled through CSSOM into the empty <style> the policy allows).
    expect(await app.page.evaluate(() => getComputedStyle(document.querySelector('.modebar') as Element).position)).toBe('absolute');
  });

  it('no violation was reported, no console error, no page error', () => {
    expect(app.cspViolations).toEqual([]);
    expect(app.consoleErrors).toEqual([]);
    expect(app.pageErrors).toEqual([]);
  });

  it('is enforced: an inline script does not run, eval and new Function are refused, each reported', async () => {
    const result = await app.page.evaluate(async () => {
      const seen = new Promise<string>((resolve) => document.addEventListener('securitypolicyviolation', (e) => resolve(e.effectiveDirective), { once: true }));
      const s = document.createElement('script');
      s.textContent = 'window.__inlineRan = true';
      document.body.appendChild(s);
      const directive = await seen;
      const refused = (f: () => unknown) => {
        try {
          f();
          return 'ran';
        } catch (err) {
          return (err as Error).name;
        }
      };
      return {
        inline: (window as unknown as { __inlineRan?: boolean }).__inlineRan ?? false,
        directive,
        evalResult: refused(() => (0, eval)('1 + 1')),
        functionResult: refused(() => new Function('return 1')()),
      };
    });
    expect(result).toEqual({ inline: false, directive: 'script-src-elem', evalResult: 'EvalError', functionResult: 'EvalError' });
    // Violation reports arrive as events after the refusals; wait for all three.
    await expect.poll(() => app.cspViolations.length).toBeGreaterThanOrEqual(3);
    expect(app.cspViolations.join('\n')).toMatch(/script-src/);
    app.cspViolations.length = 0;
    app.consoleErrors.length = 0;
  });
});
