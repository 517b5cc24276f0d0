/**
 * The results sheet of an analysis run, as CSV (for spreadsheets and notebooks) and as JSON (for
 * scripts). Both carry the method, the parameters, the software version and where each file came
 * from (name, size, SHA-256, scan-rate source, detected layout, what its header says), so a number
 * can be traced back.
 * CSV layout (our own): '#'-prefixed header lines, then tables separated by a blank line and a
 * '# table: …' line. First the readable tables (notebookTables.ts: files, series, couples; units in
 * the column heads, numbers rounded to what their uncertainty supports), then the same results in
 * SI units at full precision: raw peaks, raw couples (one row per file × cycle × couple), raw k0
 * per file, raw series (one row per series × couple), raw double-layer capacitance when measured.
 * Whole-curve fits of series, when there are any, add the readable 'fit' and 'fit models' tables
 * after the couples and the raw fit tables at the end (fitSheet.ts).
 * Signed currents follow the run's sign convention; peak heights and couple currents are positive
 * magnitudes. Left-out points and window edges get their own table when there are any. Every α
 * is named: alpha_c_cathodic is αc (of the reduction O + ne⁻ → R), alpha_n_forward_wave is α·nₐ
 * of the first-sweep wave.
 */
import { currentInConvention } from '../core/conventions';
import type { AnalyzeRunResult } from '../core/analysis/runTypes';
import type { SeriesCouple } from '../core/analysis/seriesTypes';
import { fitModelsTable, fitTable, rawFitTables, type SeriesFit } from './fitSheet';
import { couplesTable, filesTable, seriesTable } from './notebookTables';
import { runContract } from './runContract';

export interface ResultsSheetMeta {
  /** ISO time the sheet was made; left out when absent (keeps output reproducible). */
  createdAt?: string;
  /** The command line or action that produced the run. */
  command?: string;
}

type Cell = string | number | boolean | null | undefined;

