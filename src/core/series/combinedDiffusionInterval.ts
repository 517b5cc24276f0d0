/**
 * A 95 % interval for D that carries, besides the scatter of the ip–v½ line, the stated
 * uncertainty of the electrode area A and the concentration C. Randles–Ševčík gives
 * D ∝ (slope / (A·C))², so to first order the relative standard uncertainties combine as
 *   u(D)/D = 2·√(u(s)² + u(A)² + u(C)²)         (all relative)
 * Source: JCGM 100:2008 (GUM), §5.1.6 (power-law model) and §G.4 (Welch–Satterthwaite effective
 *   degrees of freedom; A and C enter as type-B estimates with infinite degrees of freedom), and
 *   the coverage factor k = t₀.₉₇₅(ν_eff) (GUM §G.3).
 * In: D (cm²/s), the slope's relative standard error and its degrees of freedom, the relative
 *   standard uncertainties of A and C. Out: [low, high] in cm²/s, or null when the slope has no
 *   standard error. Difference from the source: the interval is the linearised D·(1 ± k·u(D)/D),
 *   clipped at 0.
 */
import { AnalysisError, assertFiniteInRange } from '../errors';
import { studentTQuantile } from '../regression';

export interface CombinedDiffusionIntervalInput {
  diffusionCm2PerS: number;
  slopeRelativeStdError: number | null;
  slopeDegreesOfFreedom: number;
  areaRelativeUncertainty: number;
  concentrationRelativeUncertainty: number;
}

export function combinedDiffusionInterval(input: CombinedDiffusionIntervalInput): [number, number] | null {
  const { diffusionCm2PerS: d, slopeRelativeStdError: us, slopeDegreesOfFreedom: dof } = input;
  assertFiniteInRange('D (cm²/s)', d, 0);
  assertFiniteInRange('relative uncertainty of the area', input.areaRelativeUncertainty, 0, 1);
  assertFiniteInRange('relative uncertainty of the concentration', input.concentrationRelativeUncertainty, 0, 1);
  if (us === null || !(dof >= 1)) return null;
  if (!Number.isFinite(us)) throw new AnalysisError('NON_FINITE', `relative standard error of the slope must be finite, got ${us}`);
  const slopePart = (2 * us) ** 2;
  const u2 = slopePart + (2 * input.areaRelativeUncertainty) ** 2 + (2 * input.concentrationRelativeUncertainty) ** 2;
  const u = Math.sqrt(u2);
  // Welch–Satterthwaite: only the slope part has finite degrees of freedom.
  const nuEff = slopePart > 0 ? (u2 * u2) / ((slopePart * slopePart) / dof) : Infinity;
  const k = Number.isFinite(nuEff) ? studentTQuantile(0.975, Math.min(nuEff, 1e6)) : 1.959963984540054;
  return [Math.max(0, d * (1 - k * u)), d * (1 + k * u)];
}
