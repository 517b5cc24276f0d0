import { describe, expect, it } from 'vitest';
import { formatTrace, type DemoTrace } from './layouts';
import { SERIES } from './scenario';
import { seededGaussian as createGaussian } from '../../src/core/random/seededGaussian';

const trace: DemoTrace = {
  timeS: new Float64Array([0, 0.5, 1]),
  potentialV: new Float64Array([0.1, 0.05, 0.1]),
  currentA: new Float64Array([1.5e-6, -2.25e-6, 3e-7]),
  cycle: new Int32Array([1, 1, 1]),
};
const context = { series: SERIES[1]!, scanRateVPerS: 0.05, run: 1, recordedAt: '2026-11-17 10:00' };

describe('demo-data layouts', () => {
  it('comma layout: header and values in V, A, s', () => {
    expect(formatTrace('commaHeader', trace, context).split('\n').slice(0, 3)).toEqual(['Potential/V,Current/A,Time/s', '0.1000,1.50000e-6,0.00000', '0.0500,-2.25000e-6,0.50000']);
  });

  it('semicolon layout: preamble with the scan rate, decimal commas, µA', () => {
    const text = formatTrace('semicolonPreamble', trace, context);
    expect(text).toContain('scan rate = 50 mV/s');
    expect(text).toContain('E / V;I / µA\n0,1000;1,50000\n0,0500;-2,25000\n');
  });

  it('tab layout: BOM, CRLF, mV and µA', () => {
    const text = formatTrace('tabMilliBom', trace, context);
    expect(text.startsWith('\uFEFFTime (s)\tPotential (mV)\tCurrent (µA)\r\n0.0000\t100.0\t1.50000\r\n')).toBe(true);
  });

  it('whitespace layout: cycle, V, A without header', () => {
    expect(formatTrace('spaceCycleNoHeader', trace, context).split('\n')[0]).toBe('  1    0.1000     1.5000e-6');
  });
});

describe('createGaussian', () => {
  it('is reproducible for a seed and has mean ≈ 0, variance ≈ 1 over 20,000 draws (±0.03)', () => {
    const a = createGaussian(7);
    const b = createGaussian(7);
    expect([a(), a(), a()]).toEqual([b(), b(), b()]);
    const g = createGaussian(20261201);
    let sum = 0;
    let sq = 0;
    for (let i = 0; i < 20000; i++) {
      const x = g();
      sum += x;
      sq += x * x;
    }
    expect(Math.abs(sum / 20000)).toBeLessThan(0.03);
    expect(Math.abs(sq / 20000 - 1)).toBeLessThan(0.03);
  });
});
