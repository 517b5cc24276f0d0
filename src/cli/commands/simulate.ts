/**
 * `halfwave simulate`: writes a simulated cyclic voltammogram as CSV to stdout.
 * Unit conversions happen here only: --conc in mM → mol/cm³, --temp in °C → K.
 */
import { ZERO_CELSIUS_K } from '../../core/constants';
import { DEFAULT_SIMULATION, simulateCv, type CvSimulationInput, type CvSimulationResult, type SimulationMechanism } from '../../core/simulation';
import { optionNumber, optionString, parseArgs, type OptionSpec, type ParsedArgs } from '../args';
import type { CliCommand } from '../command';
import { UsageError } from '../errors';

const d = DEFAULT_SIMULATION;

const HELP = `halfwave simulate: simulated cyclic voltammogram as CSV on stdout

Usage: halfwave simulate [options] > file.csv

Model: planar electrode, semi-infinite linear diffusion, O + n e- <=> R with Butler-Volmer kinetics
(E), plus a first-order decay of the electrogenerated species (EC), or an adsorbed couple with
Laviron kinetics (surface); double-layer charging and uncompensated resistance are solved at
every time step. Fully implicit finite differences (BDF2) on an expanding grid.

Options (default in brackets):
  --mechanism E|EC|surface  reaction scheme [E]
  --E0 V                 formal potential [${d.formalPotentialV}]
  --k0 CM_PER_S          standard rate constant; "inf" for a Nernstian couple [${d.k0CmPerS}]
  --alpha A              αc, the CATHODIC transfer coefficient of O + n e- -> R, 0.01-0.99;
                         the oxidation runs with 1 - αc [${d.alpha}]
  --n N                  electrons transferred, 1-6 [${d.electronCount}]
  --D CM2_PER_S          diffusion coefficient of O (and of R unless --DR) [${d.diffusionOCm2PerS}]
  --DR CM2_PER_S         diffusion coefficient of R [same as --D]
  --conc MM              bulk concentration of the species present at the start, mM [1]
  --initial O|R          species present at the start [R if the first sweep goes positive, else O]
  --area CM2             electrode area [${d.areaCm2}]
  --scan-rate V_PER_S    scan rate [${d.scanRateVPerS}]
  --start V              start potential [E0 + 0.3]
  --switch V             switching (vertex) potential [E0 - 0.3]
  --cycles N             number of cycles [${d.cycles}]
  --step V               potential increment between output points [${d.stepV}]
  --Cdl F_PER_CM2        double-layer capacitance per area [${d.doubleLayerFPerCm2}]
  --Ru OHM               uncompensated resistance [${d.uncompensatedOhm}]
  --kf PER_S             EC: rate constant of the follow-up reaction [${d.followUpRatePerS}]
  --gamma MOL_PER_CM2    surface: total coverage [${d.coverageMolPerCm2}]
  --ks PER_S             surface: Laviron rate constant; "inf" for a Nernstian film [${d.surfaceRatePerS}]
  --temp CELSIUS         temperature [25]
  --all-columns          also write interfacial_potential_V, faradaic_current_A, charging_current_A

Output: header time_s,potential_V,current_A (potential = applied), one row per point; currents
follow the IUPAC convention (anodic positive).
Example: halfwave simulate --k0 0.01 --scan-rate 1 --Ru 50 --Cdl 2e-5 > quasi_1Vs.csv
`;

const VALUE: OptionSpec = { value: true };
const SPEC: Record<string, OptionSpec> = {
  mechanism: VALUE, E0: VALUE, k0: VALUE, alpha: VALUE, n: VALUE, D: VALUE, DR: VALUE, conc: VALUE, initial: VALUE,
  area: VALUE, 'scan-rate': VALUE, start: VALUE, switch: VALUE, cycles: VALUE, step: VALUE, Cdl: VALUE, Ru: VALUE,
  kf: VALUE, gamma: VALUE, ks: VALUE, temp: VALUE, 'all-columns': { value: false },
};

/** A positive rate constant, or Infinity for "inf". */
function rateOption(args: ParsedArgs, name: string, fallback: number): number {
  const raw = optionString(args, name);
  if (raw !== undefined && /^\+?inf(inity)?$/i.test(raw.trim())) return Infinity;
  const value = optionNumber(args, name, fallback, 0);
  if (!(value > 0)) throw new UsageError(`--${name} must be positive (or "inf"), got ${value}`);
  return value;
}

