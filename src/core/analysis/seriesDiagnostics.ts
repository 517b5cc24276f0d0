/**
 * Plain-words statements of what a scan-rate series shows for one couple, each with its number
 * and the expectation it is compared with.
 * Expectations: reversible Ep independent of v and ip ∝ v^½ (J. Wang, Analytical
 *   Electrochemistry 2nd ed. (2000) §2-1.1.1); irreversible |dEp/d log v| = 29.58/(α nₐ) mV per
 *   decade at 25 °C (Wang eq. 2-5); log–log slope 0.5 diffusion, 1 adsorbed (bands: common
 *   practice, no source); linearity threshold R² ≥ 0.98 is common practice, no source.
 */
import { formatMillivolts } from '../units';
import type { ResolvedSeriesOptions } from './seriesFits';
import type { SeriesCouple } from './seriesTypes';

const mv = formatMillivolts;
const sci = (v: number, d = 3) => v.toExponential(d - 1);

function describeDrift(c: Omit<SeriesCouple, 'verdict'>): string[] {
  const out: string[] = [];
  const halves = c.points.flatMap((p) => (p.eHalfV === null ? [] : [p.eHalfV]));
  if (halves.length >= 2) out.push(`E½ spans ${mv(Math.max(...halves) - Math.min(...halves))} over the series`);
  const shift = c.forwardDirection === 'anodic' ? c.peakShift.anodic : c.peakShift.cathodic;
  if (shift && c.regime === 'surface') {
    // Laviron, J. Electroanal. Chem. 101 (1979) 19 (from memory): far from E°′ each peak moves
    // 2.303RT/(αnF) or 2.303RT/((1 − α)nF) per decade.
    out.push(`forward ${c.forwardDirection} peak moves ${mv(shift.slopeVPerDecade)} per tenfold scan rate over the whole series (Nernstian film: 0; Laviron, n·ΔEp > 200 mV: 2.303RT/((1 − α)nF) or 2.303RT/(αnF), 118 mV for α = 0.5)`);
  } else if (shift) {
    out.push(`forward ${c.forwardDirection} peak moves ${mv(shift.slopeVPerDecade)} per tenfold scan rate (reversible: 0; totally irreversible: ±29.6/(αnₐ) mV)`);
  }
  return out;
}

function describeLines(c: Omit<SeriesCouple, 'verdict'>): string[] {
  const out: string[] = [];
  const sf = c.regime === 'surface' ? (c.surface?.fit ?? null) : null;
  const f = sf ?? c.forwardFit;
  const against = sf ? 'v' : 'v^½';
  if (f && f.pointCount > 1) {
    const maxIp = Math.max(...c.points.map((p) => p.forwardIpA ?? 0));
    const rel = maxIp > 0 ? Math.abs(f.intercept) / maxIp : 0;
    out.push(`|ip| against ${against}: R² = ${f.r2.toFixed(4)}, intercept ${(rel * 100).toFixed(1)} % of the largest peak`);
  }
  if (c.logLog) {
    const ci = c.logLog.fit.slopeInterval;
    const range = ci ? ` (95 % CI ${ci[0].toFixed(2)}–${ci[1].toFixed(2)})` : '';
    out.push(`log|ip| against log v: slope ${c.logLog.slope.toFixed(3)}${range} — ${c.logLog.reading}`);
  }
  return out;
}

