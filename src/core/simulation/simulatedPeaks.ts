/**
 * Peaks of a simulated voltammogram: the extreme current of a range with three-point parabolic
 * refinement, and the two peaks of a one-cycle CV. Used by the simulator's tests and by the
 * working curves the kinetics methods compute with the simulator. Common practice, no source.
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
  const p = oneCyclePeaks(r, 'cathodic');
  return { cathodic: p.forward, anodic: p.reverse };
}

/** Forward and return peaks of a one-cycle CV in either direction: the first half holds the forward sweep. */
export function oneCyclePeaks(r: { potentialV: Float64Array; currentA: Float64Array }, forward: 'anodic' | 'cathodic'): { forward: SimplePeak; reverse: SimplePeak } {
  const half = (r.currentA.length - 1) / 2;
  const s = forward === 'anodic' ? 1 : -1;
  return {
    forward: extremeInRange(r.potentialV, r.currentA, 0, half + 1, s),
    reverse: extremeInRange(r.potentialV, r.currentA, half, r.currentA.length, s === 1 ? -1 : 1),
  };
}