function mechanismOption(args: ParsedArgs): SimulationMechanism {
  const raw = optionString(args, 'mechanism') ?? 'E';
  if (raw !== 'E' && raw !== 'EC' && raw !== 'surface') throw new UsageError(`--mechanism must be E, EC or surface, got "${raw}"`);
  return raw;
}

export function simulationInputFromArgs(args: ParsedArgs): CvSimulationInput {
  const e0 = optionNumber(args, 'E0', d.formalPotentialV);
  const startV = optionNumber(args, 'start', e0 + 0.3);
  const switchV = optionNumber(args, 'switch', e0 - 0.3);
  const initial = optionString(args, 'initial') ?? (switchV > startV ? 'R' : 'O');
  if (initial !== 'O' && initial !== 'R') throw new UsageError(`--initial must be O or R, got "${initial}"`);
  const concMolPerCm3 = optionNumber(args, 'conc', 1, 0) * 1e-6;
  const dO = optionNumber(args, 'D', d.diffusionOCm2PerS);
  return {
    mechanism: mechanismOption(args),
    formalPotentialV: e0,
    k0CmPerS: rateOption(args, 'k0', d.k0CmPerS),
    alpha: optionNumber(args, 'alpha', d.alpha),
    electronCount: optionNumber(args, 'n', d.electronCount),
    diffusionOCm2PerS: dO,
    diffusionRCm2PerS: optionNumber(args, 'DR', dO),
    concentrationOMolPerCm3: initial === 'O' ? concMolPerCm3 : 0,
    concentrationRMolPerCm3: initial === 'R' ? concMolPerCm3 : 0,
    areaCm2: optionNumber(args, 'area', d.areaCm2),
    temperatureK: optionNumber(args, 'temp', 25, -100, 400) + ZERO_CELSIUS_K,
    scanRateVPerS: optionNumber(args, 'scan-rate', d.scanRateVPerS),
    startV,
    switchV,
    cycles: optionNumber(args, 'cycles', d.cycles),
    stepV: optionNumber(args, 'step', d.stepV),
    doubleLayerFPerCm2: optionNumber(args, 'Cdl', d.doubleLayerFPerCm2),
    uncompensatedOhm: optionNumber(args, 'Ru', d.uncompensatedOhm),
    followUpRatePerS: optionNumber(args, 'kf', d.followUpRatePerS),
    coverageMolPerCm2: optionNumber(args, 'gamma', d.coverageMolPerCm2),
    surfaceRatePerS: rateOption(args, 'ks', d.surfaceRatePerS),
  };
}

/** Nine significant digits: far below any instrument's resolution, and round-trips cleanly. */
const num = (x: number) => String(Number(x.toPrecision(9)));

export function simulationToCsv(r: CvSimulationResult, allColumns: boolean): string {
  const header = allColumns
    ? 'time_s,potential_V,current_A,interfacial_potential_V,faradaic_current_A,charging_current_A'
    : 'time_s,potential_V,current_A';
  const lines = [header];
  for (let i = 0; i < r.timeS.length; i++) {
    const base = `${num(r.timeS[i] as number)},${num(r.potentialV[i] as number)},${num(r.currentA[i] as number)}`;
    lines.push(allColumns
      ? `${base},${num(r.interfacialPotentialV[i] as number)},${num(r.faradaicCurrentA[i] as number)},${num(r.chargingCurrentA[i] as number)}`
      : base);
  }
  return `${lines.join('\n')}\n`;
}

export const simulateCommand: CliCommand = {
  name: 'simulate',
  summary: 'write a simulated cyclic voltammogram (E, EC or adsorbed couple) as CSV',
  help: HELP,
  run: async (argv, io) => {
    const args = parseArgs(argv, SPEC);
    if (args.positionals.length) throw new UsageError(`simulate takes no file arguments, got "${args.positionals[0]}"`);
    const result = simulateCv(simulationInputFromArgs(args));
    io.stdout(simulationToCsv(result, args.flags.has('all-columns')));
    return 0;
  },
};
