/**
 * Laviron's general working curve of a surface-confined couple: the peak potentials, the peak
 * separation and the peak current function as functions of m = (RT/nF)·(k_s/v) and α, for every m
 * (Nernstian through totally irreversible), and k_s back from one file's ΔEp.
 * In: m (pure number), alpha (αc, the cathodic transfer coefficient); for the inversion deltaEpV
 *   (Epa − Epc, V), scanRateVPerS, electronCount n, temperatureK. Out: peak positions in units of
 *   RT/(nF) from E°′ (ξ = nF(Ep − E°′)/RT), ψ = ip·RT/(n²F²AΓv) (pure number), k_s in s⁻¹.
 * Source: E. Laviron, "General expression of the linear potential sweep voltammogram in the case
 *   of diffusionless electrochemical systems", J. Electroanal. Chem. 101, 19 (1979) (from memory):
 *   Langmuir film, dΓ_O/dt = −k_s e^{−αnfη}Γ_O + k_s e^{(1−α)nfη}Γ_R; ΔEp depends on m and α only.
 *   His limits: m → ∞ gives the Nernstian film, ξ = 0 and ψ = 1/4 (Laviron, J. Electroanal. Chem.
 *   52, 355 (1974)); m → 0 gives ξc = −ln(α/m)/α, ξa = ln((1−α)/m)/(1−α) and ψc = α/e.
 * Difference from the source: Laviron printed the curve as a figure; here it is integrated
 *   (ours): with s = −ξ on the cathodic sweep, dθ/ds = −m(e^{αs} + e^{−(1−α)s})(θ − 1/(1 + e^{s})),
 *   θ = Γ_O/Γ, each step of h = 0.01 solved exactly with the rate at its midpoint and the
 *   equilibrium linear across it (second order in h, and no lag when the rate is large), the film at equilibrium at ξ = 12, the peak placed by a parabola through
 *   the three largest steps. The return peak is the forward one with α ↔ 1 − α (the film fully
 *   converted before the switch, as Laviron assumes).
 */
import { AnalysisError, assertFiniteInRange } from '../errors';
import { STANDARD_TEMPERATURE_K, thermalVoltageV } from '../constants';

export interface LavironWorkingCurveOptions {
  /** Step of the integration in units of RT/(nF). @default 0.01 */
  step?: number;
}

export interface LavironPeak {
  /** nF(Ep − E°′)/RT of the cathodic peak (negative). */
  xi: number;
  /** ip·RT/(n²F²AΓv) of the peak. */
  psi: number;
}

const START_S = -12;

/** The cathodic (forward reduction) peak at m and αc. */
export function lavironCathodicPeak(m: number, alpha: number, options: LavironWorkingCurveOptions = {}): LavironPeak {
  assertFiniteInRange('m', m, Number.MIN_VALUE);
  assertFiniteInRange('alpha', alpha, 0.01, 0.99);
  const h = options.step ?? 0.01;
  assertFiniteInRange('step', h, 1e-4, 0.1);
  let s = START_S;
  let theta = 1 / (1 + Math.exp(s));
  const psis: number[] = [];
  let best = 0;
  let bestK = -1;
  // Past the peak the rate falls: stop when it is below 1e-3 of the largest and the film is converted.
  for (let k = 0; k < 1e6; k++) {
    const mid = s + h / 2;
    const rate = m * (Math.exp(Math.min(alpha * mid, 700)) + Math.exp(Math.min(-(1 - alpha) * mid, 700)));
    // Equilibrium taken linear across the step, rate at its midpoint: exact for that ODE, so
    // neither the slow (rate·h ≪ 1) nor the stiff (rate·h ≫ 1) end lags.
    const eq0 = 1 / (1 + Math.exp(Math.min(s, 700)));
    const eq1 = 1 / (1 + Math.exp(Math.min(s + h, 700)));
    const decay = Math.exp(-rate * h);
    const next = eq1 + (theta - eq0) * decay + ((eq1 - eq0) / h) * (rate * h > 1e-12 ? Math.expm1(-rate * h) / rate : -h);
    const psi = (theta - next) / h;
    psis.push(psi);
    if (psi > best) {
      best = psi;
      bestK = k;
    }
    theta = next;
    s += h;
    if (bestK >= 0 && k > bestK + 1 && psi < 1e-3 * best && theta < 1e-3) break;
  }
  const b = psis[bestK];
  const a = psis[bestK - 1];
  const c = psis[bestK + 1];
  if (b === undefined || a === undefined || c === undefined) throw new AnalysisError('NOT_CONVERGED', `no peak found inside the sweep at m = ${m}, α = ${alpha}`);
  const den = a - 2 * b + c;
  const shift = den < 0 ? (0.5 * (a - c)) / den : 0;
  const psi = den < 0 ? b - 0.25 * (a - c) * shift : b;
  return { xi: -(START_S + (bestK + 0.5 + shift) * h), psi };
}

