/**
 * How far a tilted background can move a return peak measured on the extended forward decay.
 * The return baseline keeps the forward background's slope in E and re-measures only its offset
 * at the switch (nicholsonReturnBaseline.ts). That is right for a leak current, which keeps its
 * sign on both sweeps, but not for double-layer charging whose capacitance varies with potential:
 * i_c = A·C_d(E)·dE/dt changes sign with the sweep (Bard & Faulkner, Electrochemical Methods,
 * 2nd ed. (2001) §1.2.2, from memory), so its slope flips too. With a background slope b (A/V)
 * the return baseline is then off by 2·b·(E_p,return − E_switch) at the return peak, the forward
 * peak not at all (its line extrapolates the same charging current). The slope is read from the
 * forward background between the forward peak and the switch; which of the two the tilt is cannot
 * be told from one trace, so this is the bound, to be stated, not subtracted (a blank measured
 * at the same scan rate removes it). Our derivation, no published source.
 * Whether the tilt is real: its standard error from the noise σ over the window the forward line
 * was fitted on, σ/√Σ(E − Ē)² (least-squares slope; e.g. Press et al., Numerical Recipes, 3rd ed.
 * (2007) eq. 15.2.9, from memory); the caller says it only when it stands out of that.
 * In: sweep signals, the forward peak's background (A, IUPAC, as a function of point index), the
 *   forward peak's and the switch's point index, the return peak's potential (V), the forward
 *   line's fit window [start, end) (point indices) and the noise σ (A).
 * Out: the slope and its standard error (A/V) and the bound on the return baseline's error at the
 *   return peak (A, ≥ 0), or null when the background is not known at both ends.
 */
import type { SweepSignals } from '../peaks/sweepSignals';

export interface TiltedChargingBias {
  slopeAPerV: number;
  /** Standard error of the slope from the noise alone; Infinity when the window has < 3 points. */
  slopeStdErrAPerV: number;
  biasA: number;
}

export function tiltedChargingBias(
  sig: Pick<SweepSignals, 'potentialV'>,
  forwardBackground: (index: number) => number | null,
  forwardPeakIndex: number,
  vertexIndex: number,
  returnPeakV: number,
  fitWindow: readonly [number, number],
  noiseA: number,
): TiltedChargingBias | null {
  const b1 = forwardBackground(forwardPeakIndex);
  const b2 = forwardBackground(vertexIndex);
  const e1 = sig.potentialV[forwardPeakIndex]!;
  const e2 = sig.potentialV[vertexIndex]!;
  if (b1 === null || b2 === null || !Number.isFinite(b1) || !Number.isFinite(b2) || e2 === e1) return null;
  const slopeAPerV = (b2 - b1) / (e2 - e1);
  return { slopeAPerV, slopeStdErrAPerV: slopeStdErr(sig.potentialV, fitWindow, noiseA), biasA: Math.abs(2 * slopeAPerV * (returnPeakV - e2)) };
}

function slopeStdErr(potentialV: ArrayLike<number>, [start, end]: readonly [number, number], noiseA: number): number {
  if (end - start < 3) return Infinity;
  let mean = 0;
  for (let k = start; k < end; k++) mean += potentialV[k]!;
  mean /= end - start;
  let sxx = 0;
  for (let k = start; k < end; k++) sxx += (potentialV[k]! - mean) ** 2;
  return sxx > 0 ? noiseA / Math.sqrt(sxx) : Infinity;
}
