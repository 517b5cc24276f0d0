/**
 * Seeded standard normal deviates for test data, benchmarks and the demo scenario, so every
 * "noisy" voltammogram in the project is reproducible.
 * Uniforms: mulberry32 (public-domain snippet by T. Ettinger, from memory). Normals: the
 * Box–Muller transform (G. E. P. Box, M. E. Muller, Ann. Math. Statist. 29 (1958) 610).
 */
export function seededGaussian(seed: number): () => number {
  let state = seed >>> 0;
  const uniform = () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return () => Math.sqrt(-2 * Math.log(Math.max(uniform(), 1e-300))) * Math.cos(2 * Math.PI * uniform());
}
