import { describe, expect, it } from 'vitest';
import { followUpCurrentFunction } from './followUpCurrentFunction';

describe('followUpCurrentFunction', () => {
  // Nicholson & Shain, Anal. Chem. 36 (1964) 706 (from memory): 0.4463 without reaction (Randles–
  // Ševčík), 0.4958 in the pure kinetic zone; the simulated curve must reach both within 0.3 %.
  it('runs from 0.4463 to 0.4958 and rises monotonically', () => {
    expect(Math.abs(followUpCurrentFunction(0) / 0.4463 - 1)).toBeLessThan(1e-9);
    expect(Math.abs(followUpCurrentFunction(0.001) / 0.4463 - 1)).toBeLessThan(0.003);
    expect(Math.abs(followUpCurrentFunction(1e4) / 0.4958 - 1)).toBeLessThan(0.003);
    let prev = 0;
    for (const l of [0.01, 0.1, 1, 3, 10, 100]) {
      const f = followUpCurrentFunction(l);
      expect(f).toBeGreaterThan(prev);
      prev = f;
    }
  });
  it('refuses a negative λ', () => {
    expect(() => followUpCurrentFunction(-1)).toThrow(/lambda/);
  });
});