export interface LavironSeparation {
  /** nF·ΔEp/RT. */
  separation: number;
  cathodic: LavironPeak;
  /** The return (anodic) peak: ξ positive. */
  anodic: LavironPeak;
}

/** Both peaks and their separation at m and αc. */
export function lavironPeakSeparation(m: number, alpha: number, options: LavironWorkingCurveOptions = {}): LavironSeparation {
  const cathodic = lavironCathodicPeak(m, alpha, options);
  const mirror = lavironCathodicPeak(m, 1 - alpha, options);
  const anodic = { xi: -mirror.xi, psi: mirror.psi };
  return { separation: anodic.xi - cathodic.xi, cathodic, anodic };
}

export interface LavironFromSeparationOptions extends LavironWorkingCurveOptions {
  /** αc. @default 0.5 */
  alpha?: number;
  /** @default 298.15 */
  temperatureK?: number;
}

export interface LavironFromSeparation extends LavironSeparation {
  ksPerS: number;
  m: number;
}

const LOG_M_LOW = Math.log(1e-9);
const LOG_M_HIGH = Math.log(1e5);

/**
 * k_s (s⁻¹) from one file's ΔEp by the working curve, with the peaks it implies. Refuses a ΔEp
 * beyond the curve's range (m outside 1e-9…1e5).
 */
export function lavironRateConstantFromSeparation(
  input: { deltaEpV: number; scanRateVPerS: number; electronCount: number },
  options: LavironFromSeparationOptions = {},
): LavironFromSeparation {
  const alpha = options.alpha ?? 0.5;
  const t = options.temperatureK ?? STANDARD_TEMPERATURE_K;
  assertFiniteInRange('deltaEpV', input.deltaEpV, Number.MIN_VALUE);
  assertFiniteInRange('scanRateVPerS', input.scanRateVPerS, Number.MIN_VALUE);
  assertFiniteInRange('electronCount', input.electronCount, Number.MIN_VALUE);
  assertFiniteInRange('temperatureK', t, Number.MIN_VALUE);
  const rt = thermalVoltageV(t);
  const target = (input.electronCount * input.deltaEpV) / rt;
  const at = (logM: number) => lavironPeakSeparation(Math.exp(logM), alpha, options);
  let [lo, hi] = [LOG_M_LOW, LOG_M_HIGH];
  let loSep = at(lo);
  const hiSep = at(hi);
  if (target > loSep.separation || target < hiSep.separation) {
    throw new AnalysisError('OUT_OF_RANGE', `n·ΔEp = ${(input.electronCount * input.deltaEpV * 1000).toFixed(2)} mV lies beyond Laviron's working curve (m from 1e-9 to 1e5)`);
  }
  // ΔEp falls as m grows: bisect log m to 1e-5 (k_s to 0.001 %).
  while (hi - lo > 1e-5) {
    const mid = (lo + hi) / 2;
    const sep = at(mid);
    if (sep.separation > target) {
      lo = mid;
      loSep = sep;
    } else hi = mid;
  }
  const m = Math.exp(lo);
  return { ...loSep, m, ksPerS: (m * input.scanRateVPerS * input.electronCount) / rt };
}
