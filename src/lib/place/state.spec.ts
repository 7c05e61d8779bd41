import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { makeBoard } from '../board/grid.ts';
import { copperMap } from './copper-map.ts';
import { placementCost } from './cost.ts';
import { buildProblem } from './problem.ts';
import { PlaceState, type Spot } from './state.ts';
import { plantedInstance } from './planted.ts';
import { circuitOf, designOf } from './test-kit.ts';

const design = designOf(
  circuitOf([
    { ref: 'R1', kind: 'resistor', pins: { '1': 'A', '2': 'B' } },
    { ref: 'R2', kind: 'resistor', pins: { '1': 'B', '2': 'C' } },
    { ref: 'Q1', kind: 'npn', pinout: 'EBC', pins: { C: 'A', B: 'B', E: 'C' } },
    { ref: 'C1', kind: 'capacitor', pins: { '1': 'A', '2': 'C' } },
    { ref: 'U1', kind: 'ic', package: 'DIP-8', pins: { '1': 'A', '4': 'C', '8': 'B' } },
  ]),
);
const problem = buildProblem(design, { padsEdge: 'left' });
const board = makeBoard('strip', 14, 12);

function fresh(spots: Spot[]): PlaceState {
  const s = new PlaceState(problem, copperMap(board));
  spots.forEach((spot, p) => s.place(p, spot));
  s.settle();
  return s;
}

/** Five parts in a column and one to the side: the start of the random move sequences. */
const START: Spot[] = [
  { x: 0, y: 0, pose: 0 },
  { x: 0, y: 2, pose: 0 },
  { x: 0, y: 4, pose: 0 },
  { x: 0, y: 6, pose: 0 },
  { x: 8, y: 4, pose: 0 },
];

/** The lanes net n's current verdict watches, flat (x0, x1, y0, y1)…, or undefined when unknown. */
function lanesOf(s: PlaceState, n: number): number[] | undefined {
  const slot = 2 * n + s.laneSlot[n]!;
  const count = s.laneCount[slot]!;
  return count < 0 ? undefined : Array.from(s.laneRects[slot]!.subarray(0, 4 * count));
}

