/**
 * The digest that stands in for a run request's text between the worker and the page
 * (runInput.ts runRequestDigest). What it must do is tell texts apart: checked on texts that
 * differ in one character, at every position, as run requests do when one setting changes.
 */
import { describe, expect, it } from 'vitest';
import { textDigest } from './textDigest';

describe('textDigest', () => {
  it('is the same for the same text, and carries its length', () => {
    const text = '{"run":{"method":{"smoothing":{"kind":"savitzky-golay","window":11}},"E½":"−0.2"}}';
    expect(textDigest(text)).toBe(textDigest(`${text}`));
    expect(textDigest(text)).toMatch(new RegExp(`^[0-9a-f]{16}:${text.length}$`));
    expect(textDigest('')).toMatch(/^[0-9a-f]{16}:0$/);
  });

  it('tells apart texts that differ in one character, wherever it is', () => {
    const base = JSON.stringify({ settings: { minSignalToNoise: 3, smoothingWindow: 11, temperatureC: 25, areaCm2: 0.0707 }, files: ['nernst_100mVs.csv'] });
    const seen = new Map<string, string>();
    let texts = 0;
    for (let i = 0; i < base.length; i++) {
      for (const c of ['0', '1', '9', 'a', 'z', '"', ' ', '½', '−']) {
        if (base[i] === c) continue;
        const text = base.slice(0, i) + c + base.slice(i + 1);
        const d = textDigest(text);
        expect(seen.get(d) ?? text).toBe(text);
        seen.set(d, text);
        texts++;
      }
    }
    expect(seen.size).toBe(texts);
    expect(seen.has(textDigest(base))).toBe(false);
  });

  it('tells apart numbers written a last digit apart, as settings change', () => {
    const digests = new Set<string>();
    for (let k = 0; k < 20000; k++) digests.add(textDigest(`{"noiseThreshold":${(3 + k * 1e-6).toFixed(6)},"window":11}`));
    expect(digests.size).toBe(20000);
  });

  it('changes with one more character at the end, and with two swapped', () => {
    expect(textDigest('abc')).not.toBe(textDigest('abcd'));
    expect(textDigest('abcd').slice(0, 16)).not.toBe(textDigest('abdc').slice(0, 16));
  });
});
