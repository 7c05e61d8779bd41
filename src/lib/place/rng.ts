/**
 * `createRng(seed): Rng` — the placer's only source of randomness (style habit 6).
 *
 * A 32-bit state generator (mulberry32 mixing, public domain); `next()` gives a float in
 * [0, 1), `int(n)` an integer in [0, n). The same seed always gives the same sequence, so a
 * plan is reproducible from its seed. The generator is also handed to d3-force as its
 * random source.
 */
import { mulberry32 } from '../random/index.ts';

export interface Rng {
  next(): number;
  int(n: number): number;
  /** A fresh generator derived from this one (for a sub-phase that must not shift the rest). */
  fork(salt: number): Rng;
}

export function createRng(seed: number): Rng {
  const next = mulberry32((seed ^ 0x9e3779b9) >>> 0);
  return {
    next,
    int: (n) => Math.floor(next() * n),
    fork: (salt) => createRng((Math.imul(seed, 31) + salt * 7919 + 1) >>> 0),
  };
}
