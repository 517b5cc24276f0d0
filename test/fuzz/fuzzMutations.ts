/**
 * Mutations of a real layout's bytes for the fuzz suite: byte flips, cut and repeated spans,
 * truncation, lines duplicated or swapped, delimiters swapped, quotes, NULs and byte-order marks
 * dropped in. One to thirty per input, chosen by the seeded Rng.
 */
import { concatBytes } from './fuzzRandom';
import type { Rng } from './fuzzRandom';

type Mutation = (r: Rng, b: Uint8Array) => Uint8Array;

const at = (r: Rng, b: Uint8Array) => r.int(0, Math.max(0, b.length - 1));

const MUTATIONS: Mutation[] = [
  (r, b) => {
    const c = b.slice();
    if (c.length) c[at(r, c)] = r.int(0, 255);
    return c;
  },
  (r, b) => {
    const p = at(r, b);
    return concatBytes([b.subarray(0, p), b.subarray(Math.min(b.length, p + r.int(1, 400)))]);
  },
  (r, b) => {
    const p = at(r, b);
    return concatBytes([b.subarray(0, p), new Uint8Array(r.int(1, 300)).fill(r.pick([0x22, 0x2c, 0x3b, 0x09, 0x0a, 0x0d, 0x20, 0x31, 0x00, 0xb5, 0xc2])), b.subarray(p)]);
  },
  (r, b) => b.subarray(0, at(r, b)),
  (r, b) => {
    const p = at(r, b);
    const len = r.int(1, 2000);
    const span = b.subarray(p, Math.min(b.length, p + len));
    return concatBytes([b.subarray(0, p), span, span, b.subarray(p)]);
  },
  (r, b) => swapLines(r, b),
  (r, b) => {
    const [from, to] = r.pick([[0x2c, 0x3b], [0x3b, 0x2c], [0x09, 0x20], [0x2e, 0x2c], [0x2c, 0x2e], [0x0a, 0x0d]] as const);
    return b.map((x) => (x === from && r.chance(0.9) ? to : x));
  },
  (r, b) => {
    const p = at(r, b);
    return concatBytes([b.subarray(0, p), r.pick([Uint8Array.of(0xef, 0xbb, 0xbf), Uint8Array.of(0xff, 0xfe), Uint8Array.of(0x22), Uint8Array.of(0x00), Uint8Array.of(0xc3, 0x28)]), b.subarray(p)]);
  },
];

function swapLines(r: Rng, b: Uint8Array): Uint8Array {
  const lines: Uint8Array[] = [];
  let start = 0;
  for (let i = 0; i <= b.length; i++) {
    if (i === b.length || b[i] === 0x0a) {
      lines.push(b.subarray(start, Math.min(b.length, i + 1)));
      start = i + 1;
    }
  }
  if (lines.length < 2) return b;
  const i = r.int(0, lines.length - 1);
  const j = r.int(0, lines.length - 1);
  [lines[i], lines[j]] = [lines[j] as Uint8Array, lines[i] as Uint8Array];
  return concatBytes(lines);
}

export function mutate(r: Rng, base: Uint8Array): Uint8Array {
  let b = base;
  const n = r.int(1, 30);
  for (let k = 0; k < n; k++) b = r.pick(MUTATIONS)(r, b);
  return b;
}
