/**
 * Each file of a surface-confined series read on Laviron's general working curve
 * (kinetics/lavironWorkingCurve.ts): at each αc of a set, the k_s its ΔEp gives, the E°′ its two
 * peaks then give, and its forward peak current over the Nernstian one; and the Ru (Ω) its ΔEp
 * would need if the film were Nernstian and all of it ohmic (series/filmOhmicSeparation.ts).
 * Sources: Laviron, J. Electroanal. Chem. 101, 19 (1979) (from memory); E°′ = Epc − ξc·RT/nF =
 *   Epa − ξa·RT/nF, averaged, from the same curve (for n·ΔEp > 200 mV this is
 *   αc·Epc + (1 − αc)·Epa − (RT/nF)·ln((1 − αc)/αc), his two peak lines).
 * Resolution (ours; common practice, no source): a file enters only when n·ΔEp ≥ 5 mV; below that
 *   the reading's point spacing, baseline and the instrument's sampling lag are as large as the
 *   kinetic shift, so such a file bounds k_s from below only.
 */
import { thermalVoltageV } from '../constants';
import { AnalysisError } from '../errors';
import { lavironRateConstantFromSeparation } from '../kinetics/lavironWorkingCurve';
import type { PeakDirection } from '../peaks/peakTypes';
import { filmResistanceFromSeparation } from '../series/filmOhmicSeparation';
import type { SeriesPoint } from '../series/seriesPoint';
import type { ResolvedSeriesOptions } from './seriesFits';

/** Smallest n·ΔEp (V) a file's k_s is read from. */
export const KS_MIN_N_DELTA_EP_V = 0.005;

export interface SurfaceFileReading {
  fileIndex: number;
  scanRateVPerS: number;
  deltaEpV: number;
  /** Per αc of the set, in its order; null where the curve does not reach the ΔEp. */
  atAlpha: Array<{ alphaC: number; ksPerS: number; formalPotentialV: number | null; forwardPeakRatio: number } | null>;
  /**
   * Forward ip over the Nernstian one at αc = 0.5, where it falls steadily with ΔEp (at a forward
   * α above 0.68 the irreversible ψ = α/e exceeds 1/4, so the ratio alone does not bound ΔEp).
   */
  midAlphaPeakRatio: number | null;
  /** Ru (Ω) a Nernstian film would need for this ΔEp; null without a charge or beyond the table. */
  ohmicRuOhm: number | null;
}

function atAlpha(p: SeriesPoint, alphaC: number, o: ResolvedSeriesOptions, forward: PeakDirection) {
  try {
    const r = lavironRateConstantFromSeparation({ deltaEpV: p.deltaEpV!, scanRateVPerS: p.scanRateVPerS, electronCount: o.electronCount }, { alpha: alphaC, temperatureK: o.temperatureK });
    const rtNf = thermalVoltageV(o.temperatureK) / o.electronCount;
    const e0 = p.epaV !== null && p.epcV !== null ? ((p.epcV - r.cathodic.xi * rtNf) + (p.epaV - r.anodic.xi * rtNf)) / 2 : null;
    const psi = forward === 'cathodic' ? r.cathodic.psi : r.anodic.psi;
    return { alphaC, ksPerS: r.ksPerS, formalPotentialV: e0, forwardPeakRatio: psi / 0.25 };
  } catch (err) {
    if (err instanceof AnalysisError) return null;
    throw err;
  }
}

/** The files with n·ΔEp ≥ 5 mV, each at every αc of `alphas`. */
export function readSurfaceFiles(points: SeriesPoint[], alphas: readonly number[], o: ResolvedSeriesOptions, forward: PeakDirection): SurfaceFileReading[] {
  return points.flatMap((p) => {
    if (p.deltaEpV === null || o.electronCount * p.deltaEpV < KS_MIN_N_DELTA_EP_V) return [];
    const q = p.forwardChargeC ?? p.anodicChargeC ?? p.cathodicChargeC;
    const ru = q !== null && q !== 0 ? filmResistanceFromSeparation({ deltaEpV: p.deltaEpV, chargeC: q, scanRateVPerS: p.scanRateVPerS, electronCount: o.electronCount, temperatureK: o.temperatureK }) : null;
    const at = alphas.map((a) => atAlpha(p, a, o, forward));
    const j = alphas.indexOf(0.5);
    const mid = j >= 0 ? at[j] ?? null : atAlpha(p, 0.5, o, forward);
    return [{ fileIndex: p.fileIndex, scanRateVPerS: p.scanRateVPerS, deltaEpV: p.deltaEpV, atAlpha: at, midAlphaPeakRatio: mid?.forwardPeakRatio ?? null, ohmicRuOhm: ru }];
  });
}
