/**
 * Refines a single-voltammogram verdict with scan-rate evidence from a series.
 * Diagnostics:
 *   log|ip| vs log v slope 0.5 for diffusion, 1 for an adsorbed layer (Bard &
 *     Faulkner 2nd ed. §6.2 and §14.3, from memory);
 *   Ep independent of v for a reversible couple (Wang, Analytical Electrochemistry, 2nd ed. (2000)
 *     §2-1.1.1); a totally irreversible peak moves by ln10·RT/(2αnF) ≈ 29.6/(αn) mV per decade
 *     (Wang eq. 2-5).
 * Thresholds (common practice, no source): slope inside LOG_LOG_DIFFUSION_BAND "diffusion", inside
 *   LOG_LOG_SURFACE_BAND "surface" (series/logLogSlope.ts);
 *   an Ep drift above 0.4·ln10·RT/(2nF) (≈ 11.8/n mV per decade at 25 °C) is "moves with v".
 * In: the verdict and whatever evidence the series has. Out: a new verdict; the input is unchanged.
 */
import { thermalVoltageV } from '../constants';
import { LOG_LOG_DIFFUSION_BAND, LOG_LOG_SURFACE_BAND } from '../series/logLogSlope';
import type { SeriesEvidence, Verdict, VerdictCategory } from './coupleTypes';
import { VERDICT_LABELS } from './classifyCouple';

export function refineVerdictWithSeries(verdict: Verdict, evidence: SeriesEvidence): Verdict {
  const reasons = [...verdict.reasons];
  let category: VerdictCategory = verdict.category;
  let label = verdict.label;
  const change = (to: VerdictCategory, why: string) => {
    reasons.push(why);
    if (to !== category) {
      category = to;
      label = VERDICT_LABELS[to];
    }
  };
  const { electronCount: n, temperatureK } = verdict.evidence;
  const count = evidence.count === undefined ? '' : ` over ${evidence.count} scan rates`;
  const slope = evidence.logLogSlope;
  if (slope !== undefined && Number.isFinite(slope)) {
    const text = `log|ip| vs log v slope = ${slope.toFixed(2)}${count}`;
    if (slope >= LOG_LOG_SURFACE_BAND[0] && slope <= LOG_LOG_SURFACE_BAND[1]) {
      if (category === 'adsorbed') reasons.push(`${text}: as for an adsorbed layer (1)`);
      else change('inconclusive', `${text}: close to 1, which points to a surface-confined species or charging current, not diffusion (0.5)`);
    } else if (slope >= LOG_LOG_DIFFUSION_BAND[0] && slope <= LOG_LOG_DIFFUSION_BAND[1]) {
      if (category === 'adsorbed') change('inconclusive', `${text}: diffusion-like (0.5), although the single voltammogram looks adsorbed`);
      else reasons.push(`${text}: diffusion-controlled (0.5)`);
    } else {
      reasons.push(`${text}: between the diffusion (0.5) and surface (1) limits, mixed control`);
    }
  }
  const drift = largestDrift(evidence);
  if (drift !== null) {
    const limit = (0.4 * Math.LN10 * thermalVoltageV(temperatureK)) / (2 * n);
    const text = `Ep moves ${(drift * 1000).toFixed(1)} mV per decade of scan rate${count}`;
    if (drift > limit && category === 'reversible') change('quasi-reversible', `${text}: a reversible couple's Ep does not move (limit used ${(limit * 1000).toFixed(1)} mV)`);
    else if (drift > limit) reasons.push(`${text}: kinetic control at the faster rates`);
    else reasons.push(`${text}: essentially constant, as for fast electron transfer`);
  }
  for (const [key, name] of [['sqrtScanRateR2', 'ip vs v^½'], ['scanRateR2', 'ip vs v']] as const) {
    const r2 = evidence[key];
    if (r2 !== undefined && Number.isFinite(r2)) reasons.push(`${name}: R² = ${r2.toFixed(4)}`);
  }
  return { ...verdict, category, label, reasons };
}

function largestDrift(e: SeriesEvidence): number | null {
  const values = [e.epaShiftVPerDecade, e.epcShiftVPerDecade].filter((v): v is number => v !== undefined && Number.isFinite(v));
  return values.length ? Math.max(...values.map(Math.abs)) : null;
}
