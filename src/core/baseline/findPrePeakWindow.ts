/**
 * Finds the stretch of a sweep before a wave's foot that carries only background current, for the
 * pre-peak baseline fit.
 * Method (ours; common practice, no source): fit a line to the first half of the region before
 * the peak, walk back from the peak while the current stays above that line by more than
 * max(3σ, 0.3 % of the peak height over the line); the first point within is the foot. Refit on
 * [regionStart, foot) and repeat until the foot stops moving (at most 6 passes).
 * In: the oriented (peaks up) smoothed current of the sweep, local indices regionStart < peak,
 *   noise σ (same unit). Out: the fit window [start, end) in local indices, or null when fewer
 *   than 5 points lie before the peak. An optional margin then trims the window's end: the
 *   exponential foot of a wave carries a little faradaic current even below the threshold, and a
 *   margin of 2·RT/nF cuts that residue by a factor e² (our choice). Where the noise sets the
 *   threshold above 0.3 % of the height, the foot is found that many times higher up its
 *   exponential rise, and the margin grows by ln(that factor)·RT/nF (at most half the window).
 */

export interface PrePeakWindow {
  start: number;
  end: number;
}

export interface FindPrePeakWindowOptions {
  /** Noise standard deviation of y. @default 0 */
  noise?: number;
  /** Foot threshold as a fraction of the peak height above the line. @default 0.003 */
  footFraction?: number;
  /** Points dropped from the end of the window, so the rising foot stays out of the fit: 2·RT/nF
   * in points (more when the noise raises the threshold). At most 30 % of the window is dropped
   * (50 % when the noise raised it). @default 0 */
  marginPoints?: number;
}

function fitLineLocal(y: ArrayLike<number>, a: number, b: number): { slope: number; intercept: number } {
  const n = b - a;
  let sx = 0, sy = 0, sxx = 0, sxy = 0;
  for (let k = a; k < b; k++) {
    const v = y[k] as number;
    sx += k; sy += v; sxx += k * k; sxy += k * v;
  }
  const det = n * sxx - sx * sx;
  const slope = det !== 0 ? (n * sxy - sx * sy) / det : 0;
  return { slope, intercept: (sy - slope * sx) / n };
}

export function findPrePeakWindow(y: ArrayLike<number>, regionStart: number, peak: number, options: FindPrePeakWindowOptions = {}): PrePeakWindow | null {
  if (peak - regionStart < 5) return null;
  const noise = options.noise ?? 0;
  const fraction = options.footFraction ?? 0.003;
  const minEnd = regionStart + 4;
  let end = Math.max(minEnd, regionStart + Math.floor((peak - regionStart) / 2));
  // How far above the 0.3 % level the noise put the foot (1 when it did not).
  let raised = 1;
  for (let pass = 0; pass < 6; pass++) {
    const { slope, intercept } = fitLineLocal(y, regionStart, end);
    const line = (k: number) => intercept + slope * k;
    const height = Math.abs((y[peak] as number) - line(peak));
    const threshold = Math.max(3 * noise, fraction * height);
    raised = height > 0 ? threshold / (fraction * height) : 1;
    let k = peak;
    while (k > regionStart && (y[k] as number) - line(k) > threshold) k--;
    const next = Math.max(minEnd, k + 1);
    if (next === end) break;
    end = next;
  }
  // The foot rises as e^(nFE/RT): found at `raised` times the 0.3 % level, it lies ln(raised)·RT/nF
  // past where that level is, so the margin (2·RT/nF) grows by as much (at most half the window).
  const rtnf = Math.max(0, options.marginPoints ?? 0) / 2;
  const wanted = Math.round(rtnf * (2 + Math.log(Math.max(1, raised))));
  const margin = Math.min(wanted, Math.floor((raised > 1 ? 0.5 : 0.3) * (end - regionStart)));
  return { start: regionStart, end: Math.max(minEnd, end - margin) };
}
