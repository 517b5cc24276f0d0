/**
 * The readable part of the results sheet, ready to paste into a lab notebook: one table of files
 * (with what their headers say about sample, operator and electrodes), one of series and one of
 * couples. Units sit in the column heads (V, mV, µA, cm² s⁻¹) and every number is rounded to
 * what its uncertainty supports (core/statistics/roundToUncertainty.ts): potentials to the
 * potential step, currents to the file's noise, D to its regression interval, k° to two
 * significant digits. The same numbers in SI units at full precision follow in the raw tables
 * (exportResults.ts). Each table is a header row and rows of text cells; an empty cell is "".
 */
import type { AnalyzeRunResult, RunFileResult, RunSeriesResult } from '../core/analysis/runTypes';
import type { SeriesCouple } from '../core/analysis/seriesTypes';
import { decimalsFor } from '../core/statistics/roundToUncertainty';

export interface TextTable {
  name: string;
  header: string[];
  rows: string[][];
}

/** A number printed with the decimals its uncertainty supports, or "" when there is none. */
export function fixedFor(x: number | null | undefined, uncertainty: number, scale = 1): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '';
  const u = Math.abs(uncertainty * scale);
  return (x * scale).toFixed(Math.min(12, u > 0 ? decimalsFor(u) : 4));
}

/** A number to n significant digits in scientific notation, or "". */
export function sigFigs(x: number | null | undefined, digits: number): string {
  return x === null || x === undefined || !Number.isFinite(x) ? '' : x.toExponential(digits - 1);
}

/** Median spacing of the potential column as analysed (V): the resolution of a peak potential. */
function potentialStepV(f: RunFileResult): number {
  const peaks = f.analysis.cycles.flatMap((c) => c.peaks);
  const widths = peaks.map((p) => Math.abs(p.baseline.potentialV[1]! - p.baseline.potentialV[0]!)).filter((w) => w > 0).sort((a, b) => a - b);
  return widths[widths.length >> 1] ?? 0.001;
}

/** Current unit for a column of magnitudes: µA, nA or mA by the largest. */
function currentUnit(maxA: number): { unit: string; factor: number } {
  if (maxA >= 1e-3) return { unit: 'mA', factor: 1e3 };
  if (maxA >= 1e-6 || maxA === 0) return { unit: 'µA', factor: 1e6 };
  return { unit: 'nA', factor: 1e9 };
}

const metadataLike = (md: Record<string, string> | undefined, re: RegExp) => Object.entries(md ?? {}).find(([k]) => re.test(k))?.[1] ?? '';

export function filesTable(r: AnalyzeRunResult): TextTable {
  return {
    name: 'files',
    header: ['file', 'series', 'role', 'sample', 'operator', 'working electrode', 'reference electrode (as written)', 'recorded',
      'scan rate / (mV s⁻¹)', 'scan rate from', 'currents', 'blank', 'size / bytes', 'SHA-256', 'layout'],
    rows: r.files.map((f) => {
      const md = f.provenance.metadata;
      return [f.fileName, f.series, f.role, metadataLike(md, /sample|analyte|solution/i), metadataLike(md, /operator|user|analyst/i),
        metadataLike(md, /working|^we$|electrode(?!.*(ref|counter))/i), metadataLike(md, /ref/i), metadataLike(md, /date|recorded|time of/i),
        String(Number((f.scanRateVPerS * 1000).toPrecision(6))), f.scanRateSource ?? '', f.currentKind === 'density' ? 'densities, A/cm²' : 'A',
        f.blank?.fileName ?? '', String(f.provenance.sizeBytes ?? ''), f.provenance.sha256 ?? '', f.provenance.layout ?? ''];
    }),
  };
}

export function couplesTable(r: AnalyzeRunResult): TextTable {
  const maxA = Math.max(0, ...r.files.flatMap((f) => f.analysis.cycles.flatMap((c) => c.couples.flatMap((k) => [k.ipaA ?? 0, k.ipcA ?? 0]))));
  const cu = currentUnit(maxA);
  const anyDensity = r.files.some((f) => f.currentKind === 'density');
  const rows = r.files.flatMap((f) => {
    const uE = potentialStepV(f) / 2;
    const uI = f.analysis.noiseA;
    return f.analysis.cycles.flatMap((cy) => cy.couples.map((k) => {
      const rel = k.ipaA && k.ipcA ? Math.hypot(uI / k.ipaA, uI / k.ipcA) * (k.ratio ?? 0) : 0.001;
      const fwdWidth = k.forwardDirection === 'anodic' ? k.anodicHalfPeakWidthV : k.cathodicHalfPeakWidthV;
      return [f.fileName, f.series, String(Number((f.scanRateVPerS * 1000).toPrecision(6))), String(cy.index), String(k.index + 1),
        fixedFor(k.epaV, uE), fixedFor(k.epcV, uE), fixedFor(k.eHalfV, uE), fixedFor(k.deltaEpV, uE, 1000),
        fixedFor(k.ipaA, uI, cu.factor), fixedFor(k.ipcA, uI, cu.factor), fixedFor(k.ratio, rel), fixedFor(fwdWidth, uE, 1000),
        k.verdict.category, String(f.warnings.length), ...(anyDensity ? [f.currentKind === 'density' ? 'per cm²' : ''] : [])];
    }));
  });
  return {
    name: 'couples',
    header: ['file', 'series', 'v / (mV s⁻¹)', 'cycle', 'couple', 'Epa / V', 'Epc / V', 'E½ / V', 'ΔEp / mV', `ipa / ${cu.unit}`, `ipc / ${cu.unit}`,
      'ip return / ip forward', '|Ep − Ep/2| of the forward peak / mV', 'reading', 'warnings', ...(anyDensity ? ['ipa, ipc per cm² of electrode'] : [])],
    rows,
  };
}

