/**
 * The analysis branch of `halfwave analyze`: turns the imported measurements and the parsed
 * options into one analysis run (src/core/analysis/analyzeRun.ts) and prints it as the JSON
 * contract (--json), as a readable table, and/or writes the results sheet (--csv FILE).
 * Unit conversion at this edge only: mM → mol/cm³ and °C → K happened in parseAnalyzeArgs; here
 * --cdl-at is in V, --ru in Ω, --diffusion in cm²/s.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { analyzeRun } from '../core/analysis/analyzeRun';
import type { AnalyzeRunOptions, InternalStandardSource, RunInput } from '../core/analysis/runTypes';
import type { CurrentConvention } from '../core/analysis/types';
import { sha256Hex } from '../core/provenance/sha256';
import { delimiterName } from '../io';
import type { Measurement } from '../io';
import { resultsSheetCsv, resultsSheetJson } from '../io/exportResults';
import { optionNumberOrUndefined, optionString } from './args';
import type { OptionSpec, ParsedArgs } from './args';
import type { CliIo } from './command';
import type { AnalyzeArgs } from './commands/analyze';
import { UsageError } from './errors';
import { analyzeContract } from './analyzeContract';
import { analyzeText } from './analyzeText';
import { expandPaths } from './readInputs';

/** Analysis options beyond the fixed contract; `analyze` must accept them in its option table. */
export const ANALYSIS_OPTION_SPEC: Record<string, OptionSpec> = {
  'from-ref': { value: true }, alpha: { value: true }, ph: { value: true }, ru: { value: true },
  'out-convention': { value: true }, diffusion: { value: true }, 'd-ratio': { value: true }, 'cdl-at': { value: true },
  'fc-near': { value: true }, 'fc-file': { value: true }, 'fc-value': { value: true }, cycle: { value: true }, 'json-sheet': { value: true },
};

export const ANALYSIS_OPTION_HELP = `Further analysis options:
  --ref NAME            report potentials on this scale: SHE, SCE, NCE, SSCE, AgCl-sat, AgCl-3M,
                        AgCl-3.5M, AgCl-1M, AgCl-0.1M, MSE-sat, MSE-1M-H2SO4, HgO-1M, HgO-0.1M,
                        RHE (needs --ph), Fc (internal standard)
  --from-ref NAME       scale the files were measured on (default: the file's metadata)
  --ph PH               pH for the RHE scale
  --fc-near V           Fc⁺/Fc: use the couple with E½ nearest V (measured scale) as zero
  --fc-file NAME        ...found in this companion file (given among the files, left out of the series)
  --fc-value V          Fc⁺/Fc: E½ measured elsewhere, in V on the --from-ref scale
  --alpha A             transfer coefficient (default: measured, else 0.5)
  --diffusion CM2_PER_S known D of the species present, used for k° (default: fitted)
  --d-ratio R           D_O/D_R for Nicholson's k° (default 1)
  --ru OHM              uncompensated resistance: potentials corrected to E − i·Ru
  --out-convention C    iupac | polarographic, for signed currents in the output (default iupac)
  --cdl-at V            potential (output scale) of a featureless region: double-layer capacitance
  --cycle N             cycle used for the series (default 1)
  --json-sheet FILE     also write the full results sheet as JSON
Mercury reference electrodes (SCE, MSE, Hg/HgO) contain mercury: follow your local safety and
disposal rules.
`;

export interface AnalysisExtras {
  fromRef?: string;
  alpha?: number;
  pH?: number;
  ruOhm?: number;
  outputConvention?: CurrentConvention;
  diffusionCm2PerS?: number;
  diffusionRatio?: number;
  capacitancePotentialV?: number;
  internalStandard?: InternalStandardSource;
  cycle?: number;
  jsonSheetPath?: string;
}

function internalStandardOf(a: ParsedArgs, fromRef: string | undefined): InternalStandardSource | undefined {
  const near = optionNumberOrUndefined(a, 'fc-near', -10, 10);
  const value = optionNumberOrUndefined(a, 'fc-value', -10, 10);
  const file = optionString(a, 'fc-file');
  if (near !== undefined && value !== undefined) throw new UsageError('give either --fc-near or --fc-value, not both');
  if (value !== undefined) {
    if (!fromRef) throw new UsageError('--fc-value needs the scale it was measured on (--from-ref)');
    return { kind: 'value', eHalfV: value, reference: fromRef, origin: 'given with --fc-value' };
  }
  if (file !== undefined && near === undefined) throw new UsageError('--fc-file needs --fc-near V to pick the ferrocene couple');
  return near === undefined ? undefined : { kind: 'measured', nearV: near, ...(file ? { fileName: file } : {}) };
}

/** Reads the options of ANALYSIS_OPTION_SPEC. */
export function parseAnalysisExtras(a: ParsedArgs): AnalysisExtras {
  const out: AnalysisExtras = {};
  const fromRef = optionString(a, 'from-ref');
  if (fromRef !== undefined) out.fromRef = fromRef;
  const num: Array<[string, keyof AnalysisExtras, number, number]> = [
    ['alpha', 'alpha', 0.01, 0.99], ['ph', 'pH', -2, 16], ['ru', 'ruOhm', 0, 1e9], ['diffusion', 'diffusionCm2PerS', 1e-12, 1],
    ['d-ratio', 'diffusionRatio', 1e-3, 1e3], ['cdl-at', 'capacitancePotentialV', -10, 10], ['cycle', 'cycle', 1, 1e6],
  ];
  for (const [name, key, lo, hi] of num) {
    const v = optionNumberOrUndefined(a, name, lo, hi);
    if (v !== undefined) (out as Record<string, unknown>)[key] = v;
  }
  const conv = optionString(a, 'out-convention');
  if (conv !== undefined) {
    if (conv !== 'iupac' && conv !== 'polarographic') throw new UsageError(`--out-convention must be iupac or polarographic, got "${conv}"`);
    out.outputConvention = conv;
  }
  const std = internalStandardOf(a, fromRef);
  if (std) out.internalStandard = std;
  const sheet = optionString(a, 'json-sheet');
  if (sheet !== undefined) out.jsonSheetPath = sheet;
  return out;
}

