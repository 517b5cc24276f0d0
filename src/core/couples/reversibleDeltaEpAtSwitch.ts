/**
 * Peak separation of a reversible (Nernstian) diffusing couple as a function of how far the switch
 * lies past the forward peak.
 * Source: R. S. Nicholson, "Theory and application of cyclic voltammetry for measurement of
 *   electrode reaction kinetics", Anal. Chem. 37 (1965) 1351, as tabulated in Bard & Faulkner,
 *   Electrochemical Methods, 2nd ed. (2001), §6.5 (from memory):
 *     n·(distance past forward peak) / mV: 71.5, 121.5, 171.5, 271.5, ∞
 *     n·ΔEp / mV:                          60.5,  59.2,  58.3,  57.8, 57.0 (= 2.218·RT/F)
 *   The first column is the distance past the forward peak; this project's simulator confirms
 *   that reading to better than 1 mV (src/core/simulation/simulateCv.reversible.test.ts).
 * In: distance of the switch past the forward peak (V, ≥ 0), n, temperature (K).
 * Out: expected ΔEp (V) and whether the distance lay inside the table.
 * Differences from the source: the table is for 25 °C; values are scaled with T through RT/F
 *   (both columns are multiples of RT/nF). Between rows: linear interpolation; past 271.5 mV the
 *   value approaches 2.218·RT/nF as 1/distance (our choice); below 71.5 mV the first row is used and
 *   `inTable` is false.
 */
import { AnalysisError } from '../errors';
import { thermalVoltageV, STANDARD_TEMPERATURE_K } from '../constants';

const RT_F_25C_MV = thermalVoltageV(STANDARD_TEMPERATURE_K) * 1000;
const PAST_PEAK_MV = [71.5, 121.5, 171.5, 271.5];
const DELTA_EP_MV = [60.5, 59.2, 58.3, 57.8];
const LIMIT_FACTOR = 2.218;

export interface ReversibleDeltaEpAtSwitchOptions {
  /** Electrons per molecule n. @default 1 */
  electronCount?: number;
  /** Temperature (K). @default 298.15 */
  temperatureK?: number;
}

export interface ReversibleDeltaEp {
  deltaEpV: number;
  inTable: boolean;
}

/** Large-switching-offset limit 2.218·RT/(nF), V. */
export function reversibleDeltaEpLimitV(electronCount: number, temperatureK: number): number {
  return (LIMIT_FACTOR * thermalVoltageV(temperatureK)) / electronCount;
}

export function reversibleDeltaEpAtSwitch(pastPeakV: number, options: ReversibleDeltaEpAtSwitchOptions = {}): ReversibleDeltaEp {
  const n = options.electronCount ?? 1;
  const temperatureK = options.temperatureK ?? STANDARD_TEMPERATURE_K;
  if (!Number.isFinite(pastPeakV) || pastPeakV < 0) {
    throw new AnalysisError('BAD_OPTION', `switching distance past the peak must be a finite potential ≥ 0 V, got ${pastPeakV}`);
  }
  const scale = thermalVoltageV(temperatureK) * 1000 / RT_F_25C_MV;
  // Table abscissa at 25 °C, in mV, of this (n, T).
  const x = (n * pastPeakV * 1000) / scale;
  const yMv = interpolate(x);
  return { deltaEpV: (yMv * scale) / (1000 * n), inTable: x >= (PAST_PEAK_MV[0] as number) };
}

/**
 * How far the peak midpoint (Epa + Epc)/2 of a reversible couple lies from its E½ towards the return
 * peak when the switch is this close: the forward peak stays 1.109·RT/nF before E½ (Nicholson &
 * Shain, Anal. Chem. 36 (1964) 706, Table I) and only the return peak moves, so the midpoint moves
 * by half of ΔEp's excess over 2.218·RT/nF (V, ≥ 0). Below the table's first row it is at least
 * the first row's value (`inTable` false).
 */
export function reversibleMidpointOffset(pastPeakV: number, options: ReversibleDeltaEpAtSwitchOptions = {}): ReversibleDeltaEp {
  const at = reversibleDeltaEpAtSwitch(pastPeakV, options);
  const limit = reversibleDeltaEpLimitV(options.electronCount ?? 1, options.temperatureK ?? STANDARD_TEMPERATURE_K);
  return { deltaEpV: (at.deltaEpV - limit) / 2, inTable: at.inTable };
}

function interpolate(x: number): number {
  const last = PAST_PEAK_MV.length - 1;
  if (x <= (PAST_PEAK_MV[0] as number)) return DELTA_EP_MV[0] as number;
  const limitMv = LIMIT_FACTOR * RT_F_25C_MV;
  if (x >= (PAST_PEAK_MV[last] as number)) {
    return limitMv + ((DELTA_EP_MV[last] as number) - limitMv) * ((PAST_PEAK_MV[last] as number) / x);
  }
  let k = 0;
  while (x > (PAST_PEAK_MV[k + 1] as number)) k++;
  const x0 = PAST_PEAK_MV[k] as number;
  const x1 = PAST_PEAK_MV[k + 1] as number;
  const y0 = DELTA_EP_MV[k] as number;
  const y1 = DELTA_EP_MV[k + 1] as number;
  return y0 + ((y1 - y0) * (x - x0)) / (x1 - x0);
}