/** D with the decimals its regression interval supports, and both 95 % intervals. */
function diffusionCells(c: SeriesCouple): string[] {
  const d = c.diffusion;
  if (!d) return ['', '', '', '', ''];
  const ci = d.intervalCm2PerS;
  // D ∝ slope², so u(D)/D = 2·u(slope)/slope.
  const u = d.slopeRelativeStdError !== null && d.slopeRelativeStdError > 0 ? 2 * d.diffusionCm2PerS * d.slopeRelativeStdError : d.diffusionCm2PerS * 0.01;
  const scale = 10 ** -Math.floor(Math.log10(d.diffusionCm2PerS));
  const at = (x: number | undefined) => (x === undefined ? '' : `${fixedFor(x, u, scale)}e${-Math.log10(scale)}`);
  const combined = d.combinedIntervalCm2PerS ?? null;
  if (d.status === 'range-only') {
    const range = d.rangeCm2PerS;
    return ['', range ? `${at(range[0])} … ${at(range[1])} (range only)` : '', '', d.form, d.note ?? ''];
  }
  return [at(d.diffusionCm2PerS), ci ? `${at(ci[0])} … ${at(ci[1])}` : '', combined ? `${at(combined[0])} … ${at(combined[1])}` : '', d.form, d.note ?? ''];
}

function seriesRows(s: RunSeriesResult, cu: { unit: string; factor: number }): string[][] {
  const defaults = s.defaultsUsed.map((d) => `${d.affects.join(', ')} on default ${d.value}`).join('; ');
  return s.analysis.couples.map((c) => {
    const f = c.forwardFit;
    const surface = c.regime === 'surface' ? c.surface : null;
    const k = c.rateConstant;
    return [s.key, String(c.index + 1), String(c.points.length), fixedFor(c.eHalfV, 0.0001), c.verdict.category,
      f ? fixedFor(f.slope, f.slopeStdError ?? Math.abs(f.slope) * 1e-3, cu.factor) : '', f && Number.isFinite(f.r2) ? f.r2.toFixed(4) : '',
      ...diffusionCells(c), sigFigs(k?.k0CmPerS, 2), sigFigs(k?.lowerBoundCmPerS, 2), k && k.status === 'cannot-tell' ? `cannot tell${k.reason ? `: ${k.reason}` : ''}` : (k?.reason ?? ''),
      c.alpha === null ? '' : c.alpha.toFixed(2),
      sigFigs(surface?.coverageFromChargeMolPerCm2 ?? surface?.coverageFromSlopeMolPerCm2, 3), sigFigs(surface?.ksPerS, 2), sigFigs(c.followUp?.rateConstantPerS, 2),
      c.logLog ? c.logLog.slope.toFixed(2) : '', s.currentKind === 'density' ? 'per cm² of electrode' : 'A', defaults];
  });
}

export function seriesTable(r: AnalyzeRunResult): TextTable {
  const maxSlope = Math.max(0, ...r.series.flatMap((s) => s.analysis.couples.map((c) => Math.abs(c.forwardFit?.slope ?? 0))));
  const cu = currentUnit(maxSlope);
  return {
    name: 'series',
    header: ['series', 'couple', 'files', 'E½ (median) / V', 'reading', `|ip| vs v½ slope / (${cu.unit} s½ V⁻½)`, 'R²', 'D / (cm² s⁻¹)',
      'D 95 % (regression)', 'D 95 % (with u(A), u(C))', 'D form', 'D note', 'k° / (cm s⁻¹)', 'k° lower bound / (cm s⁻¹)', 'k° note', 'αc', 'Γ / (mol cm⁻²)',
      'k_s / s⁻¹', 'k_f / s⁻¹', 'log|ip| vs log v slope', 'currents', 'defaults used'],
    rows: r.series.flatMap((s) => seriesRows(s, cu)),
  };
}
