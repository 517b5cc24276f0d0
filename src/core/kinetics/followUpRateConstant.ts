/**
 * Rate constant k_f of a first-order chemical reaction that consumes the product of a reversible
 * electron transfer (EC mechanism), from the return/forward peak-current ratio of one voltammogram.
 * Method: Nicholson & Shain, Anal. Chem. 36 (1964) 706 (from memory): for a reversible E step the
 *   ratio depends only on λ = k_f·RT/(nFv) (equivalently k_f·τ, τ the time from E½ to the switch)
 *   and on n(Eλ − E½). Their printed working curve is not to hand, so it is computed with this
 *   project's simulator (src/core/simulation, EC mechanism; its E part is tied to 0.4463 and to
 *   Nicholson's ΔEp table): for each λ of a grid, one sweep with the file's own n(Eλ − E½), and
 *   the ratio taken with Nicholson's empirical formula, Anal. Chem. 38 (1966) 1406
 *   (nicholsonPeakRatio.ts), as it is taken from the data. Between grid points log λ is
 *   interpolated linearly in the ratio.
 * In: the Nicholson (1966) ratio (pure number), |Eλ − E½| (V), v (V/s), n, T (K).
 * Out: k_f (1/s) and λ, or null with the reason when the ratio lies outside the working curve.
 * Differences from the source: numerical working curve; assumes reversible electron transfer and
 *   equal diffusion coefficients; E½ of the data stands for E°′ of the simulation. Curves are
 *   kept per switching distance (1 mV), so a series computes each once.
 */
import { assertFiniteInRange } from '../errors';
import { inverseThermalVoltagePerV, STANDARD_TEMPERATURE_K } from '../constants';
import { nicholsonPeakRatio } from '../baseline/nicholsonPeakRatio';
import { simulateCv } from '../simulation';

export interface FollowUpRateConstantInput {
  /** Return/forward ratio by Nicholson's 1966 formula. */
  ratio: number;
  /** |Eλ − E½| (V). */
  switchPastHalfWaveV: number;
  scanRateVPerS: number;
}

export interface FollowUpRateConstantOptions {
  /** @default 1 */
  electronCount?: number;
  /** @default 298.15 */
  temperatureK?: number;
  /** Potential step of the working simulations (V, at n = 1). @default 0.002 */
  stepV?: number;
}

export type FollowUpRateConstantResult = { rateConstantPerS: number; lambda: number; reason: null } | { rateConstantPerS: null; lambda: null; reason: string };

/** λ of the single-file working curve; beyond 2.5 the ratio hardly moves (return peak nearly gone). */
const LAMBDAS = [0.003, 0.01, 0.03, 0.1, 0.2, 0.4, 0.7, 1, 1.5, 2.5];
/** λ of the extended curve for fits over several files (the flat end bounds k_f from below). */
export const FOLLOW_UP_LAMBDAS = [0.001, ...LAMBDAS, 5, 10, 20];

/** Nicholson ratio of a simulated reversible EC sweep (n = 1, 25 °C, v = 1 V/s) at λ. */
function simulatedRatio(lambda: number, switchPastV: number, stepV: number): number {
  const f = inverseThermalVoltagePerV(STANDARD_TEMPERATURE_K);
  const r = simulateCv({ mechanism: 'EC', k0CmPerS: 1e4, followUpRatePerS: lambda * f, scanRateVPerS: 1, formalPotentialV: 0, startV: 0.35, switchV: -switchPastV, stepV, cycles: 1 });
  const half = Math.floor(r.currentA.length / 2);
  let forward = 0;
  for (let k = 0; k <= half; k++) forward = Math.min(forward, r.currentA[k]!);
  let ret = -Infinity;
  for (let k = half; k < r.currentA.length; k++) ret = Math.max(ret, r.currentA[k]!);
  return nicholsonPeakRatio({ forwardPeakA: -forward, returnPeakFromZeroA: ret, switchingCurrentFromZeroA: -r.currentA[half]! });
}

export function followUpRateConstant(input: FollowUpRateConstantInput, options: FollowUpRateConstantOptions = {}): FollowUpRateConstantResult {
  const n = options.electronCount ?? 1;
  const temperatureK = options.temperatureK ?? STANDARD_TEMPERATURE_K;
  assertFiniteInRange('ratio', input.ratio, 0, 2);
  assertFiniteInRange('switchPastHalfWaveV', input.switchPastHalfWaveV, 0.02, 2);
  assertFiniteInRange('scanRateVPerS', input.scanRateVPerS, 1e-9);
  // n(Eλ − E½) in 25 °C units is the only potential the dimensionless problem knows.
  const past = (n * input.switchPastHalfWaveV * STANDARD_TEMPERATURE_K) / temperatureK;
  const curve = followUpRatioCurve(past, options.stepV ?? 0.002);
  const ratios = LAMBDAS.map((l) => curve.ratios[FOLLOW_UP_LAMBDAS.indexOf(l)]!);
  if (input.ratio >= ratios[0]!) return { rateConstantPerS: null, lambda: null, reason: `ratio ${input.ratio.toFixed(3)} shows too little loss: λ < ${LAMBDAS[0]} (k_f below ${toRate(LAMBDAS[0]!, input, n, temperatureK).toPrecision(2)} 1/s)` };
  const last = ratios.length - 1;
  if (input.ratio <= ratios[last]!) return { rateConstantPerS: null, lambda: null, reason: `ratio ${input.ratio.toFixed(3)}: the return peak is nearly gone, λ > ${LAMBDAS[last]} (scan faster)` };
  let k = 0;
  while (ratios[k + 1]! > input.ratio) k++;
  const t = (ratios[k]! - input.ratio) / (ratios[k]! - ratios[k + 1]!);
  const lambda = Math.exp(Math.log(LAMBDAS[k]!) + t * (Math.log(LAMBDAS[k + 1]!) - Math.log(LAMBDAS[k]!)));
  return { rateConstantPerS: toRate(lambda, input, n, temperatureK), lambda, reason: null };
}

const curves = new Map<string, { lambdas: number[]; ratios: number[] }>();

/**
 * Nicholson ratio against λ (FOLLOW_UP_LAMBDAS) for n(Eλ − E½) = switchPastV at 25 °C; simulated
 * once per switching distance (rounded to 1 mV) and step, then kept.
 */
export function followUpRatioCurve(switchPastV: number, stepV = 0.002): { lambdas: number[]; ratios: number[] } {
  assertFiniteInRange('switchPastV', switchPastV, 0.02, 2);
  const past = Math.round(switchPastV * 1000) / 1000;
  const key = `${past}|${stepV}`;
  const hit = curves.get(key);
  if (hit) return hit;
  const curve = { lambdas: FOLLOW_UP_LAMBDAS, ratios: FOLLOW_UP_LAMBDAS.map((l) => simulatedRatio(l, past, stepV)) };
  if (curves.size > 500) curves.clear();
  curves.set(key, curve);
  return curve;
}

/** k_f = λ·nFv/RT. */
function toRate(lambda: number, input: FollowUpRateConstantInput, n: number, temperatureK: number): number {
  return lambda * n * inverseThermalVoltagePerV(temperatureK) * input.scanRateVPerS;
}
