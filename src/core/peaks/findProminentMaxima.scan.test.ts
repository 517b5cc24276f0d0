import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { findProminentMaxima } from './findProminentMaxima';

/** The direct definition: walk out from each maximum until a higher point (the former code). */
function byScanning(y: number[], start: number, end: number): { index: number; prominence: number; leftBase: number; rightBase: number }[] {
  const out = [];
  for (let k = start + 1; k < end - 1; k++) {
    const v = y[k]!;
    if (!(v > y[k - 1]!)) continue;
    let r = k + 1;
    while (r < end - 1 && y[r] === v) r++;
    if (!(v > y[r]!)) continue;
    let left = k;
    for (let j = k - 1; j >= start && !(y[j]! > v); j--) if (y[j]! < y[left]!) left = j;
    let right = r;
    for (let j = r; j < end && !(y[j]! > v); j++) if (y[j]! < y[right]!) right = j;
    const prominence = v - Math.max(y[left]!, y[right]!);
    if (prominence > 0) out.push({ index: k, prominence, leftBase: left, rightBase: right });
  }
  return out;
}

describe('findProminentMaxima (stack) against the definition by scanning', () => {
  // Small integers make flat tops and equal lows common, which is where the tie rules matter.
  it('same maxima, prominences and bases on seeded random sequences with ties', () => {
    fc.assert(fc.property(fc.array(fc.integer({ min: 0, max: 6 }), { minLength: 3, maxLength: 80 }), fc.nat(5), fc.nat(5), (y, a, b) => {
      const start = Math.min(a, y.length - 3);
      const end = Math.max(start + 3, y.length - b);
      expect(findProminentMaxima(y, { start, end })).toEqual(byScanning(y, start, end));
    }), { seed: 42, numRuns: 2000 });
  });
});
