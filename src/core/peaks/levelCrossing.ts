/**
 * Where a peak's current above its baseline falls to a level (half its height, for Ep/2 and the
 * width at half height), by linear interpolation between the two points around it. Shared by the
 * peak measurement (measurePeak.ts) and the baseline that extends an earlier wave
 * (extendedDecayBaselines.ts).
 */
import type { SweepSignals } from './sweepSignals';

/** Potential where corrected(k) first falls to `level`, walking from `from` towards `limit`. */
export function crossing(sig: SweepSignals, corrected: (k: number) => number, from: number, limit: number, dir: 1 | -1, level: number): number | null {
  for (let k = from; dir > 0 ? k < limit : k > limit; k += dir) {
    const a = corrected(k);
    const b = corrected(k + dir);
    if (a >= level && b < level) {
      const e0 = sig.potentialV[k]!;
      const e1 = sig.potentialV[k + dir]!;
      return e0 + ((a - level) / (a - b)) * (e1 - e0);
    }
  }
  return null;
}
