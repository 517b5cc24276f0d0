import { describe, expect, it } from 'vitest';
import { AnalysisError } from '../errors';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import { resolveCell, resolveReport, resolveRun } from './resolveRun';
import { conversionContextOf, describeSeriesReferences, fileReference, seriesReferenceFacts } from './runReference';
import type { CellValues, ReportOptions, RunFile, RunFileResult } from './runTypes';

const v = simulatedVoltammogram({});

function plan(files: RunFile[], cell: CellValues = {}, report: ReportOptions = {}) {
  const run = resolveRun({ files });
  const c = resolveCell(cell);
  const r = resolveReport(report);
  const context = conversionContextOf(c, r);
  const facts = seriesReferenceFacts(run.files, run.files.map((_f, i) => i));
  return run.files.map((f) => fileReference(f, c, r, context, facts));
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

// Bard & Faulkner 2001, inside back cover: SCE 0.2412 V vs SHE; Ag/AgCl (3 M KCl) 0.210 V (from memory). A series whose
// files state different electrodes is converted file by file (0.2412 and 0.210 V), never all on the first file's scale.
describe('a series whose files state different references', () => {
  const files: RunFile[] = [
    { fileName: 'a.csv', voltammogram: v, referenceElectrode: 'SCE' },
    { fileName: 'b.csv', voltammogram: v, referenceElectrode: 'Ag/AgCl (3 M KCl)' },
  ];
  it("converts each file from its own stated scale, even when the series' cell holds the first file's header value", () => {
    const refs = plan(files, { inputReference: 'SCE', origins: { inputReference: 'header' } }, { outputReference: 'SHE' });
    expect(refs.map((r) => r.input)).toEqual(['SCE', 'AgCl-3M']);
    expect(refs[0]?.offsetV).toBeCloseTo(0.2412, 12);
    expect(refs[1]?.offsetV).toBeCloseTo(0.21, 12);
    const results = refs.map((reference, i) => ({ reference, role: 'series', fileName: files[i]?.fileName }) as RunFileResult);
    expect(describeSeriesReferences(results, 'SHE', 298.15).warnings.map((w) => w.message).join('\n')).toMatch(/mixes reference electrodes \(a\.csv: SCE; b\.csv: AgCl-3M\): each file was converted from its own stated scale to SHE/);
    expect(describeSeriesReferences(results, null, 298.15).warnings.map((w) => w.message).join('\n')).toMatch(/not comparable/);
  });
  it('a scale the user entered for the series wins, and the disagreement is named', () => {
    const refs = plan(files, { inputReference: 'SCE', origins: { inputReference: 'entered' } }, { outputReference: 'SHE' });
    expect(refs.map((r) => r.input)).toEqual(['SCE', 'SCE']);
    expect(refs[1]?.cautions?.join('\n')).toMatch(/b\.csv states "Ag\/AgCl \(3 M KCl\)" \(AgCl-3M\) but its series is set to SCE/);
  });
  it('refuses a file that states nothing among files that disagree, rather than take the first', () => {
    const three = [...files, { fileName: 'c.csv', voltammogram: v }];
    expect(() => plan(three, { inputReference: 'SCE', origins: { inputReference: 'header' } }, { outputReference: 'SHE' })).toThrow(/c\.csv: cannot report on SHE because it states no reference and the other files of its series state different ones \(SCE, AgCl-3M\)/);
  });
});

describe('cautions that go with a scale', () => {
  // Safety: mercury in calomel electrodes (common practice, no source; local rules decide).
  it('names mercury, the liquid junction and an aqueous electrode with the Fc⁺/Fc scale', () => {
    const ref = plan([{ fileName: 'a.csv', voltammogram: v, referenceElectrode: 'SCE' }], {}, { outputReference: 'Fc' })[0];
    const text = ref?.cautions?.join('\n') ?? '';
    expect(text).toMatch(/contains mercury/);
    expect(text).toMatch(/liquid junction/);
    expect(text).toMatch(/aqueous reference electrode .* with non-aqueous work/);
  });
  it('warns of a solvent named in the header, and of an unqualified name', () => {
    const file: RunFile = { fileName: 'm.csv', voltammogram: v, referenceElectrode: 'Ag/AgCl', provenance: { metadata: { solvent: 'acetonitrile' } } };
    const text = plan([file], {}, { outputReference: 'SHE' })[0]?.cautions?.join('\n') ?? '';
    expect(text).toMatch(/the header names acetonitrile/);
    expect(text).toMatch(/m\.csv: "Ag\/AgCl" does not name its filling/);
    expect(text).not.toMatch(/mercury/);
  });
});
