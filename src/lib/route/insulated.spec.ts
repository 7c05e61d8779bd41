/**
 * Insulated wire links (the `insulatedLinks` route option): only for nets no straight link,
 * copper-side wire or relay island joins; the shortest link between free landing holes of
 * two islands, bent or straight over a pin (the bench guide marks it insulated either way); room made by ripping up another net's straight
 * link that covers an island's only landing hole; and nothing changes for placements that
 * route without them.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { breadboardBoard, makeBoard } from '../board/index.ts';
import type { Board, Hole, Layout, RouteOptionsInput } from '../model/index.ts';
import { verifyLayout } from '../verify/index.ts';
import { buildCopper } from './copper.ts';
import { routeLayout } from './index.ts';
import { joinRest } from './join.ts';
import { linkIslands } from './links.ts';
import { readPlacement } from './placement.ts';
import { newScratch } from './search.ts';
import { splitSegments } from './segments.ts';
import { cloneState, newState } from './state.ts';
import { handCase, type HandCase, type HandPart } from './testing/hand.ts';
import { randomCase } from './testing/random-placement.ts';
import { wireIslands } from './wiring.ts';
import { linkList } from '../guide/segments.ts';
import { drawScene } from '../render/index.ts';

const INSULATED: RouteOptionsInput = { cutStyle: 'between', insulatedLinks: true };

function pad(ref: string, net: string, x: number, y: number): HandPart {
  return { ref, kind: 'pads', count: 1, pins: { '1': [net, x, y] } };
}

/** Links the bench guide lists as insulated wire (not straight, or over a pin or another link). */
function bent(layout: Layout): Layout['links'] {
  const items = linkList(layout, drawScene(layout, undefined, { side: 'component' }));
  return layout.links.filter((_, i) => items[i]!.insulated);
}

const sameHole = (p: Hole, q: Hole) => p[0] === q[0] && p[1] === q[1];

/**
 * A on rows 0 and 2 of a strip board `width` holes wide, as pads at the columns listed;
 * row 1 is a row of unconnected pads (each a net of its own, parted by cuts), so no link
 * crosses it, no copper-side wire may step onto it and no gap in it holds a relay island.
 */
function fencedCase(width: number, top: number[], bottom: number[]): HandCase {
  const fence: HandPart = {
    ref: 'J9',
    kind: 'pads',
    count: width,
    pins: Object.fromEntries(Array.from({ length: width }, (_, x) => [String(x + 1), [null, x, 1]])),
  };
  return handCase(makeBoard('strip', width, 3), [...top.map((x, i) => pad(`J${i + 10}`, 'A', x, 0)), ...bottom.map((x, i) => pad(`J${i + 40}`, 'A', x, 2)), fence]);
}

/**
 * Brute force: the shortest insulated link between a free hole of row 0 and one of row 2 —
 * bent, or straight down one column over the fence's pin in row 1.
 */
function shortestInsulated(width: number, top: number[], bottom: number[]): number {
  let best = Infinity;
  for (let a = 0; a < width; a++)
    for (let b = 0; b < width; b++) if (!top.includes(a) && !bottom.includes(b)) best = Math.min(best, Math.abs(a - b) + 2);
  return best;
}

