/**
 * `halfwave fit FILE...`: whole-curve fit of the simulator to the measured voltammograms
 * (src/core/fit). Files given together form one series fitted jointly. Reads files as `analyze`
 * does; prints the JSON contract (--json) or a readable report.
 */
import { ZERO_CELSIUS_K } from '../../core/constants';
import { nearestBlank, subtractBlank } from '../../core/background';
import { fitWithComparison, perAreaFit, type FitCell, type FitInput, type FitVoltammogramsOptions, type FitWithComparisonResult } from '../../core/fit';
import { cellFromHeaders, fitContract, summariseComparison, type Measurement } from '../../io';
import { parseArgs, type OptionSpec } from '../args';
import type { CliCommand, CliIo } from '../command';
import { UsageError } from '../errors';
import { parseFitArgs, type FitArgs } from '../fitArgs';
import { fitText } from '../fitText';
import { readInputs } from '../readInputs';
import { IMPORT_OPTION_HELP, IMPORT_OPTION_SPEC, parseOverrides } from './analyze';

const V: OptionSpec = { value: true };
const SPEC: Record<string, OptionSpec> = {
  mechanism: V, couples: V, free: V, start: V, window: V, cycle: V, compare: V, 'max-iterations': V,
  area: V, conc: V, n: V, temp: V, 'scan-rate': V, ru: V, blank: { value: true, repeat: true }, json: { value: false }, ...IMPORT_OPTION_SPEC,
};

const HELP = `Usage: halfwave fit FILE|FOLDER... [options]

Fits simulated voltammograms to the measured current over a potential window (nonlinear least
squares, Levenberg–Marquardt). Files given together form one series fitted jointly: every
parameter is shared by all files, except a straight background per file when it is fitted.
Starting values come from the peak analysis. Each file's cycle must run start → vertex → start.

Model:
  --mechanism M         E (electron transfer, Butler–Volmer) | EC (E plus a first-order decay of
                        the product) | surface (adsorbed film, Laviron kinetics) [E]
  --couples N           independent couples (species) in the record, 1-4 [1]
  --free LIST           parameters to fit, comma-separated [E: E0,k0,alpha,D,Cdl;
                        EC: E0,k0,alpha,D,kf,Cdl; surface: E0,alpha,gamma,ks,Cdl]. Names and units:
                          E0 formal potential (V)       k0 standard rate constant (cm/s)
                          alpha transfer coefficient    D diffusion coefficient D_O (cm²/s)
                          Dratio D_O/D_R                kf follow-up rate constant (1/s)
                          gamma film coverage (mol/cm²) ks film rate constant (1/s)
                          Ru uncompensated resistance (Ω)  Cdl double-layer capacitance (F/cm²)
                          background straight line a + b·E per file
  --start LIST          starting values of fitted parameters and values of held ones, units as
                        above, [j] = couple j in order of E°′, e.g. k0=0.01,alpha=0.5,E0[2]=-0.1
                        [from the peak analysis; alpha 0.5, Dratio 1]
  --window LO:HI        potential window fitted, V, on both sweeps [the whole cycle]
  --cycle N             cycle fitted; earlier cycles are simulated too [1]
  --max-iterations N    Levenberg–Marquardt iterations at most [60]
  --compare C           auto | none | mechanism (E against EC) | ru (Ru fitted against held):
                        also fit the alternative and recommend one by BIC [auto: E against EC
                        for two or more files with mechanism E or EC, else none]

Cell (the same for all files, never fitted):
  --area CM2            electrode area, cm² [the files' preamble; required otherwise]
  --conc MM             bulk concentration of the species present at the start, mM (mmol/L)
                        [the files' preamble; required for E and EC]
  --n N                 electrons per molecule, 1-6 [1]
  --temp CELSIUS        temperature, °C [the files', else 25]
  --scan-rate V_PER_S   scan rate of every file, V/s [time column, preamble or file name]
  --ru OHM              uncompensated resistance, Ω: held at this value, or the start when Ru is
                        in --free [held at 0; estimated from ΔEp across the files when fitted]
  --blank FILE          a blank (supporting electrolyte alone, same electrode), subtracted before
                        the fit as analyze does; repeatable or a folder: each file subtracts the
                        blank nearest its scan rate, named in the notes

Output:
  --json                one JSON object on stdout: mechanism, params (first couple in order of
                        E°′, with Ru and Cdl), stderr, bounds (95 % intervals; [lo, null] for a
                        lower bound), couples (same keys per couple), correlation {labels,
                        matrix}, rms (A), iterations, converged, notes, and extra fields. A
                        value the data give only as a bound (k° of a reversible couple) is null.

${IMPORT_OPTION_HELP}
Exit codes: 0 done (also when the fit did not converge: "converged": false), 1 internal fault,
2 bad arguments or unreadable input.
`;

