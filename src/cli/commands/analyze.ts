/**
 * `halfwave analyze FILE...`: reads voltammograms through the importer, groups them into scan-rate
 * series and analyses them (analyzeReport.ts: one analysis run, as the screen computes it).
 * `--inspect` prints what the importer detected in each file instead.
 */
import { parseArgs, optionNumberOrUndefined, optionString } from '../args';
import type { OptionSpec, ParsedArgs } from '../args';
import type { CliCommand, CliIo } from '../command';
import { UsageError } from '../errors';
import { formatInspectText, inspectJson } from '../inspect';
import { readInputs } from '../readInputs';
import { ANALYSIS_OPTION_HELP, ANALYSIS_OPTION_SPEC, parseAnalysisExtras, runAnalysis } from '../analyzeReport';
import { celsiusToKelvin, millimolarToMolPerCm3 } from '../../core/units';
import {
  CONVENTION_CHOICES, CURRENT_UNIT_CHOICES, DECIMAL_CHOICES, DELIMITER_CHOICES, ENCODING_CHOICES, POTENTIAL_UNIT_CHOICES, TIME_UNIT_CHOICES,
  choiceNamed, choiceNames, parseUnitOf,
} from '../../io';
import type { Choice, ImportOverrides } from '../../io';

/** Options that override one guess of the importer (read by parseOverrides); `fit` takes them too. */
export const IMPORT_OPTION_SPEC: Record<string, OptionSpec> = {
  delimiter: { value: true }, decimal: { value: true }, 'header-line': { value: true }, columns: { value: true },
  'potential-unit': { value: true }, 'current-unit': { value: true }, 'time-unit': { value: true },
  convention: { value: true }, encoding: { value: true },
};

export const IMPORT_OPTION_HELP = `Import overrides (each replaces one guess; see analyze --inspect):
  --delimiter D         ${choiceNames(DELIMITER_CHOICES).replace(/, /g, ' | ')} (space: runs of spaces)
  --decimal M           ${choiceNames(DECIMAL_CHOICES).replace(/, /g, ' | ')}
  --header-line N       1-based line of the column names; 0 = the file has none
  --columns LIST        1-based columns, e.g. E=2,I=3,t=1,cycle=4 (cycle=0: split cycles from
                        the potential instead of a cycle column)
  --potential-unit U    V | mV | µV (or uV)
  --current-unit U      A | mA | µA (or uA) | nA | pA
  --time-unit U         s | ms | µs (or us) | min | h
  --convention C        iupac (anodic current positive) | polarographic (cathodic positive)
  --encoding E          ${choiceNames(ENCODING_CHOICES).replace(/, /g, ' | ')}
`;

const SPEC: Record<string, OptionSpec> = {
  area: { value: true }, conc: { value: true }, n: { value: true }, temp: { value: true }, 'scan-rate': { value: true },
  json: { value: false }, csv: { value: true }, ref: { value: true }, inspect: { value: false },
  ...IMPORT_OPTION_SPEC,
  ...ANALYSIS_OPTION_SPEC,
};

/** Everything `analyze` was asked for, in core units. */
export interface AnalyzeArgs {
  files: string[];
  overrides: ImportOverrides;
  areaCm2?: number;
  concentrationMolPerCm3?: number;
  electronCount?: number;
  temperatureK?: number;
  referenceElectrode?: string;
  json: boolean;
  csvPath?: string;
  inspect: boolean;
}

const HELP = `Usage: halfwave analyze FILE|FOLDER... [options]

Reads instrument text/CSV exports (a folder stands for its files, in natural order;
"-" reads standard input, e.g. halfwave simulate | halfwave analyze - --inspect).

Analysis options:
  --area CM2            electrode area in cm²
  --conc MM             bulk concentration in mM (mmol/L)
  --n N                 electrons transferred
  --temp CELSIUS        temperature in °C (default: the file's, else 25 °C)
  --scan-rate V_PER_S   scan rate in V/s; beats the time column, preamble and file name
  --json                machine-readable output on stdout
  --csv FILE            also write the results table to FILE
  --inspect             print what was detected in each file (no analysis)

${IMPORT_OPTION_HELP}
${ANALYSIS_OPTION_HELP}
Exit codes: 0 done, 1 internal fault, 2 bad arguments or a file that cannot be read.
`;

export const analyzeCommand: CliCommand = {
  name: 'analyze',
  summary: 'read voltammograms (use --inspect to see what was detected in each file)',
  help: HELP,
  run: async (argv: string[], io: CliIo) => {
    const parsed = parseArgs(argv, SPEC);
    const args = parseAnalyzeArgs(parsed);
    if (args.inspect) return inspect(args, io);
    const extras = parseAnalysisExtras(parsed);
    return runAnalysis(readInputs(args.files, { overrides: args.overrides }), args, io, extras);
  },
};

function inspect(args: AnalyzeArgs, io: CliIo): number {
  const read = readInputs(args.files, { overrides: args.overrides, keepGoing: true });
  io.stdout(args.json ? `${JSON.stringify(inspectJson(read.outcomes), null, 2)}\n` : formatInspectText(read.outcomes));
  return read.failures.length ? 2 : 0;
}

