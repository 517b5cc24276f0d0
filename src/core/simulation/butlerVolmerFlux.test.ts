import { describe, expect, it } from 'vitest';
import { butlerVolmerFlux } from './butlerVolmerFlux';

describe('butlerVolmerFlux', () => {
  // Bard & Faulkner 2nd ed. §3.3 (from memory): with fixed surface concentrations (no diffusion
  // coupling, sO = sR = 0), J = k0[c_O e^{−αx} − c_R e^{(1−α)x}].
  it.each([-3, -0.2, 0, 0.2, 3])('equals k0[cO e^(−αx) − cR e^((1−α)x)] when the surface values are fixed (x = %f)', (x) => {
    const expected = 0.01 * (2e-6 * Math.exp(-0.3 * x) - 1e-6 * Math.exp(0.7 * x));
    expect(Math.abs(butlerVolmerFlux(x, 0.3, 0.01, 2e-6, 0, 1e-6, 0) / expected - 1)).toBeLessThan(1e-12);
  });

  it('the Nernstian limit (k0 = ∞) leaves c_O(0)/c_R(0) = e^x', () => {
    const x = 0.8;
    const [uO, sO, uR, sR] = [1e-6, 3, 2e-7, 5];
    const j = butlerVolmerFlux(x, 0.5, Infinity, uO, sO, uR, sR);
    expect((uO - j * sO) / (uR + j * sR)).toBeCloseTo(Math.exp(x), 10);
  });

  it('stays finite at extreme overpotentials', () => {
    expect(Number.isFinite(butlerVolmerFlux(2000, 0.5, 1, 1e-6, 1, 0, 1))).toBe(true);
    expect(Number.isFinite(butlerVolmerFlux(-2000, 0.5, 1, 1e-6, 1, 0, 1))).toBe(true);
  });
});
