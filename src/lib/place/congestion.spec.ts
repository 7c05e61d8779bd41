import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { makeBoard } from '../board/grid.ts';
import { copperMap } from './copper-map.ts';
import { padCongestion } from './congestion.ts';
import { buildProblem } from './problem.ts';
import { PlaceState } from './state.ts';
import { circuitOf, designOf } from './test-kit.ts';

/** n resistors, resistor i from net Ai to net Bi; each laid flat in its own row. */
function rowOf(n: number) {
  const d = designOf(circuitOf(Array.from({ length: n }, (_, i) => ({ ref: `R${i}`, kind: 'resistor' as const, pins: { '1': `A${i}`, '2': `B${i}` } }))));
  const problem = buildProblem(d, { padsEdge: 'left' });
  const s = new PlaceState(problem, copperMap(makeBoard('pads', 30, 30)));
  return { s, problem };
}

describe('padCongestion', () => {
  it('is zero while every net is a single pin', () => {
    const { s } = rowOf(3);
    for (let p = 0; p < 3; p++) s.place(p, { x: 0, y: 2 * p, pose: 0 });
    s.settle();
    expect(padCongestion(s)).toBe(0);
  });

  it('grows when many nets must cross the same row', () => {
    const d = designOf(circuitOf(Array.from({ length: 16 }, (_, i) => ({ ref: `R${i}`, kind: 'resistor' as const, pins: { '1': `N${i}`, '2': `N${(i + 8) % 16}` } }))));
    const problem = buildProblem(d, { padsEdge: 'left' });
    const upright = problem.parts[0]!.poses.findIndex((o) => o.pins[1]![0] === 0 && o.pins[1]![1] > 0);
    const flat = new PlaceState(problem, copperMap(makeBoard('pads', 40, 40)));
    // side by side, upright: each net runs from a top pin to a bottom pin eight parts on,
    // so sixteen wires share the few rows the parts stand in
    for (let p = 0; p < 16; p++) flat.place(p, { x: 2 * p, y: 0, pose: upright });
    flat.settle();
    expect(padCongestion(flat)).toBeGreaterThan(0);
  });

  it('stays equal to a count from scratch as parts move about (leads boxed in, wire boxes)', () => {
    const d = designOf(circuitOf(Array.from({ length: 8 }, (_, i) => ({ ref: `R${i}`, kind: 'resistor' as const, pins: { '1': `N${i % 3}`, '2': `N${(i + 1) % 4}` } }))));
    const problem = buildProblem(d, { padsEdge: 'left' });
    const board = makeBoard('pads', 9, 8);
    /** Leads with no free neighbour count 2, with one 1/2, straight from the lead lists. */
    const boxed = (s: PlaceState) => {
      const lead = new Set(s.netHoles.flat());
      const free = (x: number, y: number) => x >= 0 && y >= 0 && x < s.W && y < s.H && !lead.has(x + y * s.W);
      let sum = 0;
      for (const h of s.netHoles.flat()) {
        const [x, y] = [h % s.W, Math.floor(h / s.W)];
        const n = [free(x - 1, y), free(x + 1, y), free(x, y - 1), free(x, y + 1)].filter(Boolean).length;
        sum += n === 0 ? 2 : n === 1 ? 0.5 : 0;
      }
      return sum;
    };
    const fresh = (s: PlaceState) => {
      const again = new PlaceState(problem, copperMap(board));
      problem.parts.forEach((_, p) => again.place(p, s.spotOf(p)));
      again.settle();
      return again;
    };
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.nat(7), fc.nat(8), fc.nat(7), fc.nat(20)), { minLength: 10, maxLength: 40 }), (moves) => {
        const s = new PlaceState(problem, copperMap(board));
        // Packed tight in two rows, so that leads hem each other in.
        problem.parts.forEach((_, p) => s.place(p, { x: (p % 4) * 2, y: p < 4 ? 0 : 2, pose: 0 }));
        s.settle();
        for (const [p, x, y, k] of moves) {
          s.moveMany([p], [{ x, y, pose: k % problem.parts[p]!.poses.length }]);
          if (x % 3 === 0) continue;
          s.settle();
          const again = fresh(s);
          expect(s.boxedLeads).toBe(boxed(s));
          expect(padCongestion(s)).toBe(padCongestion(again));
        }
      }),
      { numRuns: 40 },
    );
  });
});
