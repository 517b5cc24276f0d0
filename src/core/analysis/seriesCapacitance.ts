/**
 * The double-layer capacitance of one series at the cell's chosen potential: each file's gap read
 * as the median over ± 10 mV (windowMedianGap.ts), the current of an adsorbed film of the series
 * taken off where its shape is known, bounded where it is not, and the fit over the scan rates
 * (doubleLayerCapacitance.ts).
 * A film's current is ∝ v like the charging current, so the scan rates cannot separate the two
 * (Laviron, J. Electroanal. Chem. 52 (1974) 355): the film the series has already measured is
 * modelled instead, file by file, from its own peak potentials and forward charge
 * (surfaceWaveCurrent.ts):
 * - a Nernstian film (n·ΔEp within 1.109·RT/F, the series' own criterion, seriesSurface.ts, and
 *   |Ep − Ep/2| within 10 % of 1.763·RT/nF, the θ/(1+θ)² shape, Laviron 1974): its current at
 *   each potential of the window is taken off. Its relative standard uncertainty combines the
 *   position (nF/RT·u_E, u_E the larger of ΔEp/2 and half the potential step), the shape
 *   (nF/RT·|E − E½|·δw, δw the width's relative departure, at least half a step over the width)
 *   and the amount (|ip/(nFQv/4RT) − 1|), and is carried as shared between the files;
 * - any other film (slow, or wider than Langmuir's shape): nothing is taken off; the largest of
 *   the Nernstian shape and Laviron's (1979) irreversible shape over αc 0.3–0.7 (or the series'
 *   α) at the chosen potential is what it could still carry, and the interval is widened down
 *   by it. Both say so when the film's share reaches 1 % of the gap (the thresholds: ours).
 * The window's half-width, 10 mV, is common practice, no source.
 */
import { inverseThermalVoltagePerV, thermalVoltageV } from '../constants';
import { doubleLayerCapacitance, irreversibleSurfaceCurrentA, nernstianSurfaceCurrentA, windowMedianGap } from '../series';
import type { ChargingGapWindow, DoubleLayerCapacitanceResult } from '../series';
import type { SeriesPoint } from '../series/seriesPoint';
import { median } from '../statistics/median';
import type { ResolvedCell, RunFileResult, RunWarning } from './runTypes';
import type { SeriesAnalysis } from './seriesTypes';

/** Half-width (V) of the window the gap is read over. */
export const CAPACITANCE_WINDOW_HALF_WIDTH_V = 0.01;
/** Share of the gap a film's current must reach before the run says so. */
const FILM_SHARE_NOTED = 0.01;
const ALPHA_SPAN = [0.3, 0.5, 0.7];

type Cell = Pick<ResolvedCell, 'capacitancePotentialV' | 'areaCm2' | 'electronCount' | 'temperatureK' | 'alpha'>;

interface FilmAtFile {
  /** Film gap at each potential of the window (A), taken off. */
  subtracted: number[];
  /** Shared standard uncertainty of that film gap at the chosen potential (A). */
  sharedA: number;
  /** What a film not modelled may still carry at the chosen potential (A). */
  boundA: number;
  notes: string[];
}

function stepOf(w: ChargingGapWindow): number {
  const e = [...w.potentialV].sort((a, b) => a - b);
  const d = e.slice(1).map((x, i) => x - e[i]!).filter((x) => x > 0);
  return d.length ? median(d) : 0;
}

const mv = (x: number) => `${(x * 1000).toFixed(0)} mV`;

function nernstianFilm(p: SeriesPoint, w: ChargingGapWindow, cell: Cell, chargeC: number, centre: number): { gaps: number[]; sharedA: number } | null {
  const nf = cell.electronCount * inverseThermalVoltagePerV(cell.temperatureK);
  const width0 = 1.7627 / nf;
  if (p.epaV === null || p.epcV === null || p.deltaEpV === null || p.forwardHalfPeakWidthV === null) return null;
  if (cell.electronCount * Math.abs(p.deltaEpV) > 1.109 * thermalVoltageV(cell.temperatureK)) return null;
  const step = stepOf(w);
  const dw = Math.max(Math.abs(p.forwardHalfPeakWidthV / width0 - 1), step / 2 / width0);
  if (dw > 0.1) return null;
  const base = { chargeC, scanRateVPerS: p.scanRateVPerS, electronCount: cell.electronCount, temperatureK: cell.temperatureK };
  const at = (e: number) => nernstianSurfaceCurrentA({ ...base, potentialV: e, direction: 'positive', epV: p.epaV! })
    + nernstianSurfaceCurrentA({ ...base, potentialV: e, direction: 'negative', epV: p.epcV! });
  const eHalf = (p.epaV + p.epcV) / 2;
  const uE = Math.max(Math.abs(p.deltaEpV) / 2, step / 2);
  const uQ = p.forwardIpA !== null ? Math.abs(p.forwardIpA / ((nf * chargeC * p.scanRateVPerS) / 4) - 1) : 0.1;
  const rel = Math.hypot(nf * uE, nf * Math.abs(centre - eHalf) * dw, uQ);
  return { gaps: w.potentialV.map(at), sharedA: rel * at(centre) };
}

