/**
 * Board millimetres ↔ holes for one side, matching the scene's frame: hole centres sit half
 * a pitch in from the board edge, and the copper side mirrors x (x → width − x).
 *
 * - `holeAtPoint(grid, [x, y])` → the hole whose pitch square holds the point, or undefined
 *   off the board. `grid` is { side, pitchMm, cols, rows }.
 * - `holeCentre(grid, hole)` → [x, y] in mm on that side.
 */
import type { Hole } from '../../lib/model/index.ts';

export interface SideGrid {
  side: 'component' | 'copper';
  pitchMm: number;
  cols: number;
  rows: number;
}

export function holeAtPoint(g: SideGrid, p: readonly [number, number]): Hole | undefined {
  const width = g.cols * g.pitchMm;
  const x = g.side === 'copper' ? width - p[0] : p[0];
  const col = Math.floor(x / g.pitchMm);
  const row = Math.floor(p[1] / g.pitchMm);
  if (col < 0 || row < 0 || col >= g.cols || row >= g.rows) return undefined;
  return [col, row];
}

export function holeCentre(g: SideGrid, h: readonly [number, number]): [number, number] {
  const x = (h[0] + 0.5) * g.pitchMm;
  return [g.side === 'copper' ? g.cols * g.pitchMm - x : x, (h[1] + 0.5) * g.pitchMm];
}
