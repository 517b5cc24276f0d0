/**
 * Nicholson's ψ from ΔEp for any transfer coefficient and switching potential.
 * In: deltaEpV (Epa − Epc, V), the forward wave's transfer coefficient (αc for a reduction first,
 *   1 − αc for an oxidation first), |Eλ − E½| (V), n, T, the ψ method for α = 0.5.
 * Out: ψ (pure number), the α = 0.5 value it scales, and the factor.
 * Source: R. S. Nicholson, Anal. Chem. 37, 1351 (1965): ψ = γ^α·k°/(π D_O nFv/RT)^½ holds for any
 *   α, but his ΔEp–ψ table was computed for α = 0.5 with the switch 112.5/n mV past E½. He notes
 *   ΔEp depends little on α between 0.3 and 0.7 near the reversible end. Further out it does: with
 *   αc = 0.3 a ΔEp of 214 mV means ψ ≈ 0.14, not 0.1 (measured here with the simulator). The switch
 *   matters near the reversible end: 500 mV past E½, ΔEp is 2.2 mV narrower at ψ = 4 and 1.9 mV at
 *   ψ = 2 than in the table, so the table alone would read ψ 30-40 % high there (simulated, and on an
 *   independent semi-integral simulation alike).
 * Method (ours): ψ(ΔEp, α, Eλ) = ψ_table(ΔEp) · ψ_sim(ΔEp; α, Eλ)/ψ_sim(ΔEp; 0.5, 112.5 mV), where
 *   ψ_sim are working curves from this project's simulator (src/core/simulation, tied to
 *   Nicholson's table within 2 mV) at the couple's α and switching distance (rounded to 50 mV,
 *   0.1–0.8 V) and at the table's own, so the table stays the reference and only the difference is
 *   simulated. A mirror image makes an oxidation first with αc the same problem as a reduction first
 *   with 1 − αc, so every curve is simulated as a reduction first. Curves are kept per (α, switch),
 *   each grid point simulated only when a reading first needs it.
 */
import { assertFiniteInRange } from '../errors';
import { STANDARD_TEMPERATURE_K, inverseThermalVoltagePerV } from '../constants';
import { simulateCv } from '../simulation';
import { oneCyclePeaks } from '../simulation/simulatedPeaks';
import { nicholsonPsi, type NicholsonPsiMethod } from './nicholsonPsi';

export interface NicholsonPsiAtAlphaOptions {
  /** Transfer coefficient of the forward wave. @default 0.5 */
  forwardAlpha?: number;
  /** |Eλ − E½| (V). @default 0.1125 (the table's own: the table is used as it stands) */
  switchPastHalfWaveV?: number;
  /** @default 1 */
  electronCount?: number;
  /** @default 298.15 */
  temperatureK?: number;
  /** ψ at α = 0.5. @default 'table' */
  method?: NicholsonPsiMethod;
}

export interface NicholsonPsiAtAlphaResult {
  psi: number;
  /** ψ of the α = 0.5 method (Nicholson's table by default). */
  psiAtHalf: number;
  /** ψ_sim(α)/ψ_sim(0.5). */
  factor: number;
}

/** |Eλ − E½| of Nicholson's table (n = 1), V. */
export const NICHOLSON_SWITCH_PAST_V = 0.1125;

const PSI_GRID = [20, 10, 7, 5, 3, 2, 1.5, 1, 0.75, 0.5, 0.35, 0.25, 0.175, 0.1, 0.07];

/**
 * ΔEp (mV, n = 1, 25 °C) of a simulated reduction-first cycle at each ψ of the grid, simulated
 * point by point as a lookup first needs it: a reading walks the grid from the fast end and stops
 * at the first ΔEp above its own, so a near-reversible couple simulates two or three cycles of
 * the fifteen. Each point, once simulated, is kept.
 */
interface WorkingCurve {
  alpha: number;
  switchPastV: number;
  deltaEpMv: Array<number | undefined>;
}

