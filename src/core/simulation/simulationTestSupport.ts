/**
 * Helpers for the simulator's own tests (not part of the public surface): the peak helpers of
 * simulatedPeaks.ts and the width of a peak at half its height. Common practice, no source.
 */
import type { SimplePeak } from './simulatedPeaks';

export { cathodicFirstPeaks, extremeInRange, type SimplePeak } from './simulatedPeaks';

/** Full width at half height of the peak at `peak.index` inside [start, end), by linear interpolation. */
export function widthAtHalfHeightV(potentialV: Float64Array, currentA: Float64Array, peak: SimplePeak, start: number, end: number): number {
  const halfA = peak.currentA / 2;
  const crossing = (from: number, dir: 1 | -1): number => {
    for (let i = from; i > start && i < end - 1; i += dir) {
      const a = currentA[i] as number;
      const b = currentA[i + dir] as number;
      if ((a - halfA) * (b - halfA) <= 0) {
        const ea = potentialV[i] as number;
        return ea + ((halfA - a) / (b - a)) * ((potentialV[i + dir] as number) - ea);
      }
    }
    return NaN;
  };
  return Math.abs(crossing(peak.index, 1) - crossing(peak.index, -1));
}
