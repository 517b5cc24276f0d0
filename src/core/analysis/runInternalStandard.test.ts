/**
 * The measured Fc⁺/Fc internal standard of a run, on voltammograms from the project's validated
 * simulator (reversible couples, E½ = E°′ within 1 mV for equal D: Bard & Faulkner, Electrochemical
 * Methods 2nd ed. (2001) §6.2.1).
 */
import { describe, expect, it } from 'vitest';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import { analyzeRun } from './analyzeRun';
import type { CellValues, RunFile, RunInput } from './runTypes';

const sim = { k0CmPerS: Infinity, startV: 0.8, switchV: -0.3, scanRateVPerS: 0.1 };
const analyte = (fileName: string, referenceElectrode: string, extra: Array<{ formalPotentialV: number }> = []): RunFile => ({
  fileName, referenceElectrode, voltammogram: simulatedVoltammogram({ ...sim, formalPotentialV: 0 }, { extra }),
});
const run = (files: RunFile[], cell: CellValues, output: string) => analyzeRun({ files, cells: { 'series 1': cell }, report: { outputReference: output } } as RunInput);

describe('the measured internal standard', () => {
  // Gritzner & Kůta, Pure Appl. Chem. 56 (1984) 461 (from memory): ferrocene is added to the solution as a second couple.
  // One couple alone cannot be both analyte and standard: every potential would read 0 V vs Fc⁺/Fc.
  it('refuses the series\' only couple as the standard and says how far it is from the search potential', () => {
    const files = [analyte('only.csv', 'SCE')];
    expect(() => run(files, { internalStandard: { kind: 'measured', nearV: 0.1 } }, 'Fc')).toThrow(/\d{2,3}\.\d mV from the 0\.1 V searched\) is the only couple in the series' files/);
  });

  // Bard & Faulkner 2001, inside back cover: SCE 0.2412 V vs SHE; Ag/AgCl (3 M KCl) 0.210 V (from memory). The
  // analyte at 0 V vs SCE and ferrocene at 0.45 V vs Ag/AgCl (3 M) in a companion file: 0.2412 − (0.45 + 0.210) = −0.4188 V vs Fc⁺/Fc.
  it("places a companion file's ferrocene from the companion's own stated scale and says the scales differ", () => {
    const companion: RunFile = {
      fileName: 'fc.csv', referenceElectrode: 'Ag/AgCl (3 M KCl)', role: 'internal-standard',
      voltammogram: simulatedVoltammogram({ ...sim, formalPotentialV: 0.45 }),
    };
    const r = run([analyte('an.csv', 'SCE'), companion], { internalStandard: { kind: 'measured', nearV: 0.45, fileName: 'fc.csv' } }, 'Fc');
    const eHalf = r.files[0]?.analysis.cycles[0]?.couples[0]?.eHalfV ?? Number.NaN;
    expect(Math.abs(eHalf - (0.2412 - 0.45 - 0.21))).toBeLessThan(0.002);
    const text = r.warnings.map((w) => w.message).join('\n');
    expect(text).toMatch(/Fc⁺\/Fc: the couple at E½ = 0\.4\d+ V vs AgCl-3M in fc\.csv, \d\.\d mV from the 0\.45 V searched/);
    expect(text).toMatch(/recorded vs AgCl-3M, the series' files vs SCE/);
  });

  it('names a companion that is not among the files', () => {
    expect(() => run([analyte('an.csv', 'SCE', [{ formalPotentialV: 0.45 }])], { internalStandard: { kind: 'measured', nearV: 0.45, fileName: 'gone.csv' } }, 'Fc')).toThrow(/"gone\.csv" is not among the files of the run/);
  });

  // Same file, two couples (common practice, no source): the standard at 0.45 V, the analyte 0.45 V below it.
  it('takes ferrocene measured beside the analyte and warns loudly when it sits far from the search potential', () => {
    const files = [analyte('both.csv', 'SCE', [{ formalPotentialV: 0.45 }])];
    const r = run(files, { internalStandard: { kind: 'measured', nearV: 0.38 } }, 'Fc');
    const halves = (r.files[0]?.analysis.cycles[0]?.couples ?? []).map((c) => c.eHalfV ?? Number.NaN).sort((a, b) => a - b);
    expect(Math.abs((halves[0] ?? 0) + 0.45)).toBeLessThan(0.002);
    expect(r.warnings.map((w) => w.message).join('\n')).toMatch(/7\d\.\d mV from the 0\.38 V searched — far from it: check that this couple is ferrocene/);
  });
});
