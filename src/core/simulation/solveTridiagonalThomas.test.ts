import { describe, expect, it } from 'vitest';
import { eliminateFromBulkSide, factorThomasFromBulkSide, solveTridiagonalThomas, substituteTowardsBulk } from './solveTridiagonalThomas';

/** Dense Gaussian elimination with partial pivoting, the textbook reference (common practice, no source). */
function solveDense(m: number[][], b: number[]): number[] {
  const n = b.length;
  const a = m.map((row, i) => [...row, b[i] as number]);
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(a[r]![c]!) > Math.abs(a[p]![c]!)) p = r;
    [a[c], a[p]] = [a[p]!, a[c]!];
    for (let r = c + 1; r < n; r++) {
      const k = a[r]![c]! / a[c]![c]!;
      for (let j = c; j <= n; j++) a[r]![j]! -= k * a[c]![j]!;
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let s = a[r]![n]!;
    for (let j = r + 1; j < n; j++) s -= a[r]![j]! * x[j]!;
    x[r] = s / a[r]![r]!;
  }
  return x;
}

describe('solveTridiagonalThomas', () => {
  it('solves a 3×3 system worked by hand: [2 −1 0; −1 2 −1; 0 −1 2]x = [1 0 1] → x = [1 1 1]', () => {
    const x = solveTridiagonalThomas(new Float64Array([0, -1, -1]), new Float64Array([2, 2, 2]), new Float64Array([-1, -1, 0]), new Float64Array([1, 0, 1]));
    expect(Array.from(x)).toEqual([1, 1, 1].map((v) => expect.closeTo(v, 14)));
  });

  it('agrees with dense elimination on a seeded random diagonally dominant system (n = 40)', () => {
    let seed = 12345;
    const rand = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648) - 0.5;
    const n = 40;
    const lower = new Float64Array(n), diag = new Float64Array(n), upper = new Float64Array(n), rhs = new Float64Array(n);
    const dense = Array.from({ length: n }, () => new Array<number>(n).fill(0));
    for (let i = 0; i < n; i++) {
      lower[i] = i > 0 ? rand() : 0;
      upper[i] = i < n - 1 ? rand() : 0;
      diag[i] = 2 + Math.abs(rand());
      rhs[i] = rand();
      dense[i]![i] = diag[i]!;
      if (i > 0) dense[i]![i - 1] = lower[i]!;
      if (i < n - 1) dense[i]![i + 1] = upper[i]!;
    }
    const x = solveTridiagonalThomas(lower, diag, upper, rhs);
    const ref = solveDense(dense, Array.from(rhs));
    for (let i = 0; i < n; i++) expect(x[i]).toBeCloseTo(ref[i] as number, 12);
  });

  it('a flux q added to r_0 moves c_0 by q·inverseDenominator[0] (the surface relation the simulator relies on)', () => {
    const lower = new Float64Array([0, -1, -1, -1]);
    const diag = new Float64Array([3, 3, 3, 3]);
    const upper = new Float64Array([-1, -1, -1, 0]);
    const rhs = new Float64Array([1, 2, 3, 4]);
    const f = factorThomasFromBulkSide(lower, diag, upper);
    const u = new Float64Array(4);
    const c0 = eliminateFromBulkSide(f, rhs, u);
    const q = 0.7;
    const out = new Float64Array(4);
    substituteTowardsBulk(f, u, c0 + q * (f.inverseDenominator[0] as number), out);
    const direct = solveTridiagonalThomas(lower, diag, upper, new Float64Array([1 + q, 2, 3, 4]));
    for (let i = 0; i < 4; i++) expect(out[i]).toBeCloseTo(direct[i] as number, 14);
  });
});
