/**
 * The `analyze --json` object. Field names and meanings of the contract are fixed (outside checks
 * depend on them): files[].{file, scanRate, scanRateSource, cycles[].{index, peaks[], couples[]}},
 * series[].{couple, slope, intercept, r2, D, logLogSlope, k0, gamma}, warnings[]. Everything else
 * here is an extra field. Units: V, A, V/s, cm²/s, cm/s, mol/cm²; ipa/ipc and ip are positive
 * baseline-corrected magnitudes; `ratio` is return over forward peak (Nicholson's convention).
 */
import type { AnalyzeRunResult, RunFileResult } from '../core/analysis/runTypes';
import type { SeriesCouple } from '../core/analysis/seriesTypes';
import { currentInConvention } from '../core/conventions';

/** Finite numbers pass, anything else becomes null (JSON has no NaN). */
const num = (x: number | null | undefined): number | null => (x === null || x === undefined || !Number.isFinite(x) ? null : x);

function fileEntry(f: RunFileResult, givenAs: string, r: AnalyzeRunResult) {
  return {
    file: givenAs,
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

function seriesEntry(c: SeriesCouple) {
  const f = c.forwardFit;
  return {
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

/** The contract object; `givenAs[i]` is how file i was named on the command line. */
export function analyzeContract(r: AnalyzeRunResult, givenAs: string[]) {
  return {
    files: r.files.map((f, i) => fileEntry(f, givenAs[i] ?? f.fileName, r)),
    series: r.series.couples.map(seriesEntry),
    warnings: r.warnings.map((w) => (w.fileName ? `${w.fileName}: ${w.message}` : w.message)),
    reference: r.reference,
    convention: r.convention,
    capacitance: r.capacitance ? { Cd: r.capacitance.capacitanceFPerCm2, pointwise: r.capacitance.pointCapacitancesFPerCm2 } : null,
    software: r.provenance.software,
  };
}
