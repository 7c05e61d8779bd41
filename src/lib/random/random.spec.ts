import { expect, it } from 'vitest';
import * as api from './index.ts';
import { mulberry32 } from './index.ts';

it('exports exactly the random API', () => {
  expect(Object.keys(api)).toEqual(['mulberry32']);
});

it('repeats for a seed, differs between seeds, stays in [0, 1) and spreads evenly', () => {
  const a = mulberry32(42);
  const b = mulberry32(42);
  const c = mulberry32(43);
  const xs = Array.from({ length: 10_000 }, () => a());
  expect(Array.from({ length: 10_000 }, () => b())).toEqual(xs);
  expect(c()).not.toBe(xs[0]);
  expect(xs.every((x) => x >= 0 && x < 1)).toBe(true);
  // ten equal bins of 10 000 draws: each within 10 % of 1 000 (a uniform source)
  const bins = new Array<number>(10).fill(0);
  for (const x of xs) bins[Math.floor(x * 10)]!++;
  for (const n of bins) expect(Math.abs(n - 1000)).toBeLessThan(100);
});
