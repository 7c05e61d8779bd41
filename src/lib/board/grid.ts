/**
 * The hole grid and its copper. Every board kind answers one question — which holes share
 * copper, in which order — as a list of conductors (style habit 4: no switching on kind
 * outside this file).
 */
import type { Board, BoardKind } from '../model/layout.ts';
import type { Hole } from '../model/problem.ts';

/** Dense index of a hole: col + row * cols. */
export function holeIndex(board: Pick<Board, 'cols'>, h: Hole): number {
  return h[0] + h[1] * board.cols;
}

export function holeAt(board: Pick<Board, 'cols'>, index: number): Hole {
  return [index % board.cols, Math.floor(index / board.cols)];
}

export function onBoard(board: Pick<Board, 'cols' | 'rows'>, h: Hole): boolean {
  return h[0] >= 0 && h[1] >= 0 && h[0] < board.cols && h[1] < board.rows && Number.isInteger(h[0]) && Number.isInteger(h[1]);
}

export function sameHole(a: Hole, b: Hole): boolean {
  return a[0] === b[0] && a[1] === b[1];
}

/**
 * The board's conductors before any cut, each an ordered list of holes. `board.conductors`
 * wins when present; otherwise strip boards have one conductor per row and pad boards one
 * per hole.
 */
export function conductorsOf(board: Board): Hole[][] {
  if (board.conductors) return board.conductors.map((c) => c.map((h) => [h[0], h[1]] as Hole));
  const out: Hole[][] = [];
  if (board.kind === 'strip') {
    for (let r = 0; r < board.rows; r++) {
      const row: Hole[] = [];
      for (let c = 0; c < board.cols; c++) row.push([c, r]);
      out.push(row);
    }
  } else if (board.kind === 'pads') {
    for (let r = 0; r < board.rows; r++) for (let c = 0; c < board.cols; c++) out.push([[c, r]]);
  }
  return out;
}

/** A plain board of the given kind and size (no explicit conductors). */
export function makeBoard(kind: BoardKind, cols: number, rows: number, pitchMm = 2.54): Board {
  return { kind, cols, rows, pitchMm };
}

/** Board size in millimetres, hole centre to hole centre plus one pitch of margin. */
export function boardSizeMm(board: Board): { width: number; height: number } {
  return { width: board.cols * board.pitchMm, height: board.rows * board.pitchMm };
}
