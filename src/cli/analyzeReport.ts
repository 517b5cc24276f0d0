/**
 * The analysis branch of `halfwave analyze`: groups the files into scan-rate series as the screen
 * does, turns them and the parsed options into one analysis run (src/core/analysis/analyzeRun.ts)
 * and prints it as the JSON contract (--json), as a readable table, and/or writes the results
 * sheet (--csv FILE).
 * Unit conversion at this edge only: mM → mol/cm³ and °C → K happened in parseAnalyzeArgs; here
 * --cdl-at is in V, --ru in Ω, --diffusion in cm²/s.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { analyzeRun } from '../core/analysis/analyzeRun';
import type { CellValues, InternalStandardSource, RunBlank, RunFile, RunInput, ValueOrigin } from '../core/analysis/runTypes';
import { nearestBlank } from '../core/background';
import type { CurrentConvention } from '../core/types';
import { cellFromHeaders, describeLayout, groupIntoSeries, SERIES_GROUPINGS } from '../io';
import type { Measurement, SeriesGrouping } from '../io';
import { runInputOf as runInputFromSources } from '../run/runInput';
import { SOFTWARE } from '../version';
import { sessionSources } from './sessionSources';
import { resultsSheetCsv, resultsSheetJson } from '../io/exportResults';
import { optionNumberOrUndefined, optionString } from './args';
import type { OptionSpec, ParsedArgs } from './args';
import type { CliIo } from './command';
import type { AnalyzeArgs } from './commands/analyze';
import { UsageError } from './errors';
import { runContract } from '../io';
import { analyzeText } from './analyzeText';

export { ANALYSIS_OPTION_HELP } from './analysisHelp';
import { readInputs, type InputsRead, type ReadFile } from './readInputs';

/** Analysis options beyond the fixed contract; `analyze` must accept them in its option table. */
export const ANALYSIS_OPTION_SPEC: Record<string, OptionSpec> = {
  'from-ref': { value: true }, alpha: { value: true }, ph: { value: true }, ru: { value: true },
  'out-convention': { value: true }, diffusion: { value: true }, 'd-ratio': { value: true }, 'cdl-at': { value: true },
  'fc-near': { value: true }, 'fc-file': { value: true }, 'fc-value': { value: true }, cycle: { value: true }, 'json-sheet': { value: true },
  'series-by': { value: true }, session: { value: true }, blank: { value: true, repeat: true },
  na: { value: true }, e0: { value: true }, psi: { value: true }, spikes: { value: true },
};


export interface AnalysisExtras {
  fromRef?: string;
  alpha?: number;
  transferElectronCount?: number;
  formalPotentialV?: number;
  psiMethod?: 'table' | 'lavagnini';
  spikeFilter?: 'hampel' | 'off';
  pH?: number;
  ruOhm?: number;
  outputConvention?: CurrentConvention;
  diffusionCm2PerS?: number;
  diffusionRatio?: number;
  capacitancePotentialV?: number;
  internalStandard?: InternalStandardSource;
  cycle?: number;
  jsonSheetPath?: string;
  seriesBy?: SeriesGrouping;
  sessionPath?: string;
  /** Blank files or folders (--blank, repeatable). */
  blankPaths?: string[];
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
    ['alpha', 'alpha', 0.05, 0.95], ['na', 'transferElectronCount', 0.5, 10], ['e0', 'formalPotentialV', -10, 10], ['ph', 'pH', -2, 16], ['ru', 'ruOhm', 0, 1e9], ['diffusion', 'diffusionCm2PerS', 1e-12, 1],
    ['d-ratio', 'diffusionRatio', 1e-3, 1e3], ['cdl-at', 'capacitancePotentialV', -10, 10], ['cycle', 'cycle', 1, 1e6],
  ];
  for (const [name, key, lo, hi] of num) {
    const v = optionNumberOrUndefined(a, name, lo, hi);
    if (v !== undefined) (out as Record<string, unknown>)[key] = v;
  }
  const psi = optionString(a, 'psi');
  if (psi !== undefined) {
    if (psi !== 'table' && psi !== 'lavagnini') throw new UsageError(`--psi must be table or lavagnini, got "${psi}"`);
    out.psiMethod = psi;
  }
  const spikes = optionString(a, 'spikes');
  if (spikes !== undefined) {
    if (spikes !== 'hampel' && spikes !== 'off') throw new UsageError(`--spikes must be hampel or off, got "${spikes}"`);
    out.spikeFilter = spikes;
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
  const blanks = a.options.get('blank');
  if (blanks?.length) out.blankPaths = blanks;
  const session = optionString(a, 'session');
  if (session !== undefined) out.sessionPath = session;
  const by = optionString(a, 'series-by');
  if (by !== undefined) {
    if (!SERIES_GROUPINGS.includes(by as SeriesGrouping)) throw new UsageError(`--series-by must be one of ${SERIES_GROUPINGS.join(', ')}, got "${by}"`);
    out.seriesBy = by as SeriesGrouping;
  }
  return out;
}

