/**
 * Gap between the positive-going and negative-going currents of one cycle at a chosen potential,
 * the raw input of a double-layer capacitance estimate, read at one point or over a window.
 * In: a Voltammogram (IUPAC currents, A), potentialV where no faradaic current flows, and the
 *   1-based cycle. Out: gapA = i(positive-going sweep) − i(negative-going sweep), in A; positive
 *   for a capacitive loop (charging current follows the sweep direction under IUPAC). The window
 *   form gives the gap at every sample of the positive-going sweep within ± halfWidthV, each with
 *   the negative-going sweep interpolated there.
 * Method: linear interpolation of the current on the first positive-going and the first
 *   negative-going sweep of the cycle that span the potential (common practice, no source).
 *   A resistive leak is the same current at one potential on both sweeps and drops out of the gap.
 */
import { AnalysisError, assertFiniteInRange } from '../errors';
import type { SweepDirection, Voltammogram } from '../types';

function currentOnSweep(v: Voltammogram, cycle: number, direction: SweepDirection, potentialV: number): number | null {
  for (const seg of v.segments) {
    if (seg.cycle !== cycle || seg.direction !== direction) continue;
    for (let i = seg.start; i + 1 < seg.end; i++) {
      const e0 = v.potentialV[i] as number;
      const e1 = v.potentialV[i + 1] as number;
      if ((potentialV - e0) * (potentialV - e1) > 0 || e0 === e1) continue;
      const t = (potentialV - e0) / (e1 - e0);
      return (v.currentA[i] as number) * (1 - t) + (v.currentA[i + 1] as number) * t;
    }
  }
  return null;
}

export function chargingCurrentGap(voltammogram: Voltammogram, potentialV: number, cycle = 1): number {
  assertFiniteInRange('potentialV', potentialV);
  const up = currentOnSweep(voltammogram, cycle, 'positive', potentialV);
  const down = currentOnSweep(voltammogram, cycle, 'negative', potentialV);
  if (up === null || down === null) {
    throw new AnalysisError('OUT_OF_RANGE', `cycle ${cycle} does not cross ${potentialV} V on both sweep directions`);
  }
  return up - down;
}

/** Gaps (A) at the potentials (V) of a window around a chosen potential; the chosen one first. */
export interface ChargingGapWindow {
  potentialV: number[];
  gapA: number[];
}

/**
 * The gap at the chosen potential and at every sample of the positive-going sweep within
 * ± halfWidthV (V) of it where the negative-going sweep is there too.
 */
export function chargingGapWindow(voltammogram: Voltammogram, potentialV: number, cycle = 1, halfWidthV = 0.01): ChargingGapWindow {
  assertFiniteInRange('halfWidthV', halfWidthV, 0);
  const out: ChargingGapWindow = { potentialV: [potentialV], gapA: [chargingCurrentGap(voltammogram, potentialV, cycle)] };
  const seen = new Set<number>([potentialV]);
  for (const seg of voltammogram.segments) {
    if (seg.cycle !== cycle || seg.direction !== 'positive') continue;
    for (let i = seg.start; i < seg.end; i++) {
      const e = voltammogram.potentialV[i] as number;
      if (Math.abs(e - potentialV) > halfWidthV || seen.has(e)) continue;
      const down = currentOnSweep(voltammogram, cycle, 'negative', e);
      if (down === null) continue;
      seen.add(e);
      out.potentialV.push(e);
      out.gapA.push((voltammogram.currentA[i] as number) - down);
    }
    break;
  }
  return out;
}