function layoutOf(m: Measurement): string {
  const d = m.detection;
  const cols = d.columns.filter((c) => c.role !== 'other').map((c) => `${c.role}=${c.name}${c.unit ? ` [${c.unit}]` : ''}`).join(', ');
  return `${delimiterName(d.delimiter.value)}-separated, decimal '${d.decimalMark.value}', header line ${d.headerLine.value ?? 'none'}, ${cols}, ${d.rowsRead} rows (${d.rowsSkipped} skipped), ${m.currentConvention} currents in the file`;
}

function runInputs(measurements: Measurement[], paths: string[], extras: AnalysisExtras): RunInput[] {
  return measurements.map((m, i) => {
    const path = paths[i];
    let bytes: Uint8Array | null = null;
    try {
      if (path !== undefined) bytes = readFileSync(path);
    } catch {
      bytes = null;
    }
    const fc = extras.internalStandard?.kind === 'measured' ? extras.internalStandard.fileName : undefined;
    return {
      fileName: m.fileName, voltammogram: m, referenceElectrode: m.referenceElectrode,
      role: fc !== undefined && (m.fileName === fc || path === fc) ? 'internal-standard' : 'series',
      provenance: { sizeBytes: bytes?.length ?? null, sha256: bytes ? sha256Hex(bytes) : null, layout: layoutOf(m) },
    };
  });
}

/** A value every file's preamble agrees on, else undefined. */
export function fromFiles(measurements: Measurement[], pick: (m: Measurement) => { value: number } | null): number | undefined {
  const values = measurements.map((m) => pick(m)?.value);
  const first = values[0];
  return first !== undefined && values.every((v) => v === first) ? first : undefined;
}

function softwareVersion(): { name: string; version: string } {
  try {
    const pkg = JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as { name?: string; version?: string };
    return { name: pkg.name ?? 'halfwave', version: pkg.version ?? 'unknown' };
  } catch {
    return { name: 'halfwave', version: 'unknown' };
  }
}

export function runOptions(measurements: Measurement[], args: AnalyzeArgs, extras: AnalysisExtras): AnalyzeRunOptions {
  const area = args.areaCm2 ?? fromFiles(measurements, (m) => m.areaCm2);
  const conc = args.concentrationMolPerCm3 ?? fromFiles(measurements, (m) => m.concentrationMolPerCm3);
  const temp = args.temperatureK ?? fromFiles(measurements, (m) => m.temperatureK);
  const o: AnalyzeRunOptions = { software: softwareVersion(), electronCount: args.electronCount ?? 1, areaCm2: area ?? null, concentrationMolPerCm3: conc ?? null };
  if (temp !== undefined) o.temperatureK = temp;
  if (args.scanRateVPerS !== undefined) o.scanRateVPerS = args.scanRateVPerS;
  if (args.referenceElectrode !== undefined) o.outputReference = args.referenceElectrode;
  if (extras.fromRef !== undefined) o.inputReference = extras.fromRef;
  const copy: Array<[keyof AnalysisExtras, keyof AnalyzeRunOptions]> = [
    ['alpha', 'alpha'], ['pH', 'pH'], ['ruOhm', 'ruOhm'], ['outputConvention', 'outputConvention'], ['diffusionCm2PerS', 'diffusionCm2PerS'],
    ['diffusionRatio', 'diffusionRatio'], ['capacitancePotentialV', 'capacitancePotentialV'], ['internalStandard', 'internalStandard'], ['cycle', 'cycle'],
  ];
  for (const [from, to] of copy) if (extras[from] !== undefined) (o as Record<string, unknown>)[to] = extras[from];
  return o;
}

/** Runs the analysis and prints it; returns the exit code. */
export function runAnalysis(measurements: Measurement[], args: AnalyzeArgs, io: CliIo, extras: AnalysisExtras = {}): number {
  const paths = expandPaths(args.files);
  const givenAs = paths.length === measurements.length ? paths : measurements.map((m) => m.fileName);
  const result = analyzeRun(runInputs(measurements, givenAs, extras), runOptions(measurements, args, extras));
  const meta = { createdAt: new Date().toISOString(), command: `analyze ${args.files.join(' ')}` };
  if (args.csvPath !== undefined) writeOut(args.csvPath, resultsSheetCsv(result, meta));
  if (extras.jsonSheetPath !== undefined) writeOut(extras.jsonSheetPath, resultsSheetJson(result, meta));
  io.stdout(args.json ? `${JSON.stringify(analyzeContract(result, givenAs), null, 2)}\n` : analyzeText(result));
  return 0;
}

function writeOut(path: string, text: string): void {
  try {
    writeFileSync(path, text);
  } catch (err) {
    throw new UsageError(`cannot write "${path}": ${(err as NodeJS.ErrnoException).code ?? String(err)}`);
  }
}