/**
 * The --fc-file companion among the files read, matched by the path as given or by its file name;
 * a name that is none of them is refused here, in words, rather than as "no couple found".
 */
function standardFileOf(read: InputsRead, extras: AnalysisExtras): ReadFile | undefined {
  const fc = extras.internalStandard?.kind === 'measured' ? extras.internalStandard.fileName : undefined;
  if (fc === undefined) return undefined;
  const hit = read.files.find((f) => f.path === fc) ?? read.files.find((f) => f.measurement.fileName === fc);
  if (!hit) throw new UsageError(`--fc-file "${fc}" is not among the input files; list it with the files to analyse (by the same path or its file name)`);
  return hit;
}

/** Each file read once, grouped into series as the screen groups them (io/groupIntoSeries.ts). */
export function runFilesOf(read: InputsRead, extras: AnalysisExtras): RunFile[] {
  const standard = standardFileOf(read, extras);
  const isStandard = (f: ReadFile) => f === standard;
  const members = read.files.filter((f) => !isStandard(f));
  const groups = groupIntoSeries(members.map((f) => ({ name: f.measurement.fileName, folder: f.folder })), extras.seriesBy ?? 'auto');
  const keyOf = new Map<ReadFile, string>();
  for (const g of groups) for (const i of g.members) keyOf.set(members[i]!, g.key);
  return read.files.map((f) => ({
    fileName: f.measurement.fileName, series: keyOf.get(f) ?? groups[0]?.key ?? 'series 1', voltammogram: f.measurement,
    referenceElectrode: f.measurement.referenceElectrode, role: isStandard(f) ? 'internal-standard' : 'series',
    provenance: { sizeBytes: f.sizeBytes, sha256: f.sha256, layout: describeLayout(f.measurement), importWarnings: f.warnings.map((w) => w.message), metadata: f.measurement.metadata },
  }));
}

/**
 * A series' cell: what its files' headers state (as the screen reads them), then the command-line
 * options, each value with its origin (so a default that decides a number is named, as on screen).
 */
function cellOf(files: RunFile[], args: AnalyzeArgs, extras: AnalysisExtras): CellValues {
  const headers = cellFromHeaders(files.map((f) => f.voltammogram as Measurement)).values;
  const origin = (flag: unknown, header: unknown): ValueOrigin => (flag !== undefined ? 'entered' : header !== undefined ? 'header' : 'default');
  const cell: CellValues = {
    ...headers, electronCount: args.electronCount ?? 1,
    origins: {
      electronCount: origin(args.electronCount, undefined), areaCm2: origin(args.areaCm2, headers.areaCm2),
      concentrationMolPerCm3: origin(args.concentrationMolPerCm3, headers.concentrationMolPerCm3), temperatureK: origin(args.temperatureK, headers.temperatureK),
      alpha: origin(extras.alpha, undefined), ruOhm: origin(extras.ruOhm, undefined), inputReference: origin(extras.fromRef, headers.inputReference),
    },
  };
  const given: Array<[keyof CellValues, unknown]> = [
    ['areaCm2', args.areaCm2], ['concentrationMolPerCm3', args.concentrationMolPerCm3], ['temperatureK', args.temperatureK],
    ['inputReference', extras.fromRef], ['alpha', extras.alpha], ['transferElectronCount', extras.transferElectronCount], ['formalPotentialV', extras.formalPotentialV], ['pH', extras.pH], ['ruOhm', extras.ruOhm], ['diffusionCm2PerS', extras.diffusionCm2PerS],
    ['diffusionRatio', extras.diffusionRatio], ['capacitancePotentialV', extras.capacitancePotentialV], ['internalStandard', extras.internalStandard],
  ];
  for (const [key, value] of given) if (value !== undefined) (cell as Record<string, unknown>)[key] = value;
  return cell;
}

