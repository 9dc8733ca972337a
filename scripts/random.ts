/**
 * Seeded pseudo-random numbers for generators and tests that must give the same numbers on every
 * run: mulberry32 (a 32-bit generator by Tommy Ettinger, public domain) for uniform numbers and the
 * Box–Muller transform for normal ones. Not for anything that needs unpredictable numbers.
 */

/** Uniform numbers in [0, 1) from the seed `seed`. */
export function seededUniform(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal numbers from uniform ones (Box–Muller, cosine branch). */
export function seededNormal(uniform: () => number): () => number {
  return () => Math.sqrt(-2 * Math.log(1 - uniform())) * Math.cos(2 * Math.PI * uniform());
}
