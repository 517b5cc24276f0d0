/**
 * Is a fitted electron-transfer rate constant (k° of a dissolved couple, k_s of a film) a
 * measurement, or only a sign that the waves are reversible? Two physical tests, either of which
 * makes it a lower bound:
 * 1. Regime: at the fastest scan rate of the series the couple is still in the reversible zone.
 *    Dissolved couple: Λ = k°/(D_O^(1−α)·D_R^α·nFv/RT)^½ ≥ 15 (H. Matsuda, Y. Ayabe, Z. Elektrochem.
 *    59 (1955) 494: reversible for Λ ≥ 15; from memory). Film: Laviron's m = RT·k_s/(nFv) ≥ 12
 *    (E. Laviron, J. Electroanal. Chem. 101 (1979) 19, defines m; the value 12 is ours: with this
 *    project's simulator the film's ΔEp exceeds its Nernstian value there by 3.1 mV, as a dissolved
 *    couple's does at Λ = 15 — computed, not from the paper).
 * 2. Resolution: at every scan rate both peaks of the couple, simulated alone (no R_u, no C_dl)
 *    with the fitted constant, lie closer to those of the Nernstian limit than the spacing of the
 *    measured points. The data then hold nothing that tells the fitted value from infinity; the
 *    value reflects the model's small mismatches (sampling, background), not kinetics.
 *    Common practice, no source.
 * In: the fit context, the fitted values, the couple and the parameter. Out: null (a measurement)
 *   or the reason in words, with the numbers behind it.
 */
import { inverseThermalVoltagePerV } from '../constants';
import { simulateCv, type CvSimulationInput } from '../simulation';
import { oneCyclePeaks } from '../simulation/simulatedPeaks';
import type { FitContext } from './fitProblem';
import type { PreparedRecord } from './fitRecords';
import type { FitModelValues } from './fitTypes';

/** Matsuda & Ayabe (1955): the reversible zone of a dissolved couple. */
export const REVERSIBLE_LAMBDA = 15;
/** Film: the m with the same ΔEp excess (3.1 mV) as Λ = 15 (computed with this simulator). */
export const REVERSIBLE_LAVIRON_M = 12;

export interface UnresolvedRate {
  /** Λ (dissolved) or m (film) at the fastest scan rate. */
  regimeValue: number;
  /** Largest move of a peak from the Nernstian one over the files, V. */
  largestShiftV: number;
  /** Smallest spacing of the measured points over the files, V. */
  spacingV: number;
  reason: string;
}

export function reversibleLimitCheck(ctx: FitContext, values: FitModelValues, couple: number, parameter: 'k0CmPerS' | 'surfaceRatePerS'): UnresolvedRate | null {
  const c = values.couples[couple];
  if (!c) return null;
  const { settings, records } = ctx.model;
  const n = settings.electronCounts[couple] ?? settings.cell.electronCount;
  const f = n * inverseThermalVoltagePerV(settings.cell.temperatureK);
  const vMax = Math.max(...records.map((r) => r.scanRateVPerS));
  const surface = parameter === 'surfaceRatePerS';
  const rate = surface ? c.surfaceRatePerS : c.k0CmPerS;
  if (!(rate > 0) || !Number.isFinite(rate)) return null;
  const dO = c.diffusionOCm2PerS;
  const dR = dO / c.diffusionRatio;
  const regimeValue = surface ? rate / (f * vMax) : rate / Math.sqrt(dO ** (1 - c.alpha) * dR ** c.alpha * f * vMax);
  const reversibleZone = regimeValue >= (surface ? REVERSIBLE_LAVIRON_M : REVERSIBLE_LAMBDA);
  let largestShiftV = 0;
  let spacingV = Infinity;
  for (const r of records) {
    spacingV = Math.min(spacingV, medianSpacingV(r.potentialV));
    largestShiftV = Math.max(largestShiftV, peakShiftV(ctx, values, couple, r, surface));
  }
  const unresolved = largestShiftV < spacingV;
  if (!reversibleZone && !unresolved) return null;
  const name = surface ? 'k_s' : 'k°';
  const fastest = `at the fastest scan rate (${Number(vMax.toPrecision(3))} V/s)`;
  const zone = surface
    ? `m = RT·k_s/(nFv) = ${regimeValue.toPrecision(2)} ${fastest}, within the film's reversible range (m ≥ ${REVERSIBLE_LAVIRON_M}; Laviron 1979)`
    : `Λ = k°/(D·nFv/RT)^½ = ${regimeValue.toPrecision(2)} ${fastest}, within the reversible zone (Λ ≥ ${REVERSIBLE_LAMBDA}; Matsuda & Ayabe 1955)`;
  const shift = `the peaks lie ${(largestShiftV * 1e3).toPrecision(2)} mV or less from the Nernstian ones, below the ${(spacingV * 1e3).toPrecision(2)} mV point spacing`;
  const why = [reversibleZone ? zone : null, unresolved ? shift : null].filter(Boolean).join('; and ');
  const hold = `the other values come from the fit with this finite ${name}; hold ${name} at a large value (and α) to fit the Nernstian model itself`;
  return { regimeValue, largestShiftV, spacingV, reason: `the fitted ${name} of ${rate.toPrecision(3)} is not a measurement: ${why}. ${hold}` };
}