/** The run input of an `analyze` command: files grouped into series, each series' cell, the method, the report. */
export function runInputOf(read: InputsRead, args: AnalyzeArgs, extras: AnalysisExtras, blankFiles: ReadFile[] = []): RunInput {
  const blanks: RunBlank[] = blankFiles.map((b) => ({
    fileName: b.measurement.fileName, voltammogram: b.measurement, provenance: { sizeBytes: b.sizeBytes, sha256: b.sha256, layout: describeLayout(b.measurement) },
  }));
  const rates = blankFiles.map((b) => ({ fileName: b.measurement.fileName, scanRateVPerS: b.measurement.scanRateVPerS }));
  const files = runFilesOf(read, extras).map((f) => (blanks.length ? { ...f, blankFile: nearestBlank(f.voltammogram.scanRateVPerS, rates) } : f));
  // The core finds the companion by its file name, whatever path named it on the command line.
  const std = extras.internalStandard;
  const standard = standardFileOf(read, extras);
  if (std?.kind === 'measured' && standard) extras = { ...extras, internalStandard: { ...std, fileName: standard.measurement.fileName } };
  const keys = [...new Set(files.map((f) => f.series as string))];
  const report: RunInput['report'] = { outputConvention: extras.outputConvention ?? 'iupac' };
  if (args.referenceElectrode !== undefined) report.outputReference = args.referenceElectrode;
  return {
    files,
    blanks,
    cells: Object.fromEntries(keys.map((k) => [k, cellOf(files.filter((f) => f.series === k && f.role !== 'internal-standard'), args, extras)])),
    method: { seriesCycle: extras.cycle ?? 1, ...(extras.psiMethod ? { psiMethod: extras.psiMethod } : {}), ...(extras.spikeFilter ? { spikeFilter: extras.spikeFilter } : {}) },
    report,
    software: { ...SOFTWARE },
  };
}

/** The run input of a `--session` run: the session laid over the files by the screen's own mapping. */
function sessionRunInput(read: InputsRead, args: AnalyzeArgs, extras: AnalysisExtras, sessionPath: string, io: CliIo): RunInput {
  const given = [
    ...(['areaCm2', 'concentrationMolPerCm3', 'electronCount', 'temperatureK', 'referenceElectrode'] as const).filter((k) => args[k] !== undefined),
    ...(Object.keys(extras) as Array<keyof AnalysisExtras>).filter((k) => k !== 'sessionPath' && k !== 'jsonSheetPath' && extras[k] !== undefined),
  ];
  if (given.length) throw new UsageError(`--session carries the cell values, scales and grouping; leave out ${given.join(', ')}`);
  let text: string;
  try {
    text = readFileSync(sessionPath, 'utf8');
  } catch (err) {
    throw new UsageError(`cannot read "${sessionPath}": ${(err as NodeJS.ErrnoException).code ?? String(err)}`);
  }
  const { sources, notes } = sessionSources(read, text, sessionPath);
  for (const n of notes) io.stderr(`note: ${n}\n`);
  return { ...runInputFromSources(sources), software: { ...SOFTWARE } };
}

/** Runs the analysis and prints it; returns the exit code. */
export function runAnalysis(read: InputsRead, args: AnalyzeArgs, io: CliIo, extras: AnalysisExtras = {}): number {
  const blankFiles = extras.blankPaths ? readInputs(extras.blankPaths, { overrides: args.overrides }).files : [];
  if (extras.sessionPath === undefined) assertScanRates(read);
  const input = extras.sessionPath !== undefined ? sessionRunInput(read, args, extras, extras.sessionPath, io) : runInputOf(read, args, extras, blankFiles);
  const result = analyzeRun(input);
  const givenAs = read.files.map((f) => f.path);
  const meta = { createdAt: new Date().toISOString(), command: `analyze ${args.files.join(' ')}` };
  if (args.csvPath !== undefined) writeOut(args.csvPath, resultsSheetCsv(result, meta));
  if (extras.jsonSheetPath !== undefined) writeOut(extras.jsonSheetPath, resultsSheetJson(result, meta));
  io.stdout(args.json ? `${JSON.stringify(runContract(result, givenAs), null, 2)}\n` : analyzeText(result));
  return 0;
}

/** A file with no usable scan rate stops the run, in the import's own words on what it found. */
function assertScanRates(read: InputsRead): void {
  for (const f of read.files) {
    if (f.measurement.scanRateVPerS !== null) continue;
    const w = f.warnings.find((x) => x.code === 'NO_SCAN_RATE');
    if (w) throw new UsageError(`${w.message.replace(/; enter it to use rate-dependent analyses$/, '')}; give it with --scan-rate`);
  }
}

function writeOut(path: string, text: string): void {
  try {
    writeFileSync(path, text);
  } catch (err) {
    throw new UsageError(`cannot write "${path}": ${(err as NodeJS.ErrnoException).code ?? String(err)}`);
  }
}
