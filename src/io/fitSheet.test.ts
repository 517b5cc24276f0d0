/**
 * Fits in the results sheet and in rounded text. The fit below is hand-made input (the numbers
 * are invented to exercise the formatting; the fitting itself is tested in src/core/fit). Rounding
 * follows JCGM 100:2008 (GUM) §7.2.6: the standard error to one or two significant digits, the
 * value to the same decimal place.
 */
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { analyzeRun } from '../core/analysis/analyzeRun';
import type { FitResult, ParameterEstimate } from '../core/fit';
import { simulatedVoltammogram } from '../core/peaks/simulatedVoltammogram';
import { resultsSheetCsv, resultsSheetJson } from './exportResults';
import type { SeriesFit } from './fitSheet';
import { fitParameterRows, strongestCorrelations } from './fitTables';

const estimate = (parameter: ParameterEstimate['parameter'], value: number, patch: Partial<ParameterEstimate> = {}): ParameterEstimate => ({
  parameter, couple: parameter === 'uncompensatedOhm' || parameter === 'doubleLayerFPerCm2' ? null : 0, value, free: true, standardError: null, interval: null,
  intervalMethod: 'linearized', status: 'estimate', atSearchLimit: false, ...patch,
});

const couple = { formalPotentialV: 0.3021, k0CmPerS: 5, alpha: 0.5, diffusionOCm2PerS: 6.1e-6, diffusionRatio: 1, followUpRatePerS: 0, coverageMolPerCm2: 0, surfaceRatePerS: 0 };
const result: FitResult = {
  mechanism: 'E',
  values: { couples: [couple], shared: { uncompensatedOhm: 118.4, doubleLayerFPerCm2: 2.04e-5 } },
  start: { couples: [{ ...couple, formalPotentialV: 0.3, k0CmPerS: 0.1 }], shared: { uncompensatedOhm: 0, doubleLayerFPerCm2: 2e-5 } },
  parameters: [
    estimate('formalPotentialV', 0.30213, { standardError: 0.000236, interval: [0.30166, 0.3026] }),
    estimate('k0CmPerS', 5, { standardError: null, interval: [0.213, null], intervalMethod: 'profile', status: 'lower-bound' }),
    estimate('alpha', 0.5, { status: 'undetermined' }),
    estimate('diffusionOCm2PerS', 6.1234e-6, { standardError: 2.3e-8, interval: [6.077e-6, 6.17e-6] }),
    estimate('uncompensatedOhm', 118.4, { standardError: 12.2, interval: [94, 142.8] }),
    estimate('doubleLayerFPerCm2', 2e-5, { free: false, status: 'fixed', standardError: null, interval: null, intervalMethod: null }),
  ],
  correlation: { labels: ['formalPotentialV[1]', 'k0CmPerS[1]', 'diffusionOCm2PerS[1]', 'uncompensatedOhm'], matrix: [[1, 0.1, 0.2, -0.3], [0.1, 1, 0.05, -0.91], [0.2, 0.05, 1, 0.4], [-0.3, -0.91, 0.4, 1]] },
  windowV: [0.65, 0], pointCount: 2600, rmsA: 1.2e-8, residualStdA: 1.21e-8, degreesOfFreedom: 2595, iterations: 9, evaluations: 80, converged: true, stopReason: 'relative-offset',
  criteria: { aic: -10500.25, bic: -10470.5, parameterCount: 5 },
  records: [{ scanRateVPerS: 0.1, pointCount: 1300, rmsA: 1e-8, background: null, indices: new Int32Array(0), modelA: new Float64Array(0) }],
  notes: ['k° > 0.21 cm/s at 95 %: the waves are reversible at these scan rates, so the data set only a lower limit (profile likelihood)'],
};
const fit: SeriesFit = {
  series: 'series 1', fileNames: ['a.csv', 'b.csv'], scale: { name: 'SCE', offsetV: -0.045 }, cell: { areaCm2: 0.0707, concentrationMolPerCm3: 1e-6, electronCount: 1, temperatureK: 298.15 },
  setup: { mechanism: 'E', coupleCount: 1, free: ['formalPotentialV', 'k0CmPerS', 'alpha', 'diffusionOCm2PerS', 'uncompensatedOhm'], compare: 'mechanism' },
  result,
  comparison: { preferred: 'E', evidence: 'strong', recommendation: 'E is preferred over EC: ΔBIC 7.9 (strong evidence)', candidates: [
    { label: 'E', aic: -10500.25, bic: -10470.5, deltaAic: 0, deltaBic: 0, converged: true, parameterCount: 5 },
    { label: 'EC', aic: -10499.3, bic: -10462.6, deltaAic: 0.95, deltaBic: 7.9, converged: true, parameterCount: 6 },
  ] },
};

