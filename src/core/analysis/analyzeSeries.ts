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
import { refineVerdictWithSeries } from '../couples/refineVerdictWithSeries';
import { electroactiveAreaFromStandard } from '../series';
import { median } from '../statistics/median';
import { matchSeriesCouples } from './matchSeriesCouples';
import { resolveCell, resolveMethod } from './resolveRun';
import type { CoupleRef } from './matchSeriesCouples';
import { classifySeriesCouple, mostCommon, suggestedElectronCount } from '../series/classifySeriesCouple';
import { describeSeriesCouple } from './seriesDiagnostics';
import { fitAgainstScanRate, fitAgainstSqrtScanRate, fitForwardAgainstSqrtScanRate, fitLogLog, fitPeakShift, seriesDiffusion } from './seriesFits';
import type { ResolvedSeriesOptions } from './seriesFits';
import { seriesFollowUp, seriesRateConstant, seriesSurface } from './seriesKinetics';
import type { AnalyzeSeriesOptions, SeriesAnalysis, SeriesCouple, SeriesFileInput, SeriesWarning } from './seriesTypes';
import type { SeriesPoint } from '../series/seriesPoint';
import type { CycleAnalysis } from './types';
import type { SeriesEvidence, Verdict } from '../couples/coupleTypes';

/** Checks the series options and fills in the defaults (the run does this once in resolveRun). */
export function resolveSeriesOptions(options: AnalyzeSeriesOptions): ResolvedSeriesOptions {
  const { cycle, matchToleranceV, ...cell } = options;
  const c = resolveCell(cell);
  const r = resolveMethod({ seriesCycle: cycle ?? 1, matchToleranceV: matchToleranceV ?? 0.12 });
  return {
    electronCount: c.electronCount, areaCm2: c.areaCm2, concentrationMolPerCm3: c.concentrationMolPerCm3, temperatureK: c.temperatureK, alpha: c.alpha,
    transferElectronCount: c.transferElectronCount, diffusionRatio: c.diffusionRatio, diffusionCm2PerS: c.diffusionCm2PerS,
    cycle: r.seriesCycle, matchToleranceV: r.matchToleranceV,
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
  };
}

/** A of a reversible standard of known D from its forward slope (electroactiveAreaFromStandard.ts). */
function electroactiveArea(fit: SeriesCouple['forwardFit'], reversible: boolean, o: ResolvedSeriesOptions): number | null {
  if (!fit || !reversible || o.diffusionCm2PerS === null || o.concentrationMolPerCm3 === null) return null;
  return electroactiveAreaFromStandard(
    { slopeAPerSqrtVPerS: fit.slope, electronCount: o.electronCount, concentrationMolPerCm3: o.concentrationMolPerCm3, diffusionCm2PerS: o.diffusionCm2PerS },
    { temperatureK: o.temperatureK },
  );
}

/** The single-trace verdict refined with what the series shows (two scan rates at least). */
function seriesVerdict(first: Verdict, c: Omit<SeriesCouple, 'verdict'>): Verdict {
  const e: SeriesEvidence = { count: new Set(c.points.map((p) => p.scanRateVPerS)).size };
  if ((e.count ?? 0) < 2) return first;
  if (c.logLog) e.logLogSlope = c.logLog.slope;
  if (c.peakShift.anodic) e.epaShiftVPerDecade = c.peakShift.anodic.slopeVPerDecade;
  if (c.peakShift.cathodic) e.epcShiftVPerDecade = c.peakShift.cathodic.slopeVPerDecade;
  if (c.forwardFit) e.sqrtScanRateR2 = c.forwardFit.r2;
  const linear = fitAgainstScanRate(c.points, (p) => p.forwardIpA);
  if (linear) e.scanRateR2 = linear.r2;
  const refined = refineVerdictWithSeries(first, e);
  if (c.regime !== 'surface' || c.kineticClass !== 'quasi-reversible' || refined.category !== 'adsorbed') return refined;
  // The slowest file of a slow film looks Nernstian; the series shows the Laviron regime.
  return { ...refined, label: 'surface-confined (adsorbed; slow electron transfer, Laviron)', reasons: [...refined.reasons, c.diagnostics[0] ?? ''].filter(Boolean) };
}