export function parseAnalyzeArgs(a: ParsedArgs): AnalyzeArgs {
  const out: AnalyzeArgs = { files: a.positionals, overrides: parseOverrides(a), json: a.flags.has('json'), inspect: a.flags.has('inspect') };
  const area = optionNumberOrUndefined(a, 'area', 1e-12, 1e6);
  const conc = optionNumberOrUndefined(a, 'conc', 0, 1e5);
  const n = optionNumberOrUndefined(a, 'n', 1, 10);
  const temp = optionNumberOrUndefined(a, 'temp', -100, 500);
  if (area !== undefined) out.areaCm2 = area;
  if (conc !== undefined) out.concentrationMolPerCm3 = millimolarToMolPerCm3(conc);
  if (n !== undefined) {
    if (!Number.isInteger(n)) throw new UsageError(`--n must be a whole number of electrons, got ${n}`);
    out.electronCount = n;
  }
  if (temp !== undefined) out.temperatureK = celsiusToKelvin(temp);
  const ref = optionString(a, 'ref');
  if (ref !== undefined) out.referenceElectrode = ref;
  const csv = optionString(a, 'csv');
  if (csv !== undefined) out.csvPath = csv;
  return out;
}

const COLUMN_KEYS: Record<string, 'potentialColumn' | 'currentColumn' | 'timeColumn' | 'cycleColumn'> = {
  e: 'potentialColumn', potential: 'potentialColumn', i: 'currentColumn', current: 'currentColumn', t: 'timeColumn', time: 'timeColumn', cycle: 'cycleColumn',
};

/** The value of a choice flag (io/overrideChoices.ts), or a UsageError listing the names it takes. */
function pick<T>(a: ParsedArgs, name: string, choices: readonly Choice<T>[]): T | undefined {
  const raw = optionString(a, name);
  if (raw === undefined) return undefined;
  const hit = choiceNamed(choices, raw);
  if (!hit) throw new UsageError(`--${name} must be one of ${choiceNames(choices)}, got "${raw}"`);
  return hit.value;
}

/** A unit flag: any spelling the importer reads (parseUnitOf), checked against the unit table. */
function unitOption<T extends string>(a: ParsedArgs, kind: 'potential' | 'current' | 'time', choices: readonly Choice<T>[]): T | undefined {
  const raw = optionString(a, `${kind}-unit`);
  if (raw === undefined) return undefined;
  const u = parseUnitOf(kind, raw) as T | null;
  if (!u || !choices.some((c) => c.value === u)) throw new UsageError(`--${kind}-unit must be one of ${choices.map((c) => c.value).join(', ')}, got "${raw}"`);
  return u;
}

export function parseOverrides(a: ParsedArgs): ImportOverrides {
  const o: ImportOverrides = {};
  const delimiter = pick(a, 'delimiter', DELIMITER_CHOICES);
  if (delimiter) o.delimiter = delimiter;
  const decimal = pick(a, 'decimal', DECIMAL_CHOICES);
  if (decimal) o.decimalMark = decimal;
  const header = optionNumberOrUndefined(a, 'header-line', 0, 1e7);
  if (header !== undefined) {
    if (!Number.isInteger(header)) throw new UsageError(`--header-line must be a whole line number, got ${header}`);
    o.headerLine = header;
  }
  Object.assign(o, parseColumns(optionString(a, 'columns')));
  const pu = unitOption(a, 'potential', POTENTIAL_UNIT_CHOICES);
  if (pu) o.potentialUnit = pu;
  const cu = unitOption(a, 'current', CURRENT_UNIT_CHOICES);
  if (cu) o.currentUnit = cu;
  const tu = unitOption(a, 'time', TIME_UNIT_CHOICES);
  if (tu) o.timeUnit = tu;
  const conv = pick(a, 'convention', CONVENTION_CHOICES);
  if (conv) o.currentConvention = conv;
  const enc = pick(a, 'encoding', ENCODING_CHOICES);
  if (enc) o.encoding = enc;
  const rate = optionNumberOrUndefined(a, 'scan-rate', 1e-9, 1e7);
  if (rate !== undefined) o.scanRateVPerS = rate;
  return o;
}

/** "E=2,I=3,t=1,cycle=4" (1-based) → 0-based column overrides; cycle=0 → -1 (ignore). */
export function parseColumns(raw: string | undefined): ImportOverrides {
  const o: ImportOverrides = {};
  if (raw === undefined) return o;
  for (const part of raw.split(',')) {
    const m = /^\s*([a-z]+)\s*=\s*(\d+)\s*$/i.exec(part);
    const key = m ? COLUMN_KEYS[(m[1] as string).toLowerCase()] : undefined;
    if (!m || !key) throw new UsageError(`--columns takes pairs like E=2,I=3,t=1,cycle=4; could not read "${part.trim()}"`);
    const n = Number(m[2]);
    if (n === 0 && key !== 'cycleColumn') throw new UsageError(`--columns: column numbers start at 1, got ${part.trim()}`);
    o[key] = n - 1;
  }
  return o;
}
