/**
 * `workingBoard(problem, kind, attempt): Board` — the board the placer works on when the
 * board is 'auto'. The area starts at SPREAD times the parts' body cells (room for links
 * between them; the annealer then pulls the parts together and the plan is cropped to
 * them) in a 4:3 landscape, never narrower than the biggest part, and grows by GROWTH in
 * area per further attempt. Bus boards keep the breadboard pattern and grow in length.
 *
 * `cropBoard(board, box, margin)`: the board cut to the parts' box plus `margin` holes all
 * round (the board is cut to size); a breadboard pattern is cut to length only, other
 * boards with explicit copper are not cut.
 */
import type { Board, BoardKind } from '../model/layout.ts';
import { breadboardBoard } from '../board/breadboard.ts';
import { makeBoard } from '../board/grid.ts';
import type { PlaceProblem } from './problem.ts';

const SPREAD = 4;
const GROWTH = 1.35;
/** Usable rows of copper on a breadboard-pattern board: two groups of five. */
const BUS_ROWS = 10;

export function workingBoard(problem: PlaceProblem, kind: BoardKind, attempt: number): Board {
  const cells = problem.parts.reduce((a, p) => a + p.cells, 0);
  const area = Math.max(16, cells * SPREAD * GROWTH ** attempt);
  // The longest side of the most compact pose of the biggest part.
  let big = 1;
  for (const p of problem.parts) big = Math.max(big, Math.min(...p.poses.map((o) => Math.max(o.maxX - o.minX, o.maxY - o.minY) + 1)));
  if (kind === 'bus') return breadboardBoard(Math.min(200, Math.max(10, Math.ceil(area / BUS_ROWS))));
  const cols = Math.min(400, Math.max(big + 2, Math.ceil(Math.sqrt((area * 4) / 3))));
  const rows = Math.min(400, Math.max(big + 2, Math.ceil(area / cols)));
  return makeBoard(kind, cols, rows);
}

export function cropBoard(board: Board, box: { x0: number; y0: number; x1: number; y1: number }, margin: number): { board: Board; dx: number; dy: number } {
  // A breadboard pattern is the same in every column: it may be cut to length.
  if (board.conductors && board.pattern?.startsWith('breadboard')) {
    const cols = Math.min(200, Math.max(4, box.x1 - box.x0 + 1 + 2 * margin));
    return { board: breadboardBoard(cols, board.pitchMm), dx: margin - box.x0, dy: 0 };
  }
  if (board.conductors) return { board, dx: 0, dy: 0 };
  const cols = Math.min(400, box.x1 - box.x0 + 1 + 2 * margin);
  const rows = Math.min(400, box.y1 - box.y0 + 1 + 2 * margin);
  return { board: makeBoard(board.kind, cols, rows, board.pitchMm), dx: margin - box.x0, dy: margin - box.y0 };
}
