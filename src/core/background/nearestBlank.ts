/**
 * Which blank a voltammogram takes when a series has several (one per scan rate, as the charging
 * current scales with v): the one whose scan rate is nearest on a logarithmic scale, |ln(v/v_blank)|
 * smallest; ties go to the first. Our rule (common practice, no source).
 * In: the file's scan rate (V/s) and the blanks' names and scan rates. Out: the chosen name, or null.
 */
export function nearestBlank(scanRateVPerS: number | null, blanks: ReadonlyArray<{ fileName: string; scanRateVPerS: number | null }>): string | null {
  let best: string | null = null;
  let bestDistance = Infinity;
  for (const b of blanks) {
    const d = scanRateVPerS && b.scanRateVPerS ? Math.abs(Math.log(scanRateVPerS / b.scanRateVPerS)) : Number.MAX_VALUE;
    if (d < bestDistance) {
      best = b.fileName;
      bestDistance = d;
    }
  }
  return best;
}
