import { describe, expect, it } from 'vitest';
import { makeBoard } from '../board/grid.ts';
import { DEFAULT_WEIGHTS } from './cost.ts';
import { exactPlacement } from './exact.ts';
import { naiveBaseline } from './baseline.ts';
import { placeOnBoard } from './place-board.ts';
import { plantedInstance } from './planted.ts';
import { buildProblem } from './problem.ts';
import { scoreSpots } from './score.ts';
import { circuitOf, designOf } from './test-kit.ts';
import { PlaceState } from './state.ts';
import { copperMap } from './copper-map.ts';
import { circuitOfDesign } from './circuit-of-design.ts';
import { placementLayout } from './output.ts';
import { routeLayout } from '../route/index.ts';
import { verifyLayout } from '../verify/index.ts';

const CMP = { ...DEFAULT_WEIGHTS, stranded: 0, blocked: 0, shortfall: 0, supplyAtEdges: false };

describe('naiveBaseline', () => {
  it('links every connected pin and cuts between neighbouring pins in each row', () => {
    // Two upright resistors side by side: pins share the top row and the bottom row.
    const d = designOf(circuitOf([
      { ref: 'R1', kind: 'resistor', pins: { '1': 'A', '2': 'B' } },
      { ref: 'R2', kind: 'resistor', pins: { '1': 'B', '2': 'C' } },
    ]));
    const b = naiveBaseline(d);
    expect(b.links).toBe(4);
    expect(b.cuts).toBe(2);
    // three net strips above parts five rows tall (span 4); two parts, each its own column
    // plus a link column per pin
    expect(b.rows).toBe(3 + 5);
    expect(b.cols).toBe(6);
  });
});

describe('plantedInstance', () => {
  it('reads a netlist off a legal layout that scores on its own board', () => {
    const inst = plantedInstance(12, 3);
    expect(inst.design.parts).toHaveLength(12);
    const problem = buildProblem(inst.design, { padsEdge: 'left' });
    const cost = scoreSpots(problem, inst.board, inst.spots, CMP);
    expect(cost).toBeDefined();
    // every net is read off the copper, so the planted layout's nets need few links
    expect(cost!.links).toBeLessThanOrEqual(Math.ceil(inst.design.nets.length * 0.2));
    expect(plantedInstance(12, 3)).toEqual(inst);
  });

  it('plants a layout the router can finish: its straight links are real, so its spots route and verify clean', () => {
    let routed = 0;
    const seeds = [1, 2, 3, 4, 5, 6, 7, 8];
    for (const seed of seeds) {
      const inst = plantedInstance(40, seed);
      const problem = buildProblem(inst.design, { padsEdge: 'left' });
      const state = new PlaceState(problem, copperMap(inst.board));
      inst.spots.forEach((spot, p) => state.place(p, spot));
      state.settle();
      const circuit = circuitOfDesign(inst.design);
      const r = routeLayout(inst.design, placementLayout(state, inst.design, inst.board, new Set()));
      if (!r.ok) continue;
      routed++;
      expect(verifyLayout(circuit, r.value.layout).faults).toEqual([]);
    }
    // The router is greedy: a planted answer exists, and it must find one nearly always.
    expect(routed).toBeGreaterThanOrEqual(seeds.length - 1);
  });
});

describe('exactPlacement', () => {
  it('finds a placement no worse than the annealer and proves two resistors in series need no link', () => {
    const d = designOf(circuitOf([
      { ref: 'R1', kind: 'resistor', span: { min: 3, max: 3 }, pins: { '1': 'A', '2': 'B' } },
      { ref: 'R2', kind: 'resistor', span: { min: 3, max: 3 }, pins: { '1': 'B', '2': 'C' } },
    ]));
    const problem = buildProblem(d, { padsEdge: 'left' });
    const board = makeBoard('strip', 5, 7);
    const placed = placeOnBoard(problem, board, { seed: 1, effort: 'quick', weights: CMP, locked: new Map(), keepOut: [], linkPlan: false });
    expect(placed.ok).toBe(true);
    if (!placed.ok) return;
    const mine = scoreSpots(problem, board, problem.parts.map((_, p) => placed.state.spotOf(p)), CMP)!;
    const exact = exactPlacement(problem, board, CMP, mine.total + 1e-6);
    expect(exact.complete).toBe(true);
    expect(exact.cost).toBeLessThanOrEqual(mine.total + 1e-9);
    const best = exact.spots.length ? scoreSpots(problem, board, exact.spots, CMP)! : mine;
    expect(best.cuts + best.links).toBe(0);
  });
});