function buildCouple(index: number, points: SeriesPoint[], first: CoupleRef['couple'], o: ResolvedSeriesOptions): SeriesCouple {
  const forward = first.forwardDirection;
  const logLog = fitLogLog(points);
  const { regime, kineticClass, majority } = classifySeriesCouple(points, o.electronCount, o.temperatureK, logLog?.slope ?? null);
  const forwardFit = fitForwardAgainstSqrtScanRate(points);
  const peakShift = { anodic: fitPeakShift(points, 'anodic', o), cathodic: fitPeakShift(points, 'cathodic', o) };
  const forwardShift = forward === 'anodic' ? peakShift.anodic : peakShift.cathodic;
  const surface = regime === 'surface' ? seriesSurface(points, o) : null;
  const diffusion = regime === 'diffusion' ? seriesDiffusion(forwardFit, kineticClass, forwardShift, points, o, forward).diffusion : null;
  const rateConstant = regime === 'diffusion' ? seriesRateConstant(points, forward, diffusion, o, forwardShift?.alpha ?? null, kineticClass === 'reversible') : null;
  const halves = points.flatMap((p) => (p.eHalfV !== null ? [p.eHalfV] : p.epaV !== null ? [p.epaV] : p.epcV !== null ? [p.epcV] : []));
  const couple: Omit<SeriesCouple, 'verdict'> = {
    index,
    eHalfV: halves.length ? median(halves) : null,
    forwardDirection: forward,
    points,
    regime,
    kineticClass,
    followUp: regime === 'diffusion' && majority === 'chemically-coupled' ? seriesFollowUp(points, o) : null,
    forwardFit,
    anodicFit: fitAgainstSqrtScanRate(points, (p) => p.ipaA),
    cathodicFit: fitAgainstSqrtScanRate(points, (p) => p.ipcA),
    diffusion,
    logLog,
    peakShift,
    alpha: regime === 'diffusion' && kineticClass === 'irreversible' ? (diffusion?.alphaUsed ?? forwardShift?.alpha ?? null) : null,
    rateConstant,
    electroactiveAreaCm2: electroactiveArea(forwardFit, regime === 'diffusion' && kineticClass === 'reversible', o),
    surface,
    diagnostics: [],
  };
  couple.diagnostics = describeSeriesCouple(couple, o);
  return { ...couple, verdict: seriesVerdict(first.verdict, couple) };
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
    return buildCouple(index, points, representative.couple, o);
  });
  warnings.push(...seriesWarnings(files, couples, o));
  return { couples, warnings };
}

function seriesWarnings(files: SeriesFileInput[], couples: SeriesCouple[], o: ResolvedSeriesOptions): SeriesWarning[] {
  const out: SeriesWarning[] = [];
  const rates = files.map((f) => f.scanRateVPerS);
  if (new Set(rates).size < 2) {
    out.push({ code: 'SINGLE_SCAN_RATE', message: 'only one scan rate: slope and D come from a single peak through the origin; no linearity check, log–log slope or Ep–log v line' });
  } else if (new Set(rates).size < rates.length) {
    out.push({ code: 'DUPLICATE_SCAN_RATE', message: 'several files share a scan rate; each enters the fits as its own point' });
  }
  const needsD = couples.some((c) => c.regime === 'diffusion' && c.forwardFit);
  if (needsD && o.areaCm2 === null) out.push({ code: 'NO_AREA', message: 'no electrode area given: D and Γ are not reported' });
  if (needsD && o.concentrationMolPerCm3 === null) out.push({ code: 'NO_CONCENTRATION', message: 'no concentration given: D is not reported' });
  for (const c of couples) {
    if (c.points.length < files.length && files.length > 1) {
      out.push({ code: 'UNMATCHED_COUPLE', couple: c.index, message: `couple ${c.index} (E½ ≈ ${c.eHalfV?.toFixed(3) ?? '?'} V) is found in ${c.points.length} of ${files.length} files` });
    }
    if (c.rateConstant && c.rateConstant.k0CmPerS === null && c.kineticClass !== 'reversible') {
      out.push({ code: 'NOT_DETERMINABLE', couple: c.index, message: `couple ${c.index}: k° not determinable (${c.rateConstant.perFile.find((f) => f.reason)?.reason ?? 'no D available'})` });
    }
    const hint = c.regime === 'diffusion' ? suggestedElectronCount(c.points, o.electronCount, o.temperatureK) : null;
    if (hint) {
      out.push({ code: 'ELECTRON_COUNT', couple: c.index, message: `couple ${c.index}: forward |Ep − Ep/2| = ${(hint.halfPeakWidthV * 1000).toFixed(1)} mV is narrower than any diffusing couple with n = ${o.electronCount} (2.20RT/nF = ${((2.2 * thermalVoltageV(o.temperatureK) * 1000) / o.electronCount).toFixed(1)} mV) and reads as n ≈ ${hint.electronCount}; D (∝ n⁻³) and k° assume n = ${o.electronCount} — rerun with n = ${hint.electronCount} if that is the couple's electron count` });
    }
    if (c.regime === 'diffusion' && c.forwardFit && c.forwardFit.pointCount >= 3 && c.forwardFit.r2 < 0.98) {
      out.push({ code: 'NONLINEAR', couple: c.index, message: `couple ${c.index}: ip against v^½ is not straight (R² = ${c.forwardFit.r2.toFixed(3)})` });
    }
  }
  return out;
}
