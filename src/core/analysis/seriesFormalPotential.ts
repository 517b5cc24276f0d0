/**
 * E°′ of a diffusing series couple beside k°, with the range it can lie in, and the check that the
 * per-file k° agree with one another.
 * In: the files that gave k° (each with its E°′ and the E°′ at the ends of αc's range when k° came
 *   from the return peak), the couple's points (E½, ΔEp, the reversible ΔEp at each file's switch),
 *   n, T, D_O/D_R and a given E°′. Out: E°′ (V), its source in words and its range (V); the drift
 *   text or null.
 * Sources and rules:
 *   - E°′ from the return peaks: the one-step Butler–Volmer model whose return-peak departure is
 *     simulated (kinetics/correctedIrreversibleRateConstant.ts). It rests on αc: where αc is only
 *     assumed, its E°′ moves by tens of mV over 0.3–0.7, so it is given over that range.
 *   - E½ of a reversible couple is E°′ + (RT/2nF)·ln(D_R/D_O) (Bard & Faulkner, Electrochemical
 *     Methods 2nd ed. (2001) eq. 6.2.4, from memory). Slow electron transfer only moves each peak
 *     outward from its reversible place (Nicholson, Anal. Chem. 37, 1351 (1965)), so the midpoint
 *     moves by at most half the widening ΔEp − ΔEp(rev) whatever αc is (ours, by inspection; the
 *     simulated test checks it at αc = 0.35). The file nearest reversibility thus bounds E°′ to
 *     E½ ± widening/2; that estimate is used when its range is narrower than the return-peak one.
 *   - Drift (ours; common practice, no source): when one model holds, k° is the same at every scan
 *     rate. Single-file k° of simulated series scatter by about 10 % at most, so a steady trend of
 *     ln k° against ln v (95 % interval of the slope excluding 0) worth a factor 1.5 or more over
 *     the rates says the model (nₐ, αc, no ohmic drop, no coupled chemistry) does not hold, and no
 *     median is given.
 */
import { thermalVoltageV } from '../constants';
import { fitLine } from '../regression';
import type { SeriesPoint } from '../series/seriesPoint';
import { formatScanRate } from '../units';
import type { ResolvedSeriesOptions } from './seriesFits';
import type { SeriesRateConstant } from './seriesTypes';
import { median } from '../statistics/median';

type PerFile = SeriesRateConstant['perFile'][number];

/** Smallest fold change of k° over the rates that counts as a drift. */
export const K0_DRIFT_FOLD = 1.5;

export interface SeriesFormalPotential {
  formalPotentialV: number | null;
  formalPotentialSource: string | null;
  formalPotentialRangeV: [number, number] | null;
}

const mv = (v: number) => `${(v * 1000).toFixed(1)} mV`;

/** E°′ bounded by the E½ of the file whose ΔEp is nearest its reversible value, or null. */
export function formalPotentialFromHalfWave(points: SeriesPoint[], o: Pick<ResolvedSeriesOptions, 'electronCount' | 'temperatureK' | 'diffusionRatio'>): { e0: number; halfWidthV: number; fileName: string } | null {
  let best: { p: SeriesPoint; widening: number } | null = null;
  for (const p of points) {
    if (p.eHalfV === null || p.deltaEpV === null || p.reversibleDeltaEpV == null) continue;
    const widening = Math.max(0, p.deltaEpV - p.reversibleDeltaEpV);
    if (best === null || widening < best.widening) best = { p, widening };
  }
  if (!best) return null;
  const shift = (thermalVoltageV(o.temperatureK) / (2 * o.electronCount)) * Math.log(o.diffusionRatio);
  return { e0: (best.p.eHalfV as number) + shift, halfWidthV: best.widening / 2, fileName: best.p.fileName };
}

export function seriesFormalPotential(got: PerFile[], input: { points: SeriesPoint[] }, o: ResolvedSeriesOptions): SeriesFormalPotential {
  const e0s = got.flatMap((f) => (f.formalPotentialV == null ? [] : [f.formalPotentialV]));
  if (!e0s.length) return { formalPotentialV: null, formalPotentialSource: null, formalPotentialRangeV: null };
  if (o.formalPotentialV !== null) return { formalPotentialV: o.formalPotentialV, formalPotentialSource: 'given by the user', formalPotentialRangeV: null };
  const ends = got.flatMap((f) => f.formalPotentialRangeV ?? []);
  const lo = Math.min(...e0s, ...ends);
  const hi = Math.max(...e0s, ...ends);
  const half = formalPotentialFromHalfWave(input.points, o);
  if (half && 2 * half.halfWidthV < hi - lo) {
    return {
      formalPotentialV: half.e0, formalPotentialRangeV: [half.e0 - half.halfWidthV, half.e0 + half.halfWidthV],
      formalPotentialSource: `from E½ of ${half.fileName}, the file nearest reversibility: slow electron transfer moves its midpoint by at most half its widening (±${mv(half.halfWidthV)}), a narrower range than the return peaks give over αc (${(lo * 1000).toFixed(1)} to ${(hi * 1000).toFixed(1)} mV)`,
    };
  }
  const assumed = hi - lo > 0.002 ? `; it rests on αc, and over αc's range lies within ${(lo * 1000).toFixed(1)} to ${(hi * 1000).toFixed(1)} mV` : '';
  return { formalPotentialV: median(e0s), formalPotentialRangeV: [lo, hi], formalPotentialSource: `from the return peaks, their departure from eq. 2-5 simulated${assumed}` };
}

/** Why the per-file k° cannot be summed up in one value (a steady drift with scan rate) and its fold change, or null. */
export function rateConstantDrift(got: PerFile[], points: SeriesPoint[]): { text: string; fold: number } | null {
  const rows = got.flatMap((f) => {
    const p = points.find((x) => x.fileIndex === f.fileIndex);
    return p && f.k0CmPerS !== null && f.k0CmPerS > 0 ? [{ v: p.scanRateVPerS, k: f.k0CmPerS }] : [];
  }).sort((a, b) => a.v - b.v);
  if (new Set(rows.map((r) => r.v)).size < 3) return null;
  const fit = fitLine(rows.map((r) => Math.log(r.v)), rows.map((r) => Math.log(r.k)));
  const ci = fit.slopeInterval;
  if (!ci || ci[0] * ci[1] <= 0) return null;
  const span = Math.log(rows[rows.length - 1]!.v / rows[0]!.v);
  const fold = Math.exp(Math.abs(fit.slope) * span);
  if (fold < K0_DRIFT_FOLD) return null;
  const first = rows[0]!;
  const last = rows[rows.length - 1]!;
  const text = `the per-file k° drifts ${fold.toFixed(1)}-fold with scan rate (${first.k.toPrecision(3)} cm/s at ${formatScanRate(first.v)}, ${last.k.toPrecision(3)} cm/s at ${formatScanRate(last.v)}; ln k° against ln v has slope ${fit.slope.toFixed(2)}, 95 % ${ci[0].toFixed(2)} to ${ci[1].toFixed(2)}): one k° does not describe the series, so the model behind it (nₐ, αc, no ohmic drop, no coupled chemistry) does not hold and no median is given; a whole-curve fit (fit) can test other models`;
  return { text, fold };
}
