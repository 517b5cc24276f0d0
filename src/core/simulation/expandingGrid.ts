/**
 * Exponentially expanding space grid for planar diffusion next to an electrode.
 * Source: S. W. Feldberg, "Optimization of explicit finite-difference simulation of
 *   electrochemical phenomena utilizing an exponentially expanded space grid", J. Electroanal.
 *   Chem. 127, 1 (1981) (citation from memory); D. Britz, T. Strutwolf, "Digital Simulation in
 *   Electrochemistry", 4th ed., Springer (2016), chapter on unequal intervals (from memory).
 * In: first spacing h0 (cm), expansion ratio γ ≥ 1, outer edge L (cm).
 * Out: node positions x_0 = 0 … x_N ≥ L (cm), spacings h_i = x_{i+1} − x_i = h0·γ^i, and the
 *   control-volume widths V_0 = h_0/2, V_i = (h_{i−1} + h_i)/2 used by the finite-volume
 *   discretisation (node N is the bulk, held at its bulk concentration).
 * Difference from the source: the grid is built in real distance (cm) rather than through a
 *   transformed coordinate; the discretisation is the conservative three-point one.
 */
import { AnalysisError, assertFiniteInRange } from '../errors';

export interface ExpandingGrid {
  /** Node positions, cm; length N + 1, last node is the bulk. */
  positionCm: Float64Array;
  /** Spacings h_i, cm; length N. */
  spacingCm: Float64Array;
  /** Control-volume widths, cm; length N (bulk node excluded). */
  volumeCm: Float64Array;
}

/** Hard cap so that a bad option cannot allocate without bound. */
const MAX_NODES = 20000;

export function expandingGrid(firstSpacingCm: number, expansion: number, outerEdgeCm: number): ExpandingGrid {
  assertFiniteInRange('firstSpacingCm', firstSpacingCm, Number.MIN_VALUE);
  assertFiniteInRange('gridExpansion', expansion, 1, 10);
  assertFiniteInRange('outerEdgeCm', outerEdgeCm, firstSpacingCm);
  const intervals = expansion === 1
    ? Math.ceil(outerEdgeCm / firstSpacingCm)
    : Math.ceil(Math.log(1 + (outerEdgeCm * (expansion - 1)) / firstSpacingCm) / Math.log(expansion));
  if (!(intervals <= MAX_NODES)) {
    throw new AnalysisError('BAD_OPTION', `the space grid would need ${intervals} nodes (limit ${MAX_NODES}); raise gridExpansion or firstSpacingFraction`);
  }
  const n = Math.max(intervals, 2);
  const positionCm = new Float64Array(n + 1);
  const spacingCm = new Float64Array(n);
  const volumeCm = new Float64Array(n);
  let h = firstSpacingCm;
  for (let i = 0; i < n; i++) {
    spacingCm[i] = h;
    positionCm[i + 1] = (positionCm[i] as number) + h;
    h *= expansion;
  }
  volumeCm[0] = firstSpacingCm / 2;
  for (let i = 1; i < n; i++) volumeCm[i] = ((spacingCm[i - 1] as number) + (spacingCm[i] as number)) / 2;
  return { positionCm, spacingCm, volumeCm };
}
