/**
 * Nicholson's empirical return-to-forward peak-current ratio, which needs no extrapolated baseline
 * under the return peak, only the current at the switching potential.
 * Source: R. S. Nicholson, "Semiempirical procedure for measuring with stationary electrode
 *   polarography rates of chemical reactions involving the product of electron transfer",
 *   Anal. Chem. 38 (1966) 1406 (formula and coefficients from memory):
 *     i_return/i_forward = (i_return)₀/i_forward + 0.485·(i_sp)₀/i_forward + 0.086
 * In (A): forward peak current measured from its own baseline (> 0); return peak current measured
 *   from zero, counted positive in the return direction; current at the switching potential
 *   measured from zero, counted positive in the forward direction. For an ordinary reversible
 *   couple all three are positive; the signs matter only when the return current never crosses
 *   zero.
 * Out: the ratio (dimensionless); ≈ 1 for a simple reversible couple.
 * Written by Nicholson for a forward reduction; it applies unchanged with the directions swapped.
 */
import { AnalysisError } from '../errors';

export interface NicholsonPeakRatioInput {
  /** Forward peak current from the forward baseline, > 0 (A). */
  forwardPeakA: number;
  /** Return peak current measured from zero, positive in the return direction (A). */
  returnPeakFromZeroA: number;
  /** Current at the switching potential measured from zero, positive in the forward direction (A). */
  switchingCurrentFromZeroA: number;
}

export function nicholsonPeakRatio(input: NicholsonPeakRatioInput): number {
  const { forwardPeakA, returnPeakFromZeroA, switchingCurrentFromZeroA } = input;
  for (const [name, v] of Object.entries(input)) {
    if (!Number.isFinite(v)) throw new AnalysisError('NON_FINITE', `${name} must be finite, got ${v}`);
  }
  if (!(forwardPeakA > 0)) throw new AnalysisError('BAD_OPTION', `forwardPeakA must be > 0 for a ratio, got ${forwardPeakA}`);
  return returnPeakFromZeroA / forwardPeakA + (0.485 * switchingCurrentFromZeroA) / forwardPeakA + 0.086;
}
