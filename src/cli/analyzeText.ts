/** The readable `analyze` report (no --json): a couple table per file and cycle, then the series. */
import type { AnalyzeRunResult } from '../core/analysis/runTypes';
import type { SeriesCouple } from '../core/analysis/seriesTypes';
import { describeCapacitance } from '../core/series';
import { formatFixed } from '../core/units';

const f = (x: number | null | undefined, digits: number, scale = 1) =>
  x === null || x === undefined || !Number.isFinite(x) ? '—' : formatFixed(x * scale, digits);
const e = (x: number | null | undefined, digits = 3) => (x === null || x === undefined || !Number.isFinite(x) ? '—' : x.toExponential(digits - 1));

const COLUMNS: Array<[string, number]> = [
  ['file', 24], ['v (V/s)', 9], ['cyc', 4], ['Epa (V)', 9], ['Epc (V)', 9], ['E½ (V)', 9], ['ΔEp (mV)', 9], ['ipa (µA)', 10], ['ipc (µA)', 10], ['ratio', 7], ['verdict', 16],
];
const line = (cells: string[]) => cells.map((c, i) => c.padEnd(COLUMNS[i]?.[1] ?? 10)).join(' ').trimEnd();

function coupleRows(r: AnalyzeRunResult): string[] {
  const rows = [line(COLUMNS.map(([h]) => h))];
  for (const file of r.files) {
    for (const cy of file.analysis.cycles) {
      if (!cy.couples.length) rows.push(line([file.fileName.slice(0, 24), f(file.scanRateVPerS, 4), String(cy.index), 'no peaks']));
      for (const c of cy.couples) {
        rows.push(line([file.fileName.slice(0, 24), f(file.scanRateVPerS, 4), String(cy.index), f(c.epaV, 4), f(c.epcV, 4), f(c.eHalfV, 4),
          f(c.deltaEpV, 1, 1000), f(c.ipaA, 3, 1e6), f(c.ipcA, 3, 1e6), f(c.ratio, 3), c.verdict.category]));
      }
    }
  }
  return rows;
}

const rangeText = (r: [number, number] | null | undefined) => (r ? ` [${e(r[0])}–${e(r[1])}]` : '');

/** D with its range; "cannot tell" and the range when D cannot be separated from k_f. */
function dText(c: SeriesCouple): string {
  const d = c.diffusion;
  if (!d) return '—';
  return d.status === 'range-only' ? `cannot tell, in${rangeText(d.rangeCm2PerS)}` : `${e(d.diffusionCm2PerS)}${rangeText(d.rangeCm2PerS)}`;
}

/** k_s of a film with its range, or "≥ bound", or "cannot tell (uncompensated resistance?)". */
function ksText(c: SeriesCouple): string {
  const s = c.surface;
  if (!s) return '—';
  if (s.ksStatus === 'cannot-tell') return `cannot tell — uncompensated resistance?${s.ohmicRuOhm !== null ? ` (Ru ≈ ${s.ohmicRuOhm} Ω)` : ''}`;
  if (s.ksStatus === 'lower-bound') return s.ksLowerBoundPerS === null ? '—' : `≥ ${e(s.ksLowerBoundPerS)} 1/s`;
  return `${e(s.ksPerS)}${rangeText(s.ksRangePerS)} 1/s${s.ksStatus === 'estimate' ? ' (estimate)' : ''}`;
}

/** k° with its range over αc, or "≥ bound", or "cannot tell". */
function k0Text(c: SeriesCouple): string {
  const k = c.rateConstant;
  if (!k) return '—';
  // A bound needs D: without it there is no number (a note below the line says why), not "≥ —".
  if (k.status === 'lower-bound') return k.lowerBoundCmPerS === null ? '—' : `≥ ${e(k.lowerBoundCmPerS)}`;
  if (k.status === 'cannot-tell') return 'cannot tell';
  return `${e(k.k0CmPerS)}${rangeText(k.rangeCmPerS)}`;
}

function seriesLines(c: SeriesCouple): string[] {
  const fit = c.forwardFit;
  const half = c.eHalfV === null ? 'no E½ (no file has both peaks)' : `E½ = ${f(c.eHalfV, 4)} V`;
  const out = [`couple ${c.index}: ${half} over ${c.points.length} file(s); ${c.verdict.label}`];
  const surfaceFit = c.regime === 'surface' ? (c.surface?.fit ?? null) : null;
  if (surfaceFit) {
    out.push(`  |ip| vs v: slope ${e(surfaceFit.slope)} A·s/V, intercept ${e(surfaceFit.intercept)} A, R² ${f(surfaceFit.r2, 5)}   k_s = ${ksText(c)}`);
  } else if (fit) {
    const ci = fit.slopeInterval ? ` (95 % CI ${e(fit.slopeInterval[0])} to ${e(fit.slopeInterval[1])})` : '';
    out.push(`  |ip| vs v^½: slope ${e(fit.slope)} A·(V/s)^-½${ci}, intercept ${e(fit.intercept)} A, R² ${f(fit.r2, 5)}`);
  }
  out.push(`  D = ${dText(c)} cm²/s   log–log slope = ${f(c.logLog?.slope, 3)}   k° = ${k0Text(c)} cm/s   Γ = ${e(c.surface?.coverageFromChargeMolPerCm2 ?? c.surface?.coverageFromSlopeMolPerCm2)} mol/cm²`);
  if (c.alpha !== null) out.push(`  αc = ${f(c.alpha, 3)} (cathodic transfer coefficient)${c.transferCoefficient ? `, forward αnₐ = ${f(c.transferCoefficient.forwardAlphaNa, 3)}` : ''}`);
  if (c.followUp) out.push(`  k_f = ${c.followUp.rateConstantPerS === null && c.followUp.lowerBoundPerS !== null ? `≥ ${e(c.followUp.lowerBoundPerS)}` : e(c.followUp.rateConstantPerS)} 1/s (follow-up reaction)`);
  for (const d of c.diagnostics) out.push(`  · ${d}`);
  return out;
}

export function analyzeText(r: AnalyzeRunResult): string {
  const scale = r.reference.output ? `potentials vs ${r.reference.output}` : "potentials on each file's own reference scale";
  const parts = [`${scale}; currents as positive magnitudes`, '', ...coupleRows(r)];
  for (const s of r.series) {
    parts.push('', `Series "${s.key}" (${s.fileNames.length} file${s.fileNames.length === 1 ? '' : 's'}):`);
    if (!s.analysis.couples.length) parts.push('  no couples found');
    for (const c of s.analysis.couples) parts.push(...seriesLines(c));
    if (s.capacitance) parts.push(`  double-layer capacitance Cd ${describeCapacitance(s.capacitance)}`);
  }
  // What the importer could only guess or doubt (each message names its file); --inspect has the rest.
  const read = r.files.flatMap((file) => file.provenance.importWarnings ?? []);
  if (read.length) parts.push('', 'Reading the files:');
  for (const m of read) parts.push(`  - ${m}`);
  // One push per warning: a spread of 10⁵ warnings (a trace of many tiny cycles) overflows the stack.
  if (r.warnings.length) parts.push('', 'Warnings:');
  for (const w of r.warnings) parts.push(`  - ${w.fileName ? `${w.fileName}: ` : w.series ? `${w.series}: ` : ''}${w.message}`);
  return `${parts.join('\n')}\n`;
}