function medianSpacingV(e: Float64Array): number {
  const d: number[] = [];
  for (let i = 1; i < e.length; i++) {
    const s = Math.abs((e[i] as number) - (e[i - 1] as number));
    if (s > 0) d.push(s);
  }
  d.sort((a, b) => a - b);
  return d[Math.floor(d.length / 2)] ?? Infinity;
}

/** Largest move of the forward or return peak (the return one only where it is a peak) of the couple alone, finite constant against infinite, V. */
function peakShiftV(ctx: FitContext, values: FitModelValues, couple: number, r: PreparedRecord, surface: boolean): number {
  const { settings } = ctx.model;
  const c = values.couples[couple]!;
  const bulk = surface ? 0 : settings.cell.concentrationMolPerCm3;
  const input: Partial<CvSimulationInput> = {
    mechanism: settings.mechanism, formalPotentialV: c.formalPotentialV, k0CmPerS: c.k0CmPerS, alpha: c.alpha,
    electronCount: settings.electronCounts[couple] ?? settings.cell.electronCount,
    diffusionOCm2PerS: c.diffusionOCm2PerS, diffusionRCm2PerS: c.diffusionOCm2PerS / c.diffusionRatio,
    concentrationOMolPerCm3: settings.initialSpecies === 'O' ? bulk : 0, concentrationRMolPerCm3: settings.initialSpecies === 'R' ? bulk : 0,
    followUpRatePerS: c.followUpRatePerS, coverageMolPerCm2: c.coverageMolPerCm2, surfaceRatePerS: c.surfaceRatePerS,
    areaCm2: settings.cell.areaCm2, temperatureK: settings.cell.temperatureK, scanRateVPerS: r.scanRateVPerS,
    startV: r.startV, switchV: r.switchV, stepV: r.stepV, cycles: 1, doubleLayerFPerCm2: 0, uncompensatedOhm: 0,
  };
  const limit = surface ? { surfaceRatePerS: Infinity } : { k0CmPerS: Infinity };
  const direction = r.switchV < r.startV ? 'cathodic' : 'anodic';
  const fitted = oneCyclePeaks(simulateCv(input), direction);
  const nernst = oneCyclePeaks(simulateCv({ ...input, ...limit }), direction);
  const half = Math.round(Math.abs(r.switchV - r.startV) / r.stepV);
  const isPeak = (i: number) => i > half + 1 && i < 2 * half - 1;
  let shift = Math.abs(fitted.forward.potentialV - nernst.forward.potentialV);
  if (isPeak(fitted.reverse.index) && isPeak(nernst.reverse.index)) shift = Math.max(shift, Math.abs(fitted.reverse.potentialV - nernst.reverse.potentialV));
  return shift;
}