/** The most a film of unknown shape can carry at E: Nernstian or irreversible (Laviron 1979) over α. */
function filmBound(p: SeriesPoint, cell: Cell, alphaC: number | null, chargeC: number, e: number): number {
  const base = { potentialV: e, chargeC, scanRateVPerS: p.scanRateVPerS, electronCount: cell.electronCount, temperatureK: cell.temperatureK };
  const alphas = alphaC !== null ? [alphaC] : ALPHA_SPAN;
  const sweep = (ep: number | null, direction: 'positive' | 'negative') => (ep === null ? 0 : Math.max(
    nernstianSurfaceCurrentA({ ...base, direction, epV: ep }),
    ...alphas.map((a) => irreversibleSurfaceCurrentA({ ...base, direction, epV: ep, alphaN: cell.electronCount * (direction === 'positive' ? 1 - a : a) })),
  ));
  return sweep(p.epaV, 'positive') + sweep(p.epcV, 'negative');
}

function filmAtFile(f: RunFileResult, w: ChargingGapWindow, analysis: SeriesAnalysis, cell: Cell): FilmAtFile {
  const out: FilmAtFile = { subtracted: w.potentialV.map(() => 0), sharedA: 0, boundA: 0, notes: [] };
  const centre = w.potentialV[0]!;
  const gap = Math.abs(w.gapA[0]!);
  for (const c of analysis.couples) {
    if (c.regime !== 'surface') continue;
    const p = c.points.find((x) => x.fileName === f.fileName);
    const chargeC = p?.forwardChargeC ?? null;
    if (!p || chargeC === null) continue;
    const eWave = p.eHalfV ?? p.epaV ?? p.epcV;
    const away = eWave === null ? '' : `${mv(Math.abs(centre - eWave))} from`;
    const model = nernstianFilm(p, w, cell, chargeC, centre);
    if (model) {
      model.gaps.forEach((g, i) => { out.subtracted[i]! += g; });
      out.sharedA = Math.hypot(out.sharedA, model.sharedA);
      const share = model.gaps[0]! / gap;
      if (share >= FILM_SHARE_NOTED) out.notes.push(`${f.fileName}: the chosen potential lies ${away} the Nernstian film at ${eWave === null ? '?' : mv(eWave)}; its current there (Laviron 1974, from the file's own peaks and charge), ${(100 * share).toFixed(1)} % of the gap, was taken off (± ${(100 * model.sharedA / gap).toFixed(2)} %)`);
      continue;
    }
    const bound = filmBound(p, cell, c.alpha ?? cell.alpha, chargeC, centre);
    out.boundA += bound;
    const share = bound / gap;
    if (share >= FILM_SHARE_NOTED) out.notes.push(`${f.fileName}: the chosen potential lies ${away} a surface wave whose shape is neither Nernstian nor Langmuir-wide (ΔEp ${p.deltaEpV === null ? '—' : mv(p.deltaEpV)}); its current there could reach ${bound.toExponential(2)} A, ${(100 * share).toFixed(1)} % of the gap, and was not taken off: Cd's interval is widened down by it; choose a potential farther from the wave`);
  }
  return out;
}

export function seriesCapacitance(files: RunFileResult[], cell: Cell, analysis: SeriesAnalysis, warnings: RunWarning[], key: string): DoubleLayerCapacitanceResult | null {
  const read = files.filter((f) => f.chargingGapWindow !== null);
  if (cell.capacitancePotentialV === null || !read.length) return null;
  if (cell.areaCm2 === null) {
    warnings.push({ code: 'CAPACITANCE', series: key, message: 'double-layer capacitance needs the electrode area' });
    return null;
  }
  const rows = read.map((f) => {
    const w = f.chargingGapWindow!;
    const film = filmAtFile(f, w, analysis, cell);
    const g = windowMedianGap(w.potentialV, w.gapA.map((x, i) => x - film.subtracted[i]!));
    return { f, g, film };
  });
  const result = doubleLayerCapacitance({
    scanRatesVPerS: rows.map((r) => r.f.scanRateVPerS), gapCurrentsA: rows.map((r) => r.g.gapA), areaCm2: cell.areaCm2,
    gapUncertaintiesA: rows.map((r) => r.g.standardUncertaintyA ?? 0), sharedUncertaintiesA: rows.map((r) => r.film.sharedA), unsubtractedA: rows.map((r) => r.film.boundA),
  });
  for (const r of rows) for (const n of r.film.notes) warnings.push({ code: 'CAPACITANCE', series: key, message: `double-layer capacitance: ${n}` });
  if (result.warning) warnings.push({ code: 'CAPACITANCE', series: key, message: `double-layer capacitance: ${result.warning}` });
  return result;
}