function cell(v: Cell): string {
  if (v === null || v === undefined || (typeof v === 'number' && !Number.isFinite(v))) return '';
  const s = typeof v === 'number' ? String(Number(v.toPrecision(10))) : String(v);
  return /[",\n\r]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

const row = (cells: Cell[]) => cells.map(cell).join(',');

function headerLines(r: AnalyzeRunResult, meta: ResultsSheetMeta): string[] {
  const lines = [row(['# results sheet', r.provenance.software.name, r.provenance.software.version])];
  if (meta.createdAt) lines.push(row(['# created', meta.createdAt]));
  if (meta.command) lines.push(row(['# command', meta.command]));
  lines.push(row(['# current sign convention', r.convention === 'iupac' ? 'IUPAC (anodic positive)' : 'polarographic (cathodic positive)']));
  lines.push(row(['# potential scale', r.reference.output ?? "each file's own"]));
  for (const b of r.reference.basis) lines.push(row(['# reference', b]));
  const param = (k: string, v: unknown) => row(['# parameter', k, v === null ? 'none' : typeof v === 'object' ? JSON.stringify(v) : String(v)]);
  for (const [k, v] of Object.entries(r.provenance.method)) lines.push(param(k, v));
  for (const [k, v] of Object.entries(r.provenance.report)) lines.push(param(k, v));
  for (const s of r.series) for (const [k, v] of Object.entries(s.cell)) lines.push(row(['# cell', s.key, k, v === null ? 'none' : typeof v === 'object' ? JSON.stringify(v) : v]));
  for (const m of r.provenance.methods) lines.push(row(['# method', m]));
  for (const f of r.files) {
    const p = f.provenance;
    lines.push(row(['# file', f.fileName, 'series', f.series, 'role', f.role, 'size_bytes', p.sizeBytes, 'sha256', p.sha256, 'scan_rate_V_per_s', f.scanRateVPerS,
      'scan_rate_source', f.scanRateSource, 'points', f.pointCount, 'input_reference', f.reference.input, 'offset_V', f.reference.offsetV,
      'blank', f.blank?.fileName, 'blank_sha256', f.blank?.sha256, 'layout', p.layout]));
  }
  for (const w of r.warnings) lines.push(row(['# warning', w.fileName ?? w.series ?? '', w.message]));
  return lines;
}

function peakTable(r: AnalyzeRunResult): string[] {
  const out = [row(['file', 'cycle', 'direction', 'Ep_V', 'ip_A', 'i_at_Ep_A', 'baseline_at_Ep_A', 'Ep_half_V', 'Ep_minus_Ep_half_V', 'fwhm_V', 'charge_C', 'confidence', 'baseline'])];
  for (const f of r.files) {
    for (const c of f.analysis.cycles) {
      for (const p of c.peaks) {
        out.push(row([f.fileName, c.index, p.direction, p.potentialV, p.heightA, currentInConvention(p.rawCurrentA, r.convention),
          currentInConvention(p.baselineCurrentA, r.convention), p.halfPeakPotentialV, p.halfPeakWidthV, p.fwhmV, p.chargeC, p.confidence, p.baseline.description]));
      }
    }
  }
  return out;
}

/** Points left out of the analysis (spikes) and sweeps that end in a breakdown current, one row each. */
function notedPointsTable(r: AnalyzeRunResult): string[] {
  const out = [row(['file', 'cycle', 'what', 'E_from_V', 'E_to_V', 'direction', 'i_A', 'point'])];
  for (const f of r.files) {
    for (const p of f.analysis.spikes ?? []) out.push(row([f.fileName, '', 'isolated bad point left out', p.potentialV, p.potentialV, '', currentInConvention(p.currentA, r.convention), p.index]));
    for (const c of f.analysis.cycles) {
      for (const e of c.windowEdges ?? []) out.push(row([f.fileName, c.index, 'breakdown or catalytic current at the window edge', e.fromV, e.toV, e.direction, currentInConvention(e.currentA, r.convention), '']));
    }
  }
  return out;
}

function coupleTable(r: AnalyzeRunResult): string[] {
  const out = [row(['file', 'scan_rate_V_per_s', 'cycle', 'couple', 'Epa_V', 'Epc_V', 'E_half_V', 'dEp_V', 'ipa_A', 'ipc_A', 'ratio_return_over_forward', 'nicholson_1966_ratio', 'Qa_C', 'Qc_C', 'verdict', 'verdict_text'])];
  for (const f of r.files) {
    for (const cy of f.analysis.cycles) {
      for (const c of cy.couples) {
        out.push(row([f.fileName, f.scanRateVPerS, cy.index, c.index, c.epaV, c.epcV, c.eHalfV, c.deltaEpV, c.ipaA, c.ipcA, c.ratio, c.nicholsonRatio,
          c.anodicChargeC, c.cathodicChargeC, c.verdict.category, c.verdict.label]));
      }
    }
  }
  return out;
}

function rateTable(r: AnalyzeRunResult): string[] {
  const out = [row(['series', 'series_couple', 'file', 'scan_rate_V_per_s', 'dEp_V', 'psi', 'psi_source', 'method', 'k0_cm_per_s', 'k0_low_over_alpha_c', 'k0_high_over_alpha_c', 'E0_V', 'not_determined_because'])];
  for (const s of r.series) {
    for (const c of s.analysis.couples) {
      for (const k of c.rateConstant?.perFile ?? []) {
        const p = c.points.find((x) => x.fileIndex === k.fileIndex);
        out.push(row([s.key, c.index, p?.fileName ?? s.fileNames[k.fileIndex], p?.scanRateVPerS, p?.deltaEpV, k.psi?.psi, k.psi?.source, k.method, k.k0CmPerS,
          k.rangeCmPerS?.[0], k.rangeCmPerS?.[1], k.formalPotentialV, k.reason]));
      }
    }
  }
  return out;
}

const SERIES_COLUMNS = ['series', 'couple', 'E_half_V', 'E_half_meaning', 'files', 'regime', 'kinetic_class', 'verdict', 'slope_ip_vs_sqrt_v_A_s05_V05', 'slope_ci95_low',
  'slope_ci95_high', 'intercept_A', 'r2', 'D_cm2_per_s', 'D_ci95_low', 'D_ci95_high', 'D_ci95_with_uA_uC_low', 'D_ci95_with_uA_uC_high', 'D_status', 'D_range_low', 'D_range_high', 'D_form',
  'alpha_c_cathodic', 'alpha_c_source', 'alpha_c_range_low', 'alpha_c_range_high', 'alpha_n_forward_wave', 'log_log_slope', 'log_log_reading',
  'Epa_shift_V_per_decade', 'Epc_shift_V_per_decade', 'k0_cm_per_s', 'k0_status', 'k0_range_low', 'k0_range_high', 'k0_lower_bound_cm_per_s', 'k0_reason',
  'E0_V', 'D_used_for_k0_cm2_per_s', 'ohmic_explaining_Ru_ohm', 'kf_per_s', 'kf_lower_bound_per_s', 'gamma_from_charge_mol_per_cm2',
  'gamma_from_slope_mol_per_cm2', 'gamma_from_slope_form', 'laviron_alpha_c', 'ks_per_s', 'ks_status', 'ks_range_low_per_s', 'ks_range_high_per_s', 'ks_lower_bound_per_s', 'ks_note', 'ohmic_Ru_film_ohm', 'E0_film_V', 'E0_film_range_low_V', 'E0_film_range_high_V', 'electroactive_area_cm2', 'anodic_slope_A_s05_V05', 'anodic_r2',
  'cathodic_slope_A_s05_V05', 'cathodic_r2', 'diagnostics'];

function seriesRow(key: string, c: SeriesCouple): Cell[] {
  const f = c.forwardFit;
  const d = c.diffusion;
  const k = c.rateConstant;
  const t = c.transferCoefficient;
  return [key, c.index, c.eHalfV, c.eHalfMeaning, c.points.length, c.regime, c.kineticClass, c.verdict.category, f?.slope, f?.slopeInterval?.[0],
    f?.slopeInterval?.[1], f?.intercept, f?.r2, d?.status === 'range-only' ? null : d?.diffusionCm2PerS, d?.intervalCm2PerS?.[0], d?.intervalCm2PerS?.[1],
    d?.status === 'range-only' ? null : d?.combinedIntervalCm2PerS?.[0], d?.status === 'range-only' ? null : d?.combinedIntervalCm2PerS?.[1],
    d ? (d.status ?? 'value') : null, d?.rangeCm2PerS?.[0], d?.rangeCm2PerS?.[1], d?.form,
    c.alpha ?? d?.alphaUsed, t?.source, t?.alphaCRange?.[0], t?.alphaCRange?.[1], t?.forwardAlphaNa, c.logLog?.slope, c.logLog?.reading,
    c.peakShift.anodic?.slopeVPerDecade, c.peakShift.cathodic?.slopeVPerDecade, k?.k0CmPerS, k?.status, k?.rangeCmPerS?.[0], k?.rangeCmPerS?.[1],
    k?.lowerBoundCmPerS, k?.reason, k?.formalPotentialV, k?.diffusionOxCm2PerS, c.ohmic?.explainingRuOhm, c.followUp?.rateConstantPerS,
    c.followUp?.lowerBoundPerS, c.surface?.coverageFromChargeMolPerCm2, c.surface?.coverageFromSlopeMolPerCm2, c.surface?.coverageFromSlopeForm,
    c.surface?.lavironAlpha, c.surface?.ksPerS, c.surface?.ksStatus, c.surface?.ksRangePerS?.[0], c.surface?.ksRangePerS?.[1], c.surface?.ksLowerBoundPerS, c.surface?.ksNote,
    c.surface?.ohmicRuOhm, c.surface?.formalPotentialV, c.surface?.formalPotentialRangeV?.[0], c.surface?.formalPotentialRangeV?.[1], c.electroactiveAreaCm2, c.anodicFit?.slope, c.anodicFit?.r2,
    c.cathodicFit?.slope, c.cathodicFit?.r2, c.diagnostics.join('; ')];
}

/** The results sheet as CSV text (CRLF-free, UTF-8 characters as they are); `fits`: whole-curve fits of its series. */
export function resultsSheetCsv(result: AnalyzeRunResult, meta: ResultsSheetMeta = {}, fits: readonly SeriesFit[] = []): string {
  const tables = [filesTable(result), seriesTable(result), couplesTable(result), ...(fits.length ? [fitTable(fits), fitModelsTable(fits)] : [])];
  const readable = tables.map((t) => [`# table: ${t.name}`, row(t.header), ...t.rows.map(row)]);
  const parts = [
    [...headerLines(result, meta), '# the tables below are rounded to what each number supports; the "raw" tables after them give every number in SI units at full precision'],
    ...readable,
    ['# table: raw peaks', ...peakTable(result)],
    ['# table: raw couples', ...coupleTable(result)],
    ['# table: raw k0 per file', ...rateTable(result)],
    ['# table: raw series', row(SERIES_COLUMNS), ...result.series.flatMap((s) => s.analysis.couples.map((c) => row(seriesRow(s.key, c))))],
  ];
  const noted = notedPointsTable(result);
  if (noted.length > 1) parts.push(['# table: left-out points and window edges', ...noted]);
  const withCd = result.series.filter((s) => s.capacitance);
  if (withCd.length) {
    parts.push(['# table: raw double-layer capacitance', row(['series', 'Cd_F_per_cm2', 'Cd_status', 'Cd_upper_bound_F_per_cm2', 'Cd_ci95_low', 'Cd_ci95_high', 'model', 'faradaic_tail_A_per_sqrt_V_per_s', 'line_intercept_A', 'line_r2', 'warning']),
      ...withCd.map((s) => {
        const c = s.capacitance;
        return row([s.key, c?.capacitanceFPerCm2, c?.status, c?.upperBoundFPerCm2, c?.capacitanceIntervalFPerCm2?.[0], c?.capacitanceIntervalFPerCm2?.[1], c?.model, c?.faradaicTailAPerSqrtVPerS, c?.fit?.intercept, c?.fit?.r2, c?.warning]);
      })]);
  }
  if (fits.length) parts.push(...rawFitTables(fits).map((t) => [`# table: ${t.name}`, ...t.rows.map(row)]));
  return `${parts.map((p) => p.join('\n')).join('\n\n')}\n`;
}

/**
 * The results sheet as JSON text: the run contract (the keys `analyze --json` prints), then the
 * provenance (software, methods, method and report options, each series' cell, each file's
 * origin) and meta.
 */
export function resultsSheetJson(result: AnalyzeRunResult, meta: ResultsSheetMeta = {}, fits: readonly SeriesFit[] = []): string {
  const provenance = {
    ...result.provenance,
    cells: Object.fromEntries(result.series.map((s) => [s.key, s.cell])),
    files: result.files.map((f) => ({ file: f.fileName, series: f.series, role: f.role, reference: f.reference, points: f.pointCount, ...f.provenance })),
  };
  return `${JSON.stringify({ sheet: 'halfwave-results', version: 2, ...meta, ...runContract(result, [], fits), provenance }, null, 2)}\n`;
}
