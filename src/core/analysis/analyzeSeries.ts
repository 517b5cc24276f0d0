/**
 * Scan-rate series analysis: follows each redox couple across voltammograms recorded at
 * different scan rates and derives what the series can tell and a single trace cannot.
 * In: per file its scan rate (V/s) and its per-trace analysis (analyzeVoltammogram); options with
 *   n, area (cm²), concentration (mol/cm³), temperature (K), α, D_O/D_R.
 * Out: per series couple the fits (|ip| vs v^½, log|ip| vs log v, Ep vs log v), D by
 *   Randles–Ševčík (reversible or irreversible form by kinetic class), α, Nicholson k° per file and
 *   median, Γ and Laviron k_s for surface couples, plain diagnostics; plus warnings.
 * Sources: in the methods called (series/, kinetics/, regression/); the couple matching and the
 *   class rules are design choices documented in matchSeriesCouples.ts and series/classifySeriesCouple.ts.
 */
import { thermalVoltageV } from '../constants';
import { AnalysisError, assertFiniteInRange } from '../errors';
import { matchSeriesCouples } from './matchSeriesCouples';
import { resolveCell, resolveMethod } from './resolveRun';
import type { CoupleRef } from './matchSeriesCouples';
import { mostCommon, suggestedElectronCount } from '../series/classifySeriesCouple';
import type { ResolvedSeriesOptions } from './seriesFits';
import { buildSeriesCouple } from './seriesCouple';
import type { AnalyzeSeriesOptions, SeriesAnalysis, SeriesCouple, SeriesFileInput, SeriesWarning } from './seriesTypes';
import type { SeriesPoint } from '../series/seriesPoint';
import { median } from '../statistics/median';
import type { CycleAnalysis } from './types';

/** Checks the series options and fills in the defaults (the run does this once in resolveRun). */
export function resolveSeriesOptions(options: AnalyzeSeriesOptions): ResolvedSeriesOptions {
  const { cycle, matchToleranceV, psiMethod, ...cell } = options;
  const c = resolveCell(cell);
  const r = resolveMethod({ seriesCycle: cycle ?? 1, matchToleranceV: matchToleranceV ?? 0.12, psiMethod: psiMethod ?? 'table' });
  return {
    electronCount: c.electronCount, areaCm2: c.areaCm2, concentrationMolPerCm3: c.concentrationMolPerCm3, temperatureK: c.temperatureK, alpha: c.alpha,
    transferElectronCount: c.transferElectronCount, transferElectronCountGiven: c.transferElectronCountGiven, diffusionRatio: c.diffusionRatio, diffusionCm2PerS: c.diffusionCm2PerS,
    formalPotentialV: c.formalPotentialV, ruOhm: c.ruOhm, cycle: r.seriesCycle, matchToleranceV: r.matchToleranceV, psiMethod: r.psiMethod,
  };
}

function chooseCycle(analysis: SeriesFileInput['analysis'], cycle: number): CycleAnalysis | null {
  return analysis.cycles.find((c) => c.index === cycle) ?? null;
}

function peakChargeOf(c: CoupleRef['couple'], cycle: CycleAnalysis, direction: 'anodic' | 'cathodic'): number | null {
  const k = direction === 'anodic' ? c.anodicPeak : c.cathodicPeak;
  return k === null ? null : (cycle.peaks[k]?.chargeC ?? null);
}