describe('PlaceState', () => {
  it('gives every unconnected IC pin a net of its own', () => {
    const u1 = problem.parts.find((p) => p.ref === 'U1')!;
    const open = u1.pinNet.filter((n) => problem.nets[n]!.open);
    expect(open).toHaveLength(5);
    expect(new Set(open).size).toBe(5);
  });

  it('refuses overlapping bodies and spots off the board', () => {
    const s = new PlaceState(problem, copperMap(board));
    expect(s.fits(0, { x: 0, y: 0, pose: 0 })).toBe(true);
    s.place(0, { x: 0, y: 0, pose: 0 });
    expect(s.fits(1, { x: 0, y: 0, pose: 0 })).toBe(false);
    expect(s.fits(1, { x: 13, y: 0, pose: 0 })).toBe(false);
    expect(s.fits(1, { x: -1, y: 5, pose: 0 })).toBe(false);
  });

  it('keeps its incremental cost equal to a placement built from scratch', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.nat(4), fc.nat(13), fc.nat(11), fc.nat(40)), { maxLength: 40 }), (moves) => {
        const s = fresh(START);
        for (const [p, x, y, k] of moves) {
          const spot = { x, y, pose: k % problem.parts[p]!.poses.length };
          s.moveMany([p], [spot]);
          if (x % 2) s.settle();
        }
        s.settle();
        const again = fresh(problem.parts.map((_, p) => s.spotOf(p)));
        expect(placementCost(s)).toEqual(placementCost(again));
        expect(s.blockedSum).toBe(again.blockedSum);
      }),
      { numRuns: 60 },
    );
  });

  it('puts the cost back exactly when a move is undone with settleBack', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.nat(4), fc.nat(13), fc.nat(11), fc.nat(40), fc.boolean()), { maxLength: 40 }), (moves) => {
        const s = fresh(START);
        for (const [p, x, y, k, undo] of moves) {
          const old = s.spotOf(p);
          if (!s.moveMany([p], [{ x, y, pose: k % problem.parts[p]!.poses.length }])) continue;
          s.settle();
          if (!undo) continue;
          s.moveMany([p], [old]);
          s.settleBack();
        }
        const again = fresh(problem.parts.map((_, p) => s.spotOf(p)));
        expect(placementCost(s)).toEqual(placementCost(again));
        expect(s.blockedSum).toBe(again.blockedSum);
        expect(s.tally.runs).toEqual(again.tally.runs);
      }),
      { numRuns: 60 },
    );
  });

  it('keeps every net\'s link-lane verdict equal to a fresh count through moves and undos (20 planted parts)', () => {
    // Verdicts are judged again only where a moved body meets a net's lanes, and an undo
    // turns back to the lanes of before: a stale lane shows here, as lanes that differ from a
    // fresh count's (and, when a move meets it, as a verdict that differs).
    const inst = plantedInstance(20, 3);
    const big = buildProblem(inst.design, { padsEdge: 'left' });
    // Room to move: the planted spots on a board half as wide and tall again.
    const roomy = makeBoard('strip', Math.ceil(inst.board.cols * 1.5), Math.ceil(inst.board.rows * 1.5));
    const freshBig = (spots: Spot[]) => {
      const t = new PlaceState(big, copperMap(roomy));
      spots.forEach((spot, p) => t.place(p, spot));
      t.settle();
      return t;
    };
    let judged = 0;
    let moved = 0;
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.nat(big.parts.length - 1), fc.integer({ min: -3, max: 3 }), fc.integer({ min: -3, max: 3 }), fc.nat(7), fc.boolean()), { minLength: 10, maxLength: 60 }), (moves) => {
        const s = freshBig(inst.spots);
        for (const [p, dx, dy, k, undo] of moves) {
          const old = s.spotOf(p);
          if (!s.moveMany([p], [{ x: old.x + dx, y: old.y + dy, pose: k % 2 ? old.pose : k % big.parts[p]!.poses.length }])) continue;
          moved++;
          s.settle();
          if (undo) {
            s.moveMany([p], [old]);
            s.settleBack();
          }
          const again = freshBig(big.parts.map((_, q) => s.spotOf(q)));
          expect(Array.from(s.netBlocked)).toEqual(Array.from(again.netBlocked));
          // The lanes a net's verdict watches, where known, are the ones a fresh count sees.
          big.nets.forEach((_, n) => {
            const mine = lanesOf(s, n);
            if (mine) expect(mine).toEqual(lanesOf(again, n) ?? []);
          });
          judged += s.blockedSum > 0 ? 1 : 0;
        }
      }),
      { numRuns: 25 },
    );
    expect(judged).toBeGreaterThan(0);
    expect(moved).toBeGreaterThan(100);
  });

  it('judges a one-column lane again when a body moves into it or out, undos included', () => {
    // A's pads sit between C's: on row 0 at column 1 (C at 0 and 3), on row 4 at column 3 (C
    // at 1 and 4), so the only column both of A's strip pieces reach is 2 (the gap holes
    // beside them), rows 0–4; D's pad is the body that moves in and out of that lane.
    const pad = (ref: string, net: string) => ({ ref, kind: 'pads' as const, count: 1, pins: { '1': net } });
    const lane = buildProblem(designOf(circuitOf([pad('J1', 'A'), pad('J2', 'A'), pad('J3', 'C'), pad('J4', 'C'), pad('J5', 'C'), pad('J6', 'C'), pad('J7', 'D')])), { padsEdge: 'left' });
    const laneBoard = makeBoard('strip', 10, 6);
    const at = (x: number, y: number): Spot => ({ x, y, pose: 0 });
    const s = new PlaceState(lane, copperMap(laneBoard));
    [at(1, 0), at(3, 4), at(0, 0), at(3, 0), at(1, 4), at(4, 4), at(6, 2)].forEach((spot, p) => s.place(p, spot));
    s.settle();
    const a = lane.nets.findIndex((n) => n.name === 'A');
    expect(s.netBlocked[a]).toBe(0);
    expect(lanesOf(s, a)).toEqual([2, 2, 0, 4]);
    for (const [to, blocked, undo] of [
      [at(2, 2), 1, false],
      [at(6, 2), 0, false],
      [at(2, 3), 1, true],
      [at(2, 1), 1, false],
      [at(8, 5), 0, true],
      [at(7, 2), 0, false],
    ] as const) {
      const before = s.netBlocked[a];
      const old = s.spotOf(6);
      expect(s.moveMany([6], [to])).toBe(true);
      s.settle();
      expect(s.netBlocked[a]).toBe(blocked);
      if (undo) {
        s.moveMany([6], [old]);
        s.settleBack();
        expect(s.netBlocked[a]).toBe(before);
      }
    }
  });

  it('moves several parts as lifting them all and putting them down in turn would, refusals included', () => {
    /** The plain way: lift every part, put each down in turn; at the first that does not fit, put them all back. */
    const plainMove = (s: PlaceState, parts: number[], spots: Spot[]): boolean => {
      const old = parts.map((p) => s.spotOf(p));
      parts.forEach((p) => s.lift(p));
      let i = 0;
      for (; i < parts.length && s.fits(parts[i]!, spots[i]!); i++) s.place(parts[i]!, spots[i]!);
      if (i === parts.length) return true;
      parts.slice(0, i).forEach((p) => s.lift(p));
      parts.forEach((p, j) => s.place(p, old[j]!));
      return false;
    };
    const move = fc.record({
      parts: fc.uniqueArray(fc.nat(4), { minLength: 1, maxLength: 5 }),
      spots: fc.array(fc.tuple(fc.integer({ min: -1, max: 13 }), fc.integer({ min: -1, max: 11 }), fc.nat(40)), { minLength: 5, maxLength: 5 }),
      settle: fc.boolean(),
    });
    fc.assert(
      fc.property(fc.array(move, { minLength: 5, maxLength: 30 }), (moves) => {
        const a = fresh(START);
        const b = fresh(START);
        for (const m of moves) {
          const spots = m.parts.map((p, i) => {
            const [x, y, k] = m.spots[i]!;
            return { x, y, pose: k % problem.parts[p]!.poses.length };
          });
          const done = a.moveMany(m.parts, spots);
          expect(plainMove(b, m.parts, spots)).toBe(done);
          // The lead lists' order matters: the hop move draws from them.
          expect(a.netHoles).toEqual(b.netHoles);
          expect(a.owner).toEqual(b.owner);
          if (m.settle) {
            a.settle();
            b.settle();
            expect(placementCost(a)).toEqual(placementCost(b));
          }
        }
        a.settle();
        b.settle();
        expect(placementCost(a)).toEqual(placementCost(b));
        expect(a.blockedSum).toBe(b.blockedSum);
        expect(a.tally.runs).toEqual(b.tally.runs);
      }),
      { numRuns: 50 },
    );
  });
});
