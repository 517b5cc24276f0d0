/**
 * Seeded Gaussian noise for the demo data: mulberry32 uniform generator (public-domain snippet
 * by T. Ettinger, from memory) and the Box–Muller transform (G. E. P. Box, M. E. Muller, Ann.
 * Math. Statist. 29, 610 (1958)).
 */
export function createGaussian(seed: number): () => number {
  let state = seed >>> 0;
  const uniform = () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return () => {
    const u1 = Math.max(uniform(), 1e-300);
    return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * uniform());
  };
}
