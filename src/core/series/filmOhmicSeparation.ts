/**
 * Peak separation that an uncompensated resistance alone gives a Nernstian surface-confined film,
 * and the Ru (Ω) that one file's ΔEp would need if all of it were ohmic.
 * In: rho = ip,N·Ru·nF/RT, the drop at the film's Nernstian peak current ip,N = n²F²AΓv/(4RT)
 *   = nFQv/(4RT) (Q = nFAΓ, the peak charge) in units of RT/(nF); for the resistance deltaEpV
 *   (V), the forward peak charge (C, magnitude), scanRateVPerS, electronCount, temperatureK.
 *   Out: nFΔEp/RT (pure number); Ru in Ω.
 * Why a film differs from a diffusing couple: its current is ∝ v, so its ohmic drop (∝ ip·Ru) grows
 *   ∝ v, while slow kinetics widen ΔEp ∝ log v once n·ΔEp > 200 mV (Laviron, J. Electroanal. Chem.
 *   101, 19 (1979), from memory). At small ρ the separation is 4ρ (derived here: with
 *   i = v·g(E − i·Ru)·(1 − Ru·di/dE) for the film's Nernstian wave g, the first order in Ru moves
 *   each peak by 2·ip·Ru), twice the 2·ip·Ru often assumed.
 * Method: nFΔEp/RT depends on ρ alone (i/ip,N = 4θ(1 − θ)·dξ_int/dξ with ξ_int = ξ − ρ·i/ip,N).
 *   It is computed with this project's simulator (src/core/simulation, ohmic coupling solved per
 *   step) in one canonical cell, the forward peak's shift with Ru less the shift without (so the
 *   step lag cancels), twice (the Nernstian film's two peaks are mirror images), on a table of ρ
 *   from 0.01 to 30, interpolated in log–log. The double layer is left out (Ru·Cd·A ≪ RT/(nFv)).
 * Difference from the source: a numerical working curve, ours.
 */
import { assertFiniteInRange } from '../errors';
import { FARADAY_C_PER_MOL, STANDARD_TEMPERATURE_K, thermalVoltageV } from '../constants';
import { simulateCv } from '../simulation';

/** Smallest and largest ρ of the table. */
export const FILM_OHMIC_RHO_RANGE: readonly [number, number] = [0.01, 30];
const TABLE_POINTS = 25;

const CANON = { area: 1, gamma: 1e-10, v: 1 };

function canonicalPeakCurrentA(): number {
  return (FARADAY_C_PER_MOL * FARADAY_C_PER_MOL * CANON.area * CANON.gamma * CANON.v) / (4 * FARADAY_C_PER_MOL * thermalVoltageV(STANDARD_TEMPERATURE_K));
}

/** Where the forward (cathodic) peak lies (V) in the canonical cell with Ru. */
function forwardPeakV(ruOhm: number, dropV: number): number {
  const stepV = 0.0005;
  const r = simulateCv({
    mechanism: 'surface', surfaceRatePerS: Infinity, coverageMolPerCm2: CANON.gamma, areaCm2: CANON.area, formalPotentialV: 0, electronCount: 1,
    startV: 0.3 + dropV, switchV: -0.3 - 3 * dropV, stepV, scanRateVPerS: CANON.v, uncompensatedOhm: ruOhm, doubleLayerFPerCm2: 0,
  }, { firstSweepOnly: true });
  let k = 0;
  for (let j = 1; j < r.currentA.length; j++) if ((r.currentA[j] as number) < (r.currentA[k] as number)) k = j;
  const [a, b, c] = [r.currentA[k - 1] ?? 0, r.currentA[k] as number, r.currentA[k + 1] ?? 0];
  const den = a - 2 * b + c;
  const shift = den > 0 ? (0.5 * (a - c)) / den : 0;
  return (r.potentialV[k] as number) - shift * stepV;
}

let table: { logRho: number[]; logSep: number[] } | null = null;

function separationTable() {
  if (table) return table;
  const rt = thermalVoltageV(STANDARD_TEMPERATURE_K);
  const ip = canonicalPeakCurrentA();
  const lag = forwardPeakV(0, 0);
  const [lo, hi] = FILM_OHMIC_RHO_RANGE;
  const logRho: number[] = [];
  const logSep: number[] = [];
  for (let j = 0; j < TABLE_POINTS; j++) {
    const rho = lo * (hi / lo) ** (j / (TABLE_POINTS - 1));
    const drop = rho * rt;
    logRho.push(Math.log(rho));
    logSep.push(Math.log((2 * (lag - forwardPeakV(drop / ip, drop))) / rt));
  }
  table = { logRho, logSep };
  return table;
}

function interpolate(xs: number[], ys: number[], x: number): number {
  let j = 1;
  while (j < xs.length - 1 && (xs[j] as number) < x) j++;
  const [x0, x1, y0, y1] = [xs[j - 1] as number, xs[j] as number, ys[j - 1] as number, ys[j] as number];
  return y0 + ((y1 - y0) * (x - x0)) / (x1 - x0);
}

/** nFΔEp/RT of a Nernstian film with the ohmic parameter ρ (0.01–30; 4ρ below). */
export function nernstianFilmOhmicSeparation(rho: number): number {
  assertFiniteInRange('rho', rho, 0, FILM_OHMIC_RHO_RANGE[1]);
  if (rho < FILM_OHMIC_RHO_RANGE[0]) return 4 * rho;
  const t = separationTable();
  return Math.exp(interpolate(t.logRho, t.logSep, Math.log(rho)));
}

/**
 * Ru (Ω) that would give a Nernstian film this ΔEp at this scan rate and charge; null when the
 * separation lies beyond the table (ρ > 30).
 */
export function filmResistanceFromSeparation(input: { deltaEpV: number; chargeC: number; scanRateVPerS: number; electronCount: number; temperatureK?: number }): number | null {
  const t = input.temperatureK ?? STANDARD_TEMPERATURE_K;
  assertFiniteInRange('deltaEpV', input.deltaEpV, 0);
  assertFiniteInRange('chargeC', Math.abs(input.chargeC), Number.MIN_VALUE);
  assertFiniteInRange('scanRateVPerS', input.scanRateVPerS, Number.MIN_VALUE);
  assertFiniteInRange('electronCount', input.electronCount, Number.MIN_VALUE);
  const rtNf = thermalVoltageV(t) / input.electronCount;
  const sep = input.deltaEpV / rtNf;
  const tb = separationTable();
  let rho: number;
  if (sep < 4 * FILM_OHMIC_RHO_RANGE[0]) rho = sep / 4;
  else if (Math.log(sep) > (tb.logSep[tb.logSep.length - 1] as number)) return null;
  else rho = Math.exp(interpolate(tb.logSep, tb.logRho, Math.log(sep)));
  const ipN = (Math.abs(input.chargeC) * input.scanRateVPerS) / (4 * rtNf);
  return (rho * rtNf) / ipN;
}
