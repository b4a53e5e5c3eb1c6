/**
 * mulberry32, a small seeded 32-bit generator (public-domain algorithm by Tommy Ettinger; common practice, no
 * published source): the same numbers for the same seed, so demo data, benchmarks and test data repeat exactly.
 * Uniform on [0, 1). Not for anything secret.
 */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
