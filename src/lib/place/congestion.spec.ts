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
});
