import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { anneal } from './anneal.ts';
import { copperMap } from './copper-map.ts';
import { DEFAULT_WEIGHTS, placementCost } from './cost.ts';
import { plantedInstance } from './planted.ts';
import { buildProblem } from './problem.ts';
import { createRng } from './rng.ts';
import { PlaceState } from './state.ts';

function planted(parts: number, seed: number) {
  const inst = plantedInstance(parts, seed);
  const problem = buildProblem(inst.design, { padsEdge: 'left' });
  const start = () => {
    const s = new PlaceState(problem, copperMap(inst.board));
    inst.spots.forEach((spot, p) => s.place(p, spot));
    s.settle();
    return s;
  };
  return { problem, start, board: inst.board };
}

describe('anneal', () => {
  it('ends on the best placement it saw, whose cost a fresh count confirms, even when stopped while hot', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10_000 }), fc.integer({ min: 1, max: 1000 }), fc.integer({ min: 8, max: 16 }), fc.integer({ min: 1, max: 6 }), (seed, rngSeed, parts, asks) => {
        const { problem, start, board } = planted(parts, seed);
        const s = start();
        const bests: number[] = [];
        let asked = 0;
        const r = anneal(s, {
          rng: createRng(rngSeed),
          steps: 1500,
          weights: DEFAULT_WEIGHTS,
          locked: new Set([0]),
          tables: [],
          slotSections: [],
          warmth: 2,
          onProgress: (_f, _c, best) => bests.push(best),
          shouldStop: () => ++asked > asks,
        });
        expect(r.stopped).toBe(asks < 6);
        for (const b of bests) expect(r.cost).toBeLessThanOrEqual(b + 1e-9);
        const again = new PlaceState(problem, copperMap(board));
        problem.parts.forEach((_, p) => again.place(p, s.spotOf(p)));
        again.settle();
        expect(placementCost(again).total).toBeCloseTo(r.cost, 9);
        expect(placementCost(s)).toEqual(placementCost(again));
      }),
      { numRuns: 20 },
    );
  });

  it('is the same run for the same generator', () => {
    const { problem, start } = planted(12, 5);
    const run = () => {
      const s = start();
      const r = anneal(s, { rng: createRng(9), steps: 2000, weights: { ...DEFAULT_WEIGHTS, shortfall: 100 }, locked: new Set(), tables: [], slotSections: [] });
      return { r, spots: problem.parts.map((_, p) => s.spotOf(p)), holes: s.netHoles };
    };
    expect(run()).toEqual(run());
  });
});
