/**
 * Relay islands on hand-made placements: a net whose pieces can only be joined through
 * another net's copper takes a run of holes inside a gap between two other nets, or in the
 * tail of another net's strip, parted off by one extra cut; the layout verifies clean and
 * has exactly the cuts the geometry needs.
 */
import { describe, expect, it } from 'vitest';
import { makeBoard } from '../board/index.ts';
import type { Cut, Hole, Layout, RouteOptionsInput } from '../model/index.ts';
import { verifyLayout } from '../verify/index.ts';
import { routeLayout } from './index.ts';
import { checkRouted } from './testing/check.ts';
import { handCase, resistor, type HandCase, type HandPart } from './testing/hand.ts';

function pad(ref: string, net: string, x: number, y: number): HandPart {
  return { ref, kind: 'pads', count: 1, pins: { '1': [net, x, y] } };
}

function routeClean(c: HandCase, options: RouteOptionsInput) {
  const r = routeLayout(c.design, c.placement, options);
  if (!r.ok) throw new Error(r.problems.map((p) => p.message).join('\n'));
  expect(verifyLayout(c.circuit, r.value.layout).faults).toEqual([]);
  expect(checkRouted(c.design, r.value.layout, { linksOverBodies: options.linksOverBodies ?? false })).toEqual([]);
  return r.value;
}

/** Row of a cut and the boundary (x + 0.5 for a scored cut) or hole (x) where it parts the strip. */
function cutPlace(cut: Cut): [number, number] {
  return 'at' in cut ? [cut.at[1], cut.at[0]] : [cut.between[0][1], (cut.between[0][0] + cut.between[1][0]) / 2];
}

/** Holes of row y a link end or copper-side wire touches. */
function touched(layout: Layout, y: number): number[] {
  const out: number[] = [];
  const add = (h: Hole) => {
    if (h[1] === y) out.push(h[0]);
  };
  for (const l of layout.links) [l.from, l.to].forEach(add);
  for (const w of layout.wires)
    for (let k = 0; k <= Math.abs(w.to[1] - w.from[1]); k++) if (w.from[0] === w.to[0]) add([w.from[0], Math.min(w.from[1], w.to[1]) + k]);
  return out.sort((a, b) => a - b);
}

/**
 * A on row 0 and row 2; row 1 carries B (column 0) and C (column 4) under the body of R1
 * lying along it, so no link may cross row 1 and a copper-side path across it touches the
 * B–C gap: only a relay island there joins A.
 */
function gapCase(): HandCase {
  const c = handCase(makeBoard('strip', 5, 3), [pad('J1', 'A', 0, 0), pad('J2', 'A', 4, 2), resistor('R1', 0, 1, 'B', 1, 'C')]);
  c.placement.parts[2]!.pins = [
    { pin: '1', at: [0, 1] },
    { pin: '2', at: [4, 1] },
  ];
  return c;
}

/**
 * A on row 0 (column 0, D at column 4) and row 2 (column 6, E at column 3): whatever the cut
 * style, A's two strip pieces share no column. Row 1 carries only B at column 0; the rest of
 * it is B's tail, which A may take as a relay island.
 */
function tailCase(): HandCase {
  return handCase(makeBoard('strip', 7, 3), [pad('J1', 'A', 0, 0), pad('J3', 'D', 4, 0), pad('J5', 'B', 0, 1), pad('J4', 'E', 3, 2), pad('J2', 'A', 6, 2)]);
}

describe('relay islands', () => {
  for (const cutStyle of ['between', 'hole'] as const) {
    it(`joins a net through a gap between two other nets with one extra cut (${cutStyle === 'hole' ? 'drilled' : 'scored'})`, () => {
      const r = routeClean(gapCase(), { cutStyle });
      // Row 1 needs one cut between B and C; the island needs a second. Nothing else is cut.
      expect(r.stats.cuts).toBe(2);
      const places = r.layout.cuts.map(cutPlace);
      expect(places.every(([y]) => y === 1)).toBe(true);
      // A crosses row 1 on the copper side, touching it only between the two cuts.
      expect(r.stats.links).toBe(0);
      const [first, second] = places.map(([, x]) => x).sort((a, b) => a - b);
      const island = touched(r.layout, 1);
      expect(island.length).toBeGreaterThan(0);
      for (const x of island) expect(x > first! && x < second!).toBe(true);
    });
  }

  it('uses no relay island where a plain link will do: the same placement with links over bodies allowed', () => {
    const r = routeClean(gapCase(), { cutStyle: 'hole', linksOverBodies: true });
    expect([r.stats.cuts, r.stats.links, r.stats.wires]).toEqual([1, 1, 0]);
  });

  for (const cutStyle of ['between', 'hole'] as const) {
    it(`joins a net through the tail of another net's strip with one extra cut (${cutStyle === 'hole' ? 'drilled' : 'scored'})`, () => {
      const r = routeClean(tailCase(), { cutStyle });
      // Rows 0 and 2 need one cut each (A|D, E|A); the tail of row 1 needs one more.
      expect(r.stats.cuts).toBe(3);
      const row1 = r.layout.cuts.map(cutPlace).filter(([y]) => y === 1);
      expect(row1).toHaveLength(1);
      // The cut parts B (column 0) from everything A lands on in row 1.
      const at = row1[0]![1];
      expect(at).toBeGreaterThan(0);
      const island = touched(r.layout, 1);
      expect(island.length).toBeGreaterThanOrEqual(2);
      for (const x of island) expect(x).toBeGreaterThan(at);
    });
  }

  it('fits two relay islands of two nets into one gap, a cut between each', () => {
    // A on the left and F on the right of rows 0 and 2; B and C close row 1 under R1's body.
    const c = handCase(makeBoard('strip', 9, 3), [pad('J1', 'A', 0, 0), pad('J2', 'A', 0, 2), pad('J3', 'F', 8, 0), pad('J4', 'F', 8, 2), resistor('R1', 0, 1, 'B', 1, 'C')]);
    c.placement.parts[4]!.pins = [
      { pin: '1', at: [0, 1] },
      { pin: '2', at: [8, 1] },
    ];
    for (const cutStyle of ['between', 'hole'] as const) {
      const r = routeClean(c, { cutStyle });
      // Rows 0 and 2 one cut each; row 1: B | A's island | F's island | C.
      expect(r.stats.cuts).toBe(5);
      expect(r.layout.cuts.map(cutPlace).filter(([y]) => y === 1)).toHaveLength(3);
    }
  });

  it('stays unroutable when a gap has no room for an island and its cuts', () => {
    // As gapCase, but B and C three holes apart: a drilled island needs a free hole each side.
    const c = handCase(makeBoard('strip', 4, 3), [pad('J1', 'A', 0, 0), pad('J2', 'A', 3, 2), resistor('R1', 0, 1, 'B', 1, 'C')]);
    c.placement.parts[2]!.pins = [
      { pin: '1', at: [0, 1] },
      { pin: '2', at: [3, 1] },
    ];
    const r = routeLayout(c.design, c.placement, { cutStyle: 'hole' });
    expect(!r.ok && r.problems.map((p) => [p.code, p.nets, p.data?.reason])).toEqual([['route.unroutable', ['A'], 'blocked']]);
    expect(routeClean(c, { cutStyle: 'between' }).stats.cuts).toBe(2);
  });
});
