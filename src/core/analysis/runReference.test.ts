import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import { resolveCell, resolveReport, resolveRun } from './resolveRun';
import { conversionContextOf, describeSeriesReferences, fileReference } from './runReference';
import type { CellValues, ReportOptions, RunFile, RunFileResult } from './runTypes';

const v = simulatedVoltammogram({});

function plan(files: RunFile[], cell: CellValues = {}, report: ReportOptions = {}) {
  const run = resolveRun({ files });
  const c = resolveCell(cell);
  const r = resolveReport(report);
  const context = conversionContextOf(c, r);
  return run.files.map((f) => fileReference(f, c, r, context));
}

describe('fileReference', () => {
  // Bard & Faulkner, Electrochemical Methods 2nd ed. (2001), inside cover: SCE 0.2412 V, Ag/AgCl (sat. KCl) 0.197 V vs SHE.
  it("takes each file's own scale from its metadata and converts through SHE", () => {
    const refs = plan([{ fileName: 'a', voltammogram: v, referenceElectrode: 'SCE' }, { fileName: 'b', voltammogram: v, referenceElectrode: 'Ag/AgCl' }], {}, { outputReference: 'SHE' });
    expect(refs[0]?.offsetV).toBeCloseTo(0.2412, 12);
    expect(refs[1]?.offsetV).toBeCloseTo(0.197, 12);
    const results = refs.map((reference) => ({ reference }) as RunFileResult);
    expect(describeSeriesReferences(results, 'SHE', 298.15).warnings.some((w) => /liquid junction/.test(w.message))).toBe(true);
  });
  it("the series' recording scale beats the files' metadata", () => {
    const refs = plan([{ fileName: 'a', voltammogram: v, referenceElectrode: 'SCE' }], { inputReference: 'SHE' }, { outputReference: 'SCE' });
    expect(refs[0]?.input).toBe('SHE');
    expect(refs[0]?.offsetV).toBeCloseTo(-0.2412, 12);
  });
  it('names the file and the fix when a scale is unknown', () => {
    const files = [{ fileName: 'mystery.csv', voltammogram: v, referenceElectrode: 'home-made wire' }];
    expect(() => plan(files, {}, { outputReference: 'SCE' })).toThrow(AnalysisError);
    expect(() => plan(files, {}, { outputReference: 'SCE' })).toThrow(/mystery\.csv.*home-made wire.*recorded on/);
    expect(plan(files)[0]?.offsetV).toBe(0);
  });
  it('keeps an unconvertible file on its recording scale, with a note, when asked to', () => {
    const files = [{ fileName: 'mystery.csv', voltammogram: v, referenceElectrode: 'home-made wire' }];
    const ref = plan(files, {}, { outputReference: 'SCE', unconvertible: 'keep-recording-scale' })[0];
    expect(ref).toMatchObject({ output: null, offsetV: 0 });
    expect(ref?.note).toMatch(/mystery\.csv stays on its recording scale: cannot report on SCE because its metadata names "home-made wire"/);
    const rhe = plan([{ fileName: 'a', voltammogram: v, referenceElectrode: 'SCE' }], {}, { outputReference: 'RHE', unconvertible: 'keep-recording-scale' })[0];
    expect(rhe?.note).toMatch(/pH/);
  });
  // Connelly & Geiger, Chem. Rev. 96 (1996) 877 (from memory): typical Fc⁺/Fc +0.40 V vs SCE — flagged as typical.
  it('warns when the Fc scale rests on the typical value', () => {
    const refs = plan([{ fileName: 'a', voltammogram: v, referenceElectrode: 'SCE' }], {}, { outputReference: 'Fc' });
    expect(refs[0]?.offsetV).toBeCloseTo(-0.4, 12);
    const results = refs.map((reference) => ({ reference }) as RunFileResult);
    expect(describeSeriesReferences(results, 'Fc', 298.15).warnings.some((w) => /typical/.test(w.message))).toBe(true);
  });
  // Ives & Janz (1961, from memory) give calomel's temperature dependence; none is applied to Hg/Hg₂SO₄.
  it('at 40 °C says which scales carry a temperature coefficient and which stay at 25 °C', () => {
    const sce = describeSeriesReferences([], 'SCE', 313.15).warnings.filter((w) => w.code === 'TEMPERATURE');
    expect(sce.map((w) => w.message).join(' ')).toMatch(/SCE taken at 40\.0 °C with its published temperature dependence/);
    const mse = describeSeriesReferences([], 'MSE-sat', 313.15).warnings.filter((w) => w.code === 'TEMPERATURE');
    expect(mse.map((w) => w.message).join(' ')).toMatch(/no published temperature coefficient for MSE-sat/);
  });
});