function toPoint(ref: CoupleRef, file: SeriesFileInput, cycle: CycleAnalysis): SeriesPoint {
  const c = ref.couple;
  const forwardIndex = c.forwardDirection === 'anodic' ? c.anodicPeak : c.cathodicPeak;
  const fwd = forwardIndex === null ? null : (cycle.peaks[forwardIndex] ?? null);
  const raw = (k: number | null) => (k === null ? null : (cycle.peaks[k]?.rawCurrentA ?? null));
  const [ia, ic] = [raw(c.anodicPeak), raw(c.cathodicPeak)];
  return {
    fileIndex: ref.fileIndex,
    fileName: file.fileName,
    scanRateVPerS: file.scanRateVPerS,
    cycle: cycle.index,
    epaV: c.epaV,
    epcV: c.epcV,
    eHalfV: c.eHalfV,
    deltaEpV: c.deltaEpV,
    ipaA: c.ipaA,
    ipcA: c.ipcA,
    anodicChargeC: c.anodicChargeC ?? peakChargeOf(c, cycle, 'anodic'),
    cathodicChargeC: c.cathodicChargeC ?? peakChargeOf(c, cycle, 'cathodic'),
    forwardIpA: fwd?.heightA ?? (c.forwardDirection === 'anodic' ? c.ipaA : c.ipcA),
    forwardHalfPeakWidthV: fwd?.halfPeakWidthV ?? null,
    forwardChargeC: fwd?.chargeC ?? null,
    verdict: c.verdict.category,
    nicholsonRatio: c.nicholsonRatio,
    switchPotentialV: c.switchPotentialV ?? null,
    reversibleDeltaEpV: c.verdict.evidence.reversibleDeltaEpAtSwitchV ?? c.verdict.evidence.reversibleDeltaEpLimitV,
    peakCurrentSpanA: ia !== null && ic !== null ? ia - ic : null,
  };
}

export function analyzeSeries(files: SeriesFileInput[], options: AnalyzeSeriesOptions = {}): SeriesAnalysis {
  return analyzeResolvedSeries(files, resolveSeriesOptions(options));
}

/** The series analysis proper, on options already checked (resolveSeriesOptions, or the run's resolveRun). */
export function analyzeResolvedSeries(files: SeriesFileInput[], o: ResolvedSeriesOptions): SeriesAnalysis {
  if (!files.length) throw new AnalysisError('EMPTY_INPUT', 'a series needs at least one analysed voltammogram');
  const warnings: SeriesWarning[] = [];
  files.forEach((f, i) => assertFiniteInRange(`scan rate of ${f.fileName || `file ${i + 1}`}`, f.scanRateVPerS, Number.MIN_VALUE));
  const cycles = files.map((f) => {
    const c = chooseCycle(f.analysis, o.cycle);
    if (!c) warnings.push({ code: 'MISSING_CYCLE', message: `${f.fileName} has no cycle ${o.cycle}; it is left out of the series` });
    return c;
  });
  const groups = matchSeriesCouples(files.map((f, i) => ({ scanRateVPerS: f.scanRateVPerS, couples: cycles[i]?.couples ?? [] })), o.matchToleranceV);
  const couples = groups.map((g, index) => {
    const points = g.map((ref) => toPoint(ref, files[ref.fileIndex] as SeriesFileInput, cycles[ref.fileIndex] as CycleAnalysis));
    // The series verdict refines the single-trace verdict most files agree on, not the first file's.
    const majority = mostCommon(g.map((ref) => ref.couple.verdict.category));
    const representative = g.find((ref) => ref.couple.verdict.category === majority) ?? (g[0] as CoupleRef);
    return buildSeriesCouple(index, points, representative.couple, o);
  });
  warnings.push(...seriesWarnings(files, couples, o));
  return { couples, warnings };
}

