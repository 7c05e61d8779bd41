/**
 * `exactPlacement(problem, board, weights, limit): { cost, spots, nodes, complete }` — the
 * true optimum of the placement cost for a handful of parts, by depth-first search with
 * pruning, to measure the annealer against.
 *
 * Parts go down most-connected first; each tries every pose at every legal spot, nearest to
 * the parts already down first. Every cost term is monotone as parts are added (cuts and
 * segments never fall when a lead joins a strip; the box only grows) provided the supply-
 * edge term is off, so the cost of a partial placement bounds every completion and a branch
 * at or above the best so far is cut. `start` (the annealer's answer) seeds the bound.
 * `limit` caps the nodes visited; `complete` says whether the search finished.
 */
import type { Board } from '../model/layout.ts';
import { copperMap } from './copper-map.ts';
import { placementCost, type CostWeights } from './cost.ts';
import type { PlaceProblem } from './problem.ts';
import { PlaceState, type Spot } from './state.ts';

export interface ExactResult {
  cost: number;
  spots: Spot[];
  nodes: number;
  complete: boolean;
}

export function exactPlacement(problem: PlaceProblem, board: Board, weights: CostWeights, start: number, limit = 5e6): ExactResult {
  const w = { ...weights, supplyAtEdges: false };
  const s = new PlaceState(problem, copperMap(board));
  const n = problem.parts.length;
  // Order: the part with the most pins first, then whichever shares most nets with those down.
  const order: number[] = [];
  const left = new Set(problem.parts.map((_, i) => i));
  const netsDown = new Set<number>();
  while (left.size) {
    let best = -1;
    let score = -1;
    for (const p of left) {
      const part = problem.parts[p]!;
      const v = part.pinNet.filter((x) => netsDown.has(x)).length * 100 + part.pinNames.length;
      if (v > score) [best, score] = [p, v];
    }
    order.push(best);
    left.delete(best);
    for (const x of problem.parts[best]!.pinNet) netsDown.add(x);
  }
  let bestCost = start;
  let bestSpots: Spot[] = [];
  let nodes = 0;
  const dfs = (depth: number): void => {
    if (nodes > limit) return;
    if (depth === n) {
      const c = placementCost(s, w).total;
      if (c < bestCost - 1e-9) {
        bestCost = c;
        bestSpots = problem.parts.map((_, p) => s.spotOf(p));
      }
      return;
    }
    const p = order[depth]!;
    const part = problem.parts[p]!;
    const box = s.bounds();
    const cx = box ? (box.x0 + box.x1) / 2 : s.W / 2;
    const cy = box ? (box.y0 + box.y1) / 2 : s.H / 2;
    const spots: { spot: Spot; d: number }[] = [];
    part.poses.forEach((o, k) => {
      for (let y = -o.minY; y + o.maxY < s.H; y++)
        for (let x = -o.minX; x + o.maxX < s.W; x++) {
          const spot = { x, y, pose: k };
          if (s.fits(p, spot)) spots.push({ spot, d: Math.abs(x + (o.minX + o.maxX) / 2 - cx) + Math.abs(y + (o.minY + o.maxY) / 2 - cy) });
        }
    });
    spots.sort((a, b) => a.d - b.d);
    for (const { spot } of spots) {
      nodes++;
      s.place(p, spot);
      s.settle();
      if (placementCost(s, w).total < bestCost - 1e-9) dfs(depth + 1);
      s.lift(p);
      s.settle();
      if (nodes > limit) break;
    }
  };
  dfs(0);
  return { cost: bestCost, spots: bestSpots, nodes, complete: nodes <= limit };
}
