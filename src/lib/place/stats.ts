/**
 * `layoutStats(layout, routeStats, cost, parts, attempts, steps): PlanStats` — the figures a
 * plan reports: the board, cuts, links and their length, copper-side wires, the holes used
 * (the bounding box of every pin, link end and wire end) and how the search went.
 */
import type { Layout } from '../model/layout.ts';

export interface PlanStats {
  board: { kind: string; cols: number; rows: number };
  cuts: number;
  links: number;
  linkLengthMm: number;
  wires: number;
  wireLengthMm: number;
  holesUsed: number;
  cost: number;
  parts: number;
  attempts: number;
  steps: number;
}

export function holesUsed(layout: Layout): number {
  const box = usedBox(layout);
  return box.cols * box.rows;
}

/** The bounding box of every pin, link end and wire end (empty: 0 × 0). */
export function usedBox(layout: Layout): { cols: number; rows: number } {
  let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
  const see = (h: readonly [number, number]) => {
    x0 = Math.min(x0, h[0]);
    y0 = Math.min(y0, h[1]);
    x1 = Math.max(x1, h[0]);
    y1 = Math.max(y1, h[1]);
  };
  for (const p of layout.parts) for (const q of p.pins) see(q.at);
  for (const l of [...layout.links, ...layout.wires]) {
    see(l.from);
    see(l.to);
  }
  return x1 < x0 ? { cols: 0, rows: 0 } : { cols: x1 - x0 + 1, rows: y1 - y0 + 1 };
}

export function layoutStats(
  layout: Layout,
  route: { cuts: number; links: number; linkLengthMm: number; wires: number; wireLengthMm: number },
  cost: number,
  parts: number,
  attempts: number,
  steps: number,
): PlanStats {
  return {
    board: { kind: layout.board.kind, cols: layout.board.cols, rows: layout.board.rows },
    cuts: route.cuts,
    links: route.links,
    linkLengthMm: route.linkLengthMm,
    wires: route.wires,
    wireLengthMm: route.wireLengthMm,
    holesUsed: holesUsed(layout),
    cost,
    parts,
    attempts,
    steps,
  };
}
