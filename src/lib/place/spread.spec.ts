import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { copperMap } from './copper-map.ts';
import { plantedInstance } from './planted.ts';
import { buildProblem } from './problem.ts';
import { spreadLanes } from './spread.ts';
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

describe('spreadLanes', () => {
  it('adds free columns and rows only between bodies: every lead keeps its strip and order, cuts and links stay', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10_000 }), fc.array(fc.nat(), { minLength: 1, maxLength: 4 }), (seed, picks) => {
        const inst = plantedInstance(14, seed);
        const problem = buildProblem(inst.design, { padsEdge: 'left' });
        const before = stateAt(problem, inst.board, inst.spots);
        const nets = picks.map((k) => k % problem.nets.length);
        const wide = spreadLanes(before, inst.board, nets.map((net) => ({ net })));
        if (!wide) return;
        expect(wide.board.cols + wide.board.rows).toBeGreaterThan(inst.board.cols + inst.board.rows);
        const after = stateAt(problem, wide.board, wide.spots);
        const addedRows = wide.board.rows - inst.board.rows;
        wide.spots.forEach((spot, p) => {
          expect(spot.y - inst.spots[p]!.y).toBeGreaterThanOrEqual(0);
          expect(spot.y - inst.spots[p]!.y).toBeLessThanOrEqual(addedRows);
          expect(spot.pose).toBe(inst.spots[p]!.pose);
          expect(spot.x).toBeGreaterThanOrEqual(inst.spots[p]!.x);
        });
        // Leads that shared a strip still do, in the same order: rows move as a block.
        problem.parts.forEach((_, p) =>
          problem.parts.forEach((__, q) => {
            if (inst.spots[p]!.y === inst.spots[q]!.y) expect(wide.spots[p]!.y).toBe(wide.spots[q]!.y);
          }),
        );
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
      const wide = spreadLanes(s, inst.board, [{ net: n }]);
      if (!wide || wide.board.rows !== inst.board.rows) continue;
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

  it('gives a net whose segments share no column reach a free strip between its rows', () => {
    let found = 0;
    for (let seed = 1; seed <= 40 && found < 3; seed++) {
      const inst = plantedInstance(20, seed);
      const problem = buildProblem(inst.design, { padsEdge: 'left' });
      const s = stateAt(problem, inst.board, inst.spots);
      for (let n = 0; n < problem.nets.length; n++) {
        if (s.tally.segs[n]! < 2) continue;
        const wide = spreadLanes(s, inst.board, [{ net: n }]);
        if (!wide || wide.board.rows === inst.board.rows) continue;
        found++;
        expect(wide.board.rows).toBe(inst.board.rows + 1);
        expect(wide.board.cols).toBe(inst.board.cols);
        const after = stateAt(problem, wide.board, wide.spots);
        const W = wide.board.cols;
        const rowsOf = (st: PlaceState) => [...new Set((st.netHoles[n] ?? []).map((h) => Math.floor(h / W)))];
        const [lo, hi] = [Math.min(...rowsOf(after)), Math.max(...rowsOf(after))];
        // A row with no lead and no body among or beside the net's rows: a free strip.
        const free = Array.from({ length: wide.board.rows }, (_, y) => y).filter((y) => y >= lo - 1 && y <= hi + 1 && Array.from({ length: W }, (_, x) => after.owner[x + y * W]).every((o) => o === -1));
        expect(free.length).toBeGreaterThan(0);
        expect(after.tally.cuts).toBe(s.tally.cuts);
        break;
      }
    }
    expect(found).toBeGreaterThan(0);
  });

  it('gives every lead of a few failed nets\' islands a new hole on its row on each side, past a body if need be (strip and pad boards)', () => {
    let sides = 0;
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10_000 }), fc.nat(), fc.boolean(), (seed, pick, pads) => {
        const planted = plantedInstance(20, seed);
        // The same spots on a pad board: a hemmed pad needs a free neighbour for its wire.
        const inst = pads ? { ...planted, board: makeBoard('pads', planted.board.cols, planted.board.rows) } : planted;
        const problem = buildProblem(inst.design, { padsEdge: 'left' });
        const s = stateAt(problem, inst.board, inst.spots);
        const W = inst.board.cols;
        const withLeads = problem.nets.map((_, n) => n).filter((n) => (s.netHoles[n] ?? []).length >= 2);
        const net = withLeads[pick % withLeads.length]!;
        const holes = s.netHoles[net]!.slice();
        const leads = new Set(s.netHoles.flat());
        const wide = spreadLanes(s, inst.board, [{ net, islands: holes.map((h) => [h]) }]);
        if (!wide) return;
        const cols = wide.board.cols;
        const after = stateAt(problem, wide.board, wide.spots);
        const afterLeads = new Set(after.netHoles.flat());
        const open = (b: number) =>
          b > 0 && b < W && !problem.parts.some((part, q) => {
            const pose = part.poses[s.pose[q]!]!;
            return s.x[q]! + pose.minX + 1 <= b && b <= s.x[q]! + pose.maxX;
          });
        for (const h of holes) {
          const p = s.owner[h]!;
          const [x, y] = [h % W, Math.floor(h / W)];
          const nx = x + wide.spots[p]!.x - inst.spots[p]!.x;
          const ny = y + wide.spots[p]!.y - inst.spots[p]!.y;
          for (const side of [-1, 1]) {
            // Boundaries from the lead outwards, up to the next lead on its strip or the edge.
            let reachable = false;
            for (let b = side < 0 ? x : x + 1; b > 0 && b < W; b += side) {
              if (open(b)) {
                reachable = true;
                break;
              }
              if (leads.has(y * W + (side < 0 ? b - 1 : b))) break;
            }
            if (!reachable) continue;
            sides++;
            // After spreading, more holes between the lead and the next one (or the edge).
            const gap = (at: number, row: number, width: number, set: Set<number>) => {
              let n = 0;
              for (let c = at + side; c >= 0 && c < width && !set.has(row * width + c); c += side) n++;
              return n;
            };
            expect(gap(nx, ny, cols, afterLeads)).toBeGreaterThan(gap(x, y, W, leads));
          }
        }
      }),
      { numRuns: 40 },
    );
    expect(sides).toBeGreaterThan(0);
  });

  it('leaves boards with their own copper alone', () => {
    const inst = plantedInstance(6, 1);
    const problem = buildProblem(inst.design, { padsEdge: 'left' });
    const own: Board = { ...makeBoard('strip', inst.board.cols, inst.board.rows), conductors: [] };
    const s = stateAt(problem, inst.board, inst.spots);
    expect(spreadLanes(s, own, [{ net: 0 }])).toBeUndefined();
  });
});
