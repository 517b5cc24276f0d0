/**
 * The JSON contract of an analysis run: what `analyze --json` prints and what the JSON results
 * sheet carries, with the same keys wherever it appears. Field names and meanings are fixed
 * (outside checks depend on them): files[].{file, scanRate, scanRateSource, cycles[].{index,
 * peaks[], couples[]}}, series[].{couple, slope, intercept, r2, D, logLogSlope, k0, gamma},
 * warnings[], fits[] (whole-curve fits of series, fitSheet.ts; empty when none was run). Everything
 * else is an extra field; `series[].series` names the scan-rate series a
 * couple belongs to when a run holds several. Units: V, A, V/s, cm²/s, cm/s, mol/cm²; ipa/ipc
 * and ip are positive baseline-corrected magnitudes; `ratio` is return over forward peak
 * (Nicholson's convention).
 */
import type { AnalyzeRunResult, RunFileResult, RunSeriesResult } from '../core/analysis/runTypes';
import type { SeriesCouple } from '../core/analysis/seriesTypes';
import { currentInConvention } from '../core/conventions';
import { fitSheetEntry, type SeriesFit } from './fitSheet';

/** Finite numbers pass, anything else becomes null (JSON has no NaN). */
const num = (x: number | null | undefined): number | null => (x === null || x === undefined || !Number.isFinite(x) ? null : x);

function fileEntry(f: RunFileResult, givenAs: string, r: AnalyzeRunResult) {
  return {
    file: givenAs,
    series: f.series,
    blank: f.blank?.fileName ?? null,
    scanRate: f.scanRateVPerS,
    scanRateSource: f.scanRateSource,
    sizeBytes: f.provenance.sizeBytes ?? null,
    sha256: f.provenance.sha256 ?? null,
    role: f.role,
    cycles: f.analysis.cycles.map((c) => ({
      index: c.index,
      peaks: c.peaks.map((p) => ({
        direction: p.direction, E: p.potentialV, ip: p.heightA,
        iRaw: currentInConvention(p.rawCurrentA, r.convention), confidence: p.confidence, charge: num(p.chargeC),
      })),
      couples: c.couples.map((k) => ({
        Epa: num(k.epaV), Epc: num(k.epcV), Ehalf: num(k.eHalfV), dEp: num(k.deltaEpV), ipa: num(k.ipaA), ipc: num(k.ipcA),
        ratio: num(k.ratio), verdict: k.verdict.category, verdictText: k.verdict.label, nicholsonRatio: num(k.nicholsonRatio),
      })),
    })),
  };
}

/** Γ reported in the contract: from the forward peak's charge, else from the ip–v slope. */
function gammaOf(c: SeriesCouple): number | null {
  return num(c.surface?.coverageFromChargeMolPerCm2 ?? c.surface?.coverageFromSlopeMolPerCm2 ?? null);
}

function seriesEntry(s: RunSeriesResult, c: SeriesCouple) {
  const f = c.forwardFit;
  return {
    series: s.key,
    couple: c.index,
    slope: num(f?.slope),
    intercept: num(f?.intercept),
    r2: num(f?.r2),
    D: num(c.diffusion?.diffusionCm2PerS),
    logLogSlope: num(c.logLog?.slope),
    k0: num(c.rateConstant?.k0CmPerS),
    gamma: gammaOf(c),
    Ehalf: num(c.eHalfV),
    files: c.points.length,
    regime: c.regime,
    kineticClass: c.kineticClass,
    verdict: c.verdict.category,
    verdictText: c.verdict.label,
    slopeCI95: f?.slopeInterval ?? null,
    DCI95: c.diffusion?.intervalCm2PerS ?? null,
    DCI95WithAreaAndConc: c.diffusion?.combinedIntervalCm2PerS ?? null,
    defaultsUsed: s.defaultsUsed.filter((d) => d.affects.includes('D') || d.affects.includes('Γ') || d.affects.includes('k°')).map((d) => `${d.field}: ${d.value} (${d.affects.join(', ')})`),
    DForm: c.diffusion?.form ?? null,
    alpha: num(c.alpha ?? c.diffusion?.alphaUsed ?? null),
    logLogReading: c.logLog?.reading ?? null,
    EpaShiftPerDecade: num(c.peakShift.anodic?.slopeVPerDecade),
    EpcShiftPerDecade: num(c.peakShift.cathodic?.slopeVPerDecade),
    k0LowerBound: num(c.rateConstant?.lowerBoundCmPerS),
    k0PerFile: (c.rateConstant?.perFile ?? []).map((k) => ({
      file: c.points.find((p) => p.fileIndex === k.fileIndex)?.fileName ?? null, k0: num(k.k0CmPerS), method: k.method, reason: k.reason,
    })),
    gammaFromSlope: num(c.surface?.coverageFromSlopeMolPerCm2),
    ks: num(c.surface?.ksPerS),
    electroactiveArea: num(c.electroactiveAreaCm2),
    kf: num(c.followUp?.rateConstantPerS ?? null),
    kfPerFile: (c.followUp?.perFile ?? []).map((k) => ({
      file: c.points.find((p) => p.fileIndex === k.fileIndex)?.fileName ?? null, kf: num(k.rateConstantPerS), reason: k.reason,
    })),
    diagnostics: c.diagnostics,
  };
}

/**
 * The contract object; `givenAs[i]` is how file i was named (on the command line), else its file
 * name; `fits` the whole-curve fits of series made beside the run (the workbench's fit panel).
 */
export function runContract(r: AnalyzeRunResult, givenAs: string[] = [], fits: readonly SeriesFit[] = []) {
  return {
    files: r.files.map((f, i) => fileEntry(f, givenAs[i] ?? f.fileName, r)),
    series: r.series.flatMap((s) => s.analysis.couples.map((c) => seriesEntry(s, c))),
    warnings: r.warnings.map((w) => (w.fileName ? `${w.fileName}: ${w.message}` : w.series && r.series.length > 1 ? `${w.series}: ${w.message}` : w.message)),
    fits: fits.map(fitSheetEntry),
    seriesGroups: r.series.map((s) => ({
      series: s.key, files: s.fileNames,
      capacitance: capacitanceOf(s),
      referenceBasis: s.referenceBasis,
      cell: s.cell,
      defaultsUsed: s.defaultsUsed,
    })),
    capacitance: capacitanceOf(r.series[0]),
    reference: r.reference,
    convention: r.convention,
    software: r.provenance.software,
  };
}

function capacitanceOf(s: RunSeriesResult | undefined) {
  return s?.capacitance ? { Cd: s.capacitance.capacitanceFPerCm2, pointwise: s.capacitance.pointCapacitancesFPerCm2 } : null;
}

export type RunContract = ReturnType<typeof runContract>;
