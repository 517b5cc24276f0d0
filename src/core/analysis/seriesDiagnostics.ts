/**
 * Plain-words statements of what a scan-rate series shows for one couple, each with its number
 * and the expectation it is compared with, and what its E½ means.
 * Expectations: reversible Ep independent of v and ip ∝ v^½ (J. Wang, Analytical
 *   Electrochemistry 2nd ed. (2000) §2-1.1.1); irreversible |dEp/d log v| = 29.58/(α nₐ) mV per
 *   decade at 25 °C (Wang eq. 2-5); log–log slope 0.5 diffusion, 1 adsorbed (bands: common
 *   practice, no source); linearity threshold R² ≥ 0.98 is common practice, no source.
 *   E½ = E°′ + (RT/2nF)·ln(D_R/D_O) for a reversible couple (Bard & Faulkner 2nd ed. §6.2); for slow
 *   electron transfer the peaks move apart by RT/(αnₐF) and RT/((1 − α)nₐF) per unit of ln v
 *   (Wang eq. 2-5; Laviron 1979 for films), so their midpoint is E°′ only for α = 0.5.
 */
import { formatMillivolts, formatScanRate } from '../units';
import { irreversibleShiftText } from '../series/peakPotentialVsLogScanRate';
import type { ResolvedSeriesOptions } from './seriesFits';
import type { SeriesCouple } from './seriesTypes';

const mv = formatMillivolts;
const sci = (v: number, d = 3) => v.toExponential(d - 1);
const span = (r: [number, number] | null | undefined, unit: string) => (r ? `; range ${sci(r[0])}–${sci(r[1])} ${unit}` : '');

function describeDrift(c: Omit<SeriesCouple, 'verdict'>, temperatureK: number): string[] {
  const out: string[] = [];
  const halves = c.points.flatMap((p) => (p.eHalfV === null ? [] : [p.eHalfV]));
  if (halves.length >= 2) out.push(`E½ spans ${mv(Math.max(...halves) - Math.min(...halves))} over the series`);
  const shift = c.forwardDirection === 'anodic' ? c.peakShift.anodic : c.peakShift.cathodic;
  if (shift && c.regime === 'surface') {
    out.push(`forward ${c.forwardDirection} peak moves ${mv(shift.slopeVPerDecade)} per tenfold scan rate over the whole series (Nernstian film: 0; Laviron, n·ΔEp > 200 mV: 2.303RT/((1 − αc)nF) anodic or 2.303RT/(αc·nF) cathodic, 118 mV for αc = 0.5)`);
  } else if (shift) {
    out.push(`forward ${c.forwardDirection} peak moves ${mv(shift.slopeVPerDecade)} per tenfold scan rate (reversible: 0; totally irreversible: ±${irreversibleShiftText(temperatureK)}, αnₐ of the forward wave)`);
  }
  return out;
}

