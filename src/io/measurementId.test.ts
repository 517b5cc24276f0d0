/**
 * The file id's hash against the FNV-1a 32-bit test vectors (Fowler, Noll, Vo, IETF draft
 * "The FNV Non-Cryptographic Hash Algorithm", test vectors for FNV-1a 32; values from memory).
 */
import { describe, expect, it } from 'vitest';
import { fnv1a, measurementId } from './measurementId';

const OFFSET_BASIS = 0x811c9dc5;

describe('FNV-1a 32', () => {
  it.each([
    ['', 0x811c9dc5],
    ['a', 0xe40c292c],
    ['foobar', 0xbf9cf968],
  ])('of %j is %i', (s, want) => {
    expect(fnv1a(OFFSET_BASIS, s, 1) >>> 0).toBe(want);
  });
});

describe('measurementId', () => {
  it('is the hash of the name, the length and the text, with the name made safe for an id', () => {
    const h = fnv1a(fnv1a(fnv1a(OFFSET_BASIS, 'run 1/cv a.csv', 1), '3', 1), '1,2', 1) >>> 0;
    expect(measurementId('run 1/cv a.csv', '1,2')).toBe(`${h.toString(16).padStart(8, '0')}-cv_a.csv`);
  });
  it('tells two files of the same name and length apart by their text', () => {
    expect(measurementId('a.csv', '0,1\n')).not.toBe(measurementId('a.csv', '0,2\n'));
  });
});