const curves = new Map<string, WorkingCurve>();

function workingCurve(alpha: number, switchPastV: number): WorkingCurve {
  const key = `${alpha.toFixed(3)}|${switchPastV.toFixed(4)}`;
  let curve = curves.get(key);
  if (!curve) {
    curve = { alpha, switchPastV, deltaEpMv: new Array<number | undefined>(PSI_GRID.length) };
    curves.set(key, curve);
  }
  return curve;
}

/** ΔEp (mV) of the curve's k-th grid point, simulated the first time it is asked for. */
function deltaEpAt(curve: WorkingCurve, k: number): number {
  const known = curve.deltaEpMv[k];
  if (known !== undefined) return known;
  const f = inverseThermalVoltagePerV(STANDARD_TEMPERATURE_K);
  const k0CmPerS = (PSI_GRID[k] as number) * Math.sqrt(Math.PI * 1e-5 * f);
  const r = simulateCv({ k0CmPerS, alpha: curve.alpha, scanRateVPerS: 1, formalPotentialV: 0, startV: 0.45, switchV: -curve.switchPastV, stepV: 0.001, diffusionOCm2PerS: 1e-5, diffusionRCm2PerS: 1e-5 });
  const p = oneCyclePeaks(r, 'cathodic');
  const d = (p.reverse.potentialV - p.forward.potentialV) * 1000;
  curve.deltaEpMv[k] = d;
  return d;
}

/** ln ψ at ΔEp by linear interpolation along the curve (ΔEp rises as ψ falls); clamped to its ends. */
function lnPsiAt(curve: WorkingCurve, x: number): number {
  if (x <= deltaEpAt(curve, 0)) return Math.log(PSI_GRID[0] as number);
  for (let k = 1; k < PSI_GRID.length; k++) {
    const dk = deltaEpAt(curve, k);
    if (x <= dk) {
      const d0 = deltaEpAt(curve, k - 1);
      const l0 = Math.log(PSI_GRID[k - 1] as number);
      const l1 = Math.log(PSI_GRID[k] as number);
      return l0 + ((x - d0) / (dk - d0)) * (l1 - l0);
    }
  }
  return Math.log(PSI_GRID[PSI_GRID.length - 1] as number);
}

export function nicholsonPsiAtAlpha(deltaEpV: number, options: NicholsonPsiAtAlphaOptions = {}): NicholsonPsiAtAlphaResult {
  const alpha = options.forwardAlpha ?? 0.5;
  const n = options.electronCount ?? 1;
  const temperatureK = options.temperatureK ?? STANDARD_TEMPERATURE_K;
  assertFiniteInRange('forwardAlpha', alpha, 0.05, 0.95);
  const half = nicholsonPsi(deltaEpV, { electronCount: n, temperatureK, method: options.method ?? 'table' });
  const past = (options.switchPastHalfWaveV ?? NICHOLSON_SWITCH_PAST_V) * n * (STANDARD_TEMPERATURE_K / temperatureK);
  assertFiniteInRange('switchPastHalfWaveV', past, 0);
  // Within 25 mV of the table's switch the difference is below 0.3 mV of ΔEp.
  const asTable = Math.abs(past - NICHOLSON_SWITCH_PAST_V) < 0.025;
  if (Math.abs(alpha - 0.5) < 1e-9 && asTable) return { psi: half.psi, psiAtHalf: half.psi, factor: 1 };
  const switchPastV = asTable ? NICHOLSON_SWITCH_PAST_V : Math.min(0.8, Math.max(0.1, Math.round(past * 20) / 20));
  const x = half.nDeltaEpMv25;
  const factor = Math.exp(lnPsiAt(workingCurve(alpha, switchPastV), x) - lnPsiAt(workingCurve(0.5, NICHOLSON_SWITCH_PAST_V), x));
  return { psi: half.psi * factor, psiAtHalf: half.psi, factor };
}
