/**
 * Weights of the semi-integral ∫₀^x f(z)/√(x − z) dz for f constant on steps of length h (product
 * integration): step j, on [jh, (j+1)h], weighs 2(√(x − jh) − √(x − (j+1)h)) at x = (k+1)h, which
 * depends on d = k − j alone: scale·(√(d + 1) − √d) with scale = 2√h. The reversible and slow
 * wave shapes and the later-cycle decay share it; a caller whose constant cancels passes scale 1.
 */
export function semiIntegralWeights(n: number, scale: number): Float64Array {
  const w = new Float64Array(n);
  for (let d = 0; d < n; d++) w[d] = scale * (Math.sqrt(d + 1) - Math.sqrt(d));
  return w;
}