export const fitCommand: CliCommand = {
  name: 'fit',
  summary: 'fit simulated voltammograms to one file or a scan-rate series (E, EC, surface)',
  help: HELP,
  run: async (argv: string[], io: CliIo) => {
    const parsed = parseArgs(argv, SPEC);
    const args = parseFitArgs(parsed);
    const overrides = parseOverrides(parsed);
    const read = readInputs(args.files, { overrides });
    const names = read.files.map((f) => f.path);
    const blankPaths = parsed.options.get('blank') ?? [];
    const blanks = blankPaths.length ? readInputs(blankPaths, { overrides }).measurements : [];
    const { measurements, notes } = withBlanksSubtracted(read.measurements, blanks, names);
    const { input, notes: cellNotes } = fitInput(measurements, args, names);
    notes.push(...cellNotes);
    const fitted = runFit(input, args, names);
    const { comparison } = fitted;
    const result = notes.length ? { ...fitted.result, notes: [...notes, ...fitted.result.notes] } : fitted.result;
    const summary = comparison ? summariseComparison(comparison) : null;
    io.stdout(args.json ? `${JSON.stringify(fitContract(result, names, summary), null, 2)}\n` : fitText(result, names, summary));
    return 0;
  },
};

/** Each file minus the blank nearest its scan rate (core/background, as analyze and the screen do), with the pairing as a note. */
function withBlanksSubtracted(measurements: Measurement[], blanks: Measurement[], names: string[]): { measurements: Measurement[]; notes: string[] } {
  if (!blanks.length) return { measurements, notes: [] };
  const rates = blanks.map((b) => ({ fileName: b.fileName, scanRateVPerS: b.scanRateVPerS }));
  const pairs: string[] = [];
  const out = measurements.map((m, k) => {
    const blank = blanks.find((b) => b.fileName === nearestBlank(m.scanRateVPerS, rates));
    if (!blank) return m;
    if ((blank.currentKind ?? 'current') !== (m.currentKind ?? 'current')) throw new UsageError(`"${names[k]}" and its blank "${blank.fileName}" hold different kinds of current (density and current)`);
    pairs.push(`${names[k]} − ${blank.fileName}`);
    return { ...m, currentA: subtractBlank(m, blank).currentA };
  });
  return { measurements: out, notes: [`blank subtracted before the fit, as in the analysis: ${pairs.join('; ')}`] };
}

function fitInput(measurements: Measurement[], args: FitArgs, names: string[]): { input: FitInput; notes: string[] } {
  measurements.forEach((m, k) => {
    if (!m.scanRateVPerS) throw new UsageError(`"${names[k]}" has no scan rate (no time column, preamble or file name gives one): give --scan-rate`);
  });
  // The files' headers as analyze and the screen read them (io/cellFromHeaders.ts), then the flags.
  const headers = cellFromHeaders(measurements).values;
  // Current densities (A/cm², no area stated) are fitted per cm² (core/fit/perAreaFit.ts); --area is then not used.
  const densities = measurements.some((m) => m.currentKind === 'density');
  const areaCm2 = densities ? 1 : args.areaCm2 ?? headers.areaCm2;
  if (areaCm2 === undefined) throw new UsageError('the electrode area is needed: give --area CM2 (no file states it)');
  const conc = args.concentrationMolPerCm3 ?? headers.concentrationMolPerCm3;
  if (conc === undefined && args.mechanism !== 'surface') throw new UsageError('the bulk concentration is needed for E and EC: give --conc MM');
  const cell: FitCell = {
    areaCm2, concentrationMolPerCm3: conc ?? 0, electronCount: args.electronCount ?? 1,
    temperatureK: args.temperatureK ?? headers.temperatureK ?? 25 + ZERO_CELSIUS_K,
  };
  // --ru is given per cm² for densities (R_u·A, Ω·cm²), so it passes as it is.
  const perArea = perAreaFit(measurements, cell, undefined, null);
  return { input: { records: measurements, cell: perArea.cell }, notes: perArea.notes };
}

function runFit(input: FitInput, args: FitArgs, names: string[]): FitWithComparisonResult {
  const options: FitVoltammogramsOptions = { mechanism: args.mechanism, coupleCount: args.coupleCount, cycle: args.cycle, start: args.start, maxIterations: args.maxIterations };
  if (args.free) options.free = args.free;
  if (args.windowV) options.windowV = args.windowV;
  const compare = args.compare === 'auto' ? (input.records.length > 1 && args.mechanism !== 'surface' ? 'mechanism' : 'none') : args.compare;
  if (compare === 'mechanism' && args.mechanism === 'surface') throw new UsageError('--compare mechanism compares E with EC; it does not apply to --mechanism surface');
  // The core numbers voltammograms from 1; the user knows them by file name.
  return fitWithComparison(input, options, { compare, recordNames: names });
}
