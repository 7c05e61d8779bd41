/**
 * Which holes are joined, and by which nets. A small local union-find (the renderer keeps
 * its own so that it depends on neither the router nor the verifier): copper runs, links
 * (their two end holes) and copper-side wires (every hole they pass over) join holes; the
 * pins of the design then name the nets of each joined group.
 */
import type { Layout } from '../model/layout.ts';
import type { Hole } from '../model/problem.ts';
import { holeIndex, onBoard } from '../board/grid.ts';

export interface Connectivity {
  /** Nets whose pins lie in the group of this hole, sorted; empty when none. Shared: do not mutate. */
  netsAt(h: Hole): string[];
  /** The one net of the hole's group; undefined when none or more than one. */
  netAt(h: Hole): string | undefined;
}

/** Holes a straight wire passes over, ends included; just the ends if it is not straight. */
export function wireHoles(from: Hole, to: Hole): Hole[] {
  if (from[0] !== to[0] && from[1] !== to[1]) return [from, to];
  const dx = Math.sign(to[0] - from[0]);
  const dy = Math.sign(to[1] - from[1]);
  const n = Math.max(Math.abs(to[0] - from[0]), Math.abs(to[1] - from[1]));
  const out: Hole[] = [];
  for (let k = 0; k <= n; k++) out.push([from[0] + k * dx, from[1] + k * dy]);
  return out;
}

export function connect(layout: Layout, runs: readonly Hole[][], pinNet: (ref: string, pin: string) => string | undefined): Connectivity {
  const board = layout.board;
  const parent = Array.from({ length: board.cols * board.rows }, (_, i) => i);
  const find = (i: number): number => {
    while (parent[i] !== i) {
      parent[i] = parent[parent[i]!]!;
      i = parent[i]!;
    }
    return i;
  };
  const join = (a: Hole, b: Hole) => {
    if (!onBoard(board, a) || !onBoard(board, b)) return;
    const ra = find(holeIndex(board, a));
    const rb = find(holeIndex(board, b));
    if (ra !== rb) parent[ra] = rb;
  };
  for (const run of runs) for (let k = 1; k < run.length; k++) join(run[k - 1]!, run[k]!);
  for (const l of layout.links) join(l.from, l.to);
  for (const w of layout.wires) {
    const hs = wireHoles(w.from, w.to);
    for (let k = 1; k < hs.length; k++) join(hs[k - 1]!, hs[k]!);
  }
  const nets = new Map<number, Set<string>>();
  for (const part of layout.parts)
    for (const p of part.pins) {
      const net = pinNet(part.ref, p.pin);
      if (net === undefined || !onBoard(board, p.at)) continue;
      const root = find(holeIndex(board, p.at));
      (nets.get(root) ?? nets.set(root, new Set()).get(root)!).add(net);
    }
  const sorted = new Map<number, string[]>();
  for (const [root, set] of nets) sorted.set(root, [...set].sort());
  const none: string[] = [];
  const netsAt = (h: Hole): string[] => (onBoard(board, h) ? (sorted.get(find(holeIndex(board, h))) ?? none) : none);
  return {
    netsAt,
    netAt: (h) => {
      const n = netsAt(h);
      return n.length === 1 ? n[0] : undefined;
    },
  };
}
