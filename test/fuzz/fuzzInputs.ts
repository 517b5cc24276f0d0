/**
 * The fuzz suite's inputs, by family: random bytes, random table text, mutated real layouts,
 * enormous or empty fields, deep quoting, NUL bytes, mixed encodings, very wide tables (up to
 * 10⁶ columns), random import overrides and hostile shapes. Each is rebuilt from (family, index)
 * with the seeded Rng, so a failure names an input anyone can regenerate.
 */
import { EXPORT_FIXTURES, exportFixtureBytes } from '../fixtures/exportLayouts';
import { encodeLatin1, encodeUtf16, encodeUtf8, makeSyntheticCv, withNoise } from '../fixtures/layoutWriter';
import type { ImportOverrides } from '../../src/io/types';
import { concatBytes, Rng } from './fuzzRandom';
import { mutate } from './fuzzMutations';

export interface FuzzInput {
  name: string;
  data: Uint8Array | string;
  overrides?: ImportOverrides;
}

/** Small versions of the real layouts (about 160 rows), the seeds of the mutation families. */
const SMALL = withNoise(makeSyntheticCv({ cycles: 2, stepV: 0.02, scanRateVPerS: 0.1 }), 5, 0.01);
export const BASES: { name: string; bytes: Uint8Array }[] = EXPORT_FIXTURES.map((f) => ({ name: f.name, bytes: exportFixtureBytes({ ...f, cv: SMALL }) }));

const TOKENS = ['0', '1', '5', '9', '.', ',', ';', '\t', ' ', '\n', '\r\n', '\r', '-', '+', 'e', 'E', 'V', 'A', 'µ', '\u03bc', 'Âµ', '"', '""', 'NaN', 'Inf', '(mV)', '(µA)', 'E (V)', 'I (A)',
  'vs', 'RHE', 'j', 'mA cm-2', 'Scan rate: ', 'mV/s', '\ufeff', '\u00a0', '#', '0x1F', '1e400', '-0', 'Zeit', 'Prąd', '\u2028'];
/** Rare tokens: one NUL or lone surrogate makes most inputs binary, so they come seldom. */
const RARE = ['\u0000', '\ud800', '\udfff', '\u0007'];

const text = (r: Rng, tokens: number) => Array.from({ length: tokens }, () => (r.chance(0.002) ? r.pick(RARE) : r.pick(TOKENS))).join('');

function isLatin1(t: string): boolean {
  for (let i = 0; i < t.length; i++) if (t.charCodeAt(i) > 0xff) return false;
  return true;
}

function encodeAny(r: Rng, t: string): Uint8Array | string {
  const how = r.int(0, 4);
  if (how === 0) return t;
  if (how === 1 && isLatin1(t)) return encodeLatin1(t);
  if (how === 2) return encodeUtf16(t, r.chance(0.5));
  return encodeUtf8(t, how === 3);
}

/** Rows of fields, mostly numbers, some tokens: text that nearly reads as a table. */
function tableish(r: Rng): string {
  const d = r.pick([',', ';', '\t', ' ', '  ']);
  const k = r.int(1, 6);
  const field = () => (r.chance(0.8) ? String(r.pick([r.int(-9, 9), r.next() * 2 - 1, (r.next() - 0.5) * 1e-6, r.next() * 1e6])).replace('.', r.chance(0.2) ? ',' : '.') : text(r, r.int(0, 3)));
  return Array.from({ length: r.int(1, 60) }, () => Array.from({ length: r.chance(0.9) ? k : r.int(0, 8) }, field).join(d)).join(r.pick(['\n', '\r\n', '\r']));
}

function smallTable(r: Rng, rows: number, k: number, d: string): string[] {
  return Array.from({ length: rows }, (_, i) => Array.from({ length: k }, (_, j) => (j === 0 ? ((i % 40) - 20) * 0.01 : Math.sin(i + j) * 1e-6).toPrecision(r.int(2, 12))).join(d));
}

type Builder = (r: Rng, index: number) => FuzzInput;

