/**
 * Forward-peak width |Ep − Ep/2| of a reversible electron transfer followed by a first-order
 * reaction (EC) against λ = k_f·RT/(nFv), and the least λ a measured width allows.
 * In: λ (pure number), or a measured width (V) with its uncertainty (V), n and T.
 * Out: the width in units of RT/nF; the least λ (null when the width is too wide for the kinetic
 *   end, i.e. it bounds nothing).
 * Source: R. S. Nicholson, I. Shain, Anal. Chem. 36 (1964) 706 (from memory): the width goes from
 *   2.20·RT/nF (no reaction) to 1.857·RT/nF in the pure kinetic zone, where the wave has the shape
 *   of an irreversible one with αn replaced by n. Between them the printed curve is not to hand, so
 *   it is computed with this project's simulator (src/core/simulation, EC mechanism; validated
 *   against 0.4463 and the Nicholson–Shain kinetic-zone Ep), 0.5 mV steps, at the λ of a grid;
 *   linear in ln λ between grid points.
 * Use (ours): the width falls as λ grows, so a width at most w + u (u its uncertainty) puts λ at
 *   or above the grid λ where the curve reaches w + u: a lower bound of k_f that the shape of the
 *   fastest file supports.
 */
import { assertFiniteInRange } from '../errors';
import { inverseThermalVoltagePerV, STANDARD_TEMPERATURE_K } from '../constants';
import { simulateCv } from '../simulation';
import { oneCyclePeaks } from '../simulation/simulatedPeaks';

const GRID = [0.1, 0.3, 1, 2, 3, 5, 10, 30, 100, 1000];
let table: number[] | null = null;

/** |Ep − Ep/2| of the simulated forward peak in units of RT/F (n = 1, 25 °C). */
function simulatedWidth(lambda: number): number {
  const f = inverseThermalVoltagePerV(STANDARD_TEMPERATURE_K);
  const r = simulateCv({ mechanism: 'EC', k0CmPerS: 1e4, followUpRatePerS: lambda * f, scanRateVPerS: 1, startV: 0.35, switchV: -0.4, stepV: 0.0005, cycles: 1 });
  const peak = oneCyclePeaks(r, 'cathodic').forward;
  let k = peak.index;
  while (k > 0 && -(r.currentA[k] as number) > -peak.currentA / 2) k--;
  const i0 = -(r.currentA[k] as number);
  const i1 = -(r.currentA[k + 1] as number);
  const e = (r.potentialV[k] as number) + ((-peak.currentA / 2 - i0) / (i1 - i0)) * ((r.potentialV[k + 1] as number) - (r.potentialV[k] as number));
  return Math.abs(e - peak.potentialV) * f;
}

function widths(): number[] {
  table ??= GRID.map(simulatedWidth);
  return table;
}

/** |Ep − Ep/2| in units of RT/nF at λ (held at the ends of the grid). */
export function followUpPeakWidth(lambda: number): number {
  assertFiniteInRange('lambda', lambda, 0);
  const w = widths();
  if (lambda <= GRID[0]!) return w[0]!;
  for (let k = 1; k < GRID.length; k++) {
    if (lambda <= GRID[k]!) return w[k - 1]! + (Math.log(lambda / GRID[k - 1]!) / Math.log(GRID[k]! / GRID[k - 1]!)) * (w[k]! - w[k - 1]!);
  }
  return w[w.length - 1]!;
}

/** The least λ whose width is at most widthV + uncertaintyV; null when even the slowest end is narrower. */
export function followUpLeastLambdaFromWidth(widthV: number, uncertaintyV: number, options: { electronCount?: number; temperatureK?: number } = {}): number | null {
  assertFiniteInRange('widthV', widthV, 0);
  assertFiniteInRange('uncertaintyV', uncertaintyV, 0);
  const nf = (options.electronCount ?? 1) * inverseThermalVoltagePerV(options.temperatureK ?? STANDARD_TEMPERATURE_K);
  const limit = (widthV + uncertaintyV) * nf;
  const w = widths();
  if (w[0]! <= limit) return null;
  for (let k = 1; k < GRID.length; k++) {
    if (w[k]! <= limit) return Math.exp(Math.log(GRID[k - 1]!) + ((w[k - 1]! - limit) / (w[k - 1]! - w[k]!)) * Math.log(GRID[k]! / GRID[k - 1]!));
  }
  return GRID[GRID.length - 1]!;
}