function describeLines(c: Omit<SeriesCouple, 'verdict'>): string[] {
  const out: string[] = [];
  const sf = c.regime === 'surface' ? (c.surface?.fit ?? null) : null;
  const f = sf ?? c.forwardFit;
  const against = sf ? 'v' : 'v^½';
  if (f && f.pointCount > 1 && Number.isFinite(f.r2)) {
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

function describeDiffusion(c: Omit<SeriesCouple, 'verdict'>, o: ResolvedSeriesOptions): string[] {
  const out: string[] = [];
  if (c.transferCoefficient) out.push(c.transferCoefficient.text);
  const d = c.diffusion;
  if (d) {
    out.push(d.status === 'range-only'
      ? `D cannot be told on its own${span(d.rangeCm2PerS, 'cm²/s')}`
      : `D = ${sci(d.diffusionCm2PerS)} cm²/s (Randles–Ševčík, ${d.form} form${d.alphaUsed === null ? '' : `, αc = ${d.alphaUsed.toFixed(2)}`})${span(d.rangeCm2PerS, 'cm²/s')}`);
    if (d.note) out.push(d.note);
  }
  if (c.electroactiveAreaCm2 !== null) out.push(`electroactive area ${c.electroactiveAreaCm2.toFixed(4)} cm² from the slope and the given D (${o.diffusionCm2PerS} cm²/s)`);
  if (c.ohmic) out.push(c.ohmic.text);
  const k = c.rateConstant;
  if (k?.status === 'value' && k.k0CmPerS !== null) {
    const used = k.perFile.filter((f) => f.k0CmPerS !== null);
    const names = [...new Set(used.map((f) => (f.method === 'nicholson' ? "Nicholson's ψ (table)" : f.method === 'lavagnini' ? "Nicholson's ψ (Lavagnini fit)" : f.method === 'forward-peak' ? 'forward peak, eq. 2-5, E°′ given' : 'forward peak, eq. 2-5, E°′ from the return peak with simulated departures')))].join(' and ');
    out.push(`k° = ${sci(k.k0CmPerS)} cm/s (${names}; median of ${used.length} file${used.length > 1 ? 's' : ''}; D_O/D_R = ${o.diffusionRatio}; D ${k.diffusionSource ?? ''})${span(k.rangeCmPerS, 'cm/s over αc')}`);
  } else if (k?.status === 'lower-bound') {
    out.push(`k° ≥ ${k.lowerBoundCmPerS === null ? '?' : sci(k.lowerBoundCmPerS, 2)} cm/s only: ${k.reason ?? ''}`);
  } else if (k?.status === 'cannot-tell') {
    out.push(`k° cannot be told: ${k.reason ?? ''}`);
  }
  if (k?.formalPotentialV != null) out.push(`E°′ = ${k.formalPotentialV.toFixed(4)} V${k.formalPotentialRangeV ? ` (${k.formalPotentialRangeV.map((e) => e.toFixed(4)).join(' to ')} V)` : ''} (${k.formalPotentialSource ?? ''})`);
  else if (k?.formalPotentialRangeV) out.push(`E°′ lies within ${k.formalPotentialRangeV.map((e) => e.toFixed(4)).join(' to ')} V (${k.formalPotentialSource ?? ''})`);
  return out;
}

function describeFollowUp(c: Omit<SeriesCouple, 'verdict'>): string[] {
  const fu = c.followUp;
  if (!fu) return [];
  const out = [...fu.evidence];
  if (fu.rateConstantPerS !== null) out.push(`k_f = ${sci(fu.rateConstantPerS)} 1/s (first-order follow-up reaction, one value for all files from their Nicholson (1966) ratios on a simulated Nicholson–Shain working curve; assumes fast electron transfer)${span(fu.rangePerS, '1/s')}`);
  else if (fu.lowerBoundPerS !== null) out.push(`k_f ≥ ${sci(fu.lowerBoundPerS, 2)} 1/s only (zone: ${fu.zone})`);
  else out.push(`k_f not determinable: ${fu.perFile.find((f) => f.reason)?.reason ?? 'no usable ratio'}`);
  return out;
}

function describeSurface(c: Omit<SeriesCouple, 'verdict'>): string[] {
  const s = c.surface;
  if (!s) return [];
  const out: string[] = [];
  if (s.coverageFromChargeMolPerCm2 !== null) out.push(`Γ = ${sci(s.coverageFromChargeMolPerCm2)} mol/cm² from the peak charge`);
  if (s.coverageFromSlopeMolPerCm2 !== null) out.push(`Γ = ${sci(s.coverageFromSlopeMolPerCm2)} mol/cm² from the slope of ip against v (${s.coverageFromSlopeNote ?? ''})`);
  else if (s.coverageFromSlopeNote) out.push(`no Γ from the ip–v slope: ${s.coverageFromSlopeNote}`);
  if (s.lavironAlpha !== null) out.push(`Laviron αc = ${s.lavironAlpha.toFixed(3)} (cathodic transfer coefficient, from the Ep–log v lines of the files with n·ΔEp > 200 mV)`);
  out.push(describeSurfaceRate(s));
  return out;
}

/** k_s in words, with its status. */
function describeSurfaceRate(s: NonNullable<SeriesCouple['surface']>): string {
  const range = s.ksRangePerS ? ` (range ${s.ksRangePerS.map((k) => sci(k)).join('–')} 1/s)` : '';
  if (s.ksStatus === 'cannot-tell') return `k_s: ${s.ksNote}`;
  if (s.ksStatus === 'lower-bound') return `k_s ≥ ${s.ksLowerBoundPerS === null ? '?' : sci(s.ksLowerBoundPerS)} 1/s only: ${s.ksNote}`;
  return `Laviron k_s = ${sci(s.ksPerS!)} 1/s${s.ksStatus === 'estimate' ? ' (estimate)' : ''}${range}: ${s.ksNote}`;
}

/** First line: transport regime and kinetics in words; for a surface couple with the ΔEp evidence. */
function describeRegime(c: Omit<SeriesCouple, 'verdict'>, o: ResolvedSeriesOptions): string {
  if (c.regime !== 'surface') return `${c.regime}, ${c.kineticClass}${c.followUp ? `, with a follow-up reaction (${c.followUp.zone} zone)` : ''}`;
  const pts = c.points.filter((p) => p.deltaEpV !== null).sort((a, b) => a.scanRateVPerS - b.scanRateVPerS);
  const first = pts[0];
  const last = pts[pts.length - 1];
  const n = o.electronCount;
  if (c.kineticClass === 'quasi-reversible' && first && last && c.surface?.ksStatus === 'cannot-tell') {
    return `surface, ΔEp widens with v — uncompensated resistance or slow electron transfer, cannot tell: n·ΔEp grows from ${mv(n * first.deltaEpV!)} at ${formatScanRate(first.scanRateVPerS)} to ${mv(n * last.deltaEpV!)} at ${formatScanRate(last.scanRateVPerS)}`;
  }
  if (c.kineticClass === 'quasi-reversible' && first && last) {
    return `surface, slow electron transfer (Laviron): n·ΔEp grows from ${mv(n * first.deltaEpV!)} at ${formatScanRate(first.scanRateVPerS)} to ${mv(n * last.deltaEpV!)} at ${formatScanRate(last.scanRateVPerS)}`;
  }
  if (c.kineticClass === 'reversible' && last) return `surface, fast electron transfer: n·ΔEp stays ≤ 28.5 mV up to ${formatScanRate(last.scanRateVPerS)}`;
  return 'surface, electron-transfer rate not determined from ΔEp';
}

/** What the couple's E½ is. */
export function describeHalfWave(c: Omit<SeriesCouple, 'verdict'>): string {
  if (c.eHalfV === null) return 'no E½: no file has both peaks of this couple (a lone peak gives Ep only)';
  if (c.followUp) return 'E½ is the peak midpoint (Epa + Epc)/2; the follow-up reaction moves the forward peak, so it is not E°′';
  if (c.regime === 'surface') {
    if (c.kineticClass === 'reversible') return 'E½ ≈ E°′ of the film (Nernstian, ΔEp ≈ 0)';
    const s = c.surface;
    const e0 = s?.formalPotentialV != null ? `; E°′ = ${s.formalPotentialV.toFixed(4)} V${s.formalPotentialRangeV ? ` (${s.formalPotentialRangeV.map((e) => e.toFixed(4)).join(' to ')} V)` : ''} from ${s.formalPotentialSource ?? ''}` : '';
    return `E½ is the peak midpoint of a slow film, not E°′: the peaks move apart unequally unless αc = 0.5 (Laviron 1979)${e0}`;
  }
  if (c.kineticClass === 'reversible') return 'E½ = (Epa + Epc)/2 ≈ E°′ + (RT/2nF)·ln(D_R/D_O): E°′ when D_O = D_R';
  const k = c.rateConstant;
  const e0 = k?.formalPotentialV;
  const range = k?.formalPotentialRangeV ? ` (${k.formalPotentialRangeV.map((e) => e.toFixed(4)).join(' to ')} V)` : '';
  const how = k?.formalPotentialSource?.startsWith('from E½') ? 'from the E½ of the file nearest reversibility' : 'from the peak equation';
  return `E½ is the peak midpoint (Epa + Epc)/2, not E°′: slow electron transfer moves the peaks apart unequally unless αc = 0.5${e0 != null ? `; E°′ = ${e0.toFixed(4)} V${range} ${how}` : ''}`;
}

export function describeSeriesCouple(c: Omit<SeriesCouple, 'verdict'>, o: ResolvedSeriesOptions): string[] {
  return [describeRegime(c, o), ...describeDrift(c, o.temperatureK), ...describeLines(c), ...describeDiffusion(c, o), ...describeFollowUp(c), ...describeSurface(c), describeHalfWave(c)];
}