describe('insulated wire links', () => {
  it('join a net no straight link or relay island can, with one warning, and verify clean', () => {
    const c = fencedCase(8, [0, 1, 2], [6, 7]);
    const plain = routeLayout(c.design, c.placement, { cutStyle: 'between' });
    expect(!plain.ok && plain.problems.map((p) => [p.code, p.nets])).toEqual([['route.unroutable', ['A']]]);

    const r = routeLayout(c.design, c.placement, INSULATED);
    if (!r.ok) throw new Error(r.problems.map((p) => p.message).join('\n'));
    expect(verifyLayout(c.circuit, r.value.layout).clean).toBe(true);
    const links = bent(r.value.layout);
    expect(links).toHaveLength(1);
    expect(r.value.layout.links).toHaveLength(1);
    expect(r.warnings.map((w) => [w.code, w.nets])).toEqual([['route.insulated-link', ['A']]]);
    const [link] = links;
    const holes = r.warnings[0]!.holes!;
    expect(holes).toHaveLength(2);
    expect(holes.every((h) => sameHole(h, link!.from) || sameHole(h, link!.to))).toBe(true);
    expect(sameHole(holes[0]!, holes[1]!)).toBe(false);
    // Same input, same output.
    expect(routeLayout(c.design, c.placement, INSULATED)).toEqual(r);
  });

  it('is the shortest insulated link between free holes of the two islands (brute force over fenced boards)', () => {
    const arb = fc
      .integer({ min: 4, max: 12 })
      .chain((width) =>
        fc.record({
          width: fc.constant(width),
          top: fc.uniqueArray(fc.integer({ min: 0, max: width - 1 }), { minLength: 1, maxLength: width - 1 }),
          bottom: fc.uniqueArray(fc.integer({ min: 0, max: width - 1 }), { minLength: 1, maxLength: width - 1 }),
        }),
      );
    fc.assert(
      fc.property(arb, ({ width, top, bottom }) => {
        const c = fencedCase(width, top, bottom);
        const want = shortestInsulated(width, top, bottom);
        const r = routeLayout(c.design, c.placement, INSULATED);
        if (!r.ok) throw new Error(r.problems.map((p) => p.message).join('\n'));
        const [link, more] = bent(r.value.layout);
        expect(more).toBeUndefined();
        const ends = [link!.from, link!.to].sort((p, q) => p[1] - q[1]);
        expect(top.includes(ends[0]![0]) || bottom.includes(ends[1]![0])).toBe(false);
        expect([ends[0]![1], ends[1]![1]]).toEqual([0, 2]);
        expect(Math.abs(ends[0]![0] - ends[1]![0]) + 2).toBe(want);
        expect(verifyLayout(c.circuit, r.value.layout).clean).toBe(true);
      }),
      { numRuns: 150 },
    );
  });
});

/**
 * B's island {Q2.B} (row 1, right of R3's body) has one free hole, (7, 1); A's straight
 * link down column 7 from Q2.E's strip to D1.A's passes over it, so no search can start
 * from the island. (A small random placement, written out by hand.)
 */
function coveredCase(): HandCase {
  return handCase(makeBoard('strip', 8, 4), [
    { ref: 'D1', kind: 'diode', footprint: 'do35', pins: { A: ['A', 3, 3], K: ['B', 0, 3] } },
    { ref: 'Q2', kind: 'npn', pinout: 'EBC', pins: { E: ['A', 6, 0], B: ['B', 6, 1], C: ['C', 6, 2] } },
    { ref: 'R3', kind: 'resistor', footprint: 'axial-small', pins: { '1': ['C', 5, 1], '2': ['B', 0, 1] } },
  ]);
}

/** The router's state after joinRest, as route.ts builds it (scored cuts). */
function afterJoin(c: HandCase) {
  const copper = buildCopper(c.placement.board);
  const placed = readPlacement(c.design, c.placement);
  if (!copper.ok || !placed.ok) throw new Error('covered case does not read');
  let st = newState(copper.value, splitSegments(copper.value, placed.value.leadNet), placed.value, { drilled: false, overBodies: false });
  const sc = newScratch(st);
  st = wireIslands(st, sc);
  const base = cloneState(st);
  linkIslands(st);
  return { ...joinRest(base, st, sc), names: placed.value.netNames, cols: copper.value.cols };
}

describe('room for an island whose landing holes other nets\' links cover', () => {
  it('is what the fixture shows: B in pieces, its only landing hole under A\'s link', () => {
    const { st, failed, names, cols } = afterJoin(coveredCase());
    expect(failed.map((n) => names[n])).toEqual(['B']);
    expect(names[st.linkUse[7 + 1 * cols]! - 1]).toBe('A');
    expect(st.leadNet[7 + 1 * cols]).toBe(-1);
  });

  it('rips up the covering link, joins B, joins A again, and verifies clean', () => {
    const c = coveredCase();
    const plain = routeLayout(c.design, c.placement, { cutStyle: 'between' });
    expect(!plain.ok && plain.problems.map((p) => p.nets)).toEqual([['B']]);
    const r = routeLayout(c.design, c.placement, INSULATED);
    if (!r.ok) throw new Error(r.problems.map((p) => p.message).join('\n'));
    expect(verifyLayout(c.circuit, r.value.layout).clean).toBe(true);
    // B lands in the freed hole; A, joined again, has no link over it any more.
    const b = r.warnings.find((w) => w.nets?.[0] === 'B')!;
    expect(b.holes!.some((h) => sameHole(h, [7, 1]))).toBe(true);
    expect(r.value.layout.links.filter((l) => l.from[0] === 7 && l.to[0] === 7)).toEqual([]);
    // Every warning names one bent link, and every bent link is warned of.
    expect(r.warnings.every((w) => w.code === 'route.insulated-link')).toBe(true);
    expect(bent(r.value.layout)).toHaveLength(r.warnings.length);
    expect(routeLayout(c.design, c.placement, INSULATED)).toEqual(r);
  });
});

