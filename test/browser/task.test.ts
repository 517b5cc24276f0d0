/**
 * Task time: a new user picks a folder of six exports and reads D with its 95 % interval. The
 * spec counts the user's actions from page load, with the default settings (demo data loaded,
 * nothing changed): a click on "Folder…" and the choice in the file dialog, then D is on screen.
 * At most five are allowed. The six exports come from our simulator (folderFixture.ts) with
 * D = 1e-5 cm²/s, A = 0.0707 cm², C = 1 mM: the app's default area and concentration.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoFileCount, waitForFiles } from './appHelpers';
import { sixExportFolder } from './folderFixture';
import { openApp, type OpenedApp } from './harness';

const SUPERSCRIPT: Record<string, string> = { '⁻': '-', '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9' };
const shown = (t: string) => {
  const m = /(-?[\d.]+)\s*×\s*10([⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+)/.exec(t);
  return m ? Number(m[1]) * 10 ** Number([...(m[2] as string)].map((c) => SUPERSCRIPT[c]).join('')) : Number.NaN;
};

describe('a new user reads D of a folder of exports', () => {
  let app: OpenedApp;
  let folder: Awaited<ReturnType<typeof sixExportFolder>>;
  let actions = 0;
  beforeAll(async () => {
    folder = await sixExportFolder('my series');
    app = await openApp();
  });
  afterAll(async () => {
    await app?.close();
    await folder?.remove();
  });

  it('takes at most five actions from page load to D with its 95 % interval on screen', async () => {
    const page = app.page;
    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByRole('button', { name: 'Folder…' }).click()]);
    actions++;
    await chooser.setFiles(folder.dir);
    actions++;
    await waitForFiles(page, demoFileCount() + 6);
    const d = page.getByTestId('series-headline').getByTestId('headline-d');
    await d.waitFor({ timeout: 60_000 });
    const text = (await d.textContent()) ?? '';
    expect(actions).toBeLessThanOrEqual(5);
    // Randles–Ševčík with the simulator's D = 1e-5 cm²/s (Bard & Faulkner, Electrochemical
    // Methods, 2nd ed. (2001), §6.2): within 5 %, and the interval brackets the value.
    const interval = /\(95 % interval ([^)]+)\)/.exec(text)?.[1] ?? '';
    const value = shown(text.split('D: ')[1] ?? '');
    expect(Math.abs(value / 1e-5 - 1)).toBeLessThan(0.05);
    // The interval is printed with the digits that tell its ends apart (JCGM 100:2008 §7.2.6), or,
    // when five digits cannot (noise-free simulated data), as its relative half-width.
    const ends = interval.split(' to ');
    if (ends.length === 2) {
      const [low, high] = ends.map(shown) as [number, number];
      expect(low).toBeLessThanOrEqual(value);
      expect(high).toBeGreaterThanOrEqual(value);
      expect(ends[0]).not.toBe(ends[1]);
    } else {
      expect(interval).toMatch(/^(±[\d.]+ %|within ±0\.0001 %)$/);
    }
    expect(text).toMatch(/95 % interval/);
    expect(await page.getByTestId('series-headline').textContent()).toContain('Couple 1');
  });

  it('stayed free of console errors, page errors and outside requests', () => {
    expect(app.consoleErrors).toEqual([]);
    expect(app.pageErrors).toEqual([]);
    expect(app.outsideRequests).toEqual([]);
  });
});
