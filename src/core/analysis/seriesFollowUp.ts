/**
 * k_f of a follow-up reaction over a scan-rate series: each file's own value from its Nicholson
 * (1966) ratio (followUpRateConstant.ts), one k_f from all the ratios at once
 * (jointFollowUpRateConstant.ts), a lower bound when the return peak is nearly gone, and the
 * zone of the series (λ = k_f·RT/(nFv) below 0.1: diffusion; above 5: kinetic; Nicholson & Shain,
 * Anal. Chem. 36 (1964) 706, from memory).
 * With no ratio at all (no return peak anywhere), k_f > 0.2·nFv_max/RT, or, where the series shows
 * the pure kinetic zone's shape, the larger bound the fastest file's forward width gives
 * (followUpPeakWidth.ts), and the zone is then 'kinetic'. The first bound: this analysis still finds
 * the return peak of a simulated EC couple at λ = 0.3 and loses it from λ ≈ 0.5 (measured with the
 * simulator, switching 0.2–0.6 V past E½, 0.1 % noise), so a missing return peak means λ above
 * about 0.2 at the fastest rate at least (our margin).
 */
import { AnalysisError } from '../errors';
import { inverseThermalVoltagePerV } from '../constants';
import { followUpLeastLambdaFromWidth, followUpRateConstant, jointFollowUpRateConstant } from '../kinetics';
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

/** Reading of a half-peak width on records of about 1 mV spacing (V; common practice, no source). */
const WIDTH_UNCERTAINTY_V = 0.001;

/**
 * The least k_f the fastest file's forward width allows (followUpPeakWidth.ts): that file has the
 * smallest λ of the series, so λ there and k_f = λ·nFv/RT are bounded below by its width.
 */
function widthBound(points: SeriesPoint[], o: ResolvedSeriesOptions): { rateConstantPerS: number; text: string } | null {
  const withWidth = points.filter((p) => p.forwardHalfPeakWidthV !== null);
  if (!withWidth.length) return null;
  const p = withWidth.reduce((a, b) => (b.scanRateVPerS > a.scanRateVPerS ? b : a));
  const lambda = followUpLeastLambdaFromWidth(p.forwardHalfPeakWidthV!, WIDTH_UNCERTAINTY_V, { electronCount: o.electronCount, temperatureK: o.temperatureK });
  if (lambda === null) return null;
  const k = lambda * o.electronCount * inverseThermalVoltagePerV(o.temperatureK) * p.scanRateVPerS;
  return { rateConstantPerS: k, text: `the forward peak at the fastest rate (${Number(p.scanRateVPerS.toPrecision(6))} V/s) is ${(p.forwardHalfPeakWidthV! * 1000).toFixed(1)} mV wide (|Ep − Ep/2|, ± ${WIDTH_UNCERTAINTY_V * 1000} mV), which the simulated working curve of width against λ (Nicholson & Shain 1964) reaches only for λ ≥ ${lambda.toPrecision(2)}` };
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
    const fastest = Math.max(...points.map((p) => p.scanRateVPerS));
    const missing = 0.2 * nf * fastest;
    const shape = signature.kineticZone ? widthBound(points, o) : null;
    const lowerBoundPerS = Math.max(missing, shape?.rateConstantPerS ?? 0);
    evidence.push(shape && shape.rateConstantPerS > missing
      ? `no return peak at any rate; ${shape.text}: k_f > ${lowerBoundPerS.toPrecision(2)} 1/s. With E°′ unknown k_f stays a bound (in this zone Ep − E°′ = −0.780RT/nF + (RT/2nF)·ln λ ties the two)`
      : `no return peak to measure a ratio from at any rate: k_f > ${lowerBoundPerS.toPrecision(2)} 1/s (λ > 0.2 at the fastest rate)`);
    // The shape seen is the pure kinetic zone's: the zone says so, whatever the looser bound alone would.
    const zone = signature.kineticZone ? 'kinetic' : zoneOf(points.map((p) => lowerBoundPerS / (nf * p.scanRateVPerS)));
    return { rateConstantPerS: null, rangePerS, lowerBoundPerS, evidence, zone, perFile };
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
