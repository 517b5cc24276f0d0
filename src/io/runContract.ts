/**
 * The JSON contract of an analysis run: what `analyze --json` prints and what the JSON results
 * sheet carries, with the same keys wherever it appears. Field names and meanings are fixed
 * (outside checks depend on them): files[].{file, scanRate, scanRateSource, cycles[].{index,
 * peaks[], couples[]}}, series[].{couple, slope, intercept, r2, D, logLogSlope, k0, gamma},
 * warnings[], fits[] (whole-curve fits of series, fitSheet.ts; empty when none was run). Everything
 * else is an extra field; `series[].series` names the scan-rate series a
 * couple belongs to when a run holds several. Units: V, A, V/s, cm²/s, cm/s, mol/cm², 1/s, Ω;
 * ipa/ipc and ip are positive baseline-corrected magnitudes; `ratio` is return over forward peak
 * (Nicholson's convention). `alpha` is always αc, the cathodic transfer coefficient (alphaMeaning
 * says so in each entry); `alphaNa` is α·nₐ of the forward wave. `k0` is null unless k0Status is
 * 'value' (never beside a reversible verdict); `D` is null when DStatus is 'range-only'.
 * `currentKind` 'density' (files and series) means the file gave current densities and no area:
 * its currents are A/cm², and the series' slope, D, Γ and Cd are per cm² of electrode.
 */