function seriesWarnings(files: SeriesFileInput[], couples: SeriesCouple[], o: ResolvedSeriesOptions): SeriesWarning[] {
  const out: SeriesWarning[] = [];
  const rates = files.map((f) => f.scanRateVPerS);
  if (new Set(rates).size < 2) {
    out.push({ code: 'SINGLE_SCAN_RATE', message: files.length > 1
      ? `only one scan rate: slope and D come from the mean of the ${files.length} files' peaks through the origin; no linearity check, log–log slope or Ep–log v line`
      : 'only one scan rate: slope and D come from a single peak through the origin; no linearity check, log–log slope or Ep–log v line' });
  } else if (new Set(rates).size < rates.length) {
    out.push({ code: 'DUPLICATE_SCAN_RATE', message: 'several files share a scan rate; each enters the fits as its own point' });
  }
  const needsD = couples.some((c) => c.regime === 'diffusion' && c.forwardFit);
  if (needsD && o.areaCm2 === null) out.push({ code: 'NO_AREA', message: 'no electrode area given: D and Γ are not reported' });
  if (needsD && o.concentrationMolPerCm3 === null) out.push({ code: 'NO_CONCENTRATION', message: 'no concentration given: D is not reported' });
  for (const c of couples) {
    if (c.points.length < files.length && files.length > 1) {
      out.push({ code: 'UNMATCHED_COUPLE', couple: c.index, message: `couple ${c.index} (${c.eHalfV !== null ? `E½ ≈ ${c.eHalfV.toFixed(3)} V` : `lone peak at ${lonePeakV(c)?.toFixed(3) ?? '?'} V`}) is found in ${c.points.length} of ${files.length} files` });
    }
    const k = c.rateConstant;
    if (k && k.status !== 'value' && (k.status === 'cannot-tell' || c.kineticClass !== 'reversible')) {
      const what = k.status === 'lower-bound' ? `k° is only a lower bound${k.lowerBoundCmPerS !== null ? ` (≥ ${k.lowerBoundCmPerS.toExponential(2)} cm/s)` : ''}` : 'k° cannot be told';
      out.push({ code: 'NOT_DETERMINABLE', couple: c.index, message: `couple ${c.index}: ${what}: ${k.reason ?? 'no file gave k°'}` });
    }
    const s = c.surface;
    if (s?.ksStatus === 'cannot-tell') out.push({ code: 'OHMIC_DROP', couple: c.index, message: `couple ${c.index} (film): k_s ${s.ksNote}` });
    else if (s?.ohmicRuOhm != null && s.ksPerS !== null) out.push({ code: 'OHMIC_DROP', couple: c.index, message: `couple ${c.index} (film): ${s.ksNote}` });
    if (c.diffusion?.status === 'range-only') out.push({ code: 'NOT_DETERMINABLE', couple: c.index, message: `couple ${c.index}: ${c.diffusion.note ?? 'D cannot be told'}` });
    if (c.transferCoefficient?.note) out.push({ code: 'ELECTRON_COUNT', couple: c.index, message: `couple ${c.index}: ${c.transferCoefficient.note}` });
    const hint = c.regime === 'diffusion' ? suggestedElectronCount(c.points, o.electronCount, o.temperatureK) : null;
    if (hint) {
      out.push({ code: 'ELECTRON_COUNT', couple: c.index, message: `couple ${c.index}: forward |Ep − Ep/2| = ${(hint.halfPeakWidthV * 1000).toFixed(1)} mV is narrower than any diffusing couple with n = ${o.electronCount} (2.20RT/nF = ${((2.2 * thermalVoltageV(o.temperatureK) * 1000) / o.electronCount).toFixed(1)} mV) and reads as n ≈ ${hint.electronCount}; D (∝ n⁻³) and k° assume n = ${o.electronCount} — rerun with n = ${hint.electronCount} if that is the couple's electron count` });
    }
    const d = c.diffusion?.status === 'range-only' ? null : (c.diffusion?.diffusionCm2PerS ?? null);
    if (d !== null && d > FASTEST_DIFFUSION_CM2_PER_S) {
      out.push({ code: 'IMPLAUSIBLE_D', couple: c.index, message: `couple ${c.index}: D = ${d.toExponential(2)} cm²/s is UNRELIABLE: faster than any species diffuses in a liquid (H⁺ in water, the fastest, 9.3e-5 cm²/s at 25 °C). Check the scan rate (a time column in ms read as s makes D 1000× too large), the area, the concentration, the current unit and n` });
    }
    if (c.regime === 'diffusion' && c.forwardFit && c.forwardFit.pointCount >= 3 && c.forwardFit.r2 < 0.98) {
      out.push({ code: 'NONLINEAR', couple: c.index, message: `couple ${c.index}: ip against v^½ is not straight (R² = ${c.forwardFit.r2.toFixed(3)})` });
    }
  }
  return out;
}

/**
 * Above this D (cm²/s) no species diffuses in a liquid: H⁺ in water, the fastest, has 9.31e-5 at
 * 25 °C (CRC Handbook of Chemistry and Physics, "Ionic conductivity and diffusion at infinite
 * dilution", from memory); 1e-4 leaves room for warm solutions and rounding.
 */
const FASTEST_DIFFUSION_CM2_PER_S = 1e-4;

/** Median Ep of a couple's lone peaks (for a couple that has no E½). */
function lonePeakV(c: SeriesCouple): number | null {
  const eps = c.points.flatMap((p) => (p.epaV !== null ? [p.epaV] : p.epcV !== null ? [p.epcV] : []));
  return eps.length ? median(eps) : null;
}
