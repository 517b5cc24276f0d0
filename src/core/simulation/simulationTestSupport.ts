/**
 * Helpers for the simulator's own tests (not part of the public surface): locate the extreme
 * current of each half cycle with three-point parabolic refinement, and the width of a peak at
 * half its height. Common practice, no source.
 */
export interface SimplePeak {
  potentialV: number;
  currentA: number;
  index: number;
}

/** Extreme of `currentA` over [start, end) (`sign` −1 finds the minimum), refined by a parabola. */
export function extremeInRange(potentialV: Float64Array, currentA: Float64Array, start: number, end: number, sign: 1 | -1): SimplePeak {
  let best = start;
  for (let i = start; i < end; i++) if (sign * (currentA[i] as number) > sign * (currentA[best] as number)) best = i;
  if (best <= start || best >= end - 1) return { potentialV: potentialV[best] as number, currentA: currentA[best] as number, index: best };
  const y0 = currentA[best - 1] as number;
  const y1 = currentA[best] as number;
  const y2 = currentA[best + 1] as number;
  const shift = (y0 - y2) / (2 * (y0 - 2 * y1 + y2));
  const step = (potentialV[best + 1] as number) - (potentialV[best] as number);
  return { potentialV: (potentialV[best] as number) + shift * step, currentA: y1 - 0.25 * (y0 - y2) * shift, index: best };
}

/** Forward (cathodic, first half) and reverse (anodic, second half) peaks of a one-cycle CV that starts with a negative-going sweep. */
export function cathodicFirstPeaks(r: { potentialV: Float64Array; currentA: Float64Array }): { cathodic: SimplePeak; anodic: SimplePeak } {
  const half = (r.currentA.length - 1) / 2;
  return {
    cathodic: extremeInRange(r.potentialV, r.currentA, 0, half + 1, -1),
    anodic: extremeInRange(r.potentialV, r.currentA, half, r.currentA.length, 1),
  };
}

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
