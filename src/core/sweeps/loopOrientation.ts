/**
 * Which way a cycle's current–potential loop runs: ∮ i dE over the cycle divided by ∮ |i| |dE|,
 * a number between −1 and 1 (1: every step of the cycle adds positive area).
 *
 * Why it tells the current's sign convention: in the IUPAC convention (anodic current positive)
 * the charging current i = C·dE/dt has the sign of the sweep, oxidation currents flow mostly on
 * the positive-going sweep and reduction currents on the negative-going one, so nearly every
 * step of a voltammogram adds a positive i·dE and the loop encloses a positive area (Bard &
 * Faulkner, Electrochemical Methods, 2nd ed. (2001), §1.2.2 for the charging current and §6.2
 * for the diffusion wave, from memory). Currents recorded with the other sign (the polarographic
 * convention, cathodic positive), or potentials with the other sign, turn the loop round. A
 * crossing such as a nucleation loop, or a current still decaying after a vertex, only takes
 * part of the area away; a spike adds little, its potential barely moving.
 *
 * In: potential (V) and current (A) over the cycle's points [start, end). Out: the ratio, or null
 * when the cycle is not a closed loop (it must go both ways over at least half its span each, and
 * end within a quarter of its span of where it began) or holds no current. Trapezoid rule.
 */
export function loopOrientation(potentialV: ArrayLike<number>, currentA: ArrayLike<number>, start: number, end: number): number | null {
  if (end - start < 10) return null;
  let signed = 0;
  let absolute = 0;
  let up = 0;
  let down = 0;
  let lo = Infinity;
  let hi = -Infinity;
  for (let k = start; k < end; k++) {
    const e = potentialV[k] as number;
    if (!Number.isFinite(e)) continue;
    if (e < lo) lo = e;
    if (e > hi) hi = e;
    if (k + 1 >= end) continue;
    const e1 = potentialV[k + 1] as number;
    const i = 0.5 * ((currentA[k] as number) + (currentA[k + 1] as number));
    const dE = e1 - e;
    if (!Number.isFinite(dE) || !Number.isFinite(i)) continue;
    signed += i * dE;
    absolute += Math.abs(i * dE);
    if (dE > 0) up += dE;
    else down -= dE;
  }
  const span = hi - lo;
  if (!(span > 0) || !(absolute > 0)) return null;
  const closes = Math.abs((potentialV[end - 1] as number) - (potentialV[start] as number)) <= 0.25 * span;
  if (up < 0.5 * span || down < 0.5 * span || !closes) return null;
  return signed / absolute;
}
