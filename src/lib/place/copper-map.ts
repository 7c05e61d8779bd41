/**
 * `copperMap(board): CopperMap` — the board's copper as dense arrays for the cost counters.
 *
 * Every hole gets a conductor id and its position along that conductor (from
 * `conductorsOf`, so no board kind is named here). Holes that no conductor covers (the blank
 * rows of a breadboard pattern, every hole of a pad board) become conductors of their own.
 * `padLike` is true when no conductor joins two holes: then cuts and links say nothing and
 * the placer estimates wire length instead. `alongRows` is true when every conductor runs
 * along one row (the plain strip board), which sharpens the link-length estimate.
 */
import type { Board } from '../model/layout.ts';
import { conductorsOf } from '../board/grid.ts';

export interface CopperMap {
  cols: number;
  rows: number;
  /** Conductor id per hole index (col + row * cols). */
  cond: Int32Array;
  /** Position along its conductor per hole index. */
  pos: Int32Array;
  conductors: number;
  /** Holes of each conductor in copper order. */
  holes: number[][];
  padLike: boolean;
  alongRows: boolean;
}

export function copperMap(board: Board): CopperMap {
  const n = board.cols * board.rows;
  const cond = new Int32Array(n).fill(-1);
  const pos = new Int32Array(n);
  let id = 0;
  let padLike = true;
  let alongRows = true;
  for (const list of conductorsOf(board)) {
    let used = 0;
    const row0 = list[0]?.[1];
    list.forEach((h, i) => {
      if (h[0] < 0 || h[1] < 0 || h[0] >= board.cols || h[1] >= board.rows) return;
      const k = h[0] + h[1] * board.cols;
      if (cond[k] !== -1) return; // a hole on two conductors: the first one wins
      cond[k] = id;
      pos[k] = i;
      used++;
      if (h[1] !== row0) alongRows = false;
    });
    if (used > 1) padLike = false;
    if (used > 0) id++;
  }
  for (let k = 0; k < n; k++) if (cond[k] === -1) cond[k] = id++;
  const holes: number[][] = Array.from({ length: id }, () => []);
  for (let k = 0; k < n; k++) holes[cond[k]!]![pos[k]!] = k;
  for (let c = 0; c < id; c++) holes[c] = holes[c]!.filter((h) => h !== undefined);
  return { cols: board.cols, rows: board.rows, cond, pos, conductors: id, holes, padLike, alongRows: alongRows && !padLike };
}
