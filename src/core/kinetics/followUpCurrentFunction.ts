/**
 * Forward peak current of a reversible electron transfer followed by a first-order reaction (EC),
 * as its current function against λ = k_f·RT/(nFv): from 0.4463 (no reaction, Randles–Ševčík) to
 * 0.4958 (pure kinetic zone).
 * In: λ (pure number). Out: the current function π^½·χ_max, so that
 *   ip = F(λ)·nFAC·(nFvD/RT)^½.
 * Source: R. S. Nicholson, I. Shain, Anal. Chem. 36 (1964) 706 (from memory): the limits 0.4463
 *   and 0.4958 (in the pure kinetic zone the wave has the shape of an irreversible one with αn
 *   replaced by n). Between them the printed curve is not to hand, so it is computed with this
 *   project's simulator (src/core/simulation, EC mechanism; validated against 0.4463 and the
 *   Nicholson–Shain kinetic-zone Ep): the forward peak at each λ of a grid over a reversible one
 *   with identical numerics, times 0.4463; linear in ln λ between grid points, held at the ends.
 *   Measured: 0.4506 at λ = 0.1, 0.4711 at 1, 0.4820 at 2.5, 0.4916 at 10, 0.4956 at 300.
 */
import { assertFiniteInRange } from '../errors';
import { inverseThermalVoltagePerV, STANDARD_TEMPERATURE_K } from '../constants';
import { RANDLES_SEVCIK_REVERSIBLE } from '../series/randlesSevcik';
import { simulateCv } from '../simulation';
import { oneCyclePeaks } from '../simulation/simulatedPeaks';

const GRID = [0.01, 0.03, 0.1, 0.3, 1, 2.5, 5, 10, 30, 100, 300];
let table: number[] | null = null;

function forwardPeakA(mechanism: 'E' | 'EC', lambda: number): number {
  const f = inverseThermalVoltagePerV(STANDARD_TEMPERATURE_K);
  const r = simulateCv({ mechanism, k0CmPerS: 1e4, followUpRatePerS: lambda * f, scanRateVPerS: 1, startV: 0.35, switchV: -0.4, stepV: 0.0005, cycles: 1 });
  return -oneCyclePeaks(r, 'cathodic').forward.currentA;
}

function currentFunctions(): number[] {
  if (!table) {
    const reversible = forwardPeakA('E', 0);
    table = GRID.map((l) => (RANDLES_SEVCIK_REVERSIBLE * forwardPeakA('EC', l)) / reversible);
  }
  return table;
}

export function followUpCurrentFunction(lambda: number): number {
  assertFiniteInRange('lambda', lambda, 0);
  const t = currentFunctions();
  if (lambda <= GRID[0]!) return RANDLES_SEVCIK_REVERSIBLE + ((t[0]! - RANDLES_SEVCIK_REVERSIBLE) * lambda) / GRID[0]!;
  for (let k = 1; k < GRID.length; k++) {
    if (lambda <= GRID[k]!) return t[k - 1]! + (Math.log(lambda / GRID[k - 1]!) / Math.log(GRID[k]! / GRID[k - 1]!)) * (t[k]! - t[k - 1]!);
  }
  return t[t.length - 1]!;
}
