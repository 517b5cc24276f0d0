import { describe, expect, it } from 'vitest';
import { findSweepSegments } from './findSweepSegments';

/** Triangle wave from `start` to `vertices[...]`, step `step` V. Hand-made input. */
function triangle(start: number, vertices: number[], step: number): Float64Array {
  const out: number[] = [start];
  let e = start;
  for (const v of vertices) {
    const dir = Math.sign(v - e);
    while ((v - e) * dir > 1e-12) {
      e = Math.abs(v - e) < step ? v : e + dir * step;
      out.push(e);
    }
  }
  return Float64Array.from(out);
}

describe('findSweepSegments (common practice, no source: hysteresis vertex detection)', () => {
  it('one cycle 0 → 1 → 0 gives two sweeps sharing the vertex', () => {
    const e = triangle(0, [1, 0], 0.1);
    const { segments, cycles } = findSweepSegments(e);
    expect(segments.map((s) => [s.start, s.end, s.direction])).toEqual([
      [0, 11, 'positive'],
      [10, 21, 'negative'],
    ]);
    expect(cycles).toEqual([{ index: 1, start: 0, end: 21 }]);
  });

  it('three cycles starting mid-window: 0.2 → 1 → 0 → 0.2 repeated', () => {
    const e = triangle(0.2, [1, 0, 1, 0, 1, 0, 0.2], 0.05);
    const { segments, cycles } = findSweepSegments(e);
    expect(cycles.length).toBe(3);
    expect(segments.filter((s) => s.direction === 'negative').length).toBe(3);
    for (const c of cycles) expect(e[c.start]).toBeCloseTo(0.2, 9);
  });

  it('noise below the hysteresis does not create vertices', () => {
    const e = triangle(0, [1, 0], 0.001);
    let seed = 7;
    const noisy = e.map((v) => {
      seed = (seed * 1103515245 + 12345) % 2147483648;
      return v + (seed / 2147483648 - 0.5) * 0.004;
    });
    expect(findSweepSegments(noisy).segments.length).toBe(2);
  });

  it('follows a cycle column when given', () => {
    const e = triangle(0, [1, 0, 1, 0], 0.1);
    const col = Array.from(e, (_, i) => (i < 20 ? 1 : 2));
    expect(findSweepSegments(e, { cycleColumn: col }).cycles.map((c) => c.start)).toEqual([0, 20]);
  });

  it('a cycle column that turns over one point after the vertex makes no sliver sweep', () => {
    const e = triangle(0, [1, 0, 1, 0], 0.1);
    // Vertex back at 0 V is index 20; this column starts cycle 2 one point later.
    const col = Array.from(e, (_, i) => (i <= 20 ? 1 : 2));
    const { segments, cycles } = findSweepSegments(e, { cycleColumn: col });
    expect(cycles.map((c) => c.start)).toEqual([0, 20]);
    expect(segments.length).toBe(4);
    expect(Math.min(...segments.map((s) => s.end - s.start))).toBe(11);
  });

  it('rejects a constant potential and a single point', () => {
    expect(() => findSweepSegments(new Float64Array([0.1, 0.1, 0.1]))).toThrow(/never changes/);
    expect(() => findSweepSegments(new Float64Array([0.1]))).toThrow(/at least 2/);
  });
});
