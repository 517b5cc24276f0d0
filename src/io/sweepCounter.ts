/**
 * Whether a column taken for cycle numbers counts sweeps (half cycles) instead: a cycle of a
 * voltammogram holds two sweeps and one vertex inside it, so a cycle counter steps at most at
 * every second vertex, while a sweep or segment counter steps at every vertex and holds no vertex
 * inside a block. The column is read as a sweep counter when every one of its steps sits on a
 * vertex of the potential and every vertex on one of its steps (within a few points, as
 * core/sweeps/findSweepSegments.ts snaps cycle boundaries). Common practice, no source.
 */
import { AnalysisError } from '../core/errors';
import { findSweepSegments } from '../core/sweeps/findSweepSegments';

/** How many points a step may sit from its vertex (the reach findSweepSegments snaps within). */
const REACH = 3;

export interface SweepCount {
  /** Steps of the column, and vertices of the potential, both counted over the rows read. */
  steps: number;
  vertices: number;
}

/** The steps and vertices when `counter` counts sweeps of `potential`, else null. */
export function sweepCounterOf(potential: Float64Array, counter: Float64Array): SweepCount | null {
  const n0 = Math.min(potential.length, counter.length);
  const e = new Float64Array(n0);
  const c = new Float64Array(n0);
  let n = 0;
  for (let i = 0; i < n0; i++) {
    const a = potential[i] as number;
    const b = counter[i] as number;
    if (Number.isFinite(a) && Number.isFinite(b)) {
      e[n] = a;
      c[n++] = b;
    }
  }
  if (n < 3) return null;
  let vertices: number[];
  try {
    vertices = findSweepSegments(e.subarray(0, n)).segments.slice(1).map((s) => s.start);
  } catch (err) {
    if (err instanceof AnalysisError) return null;
    throw err;
  }
  const steps: number[] = [];
  for (let i = 1; i < n; i++) if (c[i] !== c[i - 1]) steps.push(i);
  if (!vertices.length || steps.length !== vertices.length) return null;
  // Both lists ascend and are as long: the k-th step must sit on the k-th vertex.
  const paired = steps.every((s, k) => Math.abs(s - (vertices[k] as number)) <= REACH);
  return paired ? { steps: steps.length, vertices: vertices.length } : null;
}