import type { AnalyzeRunResult, RunFileResult, RunSeriesResult } from '../core/analysis/runTypes';
import { ALPHA_MEANING, type SeriesCouple } from '../core/analysis/seriesTypes';
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
    currentKind: f.currentKind,
    spikes: (f.analysis.spikes ?? []).map((p) => ({ index: p.index, E: p.potentialV, i: currentInConvention(p.currentA, r.convention) })),
    cycles: f.analysis.cycles.map((c) => ({
      index: c.index,
      windowEdges: (c.windowEdges ?? []).map((e) => ({ direction: e.direction, fromE: e.fromV, toE: e.toV, i: currentInConvention(e.currentA, r.convention), atSwitch: e.atSwitch, label: 'breakdown or catalytic current at the window edge' })),
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
    currentKind: s.currentKind,
    slope: num(f?.slope),
    intercept: num(f?.intercept),
    r2: num(f?.r2),
    D: c.diffusion?.status === 'range-only' ? null : num(c.diffusion?.diffusionCm2PerS),
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
    DCI95: c.diffusion?.status === 'range-only' ? null : (c.diffusion?.intervalCm2PerS ?? null),
    DCI95WithAreaAndConc: c.diffusion?.status === 'range-only' ? null : (c.diffusion?.combinedIntervalCm2PerS ?? null),
    defaultsUsed: s.defaultsUsed.filter((d) => d.affects.includes('D') || d.affects.includes('Γ') || d.affects.includes('k°')).map((d) => `${d.field}: ${d.value} (${d.affects.join(', ')})`),
    DForm: c.diffusion?.form ?? null,
    DStatus: c.diffusion ? (c.diffusion.status ?? 'value') : null,
    DRange: c.diffusion?.rangeCm2PerS ?? null,
    DNote: c.diffusion?.note ?? null,
    alpha: num(c.alpha ?? c.diffusion?.alphaUsed ?? null),
    alphaMeaning: ALPHA_MEANING,
    alphaSource: c.transferCoefficient?.source ?? (c.surface?.lavironAlpha != null ? 'laviron' : null),
    alphaRange: c.transferCoefficient?.alphaCRange ?? null,
    alphaNa: num(c.transferCoefficient?.forwardAlphaNa),
    alphaNaRange: c.transferCoefficient?.forwardAlphaNaRange ?? null,
    transferElectronCount: c.transferCoefficient?.transferElectronCount ?? null,
    alphaText: c.transferCoefficient ? [c.transferCoefficient.text, c.transferCoefficient.note].filter(Boolean).join('; ') : null,
    EhalfMeaning: c.eHalfMeaning ?? null,
    logLogReading: c.logLog?.reading ?? null,
    EpaShiftPerDecade: num(c.peakShift.anodic?.slopeVPerDecade),
    EpcShiftPerDecade: num(c.peakShift.cathodic?.slopeVPerDecade),
    k0LowerBound: num(c.rateConstant?.lowerBoundCmPerS),
    k0Status: c.rateConstant?.status ?? null,
    k0Range: c.rateConstant?.rangeCmPerS ?? null,
    k0Reason: c.rateConstant?.reason ?? null,
    E0: num(c.rateConstant?.formalPotentialV ?? c.surface?.formalPotentialV ?? null),
    E0Source: c.rateConstant?.formalPotentialSource ?? c.surface?.formalPotentialSource ?? null,
    E0Range: c.rateConstant?.formalPotentialRangeV ?? c.surface?.formalPotentialRangeV ?? null,
    k0PerFile: (c.rateConstant?.perFile ?? []).map((k) => ({
      file: c.points.find((p) => p.fileIndex === k.fileIndex)?.fileName ?? null, k0: num(k.k0CmPerS), method: k.method, reason: k.reason,
      range: k.rangeCmPerS ?? null, E0: num(k.formalPotentialV ?? null), E0Range: k.formalPotentialRangeV ?? null, note: k.note ?? null,
    })),
    ohmic: c.ohmic ? { grows: c.ohmic.grows, ru: c.ohmic.ruOhm, explainingRu: num(c.ohmic.explainingRuOhm), share: num(c.ohmic.ohmicShare), limitsK0: c.ohmic.limitsK0, text: c.ohmic.text } : null,
    gammaFromSlope: num(c.surface?.coverageFromSlopeMolPerCm2),
    gammaFromSlopeForm: c.surface?.coverageFromSlopeForm ?? null,
    gammaFromSlopeRange: c.surface?.coverageFromSlopeRangeMolPerCm2 ?? null,
    gammaFromSlopeNote: c.surface?.coverageFromSlopeNote ?? null,
    lavironAlpha: num(c.surface?.lavironAlpha ?? null),
    ks: num(c.surface?.ksPerS),
    ksStatus: c.surface?.ksStatus ?? null,
    ksRange: c.surface?.ksRangePerS ?? null,
    ksLowerBound: num(c.surface?.ksLowerBoundPerS ?? null),
    ksNote: c.surface?.ksNote ?? null,
    ksFiles: c.surface ? c.surface.ksFileCount : null,
    ksAlphaSource: c.surface?.ksAlphaSource ?? null,
    ksPerFile: (c.surface?.ksPerFile ?? []).map((k) => ({ file: c.points.find((p) => p.fileIndex === k.fileIndex)?.fileName ?? null, ks: num(k.ksPerS), range: k.rangePerS })),
    ohmicRuFilm: num(c.surface?.ohmicRuOhm ?? null),
    lavironApparentN: num(c.surface?.lavironApparentElectronCount ?? null),
    electroactiveArea: num(c.electroactiveAreaCm2),
    kf: num(c.followUp?.rateConstantPerS ?? null),
    kfRange: c.followUp?.rangePerS ?? null,
    kfLowerBound: num(c.followUp?.lowerBoundPerS ?? null),
    kfZone: c.followUp?.zone ?? null,
    followUpEvidence: c.followUp?.evidence ?? [],
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
    // What the importer could only guess or doubt first (each message names its file), as the text report lists it.
    warnings: [
      ...r.files.flatMap((f) => f.provenance.importWarnings ?? []),
      ...r.warnings.map((w) => (w.fileName ? `${w.fileName}: ${w.message}` : w.series && r.series.length > 1 ? `${w.series}: ${w.message}` : w.message)),
    ],
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
  const c = s?.capacitance;
  return c ? {
    Cd: c.capacitanceFPerCm2, CdStatus: c.status, CdUpperBound: c.upperBoundFPerCm2, pointwise: c.pointCapacitancesFPerCm2, CdCI95: c.capacitanceIntervalFPerCm2, model: c.model,
    faradaicTail: c.faradaicTailAPerSqrtVPerS, warning: c.warning,
  } : null;
}

export type RunContract = ReturnType<typeof runContract>;
