import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { copperMap } from './copper-map.ts';
import { plantedInstance } from './planted.ts';
import { buildProblem } from './problem.ts';
import { spreadColumns } from './spread.ts';
import { PlaceState, type Spot } from './state.ts';
import type { Board } from '../model/layout.ts';
import { makeBoard } from '../board/grid.ts';

function stateAt(problem: ReturnType<typeof buildProblem>, board: Board, spots: Spot[]): PlaceState {
  const s = new PlaceState(problem, copperMap(board));
  spots.forEach((spot, p) => {
    expect(s.fits(p, spot)).toBe(true);
    s.place(p, spot);
  });
  s.settle();
  return s;
}

describe('spreadColumns', () => {
  it('adds free columns only between bodies: every lead keeps its row and order, cuts and links stay', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10_000 }), fc.array(fc.nat(), { minLength: 1, maxLength: 4 }), (seed, picks) => {
        const inst = plantedInstance(14, seed);
        const problem = buildProblem(inst.design, { padsEdge: 'left' });
        const before = stateAt(problem, inst.board, inst.spots);
        const nets = picks.map((k) => k % problem.nets.length);
        const wide = spreadColumns(before, inst.board, nets);
        if (!wide) return;
        expect(wide.board.cols).toBeGreaterThan(inst.board.cols);
        expect(wide.board.rows).toBe(inst.board.rows);
        const after = stateAt(problem, wide.board, wide.spots);
        wide.spots.forEach((spot, p) => {
          expect(spot.y).toBe(inst.spots[p]!.y);
          expect(spot.pose).toBe(inst.spots[p]!.pose);
          expect(spot.x).toBeGreaterThanOrEqual(inst.spots[p]!.x);
        });
        expect(after.tally.cuts).toBe(before.tally.cuts);
        expect(after.tally.links).toBe(before.tally.links);
      }),
      { numRuns: 25 },
    );
  });

  it('puts the new column where two segments of a failed net on different rows both reach', () => {
    const inst = plantedInstance(20, 3);
    const problem = buildProblem(inst.design, { padsEdge: 'left' });
    const s = stateAt(problem, inst.board, inst.spots);
    // A net with segments on two rows whose reaches overlap somewhere no body crosses.
    let tried = 0;
    for (let n = 0; n < problem.nets.length && tried < 5; n++) {
      if (s.tally.segs[n]! < 2) continue;
      const wide = spreadColumns(s, inst.board, [n]);
      if (!wide) continue;
      tried++;
      expect(wide.board.cols).toBe(inst.board.cols + 1);
      const after = stateAt(problem, wide.board, wide.spots);
      // Some column is free from top to bottom and reached by two of the net's segments on
      // different rows: a clear straight link joins them there.
      const W = wide.board.cols;
      const reach: { row: number; lo: number; hi: number }[] = [];
      for (let y = 0; y < wide.board.rows; y++) {
        const c = after.map.cond[y * W]!;
        after.tally.runs[c]!.forEach((net, i) => net === n && reach.push({ row: y, lo: after.tally.runLo[c]![i]!, hi: after.tally.runHi[c]![i]! }));
      }
      const lanes = Array.from({ length: W }, (_, x) => x).filter((x) => {
        for (let y = 0; y < wide.board.rows; y++) if (after.owner[x + y * W] !== -1) return false;
        return new Set(reach.filter((r) => r.lo <= x && x <= r.hi).map((r) => r.row)).size >= 2;
      });
      expect(lanes.length).toBeGreaterThan(0);
    }
    expect(tried).toBeGreaterThan(0);
  });

  it('leaves boards with their own copper alone', () => {
    const inst = plantedInstance(6, 1);
    const problem = buildProblem(inst.design, { padsEdge: 'left' });
    const own: Board = { ...makeBoard('strip', inst.board.cols, inst.board.rows), conductors: [] };
    const s = stateAt(problem, inst.board, inst.spots);
    expect(spreadColumns(s, own, [0])).toBeUndefined();
  });
});