function describeResults(c: Omit<SeriesCouple, 'verdict'>, o: ResolvedSeriesOptions): string[] {
  const out: string[] = [];
  if (c.diffusion) {
    const a = c.diffusion.alphaUsed === null ? '' : `, α = ${c.diffusion.alphaUsed.toFixed(2)} ${c.diffusion.alphaSource ?? ''}`;
    out.push(`D = ${sci(c.diffusion.diffusionCm2PerS)} cm²/s (Randles–Ševčík, ${c.diffusion.form} form${a})`);
    if (c.diffusion.note) out.push(c.diffusion.note);
  }
  if (c.electroactiveAreaCm2 !== null) out.push(`electroactive area ${c.electroactiveAreaCm2.toFixed(4)} cm² from the slope and the given D (${o.diffusionCm2PerS} cm²/s)`);
  const k = c.rateConstant;
  if (k?.k0CmPerS != null) {
    const used = k.perFile.filter((f) => f.k0CmPerS !== null);
    const names = [...new Set(used.map((f) => (f.method === 'irreversible' ? 'both irreversible peaks, Wang eq. 2-5' : "Nicholson's ψ")))].join(' and ');
    out.push(`k° = ${sci(k.k0CmPerS)} cm/s (${names}; median of ${used.length} file${used.length > 1 ? 's' : ''}; D_O/D_R = ${o.diffusionRatio}; D ${k.diffusionSource ?? ''})`);
  } else if (k?.lowerBoundCmPerS != null) {
    out.push(`ΔEp stays near the reversible value (below the 61 mV start of Nicholson's table) at most scan rates: k° > ${sci(k.lowerBoundCmPerS, 2)} cm/s`);
  }
  const fu = c.followUp;
  if (fu?.rateConstantPerS != null) {
    const used = fu.perFile.filter((f) => f.rateConstantPerS !== null).length;
    out.push(`k_f = ${sci(fu.rateConstantPerS)} 1/s (first-order follow-up reaction, from the return/forward ratio (Nicholson 1966) on a simulated Nicholson–Shain working curve; median of ${used} file${used > 1 ? 's' : ''}; assumes fast electron transfer)`);
  } else if (fu) {
    out.push(`k_f not determinable: ${fu.perFile.find((f) => f.reason)?.reason ?? 'no usable ratio'}`);
  }
  const s = c.surface;
  if (s) {
    if (s.coverageFromChargeMolPerCm2 !== null) out.push(`Γ = ${sci(s.coverageFromChargeMolPerCm2)} mol/cm² from the peak charge`);
    const files = s.coverageFromSlopeFileCount === undefined ? '' : `, ${s.coverageFromSlopeFileCount} file${s.coverageFromSlopeFileCount === 1 ? '' : 's'}`;
    if (s.coverageFromSlopeMolPerCm2 !== null) out.push(`Γ = ${sci(s.coverageFromSlopeMolPerCm2)} mol/cm² from the slope of ip against v (ideal Nernstian film${files})`);
    if (s.ksPerS !== null) out.push(`Laviron k_s = ${sci(s.ksPerS)} 1/s (files with n·ΔEp > 200 mV)`);
  }
  return out;
}

/** First line: transport regime and kinetics in words; for a surface couple with the ΔEp evidence. */
function describeRegime(c: Omit<SeriesCouple, 'verdict'>, o: ResolvedSeriesOptions): string {
  if (c.regime !== 'surface') return `${c.regime}, ${c.kineticClass}`;
  const pts = c.points.filter((p) => p.deltaEpV !== null).sort((a, b) => a.scanRateVPerS - b.scanRateVPerS);
  const first = pts[0];
  const last = pts[pts.length - 1];
  const n = o.electronCount;
  if (c.kineticClass === 'quasi-reversible' && first && last) {
    return `surface, slow electron transfer (Laviron): n·ΔEp grows from ${mv(n * first.deltaEpV!)} at ${first.scanRateVPerS} V/s to ${mv(n * last.deltaEpV!)} at ${last.scanRateVPerS} V/s`;
  }
  if (c.kineticClass === 'reversible' && last) return `surface, fast electron transfer: n·ΔEp stays ≤ 28.5 mV up to ${last.scanRateVPerS} V/s`;
  return 'surface, electron-transfer rate not determined from ΔEp';
}

export function describeSeriesCouple(c: Omit<SeriesCouple, 'verdict'>, o: ResolvedSeriesOptions): string[] {
  return [describeRegime(c, o), ...describeDrift(c), ...describeLines(c), ...describeResults(c, o)];
}
