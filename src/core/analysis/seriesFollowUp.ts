/**
 * k_f of a follow-up reaction over a scan-rate series: each file's own value from its Nicholson
 * (1966) ratio (followUpRateConstant.ts), one k_f from all the ratios at once
 * (jointFollowUpRateConstant.ts), a lower bound when the return peak is nearly gone, and the
 * zone of the series (λ = k_f·RT/(nFv) below 0.1: diffusion; above 5: kinetic; Nicholson & Shain,
 * Anal. Chem. 36 (1964) 706, from memory).
 * With no ratio at all (no return peak anywhere), k_f > 0.2·nFv_max/RT: this analysis still finds
 * the return peak of a simulated EC couple at λ = 0.3 and loses it from λ ≈ 0.5 (measured with the
 * simulator, switching 0.2–0.6 V past E½, 0.1 % noise), so a missing return peak means λ above
 * about 0.2 at the fastest rate at least (our margin).
 */
import { AnalysisError } from '../errors';
import { inverseThermalVoltagePerV } from '../constants';
import { followUpRateConstant, jointFollowUpRateConstant } from '../kinetics';
import type { FollowUpSignature } from '../series/followUpSignature';
import type { SeriesPoint } from '../series/seriesPoint';
import type { ResolvedSeriesOptions } from './seriesFits';
import type { SeriesFollowUp } from './seriesTypes';

function reasonOf(err: unknown): string {
  if (err instanceof AnalysisError) return err.message;
  throw err;
}

function perFileRates(points: SeriesPoint[], o: ResolvedSeriesOptions): SeriesFollowUp['perFile'] {
  return points.map((p) => {
    const none = { fileIndex: p.fileIndex, rateConstantPerS: null, lambda: null };
    const ratio = p.nicholsonRatio ?? null;
    const eSwitch = p.switchPotentialV ?? null;
    if (ratio === null || eSwitch === null || p.eHalfV === null) return { ...none, reason: 'no return peak next to the switch, so no Nicholson ratio' };
    if (ratio >= 1) return { ...none, reason: `ratio ${ratio.toFixed(3)} ≥ 1: nothing is consumed` };
    try {
      const r = followUpRateConstant({ ratio, switchPastHalfWaveV: Math.abs(eSwitch - p.eHalfV), scanRateVPerS: p.scanRateVPerS }, { electronCount: o.electronCount, temperatureK: o.temperatureK });
      return { fileIndex: p.fileIndex, rateConstantPerS: r.rateConstantPerS, lambda: r.lambda, reason: r.reason };
    } catch (err) {
      return { ...none, reason: reasonOf(err) };
    }
  });
}

function zoneOf(lambdas: number[]): SeriesFollowUp['zone'] {
  if (!lambdas.length) return 'unknown';
  if (lambdas.every((l) => l < 0.1)) return 'diffusion';
  if (lambdas.every((l) => l > 5)) return 'kinetic';
  return lambdas.some((l) => l < 0.1) || lambdas.some((l) => l > 5) ? 'mixed' : 'intermediate';
}

export function seriesFollowUp(points: SeriesPoint[], o: ResolvedSeriesOptions, signature: FollowUpSignature): SeriesFollowUp {
  const perFile = perFileRates(points, o);
  const single = perFile.flatMap((f) => (f.rateConstantPerS === null ? [] : [f.rateConstantPerS]));
  const rangePerS: [number, number] | null = single.length ? [Math.min(...single), Math.max(...single)] : null;
  const nf = o.electronCount * inverseThermalVoltagePerV(o.temperatureK);
  const files = points.flatMap((p) => (p.nicholsonRatio != null && p.switchPotentialV != null && p.eHalfV !== null
    ? [{ ratio: Math.min(p.nicholsonRatio, 1.5), switchPastHalfWaveV: Math.max(0.02, Math.abs(p.switchPotentialV - p.eHalfV)), scanRateVPerS: p.scanRateVPerS }] : []));
  const evidence = [...signature.evidence];
  if (!files.length) {
    const lowerBoundPerS = 0.2 * nf * Math.max(...points.map((p) => p.scanRateVPerS));
    evidence.push(`no return peak to measure a ratio from at any rate: k_f > ${lowerBoundPerS.toPrecision(2)} 1/s (λ > 0.2 at the fastest rate)`);
    return { rateConstantPerS: null, rangePerS, lowerBoundPerS, evidence, zone: zoneOf(points.map((p) => lowerBoundPerS / (nf * p.scanRateVPerS))), perFile };
  }
  const joint = jointFollowUpRateConstant(files, { electronCount: o.electronCount, temperatureK: o.temperatureK });
  const k = joint.rateConstantPerS;
  if (k !== null) {
    evidence.push(`one k_f = ${k.toPrecision(3)} 1/s explains every ratio (95 % ${joint.intervalPerS![0].toPrecision(2)}–${joint.intervalPerS![1].toPrecision(2)} 1/s)`);
  } else if (joint.lowerBoundPerS !== null) {
    evidence.push(`the ratios lie on the flat end of the working curve (return peak nearly gone): k_f > ${joint.lowerBoundPerS.toPrecision(2)} 1/s only`);
  } else if (joint.upperBoundPerS !== null) {
    evidence.push(`the ratios show too little loss to measure k_f: k_f < ${joint.upperBoundPerS.toPrecision(2)} 1/s`);
  }
  const lambdaAt = k ?? joint.lowerBoundPerS;
  return {
    rateConstantPerS: k, rangePerS: joint.intervalPerS ?? rangePerS, lowerBoundPerS: joint.lowerBoundPerS, evidence,
    zone: lambdaAt === null ? 'diffusion' : zoneOf(points.map((p) => lambdaAt / (nf * p.scanRateVPerS))), perFile,
  };
}
