/**
 * Property tests (fast-check, seeded): (1) a generated voltammogram written in a random valid
 * layout reads back the same numbers in SI units, within 1e-10 of each column's largest
 * magnitude (12 significant digits are written; IEEE 754 doubles carry ~15.9); (2) random or
 * mutated bytes end either in a result or in a typed ImportError — never another exception,
 * never a hang (every run is bounded by the test timeout).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { encodeUtf16, encodeUtf8, makeSyntheticCv, writeLayout } from '../../test/fixtures/layoutWriter';
import type { Column, Layout } from '../../test/fixtures/layoutWriter';
import { ImportError } from './errors';
import { importVoltammogram } from './importVoltammogram';

const SEED = 20260301;
const REL = 1e-10;

const POTENTIAL_UNITS = [['V', 1], ['mV', 1e3]] as const;
const CURRENT_UNITS = [['A', 1], ['mA', 1e3], ['µA', 1e6], ['nA', 1e9]] as const;
const PREAMBLE = ['Operator: R. Example', 'Sample: invented redox couple', 'Electrode = Pt disc', 'Date: 2026-02-01 09:30', 'Comment: second try after polishing', '# exported by our lab script'];

const layoutArb = fc.record({
  delimiter: fc.constantFrom<Layout['delimiter']>(',', ';', '\t', 'spaces'),
  decimalComma: fc.boolean(),
  header: fc.boolean(),
  order: fc.constantFrom<Column[]>(['potential', 'current'], ['current', 'potential'], ['time', 'potential', 'current'], ['cycle', 'time', 'current', 'potential'], ['index', 'potential', 'current', 'charge']),
  pUnit: fc.constantFrom(...POTENTIAL_UNITS),
  cUnit: fc.constantFrom(...CURRENT_UNITS),
  exponent: fc.boolean(),
  preamble: fc.subarray(PREAMBLE),
  lineEnd: fc.constantFrom<NonNullable<Layout['lineEnd']>>('\n', '\r\n', '\r'),
  encoding: fc.constantFrom('utf8', 'utf8bom', 'utf16le', 'utf16be'),
  trailingBlank: fc.boolean(),
  quoted: fc.boolean(),
});

const shapeArb = fc.record({
  startV: fc.double({ min: -1, max: 0.5, noNaN: true }),
  spanV: fc.double({ min: 0.2, max: 1.5, noNaN: true }),
  cycles: fc.integer({ min: 1, max: 3 }),
  stepV: fc.double({ min: 0.002, max: 0.01, noNaN: true }),
  peakA: fc.double({ min: 1e-9, max: 1e-3, noNaN: true }),
  scanRateVPerS: fc.double({ min: 0.01, max: 10, noNaN: true }),
});

const HEADER_NAMES: Record<Column, (p: string, c: string) => string> = {
  potential: (p) => `Potential (${p})`,
  current: (_p, c) => `Current (${c})`,
  time: () => 'Time (s)',
  cycle: () => 'Cycle',
  index: () => 'Point',
  charge: () => 'Charge (C)',
  current2: (_p, c) => `I2 (${c})`,
};

function maxAbsDiff(a: Float64Array, b: Float64Array): number {
  let scale = 0;
  let worst = 0;
  for (let i = 0; i < b.length; i++) {
    scale = Math.max(scale, Math.abs(b[i] as number));
    worst = Math.max(worst, Math.abs((a[i] as number) - (b[i] as number)));
  }
  return worst / scale;
}

describe('importVoltammogram properties', () => {
  it('a voltammogram written in a random valid layout reads back the same numbers', () => {
    fc.assert(
      fc.property(layoutArb, shapeArb, (lay, shape) => {
        const cv = makeSyntheticCv({ ...shape, vertexV: shape.startV + shape.spanV });
        const columns = lay.header ? lay.order : (['potential', 'current'] as Column[]);
        const [pName, pScale] = lay.header ? lay.pUnit : POTENTIAL_UNITS[0];
        const [cName, cScale] = lay.header ? lay.cUnit : CURRENT_UNITS[0];
        const header = lay.header ? Object.fromEntries(columns.map((c) => [c, HEADER_NAMES[c](pName, cName)])) : undefined;
        const layout: Layout = {
          delimiter: lay.delimiter,
          decimalComma: lay.decimalComma && (lay.delimiter !== ',' || lay.quoted),
          quoted: lay.quoted,
          columns,
          potentialScale: pScale,
          currentScale: cScale,
          digits: 12,
          exponent: lay.exponent,
          preamble: lay.preamble,
          lineEnd: lay.lineEnd,
          footer: lay.trailingBlank ? ['', ''] : [],
          ...(header ? { header } : {}),
        };
        const text = writeLayout(cv, layout);
        const data = lay.encoding === 'utf8' ? encodeUtf8(text) : lay.encoding === 'utf8bom' ? encodeUtf8(text, true) : encodeUtf16(text, lay.encoding === 'utf16le');
        const m = importVoltammogram('generated.txt', data).measurement;
        expect(m.potentialV.length).toBe(cv.potentialV.length);
        expect(maxAbsDiff(m.potentialV, cv.potentialV)).toBeLessThan(REL);
        expect(maxAbsDiff(m.currentA, cv.currentA)).toBeLessThan(REL);
        expect(m.cycles.length).toBeGreaterThanOrEqual(1);
        if (columns.includes('time')) expect(Math.abs((m.scanRateVPerS as number) - shape.scanRateVPerS) / shape.scanRateVPerS).toBeLessThan(1e-6);
      }),
      { seed: SEED, numRuns: 150 },
    );
  });

  const onlyTypedErrors = (data: Uint8Array | string) => {
    try {
      importVoltammogram('random.bin', data);
    } catch (err) {
      if (!(err instanceof ImportError)) throw err;
    }
  };

  it('random bytes give a result or an ImportError, nothing else', () => {
    fc.assert(fc.property(fc.uint8Array({ maxLength: 4096 }), onlyTypedErrors), { seed: SEED, numRuns: 400 });
  });

  it('random text made of table characters gives a result or an ImportError', () => {
    const ch = fc.constantFrom('0', '1', '5', '9', '.', ',', ';', '\t', ' ', '\n', '\r', '-', 'e', 'E', 'V', 'A', '"', 'µ', 'NaN', 'Inf', '(mV)');
    fc.assert(fc.property(fc.array(ch, { maxLength: 3000 }).map((a) => a.join('')), onlyTypedErrors), { seed: SEED, numRuns: 400 });
  });

  it('mutated valid files give a result or an ImportError', () => {
    const base = encodeUtf8(writeLayout(makeSyntheticCv({ cycles: 2 }), { delimiter: ';', decimalComma: true, header: { potential: 'E (mV)', current: 'I (µA)' }, columns: ['potential', 'current'], potentialScale: 1e3, currentScale: 1e6, preamble: ['scan rate: 100 mV/s'] }));
    const mutation = fc.tuple(fc.nat(), fc.integer({ min: 0, max: 3 }), fc.integer({ min: 0, max: 255 }), fc.integer({ min: 1, max: 200 }));
    fc.assert(
      fc.property(fc.array(mutation, { minLength: 1, maxLength: 30 }), (muts) => {
        let bytes = Uint8Array.from(base);
        for (const [pos, kind, byte, len] of muts) {
          const p = pos % Math.max(1, bytes.length);
          if (kind === 0) bytes[p] = byte;
          else if (kind === 1) bytes = Uint8Array.from([...bytes.subarray(0, p), ...bytes.subarray(Math.min(bytes.length, p + len))]);
          else if (kind === 2) bytes = Uint8Array.from([...bytes.subarray(0, p), ...new Array<number>(len).fill(byte), ...bytes.subarray(p)]);
          else bytes = bytes.subarray(0, p);
        }
        onlyTypedErrors(bytes);
      }),
      { seed: SEED, numRuns: 200 },
    );
  });
});