describe('room for hemmed-in islands in random crowded placements', () => {
  // Random strip placements (randomCase: seed, board, parts, nets) that the router with
  // insulated links still left in pieces before rip-ups looked at the gaps beside an
  // island, freed every hemmed island of a net at once, and let a ripped net rip up others
  // in turn; none of these is joined by a straight insulated link over a pin. The last
  // needed the net of a relay island beside the hemmed island and another covering net
  // ripped up together (one of 20 000 random cases).
  const cases = [
    { seed: 216, cols: 5, rows: 7, parts: 10, nets: 3, bent: true },
    { seed: 405, cols: 10, rows: 6, parts: 10, nets: 2, bent: true },
    { seed: 554, cols: 7, rows: 7, parts: 5, nets: 6, bent: true },
    { seed: 629, cols: 10, rows: 4, parts: 10, nets: 6, bent: true },
    { seed: 871, cols: 12, rows: 4, parts: 7, nets: 3, bent: true },
    { seed: 4014, cols: 11, rows: 7, parts: 7, nets: 6, bent: false },
  ];
  it.each(cases)('seed $seed on a $cols×$rows strip board: joined and clean', ({ seed, cols, rows, parts, nets, bent: allBent }) => {
    const c = randomCase(seed, makeBoard('strip', cols, rows), parts, nets);
    const plain = routeLayout(c.design, c.placement, { cutStyle: 'between' });
    expect(plain.ok).toBe(false);
    const r = routeLayout(c.design, c.placement, INSULATED);
    if (!r.ok) throw new Error(r.problems.map((p) => p.message).join('\n'));
    expect(verifyLayout(c.circuit, r.value.layout).faults).toEqual([]);
    expect(r.warnings.every((w) => w.code === 'route.insulated-link')).toBe(true);
    const links = bent(r.value.layout);
    expect(links).toHaveLength(r.warnings.length);
    if (allBent) for (const l of links) expect(l.from[0] !== l.to[0] && l.from[1] !== l.to[1]).toBe(true);
  });
});

describe('insulated links change nothing that routes without them', () => {
  const boards: fc.Arbitrary<Board> = fc.oneof(
    fc.record({ cols: fc.integer({ min: 5, max: 14 }), rows: fc.integer({ min: 4, max: 10 }) }).map(({ cols, rows }) => makeBoard('strip', cols, rows)),
    fc.record({ cols: fc.integer({ min: 5, max: 12 }), rows: fc.integer({ min: 4, max: 9 }) }).map(({ cols, rows }) => makeBoard('pads', cols, rows)),
    fc.integer({ min: 6, max: 14 }).map((cols) => breadboardBoard(cols)),
  );
  it('same layouts where the plain routing succeeds; elsewhere clean layouts or fewer nets in pieces (200 random placements)', () => {
    let helped = 0;
    fc.assert(
      fc.property(
        fc.record({ seed: fc.integer({ min: 0, max: 2 ** 31 - 1 }), board: boards, parts: fc.integer({ min: 3, max: 10 }), nets: fc.integer({ min: 2, max: 6 }), cutStyle: fc.constantFrom('between' as const, 'hole' as const) }),
        ({ seed, board, parts, nets, cutStyle }) => {
          const c = randomCase(seed, board, parts, nets);
          const plain = routeLayout(c.design, c.placement, { cutStyle });
          const r = routeLayout(c.design, c.placement, { cutStyle, insulatedLinks: true });
          if (plain.ok) {
            expect(r).toEqual(plain);
            return;
          }
          if (r.ok) {
            helped++;
            expect(verifyLayout(c.circuit, r.value.layout).faults).toEqual([]);
            expect(r.warnings.every((w) => w.code === 'route.insulated-link')).toBe(true);
            expect(bent(r.value.layout)).toHaveLength(r.warnings.length);
          } else {
            // Never worse: the nets left in pieces are among those the plain routing left.
            const before = new Set(plain.problems.flatMap((p) => p.nets ?? []));
            for (const p of r.problems) for (const n of p.nets ?? []) expect(before.has(n)).toBe(true);
          }
        },
      ),
      { numRuns: 200 },
    );
    // Crowded random placements often need them; a share of the failures must be rescued.
    expect(helped).toBeGreaterThan(0);
  });
});
