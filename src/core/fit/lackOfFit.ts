/**
 * Lack-of-fit test of a finished fit, per voltammogram: the residuals are systematic when their
 * rms is well above the noise of the data (estimated from the point-to-point scatter of the
 * measured current, madSecondDifferenceNoise.ts) and they are strongly autocorrelated in the order
 * of the sweep (Durbin–Watson statistic d = Σ(e_k − e_{k−1})² / Σe_k²; d ≈ 2 for independent
 * residuals, d → 0 for smooth ones).
 * Source: J. Durbin, G. S. Watson, "Testing for serial correlation in least squares regression
 *   I", Biometrika 37 (1950) 409 (the statistic). Thresholds: rms > 3× the noise, d < 1 (a lag-one
 *   correlation above about 0.5; far beyond the 5 % critical values for hundreds of points), and
 *   rms above 0.1 % of the file's largest current (ten times the simulator's own error, so that
 *   noiseless data fitted by the exact model are not flagged): common practice, no source.
 * In: the fit context and the residuals (measured − model, A) in the records' order. Out: the
 *   files that fail, with their numbers, and a note in words (null when none fails).
 */
import { madSecondDifferenceNoise } from '../peaks/madSecondDifferenceNoise';
import type { PreparedRecord } from './fitRecords';
import type { FitMechanism } from './fitTypes';

export interface LackOfFitRecord {
  scanRateVPerS: number;
  rmsA: number;
  noiseA: number;
  durbinWatson: number;
}

const NOISE_FACTOR = 3;
const DURBIN_WATSON_LIMIT = 1;
const MODEL_ERROR_FRACTION = 1e-3;

export function durbinWatson(residuals: ArrayLike<number>, start = 0, end = residuals.length): number {
  let num = 0;
  let den = 0;
  for (let k = start; k < end; k++) {
    const e = residuals[k] as number;
    den += e * e;
    if (k > start) num += (e - (residuals[k - 1] as number)) ** 2;
  }
  return den > 0 ? num / den : 2;
}

const OMITTED: Record<FitMechanism, string> = {
  E: 'uncompensated resistance (give --ru or fit Ru), a follow-up reaction (try the EC mechanism), or the background and charging current (subtract a blank or fit the background)',
  EC: 'uncompensated resistance (give --ru or fit Ru), a different chemistry after the electron transfer, or the background and charging current (subtract a blank or fit the background)',
  surface: 'uncompensated resistance (give --ru or fit Ru), interactions in the film or a spread of E°′, or the background and charging current (subtract a blank or fit the background)',
};

export function lackOfFit(records: readonly PreparedRecord[], residualsA: Float64Array, mechanism: FitMechanism): { failing: LackOfFitRecord[]; note: string | null } {
  const failing: LackOfFitRecord[] = [];
  for (const r of records) {
    const n = r.indices.length;
    if (n < 10) continue;
    let ss = 0;
    let largest = 0;
    for (let i = 0; i < n; i++) {
      ss += (residualsA[r.offset + i] as number) ** 2;
      largest = Math.max(largest, Math.abs(r.currentA[i] as number));
    }
    const rmsA = Math.sqrt(ss / n);
    const noiseA = madSecondDifferenceNoise(r.currentA);
    const d = durbinWatson(residualsA, r.offset, r.offset + n);
    if (rmsA > NOISE_FACTOR * noiseA && d < DURBIN_WATSON_LIMIT && rmsA > MODEL_ERROR_FRACTION * largest) {
      failing.push({ scanRateVPerS: r.scanRateVPerS, rmsA, noiseA, durbinWatson: d });
    }
  }
  if (failing.length === 0) return { failing, note: null };
  const worst = failing.reduce((a, b) => (b.rmsA / b.noiseA > a.rmsA / a.noiseA ? b : a));
  const rates = failing.map((f) => Number(f.scanRateVPerS.toPrecision(3))).join(', ');
  const note = `systematic misfit: the model does not describe these data (${failing.length} of ${records.length} file(s), at ${rates} V/s; worst: residual rms ${worst.rmsA.toExponential(2)} A, `
    + `${Number((worst.rmsA / worst.noiseA).toPrecision(2))}× the noise of the measured point-to-point scatter, Durbin–Watson d = ${worst.durbinWatson.toFixed(2)}). `
    + `Likely an effect the model leaves out: ${OMITTED[mechanism]}. The values are then not measurements, and their intervals and bounds do not hold`;
  return { failing, note };
}
