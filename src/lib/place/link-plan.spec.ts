import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { makeBoard } from '../board/grid.ts';
import { copperMap } from './copper-map.ts';
import { CopperTally } from './copper-tally.ts';
import { circuitOf, designOf } from './test-kit.ts';
import { linkPlan } from './link-plan.ts';
import { plantedInstance } from './planted.ts';
import { buildProblem } from './problem.ts';
import { PlaceState } from './state.ts';

/**
 * The greedy link plan written the plain way (objects, a comparator sort, sets), as the
 * reference the scratch-array version must agree with exactly.
 */
function plainLinkPlan(s: PlaceState): { missing: number; nets: number[] } {
  const box = s.bounds();
  if (!s.map.alongRows || !box) return { missing: 0, nets: [] };
  const t = s.tally;
  const { W, H } = s;
  const [X0, X1, Y0, Y1] = [Math.max(0, box.x0 - 2), Math.min(W - 1, box.x1 + 2), Math.max(0, box.y0 - 2), Math.min(H - 1, box.y1 + 2)];
  const runNet: number[] = [];
  const rowRuns: { id: number; lo: number; hi: number }[][] = [];
  for (let y = 0; y < H; y++) {
    const list: { id: number; lo: number; hi: number }[] = [];
    const c = s.map.cond[y * W]!;
    if (y >= Y0 && y <= Y1)
      t.runs[c]!.forEach((net, i) => {
        list.push({ id: runNet.length, lo: t.runLo[c]![i]!, hi: t.runHi[c]![i]! });
        runNet.push(net);
      });
    rowRuns.push(list);
  }
  const need = (net: number) => t.segs[net]! > 1;
  const parent = runNet.map((_, i) => i);
  const find = (a: number): number => (parent[a] === a ? a : (parent[a] = find(parent[a]!)));
  const joins: { a: number; b: number; ra: number; rb: number; len: number }[] = [];
  const last = new Map<number, { stretch: number; hole: number; run: number }>();
  let stretch = 0;
  const visit = (h: number, x: number, y: number) => {
    if (s.owner[h] !== -1 || s.blocked[h]) return void stretch++;
    for (const r of rowRuns[y]!) {
      const net = runNet[r.id]!;
      if (r.lo > x || r.hi < x || !need(net)) continue;
      const l = last.get(net);
      if (l && l.stretch === stretch && l.run !== r.id) joins.push({ a: l.hole, b: h, ra: l.run, rb: r.id, len: Math.abs((h % W) - (l.hole % W)) + Math.abs(Math.floor(h / W) - Math.floor(l.hole / W)) });
      last.set(net, { stretch, hole: h, run: r.id });
    }
  };
  for (let x = X0; x <= X1; x++, stretch++) for (let y = Y0; y <= Y1; y++) visit(x + y * W, x, y);
  for (let y = Y0; y <= Y1; y++, stretch++) for (let x = X0; x <= X1; x++) visit(x + y * W, x, y);
  const claimed = new Set<number>();
  for (const j of [...joins].sort((p, q) => p.len - q.len || p.a - q.a)) {
    const [ra, rb] = [find(j.ra), find(j.rb)];
    const step = Math.floor(j.a / W) === Math.floor(j.b / W) ? 1 : W;
    const holes: number[] = [];
    for (let h = j.a; h <= j.b; h += step) holes.push(h);
    if (ra === rb || holes.some((h) => claimed.has(h))) continue;
    holes.forEach((h) => claimed.add(h));
    parent[ra] = rb;
  }
  const roots = new Map<number, Set<number>>();
  runNet.forEach((net, id) => need(net) && roots.set(net, (roots.get(net) ?? new Set()).add(find(id))));
  let missing = 0;
  const nets: number[] = [];
  for (const [net, set] of roots) {
    missing += set.size - 1;
    if (set.size > 1) nets.push(net);
  }
  return { missing, nets };
}

describe('linkPlan', () => {
  it('finds no missing join when every net sits on one strip', () => {
    const d = designOf(circuitOf([{ ref: 'R1', kind: 'resistor', pins: { '1': 'A', '2': 'B' } }]));
    const problem = buildProblem(d, { padsEdge: 'left' });
    const s = new PlaceState(problem, copperMap(makeBoard('strip', 10, 6)));
    const upright = problem.parts[0]!.poses.findIndex((o) => o.pins[0]![1] !== o.pins[1]![1]);
    s.place(0, { x: 4, y: 1, pose: upright });
    s.settle();
    expect(linkPlan(s)).toEqual({ missing: 0, nets: [] });
  });

  it('agrees with the plain greedy plan on planted placements, moved about and walled in', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 10_000 }),
        fc.integer({ min: 6, max: 20 }),
        fc.array(fc.tuple(fc.nat(), fc.integer({ min: -3, max: 3 }), fc.integer({ min: -3, max: 3 })), { maxLength: 12 }),
        fc.array(fc.nat(), { maxLength: 12 }),
        (seed, count, moves, walls) => {
          const inst = plantedInstance(count, seed);
          const problem = buildProblem(inst.design, { padsEdge: 'left' });
          const keepOut = new Uint8Array(inst.board.cols * inst.board.rows);
          for (const w of walls) keepOut[w % keepOut.length] = 1;
          const s = new PlaceState(problem, copperMap(inst.board), keepOut);
          inst.spots.forEach((spot, p) => s.fits(p, spot) && s.place(p, spot));
          s.settle();
          expect(linkPlan(s)).toEqual(plainLinkPlan(s));
          for (const [k, dx, dy] of moves) {
            const p = k % problem.parts.length;
            if (s.pose[p]! < 0) continue;
            s.moveMany([p], [{ x: s.x[p]! + dx, y: s.y[p]! + dy, pose: s.pose[p]! }]);
            s.settle();
            expect(linkPlan(s)).toEqual(plainLinkPlan(s));
          }
        },
      ),
      { numRuns: 40 },
    );
  });

  it('agrees with the plain greedy plan on any copper, leads in free holes and links along strips included', () => {
    // Leads and bodies drawn independently (no footprint keeps a lead under its body here),
    // so joins along a strip and ties in length between crossing joins turn up too.
    fc.assert(
      fc.property(
        fc.integer({ min: 3, max: 9 }),
        fc.integer({ min: 3, max: 8 }),
        fc.array(fc.tuple(fc.nat(), fc.integer({ min: -1, max: 3 })), { minLength: 4, maxLength: 40 }),
        fc.tuple(fc.nat(), fc.nat(), fc.nat(), fc.nat()),
        (W, H, cells, [a, b, c, d]) => {
          const map = copperMap(makeBoard('strip', W, H));
          const owner = new Int32Array(W * H).fill(-1);
          const blocked = new Uint8Array(W * H);
          const tally = new CopperTally(map, 4, owner, blocked);
          const leads = new Set<number>();
          for (const [k, what] of cells) {
            const h = k % (W * H);
            if (what < 0) owner[h] = 0;
            else if (!leads.has(h)) {
              leads.add(h);
              tally.add(h, what);
            }
          }
          tally.flush(() => {});
          const [x0, x1] = [a % W, b % W].sort((p, q) => p - q) as [number, number];
          const [y0, y1] = [c % H, d % H].sort((p, q) => p - q) as [number, number];
          const s = { map, tally, owner, blocked, W, H, problem: { nets: [0, 1, 2, 3] }, bounds: () => ({ x0, y0, x1, y1 }) } as unknown as PlaceState;
          expect(linkPlan(s)).toEqual(plainLinkPlan(s));
        },
      ),
      { numRuns: 300 },
    );
  });
});
