// Which way the i–E loop runs: checked against a charging current, whose loop is a rectangle
// (i = C·dE/dt, Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001), §1.2.2, from memory),
// and against this project's simulator (its own tests tie it to Randles–Ševčík and Nicholson).
import { describe, expect, it } from 'vitest';
import { simulatedVoltammogram } from '../peaks/simulatedVoltammogram';
import { loopOrientation } from './loopOrientation';

/** A triangle E1 → E2 → E1 in `n` steps each way, with the current `current(E, goingUp)`. */
function triangle(e1: number, e2: number, n: number, current: (e: number, up: boolean) => number) {
  const e: number[] = [];
  const i: number[] = [];
  for (let k = 0; k <= n; k++) e.push(e1 + ((e2 - e1) * k) / n);
  for (let k = n - 1; k >= 0; k--) e.push(e1 + ((e2 - e1) * k) / n);
  e.forEach((v, k) => i.push(current(v, k <= n)));
  return { e: Float64Array.from(e), i: Float64Array.from(i) };
}

describe('loopOrientation', () => {
  it('a charging current (C·v going up, −C·v coming back): every step adds positive area, +1', () => {
    const cv = 20e-6 * 0.1;
    const t = triangle(-0.2, 0.3, 500, (_e, up) => (up ? cv : -cv));
    // The trapezoid rule averages the current across the vertex to zero: one step in 1000 is lost.
    expect(loopOrientation(t.e, t.i, 0, t.e.length)).toBeCloseTo(1, 2);
    expect(loopOrientation(t.e, t.i.map((x) => -x), 0, t.e.length)).toBeCloseTo(-1, 2);
  });

  it('a resistor (i = E/R) encloses nothing', () => {
    const t = triangle(-0.2, 0.3, 500, (e) => e / 1000);
    expect(Math.abs(loopOrientation(t.e, t.i, 0, t.e.length) as number)).toBeLessThan(1e-12);
  });

  it('a couple read as IUPAC runs positive; with the current sign flipped, as much negative', () => {
    // Reduction first (O present) or oxidation first (R present); fast and slow electron transfer.
    for (const [start, o0, r0] of [[0.3, 1e-6, 0], [-0.3, 0, 1e-6]] as const) for (const k0 of [Infinity, 1e-3]) {
      const v = simulatedVoltammogram({ formalPotentialV: 0, k0CmPerS: k0, scanRateVPerS: 0.1, startV: start, switchV: -start, doubleLayerFPerCm2: 20e-6, concentrationOMolPerCm3: o0, concentrationRMolPerCm3: r0 });
      const c = v.cycles[0]!;
      const o = loopOrientation(v.potentialV, v.currentA, c.start, c.end) as number;
      expect(o).toBeGreaterThan(0.5);
      expect(loopOrientation(v.potentialV, v.currentA.map((x) => -x), c.start, c.end)).toBeCloseTo(-o, 12);
    }
  });

  it('gives no answer for a sweep that does not come back, or no current', () => {
    const up = Float64Array.from({ length: 100 }, (_, k) => k / 100);
    expect(loopOrientation(up, up, 0, 100)).toBeNull();
    const t = triangle(0, 0.5, 100, () => 0);
    expect(loopOrientation(t.e, t.i, 0, t.e.length)).toBeNull();
    expect(loopOrientation(t.e, t.i, 0, 5)).toBeNull();
  });
});