describe('fitParameterRows', () => {
  const rows = Object.fromEntries(fitParameterRows(result, 'SCE').map((r) => [r.key, r]));
  it('rounds each value to its standard error (GUM §7.2.6) and names the scale of E°′', () => {
    expect(rows.E0).toMatchObject({ symbol: 'E°′', value: '0.30213', error: '0.00024', unit: 'V vs SCE', reading: 'fitted', start: '0.3' });
    expect(rows.D).toMatchObject({ value: '6.123e-6', error: '2.3e-8' });
    expect(rows.Ru).toMatchObject({ value: '118', error: '12', interval: '94 … 143' });
  });
  it('writes a one-sided k° as its bound, never as a number; undetermined and held values say so', () => {
    expect(rows.k0).toMatchObject({ value: '> 0.21', error: '', reading: 'lower bound only (95 %, profile)' });
    expect(rows.k0?.interval).toMatch(/… open$/);
    expect(rows.alpha).toMatchObject({ value: '', reading: 'not determined by these data' });
    expect(rows.Cdl).toMatchObject({ value: '20', unit: 'µF cm⁻²', reading: 'held', start: '' });
  });
  it('lists the strongest correlations first, in symbols', () => {
    expect(strongestCorrelations(result, 2)).toEqual([{ a: 'k°', b: 'R_u', rho: -0.91 }, { a: 'D_O', b: 'R_u', rho: 0.4 }]);
  });
});

describe('fits in the results sheet', () => {
  const run = analyzeRun({
    files: [0.1, 0.2].map((v) => ({ fileName: `r${v}.csv`, voltammogram: simulatedVoltammogram({ scanRateVPerS: v, k0CmPerS: Infinity }), provenance: { sizeBytes: 1, sha256: null, layout: '' } })),
    cells: { 'series 1': { areaCm2: 0.0707, concentrationMolPerCm3: 1e-6 } }, software: { name: 'halfwave', version: '9.9.9' },
  });
  it('JSON: a fits key beside the analyze contract, with the fit contract per series', () => {
    const doc = JSON.parse(resultsSheetJson(run, {}, [fit])) as Record<string, unknown> & { fits: Record<string, unknown>[] };
    expect(Object.keys(doc)).toEqual(expect.arrayContaining(['files', 'series', 'warnings', 'fits']));
    expect(doc.fits[0]).toMatchObject({
      series: 'series 1', potentialScale: 'SCE', free: ['E0', 'k0', 'alpha', 'D', 'Ru'], mechanism: 'E', window: [0.65, 0],
      params: { E0: 0.30213, k0: null, alpha: null, D: 6.1234e-6, Ru: 118.4, Cdl: 2e-5 }, stderr: { E0: 0.000236, k0: null },
      bounds: { k0: [0.213, null] }, status: { k0: 'lower-bound', alpha: 'undetermined', Cdl: 'fixed' },
      criteria: { aic: -10500.25, bic: -10470.5, parameters: 5 }, modelChoice: { preferred: 'E', evidence: 'strong' },
    });
    expect(JSON.parse(resultsSheetJson(run)).fits).toEqual([]);
  });
  it('CSV: readable fit tables after the couples, raw fit tables at the end', () => {
    const csv = resultsSheetCsv(run, {}, [fit]);
    const names = [...csv.matchAll(/^# table: (.+)$/gm)].map((m) => m[1]);
    expect(names).toEqual(['files', 'series', 'couples', 'fit', 'fit models', 'raw peaks', 'raw couples', 'raw k0 per file', 'raw series', 'raw fit', 'raw fit models', 'raw fit correlations']);
    const block = (name: string) => Papa.parse<Record<string, string>>(csv.split('\n\n').find((b) => b.startsWith(`# table: ${name}\n`))!.split('\n').slice(1).join('\n'), { header: true }).data;
    expect(block('fit').find((r) => r.parameter === 'k°')).toMatchObject({ value: '> 0.21', reading: 'lower bound only (95 %, profile)' });
    expect(block('fit models')[0]).toMatchObject({ 'window / V': '0.000 … 0.650', scale: 'SCE', BIC: '-10470.5', 'model choice': 'E is preferred over EC: ΔBIC 7.9 (strong evidence)' });
    expect(block('raw fit').find((r) => r.parameter === 'D')).toMatchObject({ unit: 'cm2/s', value: '0.0000061234', standard_error: '2.3e-8', status: 'estimate' });
    expect(block('raw fit correlations')).toContainEqual({ series: 'series 1', parameter_a: 'k0[1]', parameter_b: 'Ru', correlation: '-0.91' });
    expect(resultsSheetCsv(run)).not.toContain('# table: fit');
  });
});