const FAMILIES: Record<string, { count: number; build: Builder }> = {
  randomBytes: { count: 4000, build: (r) => ({ name: 'random.bin', data: r.chance(0.1) ? r.bytes(r.int(0, 8)) : r.bytes(r.int(0, 4096)) }) },
  tableText: { count: 5000, build: (r) => ({ name: r.pick(['t.csv', 't_50mVs-1.txt', 'v=0.1Vs.dat']), data: encodeAny(r, r.chance(0.5) ? text(r, r.int(0, 600)) : tableish(r)) }) },
  mutatedLayouts: { count: 4000, build: (r) => {
    const base = r.pick(BASES);
    return { name: base.name, data: mutate(r, base.bytes) };
  } },
  hugeFields: { count: 500, build: (r) => {
    const lines = ['E (V),I (A)', ...smallTable(r, 30, 2, ',')];
    const n = r.chance(0.05) ? 400_000 : r.pick([0, 1, 100, 10_000, 100_000]);
    const fill = r.pick(['1', ' ', 'a', ',', '"', '""', '-', '1.5,', '\t', 'µ']).repeat(Math.ceil(n / 2)).slice(0, n);
    lines.splice(r.int(0, lines.length), 0, r.chance(0.5) ? fill : `${fill},${fill}`);
    return { name: 'huge.csv', data: lines.join('\n') };
  } },
  quoting: { count: 2000, build: (r) => {
    const rows = smallTable(r, r.int(3, 60), r.int(2, 4), ',').map((row) => row.split(',').map((f) => {
      const q = '"'.repeat(r.int(0, 6));
      return r.chance(0.3) ? `${q}${f}${r.chance(0.2) ? '\n' : ''}${'"'.repeat(r.int(0, 6))}` : f;
    }).join(','));
    return { name: 'quoted.csv', data: ['"E (V)","I (A)"', ...rows].join(r.pick(['\n', '\r\n'])) };
  } },
  nulBytes: { count: 1000, build: (r) => {
    const base = r.pick(BASES).bytes.slice();
    const n = r.pick([1, 2, 10, 1000]);
    for (let i = 0; i < n; i++) base[r.int(0, base.length - 1)] = 0;
    return { name: 'nul.txt', data: r.chance(0.2) ? base.filter((_, i) => i % 2 === 0 || r.chance(0.5)).map((b, i) => (i % 2 ? 0 : b)) : base };
  } },
  mixedEncodings: { count: 1500, build: (r) => {
    const parts = Array.from({ length: r.int(2, 6) }, () => {
      const t = `${text(r, r.int(0, 40))}\n${smallTable(r, r.int(1, 20), 2, r.pick([',', ';', '\t'])).join('\n')}\n`;
      const kind = r.int(0, 5);
      if (kind === 0) return encodeLatin1(Array.from(t, (ch) => (isLatin1(ch) ? ch : '?')).join(''));
      if (kind === 1) return encodeUtf16(t, r.chance(0.5));
      if (kind === 2) return Uint8Array.from([0xc0, 0xaf, 0xed, 0xa0, 0x80, 0xff, 0xfe, 0xef, 0xbb, 0xbf]);
      return encodeUtf8(t, kind === 3);
    });
    return { name: 'mixed.txt', data: concatBytes(parts) };
  } },
  wideTables: { count: 300, build: (r, i) => wideTable(r, i) },
  overrides: { count: 1500, build: (r) => ({ name: r.pick(BASES).name, data: r.pick(BASES).bytes, overrides: randomOverrides(r) }) },
  hostileShapes: { count: 60, build: (r) => hostileShape(r) },
};

function wideTable(r: Rng, i: number): FuzzInput {
  // The first eight are 10⁶ columns: empty fields, numbers, tabs, and a header over them.
  if (i < 8) {
    const unit = [',', '1,', '1\t', '1;', ' 1', ',"', '1.0,', 'x,'][i] as string;
    const wide = unit.repeat(1_000_000);
    return { name: 'million_columns.csv', data: i === 7 ? `${wide}\n${'1,'.repeat(1_000_000)}` : wide };
  }
  const k = r.pick([3, 50, 999, 1000, 1001, 2000, 100_000]);
  const rows = r.int(1, Math.max(1, Math.floor(20_000 / k)));
  return { name: 'wide.csv', data: smallTable(r, rows, k, r.pick([',', ';', '\t', ' '])).join('\n') };
}

function randomOverrides(r: Rng): ImportOverrides {
  const o: ImportOverrides = {};
  const odd = [-2, -1, 0, 1, 2, 3, 7, 50, 1.5, NaN, Infinity];
  if (r.chance(0.3)) o.delimiter = r.pick([',', ';', '\t', 'whitespace'] as const);
  if (r.chance(0.3)) o.decimalMark = r.pick(['.', ','] as const);
  if (r.chance(0.3)) o.headerLine = r.pick(odd);
  if (r.chance(0.3)) o.potentialColumn = r.pick(odd);
  if (r.chance(0.3)) o.currentColumn = r.pick(odd);
  if (r.chance(0.2)) o.timeColumn = r.pick(odd);
  if (r.chance(0.2)) o.cycleColumn = r.pick(odd);
  if (r.chance(0.2)) o.potentialUnit = r.pick(['V', 'mV', 'µV'] as const);
  if (r.chance(0.2)) o.currentUnit = r.pick(['A', 'mA', 'µA', 'nA', 'pA'] as const);
  if (r.chance(0.2)) o.scanRateVPerS = r.pick([0.1, -1, 0, NaN, Infinity, 1e-300]);
  if (r.chance(0.2)) o.encoding = r.pick(['utf-8', 'utf-16le', 'utf-16be', 'latin1'] as const);
  if (r.chance(0.2)) o.currentConvention = r.pick(['iupac', 'polarographic'] as const);
  return o;
}

/** The shapes that once took minutes: one long line, a vertex at every point, endless blank lines. */
function hostileShape(r: Rng): FuzzInput {
  const n = r.chance(0.1) ? 1_000_000 : r.pick([100_000, 400_000]);
  const shapes: (() => string)[] = [
    () => '1.0,'.repeat(n / 4),
    () => Array.from({ length: n / 8 }, (_, i) => `${i % 2},${i % 3}`).join('\n'),
    () => `1,2\n${'\n'.repeat(n)}`,
    () => `${'"'.repeat(n / 2)},1\n${'1,2\n'.repeat(n / 8)}`,
    () => `${'# Scan rate: 100 mV/s\n'.repeat(n / 22)}1,2\n2,3\n3,4\n`,
    () => `Scan rate: ${'1'.repeat(n)}\n1,2\n2,3\n3,4\n`,
    () => `${Array.from({ length: 600 }, () => '1,'.repeat(400)).join('\n')}\n${'1,2\n'.repeat(n / 4)}`,
    () => Array.from({ length: n / 12 }, (_, i) => `${(i % 7) * 0.1},${Math.sin(i)}`).join('\n'),
  ];
  return { name: 'shape.csv', data: r.pick(shapes)() };
}

export const FAMILY_NAMES = Object.keys(FAMILIES);

export function familySize(family: string): number {
  return FAMILIES[family]?.count ?? 0;
}

export function buildInput(family: string, index: number): FuzzInput {
  const f = FAMILIES[family];
  if (!f) throw new Error(`unknown fuzz family ${family}`);
  return f.build(new Rng(family, index), index);
}
