/**
 * `buildCopper(board): Result<Copper>` — the board's conductors as flat arrays: for each
 * conductor its holes in the order the copper runs, and for each hole its conductor and
 * position along it. Holes outside every conductor have no copper (conductor -1). A board
 * whose conductors leave the grid or share a hole is bad input (`route.bad-board`).
 */
import { conductorsOf, holeLabel } from '../board/index.ts';
import { fail, ok, type Board, type Problem, type Result } from '../model/index.ts';

export interface Copper {
  cols: number;
  rows: number;
  /** Number of holes, cols × rows; a hole's index is col + row × cols. */
  holes: number;
  /** Conductor c owns condHoles[condStart[c] … condStart[c] + condLen[c] − 1]. */
  condStart: Int32Array;
  condLen: Int32Array;
  condHoles: Int32Array;
  /** Per hole: its conductor (−1: no copper) and its position along it. */
  condOf: Int32Array;
  posOf: Int32Array;
}

export function buildCopper(board: Board): Result<Copper> {
  const { cols, rows } = board;
  const holes = cols * rows;
  const list = conductorsOf(board);
  const condOf = new Int32Array(holes).fill(-1);
  const posOf = new Int32Array(holes).fill(-1);
  const condStart = new Int32Array(list.length);
  const condLen = new Int32Array(list.length);
  const flat: number[] = [];
  const problems: Problem[] = [];
  list.forEach((cond, c) => {
    condStart[c] = flat.length;
    condLen[c] = cond.length;
    cond.forEach((h, p) => {
      const [x, y] = h;
      if (!(x >= 0 && y >= 0 && x < cols && y < rows)) {
        problems.push({
          code: 'route.bad-board',
          severity: 'error',
          path: ['board', 'conductors', c, p],
          message: `conductor ${c + 1} reaches [${x}, ${y}], outside the ${cols}×${rows} board`,
          hint: 'keep every conductor hole inside the board, or enlarge the board',
        });
        flat.push(-1);
        return;
      }
      const i = x + y * cols;
      if (condOf[i] !== -1) {
        problems.push({
          code: 'route.bad-board',
          severity: 'error',
          path: ['board', 'conductors', c, p],
          message: `hole ${holeLabel([x, y], 'component', cols)} belongs to conductor ${condOf[i]! + 1} and to conductor ${c + 1}`,
          hint: 'list each hole in one conductor only; merge the two conductors if their copper touches',
          holes: [[x, y]],
        });
      }
      condOf[i] = c;
      posOf[i] = p;
      flat.push(i);
    });
  });
  if (problems.length) return fail(problems);
  return ok({ cols, rows, holes, condStart, condLen, condHoles: Int32Array.from(flat), condOf, posOf });
}
