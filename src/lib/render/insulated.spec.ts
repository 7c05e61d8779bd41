/**
 * Which links must be insulated wire, against a plain reading of the rule (render/insulated.ts):
 * bent, or straight over a pin, or two otherwise bare links sharing a hole.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { makeBoard } from '../board/grid.ts';
import type { Layout } from '../model/layout.ts';
import type { Hole } from '../model/problem.ts';
import { insulatedLinks, lineHoles } from './insulated.ts';

/** The rule as written, hole by hole, with no counting. */
function plain(layout: Layout): boolean[] {
  const key = (h: Hole) => h.join();
  const pins = new Set(layout.parts.flatMap((p) => p.pins.map((q) => key(q.at))));
  const self = layout.links.map((l) => (l.from[0] !== l.to[0] && l.from[1] !== l.to[1]) || lineHoles(l.from, l.to).slice(1, -1).some((h) => pins.has(key(h))));
  return layout.links.map((l, i) => self[i]! || layout.links.some((m, j) => j !== i && !self[j] && lineHoles(l.from, l.to).some((h) => lineHoles(m.from, m.to).some((g) => key(g) === key(h)))));
}

const hole = fc.tuple(fc.integer({ min: 0, max: 9 }), fc.integer({ min: 0, max: 7 })) as fc.Arbitrary<Hole>;

describe('insulatedLinks', () => {
  it('agrees with the rule read hole by hole (random links and pins on a 10×8 board)', () => {
    let some = 0;
    fc.assert(
      fc.property(fc.array(fc.tuple(hole, hole), { maxLength: 12 }), fc.array(hole, { maxLength: 10 }), (ends, pinHoles) => {
        const layout: Layout = {
          format: 'kerfline.layout',
          version: 1,
          board: makeBoard('strip', 10, 8),
          parts: [{ ref: 'J1', footprint: 'pads', pins: pinHoles.map((at, k) => ({ pin: String(k + 1), at })) }],
          cuts: [],
          links: ends.filter(([a, b]) => a.join() !== b.join()).map(([from, to]) => ({ from, to })),
          wires: [],
        } as unknown as Layout;
        const got = insulatedLinks(layout);
        expect(got).toEqual(plain(layout));
        some += got.filter(Boolean).length;
      }),
      { numRuns: 300 },
    );
    expect(some).toBeGreaterThan(0);
  });
});
