/**
 * Return/forward peak-current ratio that slow electron transfer alone can produce, as a function of
 * the peak separation: a quasi-reversible couple with α ≠ 0.5 has an asymmetric pair of waves, so
 * its ratio departs from 1 without any chemistry (α < 0.5 on a reduction-first scan gives a larger
 * return peak, α > 0.5 a smaller one; the mirror image for an oxidation-first scan).
 * Source: this project's simulator (src/core/simulation, Butler–Volmer E mechanism, validated
 *   against Nicholson, Anal. Chem. 37 (1965) 1351, Table I, from memory), run for α = 0.3 and
 *   0.7, n = 1, D_O = D_R = 1e-5 cm²/s, 0.1 V/s, switch 0.5 V past E°′, both scan directions, with
 *   the ratio measured by this analysis (return peak from the extended forward decay). Nicholson
 *   (1965) states that ΔEp is nearly independent of α for 0.3 < α < 0.7 (from memory), so ΔEp
 *   indexes the kinetics without knowing α.
 * In: n·ΔEp (V) at 25 °C. Out: the smallest and largest ratio seen for 0.3 ≤ α ≤ 0.7 at that
 *   separation (linear interpolation between the simulated rows; 1…1 at the reversible limit;
 *   the last row held beyond 248 mV).
 * Difference from a published working curve: none exists that we know of; the rows are ours.
 */

/** n·ΔEp (mV, 25 °C), lowest and highest ratio for α in 0.3…0.7 (simulated, see header). */
const ROWS: ReadonlyArray<readonly [number, number, number]> = [
  [57.0, 1.0, 1.0],
  [66.5, 0.966, 1.038],
  [83.4, 0.909, 1.107],
  [99.4, 0.864, 1.165],
  [118.4, 0.82, 1.222],
  [150.5, 0.762, 1.289],
  [200.4, 0.703, 1.335],
  [247.7, 0.664, 1.339],
];

export interface KineticRatioRange {
  low: number;
  high: number;
}

export function kineticRatioEnvelope(nDeltaEpV: number): KineticRatioRange {
  const x = nDeltaEpV * 1000;
  const first = ROWS[0]!;
  const last = ROWS[ROWS.length - 1]!;
  if (!(x > first[0])) return { low: first[1], high: first[2] };
  if (x >= last[0]) return { low: last[1], high: last[2] };
  let k = 0;
  while (x > ROWS[k + 1]![0]) k++;
  const [x0, l0, h0] = ROWS[k]!;
  const [x1, l1, h1] = ROWS[k + 1]!;
  const t = (x - x0) / (x1 - x0);
  return { low: l0 + t * (l1 - l0), high: h0 + t * (h1 - h0) };
}
