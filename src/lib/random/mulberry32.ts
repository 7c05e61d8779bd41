/**
 * `mulberry32(seed): () => number` — a small seeded generator (public-domain algorithm by
 * Tommy Ettinger) giving floats in [0, 1). The core's only source of randomness (style
 * habit 6): the same seed always gives the same sequence.
 */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
